// `steamwright evaluate CASE`: each project against the plant without it over
// every scenario, and the letdown-to-power screen of the base scenarios.
import type { Argv, CommandModule } from 'yargs';
import type { BackendName } from '../../lp/index.js';
import { plantDisplayFormat, projectsText, screenText } from '../../report/index.js';
import { evaluateProjects, ProjectLookupError, progressLine, SCREEN_DEFAULTS, screenLetdowns, type LetdownScreenRow } from '../../scenarios/index.js';
import { parseQuantity } from '../../units/index.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { CliError, EXIT_PROBLEMS, EXIT_USAGE } from '../errors.js';
import { checkWorkers } from '../optionChecks.js';

interface EvaluateArgs {
  case: string;
  project?: string;
  json: boolean;
  screen: boolean;
  'turbine-efficiency'?: string;
  'generator-efficiency'?: string;
  solver: BackendName;
  workers?: number;
}

function percentOption(text: string | undefined, name: string, fallback: number): number {
  if (text === undefined) return fallback;
  const parsed = parseQuantity(text, 'percent');
  if (!parsed.ok) throw new CliError(`--${name}: ${parsed.message}`, EXIT_USAGE);
  if (!(parsed.value > 0 && parsed.value <= 1)) throw new CliError(`--${name}: expected a percentage above 0 % and at most 100 %, found "${text}"`, EXIT_USAGE);
  return parsed.value;
}

export const evaluateCommand: CommandModule<object, EvaluateArgs> = {
  command: 'evaluate <case>',
  describe: 'Evaluate the projects of a case over its scenarios (savings, payback, NPV, IRR) and screen letdowns for turbines',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML)' })
      .option('project', { type: 'string', describe: 'evaluate only this project' })
      .option('json', { type: 'boolean', default: false, describe: 'print projects[] and screen[] as JSON (SI units)' })
      .option('screen', { type: 'boolean', default: true, describe: 'include the letdown-to-power screen (--no-screen leaves it out)' })
      .option('turbine-efficiency', { type: 'string', describe: `isentropic efficiency for the screen; default ${SCREEN_DEFAULTS.isentropicEfficiency * 100} % (common practice for small back-pressure sets, no single source)` })
      .option('generator-efficiency', { type: 'string', describe: `gearbox and generator efficiency for the screen; default ${SCREEN_DEFAULTS.generatorEfficiency * 100} %` })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .option('workers', { type: 'number', describe: 'most worker threads (default: one per core; 1 solves in process)' })
      .check((args) => {
        checkWorkers(args.workers);
        return true;
      })
      .example('$0 evaluate cases/kestrel-bay-board-mill.yaml', 'every project and the letdown screen')
      .example('$0 evaluate cases/kestrel-bay-board-mill.yaml --project bpt_mp_lp --json', 'one project as JSON') as Argv<EvaluateArgs>,
  handler: async (args) => {
    const efficiency = percentOption(args['turbine-efficiency'], 'turbine-efficiency', SCREEN_DEFAULTS.isentropicEfficiency);
    const generator = percentOption(args['generator-efficiency'], 'generator-efficiency', SCREEN_DEFAULTS.generatorEfficiency);
    const loaded = await loadCaseOrFail(args.case);
    const progress = progressLine('evaluate', process.stderr, args.json);
    let outcome;
    try {
      outcome = await evaluateProjects(loaded.variants, args.project ? [args.project] : [], { backend: args.solver, workers: args.workers, onProgress: progress.onProgress });
    } catch (error) {
      if (error instanceof ProjectLookupError) throw new CliError(`${args.case}: ${error.message}`, EXIT_USAGE);
      throw error;
    } finally {
      progress.finish();
    }
    const screen: LetdownScreenRow[] = [];
    if (args.screen) {
      for (const run of outcome.base) {
        const scenario = loaded.variants.scenarios.find((entry) => entry.id === run.id)!;
        if (run.ok) screen.push(...(await screenLetdowns(run.id, run.hours, scenario.plant, run.result, { isentropicEfficiency: efficiency, generatorEfficiency: generator, backend: args.solver })));
      }
    }
    const currency = loaded.plant.site.currency;
    const format = plantDisplayFormat(loaded.plant);
    if (args.json) {
      const scenarios = outcome.base.map((run) => (run.ok ? { id: run.id, hours: run.hours, ok: true, cost_per_h: run.cost_per_h, cost_per_year: run.cost_per_year } : run));
      process.stdout.write(`${JSON.stringify({ plant: loaded.plant.name, currency, scenarios, projects: outcome.projects, screen: args.screen ? { isentropic_efficiency: efficiency, generator_efficiency: generator, rows: screen } : null }, null, 2)}\n`);
    } else {
      const failedBase = outcome.base.filter((run) => !run.ok).map((run) => `  ${run.id}: NOT SOLVED: ${run.ok ? '' : run.message}`);
      const parts = [
        outcome.projects.length > 0 ? projectsText(outcome.projects, format) : 'The case has no projects.\n',
        ...(failedBase.length > 0 ? [`Scenarios that could not be solved\n${failedBase.join('\n')}\n`] : []),
        ...(args.screen ? [screenText(screen, format, efficiency, generator)] : []),
      ];
      process.stdout.write(parts.join('\n'));
    }
    const failed = outcome.base.filter((run) => !run.ok).length + outcome.projects.filter((project) => !project.ok).length;
    if (failed > 0) throw new CliError(`${args.case}: ${failed} scenario or project solve${failed === 1 ? '' : 's'} failed; see above`, EXIT_PROBLEMS);
  },
};
