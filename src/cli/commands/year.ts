// `steamwright year CASE`: every period of the case's profile solved, with the
// year's totals, months, units and headers; `--shard K/N --part FILE` solves a
// deterministic slice into a part file; `year merge PART...` combines parts
// into exactly the single run's result.
import { readFile } from 'node:fs/promises';
import type { Argv, CommandModule } from 'yargs';
import type { BackendName } from '../../lp/index.js';
import type { Plant } from '../../model/index.js';
import { plantDisplayFormat, yearCsv, yearHtml, yearText } from '../../report/index.js';
import { mergeParts, partText, ruledUnits, yearFingerprint, yearMeta, type PeriodRecord, type Shard, type YearResult } from '../../year/index.js';
import { CliError, EXIT_PROBLEMS, EXIT_USAGE } from '../errors.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { runYearWithProgress, yearInputOrFail } from '../yearRun.js';
import { checkWorkers } from '../optionChecks.js';
import { planOutputs, writeOutputs, type OutputRequest } from '../outputFiles.js';
import { OBJECTIVE_WORDS } from './solve.js';

interface YearArgs {
  case: string;
  parts?: string[];
  json: boolean;
  csv?: string;
  html?: string;
  shard?: string;
  part?: string;
  objective?: string;
  solver: BackendName;
  workers?: number;
  block?: number;
}

/** "K/N" with 1 <= K <= N; a usage error otherwise. */
export function parseShard(text: string): Shard {
  const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const index = match ? Number(match[1]) : NaN;
  const count = match ? Number(match[2]) : NaN;
  if (!match || count < 1 || index < 1 || index > count || count > 10000) throw new CliError(`--shard expects K/N with 1 <= K <= N <= 10000, such as 3/8, found "${text}"`, EXIT_USAGE);
  return { index, count };
}

function quietProgress(args: YearArgs): boolean {
  return args.json || args.csv === '' || args.csv === '-' || Boolean(process.env.CI);
}

/** Text, JSON and CSV outputs of a finished year, written together; exit 1 when any period failed. */
async function finish(args: YearArgs, inputs: { option: string; path: string }[], result: YearResult, records: PeriodRecord[] | null, plant: Plant, label: string): Promise<void> {
  const format = plantDisplayFormat(plant);
  const requests: OutputRequest[] = [];
  const csvToStdout = args.csv === '' || args.csv === '-';
  if (!csvToStdout) requests.push({ option: args.json ? '--json' : 'the summary', path: '-' });
  if (args.csv !== undefined) requests.push({ option: '--csv', path: csvToStdout ? '-' : args.csv });
  if (args.html !== undefined) requests.push({ option: '--html', path: args.html });
  const planned = await planOutputs(inputs, requests);
  const summary = args.json ? `${JSON.stringify(result, null, 2)}\n` : yearText(result, format);
  const csv = args.csv !== undefined && records ? yearCsv(result, records, format) : '';
  const html = args.html !== undefined && records ? yearHtml(result, records, format) : '';
  await writeOutputs(planned.map((output) => ({ ...output, text: output.option === '--csv' ? csv : output.option === '--html' ? html : summary })));
  if (result.failed.length > 0) {
    throw new CliError(`${label}: ${result.failed.length} of ${result.periods} periods could not be solved (${result.failed.slice(0, 3).map((period) => period.label).join(', ')}${result.failed.length > 3 ? ', ...' : ''}); the totals cover the others`, EXIT_PROBLEMS);
  }
}

async function runMerge(args: YearArgs): Promise<void> {
  const names = args.parts ?? [];
  if (names.length === 0) throw new CliError('year merge expects the part files written by "year --shard K/N --part FILE", found none', EXIT_USAGE);
  if (args.shard !== undefined || args.part !== undefined) throw new CliError('--shard and --part belong to "year CASE", not to "year merge"', EXIT_USAGE);
  const texts: { name: string; text: string }[] = [];
  const unreadable: string[] = [];
  for (const name of names) {
    try {
      texts.push({ name, text: await readFile(name, 'utf8') });
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      unreadable.push(`${name}: cannot read the part file: ${code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : 'it cannot be read'}`);
    }
  }
  if (unreadable.length > 0) {
    for (const line of unreadable) process.stderr.write(`${line}\n`);
    throw new CliError(`${unreadable.length} part file${unreadable.length === 1 ? '' : 's'} could not be read; nothing was merged`, EXIT_PROBLEMS);
  }
  const merged = mergeParts(texts);
  if (!merged.ok) {
    for (const line of merged.problems) process.stderr.write(`${line}\n`);
    throw new CliError(`the parts do not make one year (${merged.problems.length} problem${merged.problems.length === 1 ? '' : 's'}); nothing was merged`, EXIT_PROBLEMS);
  }
  const plant = (JSON.parse(texts[0].text) as { plant: Plant }).plant;
  await finish(args, names.map((name) => ({ option: 'part file', path: name })), merged.result, merged.records, plant, 'year merge');
}

