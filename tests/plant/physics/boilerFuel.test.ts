import { describe, expect, it } from 'vitest';
import { blowdownFromCycles, blowdownFromFraction, boilerFuel } from '../../../src/plant/physics/boilerFuel.js';
import { saturatedVapour, statePT } from '../../../src/properties/index.js';

const psig = (value: number): number => (value * 6.894757293168 + 101.325) / 1000;
const degF = (value: number): number => ((value + 459.67) * 5) / 9;
const KJ_PER_KG_PER_BTU_PER_LB = 2.326;

describe('blowdown', () => {
  it('COC 20 and 40,000 lb/h of steam give 2,105 lb/h of blowdown (US DOD UFC 3-240-13FN)', () => {
    const blowdown = blowdownFromCycles(40_000, 20);
    expect(Math.round(blowdown)).toBe(2105);
    expect(Math.round(40_000 + blowdown)).toBe(42_105);
  });

  it('a blowdown fraction of feedwater equal to 1/COC gives the same flow', () => {
    expect(blowdownFromFraction(40_000, 1 / 20)).toBeCloseTo(blowdownFromCycles(40_000, 20), 9);
  });

  it('refuses cycles of concentration at or below 1', () => {
    expect(() => blowdownFromCycles(10, 1)).toThrow(/must be above 1/);
  });
});

describe('boilerFuel(...)', () => {
  // US DOE Steam Tip Sheet #15: energy to make one pound of saturated steam from
  // feedwater, Btu/lb. Older tables: agreement to 0.5 % (about 5 Btu/lb).
  const TIP_SHEET_15 = [
    { steamPsig: 150, feedwaterF: 50, btuPerLb: 1178 },
    { steamPsig: 150, feedwaterF: 250, btuPerLb: 977 },
    { steamPsig: 450, feedwaterF: 100, btuPerLb: 1137 },
    { steamPsig: 600, feedwaterF: 200, btuPerLb: 1034 },
  ];
  for (const row of TIP_SHEET_15) {
    it(`energy per lb of ${row.steamPsig} psig steam from ${row.feedwaterF} degF feedwater is ${row.btuPerLb} Btu/lb (DOE Tip Sheet #15)`, () => {
      const p = psig(row.steamPsig);
      const steam = saturatedVapour(p).h;
      const feedwater = statePT(p, degF(row.feedwaterF)).h;
      const perKg = boilerFuel(1, steam, 0, 0, feedwater, 1);
      expect(Math.abs(perKg / KJ_PER_KG_PER_BTU_PER_LB / row.btuPerLb - 1)).toBeLessThan(0.005);
    });
  }

  it('divides the heat added by the efficiency and counts the blowdown heat', () => {
    expect(boilerFuel(10, 3000, 0.5, 1000, 500, 0.8)).toBeCloseTo((10 * 2500 + 0.5 * 500) / 0.8, 9);
  });
});
