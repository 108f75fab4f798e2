// The reconciliation as text and CSV: every reading with its reconciled value,
// uncertainty, adjustment and test statistic; the tests; the suspect meters;
// the streams with their estimates. No computation here beyond formatting.
import type { ReconcileOutcome } from '../reconcile/index.js';
import { formatQuantity, type UnitSystem } from '../units/index.js';
import { csvCell } from './safeCells.js';
import { table } from './table.js';

export const RECONCILE_CAUTION = [
  'Reconciled values are estimates from meters, only as good as the meters and the case. A meter named',
  'suspect is a statistical finding, not proof: check it on site before it is trusted or replaced. Work',
  'on live steam and condensate lines (meter removal, isolation, blowdown) carries burn, pressure and',
  'water-hammer hazards; follow the site permit system, local codes and licensed engineers.',
].join('\n');

function flow(value: number | null, system: UnitSystem): string {
  // Round-off below a microgram a second is shown as zero.
  return value === null ? '-' : formatQuantity(Math.abs(value) < 1e-9 ? 0 : value, 'massFlow', system, { digits: 4 });
}

/** A reading in the case's units: a flow, or a thermometer's temperature. */
function reading(value: number, quantity: 'flow' | 'temperature', system: UnitSystem): string {
  return quantity === 'flow' ? flow(value, system) : formatQuantity(value, 'temperature', system, { digits: 4 });
}

/** An adjustment or interval: a flow, or a temperature difference. */
function difference(value: number, quantity: 'flow' | 'temperature', system: UnitSystem): string {
  return quantity === 'flow' ? flow(value, system) : formatQuantity(Math.abs(value) < 1e-9 ? 0 : value, 'temperatureDifference', system, { digits: 3 });
}

function statistic(value: number | null): string {
  return value === null ? 'not checkable' : value.toFixed(2);
}

export function reconcileText(outcome: ReconcileOutcome, system: UnitSystem, title: string): string {
  const lines: string[] = [];
  lines.push(`Reconciliation of ${title}`);
  lines.push(`Method: ${outcome.method}.`);
  lines.push('');
  const g = outcome.global;
  lines.push(`Global test: chi-square ${g.statistic.toFixed(2)} on ${g.dof} degree${g.dof === 1 ? '' : 's'} of freedom, critical ${g.critical.toFixed(2)} at ${(outcome.level * 100).toFixed(3).replace(/\.?0+$/, '')} %: ${g.dof === 0 ? 'nothing to test (no redundancy)' : g.passed ? 'passed' : `rejected (p = ${g.pValue.toPrecision(2)})`}.`);
  lines.push(`Measurement test: critical value ${outcome.measurementCritical.toFixed(2)} (Sidak-corrected for ${outcome.meters.filter((meter) => meter.redundant).length} redundant readings).`);
  lines.push(`VDI 2048 quality criteria: global ${outcome.vdi2048.globalPassed ? 'met' : 'not met'}; readings beyond ${outcome.vdi2048.critical.toFixed(2)} standard deviations: ${outcome.vdi2048.flagged.length === 0 ? 'none' : outcome.vdi2048.flagged.join(', ')}.`);
  lines.push('');
  lines.push('Readings (all meters in the fit):');
  const rows = outcome.meters.map((meter) => [
    meter.tag,
    reading(meter.measured, meter.quantity, system),
    `${reading(meter.reconciled, meter.quantity, system)}${meter.atBound ? ' *' : ''}`,
    `±${difference(meter.reconciledSigma * 1.96, meter.quantity, system)}`,
    difference(meter.adjustment, meter.quantity, system),
    statistic(meter.statistic),
    meter.suspectRank !== null ? `suspect ${meter.suspectRank}` : meter.flagged ? 'flagged' : meter.redundant ? 'ok' : 'not redundant',
  ]);
  lines.push(table(['meter', 'measured', 'reconciled', '95 % interval', 'adjustment', 'statistic', 'finding'], rows));
  if (outcome.meters.some((meter) => meter.atBound) || outcome.streams.some((stream) => stream.atBound)) {
    lines.push('  * held at zero: flows are zero or more, so the fit is bounded there; the tests and intervals are the unbounded fit\'s.');
  }
  lines.push('');
  if (outcome.suspects.length === 0) {
    lines.push(g.passed ? 'Suspect meters: none (the global test passes).' : 'Suspect meters: none could be named.');
  } else {
    lines.push('Suspect meters, in the order serial elimination set them aside:');
    lines.push(
      table(
        ['#', 'meter', 'statistic', 'estimated bias', '95 % interval', 'global test after'],
        outcome.suspects.map((suspect, index) => {
          const quantity = outcome.meters.find((meter) => meter.tag === suspect.tag)?.quantity ?? 'flow';
          return [
            String(index + 1),
            suspect.tag,
            suspect.statistic.toFixed(2),
            difference(suspect.bias, quantity, system),
            `±${difference(suspect.biasSigma * 1.96, quantity, system)}`,
            suspect.globalAfter.dof === 0 ? 'nothing left to test' : `${suspect.globalAfter.statistic.toFixed(2)} of ${suspect.globalAfter.critical.toFixed(2)}: ${suspect.globalAfter.passed ? 'passed' : 'rejected'}`,
          ];
        }),
      ),
    );
    for (const suspect of outcome.suspects) {
      if (suspect.equivalent.length > 0) lines.push(`  ${suspect.tag} cannot be told apart from ${suspect.equivalent.join(', ')} by the balances: the bias may be in any of them (add a meter that separates them).`);
    }
  }
  lines.push('');
  lines.push(outcome.suspects.length === 0 ? 'Streams:' : 'Streams (suspect meters set aside):');
  lines.push(
    table(
      ['stream', 'meter', 'estimate', '95 % interval'],
      outcome.streams.map((stream) => [stream.id, stream.meter ?? '-', stream.observable ? `${flow(stream.value, system)}${stream.atBound ? ' *' : ''}` : 'not observable', stream.observable && stream.sigma !== null ? `±${flow(stream.sigma * 1.96, system)}` : '-']),
    ),
  );
  const notRedundant = outcome.meters.filter((meter) => !meter.redundant).map((meter) => meter.tag);
  if (notRedundant.length > 0) lines.push('', `Not redundant, so not checked by any balance: ${notRedundant.join(', ')}.`);
  if (outcome.unread.length > 0) lines.push('', `Meters with no reading (left out): ${outcome.unread.join(', ')}.`);
  if (outcome.notes.length > 0) lines.push('', 'Notes:', ...outcome.notes.map((note) => `- ${note}`));
  lines.push('', RECONCILE_CAUTION, '');
  return lines.join('\n');
}

