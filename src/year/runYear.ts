// A year from a case and its profile: blocks of periods solved (all of them,
// or one shard's deterministic slice), records folded into totals in period
// order. The result carries how the periods were solved.
import { createHash } from 'node:crypto';
import type { BackendName } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { MARGINAL_VALUE_UNIT } from '../plant/index.js';
import type { PeriodRecord } from './periodRecord.js';
import type { Profile } from './readProfile.js';
import { BLOCK_PERIODS, blockTasks } from './solveBlock.js';
import { solveBlocks, type YearRunOptions } from './solveYear.js';
import { YearAccumulator, type YearTotals } from './yearTotals.js';
import { ALL_WAYS_UP_TO, solveRolling, WINDOW_KEPT, WINDOW_OVERLAP, type WindowSize } from './solveRolling.js';
import { ruledUnits } from './switchingUnits.js';

export interface YearMeta {
  plant: string;
  currency: string;
  unit_system: 'si' | 'us';
  objective: Objective;
  marginal_value_unit: (typeof MARGINAL_VALUE_UNIT)[Objective];
  /** how on/off choices were made across periods */
  mode: 'independent periods' | 'rolling windows';
  mode_note: string;
  /** with rolling windows: periods kept from each window and periods it looks past them */
  window?: WindowSize;
  /** with rolling windows: the units whose switching rules link the periods */
  switching_units?: string[];
  profile: { file: string; kind: Profile['kind']; periods: number; columns: string[] };
  /** periods per block: each block starts cold, its periods warm from their neighbours */
  block_periods: number;
}

/** A rolling window whose program found no schedule: its kept periods keep their own optimum, and the switching rules may not hold there. */
export interface UnscheduledWindow {
  from: string;
  to: string;
  periods: number;
  status: string;
}

export interface YearResult extends YearMeta, YearTotals {
  /** with rolling windows: the windows whose program found no schedule (empty when every one did) */
  unscheduled_windows?: UnscheduledWindow[];
}

export interface YearInput {
  plant: Plant;
  profile: Profile;
  /** the profile's file name as the case writes it */
  profileFile: string;
  objective?: Objective;
  backend?: BackendName;
  /** periods per block (default a week of hours); part of the inputs, since a block starts cold */
  blockPeriods?: number;
  /** rolling windows' size, where units have switching rules (default a week kept, a day of overlap) */
  window?: WindowSize;
}

/** A shard was asked of a year solved as rolling windows, whose windows chain. */
export class YearModeError extends Error {}

/** A shard: the Kth (1-based) of N slices of the blocks. */
export interface Shard {
  index: number;
  count: number;
}

export function yearMeta(input: YearInput): YearMeta {
  const objective = input.objective ?? input.plant.objective;
  const ruled = ruledUnits(input.plant);
  const window = windowOf(input);
  const common = {
    plant: input.plant.name,
    currency: input.plant.site.currency,
    unit_system: input.plant.site.unitSystem,
    objective,
    marginal_value_unit: MARGINAL_VALUE_UNIT[objective],
    profile: { file: input.profileFile, kind: input.profile.kind, periods: input.profile.labels.length, columns: input.profile.columns.map((column) => column.name) },
    block_periods: input.blockPeriods ?? BLOCK_PERIODS,
  };
  if (ruled.length === 0) {
    return { ...common, mode: 'independent periods', mode_note: 'no unit declares a start-up cost or minimum up or down times, so each period is its own optimum; starts are counted from the solved on/off choices' };
  }
  const names = ruled.map((unit) => unit.id).join(', ');
  const costNote = objective === 'minimumCost' ? 'start costs are in each window\'s objective and in the totals' : 'start costs are in the totals but not in the objective, which is not cost';
  return {
    ...common,
    mode: 'rolling windows',
    mode_note: `${names} declare${ruled.length === 1 ? 's' : ''} start costs or minimum running or stopped hours, so on/off links the periods: the year is solved as rolling windows of ${window.kept + window.overlap} periods, the first ${window.kept} kept and the last ${window.overlap} overlapping the next window. Each period is converged for each on/off of ${ruled.length === 1 ? 'that unit' : 'those units'} (${ruled.length <= ALL_WAYS_UP_TO ? 'every combination' : 'its own optimum and each single flip'}, every other choice free), and each window is one mixed-integer program that picks one of them per period, linked by start, stop and minimum-time rows; the kept on/off carries into the next window; ${costNote}; a period out of service or not solved breaks the minimum times`,
    window,
    switching_units: ruled.map((unit) => unit.id),
  };
}

