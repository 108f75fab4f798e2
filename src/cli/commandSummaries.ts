// What the top-level help lists, without loading any command: `steamwright
// --help` and `--version` then start about as fast as Node itself; a named
// command loads its own module and no other's. A test
// (tests/cli/commandSummaries.test.ts) keeps this list equal to the commands.

import type { CommandModule } from 'yargs';

export interface CommandSummary {
  command: string;
  describe: string;
  /** the command's own module, loaded only when the command is named */
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  load: () => Promise<CommandModule<any, any>>;
}

export const COMMAND_SUMMARIES: CommandSummary[] = [
  { command: 'solve <case>', describe: 'Find the best operating point of a plant case and print its audited steam balance', load: async () => (await import('./commands/solve.js')).solveCommand },
  { command: 'compare <case>', describe: 'Solve the scenarios of a case (or the steps of a sweep) and print them side by side', load: async () => (await import('./commands/compare.js')).compareCommand },
  { command: 'evaluate <case>', describe: 'Evaluate the projects of a case over its scenarios (savings, payback, NPV, IRR) and screen letdowns for turbines', load: async () => (await import('./commands/evaluate.js')).evaluateCommand },
  { command: 'savings <case>', describe: 'Find, value and rank savings measures, each proven by solving the changed plant on every scenario, and the cumulative roadmap', load: async () => (await import('./commands/savings.js')).savingsCommand },
  { command: 'year <case> [parts..]', describe: 'Solve every period of the case\'s profile (a CSV of hours) and total the year; "year merge PART..." combines shards', load: async () => (await import('./commands/year.js')).yearCommand },
  { command: 'report <case>', describe: 'Write the steam balance diagram and a self-contained HTML report of a plant case', load: async () => (await import('./commands/report.js')).reportCommand },
  { command: 'watch <case>', describe: 'Serve the report of a case on this machine (127.0.0.1) and redraw it whenever the case (or its readings or profile) is saved', load: async () => (await import('./commands/watch.js')).watchCommand },
  { command: 'check <case>', describe: 'Check a plant case file: every problem with its line and column, or a summary of the plant', load: async () => (await import('./commands/check.js')).checkCommand },
  { command: 'init <file>', describe: 'Write a commented starter case file (never overwrites)', load: async () => (await import('./commands/init.js')).initCommand },
  { command: 'state', describe: 'Water or steam properties by IAPWS-IF97 from p with T, h, s or x (or T with x)', load: async () => (await import('./commands/state.js')).stateCommand },
  { command: 'reconcile <case>', describe: 'Fit meter readings to the plant balances, estimate unmetered flows and name suspect meters', load: async () => (await import('./commands/reconcile.js')).reconcileCommand },
];
