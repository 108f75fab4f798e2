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
