// Meter readings fitted to the plant's mass balances: the plant's streams as a
// network, the meters on them, weighted least squares, the tests and serial
// elimination, as plain data for the report.
import type { Meter, Plant } from '../model/index.js';
import { streamNetwork, type StreamNetwork } from '../plant/index.js';
import { saturationTemperature } from '../properties/index.js';
import { reconcileBounded } from './boundedReconciliation.js';
import { reconcileWithEnergy, type EnergyProblem } from './energyReconciliation.js';
import { planThermometers, type Thermometer } from './thermometers.js';
import type { BalanceRow, LinearProblem, LinearResult, Reading } from './linearReconciliation.js';
import type { MeteredStream } from './meterStreams.js';
import { fuelRow, POWER_SCALE, powerRow, steamForFuel, type FuelMeter, type PowerMeter } from './powerMeters.js';
import type { PressureMeter } from './pressureMeters.js';
import type { AveragedReading } from './readings.js';
import { testReconciliation, type GlobalTest } from './serialElimination.js';
import { coverageFactor } from './statistics.js';

export const METHOD = 'constrained weighted least squares (Kuehn and Davidson 1961) by projection of the unmeasured flows (Crowe et al. 1983); global chi-square test; measurement test with Sidak-corrected critical value (Mah and Tamhane 1982); serial elimination (Serth and Heenan 1986); VDI 2048 Part 1 quality criteria; reported flows bounded at zero (active-set quadratic programme), tests on the unbounded fit';

export interface MeterResult {
  tag: string;
  name: string;
  /** a flow meter (values in kg/s), a thermometer (values in K, uncertainties in K), a pressure gauge (MPa abs), a power meter or a fuel meter (values in kW) */
  quantity: 'flow' | 'temperature' | 'pressure' | 'power' | 'fuel';
  /** the stream it reads; a thermometer or a pressure gauge on a header, the header; a power meter, its turbine; a fuel meter, its boiler */
  stream: string;
  /** averaged reading, kg/s (K for a thermometer, MPa abs for a pressure gauge, kW for a power or fuel meter) */
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
  /** heat with no mass (a makeup preheater's duty): no flow to estimate */
  heatOnly: boolean;
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

/** The meters that read no stream's flow, each kind as its own module finds them. */
export interface Instruments {
  thermometers?: readonly Thermometer[];
  pressure?: readonly PressureMeter[];
  power?: readonly PowerMeter[];
  fuel?: readonly FuelMeter[];
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
      if (stream.heatOnly) return; // heat with no mass: no flow to balance
      if (stream.to === node) terms.set(index, (terms.get(index) ?? 0) + 1);
      if (stream.from === node) terms.set(index, (terms.get(index) ?? 0) - 1);
    });
    return { name: node, terms };
  });
}

