// The marginal value of steam at each header, from the converged plant.
//
// At convergence the last pass is the plant's true first-order model (every
// floating enthalpy is a variable of it and every m h is linearised about the
// solution), so its duals are the converged plant's sensitivities: one more
// kg/s drawn at a header's state moves its mass row by 1 and its energy row by
// h. Where the optimum sits on a switch (a boiler at its maximum, a turbine at
// a limit) one more and one less tonne cost differently and the dual is only
// one of them; so each side is also measured by re-solving that same model
// with a small draw added or taken away, with the on/off decisions held, and
// the units whose fuel or power moved are named.
import type { SolveResult } from '../lp/index.js';
import { buildPass, ENERGY_ROW_SCALE, energyRowName, massRowName, type Pass } from './buildPass.js';
import type { UnitReport } from './contribution.js';
import type { Converged, LoopSettings } from './converge.js';
import { passSolution } from './passSolution.js';

/**
 * The probe's draw, kg/s (0.36 kg/h). The value read is the probe model's own
 * dual, the slope of the optimum just beyond the operating point on that side,
 * exact while no switch lies within the draw; the draw only has to move the
 * solver off a degenerate point, so it can be far smaller than any header.
 */
export const PROBE_FLOW = 1e-4;

/** Trust radius of the probes' header moves, kJ/kg: far beyond what 3.6 kg/h moves. */
const PROBE_TRUST = 50;

export interface MarginalValue {
  header: string;
  /** the kept pass's dual, objective units per kg/s; null without duals */
  dual: number | null;
  /** what one more kg/s drawn costs, objective units per kg/s; null when no more can be raised with the units running */
  more: number | null;
  /** what one less kg/s saves, objective units per kg/s; null when the header cannot take less */
  less: number | null;
  /** units and limits that set each side, e.g. "boiler_2 fuel", "tg1 power given up" */
  moreSetBy: string[];
  lessSetBy: string[];
}

export async function marginalValues(settings: LoopSettings, converged: Converged): Promise<MarginalValue[]> {
  const { plant, objective, backend } = settings;
  const { pass, solution, contributions, point } = converged;
  const base = contributions.map((unit) => unit.report(solution));
  const baseObjective = converged.result.objective ?? 0;
  const onOff = new Map([...converged.integers].filter(([name]) => name.endsWith('.on')));
  // The trust radii bound the loop's steps, not the plant: at convergence none
  // binds, so the probes open them and let the headers' enthalpies follow the draw.
  const probePoint = { ...point, trust: new Map([...point.trust].map(([id, radius]) => [id, Math.max(radius, PROBE_TRUST)])) };
  const probeOptions = { ...settings.solveOptions, mipDuals: false, mipRelativeGap: 1e-12 };
  const probes = plant.headers.flatMap((header) => [PROBE_FLOW, -PROBE_FLOW].map((flow) => ({ header: header.id, flow })));
  const measured: { value: number | null; setBy: string[] }[] = probes.map(() => ({ value: null, setBy: [] }));
  // A probe's figures, read while the units are built for the model its result belongs to.
  const read = (index: number, result: SolveResult): boolean => {
    if (result.status !== 'optimal' || result.objective === null) return false;
    const changed = contributions.map((unit) => unit.report(passSolution(result)));
    const header = probes[index].header;
    // The slope beyond the point is the probe's dual; without duals (a MIP), the difference quotient.
    const slope = result.dualsAvailable ? headerDual(result, header, probePoint.headerEnthalpy.get(header)!) : null;
    measured[index] = { value: slope ?? (result.objective - baseObjective) / probes[index].flow, setBy: causes(base, changed, probes[index].flow) };
    return true;
  };
  const build = (header: string, flow: number, fixed: ReadonlyMap<string, number>): Pass =>
    buildPass(plant, contributions, probePoint, objective, { fixedIntegers: fixed, extraDemand: new Map(plant.headers.map((entry) => [entry.id, entry.id === header ? flow : 0])) });

  // Every integer held, so each probe is a linear program: one model with a
  // held draw at every header, re-solved warm with one draw moved where the
  // backend keeps a session, else one model per probe.
  const unmet: number[] = [];
  if (backend.solveBoundVariants) {
    const probeModel = build('', 0, converged.integers).context.model;
    const results = await backend.solveBoundVariants(probeModel, probes.map((probe) => [[`${probe.header}.extra_draw`, probe.flow, probe.flow] as const]), probeOptions);
    results.forEach((result, index) => {
      if (!read(index, result)) unmet.push(index);
    });
  } else {
    for (const [index, probe] of probes.entries()) {
      if (!read(index, await backend.solve(build(probe.header, probe.flow, converged.integers).context.model, probeOptions))) unmet.push(index);
    }
  }
  // Where the held load segments cannot take the draw, the segments of
  // non-convex curves follow: a small MIP, solved to optimality, since its gap
  // would swamp a difference this small.
  if (onOff.size < converged.integers.size) {
    for (const index of unmet) read(index, await backend.solve(build(probes[index].header, probes[index].flow, onOff).context.model, probeOptions));
  }

  return plant.headers.map((header, position) => {
    const dual = headerDual(converged.result, header.id, pass.context.h(header.id));
    const more = measured[2 * position];
    const less = measured[2 * position + 1];
    return { header: header.id, dual, more: more.value, less: less.value, moreSetBy: more.setBy, lessSetBy: less.setBy };
  });
}

