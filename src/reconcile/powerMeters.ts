// Power meters on turbines. A turbine's power is a linear function of its
// steam (StreamNetwork.power: each section's drop at the design point's
// states times its efficiencies, or its Willans line), so a power reading is
// one more reading in the reconciliation: a variable for the power and a row
// tying it to the turbine's outflows. A generator's meter is usually the best
// on site, and it checks the steam meters around the turbine.
import type { Issue, Meter } from '../model/index.js';
import type { StreamNetwork } from '../plant/index.js';
import type { BalanceRow } from './linearReconciliation.js';

export interface PowerMeter {
  meter: Meter;
  /** the turbine it reads */
  turbine: string;
  /** power, kW = sum of coefficient x flow of stream (index) + constant */
  terms: ReadonlyMap<number, number>;
  constant: number;
}

/** Each power meter's turbine and relation, or a located issue for a meter that names no turbine or shares one. */
export function powerMeters(meters: readonly Meter[], network: StreamNetwork): { metered: PowerMeter[]; issues: Issue[] } {
  const metered: PowerMeter[] = [];
  const issues: Issue[] = [];
  const byTurbine = new Map<string, Meter>();
  const turbines = [...network.power.keys()];
  for (const meter of meters) {
    if (meter.measures !== 'power') continue;
    const relation = network.power.get(meter.unit);
    if (!relation) {
      const expected = turbines.length > 0 ? `expected a turbine: ${turbines.map((id) => `"${id}"`).join(', ')}` : 'the case has no turbine';
      issues.push(meter.issueAt('unit', 'meter-no-turbine', `power meter ${meter.tag} names "${meter.unit}", which is not a turbine; ${expected}`));
      continue;
    }
    if (meter.to !== null) {
      issues.push(meter.issueAt('to', 'meter-power-to', `power meter ${meter.tag}: "to" picks a stream, and a power meter reads the turbine ${meter.unit} itself; leave "to" out`));
      continue;
    }
    const other = byTurbine.get(meter.unit);
    if (other) {
      issues.push(meter.issueAt('unit', 'meter-same-turbine', `power meters ${other.tag} and ${meter.tag} both read turbine ${meter.unit}; keep one, or combine their readings`));
      continue;
    }
    byTurbine.set(meter.unit, meter);
    metered.push({ meter, turbine: meter.unit, terms: relation.terms, constant: relation.constant });
  }
  return { metered, issues };
}

/**
 * Power variables and their readings are in MW inside the reconciliation, so
 * that their rows sit near the mass rows' scale (kg/s), as the energy rows do.
 */
export const POWER_SCALE = 1e-3;

/** The row power - sum(coefficient x flow) - constant = 0, in MW, with the power the variable `variable`. */
export function powerRow(power: PowerMeter, variable: number): BalanceRow {
  const terms = new Map<number, number>([[variable, 1]]);
  for (const [stream, coefficient] of power.terms) terms.set(stream, -coefficient * POWER_SCALE);
  return { name: `${power.turbine}.power`, terms, constant: -power.constant * POWER_SCALE };
}

/**
 * A fuel meter on a fired boiler. The boiler's fuel is its steam times the
 * heat each kg takes, over the efficiency the case's table gives at that load
 * (StreamNetwork.fuel): not linear in the steam, so the row is its tangent at
 * a steam flow, and reconcilePlant moves that flow to the estimate until it
 * stays (successive linearisation, as for the energy balances).
 */
export interface FuelMeter {
  meter: Meter;
  /** the boiler it reads */
  boiler: string;
  /** index of the boiler's steam stream */
  steam: number;
  /** fuel, kW, for a steam flow, kg/s */
  fuel: (steam: number) => number;
}

/** Each fuel meter's boiler and curve, or a located issue for a meter that names no fired boiler or shares one. */
export function fuelMeters(meters: readonly Meter[], network: StreamNetwork): { metered: FuelMeter[]; issues: Issue[] } {
  const metered: FuelMeter[] = [];
  const issues: Issue[] = [];
  const byBoiler = new Map<string, Meter>();
  const boilers = [...network.fuel.keys()];
  for (const meter of meters) {
    if (meter.measures !== 'fuel') continue;
    const curve = network.fuel.get(meter.unit);
    if (!curve) {
      const expected = boilers.length > 0 ? `expected a fired boiler: ${boilers.map((id) => `"${id}"`).join(', ')}` : 'the case has no fired boiler';
      issues.push(meter.issueAt('unit', 'meter-no-boiler', `fuel meter ${meter.tag} names "${meter.unit}", which is not a fired boiler; ${expected}`));
      continue;
    }
    if (meter.to !== null) {
      issues.push(meter.issueAt('to', 'meter-fuel-to', `fuel meter ${meter.tag}: "to" picks a stream, and a fuel meter reads the boiler ${meter.unit} itself; leave "to" out`));
      continue;
    }
    const other = byBoiler.get(meter.unit);
    if (other) {
      issues.push(meter.issueAt('unit', 'meter-same-boiler', `fuel meters ${other.tag} and ${meter.tag} both read boiler ${meter.unit}; keep one, or combine their readings`));
      continue;
    }
    byBoiler.set(meter.unit, meter);
    metered.push({ meter, boiler: meter.unit, steam: curve.steam, fuel: curve.fuel });
  }
  return { metered, issues };
}

/** The fuel's tangent at a steam flow, in MW: fuel - F'(s0) steam - (F(s0) - F'(s0) s0) = 0, the fuel the variable `variable`. */
export function fuelRow(meter: FuelMeter, variable: number, at: number): BalanceRow {
  const step = Math.max(1e-6, 1e-6 * Math.abs(at));
  const slope = (meter.fuel(at + step) - meter.fuel(at - step)) / (2 * step);
  const terms = new Map<number, number>([
    [variable, 1],
    [meter.steam, -slope * POWER_SCALE],
  ]);
  return { name: `${meter.boiler}.fuel`, terms, constant: -(meter.fuel(at) - slope * at) * POWER_SCALE };
}

/** The steam flow whose fuel is `fuel` by the curve (bisection from no steam to four times `upper`), to start the iteration. */
export function steamForFuel(meter: FuelMeter, fuel: number, upper: number): number {
  let low = 0;
  let high = 4 * upper;
  if (!(meter.fuel(high) > fuel)) return high;
  for (let i = 0; i < 100; i++) {
    const middle = (low + high) / 2;
    if (meter.fuel(middle) < fuel) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}
