// `steamwright check CASE`: every issue of a case file, or a summary of the plant.
import type { Argv, CommandModule } from 'yargs';
import { readFile } from 'node:fs/promises';
import { formatIssue, loadCase, resolveMeters, summarisePlant } from '../../model/index.js';
import { streamNetwork } from '../../plant/index.js';
import { fuelMeters, meterStreams, planThermometers, powerMeters, pressureMeters } from '../../reconcile/index.js';
import { EXIT_PROBLEMS } from '../errors.js';

interface CheckArgs {
  case: string;
  verbose: boolean;
}

function plural(count: number, word: string): string {
  return `${count} ${word}${count === 1 ? '' : 's'}`;
}

export const checkCommand: CommandModule<object, CheckArgs> = {
  command: 'check <case>',
  describe: 'Check a plant case file: every problem with its line and column, or a summary of the plant',
  builder: (yargs: Argv<object>) =>
    yargs
      .positional('case', { type: 'string', demandOption: true, describe: 'the case file (YAML)' })
      .option('verbose', { alias: 'v', type: 'boolean', default: false, describe: 'also list every default applied' })
      .example('$0 check cases/kestrel-bay-board-mill.yaml', 'check a case')
      .example('$0 check plant.yaml --verbose', 'and list the defaults it relies on') as Argv<CheckArgs>,
  handler: async (args) => {
    const fileName = args.case;
    const result = await loadCase(fileName);
    const issues = result.ok ? result.warnings : result.issues;
    for (const issue of issues) process.stderr.write(`${formatIssue(issue, fileName)}\n`);
    const errors = issues.filter((issue) => issue.severity === 'error').length;
    const warnings = issues.length - errors;
    if (!result.ok) {
      process.stderr.write(`${fileName}: ${plural(errors, 'error')}, ${plural(warnings, 'warning')}\n`);
      process.exitCode = EXIT_PROBLEMS;
      return;
    }
    // Meters are checked against the plant's streams, as reconcile would.
    const meters = resolveMeters(await readFile(fileName, 'utf8'));
    const meterIssues = [...meters.issues, ...(meters.meters.length > 0 ? meterIssuesOf(meters.meters, streamNetwork(result.plant), result.plant) : [])].sort((a, b) => a.line - b.line);
    if (meterIssues.length > 0) {
      for (const issue of meterIssues) process.stderr.write(`${formatIssue(issue, fileName)}\n`);
      process.stderr.write(`${fileName}: ${plural(meterIssues.length, 'error')} in the meters, ${plural(warnings, 'warning')}\n`);
      process.exitCode = EXIT_PROBLEMS;
      return;
    }
    const lines = [`${fileName}: no errors, ${plural(warnings, 'warning')}`, ...summarisePlant(result.plant)];
    if (args.verbose) {
      lines.push(result.plant.defaults.length === 0 ? 'defaults applied: none' : 'defaults applied:');
      for (const applied of result.plant.defaults) lines.push(`  ${applied.path} = ${applied.value}  (${applied.reason})`);
      const costs = result.plant.costs;
      if (costs && costs.defaults.length > 0) {
        lines.push(`unit costs for savings, defaults applied (${costs.accuracy}):`);
        for (const applied of costs.defaults) lines.push(`  ${applied.path} = ${applied.value}  (${applied.reason})`);
      }
    }
    process.stdout.write(`${lines.join('\n')}\n`);
  },
};

/** Flow meters and thermometers checked against the plant's streams. */
function meterIssuesOf(meters: Parameters<typeof meterStreams>[0], network: Parameters<typeof meterStreams>[1], plant: Parameters<typeof planThermometers>[2]) {
  return [...meterStreams(meters, network).issues, ...planThermometers(meters, network, plant).issues, ...powerMeters(meters, network).issues, ...fuelMeters(meters, network).issues, ...pressureMeters(meters, plant).issues];
}
