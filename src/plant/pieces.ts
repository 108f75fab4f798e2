// Piecewise-linear fuel curves from a boiler's efficiency table.
import type { EfficiencyPoint } from '../model/index.js';

/** Efficiency at a load, linear between table points and flat beyond its ends. */
export function efficiencyAt(table: readonly EfficiencyPoint[], load: number): number {
  if (table.length === 0) throw new Error('an efficiency table needs at least one point.');
  if (load <= table[0].load) return table[0].efficiency;
  for (let index = 1; index < table.length; index += 1) {
    const upper = table[index];
    if (load <= upper.load) {
      const lower = table[index - 1];
      const share = (load - lower.load) / (upper.load - lower.load);
      return lower.efficiency + share * (upper.efficiency - lower.efficiency);
    }
  }
  return table[table.length - 1].efficiency;
}

export interface FuelCurve {
  /** steam flows at the breakpoints, kg/s, increasing */
  steam: number[];
  /** fuel at the breakpoints, kW */
  fuel: number[];
  /** whether the incremental fuel rate never falls (the curve is convex) */
  convex: boolean;
}

/**
 * Fuel against steam through the table's loads between min and max steam:
 * fuel = steam x heatPerKg / efficiency(load).
 */
export function fuelCurve(table: readonly EfficiencyPoint[], minSteam: number, maxSteam: number, heatPerKg: number): FuelCurve {
  const loads = new Set<number>([minSteam / maxSteam, 1]);
  for (const point of table) if (point.load > minSteam / maxSteam && point.load < 1) loads.add(point.load);
  const sorted = [...loads].sort((a, b) => a - b);
  const steam = sorted.map((load) => load * maxSteam);
  const fuel = sorted.map((load, index) => (load === 0 ? 0 : (steam[index] * heatPerKg) / efficiencyAt(table, load)));
  let convex = true;
  for (let index = 2; index < steam.length; index += 1) {
    const before = (fuel[index - 1] - fuel[index - 2]) / (steam[index - 1] - steam[index - 2]);
    const after = (fuel[index] - fuel[index - 1]) / (steam[index] - steam[index - 1]);
    if (after < before - 1e-9 * Math.abs(before)) convex = false;
  }
  return { steam, fuel, convex };
}
