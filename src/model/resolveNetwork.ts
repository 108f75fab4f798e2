// Letdowns, process users, flash tanks, the deaerator and driven machines.
import { saturatedLiquid, saturationTemperature, statePT } from '../properties/index.js';
import type { CasePath } from './issue.js';
import type { AlternativeDrive, Deaerator, DrivenMachine, FeedwaterPump, FlashTank, Header, Letdown, LiquidDestination, Site, SteamUser } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';
import { steamPressure } from './resolveHeaders.js';
import { liquidDestination } from './resolveSupply.js';

function headerAt(context: ResolveContext, path: CasePath, headers: Map<string, Header>): Header | undefined {
  const id = context.reference(path, ['header']);
  return id === undefined ? undefined : headers.get(id);
}

export function resolveLetdowns(context: ResolveContext, headers: Map<string, Header>): Letdown[] {
  return context.entries(['letdowns']).flatMap(({ item, path }) => {
    const from = headerAt(context, [...path, 'from'], headers);
    const to = headerAt(context, [...path, 'to'], headers);
    let ok = from !== undefined && to !== undefined;
    if (from && to && to.pressure >= from.pressure) {
      context.error('pressure-rises', [...path, 'to'],
        `letdown goes from ${from.id} at ${context.show(from.pressure, 'pressure')} to ${to.id} at ${context.show(to.pressure, 'pressure')}; a letdown must go to a lower pressure`);
      ok = false;
    }
    const capacity = context.amount([...path, 'capacity'], 'massFlow');
    if (capacity === 0) context.error('out-of-range', [...path, 'capacity'], 'expected a capacity above zero, found "0"');
    let desuperheater: Letdown['desuperheater'] = null;
    const entry = item.desuperheater;
    if (entry === undefined) {
      context.addDefault([...path, 'desuperheater'], 'none', 'desuperheater not stated: throttling only, the outlet keeps the inlet enthalpy');
    } else if (entry !== null && typeof entry === 'object') {
      const targetPath = [...path, 'desuperheater', 'target_temperature'];
      const target = context.quantity(targetPath, 'temperature');
      const water = (entry as Record<string, unknown>).spray_water;
      if (target !== undefined && to) {
        const saturation = saturationTemperature(to.pressure);
        if (target <= saturation) {
          context.error('below-saturation', targetPath,
            `desuperheater target ${context.text(targetPath)} is at or below saturation (${context.show(saturation, 'temperature')} at ${context.show(to.pressure, 'pressure')}); give a temperature above it`);
          ok = false;
        } else {
          const state = context.property(targetPath, 'desuperheater outlet', () => statePT(to.pressure, target));
          if (state && (water === 'feedwater' || water === 'makeup')) desuperheater = { targetTemperature: target, targetH: state.h, water };
          else ok = false;
        }
      } else ok = false;
    }
    if (!ok || capacity === undefined || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'letdown' as const, from: from!.id, to: to!.id, capacity, desuperheater }];
  });
}

