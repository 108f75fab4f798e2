// `steamwright reconcile CASE --readings FILE`: meter readings fitted to the
// plant's mass balances, tested, and the suspect meters named.
import type { Argv, CommandModule } from 'yargs';
import { reconciledCase } from '../../reconcile/index.js';
import { reconcileCsv, reconcileText } from '../../report/index.js';
import { CliError, EXIT_USAGE } from '../errors.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { reconcileFilesOrFail } from '../reconcileRun.js';
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
    const { outcome, caseText } = await reconcileFilesOrFail(args.case, args.readings, loaded.plant, { level: args.level, from: args.from, to: args.to });
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
