// Fuel meters on fired boilers: the curve that ties a boiler's fuel to its
// steam, checked against the case's efficiency table and the optimiser's
// solved fuel, and the fuel reading reconciled by successive linearisation,
// checked on the curve itself at the estimate.
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { loadCase, loadCaseText, resolveMeters } from '../../src/model/index.js';
import { plantResult, solvePlant, streamNetwork } from '../../src/plant/index.js';
import { FUEL_CURVE_ACCURACY } from '../../src/plant/pieces.js';
import { fuelMeters, meterStreams, reconcilePlant, type AveragedReading } from '../../src/reconcile/index.js';
import { expectClose } from '../helpers/expectClose.js';

const MILL = 'cases/kestrel-bay-board-mill.yaml';

describe('a boiler\'s fuel against its steam', () => {
  test('boiler_1: fuel per kg of steam goes as 1 / efficiency, the case\'s table read by hand', async () => {
    const loaded = await loadCase(MILL);
    if (!loaded.ok) throw new Error('the mill does not load');
    const curve = streamNetwork(loaded.plant).fuel.get('boiler_1')!;
    const max = 60 / 3.6;
    const perKg = (load: number) => curve.fuel(load * max) / (load * max);
    // Table: 25 % 78 %, 50 % 82.5 %, 75 % 84 %, 100 % 83.5 %; 62.5 % is midway, 83.25 %.
    expectClose(perKg(0.5) / perKg(0.75), 0.84 / 0.825, 1e-12, '50 % against 75 %');
    expectClose(perKg(0.25) / perKg(1), 0.835 / 0.78, 1e-12, '25 % against 100 %');
    expectClose(perKg(0.625) / perKg(0.75), 0.84 / 0.8325, 1e-12, '62.5 % against 75 %');
  });

  test('at the optimiser\'s solution every running fired boiler\'s fuel is on the curve, within the model\'s chord accuracy', async () => {
    const loaded = await loadCase(MILL);
    if (!loaded.ok) throw new Error('the mill does not load');
    const network = streamNetwork(loaded.plant);
    const outcome = await solvePlant(loaded.plant);
    if (!outcome.ok) throw new Error('the mill does not solve');
    const result = plantResult(outcome);
    let checked = 0;
    for (const unit of result.units.filter((entry) => entry.kind === 'boiler' && entry.values.running === true)) {
      const curve = network.fuel.get(unit.id)!;
      const steam = result.streams[curve.steam].mass_kg_s;
      expect(steam).toBeCloseTo(unit.values.steam_kg_s as number, 9);
      const fuel = unit.values.fuel_kW as number;
      expect(Math.abs(curve.fuel(steam) - fuel) / fuel, unit.id).toBeLessThanOrEqual(FUEL_CURVE_ACCURACY);
      checked++;
    }
    expect(checked).toBeGreaterThan(0);
  });
});

