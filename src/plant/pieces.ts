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
 * points, so each span is cut into pieces, each as long as its chord stays
 * within this of the curve; just inside the 0.1 % the audit allows
 * (verify/tolerances.ts). Fewer pieces mean fewer binaries for a curve that
 * is not convex.
 */
export const FUEL_CURVE_ACCURACY = 9e-4;

/** Most pieces one span of the table is cut into. */
const MOST_PIECES_PER_SPAN = 64;

/**
 * Fuel against steam through the table's loads between min and max steam:
 * fuel = steam x heatPerKg / efficiency(load), with extra breakpoints so that
 * the straight pieces stay within FUEL_CURVE_ACCURACY of the curve.
 */
export function fuelCurve(table: readonly EfficiencyPoint[], minSteam: number, maxSteam: number, heatPerKg: number): FuelCurve {
  const fuelAt = (load: number): number => (load === 0 ? 0 : (load * maxSteam * heatPerKg) / efficiencyAt(table, load));
  const sorted = breakpointLoads(table, minSteam / maxSteam);
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

/**
 * The breakpoint loads of a table from `minLoad` to full load. The chord's
 * relative error does not depend on the steam's heat or the boiler's size
 * (both scale fuel alone), so the loads are found once per table and lowest
 * load, on fuel per unit of both, and kept: every pass of every solve of a
 * plant builds the same curve.
 */
const loadsByTable = new WeakMap<readonly EfficiencyPoint[], Map<number, number[]>>();

function breakpointLoads(table: readonly EfficiencyPoint[], minLoad: number): number[] {
  let byMin = loadsByTable.get(table);
  if (!byMin) loadsByTable.set(table, (byMin = new Map()));
  const known = byMin.get(minLoad);
  if (known) return known;
  const loads = new Set<number>([minLoad, 1]);
  for (const point of table) if (point.load > minLoad && point.load < 1) loads.add(point.load);
  const spans = [...loads].sort((a, b) => a - b);
  const relativeFuel = (load: number): number => (load === 0 ? 0 : load / efficiencyAt(table, load));
  const sorted: number[] = [spans[0]];
  for (let index = 1; index < spans.length; index += 1) sorted.push(...breakpointsFor(spans[index - 1], spans[index], relativeFuel));
  byMin.set(minLoad, sorted);
  return sorted;
}

/**
 * Breakpoints inside [from, to], greedily: each piece runs as far as its chord
 * stays within FUEL_CURVE_ACCURACY (found by bisection), which gives the
 * fewest pieces for a curve that bends one way within the span.
 */
function breakpointsFor(from: number, to: number, fuelAt: (load: number) => number): number[] {
  const points: number[] = [];
  let start = from;
  while (points.length < MOST_PIECES_PER_SPAN) {
    if (chordError(start, to, 1, fuelAt) <= FUEL_CURVE_ACCURACY) break;
    let good = start;
    let bad = to;
    for (let step = 0; step < 40 && bad - good > 1e-9 * (to - from); step += 1) {
      const middle = (good + bad) / 2;
      if (chordError(start, middle, 1, fuelAt) <= FUEL_CURVE_ACCURACY) good = middle;
      else bad = middle;
    }
    if (good <= start) break;
    points.push(good);
    start = good;
  }
  return [...points, to];
}

/** Largest relative chord error over equal pieces, sampled finely inside each piece. */
export function chordError(from: number, to: number, pieces: number, fuelAt: (load: number) => number): number {
  const SAMPLES = 32;
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
