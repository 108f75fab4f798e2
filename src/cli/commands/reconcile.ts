// `steamwright reconcile CASE --readings FILE`: meter readings fitted to the
// plant's mass balances, tested, and the suspect meters named.
import { open } from 'node:fs/promises';
import type { Argv, CommandModule } from 'yargs';
import { formatIssue, resolveMeters, type Issue } from '../../model/index.js';
import { streamNetwork } from '../../plant/index.js';
import { PropertyRangeError } from '../../properties/index.js';
import { EnergyIterationError, InconsistentBalancesError, meterStreams, parseReadings, planThermometers, readingSigma, reconcilePlant, reconciledCase, type AveragedReading } from '../../reconcile/index.js';
import { reconcileCsv, reconcileText } from '../../report/index.js';
import { CliError, EXIT_PROBLEMS, EXIT_USAGE } from '../errors.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { planOutputs, writeOutputs, type OutputRequest } from '../outputFiles.js';

interface ReconcileArgs {
  case: string;
  readings: string;
  json: boolean;
  csv?: string;
  'write-case'?: string;
  level: number;
  from?: string;
  to?: string;
}

/** A readings file larger than this is refused (a year of minute readings of 50 meters is some 30 MB). */
const MAX_READINGS_BYTES = 64_000_000;