export const yearCommand: CommandModule<object, YearArgs> = {
  command: 'year <case> [parts..]',
  describe: 'Solve every period of the case\'s profile (a CSV of hours) and total the year; "year merge PART..." combines shards',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML) naming a profile, or "merge"' })
      .positional('parts', { type: 'string', array: true, describe: 'with "merge": the part files of every shard' })
      .option('json', { type: 'boolean', default: false, describe: 'print the year as JSON (SI units)' })
      .option('csv', { type: 'string', describe: 'write one row per period, in the case\'s units, to FILE (no FILE: standard output)' })
      .option('html', { type: 'string', describe: 'also write a self-contained HTML page with the year\'s charts (load-duration curves, marginal values, supply by month, running hours) to FILE' })
      .option('shard', { type: 'string', describe: 'solve only the Kth of N deterministic slices of the periods: K/N (needs --part)' })
      .option('part', { type: 'string', describe: 'with --shard: the part file to write, for "year merge"' })
      .option('objective', { choices: Object.keys(OBJECTIVE_WORDS), describe: 'overrides the case objective' })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .option('workers', { type: 'number', describe: 'most worker threads (default: one per core; 1 solves in process)' })
      .option('block', { type: 'number', describe: 'periods solved as one chain from a cold start, each warm from the one before (default 168); shards split between blocks' })
      .check((args) => {
        checkWorkers(args.workers);
        if (args.block !== undefined && !(Number.isInteger(args.block) && args.block >= 1 && args.block <= 8784)) throw new CliError(`--block expects a whole number of periods from 1 to 8784, found ${Number.isNaN(args.block) ? 'a value that is not a number' : args.block}`, EXIT_USAGE);
        if (args.shard !== undefined) parseShard(args.shard);
        if ((args.shard === undefined) !== (args.part === undefined)) throw new CliError('--shard K/N and --part FILE go together: a shard writes its part file', EXIT_USAGE);
        if (args.shard !== undefined && (args.json || args.csv !== undefined || args.html !== undefined)) throw new CliError('--shard writes only its part file; --json, --csv and --html belong to "year merge"', EXIT_USAGE);
        return true;
      })
      .example('$0 year cases/kestrel-bay-board-mill.yaml', 'the year of the case\'s profile, as text')
      .example('$0 year cases/kestrel-bay-board-mill.yaml --csv hours.csv', 'also every period as a CSV row')
      .example('$0 year cases/kestrel-bay-board-mill.yaml --html year.html', 'also the charts as a page')
      .example('$0 year cases/kestrel-bay-board-mill.yaml --shard 2/8 --part part-2.json', 'the second of eight slices')
      .example('$0 year merge part-*.json --json', 'the parts combined: the same result as one run') as Argv<YearArgs>,
  handler: async (args) => {
    if (args.case === 'merge') {
      await runMerge(args);
      return;
    }
    if ((args.parts ?? []).length > 0) throw new CliError(`year takes one case file, found ${1 + (args.parts ?? []).length} arguments; to combine part files, write "year merge PART..."`, EXIT_USAGE);
    const shard = args.shard !== undefined ? parseShard(args.shard) : undefined;
    const inputs = [{ option: 'case file', path: args.case }];
    // Outputs are checked before any solving, so a bad path fails at once.
    if (shard) await planOutputs(inputs, [{ option: '--part', path: args.part! }]);
    else await planOutputs(inputs, [...(args.csv !== undefined && args.csv !== '' && args.csv !== '-' ? [{ option: '--csv', path: args.csv }] : []), ...(args.html !== undefined ? [{ option: '--html', path: args.html }] : []), { option: 'the summary', path: '-' }]);
    const loaded = await loadCaseOrFail(args.case);
    const { input, profilePath } = await yearInputOrFail(args.case, loaded.plant, { objective: args.objective ? OBJECTIVE_WORDS[args.objective] : undefined, backend: args.solver, block: args.block });
    const ruled = ruledUnits(loaded.plant);
    if (shard && ruled.length > 0) throw new CliError(`--shard: this year is solved as rolling windows (${ruled.map((unit) => unit.id).join(', ')} declare${ruled.length === 1 ? 's' : ''} switching rules), each window starting from the one before, so it cannot be split into shards; run it without --shard`, EXIT_USAGE);
    const run = await runYearWithProgress(input, { workers: args.workers, quiet: quietProgress(args), keepRecords: args.csv !== undefined || args.html !== undefined, ...(shard ? { shard } : {}) });
    if (shard) {
      const planned = await planOutputs([...inputs, { option: 'profile', path: profilePath }], [{ option: '--part', path: args.part! }]);
      const text = partText(yearMeta(input), loaded.plant, yearFingerprint(input), shard, run.records ?? []);
      await writeOutputs(planned.map((output) => ({ ...output, text })));
      const failed = (run.records ?? []).filter((record) => !record.ok).length;
      process.stderr.write(`steamwright: shard ${shard.index}/${shard.count}: ${run.records?.length ?? 0} periods written to ${args.part}${failed > 0 ? `, ${failed} of them failed` : ''}\n`);
      return;
    }
    await finish(args, [...inputs, { option: 'profile', path: profilePath }], run.result!, run.records, loaded.plant, args.case);
  },
};