describe('a fuel reading in the reconciliation', () => {
  const METERS = `
meters:
  - { tag: FT-1, unit: boiler_1, measures: steam, uncertainty: 2 % }
  - { tag: FQ-1, unit: boiler_1, measures: fuel, uncertainty: 1.5 % }
`;

  function setUp(meters = METERS) {
    const text = `${readFileSync(MILL, 'utf8')}${meters}`;
    const loaded = loadCaseText(text, 'mill.yaml');
    if (!loaded.ok) throw new Error(loaded.issues.map((issue) => issue.message).join('; '));
    const network = streamNetwork(loaded.plant);
    const all = resolveMeters(text).meters;
    const flows = meterStreams(all, network);
    const fuel = fuelMeters(all, network);
    expect([...flows.issues, ...fuel.issues]).toEqual([]);
    const curve = network.fuel.get('boiler_1')!;
    const reconcile = (entries: [string, number][]) =>
      reconcilePlant(loaded.plant, flows.metered, new Map<string, AveragedReading>(entries.map(([tag, value]) => [tag, { tag, value, count: 1, drift: null, line: 1 }])), {}, network, { fuel: fuel.metered });
    return { curve, reconcile, network };
  }

  test('a steam and a fuel reading that agree are left where they are; the fuel meter is checked by the steam meter', () => {
    const { curve, reconcile } = setUp();
    const steam = 40 / 3.6;
    const outcome = reconcile([
      ['FT-1', steam],
      ['FQ-1', curve.fuel(steam)],
    ]);
    expect(outcome.global.dof).toBe(1);
    expect(outcome.global.statistic).toBeLessThan(1e-12);
    const fq = outcome.meters.find((meter) => meter.tag === 'FQ-1')!;
    expect(fq).toMatchObject({ quantity: 'fuel', stream: 'boiler_1', redundant: true });
    expect(Math.abs(fq.adjustment)).toBeLessThan(1e-6);
    expect(outcome.notes.some((note) => note.startsWith('fuel meters (FQ-1)'))).toBe(true);
  });

  test('readings that disagree: at the estimate the reconciled fuel is on the curve at the reconciled steam (the iteration has settled)', () => {
    const { curve, reconcile } = setUp();
    const steam = 33 / 3.6; // 55 % load, where the efficiency still climbs
    const outcome = reconcile([
      ['FT-1', steam],
      ['FQ-1', 1.04 * curve.fuel(steam)],
    ]);
    const ft = outcome.meters.find((meter) => meter.tag === 'FT-1')!;
    const fq = outcome.meters.find((meter) => meter.tag === 'FQ-1')!;
    expect(ft.adjustment).toBeGreaterThan(0);
    expect(fq.adjustment).toBeLessThan(0);
    expect(Math.abs(curve.fuel(ft.unbounded) - fq.unbounded)).toBeLessThan(1e-6);
  });

  test('with no steam meter the fuel reading gives the boiler\'s steam: the curve inverted by bisection here', () => {
    const { curve, reconcile } = setUp(METERS.replace('  - { tag: FT-1, unit: boiler_1, measures: steam, uncertainty: 2 % }\n', ''));
    const fuel = 27_500; // kW, between the 50 % and 75 % points of the table
    const outcome = reconcile([['FQ-1', fuel]]);
    let low = 0;
    let high = 60 / 3.6;
    for (let i = 0; i < 200; i++) {
      const middle = (low + high) / 2;
      if (curve.fuel(middle) < fuel) low = middle;
      else high = middle;
    }
    const steam = outcome.streams.find((stream) => stream.id === 'boiler_1->hp:steam')!;
    expect(steam.observable).toBe(true);
    expectClose(steam.unbounded!, (low + high) / 2, 1e-9, 'boiler_1 steam');
    expect(outcome.meters[0]).toMatchObject({ tag: 'FQ-1', redundant: false });
  });

  test('a fuel meter on a turbine, a second one on the same boiler, or one with "to", is refused at its line', async () => {
    const base = readFileSync(MILL, 'utf8');
    const text = `${base}
meters:
  - { tag: FQ-1, unit: tg1, measures: fuel, uncertainty: 1 % }
  - { tag: FQ-2, unit: boiler_2, measures: fuel, uncertainty: 1 % }
  - { tag: FQ-3, unit: boiler_2, measures: fuel, uncertainty: 0.2 GJ/h }
  - { tag: FQ-4, unit: boiler_1, measures: fuel, to: hp, uncertainty: 1 % }
`;
    const loaded = loadCaseText(text, 'mill.yaml');
    if (!loaded.ok) throw new Error('does not load');
    const { meters, issues: meterIssues } = resolveMeters(text);
    expect(meterIssues).toEqual([]);
    expectClose(meters.find((meter) => meter.tag === 'FQ-3')!.absoluteUncertainty!, 200 / 3.6, 1e-12, '0.2 GJ/h in kW');
    const { issues } = fuelMeters(meters, streamNetwork(loaded.plant));
    const line = (tag: string) => base.split('\n').length + 1 + ['FQ-1', 'FQ-2', 'FQ-3', 'FQ-4'].indexOf(tag) + 1;
    expect(issues.map((issue) => [issue.line, issue.message])).toEqual([
      [line('FQ-1'), 'fuel meter FQ-1 names "tg1", which is not a fired boiler; expected a fired boiler: "boiler_1", "boiler_2"'],
      [line('FQ-3'), 'fuel meters FQ-2 and FQ-3 both read boiler boiler_2; keep one, or combine their readings'],
      [line('FQ-4'), 'fuel meter FQ-4: "to" picks a stream, and a fuel meter reads the boiler boiler_1 itself; leave "to" out'],
    ]);
  });
});
