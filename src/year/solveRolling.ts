// A year whose units carry switching rules, solved as rolling windows: each
// window's periods are first solved on their own (warm from their neighbour),
// then linked in one mixed-integer program (windowModel.ts) that chooses the
// ruled units' on/off over the whole window; only the window's first part is
// kept, and its last state carries into the next window. A kept period whose
// on/off differs from its own optimum is converged again with the window's
// choice held, so every kept figure is a converged, audited solve.
import { getBackend } from '../lp/index.js';
import type { Plant } from '../model/index.js';
import { buildPass, contributionsOf, solvePlant, type PassPoint, type PlantOutcome } from '../plant/index.js';
import { periodPlant, PeriodPlantError, withoutUnits } from './periodPlant.js';
import { periodRecord, trackedUnits, type PeriodRecord } from './periodRecord.js';
import type { BlockSettings, BlockTask } from './solveBlock.js';
import { heldPlant, inService, ruledUnits, type RuledUnit } from './switchingUnits.js';
import { windowModel, type UnitHistory, type WindowPeriod } from './windowModel.js';

/** Periods in a window: a week of hours kept, and a day more that looks ahead. */
export const WINDOW_KEPT = 168;
export const WINDOW_OVERLAP = 24;

export interface WindowSize {
  /** periods kept from each window */
  kept: number;
  /** periods past the kept ones that the window also sees (solved again in the next window) */
  overlap: number;
}

/** What a window's program did, for the result. */
export interface WindowNote {
  first: number;
  periods: number;
  status: string;
  /** objective of the window's program (linearised), and its solve time */
  objective: number | null;
  ms: number;
  /** kept periods converged again with the window's on/off held */
  resolved: number;
}

interface Solved {
  plant: Plant | null;
  outcome: PlantOutcome | null;
  record: PeriodRecord;
}