export const reconcileCommand: CommandModule<object, ReconcileArgs> = {
  command: 'reconcile <case>',
  describe: 'Fit meter readings to the plant balances, estimate unmetered flows and name suspect meters',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML) with its meters' })
      .option('readings', { type: 'string', demandOption: true, describe: 'CSV of readings: columns tag, value, unit (and time for a series)' })
      .option('json', { type: 'boolean', default: false, describe: 'print the whole result as JSON (SI units: kg/s)' })
      .option('csv', { type: 'string', describe: 'write readings and streams as CSV to FILE (no FILE or "-": standard output)' })
      .option('write-case', { type: 'string', describe: 'also write a copy of the case whose users draw the reconciled steam' })
      .option('level', { type: 'number', default: 0.05, describe: 'level of significance of the tests (0.05: 95 % confidence)' })
      .option('from', { type: 'string', describe: 'for a series: average readings at or after this time' })
      .option('to', { type: 'string', describe: 'for a series: average readings at or before this time' })
      .check((args) => {
        if (!(args.level > 0 && args.level < 0.5)) throw new CliError(`--level: expected a level of significance above 0 and below 0.5, found ${args.level}`, EXIT_USAGE);
        for (const key of ['from', 'to'] as const) {
          const value = args[key];
          if (value !== undefined && Number.isNaN(Date.parse(String(value)))) throw new CliError(`--${key}: expected a date and time such as 2026-11-02T08:00, found "${value}"`, EXIT_USAGE);
        }
        return true;
      })
      .example('$0 reconcile cases/millbrook-creamery.yaml --readings cases/millbrook-creamery.readings.csv', 'the demo readings')
      .example('$0 reconcile cases/millbrook-creamery.yaml --readings day.csv --write-case measured.yaml', 'and a measured case') as Argv<ReconcileArgs>,
  handler: async (args) => {
    const requests: OutputRequest[] = [];
    const toStdout = (path: string): boolean => path === '' || path === '-';
    if (args.csv === undefined || !toStdout(args.csv)) requests.push({ option: 'the summary', path: '-' });
    if (args.csv !== undefined) requests.push({ option: '--csv', path: toStdout(args.csv) ? '-' : args.csv });
    if (args['write-case'] !== undefined) requests.push({ option: '--write-case', path: args['write-case'] });
    const planned = await planOutputs(
      [
        { option: 'case file', path: args.case },
        { option: '--readings', path: args.readings },
      ],
      requests,
    );
    const loaded = await loadCaseOrFail(args.case, 'nothing was reconciled');
    const caseText = (await readBounded(args.case, 2_000_000)).toString('utf8');
    const { meters, issues: meterIssues } = resolveMeters(caseText);
    const network = streamNetwork(loaded.plant);
    const { metered, issues: streamIssues } = meterStreams(meters, network);
    const plan = planThermometers(meters, network, loaded.plant);
    const caseIssues: Issue[] = [...meterIssues, ...streamIssues, ...plan.issues];
    if (meters.length === 0 && caseIssues.length === 0) throw new CliError(`${args.case}: the case has no meters; add a "meters:" list (tag, unit, measures, uncertainty) to reconcile`, EXIT_PROBLEMS);
    if (caseIssues.length > 0) {
      for (const issue of caseIssues.sort((a, b) => a.line - b.line)) process.stderr.write(`${formatIssue(issue, args.case)}\n`);
      throw new CliError(`${args.case}: ${caseIssues.length} error${caseIssues.length === 1 ? '' : 's'} in the meters; nothing was reconciled`, EXIT_PROBLEMS);
    }

    const readingsText = (await readBounded(args.readings, MAX_READINGS_BYTES)).toString('utf8');
    const window = { from: args.from === undefined ? null : Date.parse(args.from), to: args.to === undefined ? null : Date.parse(args.to) };
    const parsed = parseReadings(readingsText, new Set(meters.map((meter) => meter.tag)), window, new Set(plan.thermometers.map((thermometer) => thermometer.meter.tag)));
    const readingProblems = parsed.ok ? [] : parsed.issues;
    if (parsed.ok && !parsed.series && (window.from !== null || window.to !== null)) {
      throw new CliError(`${args.readings}: --from and --to choose a window of a series, but the file has no time column`, EXIT_PROBLEMS);
    }
    const readings: Map<string, AveragedReading> = parsed.ok ? parsed.readings : new Map();
    for (const { meter } of metered) {
      const reading = readings.get(meter.tag);
      if (reading && !(readingSigma(meter, reading.value) > 0)) {
        readingProblems.push({ line: reading.line, message: `reading of ${meter.tag} is zero and its uncertainty is a share of the reading, so it has none; give the meter an uncertainty as a flow (such as "0.2 t/h")` });
      }
    }
    if (readingProblems.length > 0) {
      for (const problem of readingProblems.sort((a, b) => a.line - b.line)) process.stderr.write(`${args.readings}:${problem.line}: ${problem.message}\n`);
      throw new CliError(`${args.readings}: ${readingProblems.length} error${readingProblems.length === 1 ? '' : 's'}; nothing was reconciled`, EXIT_PROBLEMS);
    }
    if (readings.size === 0) throw new CliError(`${args.readings}: no reading of any meter${window.from !== null || window.to !== null ? ' in the window --from/--to' : ''}; nothing was reconciled`, EXIT_PROBLEMS);

    let outcome;
    try {
      outcome = reconcilePlant(loaded.plant, metered, readings, { level: args.level }, network, plan.thermometers);
    } catch (error) {
      // The energy balances can fail on the readings themselves: say which, never a stack trace.
      if (error instanceof EnergyIterationError || error instanceof InconsistentBalancesError || error instanceof PropertyRangeError) {
        throw new CliError(`${args.readings}: cannot be reconciled: ${error.message}; nothing was reconciled`, EXIT_PROBLEMS);
      }
      throw error;
    }
    const system = loaded.plant.site.unitSystem;
    const written = args['write-case'] !== undefined ? reconciledCase(caseText, outcome, system, args.readings) : null;
    let summary = args.json ? `${JSON.stringify({ case: loaded.plant.name, readings: args.readings, ...outcome, written_case: written ? { updated: written.updated, kept: written.kept } : null }, null, 2)}\n` : reconcileText(outcome, system, loaded.plant.name);
    if (written && !args.json) {
      summary += `Wrote ${args['write-case']}: ${written.updated.length} user${written.updated.length === 1 ? '' : 's'} at reconciled steam${written.kept.length > 0 ? `; kept as in the case (steam not observable): ${written.kept.join(', ')}` : ''}.\n`;
    }
    const texts: Record<string, string> = { 'the summary': summary, '--csv': reconcileCsv(outcome), '--write-case': written?.text ?? '' };
    await writeOutputs(planned.map((output) => ({ ...output, text: texts[output.option] })));
  },
};

/** A file's bytes with a bound; an unreadable or oversized file is one CliError line. */
async function readBounded(path: string, limit: number): Promise<Buffer> {
  let handle;
  try {
    handle = await open(path, 'r');
  } catch (error) {
    throw new CliError(`${path}: cannot read it (${(error as NodeJS.ErrnoException).code ?? String(error)})`, EXIT_PROBLEMS);
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) throw new CliError(`${path}: it is a directory, not a file`, EXIT_PROBLEMS);
    const buffer = Buffer.alloc(Math.min(limit + 1, info.isFile() ? info.size + 1 : limit + 1));
    let filled = 0;
    while (filled < buffer.length) {
      const { bytesRead } = await handle.read(buffer, filled, buffer.length - filled, null);
      if (bytesRead === 0) break;
      filled += bytesRead;
    }
    if (filled > limit) throw new CliError(`${path}: larger than ${limit.toLocaleString('en')} bytes; split the readings or choose a window`, EXIT_PROBLEMS);
    return buffer.subarray(0, filled);
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`${path}: cannot read it (${(error as NodeJS.ErrnoException).code ?? String(error)})`, EXIT_PROBLEMS);
  } finally {
    await handle.close().catch(() => undefined);
  }
}
