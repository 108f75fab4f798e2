// The drive measures: a machine whose case gives an alternative drive gets the
// swap, proven by solving. Each saving equals two separate solves to the cent,
// and a hand calculation with IF97 apart from the solver: a turbine's steam is
// shaft power / (mechanical x isentropic efficiency x isentropic drop), and a
// motor's electricity is shaft power / its efficiency. The plant is invented:
// steam is bought at a price and what the turbines exhaust is vented, so the
// steam each drive takes is paid for at that price.
import { describe, expect, test } from 'vitest';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { entropyRegion2, saturatedLiquid, statePT, temperaturePSRegion2 } from '../../src/properties/index.js';
import { findSavings, type MeasureResult } from '../../src/savings/index.js';
import { caseOpening } from '../helpers/caseText.js';
import { expectClose } from '../helpers/expectClose.js';
import { load, solvedSaving } from './helpers/solvedSaving.js';

const text = `format_version: 1
name: Two drives works (invented)
site:
  atmospheric_pressure: 101.325 kPa
  ambient_temperature: 15 degC
  makeup_water: { temperature: 15 degC, cost: 0 USD/t }
  currency: USD
  units: si
power: { site_demand: 0 kW, import: { price: 150 USD/MWh, max: 5 MW } }
headers:
  - { id: hp, pressure: 20 barg, state: floating, venting: forbidden }
  - { id: lp, pressure: 3 barg, state: floating, venting: allowed }
steam_imports:
  - { id: supply, header: hp, price: 12 USD/t, max: 30 t/h, temperature: 400 degC }
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 5 t/h }
turbines:
  - id: fan_turbine
    inlet: hp
    stages: [{ to: lp, isentropic_efficiency: 40 % }]
    mechanical_efficiency: 97 %
    can_switch_off: false
    drives: id_fan
machines:
  - { id: cooling_pump, type: pump, shaft_power: 300 kW, motor_efficiency: 94 %, alternative_drive: { turbine_from: hp, turbine_to: lp, isentropic_efficiency: 45 % } }
  - { id: id_fan, type: fan, shaft_power: 200 kW, alternative_drive: { motor_efficiency: 95 % } }
deaerator: { pressure: 0.3 barg, heating_steam: lp, vent: 0.1 %, feedwater_pumps: none }
scenarios:
  - { id: year, hours: 8000 }
`;

/** Steam a back-pressure drive takes for `shaftKW`, kg/s, from 20 barg 400 degC to 3 barg, by IF97 apart from the solver. */
function driveSteam(shaftKW: number, isentropic: number, mechanical: number): number {
  const inlet = statePT(2.101325, 673.15);
  const outletPressure = 0.401325;
  // The isentropic end point is superheated here (s above s_g at 4 bar): region 2 backward T(p, s).
  const T2s = temperaturePSRegion2(outletPressure, inlet.s);
  expectClose(entropyRegion2(outletPressure, T2s), inlet.s, 1e-9, 'isentropic end point');
  const drop = inlet.h - statePT(outletPressure, T2s).h;
  return shaftKW / (mechanical * isentropic * drop);
}

describe('drive measures', async () => {
  const loaded = load(text);
  const savings = await findSavings(text, loaded.plant, loaded.variants, { workers: 1 });
  const find = (kind: string): MeasureResult => {
    const found = savings.measures.find((entry) => entry.kind === kind);
    if (!found) throw new Error(`no ${kind} measure`);
    return found;
  };

  test('a turbine in place of a motor: its saving is the motor\'s electricity less the turbine\'s steam, and two solves agree to the cent', async () => {
    const measure = find('turbineDrive');
    expect(measure.id).toBe('turbine_drive_cooling_pump');
    if (!measure.result.ok) throw new Error(measure.result.reason);
    const steam = driveSteam(300, 0.45, 0.98);
    const hand = 8000 * ((300 / 0.94) * 0.15 - steam * 3.6 * 12);
    // The steam bought also carries the deaerator's and vent's share: none here (no boilers), so 1e-6.
    expectClose(measure.result.annual_saving, hand, 1e-6, 'annual saving USD');
    expect(measure.result.annual_saving).toBeCloseTo(await solvedSaving(text, measure.changes), 2);
  });

  test('a motor in place of a turbine: its saving is the turbine\'s steam less the motor\'s electricity, and two solves agree to the cent', async () => {
    const measure = find('motorDrive');
    expect(measure.changes).toMatchObject({ disable: ['fan_turbine'] });
    if (!measure.result.ok) throw new Error(measure.result.reason);
    const steam = driveSteam(200, 0.4, 0.97);
    const hand = 8000 * (steam * 3.6 * 12 - (200 / 0.95) * 0.15);
    expectClose(measure.result.annual_saving, hand, 1e-6, 'annual saving USD');
    expect(measure.result.annual_saving).toBeCloseTo(await solvedSaving(text, measure.changes), 2);
  });

  test('capital is the shaft power at the case\'s cost per kW', () => {
    expect(find('turbineDrive').capital).toBeCloseTo(300 * 400, 6);
    expect(find('motorDrive').capital).toBeCloseTo(200 * 150, 6);
  });
});