export async function solveRolling(settings: BlockSettings, task: BlockTask, size: WindowSize, onRecords: (records: PeriodRecord[]) => void, onPeriod?: () => void, onWindow?: (note: WindowNote) => void): Promise<void> {
  const { plant: base, columns } = settings;
  const objective = settings.objective ?? base.objective;
  const backend = getBackend(settings.backend ?? 'highs');
  const units = ruledUnits(base);
  const tracked = trackedUnits(base);
  const slotOf = new Map(tracked.map((unit, slot) => [unit.id, slot]));
  const width = columns.length;
  const total = task.labels.length;
  const headOf = (at: number): { index: number; label: string; hours: number; month: number } => ({ index: task.first + at, label: task.labels[at], hours: task.hours[at], month: task.months[at] });
  const rowOf = (at: number): Float64Array => task.values.subarray(at * width, (at + 1) * width);

  const solveOne = async (at: number, plantOf: () => Plant, neighbour: { commitment: ReadonlyMap<string, number>; start: PassPoint } | undefined): Promise<Solved> => {
    const head = headOf(at);
    let plant: Plant | null = null;
    try {
      plant = plantOf();
      const outcome = await solvePlant(plant, { objective, backend, probeMarginalValues: false, ...(neighbour ? { neighbour } : {}) });
      return { plant, outcome, record: periodRecord(head, base, tracked, outcome) };
    } catch (error) {
      const reason = error instanceof PeriodPlantError ? 'physics' : 'error';
      return { plant, outcome: null, record: { ...head, ok: false, reason, message: error instanceof Error ? error.message : String(error) } };
    }
  };

  // Each period solved on its own, once, kept until its window has passed.
  const own = new Map<number, Solved>();
  const byInputs = new Map<string, Solved>();
  let chain: PlantOutcome | null = null;
  const solveOwn = async (at: number): Promise<Solved> => {
    const known = own.get(at);
    if (known) return known;
    const key = Array.from(rowOf(at)).join(',');
    const same = byInputs.get(key);
    let solved: Solved;
    if (same) {
      solved = { ...same, record: same.record.ok ? { ...same.record, ...headOf(at), how: 'same as an earlier period' } : { ...same.record, ...headOf(at) } };
    } else {
      solved = await solveOne(at, () => periodPlant(base, columns, rowOf(at)), chain?.ok ? { commitment: chain.commitment, start: chain.start } : undefined);
      if (solved.outcome?.ok) chain = solved.outcome;
      byInputs.set(key, solved);
    }
    own.set(at, solved);
    return solved;
  };

  const history = new Map<string, UnitHistory | null>(units.map((unit) => [unit.id, null]));
  // Running state of each ruled unit in the last kept period: a start is a 0 before a 1 (null: unknown, after a failed period or at the start).
  const lastRunning = new Map<string, 0 | 1 | null>(units.map((unit) => [unit.id, null]));
  const heldCache = new Map<string, Solved>();

  for (let first = 0; first < total; first += size.kept) {
    const end = Math.min(total, first + size.kept + size.overlap);
    const keptEnd = Math.min(total, first + size.kept);
    const periods: WindowPeriod[] = [];
    const solved: Solved[] = [];
    for (let at = first; at < end; at += 1) {
      const entry = await solveOwn(at);
      solved.push(entry);
      const outcome = entry.outcome;
      periods.push({ hours: task.hours[at], pass: outcome?.ok ? buildPass(outcome.plant, contributionsOf(outcome.plant), outcome.start, objective) : null });
    }
    const window = windowModel(periods, units, history, objective);
    const result = await backend.solve(window.model, { timeLimitSeconds: Math.max(base.solver.timeLimit, 60), mipRelativeGap: base.solver.mipGap, mipDuals: false });
    const usable = result.hasSolution;
    const records: PeriodRecord[] = [];
    let resolved = 0;
    for (let at = first; at < keptEnd; at += 1) {
      const t = at - first;
      const entry = solved[t];
      let chosen = entry;
      if (usable && entry.outcome?.ok && entry.plant) {
        const onOff = new Map<string, 0 | 1>();
        units.forEach((unit, slot) => {
          const variable = window.on[t][slot];
          onOff.set(unit.id, variable && result.value(variable) > 0.5 ? 1 : 0);
        });
        const differs = units.some((unit) => inService(entry.plant!, unit) && runningIn(entry.record, slotOf.get(unit.id)!) !== onOff.get(unit.id));
        if (differs) {
          const key = `${Array.from(rowOf(at)).join(',')}|${units.map((unit) => onOff.get(unit.id)).join('')}`;
          const cached = heldCache.get(key);
          if (cached) chosen = { ...cached, record: cached.record.ok ? { ...cached.record, ...headOf(at), how: 'same as an earlier period' } : { ...cached.record, ...headOf(at) } };
          else {
            const own = entry.outcome;
            chosen = await solveOne(at, () => heldPlant(entry.plant!, units, onOff, withoutUnits), { commitment: own.commitment, start: own.start });
            heldCache.set(key, chosen);
            resolved += 1;
          }
          if (chosen.record.ok) {
            // A unit the window stops is left out of the period's plant: stopped, not out of service.
            const states = chosen.record.units.map((state) => ({ ...state }));
            for (const unit of units) {
              const slot = slotOf.get(unit.id)!;
              if (onOff.get(unit.id) === 0 && inService(entry.plant!, unit)) states[slot] = { ...states[slot], out: false, running: 0 };
            }
            chosen = { ...chosen, record: { ...chosen.record, units: states } };
          }
        }
      }
      records.push(withStartCost(chosen.record, units, slotOf, lastRunning, history));
      onPeriod?.();
    }
    onWindow?.({ first: task.first + first, periods: end - first, status: result.status, objective: result.objective, ms: result.timeMs, resolved });
    for (let at = first; at < keptEnd; at += 1) own.delete(at);
    if (byInputs.size > 4 * (size.kept + size.overlap)) byInputs.clear();
    if (heldCache.size > 4 * (size.kept + size.overlap)) heldCache.clear();
    onRecords(records);
  }
}

function runningIn(record: PeriodRecord, slot: number): 0 | 1 | null {
  return record.ok ? record.units[slot].running : null;
}

/**
 * The record with the start costs of the ruled units that start in it (stopped
 * in the kept period before, running now), and the units' history moved on.
 */
function withStartCost(record: PeriodRecord, units: readonly RuledUnit[], slotOf: ReadonlyMap<string, number>, lastRunning: Map<string, 0 | 1 | null>, history: Map<string, UnitHistory | null>): PeriodRecord {
  if (!record.ok) {
    for (const unit of units) {
      lastRunning.set(unit.id, null);
      history.set(unit.id, null);
    }
    return record;
  }
  let cost = 0;
  for (const unit of units) {
    const state = record.units[slotOf.get(unit.id)!];
    const running = state.running;
    if (running === 1 && lastRunning.get(unit.id) === 0) cost += unit.rules.startCost;
    lastRunning.set(unit.id, running);
    const before = history.get(unit.id) ?? null;
    // Out of service: no rule holds across it (a run after it starts anew). After
    // nothing known (the year's first period, a failed one) the state is taken as long held.
    if (state.out) history.set(unit.id, { on: 0, hours: Infinity });
    else if (!before) history.set(unit.id, { on: running, hours: Infinity });
    else if (before && before.on === running) history.set(unit.id, { on: running, hours: before.hours + record.hours });
    else history.set(unit.id, { on: running, hours: record.hours });
  }
  return { ...record, start_up_cost: cost };
}
