// What the solved scenarios say about a unit: its largest flow over the
// scenarios, read from the unit reports, for sizing a measure.
import type { ScenarioRun } from '../scenarios/index.js';

export type SolvedRun = Extract<ScenarioRun, { ok: true }>;

export function solvedRuns(runs: readonly ScenarioRun[]): SolvedRun[] {
  return runs.filter((run): run is SolvedRun => run.ok);
}

/** A number from a unit's report in one run (0 when absent). */
export function unitValue(run: SolvedRun, unitId: string, key: string): number {
  const value = run.units.find((unit) => unit.id === unitId)?.values[key];
  return typeof value === 'number' ? value : 0;
}

/** The largest of a figure over the solved scenarios (0 when none). */
export function largest(runs: readonly SolvedRun[], pick: (run: SolvedRun) => number): number {
  return runs.reduce((most, run) => Math.max(most, pick(run)), 0);
}

export function headerState(run: SolvedRun, headerId: string): { h: number; p: number } | null {
  const header = run.headers.find((entry) => entry.id === headerId);
  return header ? { h: header.h_kJ_kg, p: header.pressure_MPa } : null;
}