/** One row per reading, then one per stream, in SI (kg/s; a thermometer's row, `quantity` temperature, in K), for spreadsheets. */
export function reconcileCsv(outcome: ReconcileOutcome): string {
  const lines: string[] = [];
  lines.push(['table', 'tag', 'stream', 'measured_kg_s', 'sigma_kg_s', 'reconciled_kg_s', 'reconciled_sigma_kg_s', 'adjustment_kg_s', 'adjustment_sigma_kg_s', 'redundant', 'statistic', 'flagged', 'suspect_rank', 'bias_kg_s', 'bias_sigma_kg_s', 'equivalent', 'unbounded_kg_s', 'at_bound', 'quantity'].join(','));
  for (const meter of outcome.meters) {
    const suspect = outcome.suspects.find((entry) => entry.tag === meter.tag);
    lines.push(
      ['reading', meter.tag, meter.stream, meter.measured, meter.sigma, meter.reconciled, meter.reconciledSigma, meter.adjustment, meter.adjustmentSigma, meter.redundant, meter.statistic ?? '', meter.flagged, meter.suspectRank ?? '', suspect?.bias ?? '', suspect?.biasSigma ?? '', suspect?.equivalent.join(' ') ?? '', meter.unbounded, meter.atBound, meter.quantity]
        .map((cell) => csvCell(String(cell)))
        .join(','),
    );
  }
  lines.push('');
  lines.push(['table', 'stream', 'from', 'to', 'kind', 'meter', 'estimate_kg_s', 'sigma_kg_s', 'observable', 'unbounded_kg_s', 'at_bound'].join(','));
  for (const stream of outcome.streams) {
    lines.push(['stream', stream.id, stream.from, stream.to, stream.kind, stream.meter ?? '', stream.value ?? '', stream.sigma ?? '', stream.observable, stream.unbounded ?? '', stream.atBound].map((cell) => csvCell(String(cell))).join(','));
  }
  lines.push('');
  return lines.join('\r\n');
}
