// A year whose units carry switching rules, solved as rolling windows. Given
// the switching units' on/off, the periods are independent, so each period is
// solved for each way to run them (its own optimum, then each other on/off of
// the switching units held, every other choice free, warm from its own), and
// one mixed-integer program per window (windowModel.ts) chooses a way per
// period under the start costs and minimum times. Only the window's first part
// is kept; its last state carries into the next window. Every kept figure is
// a converged, audited solve.
import { getBackend, withModelReuse } from '../lp/index.js';
import type { Plant } from '../model/index.js';
import { solvePlant, type PassPoint, type PlantOutcome } from '../plant/index.js';
import { periodPlant, PeriodPlantError, withoutUnits } from './periodPlant.js';
import { periodRecord, trackedUnits, type PeriodRecord } from './periodRecord.js';
import type { BlockSettings, BlockTask } from './solveBlock.js';
import { heldPlant, inService, ruledUnits, type RuledUnit } from './switchingUnits.js';
import { windowModel, type UnitHistory, type WayToRun, type WindowPeriod } from './windowModel.js';

/** Periods in a window: a week of hours kept, and a day more that looks ahead. */
export const WINDOW_KEPT = 168;
export const WINDOW_OVERLAP = 24;

/** Up to this many switching units, every on/off of them is a way to run a period; past it, the own optimum and single flips. */
export const ALL_WAYS_UP_TO = 3;

export interface WindowSize {
  /** periods kept from each window */
  kept: number;
  /** periods past the kept ones that the window also sees (solved again in the next window) */
  overlap: number;
}

/** What a window's program did, for the result and the benchmark. */
export interface WindowNote {
  first: number;
  periods: number;
  /** periods kept from this window, and the labels of the first and last of them */
  kept: number;
  firstLabel: string;
  lastKeptLabel: string;
  status: string;
  /** whether the window's program found a schedule; without one each kept period keeps its own optimum */
  scheduled: boolean;
  /** objective of the window's program, and its solve time */
  objective: number | null;
  ms: number;
  /** kept periods run otherwise than their own optimum */
  changed: number;
}

interface Way {
  onOff: (0 | 1 | null)[];
  outcome: PlantOutcome & { ok: true };
  record: PeriodRecord & { ok: true };
}

interface PeriodWays {
  /** the period's own optimum, or its failure */
  own: PeriodRecord;
  ways: Way[];
}

export function solveRolling(settings: BlockSettings, task: BlockTask, size: WindowSize, onRecords: (records: PeriodRecord[]) => void, onPeriod?: () => void, onWindow?: (note: WindowNote) => void): Promise<void> {
  // One chain in a fixed order: HiGHS keeps each model structure between solves (see solveBlock).
  return withModelReuse(() => solveWindows(settings, task, size, onRecords, onPeriod, onWindow));
}

