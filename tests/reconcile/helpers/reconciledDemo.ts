// The creamery demo solved and its bundled readings reconciled: shared by the
// tests of the reconciled diagram (the reconcile module's flows and the
// report's drawing).
import { readFileSync } from 'node:fs';
import { loadCase, resolveMeters } from '../../../src/model/index.js';
import { plantResult, solvePlant, streamNetwork } from '../../../src/plant/index.js';
import { fuelMeters, meterStreams, parseReadings, powerMeters, reconcilePlant } from '../../../src/reconcile/index.js';

export const DEMO = 'cases/millbrook-creamery.yaml';
export const READINGS = 'cases/millbrook-creamery.readings.csv';

export async function reconciledDemo() {
  const loaded = await loadCase(DEMO);
  if (!loaded.ok) throw new Error('demo does not load');
  const solved = await solvePlant(loaded.plant);
  if (!solved.ok) throw new Error('demo does not solve');
  const network = streamNetwork(loaded.plant);
  const meters = resolveMeters(readFileSync(DEMO, 'utf8')).meters;
  const { metered } = meterStreams(meters, network);
  const power = powerMeters(meters, network).metered;
  const fuel = fuelMeters(meters, network).metered;
  const kinds = new Map([...power.map(({ meter }) => [meter.tag, 'power'] as const), ...fuel.map(({ meter }) => [meter.tag, 'fuel'] as const)]);
  const parsed = parseReadings(readFileSync(READINGS, 'utf8'), new Set(meters.map((meter) => meter.tag)), undefined, kinds);
  if (!parsed.ok) throw new Error('demo readings do not parse');
  const outcome = reconcilePlant(loaded.plant, metered, parsed.readings, {}, network, { power, fuel });
  return { plant: loaded.plant, network, result: plantResult(solved), outcome };
}
