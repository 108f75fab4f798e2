// `steamwright report CASE`: the balance diagram and a self-contained HTML
// report, plus the same tables as Markdown or CSV.
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { basename, extname } from 'node:path';
import type { Argv, CommandModule } from 'yargs';
import type { BackendName } from '../../lp/index.js';
import { packageVersion } from '../../version.js';
import type { TitleBlock } from '../../report/diagram/index.js';
import { balanceDiagram, comparisonTable, htmlReport, plantDisplayFormat, reportTables, tablesCsv, tablesMarkdown } from '../../report/index.js';
import { findSavings, type SavingsResult } from '../../savings/index.js';
import type { Objective, Plant } from '../../model/index.js';
import { mergeParts, yearFingerprint, type PeriodRecord, type YearResult } from '../../year/index.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { checkWorkers } from '../optionChecks.js';
import { reconcileFilesOrFail } from '../reconcileRun.js';
import { runYearWithProgress, yearInputOrFail } from '../yearRun.js';
import { solveForReport } from '../reportSolve.js';
import { CliError, EXIT_PROBLEMS, EXIT_USAGE } from '../errors.js';
import { planOutputs, writeOutputs, type OutputRequest } from '../outputFiles.js';
import { OBJECTIVE_WORDS } from './solve.js';

interface ReportArgs {
  case: string;
  scenario?: string;
  out?: string;
  svg?: string;
  md?: string;
  csv?: string;
  objective?: string;
  solver: BackendName;
  savings: boolean;
  year: boolean;
  'year-parts'?: string[];
  readings?: string;
  workers?: number;
}

/** "cases/kestrel-bay-board-mill.yaml" -> "mill.report.html", or "mill.winter.report.html" for a scenario (in the current directory). */
export function defaultReportName(casePath: string, scenario?: string): string {
  return `${basename(casePath, extname(casePath))}${scenario ? `.${scenario}` : ''}.report.html`;
}

/** The drawing's title block: which scenario, drawn when, by which version, from which case file (short SHA-256). */
export function titleBlockFor(casePath: string, scenario: string | undefined): TitleBlock {
  const caseHash = createHash('sha256').update(readFileSync(casePath)).digest('hex').slice(0, 8);
  return { scenario, date: new Date().toISOString().slice(0, 10), version: packageVersion(), caseHash };
}

const toStdout = (target: string | undefined): boolean => target === '' || target === '-';

