// The reconciliation as text and CSV: every reading with its reconciled value,
// uncertainty, adjustment and test statistic; the tests; the suspect meters;
// the streams with their estimates. No computation here beyond formatting.
import type { MeterResult, ReconcileOutcome } from '../reconcile/index.js';
import { formatQuantity, type UnitSystem } from '../units/index.js';
import { formatNumber } from '../units/format.js';
import { PSI_KPA } from '../units/exactFactors.js';
import { csvCell } from './safeCells.js';
import type { ReportTable } from './reportTables.js';
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

/** A reading in the case's units: a flow, a thermometer's temperature, a power meter's power or a fuel meter's fuel rate. */
function reading(value: number, quantity: MeterResult['quantity'], system: UnitSystem): string {
  if (quantity === 'pressure') return formatQuantity(value, 'pressure', system, { digits: 4, unit: system === 'us' ? 'psia' : 'bara' });
  if (quantity === 'fuel') return fuelRate(value, system);
  if (quantity === 'power') return power(value, system);
  return quantity === 'flow' ? flow(value, system) : formatQuantity(value, 'temperature', system, { digits: 4 });
}

/** An adjustment or interval: a flow, a temperature difference, a power or a fuel rate. */
function difference(value: number, quantity: MeterResult['quantity'], system: UnitSystem): string {
  if (quantity === 'pressure') return pressureDifference(value, system);
  if (quantity === 'fuel') return fuelRate(value, system);
  if (quantity === 'power') return power(value, system);
  return quantity === 'flow' ? flow(value, system) : formatQuantity(Math.abs(value) < 1e-9 ? 0 : value, 'temperatureDifference', system, { digits: 3 });
}

/** A difference of pressures (MPa in): bar, or psi in US units (neither gauge nor absolute). */
function pressureDifference(value: number, system: UnitSystem): string {
  const shown = Math.abs(value) < 1e-12 ? 0 : system === 'us' ? (value * 1000) / PSI_KPA : value * 10;
  return `${formatNumber(shown, 4)} ${system === 'us' ? 'psi' : 'bar'}`;
}

/** Fuel as energy per hour, as fuel is bought: GJ/h, or MMBtu/h in US units. */
function fuelRate(value: number, system: UnitSystem): string {
  return formatQuantity(Math.abs(value) < 1e-6 ? 0 : value, 'power', system, { digits: 4, unit: system === 'us' ? 'MMBtu/h' : 'GJ/h' });
}

function power(value: number, system: UnitSystem): string {
  // Round-off below a milliwatt is shown as zero.
  return formatQuantity(Math.abs(value) < 1e-6 ? 0 : value, 'power', system, { digits: 4 });
}

const AT_BOUND_NOTE = '* held at zero: flows are zero or more, so the fit is bounded there; the tests and intervals are the unbounded fit\'s.';

function anyAtBound(outcome: ReconcileOutcome): boolean {
  return outcome.meters.some((meter) => meter.atBound) || outcome.streams.some((stream) => stream.atBound);
}

function statistic(value: number | null): string {
  return value === null ? 'not checkable' : value.toFixed(2);
}

/** The opening lines: the method and the three tests. */
export function reconcileHeadline(outcome: ReconcileOutcome): string[] {
  const g = outcome.global;
  return [
    `Method: ${outcome.method}.`,
    `Global test: chi-square ${g.statistic.toFixed(2)} on ${g.dof} degree${g.dof === 1 ? '' : 's'} of freedom, critical ${g.critical.toFixed(2)} at ${(outcome.level * 100).toFixed(3).replace(/\.?0+$/, '')} %: ${g.dof === 0 ? 'nothing to test (no redundancy)' : g.passed ? 'passed' : `rejected (p = ${g.pValue.toPrecision(2)})`}.`,
    `Measurement test: critical value ${outcome.measurementCritical.toFixed(2)} (Sidak-corrected for ${outcome.meters.filter((meter) => meter.redundant).length} redundant readings).`,
    `VDI 2048 quality criteria: global ${outcome.vdi2048.globalPassed ? 'met' : 'not met'}; readings beyond ${outcome.vdi2048.critical.toFixed(2)} standard deviations: ${outcome.vdi2048.flagged.length === 0 ? 'none' : outcome.vdi2048.flagged.join(', ')}.`,
  ];
}

