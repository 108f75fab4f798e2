// savings: every measure's figure is the difference of two solves, the
// roadmap's last step is the plant with all its measures, a planted vent is
// found first, and a measure that cannot be solved is listed with its reason.
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { caseWithProjects, evaluateChanges, findSavings, measureAsProject, mergeChanges, resolveMeasurePlants, solveBase, type SavingsResult } from '../../src/savings/index.js';
import { load, solvedSaving } from './helpers/solvedSaving.js';
import { caseOpening } from '../helpers/caseText.js';

const creameryText = readFileSync(new URL('../../cases/millbrook-creamery.yaml', import.meta.url), 'utf8');
const creamery = load(creameryText);
const creamerySavings: SavingsResult = await findSavings(creameryText, creamery.plant, creamery.variants, { workers: 1 });

describe('savings on the creamery demo', () => {
  test('finds measures, each solved on every scenario', () => {
    const solved = creamerySavings.measures.filter((entry) => entry.result.ok);
    expect(solved.length).toBeGreaterThanOrEqual(3);
    for (const entry of solved) if (entry.result.ok) expect(entry.result.scenarios.map((run) => run.scenario)).toEqual(creamery.variants.scenarios.map((scenario) => scenario.id));
  });

  test('a measure\'s saving equals the difference of two separate solves, to the cent', async () => {
    for (const entry of creamerySavings.measures.slice(0, 2)) {
      if (!entry.result.ok) throw new Error(entry.result.reason);
      expect(entry.result.annual_saving).toBeCloseTo(await solvedSaving(creameryText, entry.changes), 2);
    }
  });

  test('the roadmap\'s last step equals the case with every one of its measures applied, to the cent', async () => {
    const last = creamerySavings.roadmap.at(-1)!;
    expect(last.applied.length).toBe(creamerySavings.roadmap.length);
    if (!last.result.ok) throw new Error(last.result.reason);
    const changes = mergeChanges(last.applied.map((id) => creamerySavings.measures.find((entry) => entry.id === id)!.changes));
    expect(last.result.annual_saving).toBeCloseTo(await solvedSaving(creameryText, changes), 2);
  });

  test('ranks by NPV by default, best first', () => {
    const npvs = creamerySavings.measures.filter((entry) => entry.result.ok).map((entry) => (entry.result.ok ? entry.result.npv : 0));
    expect(npvs).toEqual([...npvs].sort((a, b) => b - a));
    expect(creamerySavings.measures[0].rank).toBe(1);
  });

  test('each measure written as a project loads back as the same overlay', () => {
    const projects = creamerySavings.measures.map((entry) => measureAsProject(entry, 'USD'));
    const reloaded = load(caseWithProjects(creameryText, projects));
    expect(reloaded.variants.projects.map((project) => project.id)).toEqual(creamerySavings.measures.map((entry) => entry.id));
  });
});

// An invented works with one planted vent: a back-pressure turbine that may
// not pass less than 20 t/h exhausts into a low-pressure header that needs
// about 11 t/h, so the rest is vented in every hour.
const plantedVent = `${caseOpening({ name: 'Planted vent works (invented)', makeupCost: 0.8, fuelPrice: 10, co2: 56 })}power: { site_demand: 3 MW, import: { price: 120 USD/MWh, max: 10 MW } }
headers:
  - { id: hp, pressure: 40 barg, state: controlled, temperature: 400 degC, venting: forbidden }
  - { id: lp, pressure: 3 barg, state: floating, venting: allowed }
boilers:
  - { id: boiler, header: hp, fuels: [gas], steam: { min: 5 t/h, max: 60 t/h }, outlet_temperature: 400 degC, efficiency: 85 %, blowdown: 2 %, can_switch_off: false }
turbines:
  - id: bpt
    inlet: hp
    stages: [{ to: lp, isentropic_efficiency: 70 %, section_flow: { min: 20 t/h, max: 30 t/h } }]
    can_switch_off: false
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 30 t/h }
users:
  - { id: dryer, header: lp, steam: 8 t/h, condensate: { return: 70 %, temperature: 110 degC, to: deaerator } }
absorption_chillers:
  - { id: chw, header: lp, cooling: 1500 kW, capacity: 0 kW, effect: single, electric_chillers: 0.6 kW/TR }
deaerator: { pressure: 0.3 barg, heating_steam: lp, vent: 0.2 %, feedwater_pumps: none }
`;

