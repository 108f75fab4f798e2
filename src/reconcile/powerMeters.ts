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
  const { found, issues } = metersOnUnits(meters, 'power', network.power, { meter: 'power meter', unit: 'turbine', expected: 'a turbine' });
  return { metered: found.map(({ meter, value }) => ({ meter, turbine: meter.unit, terms: value.terms, constant: value.constant })), issues };
}

/** How the meters of one kind that read a unit itself are named in messages. */
interface UnitMeterWords {
  /** "power meter" */
  meter: string;
  /** "turbine" */
  unit: string;
  /** "a turbine" */
  expected: string;
  /** what the case lacks when it has none, where not `unit`: "fired boiler" */
  none?: string;
}

/**
 * The meters of one kind that read a unit itself rather than a stream (a
 * turbine's power, a boiler's fuel, a header's pressure): each with what
 * `known` holds for its unit, or a located issue for a meter whose unit is
 * not one of them, one with "to", or a second on the same unit.
 */
export function metersOnUnits<T>(meters: readonly Meter[], measures: Meter['measures'], known: ReadonlyMap<string, T>, words: UnitMeterWords): { found: { meter: Meter; value: T }[]; issues: Issue[] } {
  const found: { meter: Meter; value: T }[] = [];
  const issues: Issue[] = [];
  const byUnit = new Map<string, Meter>();
  const code = words.unit.replace(/\s+/g, '-');
  for (const meter of meters) {
    if (meter.measures !== measures) continue;
    const value = known.get(meter.unit);
    if (value === undefined) {
      const ids = [...known.keys()];
      const expected = ids.length > 0 ? `expected ${words.expected}: ${ids.map((id) => `"${id}"`).join(', ')}` : `the case has no ${words.none ?? words.unit}`;
      issues.push(meter.issueAt('unit', `meter-no-${code}`, `${words.meter} ${meter.tag} names "${meter.unit}", which is not ${words.expected}; ${expected}`));
      continue;
    }
    if (meter.to !== null) {
      issues.push(meter.issueAt('to', `meter-${code}-to`, `${words.meter} ${meter.tag}: "to" picks a stream, and a ${words.meter} reads the ${words.unit} ${meter.unit} itself; leave "to" out`));
      continue;
    }
    const other = byUnit.get(meter.unit);
    if (other) {
      issues.push(meter.issueAt('unit', `meter-same-${code}`, `${words.meter}s ${other.tag} and ${meter.tag} both read ${words.unit} ${meter.unit}; keep one, or combine their readings`));
      continue;
    }
    byUnit.set(meter.unit, meter);
    found.push({ meter, value });
  }
  return { found, issues };
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
  const { found, issues } = metersOnUnits(meters, 'fuel', network.fuel, { meter: 'fuel meter', unit: 'boiler', expected: 'a fired boiler', none: 'fired boiler' });
  return { metered: found.map(({ meter, value }) => ({ meter, boiler: meter.unit, steam: value.steam, fuel: value.fuel })), issues };
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