export function resolveUsers(context: ResolveContext, headers: Map<string, Header>): SteamUser[] {
  return context.entries(['users']).flatMap(({ item, path }) => {
    const header = headerAt(context, [...path, 'header'], headers);
    let demand: SteamUser['demand'] | undefined;
    if (item.steam !== undefined && item.heat === undefined) {
      const massFlow = context.amount([...path, 'steam'], 'massFlow');
      if (massFlow !== undefined) demand = { kind: 'flow', massFlow };
    } else if (item.heat !== undefined && item.steam === undefined) {
      const heat = context.amount([...path, 'heat'], 'power');
      if (heat !== undefined) demand = { kind: 'duty', heat };
    }
    const condensatePath = [...path, 'condensate'];
    let condensate: SteamUser['condensate'] | undefined;
    if (item.condensate === undefined) {
      context.addDefault(condensatePath, 'no return', 'condensate not stated: none is returned, all of it is made up with fresh water');
      if (header) {
        const liquid = saturatedLiquid(header.pressure);
        condensate = { returnFraction: 0, temperature: liquid.T, h: liquid.h, to: { kind: 'drain' } };
      }
    } else {
      const returnFraction = context.fraction([...condensatePath, 'return']);
      const temperaturePath = [...condensatePath, 'temperature'];
      const temperature = context.raw(temperaturePath) === undefined ? undefined : context.quantity(temperaturePath, 'temperature');
      let to: LiquidDestination | undefined = liquidDestination(context, [...condensatePath, 'to'], ['deaerator', 'drain']);
      if (returnFraction !== undefined && returnFraction > 0) {
        if (context.raw([...condensatePath, 'to']) === undefined) {
          context.error('condensate-nowhere', condensatePath, `${context.text([...condensatePath, 'return'])} of the condensate is returned but has nowhere to go: add to (a flash tank id, deaerator or drain)`);
        }
        if (context.raw(temperaturePath) === undefined) {
          context.error('missing-key', condensatePath, 'returned condensate needs a temperature, such as "90 degC"');
        }
      } else if (context.raw([...condensatePath, 'to']) === undefined) {
        to = { kind: 'drain' };
      }
      if (header && temperature !== undefined) {
        const saturation = saturationTemperature(header.pressure);
        if (temperature > saturation + 1e-9) {
          context.error('above-saturation', temperaturePath,
            `condensate temperature ${context.text(temperaturePath)} is above saturation (${context.show(saturation, 'temperature')} at ${context.show(header.pressure, 'pressure')}); condensate is liquid at or below it`);
        } else if (temperature <= 273.15) {
          context.error('out-of-range', temperaturePath, `expected a condensate temperature above 0 degC, found "${context.text(temperaturePath)}"`);
        } else {
          const h = context.property(temperaturePath, 'condensate', () =>
            saturation - temperature < 1e-6 ? saturatedLiquid(header.pressure).h : statePT(header.pressure, temperature).h);
          if (h !== undefined && returnFraction !== undefined && to) condensate = { returnFraction, temperature, h, to };
        }
      } else if (header && returnFraction === 0 && to) {
        const liquid = saturatedLiquid(header.pressure);
        condensate = { returnFraction: 0, temperature: liquid.T, h: liquid.h, to };
      }
    }
    if (!header || !demand || !condensate || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'user' as const, header: header.id, demand, condensate }];
  });
}

export function resolveFlashTanks(context: ResolveContext, headers: Map<string, Header>, site?: Site | null): FlashTank[] {
  const pressures = new Map<string, number>();
  const entries = context.entries(['flash_tanks']);
  for (const { item, path } of entries) {
    const pressure = steamPressure(context, [...path, 'pressure'], { belowAtmosphereAllowed: false });
    if (pressure !== undefined && typeof item.id === 'string') pressures.set(item.id, pressure);
  }
  return entries.flatMap(({ item, path }) => {
    const pressure = typeof item.id === 'string' ? pressures.get(item.id) : undefined;
    let vapourTo: FlashTank['vapourTo'] | undefined;
    const vapour = context.reference([...path, 'vapour_to'], ['header'], ['atmosphere']);
    if (vapour === 'atmosphere') vapourTo = { kind: 'atmosphere' };
    else if (vapour !== undefined) {
      const header = headers.get(vapour);
      if (header && pressure !== undefined && header.pressure > pressure) {
        context.error('pressure-rises', [...path, 'vapour_to'],
          `flash steam at ${context.show(pressure, 'pressure')} cannot flow up to header ${header.id} at ${context.show(header.pressure, 'pressure')}; send it to a header at or below the tank pressure`);
      } else if (header) vapourTo = { kind: 'header', id: header.id };
    }
    const liquidTo = liquidDestination(context, [...path, 'liquid_to'], ['deaerator', 'drain']);
    let ok = liquidTo !== undefined;
    if (liquidTo?.kind === 'flashTank' && pressure !== undefined) {
      const next = pressures.get(liquidTo.id);
      if (liquidTo.id === item.id) {
        context.error('self-reference', [...path, 'liquid_to'], 'a flash tank cannot send its liquid to itself');
        ok = false;
      } else if (next !== undefined && next >= pressure) {
        context.error('pressure-rises', [...path, 'liquid_to'],
          `liquid at ${context.show(pressure, 'pressure')} cannot flash in ${liquidTo.id} at ${context.show(next, 'pressure')}; a cascade goes to lower pressure`);
        ok = false;
      }
    }
    const preheater = pressure !== undefined && context.raw([...path, 'makeup_preheater']) !== undefined ? makeupPreheater(context, [...path, 'makeup_preheater'], pressure, liquidTo, site) : null;
    if (preheater === undefined) ok = false;
    if (pressure === undefined || !vapourTo || !ok || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'flashTank' as const, pressure, saturationTemperature: saturationTemperature(pressure), receives: [], vapourTo, liquidTo: liquidTo!, ...(preheater ? { makeupPreheater: preheater } : {}) }];
  });
}

