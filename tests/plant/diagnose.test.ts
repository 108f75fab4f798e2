import { describe, expect, it } from 'vitest';
import { solvePlant } from '../../src/plant/index.js';
import { loadPlant, smallCase } from './helpers/cases.js';

// A condensing turbine on the main header that may switch off.
const turbine = (sectionFlow: string): string => `turbines:
  - id: ct1
    inlet: main
    stages:
      - { condenser_pressure: 0.1 bara, isentropic_efficiency: 70 %, section_flow: ${sectionFlow} }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    can_switch_off: true
    drives: generator
users:
`;

describe('diagnose: the limits that matter to the shortfall', () => {
  it('lists the boiler at its maximum and not the stopped turbine that cannot help', async () => {
    // Running the turbine would draw at least 5 t/h more from the header that is
    // short, so the relaxed solution stops it; starting it cannot help.
    const text = smallCase({ boilerMax: '10 t/h', userSteam: '30 t/h' }).replace('users:\n', turbine('{ min: 5 t/h }'));
    const outcome = await solvePlant(loadPlant(text));
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.reason).toBe('infeasible');
    const diagnosis = outcome.diagnosis!;
    expect(diagnosis.binding.map((entry) => entry.id)).toEqual(['b1']);
    expect(diagnosis.binding[0].limits).toEqual(['at maximum steam']);
    // The turbine sits stopped in the relaxed solution, but starting it would not help.
    expect(diagnosis.irrelevant).toEqual([{ id: 'ct1', limits: ['stopped'] }]);
    expect(outcome.message).toMatch(/Limits reached: b1 at maximum steam\.$/);
    expect(outcome.message).not.toMatch(/ct1/);
  });

  it('lists a stopped unit where starting it would help', async () => {
    // 12 MW asked, 10 MW may be bought. The turbine could make the rest from spare
    // boiler steam, but its minimum of 40 t/h through the blades is more than the
    // boiler can spare and would make far more power than the site can use: the
    // relaxed solution keeps it stopped. Started below that minimum, it would help.
    const text = smallCase()
      .replace('site_demand: 0 kW', 'site_demand: 12 MW')
      .replace('users:\n', turbine('{ min: 40 t/h }'));
    const outcome = await solvePlant(loadPlant(text));
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    const diagnosis = outcome.diagnosis!;
    expect(diagnosis.shortfalls.map((item) => item.node)).toEqual(['site power']);
    expect(diagnosis.binding).toEqual([
      { id: 'ct1', limits: ['stopped'] },
      { id: 'grid', limits: ['import at its limit'] },
    ]);
    expect(outcome.message).toMatch(/Limits reached: ct1 stopped; grid import at its limit\.$/);
  });
});
