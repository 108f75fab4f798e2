// `steamwright solve CASE`: the best operating point, its audited balance and
// the marginal value of steam at every header.
import type { Argv, CommandModule } from 'yargs';
import { getBackend, toLpFormat, type BackendName } from '../../lp/index.js';
import type { Objective } from '../../model/index.js';
import { plantResult, solvePlant } from '../../plant/index.js';
import { solveSummary } from '../../report/solveSummary.js';
import { planOutputs, writeOutputs } from '../outputFiles.js';
import { loadCaseOrFail } from '../loadCaseOrFail.js';
import { solveFailure } from '../solveFailure.js';
import { CliError, EXIT_USAGE } from '../errors.js';

interface SolveArgs {
  case: string;
  objective?: string;
  json: boolean;
  'export-lp'?: string;
  solver: BackendName;
  scenario?: string;
}

/** Command-line words for the objectives. */
export const OBJECTIVE_WORDS: Record<string, Objective> = {
  'min-cost': 'minimumCost',
  'min-fuel': 'minimumFuel',
  'max-power': 'maximumPower',
  'min-co2': 'minimumCo2',
};

export const solveCommand: CommandModule<object, SolveArgs> = {
  command: 'solve <case>',
  describe: 'Find the best operating point of a plant case and print its audited steam balance',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the plant case file (YAML)' })
      .option('objective', { choices: Object.keys(OBJECTIVE_WORDS), describe: 'overrides the case objective' })
      .option('json', { type: 'boolean', default: false, describe: 'print the whole result as JSON (SI units)' })
      .option('export-lp', { type: 'string', describe: 'also write the final linear model in CPLEX LP format to FILE' })
      .option('scenario', { type: 'string', describe: 'solve this scenario of the case instead of the plant as written' })
      .option('solver', { choices: ['highs', 'jslp'] as const, default: 'highs' as BackendName, describe: 'LP/MIP solver backend' })
      .example('$0 solve cases/kestrel-bay-board-mill.yaml', 'solve the demo board mill')
      .example('$0 solve cases/kestrel-bay-board-mill.yaml --objective max-power --json', 'most on-site power, as JSON') as Argv<SolveArgs>,
  handler: async (args) => {
    const requests = [{ option: 'the summary', path: '-' }];
    if (args['export-lp'] !== undefined) requests.push({ option: '--export-lp', path: args['export-lp'] });
    const planned = await planOutputs([{ option: 'case file', path: args.case }], requests);
    const loaded = await loadCaseOrFail(args.case);
    const objective = args.objective ? OBJECTIVE_WORDS[args.objective] : undefined;
    let plant = loaded.plant;
    if (args.scenario !== undefined) {
      const scenario = loaded.variants.scenarios.find((entry) => entry.id === args.scenario && !loaded.variants.implicitBase);
      if (!scenario) {
        const known = loaded.variants.implicitBase ? 'the case has no scenarios' : `known: ${loaded.variants.scenarios.map((entry) => entry.id).join(', ')}`;
        throw new CliError(`--scenario: no scenario "${args.scenario}" in ${args.case}; ${known}`, EXIT_USAGE);
      }
      plant = scenario.plant;
    }
    const outcome = await solvePlant(plant, { objective, backend: getBackend(args.solver) });
    if (!outcome.ok) throw solveFailure(args.case, args.scenario, outcome, args.solver);
    const result = plantResult(outcome);
    const summary = args.json ? `${JSON.stringify(result, null, 2)}\n` : solveSummary(result, { atmosphericPressure_MPa: loaded.plant.site.atmosphericPressure });
    const lp = args['export-lp'] !== undefined ? toLpFormat(outcome.pass.context.model).text : '';
    await writeOutputs(planned.map((output) => ({ ...output, text: output.option === '--export-lp' ? lp : summary })));
  },
};