function windowOf(input: YearInput): WindowSize {
  return input.window ?? { kept: WINDOW_KEPT, overlap: WINDOW_OVERLAP };
}

/** Identifies the inputs of a year exactly: parts merge only with parts of the same inputs. */
export function yearFingerprint(input: YearInput): string {
  const hash = createHash('sha256');
  hash.update(JSON.stringify({ plant: input.plant, objective: input.objective ?? null, backend: input.backend ?? 'highs', blockPeriods: input.blockPeriods ?? BLOCK_PERIODS, window: input.window ?? null, columns: input.profile.columns, labels: input.profile.labels }));
  hash.update(new Uint8Array(input.profile.values.buffer, input.profile.values.byteOffset, input.profile.values.byteLength));
  hash.update(new Uint8Array(input.profile.hours.buffer, input.profile.hours.byteOffset, input.profile.hours.byteLength));
  hash.update(input.profile.months);
  return hash.digest('hex');
}

/** The blocks a shard solves: a contiguous run, so most periods keep their neighbours. */
export function shardBlocks(blocks: number, shard: Shard): { first: number; end: number } {
  return { first: Math.floor(((shard.index - 1) * blocks) / shard.count), end: Math.floor((shard.index * blocks) / shard.count) };
}

export function totalsOf(plant: Plant, periods: number, records: Iterable<PeriodRecord>): YearTotals {
  const accumulator = new YearAccumulator(plant, periods);
  for (const record of records) accumulator.add(record);
  return accumulator.totals();
}

/**
 * Solves the year (or a shard of it). The totals are folded as blocks
 * arrive; records are kept only when asked (for a per-period CSV or a part file).
 */
export async function runYear(input: YearInput, options: YearRunOptions & { keepRecords?: boolean; shard?: Shard } = {}): Promise<{ result: YearResult | null; records: PeriodRecord[] | null }> {
  const settings = { plant: input.plant, columns: input.profile.columns, objective: input.objective, backend: input.backend };
  if (ruledUnits(input.plant).length > 0) {
    // The windows chain (each starts from the last one's kept state): one thread, no shards.
    const ruled = ruledUnits(input.plant);
    if (options.shard) throw new YearModeError(`this year is solved as rolling windows (${ruled.map((unit) => unit.id).join(', ')} declare${ruled.length === 1 ? 's' : ''} switching rules), and each window starts from the one before, so it cannot be split into shards; run it whole`);
    const accumulator = new YearAccumulator(input.plant, input.profile.labels.length);
    const records: PeriodRecord[] | null = options.keepRecords ? [] : null;
    const total = input.profile.labels.length;
    let done = 0;
    const [task] = blockTasks(input.profile, Math.max(1, total));
    const unscheduled: UnscheduledWindow[] = [];
    await solveRolling(settings, task, windowOf(input), (block) => {
      for (const record of block) {
        accumulator.add(record);
        records?.push(record);
      }
    }, () => options.onProgress?.(++done, total), (note) => {
      if (!note.scheduled) unscheduled.push({ from: note.firstLabel, to: note.lastKeptLabel, periods: note.kept, status: note.status });
      options.onWindow?.(note);
    });
    return { result: { ...yearMeta(input), ...accumulator.totals(), unscheduled_windows: unscheduled }, records };
  }
  const tasks = blockTasks(input.profile, input.blockPeriods ?? BLOCK_PERIODS);
  const chosen = options.shard ? tasks.slice(shardBlocks(tasks.length, options.shard).first, shardBlocks(tasks.length, options.shard).end) : tasks;
  const accumulator = options.shard ? null : new YearAccumulator(input.plant, input.profile.labels.length);
  const records: PeriodRecord[] | null = options.keepRecords || options.shard ? [] : null;
  await solveBlocks(
    settings,
    chosen,
    (block) => {
      for (const record of block) {
        accumulator?.add(record);
        records?.push(record);
      }
    },
    options,
  );
  return { result: accumulator ? { ...yearMeta(input), ...accumulator.totals() } : null, records };
}
