import { describe, expect, test } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { expandIsentropic } from '../../src/plant/index.js';
import { enthalpyPT, saturatedLiquid, statePT } from '../../src/properties/index.js';
import { compareScenarios, runSweep } from '../../src/scenarios/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { SWITCH_CASE, SWITCH_CASE_WITH_SHORTFALL } from './helpers/switchCase.js';

const ATMOSPHERE_MPa = 0.101325;
const hpPressure = 4.0 + ATMOSPHERE_MPa;
const lpPressure = 1.0 + ATMOSPHERE_MPa;
const deaeratorPressure = 0.02 + ATMOSPHERE_MPa;

/**
 * The import price at which the turbine starts to carry flow, by hand.
 *
 * Per kg of steam the LP header must receive at h_L, with spray at h_s (saturated
 * liquid at the deaerator, as the model sprays it), the letdown path takes
 * x_v = (h_L - h_s)/(h_H - h_s) kg of HP header steam at h_H and the turbine path
 * x_t = (h_L - h_s)/(h_X - h_s), h_X its exhaust (above h_L). The turbine path
 * makes x_t (h_H - h_X) eta_m eta_g of electricity and draws x_t - x_v more HP
 * steam; since x_t - x_v = x_t (h_H - h_X)/(h_H - h_s), the power made per kg of
 * extra HP steam is (h_H - h_s) eta_m eta_g. Each kg of HP steam is y = (h_H - h_s)/
 * (h_B - h_s) kg from the boiler (outlet h_B) and the rest spray; boiler steam
 * costs fuel (h_B - h_fw)/eta_b, h_fw = h_s + w_p, and its feed pump's work
 * w_p = v_f dp is bought as power (no pumps are described, so at 100 %).
 * Dividing by y, the turbine pays when
 *   price x [(h_B - h_s) eta_m eta_g - w_p] > fuel price x (h_B - h_fw)/eta_b.
 * The turbine's efficiency, h_X and h_L cancel out. The deaerator's heating
 * steam depends only on h_L, the same on both paths; makeup is zero on both.
 * Near 3.6 GJ/MWh x fuel price / (eta_b eta_m eta_g) = 58.60 USD/MWh; with the
 * pump's work, 58.61 USD/MWh.
 */
function switchingPrice(): { pricePerMWh: number; exhaustH: number; lpH: number } {
  const boilerH = enthalpyPT(hpPressure, 425 + 273.15);
  const lpH = enthalpyPT(lpPressure, 230 + 273.15);
  const liquid = saturatedLiquid(deaeratorPressure);
  const pumpWork = liquid.v * (hpPressure - deaeratorPressure) * 1000;
  const feedH = liquid.h + pumpWork;
  const fuelPerKJ = 12 / 1e6;
  const perKJ = (fuelPerKJ * (boilerH - feedH) / 0.8) / ((boilerH - liquid.h) * 0.97 * 0.95 - pumpWork);
  const exhaustH = expandIsentropic(statePT(hpPressure, 420 + 273.15), lpPressure, 0.65).exhaust.h;
  return { pricePerMWh: perKJ * 3.6e6, exhaustH, lpH };
}

interface Step {
  price: number;
  throttle_t_h: number;
}

async function sweepSteps(sweepId: string): Promise<Step[]> {
  const loaded = loadCaseText(SWITCH_CASE, 'switch.yaml');
  if (!loaded.ok) throw new Error(loaded.issues.map((issue) => `${issue.line}:${issue.column} ${issue.message}`).join('\n'));
  const definition = loaded.variants.sweeps.find((entry) => entry.id === sweepId)!;
  const sweep = await runSweep(loaded.variants, sweepId, { workers: 1 });
  return sweep.runs.map((run, index) => {
    if (!run.ok) throw new Error(`${sweepId} step ${index} did not solve: ${run.message}`);
    const turbine = run.units.find((unit) => unit.id === 'bptg')!;
    // the resolved price is per kWh; the sweep writes it per MWh
    const price = definition.steps[index].plant.power.import!.price * 1000;
    return { price, throttle_t_h: Number(turbine.values.inlet_kg_s) * 3.6 };
  });
}

/** The last step with the turbine idle and the first with it running. */
function bracket(steps: Step[]): [Step, Step] {
  const first = steps.findIndex((step) => step.throttle_t_h > 1e-6);
  expect(first, 'the turbine runs at some step, and not at the first').toBeGreaterThan(0);
  return [steps[first - 1], steps[first]];
}

describe('runSweep', () => {
  const expected = switchingPrice();

  test('the hand derivation applies: the turbine exhaust is hotter than the LP set point', () => {
    expect(expected.exhaustH).toBeGreaterThan(expected.lpH);
    // Within the feed pump's share (4 kJ/kg in 2800) of the closed form 3.6 GJ/MWh x fuel price / (eta_b eta_m eta_g).
    expectClose(expected.pricePerMWh, (3.6 * 12) / (0.8 * 0.97 * 0.95), 0.005, 'hand-computed switching price, USD/MWh');
  });

  test('a sweep whose switching point is computed by hand switches between the two steps bracketing it', async () => {
    const steps = await sweepSteps('import_price');
    expect(steps).toHaveLength(19);
    const [below, above] = bracket(steps);
    expect(below.price).toBeLessThan(expected.pricePerMWh);
    expect(above.price).toBeGreaterThan(expected.pricePerMWh);
    // Idle below the switch, at its 15 t/h limit above it: a clean switch, not a drift.
    for (const step of steps) {
      if (step.price < expected.pricePerMWh) expect(step.throttle_t_h, `turbine flow at ${step.price} USD/MWh`).toBeLessThan(1e-6);
      else expectClose(step.throttle_t_h, 15, 1e-6, `turbine flow at ${step.price} USD/MWh, t/h`);
    }
  });

  test('a finer sweep puts the switch within 0.2 USD/MWh of the hand-computed price', async () => {
    const [below, above] = bracket(await sweepSteps('near_switch'));
    expect(below.price).toBeLessThan(expected.pricePerMWh);
    expect(above.price).toBeGreaterThan(expected.pricePerMWh);
    expectClose(above.price - below.price, 0.2, 1e-9, 'bracket width, USD/MWh');
  });
});

describe('compareScenarios', () => {
  test('a scenario that cannot be met is reported by id with the short header; the others solve; no annual total', async () => {
    const loaded = loadCaseText(SWITCH_CASE_WITH_SHORTFALL, 'switch.yaml');
    if (!loaded.ok) throw new Error(loaded.issues.map((issue) => `${issue.line}:${issue.column} ${issue.message}`).join('\n'));
    const comparison = await compareScenarios(loaded.variants, [], { workers: 1 });
    const [normal, overload] = comparison.runs;
    expect(normal.ok).toBe(true);
    expect(overload.ok).toBe(false);
    if (!overload.ok) expect(overload.message).toMatch(/cannot be met: lp is short of/);
    expect(comparison.annual.failed).toEqual(['overload']);
    expect(comparison.annual.cost_per_year).toBeNull();
  });
});
