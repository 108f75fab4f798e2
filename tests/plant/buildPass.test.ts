import { describe, expect, it } from 'vitest';
import { buildPass, contributionsOf, initialHeaderEnthalpy } from '../../src/plant/index.js';
import { loadPlant, smallCase } from './helpers/cases.js';

// One switchable condensing turbine with a minimum flow and a power limit, beside the boiler.
const text = smallCase().replace(
  'users:\n',
  `turbines:
  - id: ct1
    inlet: main
    stages:
      - { condenser_pressure: 0.1 bara, isentropic_efficiency: 70 %, section_flow: { min: 5 t/h, max: 20 t/h } }
    power: { max: 2 MW }
    mechanical_efficiency: 98 %
    generator_efficiency: 96 %
    can_switch_off: true
    drives: generator
users:
`,
);

function pass(relaxUnit?: string) {
  const plant = loadPlant(text);
  const point = { headerEnthalpy: initialHeaderEnthalpy(plant), previous: null, trust: new Map<string, number>() };
  return buildPass(plant, contributionsOf(plant), point, 'minimumCost', { withSlack: true, ...(relaxUnit ? { relaxUnit } : {}) }).context.model;
}

describe('buildPass with a unit relaxed (for the diagnosis)', () => {
  it("drops the unit's limit rows, keeps every other row, and widens its bounds", () => {
    const held = pass();
    const relaxed = pass('ct1');
    for (const row of ['ct1.section1.min', 'ct1.inlet.max', 'ct1.power.max']) {
      expect(held.hasRow(row), row).toBe(true);
      expect(relaxed.hasRow(row), row).toBe(false);
    }
    // Every row of other owners is still there: only the relaxed unit's limits go.
    const dropped = held.rows.filter((row) => !relaxed.hasRow(row.name)).map((row) => row.name);
    expect(dropped.every((name) => name.startsWith('ct1.'))).toBe(true);
    expect(relaxed.rows.length).toBe(held.rows.length - dropped.length);
    // The on/off becomes a continuous choice in [0, 1]; the section's maximum is lifted.
    expect(held.variable('ct1.on').type).toBe('binary');
    expect(relaxed.variable('ct1.on')).toMatchObject({ type: 'continuous', lower: 0, upper: 1 });
    expect(held.variable('ct1.section1').upper).toBeCloseTo(20 / 3.6, 12);
    expect(relaxed.variable('ct1.section1').upper).toBeGreaterThan(100);
    // Other units' variables are untouched.
    expect(relaxed.variable('b1.load1').upper).toBe(held.variable('b1.load1').upper);
  });
});
