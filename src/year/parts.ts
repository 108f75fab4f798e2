// Shards of a year: a part file holds one shard's period records with the
// fingerprint of the inputs; merging checks that the parts belong together
// and cover every period once, then folds the records exactly as one run does.
import type { Plant } from '../model/index.js';
import type { PeriodRecord } from './periodRecord.js';
import { totalsOf, type Shard, type YearMeta, type YearResult } from './runYear.js';

export const PART_FORMAT = 'steamwright-year-part';
export const PART_VERSION = 1;

export interface PartFile {
  format: typeof PART_FORMAT;
  version: typeof PART_VERSION;
  fingerprint: string;
  shard: Shard;
  meta: YearMeta;
  /** the base plant, so a merge needs no case file */
  plant: Plant;
  records: PeriodRecord[];
}

export function partText(meta: YearMeta, plant: Plant, fingerprint: string, shard: Shard, records: PeriodRecord[]): string {
  const part: PartFile = { format: PART_FORMAT, version: PART_VERSION, fingerprint, shard, meta, plant, records };
  return `${JSON.stringify(part)}\n`;
}

export type MergeOutcome = { ok: true; result: YearResult; records: PeriodRecord[] } | { ok: false; problems: string[] };

function readPart(name: string, text: string): PartFile | string {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return `${name}: expected a part file written by "steamwright year --shard", found text that is not JSON`;
  }
  const part = data as Partial<PartFile>;
  if (part?.format !== PART_FORMAT) return `${name}: expected a part file written by "steamwright year --shard", found ${typeof part?.format === 'string' ? `format "${part.format}"` : 'another kind of JSON'}`;
  if (part.version !== PART_VERSION) return `${name}: expected part format version ${PART_VERSION}, found ${String(part.version)}`;
  if (!part.shard || !Array.isArray(part.records) || !part.meta || !part.plant || typeof part.fingerprint !== 'string') return `${name}: the part file is incomplete (shard, meta, plant, fingerprint or records missing)`;
  return part as PartFile;
}

/** Merges parts given as (name, text); every problem is listed at once. */
export function mergeParts(parts: { name: string; text: string }[]): MergeOutcome {
  const problems: string[] = [];
  const read: { name: string; part: PartFile }[] = [];
  for (const { name, text } of parts) {
    const part = readPart(name, text);
    if (typeof part === 'string') problems.push(part);
    else read.push({ name, part });
  }
  if (problems.length > 0) return { ok: false, problems };
  const first = read[0];
  const count = first.part.shard.count;
  const seen = new Map<number, string>();
  for (const { name, part } of read) {
    if (part.fingerprint !== first.part.fingerprint) problems.push(`${name}: expected a part of the same case and profile as ${first.name}, found one of other inputs (fingerprints differ)`);
    if (part.shard.count !== count) problems.push(`${name}: expected shard K/${count} as in ${first.name}, found ${part.shard.index}/${part.shard.count}`);
    const earlier = seen.get(part.shard.index);
    if (earlier !== undefined) problems.push(`${name}: shard ${part.shard.index}/${part.shard.count} is also given as ${earlier}; expected each shard once`);
    seen.set(part.shard.index, name);
  }
  const missing = Array.from({ length: count }, (_, at) => at + 1).filter((index) => !seen.has(index));
  if (missing.length > 0) problems.push(`expected all ${count} shards, missing ${missing.map((index) => `${index}/${count}`).join(', ')}`);
  if (problems.length > 0) return { ok: false, problems };
  const records = read.sort((a, b) => a.part.shard.index - b.part.shard.index).flatMap(({ part }) => part.records);
  const periods = first.part.meta.profile.periods;
  if (records.length !== periods || records.some((record, at) => record.index !== at)) {
    return { ok: false, problems: [`expected the parts to hold periods 0 to ${periods - 1} once each, found ${records.length} records out of order or missing`] };
  }
  const result: YearResult = { ...first.part.meta, ...totalsOf(first.part.plant, periods, records) };
  return { ok: true, result, records };
}
