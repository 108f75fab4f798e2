// A flash tank's makeup preheater: blowdown liquid on its way to drain warms
// the makeup water. Its duty is checked against IF97 worked apart from the
// solve, and the independent audit closes the tank and the deaerator with the
// heat crossing between them (entropy generation >= 0 in both).
import { describe, expect, test } from 'vitest';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { auditPlant, solvedPlantFromReports } from '../../src/plant/verify/index.js';
import { saturatedLiquid, statePT } from '../../src/properties/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { load } from '../savings/helpers/solvedSaving.js';

const plantText = (preheater: string, makeup = '15 degC') => `format_version: 1
name: Blowdown preheater works (invented)
site:
  atmospheric_pressure: 101.325 kPa
  ambient_temperature: 15 degC
  makeup_water: { temperature: ${makeup}, cost: 0.5 USD/t }
  currency: USD
  units: si
fuels:
  - { id: gas, price: 8 USD/GJ, basis: HHV, co2: 56 kg/GJ }
power: { site_demand: 0 kW, import: { price: 100 USD/MWh, max: 2 MW } }
headers:
  - { id: hp, pressure: 12 barg, state: floating, venting: forbidden }
  - { id: lp, pressure: 1.5 barg, state: floating, venting: allowed }
boilers:
  - { id: boiler, header: hp, fuels: [gas], steam: { max: 40 t/h }, outlet_temperature: saturated, efficiency: 84 %, blowdown: 5 %, blowdown_to: bd_tank, can_switch_off: false }
letdowns:
  - { id: prv, from: hp, to: lp, capacity: 20 t/h }
users:
  - { id: process, header: hp, steam: 20 t/h, condensate: { return: 50 %, temperature: 90 degC, to: deaerator } }
flash_tanks:
  - { id: bd_tank, pressure: 1.7 barg, vapour_to: lp, liquid_to: drain${preheater} }
deaerator: { pressure: 0.3 barg, heating_steam: lp, vent: 0.1 %, feedwater_pumps: none }
`;

async function solved(text: string) {
  const plant = load(text).plant;
  const outcome = await solvePlant(plant);
  if (!outcome.ok) throw new Error(outcome.message);
  return { plant, outcome, result: plantResult(outcome) };
}

describe('makeup preheater', () => {
  test('its duty is the tank liquid cooled to the leaving temperature, and the audit closes', async () => {
    const { plant, outcome, result } = await solved(plantText(', makeup_preheater: { leaving_temperature: 35 degC }'));
    const tank = result.units.find((unit) => unit.id === 'bd_tank')!.values;
    const liquid = Number(tank.liquid_kg_s);
    const tankPressure = plant.flashTanks[0].pressure;
    // By IF97 apart from the solve: saturated liquid at 1.7 barg down to 35 degC at atmospheric pressure.
    const duty = liquid * (saturatedLiquid(tankPressure).h - statePT(0.101325, 308.15).h);
    expect(liquid).toBeGreaterThan(0.01);
    expectClose(Number(tank.makeup_heat_kW), duty, 1e-9, 'preheater duty kW');
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
    const audit = auditPlant(plant, solvedPlantFromReports(result.headers, result.units));
    for (const id of ['bd_tank', 'deaerator']) {
      const unit = audit.units.find((entry) => entry.id === id)!;
      expect(unit.problems, id).toEqual([]);
      expect(unit.energy_relative, id).toBeLessThan(1e-6);
      expect(unit.entropy_generation_kW_K!, id).toBeGreaterThanOrEqual(-1e-9);
    }
  });

  test('it saves the deaerator steam its duty replaces: fuel falls, and the drain carries the duty less', async () => {
    const without = await solved(plantText(''));
    const withPreheater = await solved(plantText(', makeup_preheater: { leaving_temperature: 35 degC }'));
    const duty = Number(withPreheater.result.units.find((unit) => unit.id === 'bd_tank')!.values.makeup_heat_kW);
    const heating = (result: typeof without.result) => Number(result.units.find((unit) => unit.id === 'deaerator')!.values.heating_steam_kg_s);
    expect(heating(withPreheater.result)).toBeLessThan(heating(without.result));
    expect(withPreheater.result.totals.fuel_kW).toBeLessThan(without.result.totals.fuel_kW);
    // Fuel saved lies between the duty over the boiler's efficiency times (1 -/+ 15 %): the steam
    // it displaces comes through the letdown at the boiler's enthalpy, with its blowdown.
    const saved = without.result.totals.fuel_kW - withPreheater.result.totals.fuel_kW;
    expect(saved).toBeGreaterThan((duty / 0.84) * 0.85);
    expect(saved).toBeLessThan((duty / 0.84) * 1.15);
  });
});
