// The second law at input: no turbine stage may take more work from its steam
// than an isentropic expansion would, anywhere in its flow range.
import { saturatedVapour, statePH, statePS, statePT, PropertyRangeError, type SteamState } from '../properties/index.js';
import type { Header, Plant, Turbine, TurbineStage } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

type PlantParts = Omit<Plant, 'defaults'>;

/** Implied isentropic efficiencies above this are refused (round-off allowance). */
const MOST_EFFICIENCY = 1 + 1e-9;

/**
 * The hottest enthalpy steam can have in each header, kJ/kg: a controlled
 * header's set point; for a floating one the hottest of what can enter it:
 * boilers, imports, letdowns (throttling keeps enthalpy; a desuperheater caps
 * it at its target), turbine stages (never hotter than their inlet) and flash
 * vapour. Headers are taken from high to low pressure.
 */
export function hottestHeaderEnthalpy(plant: PlantParts): Map<string, number> {
  const hottest = new Map<string, number>();
  const headers = [...plant.headers].sort((a, b) => b.pressure - a.pressure);
  for (const header of headers) {
    if (header.state.kind === 'controlled') {
      hottest.set(header.id, header.state.h);
      continue;
    }
    const offers: number[] = [];
    for (const boiler of [...plant.boilers, ...plant.heatRecoveryBoilers]) if (boiler.header === header.id) offers.push(boiler.outlet.h);
    for (const supply of plant.steamImports) if (supply.header === header.id) offers.push(supply.delivered.h);
    for (const letdown of plant.letdowns) {
      const upstream = hottest.get(letdown.from);
      if (letdown.to !== header.id || upstream === undefined) continue;
      offers.push(letdown.desuperheater ? Math.min(upstream, Math.max(letdown.desuperheater.targetH, 0)) : upstream);
    }
    for (const turbine of plant.turbines) {
      const upstream = hottest.get(turbine.inlet);
      if (upstream === undefined) continue;
      hottestExhausts(turbine, plant.headers.find((candidate) => candidate.id === turbine.inlet)!.pressure, upstream).forEach((h, k) => {
        const exhaust = turbine.stages[k].exhaust;
        if (exhaust.kind === 'header' && exhaust.id === header.id) offers.push(h);
      });
    }
    for (const tank of plant.flashTanks) if (tank.vapourTo.kind === 'header' && tank.vapourTo.id === header.id) offers.push(saturatedVapour(tank.pressure).h);
    hottest.set(header.id, offers.length > 0 ? Math.max(...offers) : saturatedVapour(header.pressure).h);
  }
  return hottest;
}

/**
 * The hottest exhaust of each stage from the hottest inlet: an isentropic
 * efficiency takes its share of the isentropic drop (hotter in, hotter out), a
 * stated exhaust is what it says, and a Willans section takes at least its
 * drop at its smallest running flow (nothing, below the no-load flow).
 */
function hottestExhausts(turbine: Turbine, inletPressure: number, inletH: number): number[] {
  const exhausts: number[] = [];
  try {
    let state = statePH(inletPressure, inletH);
    for (const stage of turbine.stages) {
      let drop = 0;
      if (stage.performance.kind === 'willans') {
        const least = stage.sectionFlow.min > 0 ? stageDrop(stage, state, turbine, stage.sectionFlow.min) : 0;
        drop = Math.max(0, least);
      } else {
        drop = stageDrop(stage, state, turbine, 1);
      }
      const h = Math.min(state.h, state.h - drop);
      exhausts.push(h);
      state = statePH(stage.exhaust.pressure, h);
    }
  } catch (error) {
    if (!(error instanceof PropertyRangeError)) throw error;
    // Beyond IF97: fall back on the inlet's enthalpy, which no exhaust exceeds.
    while (exhausts.length < turbine.stages.length) exhausts.push(inletH);
  }
  return exhausts;
}

/** Enthalpy drop of a stage per kg at a section flow, kJ/kg, from its inlet state. */
function stageDrop(stage: TurbineStage, inlet: SteamState, turbine: Turbine, flow: number): number {
  const performance = stage.performance;
  const pressure = stage.exhaust.pressure;
  if (performance.kind === 'isentropic') return performance.efficiency * (inlet.h - statePS(pressure, inlet.s).h);
  if (performance.kind === 'exhaustEnthalpy') return inlet.h - performance.h;
  if (performance.kind === 'exhaustTemperature') return inlet.h - statePT(pressure, performance.T).h;
  // Willans: section power = slope m - intercept, delivered through the mechanical and generator efficiencies.
  return (performance.slope - performance.intercept / flow) / (turbine.mechanicalEfficiency * turbine.generatorEfficiency);
}

interface StageFinding {
  stage: number;
  /** the least implied efficiency over the inlet states the plant can give it */
  efficiency: number;
  flow: number;
}