async function solveWindows(settings: BlockSettings, task: BlockTask, size: WindowSize, onRecords: (records: PeriodRecord[]) => void, onPeriod?: () => void, onWindow?: (note: WindowNote) => void): Promise<void> {
  const { plant: base, columns } = settings;
  const objective = settings.objective ?? base.objective;
  const backend = getBackend(settings.backend ?? 'highs');
  const units = ruledUnits(base);
  const tracked = trackedUnits(base);
  const slotOf = units.map((unit) => tracked.findIndex((entry) => entry.id === unit.id));
  const width = columns.length;
  const total = task.labels.length;
  const headOf = (at: number): { index: number; label: string; hours: number; month: number } => ({ index: task.first + at, label: task.labels[at], hours: task.hours[at], month: task.months[at] });
  const rowOf = (at: number): Float64Array => task.values.subarray(at * width, (at + 1) * width);

  let chain: PlantOutcome | null = null;
  const solveWays = async (at: number): Promise<PeriodWays> => {
    const head = headOf(at);
    let plant: Plant;
    let own: PlantOutcome;
    try {
      plant = periodPlant(base, columns, rowOf(at));
      own = await solvePlant(plant, { objective, backend, probeMarginalValues: false, ...(chain?.ok ? { neighbour: { commitment: chain.commitment, start: chain.start } } : {}) });
    } catch (error) {
      const reason = error instanceof PeriodPlantError ? 'physics' : 'error';
      return { own: { ...head, ok: false, reason, message: error instanceof Error ? error.message : String(error) }, ways: [] };
    }
    const ownRecord = periodRecord(head, base, tracked, own);
    if (!own.ok || !ownRecord.ok) return { own: ownRecord, ways: [] };
    chain = own;
    const present = units.map((unit) => inService(plant, unit));
    const ownOnOff = units.map((_, k) => (present[k] ? ownRecord.units[slotOf[k]].running : null));
    const ways: Way[] = [{ onOff: ownOnOff, outcome: own, record: ownRecord }];
    const neighbour = { commitment: own.commitment, start: own.start as PassPoint };
    for (const onOff of otherWays(ownOnOff)) {
      const held = new Map<string, 0 | 1>();
      units.forEach((unit, k) => {
        if (onOff[k] !== null) held.set(unit.id, onOff[k]!);
      });
      let outcome: PlantOutcome;
      try {
        outcome = await solvePlant(heldPlant(plant, units, held, withoutUnits), { objective, backend, probeMarginalValues: false, neighbour });
      } catch (error) {
        if (error instanceof PeriodPlantError) continue; // that way cannot run (a machine without its turbine)
        throw error;
      }
      if (!outcome.ok) continue;
      const record = periodRecord(head, base, tracked, outcome);
      if (!record.ok) continue;
      // A unit held stopped is left out of the plant: stopped, not out of service.
      const states = record.units.map((state) => ({ ...state }));
      units.forEach((_, k) => {
        if (onOff[k] === 0) states[slotOf[k]] = { ...states[slotOf[k]], out: false, running: 0 };
      });
      ways.push({ onOff, outcome: outcome as PlantOutcome & { ok: true }, record: { ...record, units: states } });
    }
    return { own: ownRecord, ways };
  };

  // Each period's ways, solved once, kept until its window has passed; identical periods share them.
  const solvedAt = new Map<number, PeriodWays>();
  const byInputs = new Map<string, PeriodWays>();
  const waysOf = async (at: number): Promise<PeriodWays> => {
    const known = solvedAt.get(at);
    if (known) return known;
    const key = Array.from(rowOf(at)).join(',');
    const same = byInputs.get(key);
    let entry: PeriodWays;
    if (same) {
      const head = headOf(at);
      const copy = <T extends PeriodRecord>(record: T): T => (record.ok ? { ...record, ...head, how: 'same as an earlier period' } : { ...record, ...head });
      entry = { own: copy(same.own), ways: same.ways.map((way) => ({ ...way, record: copy(way.record) })) };
    } else {
      entry = await solveWays(at);
      byInputs.set(key, entry);
    }
    solvedAt.set(at, entry);
    return entry;
  };

  const history = new Map<string, UnitHistory | null>(units.map((unit) => [unit.id, null]));
  // Running state of each ruled unit in the last kept period: a start is a 0 before a 1 (null: unknown, after a failed period or at the start).
  const lastRunning = new Map<string, 0 | 1 | null>(units.map((unit) => [unit.id, null]));

  for (let first = 0; first < total; first += size.kept) {
    const end = Math.min(total, first + size.kept + size.overlap);
    const keptEnd = Math.min(total, first + size.kept);
    const entries: PeriodWays[] = [];
    const periods: WindowPeriod[] = [];
    for (let at = first; at < end; at += 1) {
      const entry = await waysOf(at);
      entries.push(entry);
      periods.push({ hours: task.hours[at], ways: entry.ways.length > 0 ? entry.ways.map((way): WayToRun => ({ onOff: way.onOff, objective: way.outcome.result.objective ?? 0 })) : null });
    }
    const window = windowModel(periods, units, history, objective);
    const result = await backend.solve(window.model, { timeLimitSeconds: Math.max(base.solver.timeLimit, 60), mipRelativeGap: base.solver.mipGap, mipDuals: false });
    const records: PeriodRecord[] = [];
    let changed = 0;
    for (let at = first; at < keptEnd; at += 1) {
      const t = at - first;
      const entry = entries[t];
      let record = entry.own;
      const choose = window.choose[t];
      if (result.hasSolution && choose) {
        const k = choose.findIndex((variable) => result.value(variable) > 0.5);
        if (k > 0) changed += 1;
        record = entry.ways[Math.max(0, k)].record;
      }
      // Without a solution from the window's program, each period keeps its own optimum (the note says so).
      records.push(withStartCost(record, units, slotOf, lastRunning, history));
      onPeriod?.();
    }
    onWindow?.({ first: task.first + first, periods: end - first, kept: keptEnd - first, firstLabel: task.labels[first], lastKeptLabel: task.labels[keptEnd - 1], status: result.status, scheduled: result.hasSolution, objective: result.objective, ms: result.timeMs, changed });
    for (let at = first; at < keptEnd; at += 1) solvedAt.delete(at);
    if (byInputs.size > 4 * (size.kept + size.overlap)) byInputs.clear();
    onRecords(records);
  }
}

/** Every other on/off of the units in service (all of them up to ALL_WAYS_UP_TO units; else each single flip). */
function otherWays(own: readonly (0 | 1 | null)[]): (0 | 1 | null)[][] {
  const free = own.flatMap((state, k) => (state === null ? [] : [k]));
  const ways: (0 | 1 | null)[][] = [];
  if (free.length <= ALL_WAYS_UP_TO) {
    for (let mask = 0; mask < 1 << free.length; mask += 1) {
      const way = [...own];
      free.forEach((k, bit) => {
        way[k] = (mask >> bit) & 1 ? 1 : 0;
      });
      if (way.some((state, k) => state !== own[k])) ways.push(way);
    }
    return ways;
  }
  for (const k of free) {
    const way = [...own];
    way[k] = own[k] === 1 ? 0 : 1;
    ways.push(way);
  }
  return ways;
}

/**
 * The record with the start costs of the ruled units that start in it (stopped
 * in the kept period before, running now), and the units' history moved on.
 */
function withStartCost(record: PeriodRecord, units: readonly RuledUnit[], slotOf: readonly number[], lastRunning: Map<string, 0 | 1 | null>, history: Map<string, UnitHistory | null>): PeriodRecord {
  if (!record.ok) {
    for (const unit of units) {
      lastRunning.set(unit.id, null);
      history.set(unit.id, null);
    }
    return record;
  }
  let cost = 0;
  units.forEach((unit, k) => {
    const state = record.units[slotOf[k]];
    const running = state.running;
    if (running === 1 && lastRunning.get(unit.id) === 0) cost += unit.rules.startCost;
    lastRunning.set(unit.id, running);
    const before = history.get(unit.id) ?? null;
    // Out of service: no rule holds across it (a run after it starts anew). After
    // nothing known (the year's first period, a failed one) the state is taken as long held.
    if (state.out) history.set(unit.id, { on: 0, hours: Infinity });
    else if (!before) history.set(unit.id, { on: running, hours: Infinity });
    else if (before.on === running) history.set(unit.id, { on: running, hours: before.hours + record.hours });
    else history.set(unit.id, { on: running, hours: record.hours });
  });
  return { ...record, start_up_cost: cost };
}
