// The case's profile read and checked, and the year run with a progress line,
// for `year` and `report --year`. Profile problems are printed located and
// end the command with nothing solved or written.
import type { BackendName } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { progressLine } from '../scenarios/index.js';
import { formatProfileIssue, loadProfile, runYear, switchingIssues, type PeriodRecord, type Shard, type YearInput, type YearResult } from '../year/index.js';
import { CliError, EXIT_PROBLEMS } from './errors.js';

export interface YearInputSettings {
  objective?: Objective;
  backend: BackendName;
  block?: number;
}

/** The year's inputs from a loaded case, and the profile's path; a CliError when the case has no profile, the profile has problems or a switching rule is longer than the profile. */
export async function yearInputOrFail(casePath: string, plant: Plant, settings: YearInputSettings, say: (line: string) => void = (line) => process.stderr.write(`${line}\n`)): Promise<{ input: YearInput; profilePath: string }> {
  const read = await loadProfile(plant, casePath);
  if (!read.ok) {
    for (const issue of read.issues) say(formatProfileIssue(issue));
    throw new CliError(`${read.issues[0]?.file ?? casePath}: ${read.issues.length} problem${read.issues.length === 1 ? '' : 's'} in the profile; nothing was solved`, EXIT_PROBLEMS);
  }
  const ruleIssues = switchingIssues(plant, read.profile, casePath);
  if (ruleIssues.length > 0) {
    for (const issue of ruleIssues) say(formatProfileIssue(issue));
    throw new CliError(`${casePath}: ${ruleIssues.length} switching rule${ruleIssues.length === 1 ? '' : 's'} longer than the profile; nothing was solved`, EXIT_PROBLEMS);
  }
  const input: YearInput = { plant, profile: read.profile, profileFile: plant.profile!.file, objective: settings.objective, backend: settings.backend, ...(settings.block !== undefined ? { blockPeriods: settings.block } : {}) };
  return { input, profilePath: read.file! };
}

/** Every period (or one shard's) solved, with a progress line on standard error unless quiet. */
export async function runYearWithProgress(input: YearInput, options: { workers?: number; quiet: boolean; keepRecords: boolean; shard?: Shard }): Promise<{ result: YearResult | null; records: PeriodRecord[] | null }> {
  const progress = progressLine('year', process.stderr, options.quiet);
  try {
    return await runYear(input, { workers: options.workers, onProgress: progress.onProgress, keepRecords: options.keepRecords, ...(options.shard ? { shard: options.shard } : {}) });
  } finally {
    progress.finish();
  }
}
