// A block of consecutive periods solved in order, each from its neighbour's
// on/off decisions and converged point, identical periods solved once. The
// same function runs in a worker and in process, and a block always starts
// cold, so a period's result depends only on its block: never on the number
// of workers or shards.
import { getBackend, withModelReuse, type BackendName } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { solvePlant, type PassPoint, type PlantOutcome } from '../plant/index.js';
import { periodPlant, PeriodPlantError } from './periodPlant.js';
import { periodRecord, trackedUnits, type PeriodRecord } from './periodRecord.js';
import type { ProfileColumn } from './profileColumns.js';

/** The periods of one block, as plain data that crosses a worker boundary. */
export interface BlockTask {
  block: number;
  /** index of the block's first period in the profile */
  first: number;
  labels: string[];
  hours: number[];
  months: number[];
  /** internal values, periods x columns */
  values: Float64Array;
}

export interface BlockSettings {
  plant: Plant;
  columns: ProfileColumn[];
  objective?: Objective;
  backend?: BackendName;
}

/** Periods per block: a week of hours. */
export const BLOCK_PERIODS = 168;

export function solveBlock(settings: BlockSettings, task: BlockTask, onPeriod?: () => void): Promise<PeriodRecord[]> {
  // The block's periods are alike and solved in a fixed order, so HiGHS keeps
  // each model structure from one period to the next (changed coefficients
  // only, warm from the last basis); the block's result depends only on its
  // own inputs, as the shards need.
  return withModelReuse(() => solveBlockPeriods(settings, task, onPeriod));
}

async function solveBlockPeriods(settings: BlockSettings, task: BlockTask, onPeriod?: () => void): Promise<PeriodRecord[]> {
  const { plant: base, columns } = settings;
  const tracked = trackedUnits(base);
  const backend = getBackend(settings.backend ?? 'highs');
  const width = columns.length;
  const solved = new Map<string, PeriodRecord>();
  const records: PeriodRecord[] = [];
  let neighbour: { commitment: ReadonlyMap<string, number>; start: PassPoint } | undefined;
  for (let at = 0; at < task.labels.length; at += 1) {
    const head = { index: task.first + at, label: task.labels[at], hours: task.hours[at], month: task.months[at] };
    const row = task.values.subarray(at * width, (at + 1) * width);
    const key = Array.from(row).join(',');
    const same = solved.get(key);
    if (same) {
      records.push(same.ok ? { ...same, ...head, how: 'same as an earlier period' } : { ...same, ...head });
      onPeriod?.();
      continue;
    }
    let outcome: PlantOutcome | null = null;
    let record: PeriodRecord;
    try {
      const plant = periodPlant(base, columns, row);
      outcome = await solvePlant(plant, { objective: settings.objective, backend, probeMarginalValues: false, ...(neighbour ? { neighbour } : {}) });
      record = periodRecord(head, base, tracked, outcome);
    } catch (error) {
      if (!(error instanceof PeriodPlantError)) {
        // A solver fault or a property call outside IF97: one failed period, not a failed year.
        record = { ...head, ok: false, reason: 'error', message: error instanceof Error ? error.message : String(error) };
      } else record = { ...head, ok: false, reason: 'physics', message: error.message };
    }
    if (outcome?.ok) neighbour = { commitment: outcome.commitment, start: outcome.start };
    solved.set(key, record);
    records.push(record);
    onPeriod?.();
  }
  return records;
}

/** The block tasks of a profile's periods, in order. */
export function blockTasks(profile: { labels: string[]; hours: ArrayLike<number>; months: ArrayLike<number>; values: Float64Array; columns: unknown[] }, blockPeriods = BLOCK_PERIODS): BlockTask[] {
  const width = profile.columns.length;
  const tasks: BlockTask[] = [];
  for (let first = 0, block = 0; first < profile.labels.length; first += blockPeriods, block += 1) {
    const end = Math.min(profile.labels.length, first + blockPeriods);
    tasks.push({
      block,
      first,
      labels: profile.labels.slice(first, end),
      hours: Array.from(profile.hours).slice(first, end),
      months: Array.from(profile.months).slice(first, end),
      values: profile.values.slice(first * width, end * width),
    });
  }
  return tasks;
}