function motorOf(context: ResolveContext, path: CasePath): { efficiency: number } | null | undefined {
  if (context.raw(path) === undefined) return null;
  const efficiency = context.fraction(path, { zeroAllowed: false });
  return efficiency === undefined ? undefined : { efficiency };
}

export function resolveDeaerator(context: ResolveContext, headers: Map<string, Header>): Deaerator | null {
  const path = ['deaerator'];
  const pressure = steamPressure(context, [...path, 'pressure'], { belowAtmosphereAllowed: true });
  const heating = headerAt(context, [...path, 'heating_steam'], headers);
  if (heating && pressure !== undefined && heating.pressure <= pressure) {
    context.error('pressure-rises', [...path, 'heating_steam'],
      `heating steam from ${heating.id} at ${context.show(heating.pressure, 'pressure')} cannot enter the deaerator at ${context.show(pressure, 'pressure')}; choose a header above the deaerator pressure`);
  }
  const vent = context.fraction([...path, 'vent']);
  const pumps: FeedwaterPump[] = [];
  let pumpsOk = true;
  for (const { item, path: pumpPath } of context.entries([...path, 'feedwater_pumps'])) {
    const efficiency = context.fraction([...pumpPath, 'efficiency'], { zeroAllowed: false });
    const motor = motorOf(context, [...pumpPath, 'motor_efficiency']);
    const alternative = context.raw([...pumpPath, 'alternative_drive']) === undefined ? null : alternativeDrive(context, [...pumpPath, 'alternative_drive'], headers);
    if (efficiency === undefined || motor === undefined || alternative === undefined || typeof item.id !== 'string') pumpsOk = false;
    else pumps.push({ id: item.id, kind: 'feedwaterPump', pumpEfficiency: efficiency, motor, turbine: null, ...(alternative ? { alternativeDrive: alternative } : {}) });
  }
  const pumpWork = context.raw([...path, 'feedwater_pumps']) !== 'none';
  if (context.raw([...path, 'feedwater_pumps']) === undefined) {
    context.addDefault([...path, 'feedwater_pumps'], 'pump work at 100 % efficiency, bought as electricity',
      'feedwater pumps not stated: lifting feedwater to each boiler still takes work, v dp; say feedwater_pumps: none to leave it out');
  }
  if (pressure === undefined || !heating || heating.pressure <= pressure || vent === undefined || !pumpsOk) return null;
  const liquid = saturatedLiquid(pressure);
  return { id: 'deaerator', kind: 'deaerator', pressure, saturationTemperature: liquid.T, feedwaterH: liquid.h, heatingSteam: heating.id, ventFraction: vent, feedwaterPumps: pumps, pumpWork };
}

export function resolveMachines(context: ResolveContext, headers: Map<string, Header> = new Map()): DrivenMachine[] {
  return context.entries(['machines']).flatMap(({ item, path }) => {
    const shaftPower = context.amount([...path, 'shaft_power'], 'power');
    const motor = motorOf(context, [...path, 'motor_efficiency']);
    const type = item.type;
    const alternative = context.raw([...path, 'alternative_drive']) === undefined ? null : alternativeDrive(context, [...path, 'alternative_drive'], headers);
    if (shaftPower === undefined || motor === undefined || alternative === undefined || (type !== 'pump' && type !== 'fan' && type !== 'compressor') || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'machine' as const, machine: type, shaftPower, motor, turbine: null, ...(alternative ? { alternativeDrive: alternative } : {}) }];
  });
}

