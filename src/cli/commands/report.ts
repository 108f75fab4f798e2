// `steamwright report CASE`: the balance diagram and a self-contained HTML
// report, plus the same tables as Markdown or CSV.
import { basename, extname } from 'node:path';
import type { Argv, CommandModule } from 'yargs';
import { getBackend, type BackendName } from '../../lp/index.js';
import { plantResult, solvePlant } from '../../plant/index.js';
import { balanceDiagram, comparisonTable, htmlReport, plantDisplayFormat, reportTables, tablesCsv, tablesMarkdown, type ScenarioSection } from '../../report/index.js';
import { compareScenarios } from '../../scenarios/index.js';
import { findSavings, type SavingsResult } from '../../savings/index.js';
import { readFile } from 'node:fs/promises';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { solveFailure } from '../solveFailure.js';
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
}

/** "cases/mill.yaml" -> "mill.report.html", or "mill.winter.report.html" for a scenario (in the current directory). */
export function defaultReportName(casePath: string, scenario?: string): string {
  return `${basename(casePath, extname(casePath))}${scenario ? `.${scenario}` : ''}.report.html`;
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
      .example('$0 report cases/mill.yaml', 'write mill.report.html here')
      .example('$0 report cases/mill.yaml --out mill.html --svg mill.svg', 'the report and the diagram alone')
      .example('$0 report cases/mill.yaml --scenario winter', 'one scenario: mill.winter.report.html')
      .example('$0 report cases/mill.yaml --md', 'the tables as Markdown on standard output') as Argv<ReportArgs>,
  handler: async (args) => {
    // Every output is named and checked before any work is done.
    const requests: OutputRequest[] = [];
    const wantsHtml = args.out !== undefined || (args.svg === undefined && args.md === undefined && args.csv === undefined);
    if (wantsHtml) requests.push({ option: args.out === undefined ? 'the report' : '--out', path: args.out ?? defaultReportName(args.case, args.scenario) });
    if (args.svg !== undefined) requests.push({ option: '--svg', path: args.svg });
    if (args.md !== undefined) requests.push({ option: '--md', path: toStdout(args.md) ? '-' : args.md });
    if (args.csv !== undefined) requests.push({ option: '--csv', path: toStdout(args.csv) ? '-' : args.csv });
    const planned = await planOutputs([{ option: 'case file', path: args.case }], requests);
    const loaded = await loadCaseOrFail(args.case, 'no report was written');
    const variants = loaded.variants;
    let plant = loaded.plant;
    let subtitle: string | undefined;
    if (args.scenario !== undefined) {
      const scenario = variants.implicitBase ? undefined : variants.scenarios.find((entry) => entry.id === args.scenario);
      if (!scenario) {
        const known = variants.implicitBase ? 'the case has no scenarios' : `known: ${variants.scenarios.map((entry) => entry.id).join(', ')}`;
        throw new CliError(`--scenario: no scenario "${args.scenario}" in ${args.case}; ${known}`, EXIT_USAGE);
      }
      plant = scenario.plant;
      subtitle = `Scenario ${scenario.id}: ${scenario.name} (${scenario.hours} h a year)`;
    }
    const objective = args.objective ? OBJECTIVE_WORDS[args.objective] : undefined;
    const outcome = await solvePlant(plant, { objective, backend: getBackend(args.solver) });
    if (!outcome.ok) throw solveFailure(args.case, args.scenario, outcome, args.solver);
    const result = plantResult(outcome);
    const format = plantDisplayFormat(plant);

    // Without --scenario, a case with scenarios reports them all side by side.
    const sections: ScenarioSection[] = [];
    if (args.scenario === undefined && !variants.implicitBase) {
      const comparison = await compareScenarios(variants, [], { objective, backend: args.solver });
      for (const [index, run] of comparison.runs.entries()) {
        if (!run.ok) throw new CliError(`${args.case} scenario "${run.id}": ${run.message}`, EXIT_PROBLEMS);
        sections.push({ id: run.id, name: run.name, hours: run.hours, plant: variants.scenarios[index].plant, result: run.result });
      }
    }

    let savings: SavingsResult | undefined;
    if (args.savings) {
      const text = (await readFile(args.case)).toString('utf8').replace(/^\uFEFF/, '');
      savings = await findSavings(text, loaded.plant, variants, { backend: args.solver, objective });
    }

    // Everything is rendered before anything is written.
    const tables = reportTables(result, format);
    if (sections.length > 0) tables.push(comparisonTable(sections));
    const texts: Record<string, () => string> = {
      'the report': () => htmlReport(plant, result, { subtitle, scenarios: sections, ...(savings ? { savings } : {}) }),
      '--svg': () => `${balanceDiagram(result, format)}\n`,
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
  },
};
