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
 * Largest relative difference between the straight pieces and the curve the
 * builder accepts. Fuel = steam x heat / efficiency(load) bends between table
 * points, so each span is cut into equal pieces until every chord is within
 * this of the curve; half the 0.1 % the audit allows (verify/tolerances.ts).
 */
export const FUEL_CURVE_ACCURACY = 5e-4;

/** Most pieces one span of the table is cut into. */
const MOST_PIECES_PER_SPAN = 64;

/**
 * Fuel against steam through the table's loads between min and max steam:
 * fuel = steam x heatPerKg / efficiency(load), with extra breakpoints so that
 * the straight pieces stay within FUEL_CURVE_ACCURACY of the curve.
 */
export function fuelCurve(table: readonly EfficiencyPoint[], minSteam: number, maxSteam: number, heatPerKg: number): FuelCurve {
  const loads = new Set<number>([minSteam / maxSteam, 1]);
  for (const point of table) if (point.load > minSteam / maxSteam && point.load < 1) loads.add(point.load);
  const spans = [...loads].sort((a, b) => a - b);
  const fuelAt = (load: number): number => (load === 0 ? 0 : (load * maxSteam * heatPerKg) / efficiencyAt(table, load));
  const sorted: number[] = [spans[0]];
  for (let index = 1; index < spans.length; index += 1) {
    const from = spans[index - 1];
    const to = spans[index];
    const pieces = piecesFor(from, to, fuelAt);
    for (let k = 1; k <= pieces; k += 1) sorted.push(k === pieces ? to : from + ((to - from) * k) / pieces);
  }
  const steam = sorted.map((load) => load * maxSteam);
  const fuel = sorted.map(fuelAt);
  let convex = true;
  for (let index = 2; index < steam.length; index += 1) {
    const before = (fuel[index - 1] - fuel[index - 2]) / (steam[index - 1] - steam[index - 2]);
    const after = (fuel[index] - fuel[index - 1]) / (steam[index] - steam[index - 1]);
    if (after < before - 1e-9 * Math.abs(before)) convex = false;
  }
  return { steam, fuel, convex };
}

/** Fewest equal pieces of [from, to] whose chords stay within FUEL_CURVE_ACCURACY of the curve. */
function piecesFor(from: number, to: number, fuelAt: (load: number) => number): number {
  for (let pieces = 1; pieces < MOST_PIECES_PER_SPAN; pieces += 1) {
    if (chordError(from, to, pieces, fuelAt) <= FUEL_CURVE_ACCURACY) return pieces;
  }
  return MOST_PIECES_PER_SPAN;
}

/** Largest relative chord error over equal pieces, sampled finely inside each piece. */
export function chordError(from: number, to: number, pieces: number, fuelAt: (load: number) => number): number {
  const SAMPLES = 16;
  let worst = 0;
  for (let k = 0; k < pieces; k += 1) {
    const a = from + ((to - from) * k) / pieces;
    const b = from + ((to - from) * (k + 1)) / pieces;
    const fa = fuelAt(a);
    const fb = fuelAt(b);
    for (let j = 1; j < SAMPLES; j += 1) {
      const load = a + ((b - a) * j) / SAMPLES;
      const curve = fuelAt(load);
      if (curve <= 0) continue;
      const chord = fa + ((fb - fa) * j) / SAMPLES;
      worst = Math.max(worst, Math.abs(chord - curve) / curve);
    }
  }
  return worst;
}
