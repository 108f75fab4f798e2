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
import type { SolverBackend } from '../lp/index.js';
import { buildPass, ENERGY_ROW_SCALE, energyRowName, massRowName } from './buildPass.js';
import type { UnitReport } from './contribution.js';
import type { Converged, LoopSettings } from './converge.js';
import { passSolution } from './passSolution.js';

/** The probe's draw, kg/s (3.6 kg/h): small beside any header, so that a switch it sees is at the operating point, and large beside solver round-off (1e-9 of the objective). */
export const PROBE_FLOW = 0.001;

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
  const values: MarginalValue[] = [];
  for (const header of plant.headers) {
    const massPrice = solution.shadowPrice(massRowName(header.id));
    const energyPrice = pass.context.model.hasRow(energyRowName(header.id)) ? solution.shadowPrice(energyRowName(header.id)) : 0;
    const dual = massPrice === null || energyPrice === null ? null : massPrice + pass.context.h(header.id) * ENERGY_ROW_SCALE * energyPrice;
    const solveProbe = async (flow: number, fixed: ReadonlyMap<string, number>) => {
      const probePass = buildPass(plant, contributions, probePoint, objective, { fixedIntegers: fixed, extraDemand: new Map([[header.id, flow]]) });
      // A MIP's gap would swamp a difference this small: where a load segment must change, solve it to optimality.
      return backend.solve(probePass.context.model, { ...settings.solveOptions, mipDuals: false, mipRelativeGap: 1e-12 });
    };
    const probe = async (flow: number): Promise<{ value: number | null; setBy: string[] }> => {
      // Every integer held first (a linear program); only where that cannot take the draw, the load segments of non-convex curves follow.
      let result = await solveProbe(flow, converged.integers);
      if (result.status !== 'optimal' && onOff.size < converged.integers.size) result = await solveProbe(flow, onOff);
      if (result.status !== 'optimal' || result.objective === null) return { value: null, setBy: [] };
      const probeSolution = passSolution(result);
      const changed = contributions.map((unit) => unit.report(probeSolution));
      return { value: (result.objective - baseObjective) / flow, setBy: causes(base, changed, flow) };
    };
    const more = await probe(PROBE_FLOW);
    const less = await probe(-PROBE_FLOW);
    values.push({ header: header.id, dual, more: more.value, less: less.value, moreSetBy: more.setBy, lessSetBy: less.setBy });
  }
  return values;
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
