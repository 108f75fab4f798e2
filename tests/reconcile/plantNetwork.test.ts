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

  test('a makeup preheater\'s heat is in no mass balance: it opens no path for mass, and the tank\'s liquid stays observable', async () => {
    const creamery = readFileSync('cases/millbrook-creamery.yaml', 'utf8');
    // Both boilers' blowdown flashed in a new tank; with and without a preheater on its liquid.
    const tank = (preheater: boolean) => creamery
      .replace('    blowdown_to: drain\n', '    blowdown_to: blowdown_tank\n')
      .replace('    can_switch_off: true\n', '    can_switch_off: true\n    blowdown_to: blowdown_tank\n')
      .replace('flash_tanks:\n', `flash_tanks:\n  - { id: blowdown_tank, pressure: 18 psig, vapour_to: lp, liquid_to: drain${preheater ? ', makeup_preheater: { leaving_temperature: 80 degF }' : ''} }\n`);
    const { loadCaseText } = await import('../../src/model/index.js');
    const reconciled = (text: string) => {
      const loaded = loadCaseText(text, 'creamery.yaml');
      if (!loaded.ok) throw new Error(loaded.issues.map((issue) => issue.message).join('; '));
      const network = streamNetwork(loaded.plant);
      const { metered, issues } = meterStreams(resolveMeters(text).meters, network);
      expect(issues).toEqual([]);
      // Every meter reads 1 klb/h: the figures do not matter here, only which flows the balances determine.
      const readings = new Map<string, AveragedReading>(metered.map(({ meter }) => [meter.tag, { tag: meter.tag, value: 0.126, count: 1, line: 1, drift: null }]));
      return { network, outcome: reconcilePlant(loaded.plant, metered, readings, {}, network) };
    };
    const plain = reconciled(tank(false));
    const warmed = reconciled(tank(true));
    const heat = warmed.network.streams.filter((stream) => stream.heatOnly);
    expect(heat.map((stream) => stream.id)).toEqual(['blowdown_tank->deaerator:makeupHeat']);
    const heatAt = warmed.network.streams.indexOf(heat[0]);
    for (const row of balanceRows(warmed.network)) expect(row.terms.has(heatAt), row.name).toBe(false);
    expect(warmed.outcome.streams[heatAt]).toMatchObject({ heatOnly: true, value: null, observable: false });
    // Every flow stream is as observable as without the preheater: the heat opened no second way out of the tank.
    const observable = (outcome: typeof plain.outcome) => new Map(outcome.streams.filter((stream) => !stream.heatOnly).map((stream) => [stream.id, stream.observable]));
    expect(observable(warmed.outcome)).toEqual(observable(plain.outcome));
    expect(observable(warmed.outcome).get('blowdown_tank->drain:flashLiquid')).toBe(true);
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
