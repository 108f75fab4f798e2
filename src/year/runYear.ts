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

export interface YearMeta {
  plant: string;
  currency: string;
  unit_system: 'si' | 'us';
  objective: Objective;
  marginal_value_unit: (typeof MARGINAL_VALUE_UNIT)[Objective];
  /** how on/off choices were made across periods */
  mode: 'independent periods';
  mode_note: string;
  profile: { file: string; kind: Profile['kind']; periods: number; columns: string[] };
  /** periods per block: each block starts cold, its periods warm from their neighbours */
  block_periods: number;
}

export interface YearResult extends YearMeta, YearTotals {}

export interface YearInput {
  plant: Plant;
  profile: Profile;
  /** the profile's file name as the case writes it */
  profileFile: string;
  objective?: Objective;
  backend?: BackendName;
  /** periods per block (default a week of hours); part of the inputs, since a block starts cold */
  blockPeriods?: number;
}

/** A shard: the Kth (1-based) of N slices of the blocks. */
export interface Shard {
  index: number;
  count: number;
}

export function yearMeta(input: YearInput): YearMeta {
  const objective = input.objective ?? input.plant.objective;
  return {
    plant: input.plant.name,
    currency: input.plant.site.currency,
    unit_system: input.plant.site.unitSystem,
    objective,
    marginal_value_unit: MARGINAL_VALUE_UNIT[objective],
    mode: 'independent periods',
    mode_note: 'no unit declares a start-up cost or minimum up or down times, so each period is its own optimum; starts are counted from the solved on/off choices',
    profile: { file: input.profileFile, kind: input.profile.kind, periods: input.profile.labels.length, columns: input.profile.columns.map((column) => column.name) },
    block_periods: input.blockPeriods ?? BLOCK_PERIODS,
  };
}

/** Identifies the inputs of a year exactly: parts merge only with parts of the same inputs. */
export function yearFingerprint(input: YearInput): string {
  const hash = createHash('sha256');
  hash.update(JSON.stringify({ plant: input.plant, objective: input.objective ?? null, backend: input.backend ?? 'highs', blockPeriods: input.blockPeriods ?? BLOCK_PERIODS, columns: input.profile.columns, labels: input.profile.labels }));
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
  const tasks = blockTasks(input.profile, input.blockPeriods ?? BLOCK_PERIODS);
  const chosen = options.shard ? tasks.slice(shardBlocks(tasks.length, options.shard).first, shardBlocks(tasks.length, options.shard).end) : tasks;
  const accumulator = options.shard ? null : new YearAccumulator(input.plant, input.profile.labels.length);
  const records: PeriodRecord[] | null = options.keepRecords || options.shard ? [] : null;
  await solveBlocks(
    { plant: input.plant, columns: input.profile.columns, objective: input.objective, backend: input.backend },
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
