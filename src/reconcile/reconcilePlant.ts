// Meter readings fitted to the plant's mass balances: the plant's streams as a
// network, the meters on them, weighted least squares, the tests and serial
// elimination, as plain data for the report.
import type { Meter, Plant } from '../model/index.js';
import { streamNetwork, type StreamNetwork } from '../plant/index.js';
import { reconcileBounded } from './boundedReconciliation.js';
import type { BalanceRow, LinearProblem, LinearResult, Reading } from './linearReconciliation.js';
import type { MeteredStream } from './meterStreams.js';
import type { AveragedReading } from './readings.js';
import { testReconciliation, type GlobalTest } from './serialElimination.js';
import { coverageFactor } from './statistics.js';

export const METHOD = 'constrained weighted least squares (Kuehn and Davidson 1961) by projection of the unmeasured flows (Crowe et al. 1983); global chi-square test; measurement test with Sidak-corrected critical value (Mah and Tamhane 1982); serial elimination (Serth and Heenan 1986); VDI 2048 Part 1 quality criteria; reported flows bounded at zero (active-set quadratic programme), tests on the unbounded fit';

export interface MeterResult {
  tag: string;
  name: string;
  stream: string;
  /** averaged reading, kg/s */
  measured: number;
  /** standard deviation of the reading, kg/s (stated uncertainty over its coverage factor) */
  sigma: number;
  /** reconciled with every flow zero or more (the bounded fit of all readings), kg/s */
  reconciled: number;
  /** the unbounded fit's value, on which the tests are made */
  unbounded: number;
  /** the bounded fit holds this meter's stream at zero */
  atBound: boolean;
  reconciledSigma: number;
  /** reconciled - measured */
  adjustment: number;
  adjustmentSigma: number;
  redundant: boolean;
  statistic: number | null;
  /** above the Sidak-corrected critical value */
  flagged: boolean;
  /** above VDI 2048's 1.96 */
  vdiFlagged: boolean;
  /** 1 for the first meter serial elimination set aside, and so on; null if not a suspect */
  suspectRank: number | null;
  /** readings averaged */
  count: number;
  /** for a series: second-half mean less first-half mean, kg/s */
  drift: number | null;
  /** the series drifted more than the meter's stated uncertainty */
  unsteady: boolean;
}

export interface StreamResult {
  id: string;
  from: string;
  to: string;
  kind: string;
  meter: string | null;
  /** reconciled with every suspect set aside and every flow zero or more, kg/s; null where not observable */
  value: number | null;
  /** the same without the bounds; the uncertainty and the tests are the unbounded fit's */
  unbounded: number | null;
  /** held at zero by the bound */
  atBound: boolean;
  sigma: number | null;
  observable: boolean;
}

export interface SuspectResult {
  tag: string;
  statistic: number;
  bias: number;
  biasSigma: number;
  globalAfter: GlobalTest;
  /** meters the balances cannot tell apart from this one: the bias may be in any of them */
  equivalent: string[];
}

export interface ReconcileOutcome {
  method: string;
  level: number;
  nodes: number;
  streams: StreamResult[];
  meters: MeterResult[];
  global: GlobalTest;
  measurementCritical: number;
  vdi2048: { globalPassed: boolean; critical: number; flagged: string[] };
  suspects: SuspectResult[];
  /** meters with no reading in the window */
  unread: string[];
  /** notes a planner must read: unsteady window, no redundancy, forced flows, negative estimates */
  notes: string[];
}

export interface ReconcileSettings {
  /** level of significance of the tests; default 0.05 */
  level?: number;
}

/** Sigma of a reading from its meter: expanded uncertainty over the coverage factor of its confidence. */
export function readingSigma(meter: Meter, value: number): number {
  const expanded = meter.relativeUncertainty !== null ? meter.relativeUncertainty * value : (meter.absoluteUncertainty ?? 0);
  return expanded / coverageFactor(meter.confidence);
}

/** The linear problem of a network: one variable per stream, one balance per node. */
export function balanceRows(network: StreamNetwork): BalanceRow[] {
  return network.nodes.map((node) => {
    const terms = new Map<number, number>();
    network.streams.forEach((stream, index) => {
      if (stream.to === node) terms.set(index, (terms.get(index) ?? 0) + 1);
      if (stream.from === node) terms.set(index, (terms.get(index) ?? 0) - 1);
    });
    return { name: node, terms };
  });
}

