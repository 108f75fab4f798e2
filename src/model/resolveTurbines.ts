// Steam turbines: stages in flow order, each to a header or a condenser.
import { saturationTemperature } from '../properties/index.js';
import type { CasePath } from './issue.js';
import type { Header, StageExhaust, StagePerformance, Turbine, TurbineDrive, TurbineStage } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';
import { steamPressure } from './resolveHeaders.js';
import { liquidDestination } from './resolveSupply.js';
import { resolveSwitching } from './resolveSwitching.js';

function exhaustOf(context: ResolveContext, path: CasePath, headers: Map<string, Header>): StageExhaust | undefined {
  if (context.raw([...path, 'to']) !== undefined) {
    const id = context.reference([...path, 'to'], ['header']);
    const header = id === undefined ? undefined : headers.get(id);
    return header && { kind: 'header', id: header.id, pressure: header.pressure };
  }
  const pressure = steamPressure(context, [...path, 'condenser_pressure'], { belowAtmosphereAllowed: true });
  if (context.raw([...path, 'condensate_to']) === undefined) {
    context.addDefault([...path, 'condensate_to'], 'deaerator', 'condensing stage condensate destination not stated: the condenser returns it to the deaerator');
  }
  const condensateTo = liquidDestination(context, [...path, 'condensate_to'], ['deaerator', 'drain'], { kind: 'deaerator' });
  return pressure === undefined || !condensateTo ? undefined : { kind: 'condenser', pressure, condensateTo };
}

function performanceOf(context: ResolveContext, path: CasePath, exhaust: StageExhaust | undefined): StagePerformance | undefined {
  if (context.raw([...path, 'isentropic_efficiency']) !== undefined) {
    const efficiency = context.fraction([...path, 'isentropic_efficiency'], { zeroAllowed: false });
    return efficiency === undefined ? undefined : { kind: 'isentropic', efficiency };
  }
  if (context.raw([...path, 'exhaust_enthalpy']) !== undefined) {
    const enthalpy = context.quantity([...path, 'exhaust_enthalpy'], 'specificEnthalpy');
    return enthalpy === undefined ? undefined : { kind: 'exhaustEnthalpy', h: enthalpy };
  }
  if (context.raw([...path, 'exhaust_temperature']) !== undefined) {
    const temperaturePath = [...path, 'exhaust_temperature'];
    const temperature = context.quantity(temperaturePath, 'temperature');
    if (temperature === undefined || !exhaust) return undefined;
    const saturation = saturationTemperature(exhaust.pressure);
    if (temperature <= saturation) {
      context.error('below-saturation', temperaturePath,
        `exhaust temperature ${context.text(temperaturePath)} is at or below saturation (${context.show(saturation, 'temperature')} at ${context.show(exhaust.pressure, 'pressure')}); a wet exhaust is given by exhaust_enthalpy`);
      return undefined;
    }
    return { kind: 'exhaustTemperature', T: temperature };
  }
  if (context.raw([...path, 'willans_line']) !== undefined) {
    const intercept = context.amount([...path, 'willans_line', 'intercept'], 'power');
    const slope = context.quantity([...path, 'willans_line', 'slope'], 'specificEnthalpy');
    if (slope !== undefined && slope <= 0) {
      context.error('out-of-range', [...path, 'willans_line', 'slope'], `expected a slope above zero, found "${context.text([...path, 'willans_line', 'slope'])}"`);
      return undefined;
    }
    return intercept === undefined || slope === undefined ? undefined : { kind: 'willans', intercept, slope };
  }
  return undefined;
}

function driveOf(context: ResolveContext, path: CasePath): TurbineDrive | undefined {
  if (context.raw(path) === undefined) {
    context.addDefault(path, 'generator', 'drive not stated: the turbine drives a generator');
    return { kind: 'generator' };
  }
  const target = context.reference(path, ['machine', 'feedwaterPump'], ['generator']);
  if (target === undefined) return undefined;
  return target === 'generator' ? { kind: 'generator' } : { kind: 'machine', id: target };
}

function efficiencyOrDefault(context: ResolveContext, path: CasePath, fallback: number, reason: string): number | undefined {
  if (context.raw(path) === undefined) {
    context.addDefault(path, `${fallback * 100} %`, reason);
    return fallback;
  }
  return context.fraction(path, { zeroAllowed: false });
}

