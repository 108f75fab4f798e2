// `steamwright savings CASE`: measures found from the solved balance, each
// proven by solving the changed plant on every scenario, ranked, with the
// cumulative roadmap. Text, JSON, CSV and Markdown; the HTML section comes
// with `report --savings`.
import { readFile } from 'node:fs/promises';
import type { Argv, CommandModule } from 'yargs';
import type { BackendName } from '../../lp/index.js';
import { measureOverlaysYaml, plantDisplayFormat, SAFETY_CAUTION, savingsTables, table, tablesCsv, tablesMarkdown } from '../../report/index.js';
import { progressLine } from '../../scenarios/index.js';
import { findSavings, RANK_CRITERIA, type RankCriterion, type SavingsResult } from '../../savings/index.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { CliError, EXIT_PROBLEMS } from '../errors.js';
import { checkWorkers } from '../optionChecks.js';
import { planOutputs, writeOutputs, type OutputRequest } from '../outputFiles.js';

interface SavingsArgs {
  case: string;
  rank: RankCriterion;
  json: boolean;
  md?: string;
  csv?: string;
  solver: BackendName;
  workers?: number;
}

const toStdout = (target: string | undefined): boolean => target === '' || target === '-';

/** The result for --json: the base scenarios without their full solved plants. */
export function savingsJson(result: SavingsResult): unknown {
  return {
    ...result,
    base: result.base.map((run) => (run.ok ? { id: run.id, name: run.name, hours: run.hours, ok: true, cost_per_h: run.cost_per_h, cost_per_year: run.cost_per_year, cost_by_component_per_year: run.cost_by_component_per_year } : run)),
  };
}

export function savingsText(result: SavingsResult, format: ReturnType<typeof plantDisplayFormat>): string {
  const parts = [`${result.plant}: savings found from the solved balance, each measure solved on every scenario`, `Capital estimates: ${result.accuracy}.`, ''];
  for (const entry of savingsTables(result, format)) {
    parts.push(entry.title);
    parts.push(entry.rows.length > 0 ? table(entry.headings, entry.rows) : '  none', '');
  }
  parts.push('The measures as projects: copy one under projects: in the case, edit it, and run evaluate.', measureOverlaysYaml(result), SAFETY_CAUTION, '');
  return parts.join('\n');
}

export const savingsCommand: CommandModule<object, SavingsArgs> = {
  command: 'savings <case>',
  describe: 'Find, value and rank savings measures, each proven by solving the changed plant on every scenario, and the cumulative roadmap',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML)' })
      .option('rank', { choices: RANK_CRITERIA, default: 'npv' as RankCriterion, describe: 'rank by net present value, net annual saving, simple payback, IRR or CO2 avoided' })
      .option('json', { type: 'boolean', default: false, describe: 'print the result as JSON (SI units)' })
      .option('md', { type: 'string', describe: 'write the tables as Markdown to FILE (no FILE or "-": standard output)' })
      .option('csv', { type: 'string', describe: 'write the tables as CSV to FILE (no FILE or "-": standard output)' })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .option('workers', { type: 'number', describe: 'most worker threads (default: one per core; 1 solves in process)' })
      .check((args) => {
        checkWorkers(args.workers);
        const toOut = [args.json, toStdout(args.md), toStdout(args.csv)].filter(Boolean).length;
        if (toOut > 1) throw new CliError('only one of --json, --md and --csv may go to standard output; give the others a FILE');
        return true;
      })
      .example('$0 savings cases/orchard-vale-foods.yaml', 'the ranked measures and the roadmap')
      .example('$0 savings cases/orchard-vale-foods.yaml --rank payback --md savings.md', 'ranked by payback, tables also as Markdown') as Argv<SavingsArgs>,
  handler: async (args) => {
    const requests: OutputRequest[] = [];
    if (args.md !== undefined) requests.push({ option: '--md', path: toStdout(args.md) ? '-' : args.md });
    if (args.csv !== undefined) requests.push({ option: '--csv', path: toStdout(args.csv) ? '-' : args.csv });
    const planned = await planOutputs([{ option: 'case file', path: args.case }], requests);
    const loaded = await loadCaseOrFail(args.case);
    const text = (await readFile(args.case)).toString('utf8').replace(/^\uFEFF/, '');
    const progress = progressLine('savings', process.stderr, args.json);
    let result: SavingsResult;
    try {
      result = await findSavings(text, loaded.plant, loaded.variants, { criterion: args.rank, backend: args.solver, workers: args.workers, onProgress: progress.onProgress });
    } finally {
      progress.finish();
    }
    const failedBase = result.base.filter((run) => !run.ok);
    if (failedBase.length > 0) {
      throw new CliError(`${args.case}: ${failedBase.map((run) => `scenario "${run.id}" could not be solved: ${run.ok ? '' : run.message}`).join('; ')}; no savings can be measured against it`, EXIT_PROBLEMS);
    }
    const format = plantDisplayFormat(loaded.plant);
    const tables = savingsTables(result, format);
    const texts: Record<string, () => string> = {
      '--md': () => tablesMarkdown(`${result.plant}: savings`, tables, [`Capital estimates: ${result.accuracy}.`, SAFETY_CAUTION.replace(/\n/g, ' ')]),
      '--csv': () => tablesCsv(tables),
    };
    const outputs = planned.map((output) => {
      const body = texts[output.option]();
      return { ...output, text: output.kind === 'stdout' && !body.endsWith('\n') ? `${body}\n` : body };
    });
    const toStdoutAlready = outputs.some((output) => output.kind === 'stdout');
    if (args.json) process.stdout.write(`${JSON.stringify(savingsJson(result), null, 2)}\n`);
    else if (!toStdoutAlready) process.stdout.write(savingsText(result, format));
    await writeOutputs(outputs);
    const notice = outputs.filter((output) => output.kind !== 'stdout').map((output) => `wrote ${output.path}\n`).join('');
    process.stderr.write(notice);
  },
};