export function reconcilePlant(plant: Plant, metered: readonly MeteredStream[], readings: ReadonlyMap<string, AveragedReading>, settings: ReconcileSettings = {}, network: StreamNetwork = streamNetwork(plant), instruments: Instruments = {}): ReconcileOutcome {
  const { power = [], fuel = [], pressure = [] } = instruments;
  const level = settings.level ?? 0.05;
  const notes: string[] = [];
  const read = metered.filter(({ meter }) => readings.has(meter.tag));
  // A gauge's reading is the pressure its header's thermometers take their steam at.
  const readPressure = pressure.filter(({ meter }) => readings.has(meter.tag));
  const gaugeAt = new Map(readPressure.map((gauge) => [gauge.header, readings.get(gauge.meter.tag)!.value]));
  const thermometers = (instruments.thermometers ?? []).map((thermometer) => (gaugeAt.has(thermometer.header) ? { ...thermometer, p: gaugeAt.get(thermometer.header)! } : thermometer));
  const readThermometers = thermometers.filter((thermometer) => readings.has(thermometer.meter.tag) && fixesEnthalpy(thermometer, readings, []));
  const readPower = power.filter(({ meter }) => readings.has(meter.tag));
  const readFuel = fuel.filter(({ meter }) => readings.has(meter.tag));
  const unread = [...metered, ...thermometers, ...power, ...fuel, ...pressure].map(({ meter }) => meter.tag).filter((tag) => !readings.has(tag));
  const flowReadings: Reading[] = read.map(({ meter, stream }) => {
    const value = readings.get(meter.tag)!.value;
    return { variable: stream, value, sigma: readingSigma(meter, value) };
  });
  const streamCount = network.streams.length;

  // Energy balances where the thermometers allow them (thermometers.ts), by
  // successive linearisation; the tests are then made on the linearisation at
  // the estimate. Without them, the mass balances alone.
  for (const thermometer of thermometers) if (readings.has(thermometer.meter.tag)) fixesEnthalpy(thermometer, readings, notes);
  const energyHeaders = energyHeadersOf(plant, network, readThermometers, notes);
  // A power or fuel meter: one more variable, in MW, after the streams (and
  // the temperature points), tied to the turbine's outflows or the boiler's
  // steam.
  const powerBase = streamCount + (energyHeaders.size > 0 ? readThermometers.length : 0);
  const fuelBase = powerBase + readPower.length;
  const powerRows = readPower.map((meter, i) => powerRow(meter, powerBase + i));
  const unitReading = (meter: Meter, variable: number): Reading => {
    const value = readings.get(meter.tag)!.value;
    return { variable, value: value * POWER_SCALE, sigma: readingSigma(meter, value) * POWER_SCALE };
  };
  const extraReadings: Reading[] = [...readPower.map(({ meter }, i) => unitReading(meter, powerBase + i)), ...readFuel.map(({ meter }, i) => unitReading(meter, fuelBase + i))];
  if (readPower.length > 0) {
    notes.push(`power meters (${readPower.map(({ meter }) => meter.tag).join(', ')}): each turbine's power tied to its outflows with it running, at the case's steam states (an isentropic section's drop at its header's design state, a Willans section's line); a flagged power meter may also mean the turbine's efficiency in the case is not the day's`);
  }
  if (readFuel.length > 0) {
    notes.push(`fuel meters (${readFuel.map(({ meter }) => meter.tag).join(', ')}): each boiler's fuel tied to its steam by the case's efficiency table and the heat each kg of steam takes at the case's states (blowdown at the case's share), with it running, linearised at the estimate; a flagged fuel meter may also mean the boiler's efficiency is not the case's`);
  }
  if (energyHeaders.size > 0) notes.push(`energy balances written at ${[...energyHeaders].join(', ')} (IF97 enthalpies at the thermometers' temperatures, successive linearisation; the tests are made on the linearisation at the estimate)`);

  /** The linear problem with each fuel row the tangent at its boiler's steam flow `fuelAt[i]`. */
  const problemAt = (fuelAt: readonly number[]): LinearProblem => {
    const extraRows = [...powerRows, ...readFuel.map((meter, i) => fuelRow(meter, fuelBase + i, fuelAt[i]))];
    const extraCount = readPower.length + readFuel.length;
    if (energyHeaders.size === 0) return { variableCount: streamCount + extraCount, balances: [...balanceRows(network), ...extraRows], readings: [...flowReadings, ...extraReadings] };
    const pointOf = new Map<number, number>();
    readThermometers.forEach((thermometer, point) => thermometer.streams.forEach((index) => pointOf.set(index, point)));
    const headerLoss = new Map(plant.headers.map((header) => [header.id, header.heatLoss]));
    const energyProblem: EnergyProblem = {
      streams: network.streams.map((stream, index) => ({ id: stream.id, from: stream.from, to: stream.to, p: stream.p, h: stream.h, point: pointOf.get(index) ?? null })),
      nodes: network.nodes.map((node) => ({ id: node, energy: energyHeaders.has(node), heatLoss: energyHeaders.has(node) ? (headerLoss.get(node) ?? 0) : 0 })),
      points: readThermometers.map((thermometer) => ({ id: thermometer.meter.tag, p: thermometer.p, guess: readings.get(thermometer.meter.tag)!.value })),
      flows: flowReadings,
      temperatures: readThermometers.map((thermometer, point) => ({ variable: point, value: readings.get(thermometer.meter.tag)!.value, sigma: readingSigma(thermometer.meter, 0) })),
      extra: { variables: extraCount, rows: extraRows, readings: extraReadings },
    };
    return reconcileWithEnergy(energyProblem).problem;
  };
  // The fuel rows by successive linearisation: from the steam each fuel
  // reading implies, each tangent moved to the estimate until no estimate
  // moves. At the fixed point the tangent is exact to first order, so the
  // tests are those of the last pass (as for the energy balances).
  const boilerMax = new Map(plant.boilers.map((boiler) => [boiler.id, boiler.steam.max]));
  let fuelAt = readFuel.map((meter) => steamForFuel(meter, readings.get(meter.meter.tag)!.value, boilerMax.get(meter.boiler) ?? 1));
  let problem = problemAt(fuelAt);
  let tested = testReconciliation(problem, { level });
  for (let pass = 1; readFuel.length > 0; pass++) {
    const next = readFuel.map((meter, i) => tested.result.estimate[meter.steam] ?? fuelAt[i]);
    if (next.every((value, i) => Math.abs(value - fuelAt[i]) <= FUEL_TOLERANCE * Math.max(1, Math.abs(value)))) break;
    if (pass === FUEL_PASSES) {
      notes.push(`the fuel rows did not settle in ${FUEL_PASSES} passes (a boiler's steam estimate kept moving across a corner of its efficiency table); the results are the last pass's`);
      break;
    }
    fuelAt = next;
    problem = problemAt(fuelAt);
    tested = testReconciliation(problem, { level });
  }
  // Reading i of the problem: the flow meters, then the thermometers used, then the power meters, then the fuel meters.
  const used = energyHeaders.size > 0 ? readThermometers : [];
  const unitTags = [...readPower.map(({ meter }) => meter.tag), ...readFuel.map(({ meter }) => meter.tag)];
  const tagOf = (index: number): string => (index < read.length ? read[index].meter.tag : index < read.length + used.length ? used[index - read.length].meter.tag : unitTags[index - read.length - used.length]);
  /** From the problem's units back to the report's: a power or fuel reading is in MW inside, kW out. */
  const unitOf = (index: number): number => (index >= read.length + used.length ? 1 / POWER_SCALE : 1);

  for (const node of network.nodes) {
    const touching = network.streams.filter((stream) => stream.from === node || stream.to === node);
    if (touching.length === 1) notes.push(`${node} has one stream only (${touching[0].id}); its balance forces that flow to zero`);
  }
  if (network.openUnits.length > 0) notes.push(`not balanced (their streams do not conserve mass in the model): ${network.openUnits.join(', ')}`);
  if (tested.global.dof === 0) notes.push('no reading is redundant: the balances cannot check any meter, and the readings are taken as they are');

  // Flows are zero or more. The tests stay on the unbounded fit, where their
  // distributions hold; the values reported (and written to a case) are the
  // bounded fit's, for all readings and for the readings left after serial
  // elimination. Temperatures are not bounded.
  const setAside = new Set(tested.suspects.map((suspect) => suspect.reading));
  const finalProblem: LinearProblem = { ...problem, readings: problem.readings.filter((_, index) => !setAside.has(index)) };
  const allBounded = reconcileBounded(problem, zeroBounds(tested.result, streamCount), tested.result);
  const finalBounded = reconcileBounded(finalProblem, zeroBounds(tested.final, streamCount), tested.final);
  const heldAll = new Set(allBounded.atBound);
  const heldFinal = new Set(finalBounded.atBound);

  const suspectRank = new Map<number, number>();
  tested.suspects.forEach((suspect, rank) => suspectRank.set(suspect.reading, rank + 1));
  const meterRows: { meter: Meter; variable: number; where: string; quantity: MeterResult['quantity'] }[] = [
    ...read.map(({ meter, stream }) => ({ meter, variable: stream, where: network.streams[stream].id, quantity: 'flow' as const })),
    ...used.map((thermometer, point) => ({ meter: thermometer.meter, variable: streamCount + point, where: thermometer.meter.unit === thermometer.header ? thermometer.header : network.streams[thermometer.streams[0]].id, quantity: 'temperature' as const })),
    ...readPower.map(({ meter, turbine }, i) => ({ meter, variable: powerBase + i, where: turbine, quantity: 'power' as const })),
    ...readFuel.map(({ meter, boiler }, i) => ({ meter, variable: fuelBase + i, where: boiler, quantity: 'fuel' as const })),
  ];
  const meters: MeterResult[] = meterRows.map(({ meter, variable, where, quantity }, index) => {
    const unit = unitOf(index);
    const result = tested.result.readings[index];
    const reconciled = (allBounded.result.estimate[variable] ?? result.reconciled) * unit;
    const reading = readings.get(meter.tag)!;
    const sigma = problem.readings[index].sigma * unit;
    const stated = sigma * coverageFactor(meter.confidence);
    const unsteady = reading.drift !== null && Math.abs(reading.drift) > stated;
    if (unsteady) {
      const drift = quantity === 'flow' ? `${(reading.drift! * 3.6).toFixed(2)} t/h` : quantity === 'power' || quantity === 'fuel' ? `${(reading.drift! / 1000).toFixed(3)} MW` : `${reading.drift!.toFixed(2)} K`;
      notes.push(`${meter.tag} drifted ${drift} across the window, more than its stated uncertainty: the window may not be steady`);
    }
    return {
      tag: meter.tag,
      name: meter.name,
      quantity,
      stream: where,
      measured: reading.value,
      sigma,
      reconciled,
      unbounded: result.reconciled * unit,
      atBound: heldAll.has(variable),
      reconciledSigma: result.sigma * unit,
      adjustment: reconciled - reading.value,
      adjustmentSigma: result.adjustmentSigma * unit,
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

  // Pressure gauges: in no balance, so reported as read and never checked.
  const withEnergy = new Set(energyHeaders);
  for (const gauge of readPressure) {
    const { meter } = gauge;
    const reading = readings.get(meter.tag)!;
    const sigma = readingSigma(meter, reading.value);
    const stated = sigma * coverageFactor(meter.confidence);
    const unsteady = reading.drift !== null && Math.abs(reading.drift) > stated;
    if (unsteady) notes.push(`${meter.tag} drifted ${(reading.drift! * 10).toFixed(3)} bar across the window, more than its stated uncertainty: the window may not be steady`);
    const balanced = withEnergy.has(gauge.header) ? `; the energy balance at ${gauge.header} takes its enthalpies at the reading` : '';
    if (Math.abs(reading.value - gauge.casePressure) > stated) {
      notes.push(`${meter.tag}: ${gauge.header} reads ${(reading.value * 10).toFixed(3)} bar abs against the case's ${(gauge.casePressure * 10).toFixed(3)} bar abs, more than the gauge's uncertainty: the case's steam states there are not the day's${balanced}`);
    } else if (balanced) {
      notes.push(`${meter.tag}${balanced}`);
    }
    meters.push({ tag: meter.tag, name: meter.name, quantity: 'pressure', stream: gauge.header, measured: reading.value, sigma, reconciled: reading.value, unbounded: reading.value, atBound: false, reconciledSigma: sigma, adjustment: 0, adjustmentSigma: 0, redundant: false, statistic: null, flagged: false, vdiFlagged: false, suspectRank: null, count: reading.count, drift: reading.drift, unsteady });
  }

  const meterOf = new Map(read.map(({ meter, stream }) => [stream, meter.tag]));
  const streams: StreamResult[] = network.streams.map((stream, index) => {
    const unbounded = tested.final.estimate[index];
    const value = unbounded === null ? null : (finalBounded.result.estimate[index] ?? unbounded);
    const sigma = tested.final.sigma[index];
    const atBound = heldFinal.has(index);
    if (unbounded !== null && unbounded < -3 * (sigma ?? 0) - 1e-6) notes.push(`${stream.id} is estimated negative (${(unbounded * 3.6).toFixed(2)} t/h) beyond three standard deviations${atBound ? ' (reported at zero)' : ''}: a meter or the case's topology is likely wrong`);
    else if (atBound) notes.push(`${stream.id} is held at zero: the unbounded fit gives ${(unbounded! * 3.6).toFixed(3)} t/h, within its uncertainty of zero`);
    if (stream.heatOnly) return { id: stream.id, from: stream.from, to: stream.to, kind: stream.kind, meter: null, value: null, unbounded: null, atBound: false, sigma: null, observable: false, heatOnly: true };
    return { id: stream.id, from: stream.from, to: stream.to, kind: stream.kind, meter: meterOf.get(index) ?? null, value, unbounded, atBound, sigma, observable: tested.final.observable[index], heatOnly: false };
  });

  return {
    method: METHOD,
    level,
    nodes: network.nodes.length,
    streams,
    meters,
    global: tested.global,
    measurementCritical: tested.measurementCritical,
    vdi2048: { globalPassed: tested.vdi2048.globalPassed, critical: tested.vdi2048.critical, flagged: tested.vdi2048.flagged.map(tagOf) },
    suspects: tested.suspects.map((suspect) => ({ tag: tagOf(suspect.reading), statistic: suspect.statistic, bias: suspect.bias * unitOf(suspect.reading), biasSigma: suspect.biasSigma * unitOf(suspect.reading), globalAfter: suspect.globalAfter, equivalent: suspect.equivalent.map(tagOf) })),
    unread,
    notes,
  };
}

/** A lower bound of zero on every flow the fit determines (the first `flows` variables); none on the others. */
function zeroBounds(result: LinearResult, flows: number): (number | null)[] {
  return result.estimate.map((value, index) => (value === null || index >= flows ? null : 0));
}

/**
 * Saturated or wet steam has the same temperature at every quality, so a
 * thermometer there does not fix the enthalpy. A reading within 2 K of the
 * saturation temperature is left out of the energy balances, with a note
 * (the 2 K margin is this program's choice, about twice a good thermometer's
 * uncertainty; no published rule).
 */
function fixesEnthalpy(thermometer: Thermometer, readings: ReadonlyMap<string, AveragedReading>, notes: string[]): boolean {
  const value = readings.get(thermometer.meter.tag)!.value;
  const saturation = saturationTemperature(thermometer.p);
  if (Math.abs(value - saturation) >= SATURATION_MARGIN) return true;
  notes.push(`${thermometer.meter.tag} reads ${(value - 273.15).toFixed(1)} degC, within ${SATURATION_MARGIN} K of saturation at ${thermometer.header} (${(saturation - 273.15).toFixed(1)} degC): the temperature of saturated steam does not fix its enthalpy, so it is not used in an energy balance`);
  return false;
}

const SATURATION_MARGIN = 2;

/** Largest relative move of a boiler's steam (kg/s, at least 1) that ends the fuel rows' iteration, and the most passes. */
const FUEL_TOLERANCE = 1e-9;
const FUEL_PASSES = 30;

/** The headers whose energy balance can be written with the thermometers that have readings. */
function energyHeadersOf(plant: Plant, network: StreamNetwork, read: readonly Thermometer[], notes: string[]): Set<string> {
  if (read.length === 0) return new Set();
  const plan = planThermometers(read.map((thermometer) => thermometer.meter), network, plant);
  notes.push(...plan.notes);
  return new Set(plan.energyHeaders);
}