// A feedwater pump with a motor whose case offers a turbine drive: the
// pump's work follows the feedwater, so the drive is sized for the largest
// pumping over the scenarios, and the changed plant buys none of the motor's
// electricity. Invented plant; checks by IF97 apart from the solver.
const pumpText = `${caseOpening({ name: 'Pump drive works (invented)', makeupCost: 0.5, fuelPrice: 8, co2: 0 })}power: { site_demand: 0 kW, import: { price: 150 USD/MWh, max: 5 MW } }
headers:
  - { id: hp, pressure: 40 barg, state: controlled, temperature: 400 degC, venting: forbidden }
  - { id: lp, pressure: 3 barg, state: floating, venting: allowed }
boilers:
  - { id: boiler, header: hp, fuels: [gas], steam: { min: 5 t/h, max: 60 t/h }, outlet_temperature: 400 degC, efficiency: 85 %, blowdown: 2 %, can_switch_off: false }
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 40 t/h }
users:
  - { id: process, header: lp, steam: 25 t/h, condensate: { return: 60 %, temperature: 90 degC, to: deaerator } }
deaerator:
  pressure: 0.3 barg
  heating_steam: lp
  vent: 0.1 %
  feedwater_pumps:
    - { id: bfw_pump, efficiency: 70 %, motor_efficiency: 94 %, alternative_drive: { turbine_from: hp, turbine_to: lp, isentropic_efficiency: 45 % } }
scenarios:
  - { id: winter, hours: 4000 }
  - { id: summer, hours: 4000, changes: { users: [{ id: process, steam: 15 t/h }] } }
`;

describe('drive measures: a feedwater pump', async () => {
  const loaded = load(pumpText);
  const savings = await findSavings(pumpText, loaded.plant, loaded.variants, { workers: 1 });
  const measure = savings.measures.find((entry) => entry.id === 'turbine_drive_bfw_pump');
  const shaftOf = async (plant: typeof loaded.plant): Promise<number> => {
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    return plantResult(outcome).units.find((unit) => unit.id === 'deaerator')!.values.pump_shaft_kW as number;
  };

  test('a turbine in place of the pump\'s motor: sized for the largest pumping, no motor electricity bought after, and two solves agree to the cent', async () => {
    if (!measure) throw new Error(`no pump drive measure among ${savings.measures.map((entry) => entry.id).join(', ')}`);
    if (!measure.result.ok) throw new Error(measure.result.reason);
    expect(measure.changes).toMatchObject({ deaerator: { feedwater_pumps: [{ id: 'bfw_pump', motor_efficiency: null }] } });
    const shafts = await Promise.all(loaded.variants.scenarios.map((scenario) => shaftOf(scenario.plant)));
    expect(measure.capital).toBeCloseTo(Math.max(...shafts) * 400, 6);
    // After the change no electricity goes to the pump: imports fall by each scenario's motor input, hours-weighted.
    const motorMW = shafts.reduce((total, shaft) => total + shaft / 0.94 / 1000, 0) / shafts.length;
    expectClose(measure.result.physical.imported_less_MW, motorMW, 1e-6, 'electricity no longer bought, MW');
    expect(measure.result.annual_saving).toBeCloseTo(await solvedSaving(pumpText, measure.changes), 2);
  });

  test('the pump\'s shaft power is v dp x feedwater / efficiency, by IF97 apart from the solver', async () => {
    const winter = loaded.variants.scenarios.find((scenario) => scenario.id === 'winter')!.plant;
    const outcome = await solvePlant(winter);
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    // The boiler's feedwater: steam / (1 - blowdown share).
    const feedwater = (result.units.find((unit) => unit.id === 'boiler')!.values.steam_kg_s as number) / (1 - 0.02);
    // 0.3 barg and 40 barg at 101.325 kPa: 0.131325 and 4.101325 MPa.
    const v = saturatedLiquid(0.131325).v;
    const shaft = (v * (4.101325 - 0.131325) * 1000 * feedwater) / 0.7;
    expectClose(result.units.find((unit) => unit.id === 'deaerator')!.values.pump_shaft_kW as number, shaft, 1e-9, 'pump shaft kW');
  });
});