/** The readings, the suspect meters (when any) and the streams, as tables shared by the text and the HTML report. */
export function reconcileTables(outcome: ReconcileOutcome, system: UnitSystem): ReportTable[] {
  const tables: ReportTable[] = [];
  tables.push({
    id: 'readings',
    title: 'Readings (all meters in the fit):',
    headings: ['meter', 'measured', 'reconciled', '95 % interval', 'adjustment', 'statistic', 'finding'],
    rows: outcome.meters.map((meter) => [
      meter.tag,
      reading(meter.measured, meter.quantity, system),
      `${reading(meter.reconciled, meter.quantity, system)}${meter.atBound ? ' *' : ''}`,
      `±${difference(meter.reconciledSigma * 1.96, meter.quantity, system)}`,
      difference(meter.adjustment, meter.quantity, system),
      statistic(meter.statistic),
      meter.suspectRank !== null ? `suspect ${meter.suspectRank}` : meter.flagged ? 'flagged' : meter.redundant ? 'ok' : 'not redundant',
    ]),
  });
  if (outcome.suspects.length > 0) {
    tables.push({
      id: 'suspects',
      title: 'Suspect meters, in the order serial elimination set them aside:',
      headings: ['#', 'meter', 'statistic', 'estimated bias', '95 % interval', 'global test after'],
      rows: outcome.suspects.map((suspect, index) => {
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
    });
  }
  tables.push({
    id: 'streams',
    title: outcome.suspects.length === 0 ? 'Streams:' : 'Streams (suspect meters set aside):',
    headings: ['stream', 'meter', 'estimate', '95 % interval'],
    rows: outcome.streams.map((stream) => [stream.id, stream.meter ?? '-', stream.heatOnly ? 'heat only, no flow' : stream.observable ? `${flow(stream.value, system)}${stream.atBound ? ' *' : ''}` : 'not observable', stream.observable && stream.sigma !== null ? `±${flow(stream.sigma * 1.96, system)}` : '-']),
  });
  return tables;
}

/** What the tables leave to words: meters that cannot be told apart, those not checked, those unread, notes. */
export function reconcileRemarks(outcome: ReconcileOutcome): string[] {
  const remarks: string[] = [];
  if (anyAtBound(outcome)) remarks.push(AT_BOUND_NOTE);
  for (const suspect of outcome.suspects) {
    if (suspect.equivalent.length > 0) remarks.push(`${suspect.tag} cannot be told apart from ${suspect.equivalent.join(', ')} by the balances: the bias may be in any of them (add a meter that separates them).`);
  }
  const notRedundant = outcome.meters.filter((meter) => !meter.redundant).map((meter) => meter.tag);
  if (notRedundant.length > 0) remarks.push(`Not redundant, so not checked by any balance: ${notRedundant.join(', ')}.`);
  if (outcome.unread.length > 0) remarks.push(`Meters with no reading (left out): ${outcome.unread.join(', ')}.`);
  return remarks;
}

export function reconcileText(outcome: ReconcileOutcome, system: UnitSystem, title: string): string {
  const lines: string[] = [];
  const [method, ...tests] = reconcileHeadline(outcome);
  lines.push(`Reconciliation of ${title}`, method, '', ...tests, '');
  const [readings, ...rest] = reconcileTables(outcome, system);
  lines.push(readings.title, table(readings.headings, readings.rows));
  if (anyAtBound(outcome)) lines.push(`  ${AT_BOUND_NOTE}`);
  lines.push('');
  const suspects = rest.find((entry) => entry.id === 'suspects');
  if (!suspects) {
    lines.push(outcome.global.passed ? 'Suspect meters: none (the global test passes).' : 'Suspect meters: none could be named.');
  } else {
    lines.push(suspects.title, table(suspects.headings, suspects.rows));
    for (const suspect of outcome.suspects) {
      if (suspect.equivalent.length > 0) lines.push(`  ${suspect.tag} cannot be told apart from ${suspect.equivalent.join(', ')} by the balances: the bias may be in any of them (add a meter that separates them).`);
    }
  }
  const streams = rest.find((entry) => entry.id === 'streams')!;
  lines.push('', streams.title, table(streams.headings, streams.rows));
  const notRedundant = outcome.meters.filter((meter) => !meter.redundant).map((meter) => meter.tag);
  if (notRedundant.length > 0) lines.push('', `Not redundant, so not checked by any balance: ${notRedundant.join(', ')}.`);
  if (outcome.unread.length > 0) lines.push('', `Meters with no reading (left out): ${outcome.unread.join(', ')}.`);
  if (outcome.notes.length > 0) lines.push('', 'Notes:', ...outcome.notes.map((note) => `- ${note}`));
  lines.push('', RECONCILE_CAUTION, '');
  return lines.join('\n');
}

/** The HTML report's reconciliation section (`report --readings`): the tests, the diagram of reconciled flows when given, the tables. */
export function reconcileSectionHtml(outcome: ReconcileOutcome, system: UnitSystem, readingsFile: string, tableHtml: (table: ReportTable, prefix?: string) => string, escape: (text: string) => string, diagram?: string): string {
  return [
    '<section id="reconciliation"><h2>Meter reconciliation</h2>',
    `<p>Readings from ${escape(readingsFile)}.</p>`,
    ...reconcileHeadline(outcome).map((line) => `<p>${escape(line)}</p>`),
    ...(diagram ? [diagram] : []),
    ...reconcileTables(outcome, system).map((entry) => tableHtml(entry, 'reconcile')),
    ...reconcileRemarks(outcome).map((line) => `<p>${escape(line)}</p>`),
    ...(outcome.notes.length > 0 ? ['<ul>', ...outcome.notes.map((note) => `<li>${escape(note)}</li>`), '</ul>'] : []),
    `<p class="caution">${escape(RECONCILE_CAUTION.replace(/\n/g, ' '))}</p>`,
    '</section>',
  ].join('\n');
}

/** One row per reading, then one per stream, in SI (kg/s; a thermometer's row, `quantity` temperature, in K; a pressure gauge's in MPa abs; a power or fuel meter's, `quantity` power or fuel, in kW), for spreadsheets. */
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
