// Feedwater pump work: a listed default when no pump is described, left
// out when the case says feedwater_pumps: none, and each pump at its own
// efficiency when several share the lift.
import { describe, expect, it } from 'vitest';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { auditPlant, solvedPlantFromReports } from '../../src/plant/verify/index.js';
import { saturatedLiquid, saturatedVapour } from '../../src/properties/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant, smallCase } from './helpers/cases.js';

describe('feedwater pump work', () => {
  it('with no pumps described it is a listed default: v dp at 100 %, bought as electricity', async () => {
    const plant = loadPlant(smallCase());
    expect(plant.defaults.find((entry) => entry.path === 'deaerator.feedwater_pumps')?.value).toBe('pump work at 100 % efficiency, bought as electricity');
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    const feed = Number(result.units.find((unit) => unit.id === 'deaerator')!.values.feedwater_kg_s);
    // By hand: v_f (p_boiler - p_da) with v_f of saturated liquid at 0.2 barg, 10 barg boiler.
    const liquid = saturatedLiquid(0.121325);
    expectClose(Number(result.units.find((unit) => unit.id === 'deaerator')!.values.pump_shaft_kW), feed * liquid.v * (1.101325 - 0.121325) * 1000, 1e-9, 'pump work');
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
  });

  it('feedwater_pumps: none leaves it out, with no default listed, and the audit agrees', async () => {
    const plant = loadPlant(smallCase().replace('  vent: 0 %\n', '  vent: 0 %\n  feedwater_pumps: none\n'));
    expect(plant.deaerator.pumpWork).toBe(false);
    expect(plant.defaults.some((entry) => entry.path === 'deaerator.feedwater_pumps')).toBe(false);
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    expect(Number(plantResult(outcome).units.find((unit) => unit.id === 'deaerator')!.values.pump_shaft_kW)).toBe(0);
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
  });

  // Two motor-driven pumps, the less efficient listed first. Before each pump's
  // own efficiency was used, every pump was taken at the first one's 60 %.
  const twoPumps = (first: string, second: string): string =>
    smallCase().replace('  vent: 0 %\n', `  vent: 0 %\n  feedwater_pumps:\n    - { id: pa, efficiency: ${first}, motor_efficiency: 95 % }\n    - { id: pb, efficiency: ${second}, motor_efficiency: 95 % }\n`);

  it('runs the more efficient pump, at its own efficiency, and the boiler takes the feedwater that pump delivers', async () => {
    const plant = loadPlant(twoPumps('60 %', '80 %'));
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    const deaerator = result.units.find((unit) => unit.id === 'deaerator')!.values;
    const boiler = result.units.find((unit) => unit.id === 'b1')!.values;
    // By hand from IF97: saturated liquid at the deaerator (0.2 barg), lifted
    // to the 10 barg boiler: w = v_f dp / eta, all of it ending in the water.
    const liquid = saturatedLiquid(0.121325);
    const liftPerKg = liquid.v * (1.101325 - 0.121325) * 1000;
    const feed = Number(deaerator.feedwater_kg_s);
    expectClose(Number(deaerator['pump_shaft_kW:pb']), (feed * liftPerKg) / 0.8, 1e-9, 'pb shaft power');
    expect(Number(deaerator['pump_shaft_kW:pa'])).toBeCloseTo(0, 9);
    expectClose(Number(deaerator.pump_motor_kW), (feed * liftPerKg) / 0.8 / 0.95, 1e-9, 'motor power');
    expect(deaerator.pump_mean_efficiency).toBe(0.8);
    // Boiler fuel: S h_g(10 barg) - F (h_f + v dp / 0.8), over its 80 % (no blowdown).
    const steam = Number(boiler.steam_kg_s);
    expectClose(Number(boiler.fuel_kW), (steam * saturatedVapour(1.101325).h - feed * (liquid.h + liftPerKg / 0.8)) / 0.8, 1e-9, 'boiler fuel');
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
  });

  it('the independent audit names the feedwater pumps when a pump share does not match the feedwater lifted', async () => {
    const plant = loadPlant(twoPumps('60 %', '80 %'));
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    const units = result.units.map((unit) => (unit.id === 'deaerator' ? { ...unit, values: { ...unit.values, 'pump_shaft_kW:pa': 1, 'pump_shaft_kW:pb': Number(unit.values['pump_shaft_kW:pb']) - 1 } } : unit));
    const audit = auditPlant(plant, solvedPlantFromReports(result.headers, units));
    expect(audit.ok).toBe(false);
    expect(audit.failures.join('\n')).toMatch(/feedwater pumps/);
  });

  it('a turbine-driven pump shares the lift with a motor pump; each at its own efficiency, and the audit closes', async () => {
    const plant = loadPlant(
      twoPumps('50 %', '75 %')
        .replace('headers:\n', 'headers:\n  - { id: exhaust, pressure: 3 barg, state: floating, venting: allowed }\n')
        .replace('users:\n', `turbines:
  - id: pump_drive
    inlet: main
    stages:
      - to: exhaust
        isentropic_efficiency: 40 %
        section_flow: { max: 0.5 t/h }
    mechanical_efficiency: 96 %
    drives: pa
users:
  - { id: u_low, header: exhaust, steam: 0.2 t/h, condensate: { return: 0 % } }
`),
    );
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    const result = plantResult(outcome);
    const deaerator = result.units.find((unit) => unit.id === 'deaerator')!.values;
    const turbine = result.units.find((unit) => unit.id === 'pump_drive')!.values;
    const liquid = saturatedLiquid(0.121325);
    const lift = Number(deaerator.feedwater_kg_s) * liquid.v * (1.101325 - 0.121325) * 1000;
    const shareA = Number(deaerator['pump_shaft_kW:pa']);
    const shareB = Number(deaerator['pump_shaft_kW:pb']);
    // The turbine turns pa alone; pa's motor (95 %) may top it up.
    expectClose(shareA, Number(turbine.power_kW) + Number(deaerator['pump_motor_shaft_kW:pa']), 1e-9, 'pa driven by its turbine and motor');
    // Shares times own efficiencies give back the lift the feedwater needs.
    expectClose(shareA * 0.5 + shareB * 0.75, lift, 1e-9, 'lift from the shares');
    expect(shareA).toBeGreaterThan(0);
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
  });
});