export const reportCommand: CommandModule<object, ReportArgs> = {
  command: 'report <case>',
  describe: 'Write the steam balance diagram and a self-contained HTML report of a plant case',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML)' })
      .option('scenario', { type: 'string', describe: 'report this scenario of the case instead of the plant as written and all scenarios' })
      .option('out', { alias: 'o', type: 'string', describe: 'the HTML file to write (default: CASE-NAME.report.html in the current directory)' })
      .option('svg', { type: 'string', describe: 'also write the balance diagram alone as SVG to FILE' })
      .option('md', { type: 'string', describe: 'write the tables as Markdown to FILE (no FILE or "-": standard output)' })
      .option('csv', { type: 'string', describe: 'write the tables as CSV to FILE (no FILE or "-": standard output)' })
      .option('objective', { choices: Object.keys(OBJECTIVE_WORDS), describe: 'overrides the case objective' })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .option('savings', { type: 'boolean', default: false, describe: 'add a savings section: the ranked measures and the roadmap (as `steamwright savings`), with their charts' })
      .option('year', { type: 'boolean', default: false, describe: 'add a year section: every period of the case\'s profile solved (as `steamwright year`), with its charts' })
      .option('year-parts', { type: 'string', array: true, describe: 'add the year section from the part files of `year --shard K/N --part FILE` instead of solving it again (they must be of this case and profile)' })
      .option('readings', { type: 'string', describe: 'add a meter reconciliation section from this readings CSV (as `steamwright reconcile`)' })
      .option('workers', { type: 'number', describe: 'with --year: most worker threads (default: one per core)' })
      .check((args) => {
        checkWorkers(args.workers);
        if (args.year && args['year-parts'] !== undefined) throw new CliError('--year solves the year and --year-parts reads one already solved: give one of them', EXIT_USAGE);
        if (args['year-parts'] !== undefined && args['year-parts'].length === 0) throw new CliError('--year-parts expects the part files written by "year --shard K/N --part FILE", found none', EXIT_USAGE);
        return true;
      })
      .example('$0 report cases/kestrel-bay-board-mill.yaml', 'write kestrel-bay-board-mill.report.html here')
      .example('$0 report cases/kestrel-bay-board-mill.yaml --out mill.html --svg mill.svg', 'the report and the diagram alone')
      .example('$0 report cases/kestrel-bay-board-mill.yaml --scenario winter', 'one scenario: kestrel-bay-board-mill.winter.report.html')
      .example('$0 report cases/kestrel-bay-board-mill.yaml --md', 'the tables as Markdown on standard output')
      .example('$0 report cases/millbrook-creamery.yaml --readings cases/millbrook-creamery.readings.csv', 'with the meters reconciled') as Argv<ReportArgs>,
  handler: async (args) => {
    // Every output is named and checked before any work is done.
    const requests: OutputRequest[] = [];
    const wantsHtml = args.out !== undefined || (args.svg === undefined && args.md === undefined && args.csv === undefined);
    if (wantsHtml) requests.push({ option: args.out === undefined ? 'the report' : '--out', path: args.out ?? defaultReportName(args.case, args.scenario) });
    if (args.svg !== undefined) requests.push({ option: '--svg', path: args.svg });
    if (args.md !== undefined) requests.push({ option: '--md', path: toStdout(args.md) ? '-' : args.md });
    if (args.csv !== undefined) requests.push({ option: '--csv', path: toStdout(args.csv) ? '-' : args.csv });
    const yearParts = args['year-parts'] ?? [];
    const planned = await planOutputs([{ option: 'case file', path: args.case }, ...(args.readings !== undefined ? [{ option: '--readings', path: args.readings }] : []), ...yearParts.map((path) => ({ option: '--year-parts', path }))], requests);
    const loaded = await loadCaseOrFail(args.case, 'no report was written');
    const objective = args.objective ? OBJECTIVE_WORDS[args.objective] : undefined;
    // The inputs of the added sections are read and checked before the long work.
    const reconciled = args.readings !== undefined ? (await reconcileFilesOrFail(args.case, args.readings, loaded.plant, { level: 0.05 })).outcome : undefined;
    const year = args.year || yearParts.length > 0 ? await yearFor(args, loaded.plant, objective) : undefined;
    const solved = await solveForReport(args.case, loaded, { scenario: args.scenario, objective, solver: args.solver });
    const { plant, result, subtitle, sections, failed, projects } = solved;
    const format = plantDisplayFormat(plant);

    let savings: SavingsResult | undefined;
    if (args.savings) {
      const text = readFileSync(args.case).toString('utf8').replace(/^\uFEFF/, '');
      savings = await findSavings(text, loaded.plant, loaded.variants, { backend: args.solver, objective });
    }

    const block = titleBlockFor(args.case, subtitle);
    // Everything is rendered before anything is written.
    const tables = reportTables(result, format);
    if (sections.length > 0) tables.push(comparisonTable(sections));
    const texts: Record<string, () => string> = {
      'the report': () => htmlReport(plant, result, { subtitle, scenarios: sections, failedScenarios: failed, projects, titleBlock: block, ...(savings ? { savings } : {}), ...(year ? { year } : {}), ...(reconciled ? { reconciled: { outcome: reconciled, readingsFile: args.readings! } } : {}) }),
      '--svg': () => `${balanceDiagram(result, format, block)}\n`,
      '--md': () => tablesMarkdown(result.plant, tables),
      '--csv': () => tablesCsv(tables),
    };
    texts['--out'] = texts['the report'];
    const outputs = planned.map((output) => {
      const text = texts[output.option]();
      return { ...output, text: output.kind === 'stdout' && !text.endsWith('\n') ? `${text}\n` : text };
    });
    await writeOutputs(outputs);
    const notice = outputs.filter((output) => output.kind !== 'stdout').map((output) => `wrote ${output.path}\n`).join('');
    if (outputs.some((output) => output.kind === 'stdout')) process.stderr.write(notice);
    else process.stdout.write(notice);
    // The report is complete and marks what failed; the exit code still says so.
    const problems: string[] = [];
    if (failed.length > 0) problems.push(`${failed.length} of ${failed.length + sections.length} scenarios could not be solved; the report marks them:`, ...failed.map((scenario) => `  ${scenario.id}: ${scenario.message}`));
    for (const project of projects) if (!project.ok) problems.push(`project ${project.id} could not be evaluated; the report marks it:`, ...project.failed.map((failure) => `  ${failure.scenario} (${failure.which}): ${failure.message}`));
    if (year && year.result.failed.length > 0) problems.push(`${year.result.failed.length} of ${year.result.periods} periods of the year could not be solved; the report lists them`);
    if (problems.length > 0) throw new CliError(`${args.case}: ${problems.join('\n')}`, EXIT_PROBLEMS);
  },
};

/** The year for the report: solved now (--year), or merged from part files of this very case and profile (--year-parts). */
async function yearFor(args: ReportArgs, plant: Plant, objective: Objective | undefined): Promise<{ result: YearResult; records: PeriodRecord[] }> {
  const { input } = await yearInputOrFail(args.case, plant, { objective, backend: args.solver });
  const parts = args['year-parts'] ?? [];
  if (parts.length === 0) {
    const run = await runYearWithProgress(input, { workers: args.workers, quiet: Boolean(process.env.CI), keepRecords: true });
    return { result: run.result!, records: run.records ?? [] };
  }
  const texts: { name: string; text: string }[] = [];
  for (const name of parts) {
    try {
      texts.push({ name, text: await readFile(name, 'utf8') });
    } catch (error) {
      const code = (error as NodeJS.ErrnoException).code;
      throw new CliError(`--year-parts: ${name}: cannot read the part file: ${code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : 'it cannot be read'}; no report was written`, EXIT_PROBLEMS);
    }
  }
  const merged = mergeParts(texts);
  if (!merged.ok) {
    for (const line of merged.problems) process.stderr.write(`${line}\n`);
    throw new CliError(`--year-parts: the parts do not make one year (${merged.problems.length} problem${merged.problems.length === 1 ? '' : 's'}); no report was written`, EXIT_PROBLEMS);
  }
  const expected = yearFingerprint(input);
  const stale = texts.filter(({ text }) => (JSON.parse(text) as { fingerprint?: string }).fingerprint !== expected).map(({ name }) => name);
  if (stale.length > 0) throw new CliError(`--year-parts: ${stale.join(', ')}: expected parts of ${args.case} and its profile as they are now${args.objective ? ` with --objective ${args.objective}` : ''}, found parts of other inputs (the case, the profile or the objective changed since they were solved); solve them again or use --year; no report was written`, EXIT_PROBLEMS);
  return { result: merged.result, records: merged.records };
}
