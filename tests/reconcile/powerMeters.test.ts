// Power meters on turbines: the relation that ties a turbine's power to its
// steam, checked by hand with IF97 and against the optimiser's solved powers,
// and the power reading as one more reading of the reconciliation.
import { describe, expect, test } from 'vitest';
import { loadCase, loadCaseText, resolveMeters, type Meter } from '../../src/model/index.js';
import { plantResult, solvePlant, streamNetwork, type StreamNetwork } from '../../src/plant/index.js';
import { statePH, statePS, statePT } from '../../src/properties/index.js';
import { meterStreams, powerMeters, reconcilePlant, type AveragedReading } from '../../src/reconcile/index.js';
import { expectClose } from '../helpers/expectClose.js';

const MILL = 'cases/kestrel-bay-board-mill.yaml';

async function mill() {
  const loaded = await loadCase(MILL);
  if (!loaded.ok) throw new Error('the mill does not load');
  return loaded.plant;
}

function streamIndex(network: StreamNetwork, id: string): number {
  const index = network.streams.findIndex((stream) => stream.id === id);
  if (index < 0) throw new Error(`no stream ${id}: ${network.streams.map((stream) => stream.id).join(', ')}`);
  return index;
}

describe('a turbine\'s power in its flows', () => {
  test('tg1 (two isentropic sections, hp at 400 degC): the coefficients by hand from IF97', async () => {
    const plant = await mill();
    const network = streamNetwork(plant);
    const hp = plant.headers.find((header) => header.id === 'hp')!;
    const mp = plant.headers.find((header) => header.id === 'mp')!;
    // Section 1, hp (42 barg, 400 degC) to mp at 76 %; section 2 on to 0.1 bara at 72 %.
    const inlet = statePT(hp.pressure, 400 + 273.15);
    const h1 = inlet.h - 0.76 * (inlet.h - statePS(mp.pressure, inlet.s).h);
    const after1 = statePH(mp.pressure, h1);
    const h2 = h1 - 0.72 * (h1 - statePS(0.01, after1.s).h);
    const efficiency = 0.985 * 0.975;
    const relation = network.power.get('tg1')!;
    expect(relation.constant).toBe(0);
    expect([...relation.terms.keys()].sort()).toEqual([streamIndex(network, 'tg1->mp:extraction'), streamIndex(network, 'tg1->deaerator:condensate')].sort());
    expectClose(relation.terms.get(streamIndex(network, 'tg1->mp:extraction'))!, efficiency * (inlet.h - h1), 1e-9, 'kW per kg/s extracted');
    expectClose(relation.terms.get(streamIndex(network, 'tg1->deaerator:condensate'))!, efficiency * (inlet.h - h2), 1e-9, 'kW per kg/s condensed');
  });

  test('bpt1 (a Willans line, 150 kJ/kg and 60 kW): the case\'s line itself', async () => {
    const network = streamNetwork(await mill());
    const relation = network.power.get('bpt1')!;
    expect([...relation.terms]).toEqual([[streamIndex(network, 'bpt1->lp:exhaust'), 150]]);
    expect(relation.constant).toBe(-60);
  });

  test('at the optimiser\'s solution of every scenario the relation gives each running turbine\'s solved power', async () => {
    const plant = await mill();
    const network = streamNetwork(plant);
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error('the mill does not solve');
    const result = plantResult(outcome);
    const flows = result.streams.map((stream) => stream.mass_kg_s);
    let checked = 0;
    for (const unit of result.units.filter((entry) => entry.kind === 'turbine' && entry.values.running === true)) {
      const relation = network.power.get(unit.id)!;
      let power = relation.constant;
      for (const [index, coefficient] of relation.terms) power += coefficient * flows[index];
      expectClose(power, unit.values.power_kW as number, 1e-6, `${unit.id} power`);
      checked++;
    }
    expect(checked).toBeGreaterThan(0);
  });
});

