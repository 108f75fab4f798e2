// The ways to end a vent that change what is there, each an overlay proven by
// solving: a higher set point where spray feeds the vented header, and a lower
// back-pressure for a turbine that must pass steam into it. The works is
// invented: a back-pressure turbine that may not pass less than 20 t/h
// exhausts into a controlled low-pressure header held at 150 degC by spray,
// which needs about 12 t/h; the header below it is fed from the top header
// through its own letdown.
import { describe, expect, test } from 'vitest';
import { saturatedLiquid, saturatedVapour, statePT, temperaturePH } from '../../src/properties/index.js';
import { findSavings, type MeasureResult } from '../../src/savings/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { load, solvedSaving } from './helpers/solvedSaving.js';
import { caseOpening } from '../helpers/caseText.js';

const text = `${caseOpening({ name: 'Sprayed vent works (invented)', makeupCost: 0.8, fuelPrice: 10, co2: 56 })}power: { site_demand: 3 MW, import: { price: 120 USD/MWh, max: 10 MW } }
headers:
  - { id: hp, pressure: 40 barg, state: controlled, temperature: 400 degC, venting: forbidden }
  - { id: lp, pressure: 3 barg, state: controlled, temperature: 150 degC, venting: allowed }
  - { id: llp, pressure: 0.8 barg, state: floating, venting: allowed }
boilers:
  - { id: boiler, header: hp, fuels: [gas], steam: { min: 5 t/h, max: 80 t/h }, outlet_temperature: 400 degC, efficiency: 85 %, blowdown: 2 %, can_switch_off: false }
turbines:
  - id: bpt
    inlet: hp
    stages: [{ to: lp, isentropic_efficiency: 70 %, section_flow: { min: 20 t/h, max: 30 t/h } }]
    can_switch_off: false
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 30 t/h }
  - { id: prv_low, from: hp, to: llp, capacity: 40 t/h }
users:
  - { id: dryer, header: lp, steam: 9 t/h, condensate: { return: 70 %, temperature: 110 degC, to: deaerator } }
  - { id: heater, header: llp, steam: 25 t/h, condensate: { return: 80 %, temperature: 95 degC, to: deaerator } }
deaerator: { pressure: 0.3 barg, heating_steam: lp, vent: 0.2 %, feedwater_pumps: none }
scenarios:
  - { id: day, hours: 5000 }
  - { id: night, hours: 3000, changes: { users: [{ id: heater, steam: 30 t/h }] } }
`;

describe('ways to end a vent, as overlays', async () => {
  const loaded = load(text);
  const savings = await findSavings(text, loaded.plant, loaded.variants, { workers: 1 });
  const find = (id: string): MeasureResult => {
    const found = savings.measures.find((entry) => entry.id === id);
    if (!found) throw new Error(`no measure ${id}; found ${savings.measures.map((entry) => entry.id).join(', ')}`);
    return found;
  };

  test('the vent is found, with the spray and the turbine\'s minimum in its cause', () => {
    expect(savings.vents[0].where).toBe('lp');
    expect(savings.vents[0].cause).toMatch(/spray/);
    expect(savings.vents[0].cause).toMatch(/bpt/);
  });

  test('a higher set temperature: 2 K below what the exhaust arrives at unsprayed, fewer tonnes vented, and two solves agree to the cent', async () => {
    const measure = find('set_point_lp');
    expect(measure.kind).toBe('ventSetPoint');
    // The exhaust by IF97 apart from the solver: 70 % of the isentropic drop from 40 barg, 400 degC to 3 barg.
    // The isentropic end point is wet at 4 bar: x = (s - s_f) / (s_g - s_f).
    const inlet = statePT(4.101325, 673.15);
    const [liquid, vapour] = [saturatedLiquid(0.401325), saturatedVapour(0.401325)];
    const h2s = liquid.h + ((inlet.s - liquid.s) / (vapour.s - liquid.s)) * (vapour.h - liquid.h);
    const exhaustT = temperaturePH(0.401325, inlet.h - 0.7 * (inlet.h - h2s));
    const written = (measure.changes.headers as { temperature: string }[])[0].temperature;
    // The only unsprayed inflow in the scenario where lp is coolest is the exhaust (the letdown is shut): 1e-6 K.
    expectClose(Number.parseFloat(written), exhaustT - 2, 1e-6, 'new set temperature K');
    if (!measure.result.ok) throw new Error(measure.result.reason);
    expect(measure.result.physical.vented_less_t_per_h).toBeGreaterThan(0.5);
    expect(measure.result.annual_saving).toBeCloseTo(await solvedSaving(text, measure.changes), 2);
  });

  test('a lower back-pressure: the turbine exhausts to the header below, the vent ends, and two solves agree to the cent', async () => {
    const measure = find('lower_back_pressure_bpt');
    expect(measure.kind).toBe('ventBackPressure');
    expect(measure.changes).toEqual({ turbines: [{ id: 'bpt', stages: [{ to: 'llp', isentropic_efficiency: '70 %', section_flow: { min: '20 t/h', max: '30 t/h' } }] }] });
    if (!measure.result.ok) throw new Error(measure.result.reason);
    expect(measure.result.physical.generated_more_MW).toBeGreaterThan(0);
    // Every tonne the header vented in the base ends (the header below takes the whole minimum
    // flow); the deaerator's vent, 0.2 % of the feedwater, moves with the boiler's steam too: 0.5 %.
    const vented = savings.vents[0].average_kg_s * 3.6;
    expect(measure.result.physical.vented_less_t_per_h).toBeGreaterThanOrEqual(vented * (1 - 1e-9));
    expectClose(measure.result.physical.vented_less_t_per_h, vented, 0.005, 'vent ended t/h');
    expect(measure.result.annual_saving).toBeCloseTo(await solvedSaving(text, measure.changes), 2);
  });

  test('the vent finding lists both among its measures; the roadmap applies at most one of the turbine ways', () => {
    expect(savings.vents[0].measures).toEqual(expect.arrayContaining(['set_point_lp', 'lower_back_pressure_bpt']));
    const turbineWays = savings.roadmap.filter((step) => ['lower_back_pressure_bpt', 'condensing_tg_lp'].includes(step.measure));
    expect(turbineWays.length).toBeLessThanOrEqual(1);
  });
});