export function reconcilePlant(plant: Plant, metered: readonly MeteredStream[], readings: ReadonlyMap<string, AveragedReading>, settings: ReconcileSettings = {}, network: StreamNetwork = streamNetwork(plant)): ReconcileOutcome {
  const level = settings.level ?? 0.05;
  const notes: string[] = [];
  const read = metered.filter(({ meter }) => readings.has(meter.tag));
  const unread = metered.filter(({ meter }) => !readings.has(meter.tag)).map(({ meter }) => meter.tag);
  const problemReadings: Reading[] = read.map(({ meter, stream }) => {
    const value = readings.get(meter.tag)!.value;
    return { variable: stream, value, sigma: readingSigma(meter, value) };
  });
  const problem: LinearProblem = { variableCount: network.streams.length, balances: balanceRows(network), readings: problemReadings };
  const tested = testReconciliation(problem, { level });

  for (const node of network.nodes) {
    const touching = network.streams.filter((stream) => stream.from === node || stream.to === node);
    if (touching.length === 1) notes.push(`${node} has one stream only (${touching[0].id}); its balance forces that flow to zero`);
  }
  if (network.openUnits.length > 0) notes.push(`not balanced (their streams do not conserve mass in the model): ${network.openUnits.join(', ')}`);
  if (tested.global.dof === 0) notes.push('no reading is redundant: the balances cannot check any meter, and the readings are taken as they are');

  // Flows are zero or more. The tests stay on the unbounded fit, where their
  // distributions hold; the values reported (and written to a case) are the
  // bounded fit's, for all readings and for the readings left after serial
  // elimination.
  const setAside = new Set(tested.suspects.map((suspect) => suspect.reading));
  const finalProblem: LinearProblem = { ...problem, readings: problem.readings.filter((_, index) => !setAside.has(index)) };
  const allBounded = reconcileBounded(problem, zeroBounds(tested.result), tested.result);
  const finalBounded = reconcileBounded(finalProblem, zeroBounds(tested.final), tested.final);
  const heldAll = new Set(allBounded.atBound);
  const heldFinal = new Set(finalBounded.atBound);

  const suspectRank = new Map<number, number>();
  tested.suspects.forEach((suspect, rank) => suspectRank.set(suspect.reading, rank + 1));
  const meters: MeterResult[] = read.map(({ meter, stream }, index) => {
    const result = tested.result.readings[index];
    const reconciled = allBounded.result.estimate[stream] ?? result.reconciled;
    const reading = readings.get(meter.tag)!;
    const sigma = problemReadings[index].sigma;
    const stated = sigma * coverageFactor(meter.confidence);
    const unsteady = reading.drift !== null && Math.abs(reading.drift) > stated;
    if (unsteady) notes.push(`${meter.tag} drifted ${(reading.drift! * 3.6).toFixed(2)} t/h across the window, more than its stated uncertainty: the window may not be steady`);
    return {
      tag: meter.tag,
      name: meter.name,
      stream: network.streams[stream].id,
      measured: reading.value,
      sigma,
      reconciled,
      unbounded: result.reconciled,
      atBound: heldAll.has(stream),
      reconciledSigma: result.sigma,
      adjustment: reconciled - reading.value,
      adjustmentSigma: result.adjustmentSigma,
      redundant: result.redundant,
      statistic: result.statistic,
      flagged: tested.measurementFlagged.includes(index),
      vdiFlagged: tested.vdi2048.flagged.includes(index),
      suspectRank: suspectRank.get(index) ?? null,
      count: reading.count,
      drift: reading.drift,
      unsteady,
    };
  });

  const meterOf = new Map(read.map(({ meter, stream }) => [stream, meter.tag]));
  const streams: StreamResult[] = network.streams.map((stream, index) => {
    const unbounded = tested.final.estimate[index];
    const value = unbounded === null ? null : (finalBounded.result.estimate[index] ?? unbounded);
    const sigma = tested.final.sigma[index];
    const atBound = heldFinal.has(index);
    if (unbounded !== null && unbounded < -3 * (sigma ?? 0) - 1e-6) notes.push(`${stream.id} is estimated negative (${(unbounded * 3.6).toFixed(2)} t/h) beyond three standard deviations${atBound ? ' (reported at zero)' : ''}: a meter or the case's topology is likely wrong`);
    else if (atBound) notes.push(`${stream.id} is held at zero: the unbounded fit gives ${(unbounded! * 3.6).toFixed(3)} t/h, within its uncertainty of zero`);
    return { id: stream.id, from: stream.from, to: stream.to, kind: stream.kind, meter: meterOf.get(index) ?? null, value, unbounded, atBound, sigma, observable: tested.final.observable[index] };
  });

  return {
    method: METHOD,
    level,
    nodes: network.nodes.length,
    streams,
    meters,
    global: tested.global,
    measurementCritical: tested.measurementCritical,
    vdi2048: { globalPassed: tested.vdi2048.globalPassed, critical: tested.vdi2048.critical, flagged: tested.vdi2048.flagged.map((index) => read[index].meter.tag) },
    suspects: tested.suspects.map((suspect) => ({ tag: read[suspect.reading].meter.tag, statistic: suspect.statistic, bias: suspect.bias, biasSigma: suspect.biasSigma, globalAfter: suspect.globalAfter, equivalent: suspect.equivalent.map((index) => read[index].meter.tag) })),
    unread,
    notes,
  };
}

/** A lower bound of zero on every flow the fit determines; none on the others. */
function zeroBounds(result: LinearResult): (number | null)[] {
  return result.estimate.map((value) => (value === null ? null : 0));
}
