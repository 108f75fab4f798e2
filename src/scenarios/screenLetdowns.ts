// Letdown-to-power screening: for every letdown carrying flow, what a
// back-pressure turbine beside it would make, and what the plant saves with
// it: the scenario solved again with the turbine added, never a product of
// duals. The first-order figures (power at the marginal power value, the
// energy taken out priced as downstream steam) are shown beside it to explain
// it. The table planners use to see where a turbine pays.
import { getBackend, type BackendName } from '../lp/index.js';
import type { Objective, Plant, Turbine } from '../model/index.js';
import { expandIsentropic, plantResult, solvePlant, type PlantResult } from '../plant/index.js';
import { statePH } from '../properties/index.js';

/**
 * 65 % isentropic: a small single-stage back-pressure set, common practice,
 * no single source. 95 % gearbox and generator together: common practice, no
 * single source. Both can be overridden.
 */
export const SCREEN_DEFAULTS = { isentropicEfficiency: 0.65, generatorEfficiency: 0.95 } as const;

const T_PER_H_PER_KG_S = 3.6;

export interface ScreenOptions {
  isentropicEfficiency?: number;
  generatorEfficiency?: number;
  objective?: Objective;
  backend?: BackendName;
}

export interface LetdownScreenRow {
  scenario: string;
  hours: number;
  letdown: string;
  from: string;
  to: string;
  steam_kg_s: number;
  inlet_h_kJ_kg: number;
  /** turbine exhaust enthalpy at the downstream pressure */
  exhaust_h_kJ_kg: number;
  /** exhaust quality when wet, else null */
  exhaust_quality: number | null;
  /** enthalpy of what the letdown now delivers (after any desuperheater) */
  letdown_outlet_h_kJ_kg: number;
  /** electric power the turbine would make, kW */
  power_kW: number;
  /** value of one more kWh: the site power balance's marginal value, or the import price */
  power_value_per_kWh: number;
  power_value_per_year: number;
  /** exhaust less letdown outlet enthalpy at the downstream header, kJ/kg */
  downstream_h_change_kJ_kg: number;
  /** header-steam equivalent the downstream header loses (the energy taken out as power), t/h */
  steam_equivalent_lost_t_per_h: number;
  downstream_marginal_value_per_t: number | null;
  /** first order: power value less the lost steam at its marginal value, per hour; null without marginal values */
  first_order_net_per_h: number | null;
  /** the scenario's cost less its cost with the turbine added (each solved), per hour; null when the variant could not be solved */
  solved_saving_per_h: number | null;
  /** the solved saving over the scenario's hours; null when it could not be solved */
  net_benefit_per_year: number | null;
  /** why the variant could not be solved, where it could not */
  note: string | null;
}

/**
 * The turbine takes the letdown's steam at its inlet state and exhausts at the
 * downstream header's pressure. The energy it turns into shaft work is lost to
 * the downstream header; valued as header steam made from feedwater, that is
 * m (h_in - h_exhaust) / (h_header - h_feedwater) tonnes of steam, priced at
 * the header's marginal value. Marginal values hold for small changes; a large
 * turbine moves them, and a solve with the turbine added (a project) is the
 * true figure.
 */
export async function screenLetdowns(scenario: string, hours: number, plant: Plant, result: PlantResult, options: ScreenOptions = {}): Promise<LetdownScreenRow[]> {
  const efficiency = options.isentropicEfficiency ?? SCREEN_DEFAULTS.isentropicEfficiency;
  const generator = options.generatorEfficiency ?? SCREEN_DEFAULTS.generatorEfficiency;
  const rows: LetdownScreenRow[] = [];
  const powerValue = result.marginal_power_value_per_kWh ?? plant.power.import?.price ?? 0;
  for (const letdown of plant.letdowns) {
    const report = result.units.find((unit) => unit.id === letdown.id);
    const steam = Number(report?.values.steam_kg_s ?? 0);
    if (!(steam > 1e-6)) continue;
    const inletH = Number(report!.values.inlet_h_kJ_kg);
    const outletH = Number(report!.values.outlet_h_kJ_kg);
    const from = result.headers.find((header) => header.id === letdown.from)!;
    const to = result.headers.find((header) => header.id === letdown.to)!;
    const expansion = expandIsentropic(statePH(from.pressure_MPa, inletH), to.pressure_MPa, efficiency);
    const power = steam * expansion.enthalpyDrop * generator;
    const feedwaterH = plant.deaerator.feedwaterH;
    const lost = (steam * expansion.enthalpyDrop) / (to.h_kJ_kg - feedwaterH) * T_PER_H_PER_KG_S;
    const value = to.marginal_value_per_t;
    const firstOrder = value === null ? null : power * powerValue - lost * value;
    const solved = await solveWithTurbine(plant, result, letdown.id, letdown.from, letdown.to, to.pressure_MPa, steam, efficiency, generator, options);
    rows.push({
      scenario,
      hours,
      letdown: letdown.id,
      from: letdown.from,
      to: letdown.to,
      steam_kg_s: steam,
      inlet_h_kJ_kg: inletH,
      exhaust_h_kJ_kg: expansion.exhaust.h,
      exhaust_quality: expansion.exhaust.x !== null && expansion.exhaust.x < 1 ? expansion.exhaust.x : null,
      letdown_outlet_h_kJ_kg: outletH,
      power_kW: power,
      power_value_per_kWh: powerValue,
      power_value_per_year: power * powerValue * hours,
      downstream_h_change_kJ_kg: expansion.exhaust.h - outletH,
      steam_equivalent_lost_t_per_h: lost,
      downstream_marginal_value_per_t: value,
      first_order_net_per_h: firstOrder,
      solved_saving_per_h: solved.saving,
      net_benefit_per_year: solved.saving === null ? null : solved.saving * hours,
      note: solved.note,
    });
  }
  return rows;
}

/**
 * The scenario solved again with a back-pressure turbine generator beside the
 * letdown, sized for the flow it carries (the turbine may run anywhere from
 * stopped to that flow, so it never costs more than the plant without it),
 * trying the scenario's own on/off decisions too.
 */
async function solveWithTurbine(plant: Plant, result: PlantResult, letdown: string, from: string, to: string, toPressure: number, flow: number, efficiency: number, generator: number, options: ScreenOptions): Promise<{ saving: number | null; note: string | null }> {
  const turbine: Turbine = {
    id: `screen_${letdown}`,
    kind: 'turbine',
    inlet: from,
    stages: [{ exhaust: { kind: 'header', id: to, pressure: toPressure }, performance: { kind: 'isentropic', efficiency }, outflow: { min: 0, max: Infinity }, sectionFlow: { min: 0, max: flow } }],
    inletFlow: { min: 0, max: flow },
    mechanicalEfficiency: 1,
    generatorEfficiency: generator,
    power: { min: 0, max: Infinity },
    canSwitchOff: false,
    drives: { kind: 'generator' },
  };
  const variant: Plant = { ...plant, turbines: [...plant.turbines, turbine] };
  const outcome = await solvePlant(variant, { objective: options.objective, backend: getBackend(options.backend ?? 'highs'), commitment: new Map(Object.entries(result.commitment)), probeMarginalValues: false });
  if (!outcome.ok) return { saving: null, note: outcome.message };
  // In money, whatever the objective: what a planner banks.
  return { saving: result.totals.cost_per_h - plantResult(outcome).totals.cost_per_h, note: null };
}
