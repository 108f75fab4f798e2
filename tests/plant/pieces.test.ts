// The boiler fuel curve in straight pieces against the curve it stands for.
import { describe, expect, it } from 'vitest';
import { FUEL_CURVE_ACCURACY, efficiencyAt, fuelCurve } from '../../src/plant/pieces.js';
import type { EfficiencyPoint } from '../../src/model/index.js';

/** Fuel on the pieces at a steam flow: straight between breakpoints. */
function piecewiseFuel(curve: ReturnType<typeof fuelCurve>, steam: number): number {
  for (let k = 1; k < curve.steam.length; k += 1) {
    if (steam <= curve.steam[k] + 1e-12) {
      const share = (steam - curve.steam[k - 1]) / (curve.steam[k] - curve.steam[k - 1]);
      return curve.fuel[k - 1] + share * (curve.fuel[k] - curve.fuel[k - 1]);
    }
  }
  throw new Error(`steam ${steam} beyond the curve`);
}

// Invented tables: the board-mill demo's four points and a two-point table.
const TABLES: [string, EfficiencyPoint[]][] = [
  ['four points', [{ load: 0.25, efficiency: 0.78 }, { load: 0.5, efficiency: 0.825 }, { load: 0.75, efficiency: 0.84 }, { load: 1, efficiency: 0.835 }]],
  ['two points', [{ load: 0.25, efficiency: 0.79 }, { load: 1, efficiency: 0.85 }]],
  ['steep two points', [{ load: 0.2, efficiency: 0.6 }, { load: 1, efficiency: 0.88 }]],
];

describe('fuelCurve', () => {
  for (const [name, table] of TABLES) {
    it(`${name}: fuel on the pieces is within 0.1 % of steam x heat / efficiency(load) at ten loads`, () => {
      const maxSteam = 50;
      const heatPerKg = 2600;
      const curve = fuelCurve(table, 0.2 * maxSteam, maxSteam, heatPerKg);
      for (let k = 0; k < 10; k += 1) {
        // Ten loads between 20 % and 100 %, off the table's points.
        const load = 0.2 + (0.8 * (k + 0.37)) / 10;
        const exact = (load * maxSteam * heatPerKg) / efficiencyAt(table, load);
        const pieces = piecewiseFuel(curve, load * maxSteam);
        expect(Math.abs(pieces - exact) / exact, `${name} at load ${load.toFixed(3)}`).toBeLessThanOrEqual(1e-3);
        expect(Math.abs(pieces - exact) / exact, `${name} at load ${load.toFixed(3)}`).toBeLessThanOrEqual(FUEL_CURVE_ACCURACY * 1.01);
      }
    });
  }

  it('a flat efficiency needs one piece: fuel is then linear in steam', () => {
    const curve = fuelCurve([{ load: 1, efficiency: 0.8 }], 10, 50, 2600);
    expect(curve.steam).toEqual([10, 50]);
  });

  it('a two-point table with rising efficiency is cut into several pieces and is not convex', () => {
    const curve = fuelCurve(TABLES[1][1], 12.5, 50, 2600);
    expect(curve.steam.length).toBeGreaterThan(3);
    expect(curve.convex).toBe(false);
  });
});