/**
 * One more kg/s drawn at h moves the header's mass row by 1 and its energy row
 * (where it has one) by h: the sum of both prices, objective units per kg/s.
 */
export function headerDual(result: SolveResult, header: string, h: number): number | null {
  if (!result.dualsAvailable) return null;
  const mass = result.shadowPrice(massRowName(header));
  const energy = safeShadowPrice(result, energyRowName(header));
  return mass + h * ENERGY_ROW_SCALE * energy;
}

/** A row's shadow price, 0 for a row the model does not have (a header without an energy row). */
function safeShadowPrice(result: SolveResult, row: string): number {
  try {
    return result.shadowPrice(row);
  } catch {
    return 0;
  }
}

/**
 * The units whose fuel, power or vent moved with the probe, largest first, in
 * words: "boiler_2 fuel", "tg1 power given up", "lp vent".
 */
function causes(base: readonly UnitReport[], changed: readonly UnitReport[], flow: number): string[] {
  const moves: { phrase: string; size: number }[] = [];
  const num = (report: UnitReport | undefined, key: string): number => {
    const value = report?.values[key];
    return typeof value === 'number' ? value : 0;
  };
  for (const after of changed) {
    const before = base.find((report) => report.id === after.id);
    const delta = (key: string): number => (num(after, key) - num(before, key)) / Math.abs(flow);
    const fuel = delta('fuel_kW') + delta('duct_fuel_kW');
    if (Math.abs(fuel) > 1) moves.push({ phrase: `${after.id} fuel`, size: Math.abs(fuel) });
    if (after.kind === 'turbine') {
      const power = delta('power_kW');
      if (Math.abs(power) > 1) moves.push({ phrase: `${after.id} power ${power * flow < 0 ? 'given up' : 'gained'}`, size: Math.abs(power) * 3 });
    }
    if (after.kind === 'grid') {
      const bought = delta('import_kW') - delta('export_kW');
      if (Math.abs(bought) > 1) moves.push({ phrase: bought * flow > 0 ? 'power bought' : 'power sold', size: Math.abs(bought) * 3 });
    }
    if (after.kind === 'deaerator') {
      const vent = delta('excess_vent_kg_s');
      if (Math.abs(vent) > 1e-3) moves.push({ phrase: 'deaerator excess vent', size: Math.abs(vent) * 2500 });
    }
    if (after.kind === 'header') {
      const vent = delta('vent_kg_s');
      if (Math.abs(vent) > 1e-3) moves.push({ phrase: `${after.id} vent`, size: Math.abs(vent) * 2500 });
    }
    if (after.kind === 'steamImport') {
      const steam = delta('steam_kg_s');
      if (Math.abs(steam) > 1e-3) moves.push({ phrase: `${after.id} steam bought`, size: Math.abs(steam) * 2500 });
    }
  }
  moves.sort((a, b) => b.size - a.size);
  return moves.slice(0, 3).map((move) => move.phrase);
}