/**
 * The implied isentropic efficiency of each stage, the least over the inlet
 * states the case allows: a controlled inlet header's set point, or for a
 * floating one anything from dry saturated steam to the hottest steam that can
 * reach it. A Willans line is taken at its largest section flow, where its
 * drop per kg is largest.
 */
function impliedEfficiencies(turbine: Turbine, header: Header, hottest: number): StageFinding[] {
  const inlets = header.state.kind === 'controlled' ? [header.state.h] : [Math.min(saturatedVapour(header.pressure).h, hottest), hottest];
  const findings: StageFinding[] = turbine.stages.map((stage, k) => ({ stage: k, efficiency: Infinity, flow: largestFlow(stage, turbine) }));
  for (const h of inlets) {
    let state = statePH(header.pressure, h);
    turbine.stages.forEach((stage, k) => {
      const flow = findings[k].flow;
      const drop = stageDrop(stage, state, turbine, flow);
      const isentropic = state.h - statePS(stage.exhaust.pressure, state.s).h;
      const efficiency = isentropic > 0 ? drop / isentropic : drop > 0 ? Infinity : 0;
      findings[k].efficiency = Math.min(findings[k].efficiency, efficiency);
      // The next stage starts where this one ends; a stage making no work passes its inlet state on.
      state = statePH(stage.exhaust.pressure, state.h - Math.max(0, Math.min(drop, isentropic)));
    });
  }
  return findings;
}

/** The largest flow through a section: its stated maximum, else the turbine's inlet maximum, else 1e4 kg/s. */
function largestFlow(stage: TurbineStage, turbine: Turbine): number {
  if (Number.isFinite(stage.sectionFlow.max)) return stage.sectionFlow.max;
  if (Number.isFinite(turbine.inletFlow.max)) return turbine.inletFlow.max;
  return 1e4;
}

export function checkSecondLaw(context: ResolveContext, plant: PlantParts): void {
  const hottest = hottestHeaderEnthalpy(plant);
  const headers = new Map(plant.headers.map((header) => [header.id, header]));
  for (const turbine of plant.turbines) {
    const header = headers.get(turbine.inlet);
    const turbinePath = context.ids.get(turbine.id)?.path;
    if (!header || !turbinePath) continue;
    const stagePath = (k: number): (string | number)[] => [...turbinePath, 'stages', k];
    // Below its no-load flow a Willans section makes negative power; the optimiser runs it at
    // least at that flow, so a stated minimum below it is not what the plant will do: say so.
    turbine.stages.forEach((stage, k) => {
      const performance = stage.performance;
      if (performance.kind !== 'willans' || performance.intercept <= 0) return;
      const noLoad = performance.intercept / performance.slope;
      if (context.raw([...stagePath(k), 'section_flow']) !== undefined && stage.sectionFlow.min < noLoad * (1 - 1e-9)) {
        context.warn('below-no-load', [...stagePath(k), 'section_flow'],
          `stage ${k + 1} of turbine ${turbine.id} may run down to ${context.show(stage.sectionFlow.min, 'massFlow')}, below its Willans line's no-load flow of ${context.show(noLoad, 'massFlow')} (intercept / slope), where it makes no power; running, it passes at least the no-load flow. Set section_flow min to it`);
      }
    });
    let findings: StageFinding[];
    try {
      findings = impliedEfficiencies(turbine, header, hottest.get(header.id) ?? saturatedVapour(header.pressure).h);
    } catch (error) {
      // A state outside IF97 is reported where it arises, by the solve.
      if (error instanceof PropertyRangeError) continue;
      throw error;
    }
    for (const finding of findings) {
      if (!(finding.efficiency > MOST_EFFICIENCY)) continue;
      const stage = turbine.stages[finding.stage];
      const key = { isentropic: 'isentropic_efficiency', exhaustEnthalpy: 'exhaust_enthalpy', exhaustTemperature: 'exhaust_temperature', willans: 'willans_line' }[stage.performance.kind];
      const what = {
        isentropic: 'its isentropic efficiency',
        exhaustEnthalpy: `its exhaust enthalpy ${context.text([...stagePath(finding.stage), key])}`,
        exhaustTemperature: `its exhaust temperature ${context.text([...stagePath(finding.stage), key])}`,
        willans: `its Willans line (slope ${context.text([...stagePath(finding.stage), key, 'slope'])}, intercept ${context.text([...stagePath(finding.stage), key, 'intercept'])}) at ${context.show(finding.flow, 'massFlow')}`,
      }[stage.performance.kind];
      const from = header.state.kind === 'controlled' ? `from ${header.id} at its set point` : `from any state ${header.id} can reach`;
      context.error('above-isentropic', [...stagePath(finding.stage), key],
        `stage ${finding.stage + 1} of turbine ${turbine.id}: ${what} implies an isentropic efficiency of ${header.state.kind === 'controlled' ? '' : 'at least '}${(finding.efficiency * 100).toFixed(0)} % ${from}; no turbine passes 100 %. Check the figure and its units`);
    }
  }
}