export function resolveTurbines(context: ResolveContext, headers: Map<string, Header>): Turbine[] {
  return context.entries(['turbines']).flatMap(({ item, path }) => {
    const inletId = context.reference([...path, 'inlet'], ['header']);
    const inlet = inletId === undefined ? undefined : headers.get(inletId);
    const stages: (TurbineStage | undefined)[] = [];
    let previousPressure = inlet?.pressure;
    let previousLabel = inlet ? `the inlet header ${inlet.id}` : '';
    const stageEntries = context.entries([...path, 'stages']);
    const stageIds = new Set<string>();
    for (const { item: stage, path: stagePath } of stageEntries) {
      if (typeof stage.id !== 'string') continue;
      if (stageIds.has(stage.id)) context.error('duplicate-id', [...stagePath, 'id'], `stage id "${stage.id}" is used twice in turbine ${String(item.id)}; stage ids must be unique within their turbine`);
      stageIds.add(stage.id);
    }
    stageEntries.forEach(({ path: stagePath }, index) => {
      const exhaust = exhaustOf(context, stagePath, headers);
      const performance = performanceOf(context, stagePath, exhaust);
      const outflow = context.range([...stagePath, 'outflow'], 'massFlow');
      const sectionFlow = context.range([...stagePath, 'section_flow'], 'massFlow');
      let ok = exhaust !== undefined && performance !== undefined;
      if (context.raw([...stagePath, 'condensate_to']) !== undefined && context.raw([...stagePath, 'to']) !== undefined) {
        context.error('condensate-without-condenser', [...stagePath, 'condensate_to'], 'condensate_to belongs to a condensing stage (condenser_pressure); this stage exhausts to a header');
        ok = false;
      }
      if (exhaust && exhaust.kind === 'condenser' && index < stageEntries.length - 1) {
        context.error('condenser-not-last', [...stagePath, 'condenser_pressure'], 'a condensing stage must be the last stage of its turbine');
        ok = false;
      }
      if (exhaust && previousPressure !== undefined && exhaust.pressure >= previousPressure) {
        const where = exhaust.kind === 'header' ? [...stagePath, 'to'] : [...stagePath, 'condenser_pressure'];
        const target = exhaust.kind === 'header' ? `header ${exhaust.id}` : 'its condenser';
        context.error('pressure-rises', where,
          `stage exhausts to ${target} at ${context.show(exhaust.pressure, 'pressure')}, not below ${previousLabel} at ${context.show(previousPressure, 'pressure')}; steam only expands to a lower pressure`);
        ok = false;
      }
      if (exhaust) {
        previousPressure = exhaust.pressure;
        previousLabel = exhaust.kind === 'header' ? `the previous stage's header ${exhaust.id}` : 'the previous stage';
      }
      stages.push(ok ? { exhaust: exhaust!, performance: performance!, outflow, sectionFlow } : undefined);
    });
    const mechanical = efficiencyOrDefault(context, [...path, 'mechanical_efficiency'], 0.98, 'mechanical efficiency not stated: 98 % (common practice, no single source)');
    const drives = driveOf(context, [...path, 'drives']);
    let generator: number | undefined = 1;
    if (drives?.kind === 'generator') {
      generator = efficiencyOrDefault(context, [...path, 'generator_efficiency'], 0.97, 'generator efficiency not stated: 97 % (common practice, no single source)');
    } else if (item.generator_efficiency !== undefined) {
      context.warn('ignored-key', [...path, 'generator_efficiency'], 'this turbine drives a machine, so its generator efficiency is not used');
    }
    const power = context.range([...path, 'power'], 'power');
    if (item.can_switch_off === undefined) context.addDefault([...path, 'can_switch_off'], 'true', 'on/off not stated: the optimiser may stop this turbine');
    const switching = resolveSwitching(context, [...path, 'switching'], item.can_switch_off !== false, `turbine ${String(item.id)}`);
    if (!inlet || stages.length === 0 || stages.some((stage) => !stage) || mechanical === undefined || generator === undefined || !drives || typeof item.id !== 'string') return [];
    const resolved = stages as TurbineStage[];
    return [{
      id: item.id, kind: 'turbine' as const, inlet: inlet.id, stages: resolved, inletFlow: resolved[0].sectionFlow,
      mechanicalEfficiency: mechanical, generatorEfficiency: generator, power, canSwitchOff: item.can_switch_off !== false, drives, ...(switching ? { switching } : {}),
    }];
  });
}