/** A machine's or feedwater pump's alternative drive: a motor, or a back-pressure turbine between two headers, down in pressure. */
function alternativeDrive(context: ResolveContext, path: CasePath, headers: Map<string, Header>): AlternativeDrive | undefined {
  // Both or neither of motor_efficiency and turbine_from: the schema says so.
  if ((context.raw([...path, 'motor_efficiency']) === undefined) === (context.raw([...path, 'turbine_from']) === undefined)) return undefined;
  if (context.raw([...path, 'motor_efficiency']) !== undefined) {
    const efficiency = context.fraction([...path, 'motor_efficiency'], { zeroAllowed: false });
    return efficiency === undefined ? undefined : { kind: 'motor', efficiency };
  }
  let ok = true;
  for (const key of ['turbine_to', 'isentropic_efficiency']) {
    if (context.raw([...path, key]) === undefined) {
      context.error('alternative-drive-incomplete', path, `a turbine alternative needs ${key} as well as turbine_from; add it`);
      ok = false;
    }
  }
  const from = headerAt(context, [...path, 'turbine_from'], headers);
  const to = context.raw([...path, 'turbine_to']) === undefined ? undefined : headerAt(context, [...path, 'turbine_to'], headers);
  const efficiency = context.raw([...path, 'isentropic_efficiency']) === undefined ? undefined : context.fraction([...path, 'isentropic_efficiency'], { zeroAllowed: false });
  if (from && to && to.pressure >= from.pressure) {
    context.error('pressure-rises', [...path, 'turbine_to'], `a turbine from ${from.id} at ${context.show(from.pressure, 'pressure')} cannot exhaust to ${to.id} at ${context.show(to.pressure, 'pressure')}; choose a header at a lower pressure`);
    ok = false;
  }
  if (!ok || !from || !to || efficiency === undefined) return undefined;
  return { kind: 'turbine', from: from.id, to: to.id, isentropicEfficiency: efficiency };
}

/**
 * A flash tank's makeup preheater: only on liquid that goes to drain, leaving
 * above the makeup water's temperature (heat flows from the liquid to the
 * makeup) and below the tank's saturation (it cools the liquid).
 */
function makeupPreheater(context: ResolveContext, path: CasePath, pressure: number, liquidTo: LiquidDestination | undefined, site: Site | null | undefined): FlashTank['makeupPreheater'] | undefined {
  const temperaturePath = [...path, 'leaving_temperature'];
  const leaving = context.quantity(temperaturePath, 'temperature');
  if (leaving === undefined) return undefined;
  if (liquidTo && liquidTo.kind !== 'drain') {
    context.error('preheater-not-on-drain', path, `a makeup preheater cools liquid on its way to drain, but this tank sends its liquid to ${liquidTo.kind === 'flashTank' ? liquidTo.id : liquidTo.kind}; set liquid_to: drain or leave the preheater out`);
    return undefined;
  }
  const saturation = saturationTemperature(pressure);
  if (!(leaving < saturation)) {
    context.error('preheater-too-hot', temperaturePath, `leaving temperature ${context.text(temperaturePath)} is not below the tank's saturation (${context.show(saturation, 'temperature')} at ${context.show(pressure, 'pressure')}); the exchanger cools the liquid, so give a lower temperature`);
    return undefined;
  }
  if (site && !(leaving > site.makeupWater.temperature)) {
    context.error('preheater-too-cold', temperaturePath, `leaving temperature ${context.text(temperaturePath)} is not above the makeup water's ${context.show(site.makeupWater.temperature, 'temperature')}; heat flows from the liquid to the makeup, so give a higher temperature`);
    return undefined;
  }
  if (!site) return undefined;
  return { leavingTemperature: leaving, leavingH: statePT(site.atmosphericPressure, leaving).h };
}
