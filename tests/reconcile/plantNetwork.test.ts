// The plant's streams as a reconciliation network, checked against solved
// plants: the optimiser's own flows must close every balance the network
// writes, and reconciling those flows as exact-ish readings must leave them
// where they are.
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { loadCase, resolveMeters } from '../../src/model/index.js';
import { plantResult, solvePlant, streamNetwork } from '../../src/plant/index.js';
import { balanceRows, meterStreams, reconcileLinear, reconcilePlant, reconciledCase, type AveragedReading } from '../../src/reconcile/index.js';

const DEMOS = ['cases/millbrook-creamery.yaml', 'cases/kestrel-bay-board-mill.yaml'];

async function solved(file: string) {
  const loaded = await loadCase(file);
  if (!loaded.ok) throw new Error(`${file} does not load`);
  const outcome = await solvePlant(loaded.plant);
  if (!outcome.ok) throw new Error(`${file} does not solve`);
  return { plant: loaded.plant, result: plantResult(outcome) };
}

describe('streamNetwork', () => {
  test.each(DEMOS)('%s: every unit conserves mass, and the solved flows close every balance', async (file) => {
    const { plant, result } = await solved(file);
    const network = streamNetwork(plant);
    expect(network.openUnits).toEqual([]);
    expect(network.streams).toHaveLength(result.streams.length);
    // The network's streams and the result's are the same list in the same order.
    network.streams.forEach((stream, index) => expect(stream.kind, stream.id).toBe(result.streams[index].kind));
    for (const row of balanceRows(network)) {
      let sum = 0;
      let scale = 0;
      for (const [index, coefficient] of row.terms) {
        sum += coefficient * result.streams[index].mass_kg_s;
        scale = Math.max(scale, Math.abs(result.streams[index].mass_kg_s));
      }
      expect(Math.abs(sum), `${file}: ${row.name}`).toBeLessThan(1e-6 * Math.max(1, scale));
    }
  });

  test('readings equal to a solved balance are left as they are, and the unmetered flows come out as solved', async () => {
    const { plant, result } = await solved('cases/kestrel-bay-board-mill.yaml');
    const network = streamNetwork(plant);
    // Meter every other stream, 1 % standard deviation (floored for idle streams).
    const readings = network.streams.flatMap((_, index) => (index % 2 === 0 ? [{ variable: index, value: result.streams[index].mass_kg_s, sigma: 0.01 * result.streams[index].mass_kg_s + 0.01 }] : []));
    const reconciled = reconcileLinear({ variableCount: network.streams.length, balances: balanceRows(network), readings });
    expect(reconciled.globalStatistic).toBeLessThan(1e-12);
    reconciled.estimate.forEach((estimate, index) => {
      if (estimate === null) return;
      expect(Math.abs(estimate - result.streams[index].mass_kg_s), network.streams[index].id).toBeLessThan(1e-6);
    });
  });
});

describe('reconciledCase', () => {
  test('the demo written back: every metered user at its reconciled steam, comments kept', async () => {
    const file = 'cases/millbrook-creamery.yaml';
    const text = readFileSync(file, 'utf8');
    const loaded = await loadCase(file);
    if (!loaded.ok) throw new Error('demo does not load');
    const network = streamNetwork(loaded.plant);
    const { metered, issues } = meterStreams(resolveMeters(text).meters, network);
    expect(issues).toEqual([]);
    // Arbitrary readings (kg/s): only how the reconciled user flows are written back is checked here.
    const readings = new Map<string, AveragedReading>();
    metered.forEach(({ meter }, index) => readings.set(meter.tag, { tag: meter.tag, value: 1 + index * 0.1, count: 1, drift: null, line: index + 2 }));
    const outcome = reconcilePlant(loaded.plant, metered, readings, {}, network);
    const written = reconciledCase(text, outcome, 'us', 'r.csv');
    expect(written.updated.map((entry) => entry.user)).toEqual(['pasteurisers', 'evaporator', 'cip_heaters', 'space_heating', 'direct_injection']);
    expect(written.text).toMatch(/^# Users' steam reconciled from r\.csv by steamwright reconcile/);
    expect(written.text).toMatch(/# Millbrook Creamery: an invented dairy plant/);
    for (const { user, steam } of written.updated) {
      const stream = outcome.streams.find((entry) => entry.kind === 'process' && entry.to === user)!;
      // The written flow, read back in klb/h, is the reconciled one to the 4 digits written.
      const klbPerHour = Number(steam.replace(' klb/h', ''));
      expect(Math.abs(klbPerHour * 0.45359237 / 3.6 - stream.value!) / stream.value!, user).toBeLessThan(1e-3);
    }
  });
});