describe('an invented plant with one planted vent', async () => {
  const loaded = load(plantedVent);
  const savings = await findSavings(plantedVent, loaded.plant, loaded.variants, { workers: 1 });

  test('finds that vent first, with its cause, and ranks a measure that ends it first', () => {
    expect(savings.vents.map((vent) => vent.where)).toEqual(['lp']);
    expect(savings.vents[0].cause).toMatch(/bpt/);
    const first = savings.measures[0];
    expect(first.rank).toBe(1);
    expect(['ventTurbine', 'ventChiller']).toContain(first.kind);
    expect(first.touches).toContain('lp');
    expect(savings.vents[0].measures).toContain(first.id);
    if (!first.result.ok) throw new Error(first.result.reason);
    expect(first.result.physical.vented_less_t_per_h).toBeGreaterThan(1);
  });

  test('offers absorption chilling in place of the electric chillers, which uses the vented steam', () => {
    const chiller = savings.measures.find((entry) => entry.kind === 'ventChiller');
    expect(chiller?.result.ok).toBe(true);
    if (!chiller?.result.ok) return;
    expect(chiller.result.physical.absorption_cooling_more_MW).toBeCloseTo(1.5, 6);
    expect(chiller.result.annual_saving_by_component.power).toBeGreaterThan(0);
  });
});

describe('a measure that cannot be solved', () => {
  test('is listed with its reason and the others still go on', async () => {
    const good = { id: 'good', capital_cost: '1000 USD', life: 10, discount_rate: '10 %', changes: { users: [{ id: 'dryer', condensate: { return: '90 %' } }] } };
    const bad = { id: 'bad', capital_cost: '1000 USD', life: 10, discount_rate: '10 %', changes: { users: [{ id: 'no_such_user', steam: '1 t/h' }] } };
    const plants = resolveMeasurePlants(plantedVent, [good, bad]);
    expect(plants.get('good')?.ok).toBe(true);
    const failed = plants.get('bad')!;
    expect(failed.ok).toBe(false);
    if (!failed.ok) expect(failed.reason).toMatch(/no_such_user/);
    const loaded = load(plantedVent);
    const base = await solveBase(loaded.variants, { workers: 1 });
    const definition = (id: string) => ({ id, name: id, capitalCost: 1000, lifeYears: 10, discountRate: 0.1, fixedOmPerYear: 0 });
    const outcomes = await evaluateChanges(base, [{ definition: definition('good'), plants: plants.get('good')! }, { definition: definition('bad'), plants: failed }], { workers: 1 });
    expect(outcomes[0].ok).toBe(true);
    expect(outcomes[1]).toEqual({ ok: false, reason: failed.ok ? '' : failed.reason });
  });
});

describe('insulation repair', () => {
  // A heat-loss on a floating header makes its steam wetter; a user of a heat
  // duty then draws more of it, so the loss is paid in fuel. With all the
  // condensate back, fuel saved = loss saved / boiler efficiency, within the
  // deaerator's vent (0.1 % of feedwater) and the pump work.
  test('saves the fuel of the heat loss it ends: loss saved / boiler efficiency', async () => {
    const text = `${caseOpening({ name: 'Bare pipe works (invented)', makeupCost: 0.5, fuelPrice: 10, co2: 0 })}power: { site_demand: 0 kW, import: { price: 100 USD/MWh, max: 5 MW } }
headers:
  - { id: main, pressure: 10 barg, state: floating, venting: forbidden, heat_loss: 150 kW }
boilers:
  - { id: boiler, header: main, fuels: [gas], steam: { max: 40 t/h }, outlet_temperature: saturated, efficiency: 85 %, blowdown: 0 %, can_switch_off: false }
users:
  - { id: process, header: main, heat: 7 MW, condensate: { return: 100 %, temperature: 90 degC, to: deaerator } }
deaerator: { pressure: 0.3 barg, heating_steam: main, vent: 0.1 %, feedwater_pumps: none }
insulation_survey:
  - { header: main, bare_length: 120 m, heat_loss_after: 15 kW }
costs:
  insulation: 100 USD/m
`;
    const loaded = load(text);
    const savings = await findSavings(text, loaded.plant, loaded.variants, { workers: 1 });
    const measure = savings.measures.find((entry) => entry.kind === 'insulation')!;
    expect(measure.capital).toBe(12_000);
    if (!measure.result.ok) throw new Error(measure.result.reason);
    // 135 kW less lost, made up at 85 %, at 10 USD/GJ for 8760 h.
    const fuel = (135 / 0.85) * 0.0036 * 10 * 8760;
    expect(Math.abs(measure.result.annual_saving_by_component.fuel - fuel) / fuel).toBeLessThan(0.005);
  });
});
