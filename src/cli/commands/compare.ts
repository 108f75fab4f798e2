// `steamwright compare CASE`: scenarios (or a sweep's steps) solved side by
// side, with differences against the first column and the annual total.
import type { Argv, CommandModule } from 'yargs';
import type { BackendName } from '../../lp/index.js';
import { compareCsv, compareMarkdown, compareText, plantDisplayFormat } from '../../report/index.js';
import { AS_WRITTEN, compareScenarios, progressLine, runSweep, ScenarioLookupError, type Comparison } from '../../scenarios/index.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { CliError, EXIT_PROBLEMS, EXIT_USAGE } from '../errors.js';
import { checkOneOf, checkWorkers } from '../optionChecks.js';
import { OBJECTIVE_WORDS } from './solve.js';

interface CompareArgs {
  case: string;
  scenarios?: string;
  sweep?: string;
  json: boolean;
  csv: boolean;
  md: boolean;
  objective?: string;
  solver: BackendName;
  workers?: number;
}

export const compareCommand: CommandModule<object, CompareArgs> = {
  command: 'compare <case>',
  describe: 'Solve the scenarios of a case (or the steps of a sweep) and print them side by side',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML)' })
      .option('scenarios', { type: 'string', describe: 'comma-separated scenario ids, in column order (default: all); "plant" is the plant as written, a whole year beside the scenarios, not in the annual total' })
      .option('sweep', { type: 'string', describe: 'solve the steps of this sweep instead of the scenarios' })
      .option('json', { type: 'boolean', default: false, describe: 'print scenarios[] as JSON (SI units)' })
      .option('csv', { type: 'boolean', default: false, describe: 'print the table as CSV' })
      .option('md', { type: 'boolean', default: false, describe: 'print the table as Markdown' })
      .option('objective', { choices: Object.keys(OBJECTIVE_WORDS), describe: 'overrides the case objective' })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .option('workers', { type: 'number', describe: 'most worker threads (default: one per core; 1 solves in process)' })
      .conflicts('scenarios', 'sweep')
      .check((args) => {
        checkOneOf(args, ['json', 'csv', 'md']);
        checkWorkers(args.workers);
        return true;
      })
      .example('$0 compare cases/kestrel-bay-board-mill.yaml', 'every scenario side by side')
      .example('$0 compare cases/kestrel-bay-board-mill.yaml --scenarios plant,winter,summer', 'the plant as written beside two scenarios')
      .example('$0 compare cases/kestrel-bay-board-mill.yaml --sweep import_price --csv', 'a sweep as CSV') as Argv<CompareArgs>,
  handler: async (args) => {
    const loaded = await loadCaseOrFail(args.case);
    const progress = progressLine('compare', process.stderr, args.json);
    const options = { objective: args.objective ? OBJECTIVE_WORDS[args.objective] : undefined, backend: args.solver, workers: args.workers, onProgress: progress.onProgress };
    let comparison: Comparison;
    let title: string;
    let sweepOf: { id: string; target: string; scenario: string } | null = null;
    try {
      if (args.sweep) {
        const sweep = await runSweep(loaded.variants, args.sweep, options);
        comparison = sweep;
        sweepOf = { id: args.sweep, target: sweep.target, scenario: sweep.scenario };
        title = `${loaded.plant.name}: sweep "${args.sweep}" of ${sweep.target} on ${sweep.scenario === 'plant' ? 'the plant as written' : `scenario "${sweep.scenario}"`}, differences against the first step`;
      } else {
        const ids = args.scenarios ? args.scenarios.split(',').map((id) => id.trim()).filter((id) => id !== '') : [];
        comparison = await compareScenarios(loaded.variants, ids, options, loaded.plant);
        const asWritten = ids.includes(AS_WRITTEN) ? ` ("${AS_WRITTEN}" is the plant as written, left out of the annual total)` : '';
        title = `${loaded.plant.name}: scenarios side by side, differences against ${comparison.runs[0]?.id ?? 'the first'}${asWritten}`;
      }
    } catch (error) {
      if (error instanceof ScenarioLookupError) throw new CliError(`${args.case}: ${error.message}`, EXIT_USAGE);
      throw error;
    } finally {
      progress.finish();
    }
    const currency = loaded.plant.site.currency;
    const format = plantDisplayFormat(loaded.plant);
    const { runs, annual } = comparison;
    if (args.json) {
      const scenarios = runs.map((run) => (run.ok ? { ...run, result: undefined } : run));
      // A sweep's steps are alternatives: no annual total, and the sweep named instead.
      const head = sweepOf ? { plant: loaded.plant.name, currency, sweep: sweepOf, annual: null } : { plant: loaded.plant.name, currency, annual };
      process.stdout.write(`${JSON.stringify({ ...head, scenarios }, null, 2)}\n`);
    } else if (args.csv) {
      process.stdout.write(compareCsv(runs, format));
    } else if (args.md) {
      process.stdout.write(compareMarkdown(runs, format));
    } else {
      process.stdout.write(compareText(title, runs, format, sweepOf ? null : annual));
    }
    const failed = runs.filter((run) => !run.ok);
    if (failed.length > 0) {
      throw new CliError(`${args.case}: ${failed.length} of ${runs.length} could not be solved: ${failed.map((run) => run.id).join(', ')}`, EXIT_PROBLEMS);
    }
  },
};