describe('a power reading in the reconciliation', () => {
  // tg1 metered on its inlet, its extraction and its condensate (2 %), and
  // its generator (0.5 %): two balances (the turbine's mass and its power) and
  // no unmeasured flow, so two degrees of freedom at the turbine.
  const METERS = `
meters:
  - { tag: FT-1, unit: tg1, measures: steam, uncertainty: 2 % }
  - { tag: FT-2, unit: tg1, measures: extraction, uncertainty: 2 % }
  - { tag: FT-3, unit: tg1, measures: condensate, uncertainty: 2 % }
  - { tag: JT-1, unit: tg1, measures: power, uncertainty: 0.5 % }
`;

  async function setUp() {
    const text = `${(await import('node:fs')).readFileSync(MILL, 'utf8')}${METERS}`;
    const loaded = loadCaseText(text, 'mill.yaml');
    if (!loaded.ok) throw new Error(loaded.issues.map((issue) => issue.message).join('; '));
    const network = streamNetwork(loaded.plant);
    const { meters } = resolveMeters(text);
    const flows = meterStreams(meters, network);
    const power = powerMeters(meters, network);
    expect([...flows.issues, ...power.issues]).toEqual([]);
    const relation = network.power.get('tg1')!;
    // A consistent day: 40 t/h in, 28 t/h extracted, 12 t/h condensed, and the power those give.
    const [extraction, condensate] = [28 / 3.6, 12 / 3.6];
    const truePower = relation.terms.get(streamIndex(network, 'tg1->mp:extraction'))! * extraction + relation.terms.get(streamIndex(network, 'tg1->deaerator:condensate'))! * condensate;
    const readingsOf = (entries: [string, number][]) => new Map<string, AveragedReading>(entries.map(([tag, value]) => [tag, { tag, value, count: 1, drift: null, line: 1 }]));
    const flowReadings = (extractionBias: number): [string, number][] => [
      ['FT-1', extraction + condensate],
      ['FT-2', extraction + extractionBias],
      ['FT-3', condensate],
    ];
    const reconcile = (powerReading: number, extractionBias = 0) => reconcilePlant(loaded.plant, flows.metered, readingsOf([...flowReadings(extractionBias), ['JT-1', powerReading]]), {}, network, { power: power.metered });
    const flowsOnly = (extractionBias: number) => reconcilePlant(loaded.plant, flows.metered, readingsOf(flowReadings(extractionBias)), {}, network, { power: power.metered });
    return { reconcile, flowsOnly, truePower, meters };
  }

  test('readings that agree are left where they are; the power meter is redundant and reported in kW', async () => {
    const { reconcile, truePower } = await setUp();
    const outcome = reconcile(truePower);
    expect(outcome.global.dof).toBe(2);
    expect(outcome.global.statistic).toBeLessThan(1e-12);
    const jt = outcome.meters.find((meter) => meter.tag === 'JT-1')!;
    expect(jt).toMatchObject({ quantity: 'power', stream: 'tg1', redundant: true });
    expectClose(jt.reconciled, truePower, 1e-9, 'reconciled power');
    expectClose(jt.sigma, (0.005 * truePower) / 1.959964, 1e-6, 'sigma of the reading, kW');
    expect(Math.abs(jt.adjustment)).toBeLessThan(1e-6);
    expect(outcome.suspects).toEqual([]);
    expect(outcome.notes.some((note) => note.startsWith('power meters (JT-1)'))).toBe(true);
  });

  test('a generator meter reading 10 % high (a wrong transformer ratio, say) is named, with its bias in kW', async () => {
    const { reconcile, truePower } = await setUp();
    const outcome = reconcile(1.1 * truePower);
    expect(outcome.global.passed).toBe(false);
    expect(outcome.suspects[0]?.tag).toBe('JT-1');
    expect(outcome.suspects[0].equivalent).toEqual([]);
    // With the readings exact but for the bias, the bias estimate is the bias.
    expectClose(outcome.suspects[0].bias, 0.1 * truePower, 1e-6, 'bias, kW');
    expect(outcome.suspects[0].globalAfter.passed).toBe(true);
  });

  test('a biased extraction meter: the flow meters alone cannot say which of the three it is, the power meter can', async () => {
    const { reconcile, truePower, flowsOnly } = await setUp();
    const bias = (8 * (0.02 * 28)) / 3.6 / 1.959964; // 8 standard deviations of FT-2
    const withPower = reconcile(truePower, bias);
    expect(withPower.suspects[0]?.tag).toBe('FT-2');
    expect(withPower.suspects[0].equivalent).toEqual([]);
    expectClose(withPower.suspects[0].bias, bias, 1e-6, 'bias, kg/s');
    // Without it one balance is left at the turbine, and a bias in any of its three meters looks the same.
    const without = flowsOnly(bias);
    expect(without.global.passed).toBe(false);
    expect([without.suspects[0]?.tag, ...(without.suspects[0]?.equivalent ?? [])].sort()).toEqual(['FT-1', 'FT-2', 'FT-3']);
  });

  test('without the condensate meter the power meter determines the condensed flow: (P - a1 m1) / a2, by hand', async () => {
    const { reconcile, truePower } = await setUp();
    void reconcile;
    const text = `${(await import('node:fs')).readFileSync(MILL, 'utf8')}${METERS.replace('  - { tag: FT-3, unit: tg1, measures: condensate, uncertainty: 2 % }\n', '').replace('FT-1, unit: tg1, measures: steam', 'FT-1, unit: prv_hp_mp, measures: steam')}`;
    const loaded = loadCaseText(text, 'mill.yaml');
    if (!loaded.ok) throw new Error('does not load');
    const network = streamNetwork(loaded.plant);
    const meters: Meter[] = resolveMeters(text).meters;
    const flows = meterStreams(meters, network);
    const power = powerMeters(meters, network);
    const relation = network.power.get('tg1')!;
    const a1 = relation.terms.get(streamIndex(network, 'tg1->mp:extraction'))!;
    const a2 = relation.terms.get(streamIndex(network, 'tg1->deaerator:condensate'))!;
    const readings = new Map<string, AveragedReading>([
      ['FT-1', { tag: 'FT-1', value: 5, count: 1, drift: null, line: 1 }],
      ['FT-2', { tag: 'FT-2', value: 28 / 3.6, count: 1, drift: null, line: 1 }],
      ['JT-1', { tag: 'JT-1', value: truePower, count: 1, drift: null, line: 1 }],
    ]);
    const outcome = reconcilePlant(loaded.plant, flows.metered, readings, {}, network, { power: power.metered });
    const condensed = outcome.streams.find((stream) => stream.id === 'tg1->deaerator:condensate')!;
    const inlet = outcome.streams.find((stream) => stream.id === 'hp->tg1:steam')!;
    expect(condensed.observable).toBe(true);
    expectClose(condensed.value!, (truePower - a1 * (28 / 3.6)) / a2, 1e-9, 'condensed flow');
    expectClose(inlet.value!, 28 / 3.6 + (truePower - a1 * (28 / 3.6)) / a2, 1e-9, 'inlet flow');
    // Nothing checks the power meter here: it is the only reading on the condensed flow.
    expect(outcome.meters.find((meter) => meter.tag === 'JT-1')!.redundant).toBe(false);
  });

  test('a power meter on a header, a second one on the same turbine, or one with "to", is refused at its line', async () => {
    const base = (await import('node:fs')).readFileSync(MILL, 'utf8');
    const text = `${base}
meters:
  - { tag: JT-1, unit: hp, measures: power, uncertainty: 1 % }
  - { tag: JT-2, unit: tg1, measures: power, uncertainty: 1 % }
  - { tag: JT-3, unit: tg1, measures: power, uncertainty: 20 kW }
  - { tag: JT-4, unit: bpt1, measures: power, to: lp, uncertainty: 1 % }
`;
    const loaded = loadCaseText(text, 'mill.yaml');
    if (!loaded.ok) throw new Error('does not load');
    const { meters, issues: meterIssues } = resolveMeters(text);
    expect(meterIssues).toEqual([]);
    expect(meters.find((meter) => meter.tag === 'JT-3')!.absoluteUncertainty).toBe(20);
    const { issues } = powerMeters(meters, streamNetwork(loaded.plant));
    const line = (tag: string) => base.split('\n').length + 1 + ['JT-1', 'JT-2', 'JT-3', 'JT-4'].indexOf(tag) + 1;
    expect(issues.map((issue) => [issue.line, issue.message])).toEqual([
      [line('JT-1'), 'power meter JT-1 names "hp", which is not a turbine; expected a turbine: "tg1", "bpt1"'],
      [line('JT-3'), 'power meters JT-2 and JT-3 both read turbine tg1; keep one, or combine their readings'],
      [line('JT-4'), 'power meter JT-4: "to" picks a stream, and a power meter reads the turbine bpt1 itself; leave "to" out'],
    ]);
  });
});
