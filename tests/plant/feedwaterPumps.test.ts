// Feedwater pump work: a listed default when no pump is described, and left
// out when the case says feedwater_pumps: none.
import { describe, expect, it } from 'vitest';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { saturatedLiquid } from '../../src/properties/index.js';
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
});
