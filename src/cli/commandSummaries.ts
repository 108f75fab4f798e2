// What the top-level help lists, without loading any command: `steamwright
// --help` and `--version` then start about as fast as Node itself. A test
// (tests/cli/commandSummaries.test.ts) keeps this list equal to the commands.

export interface CommandSummary {
  command: string;
  describe: string;
}

export const COMMAND_SUMMARIES: CommandSummary[] = [
  { command: 'solve <case>', describe: 'Find the best operating point of a plant case and print its audited steam balance' },
  { command: 'compare <case>', describe: 'Solve the scenarios of a case (or the steps of a sweep) and print them side by side' },
  { command: 'evaluate <case>', describe: 'Evaluate the projects of a case over its scenarios (savings, payback, NPV, IRR) and screen letdowns for turbines' },
  { command: 'savings <case>', describe: 'Find, value and rank savings measures, each proven by solving the changed plant on every scenario, and the cumulative roadmap' },
  { command: 'year <case> [parts..]', describe: 'Solve every period of the case\'s profile (a CSV of hours) and total the year; "year merge PART..." combines shards' },
  { command: 'report <case>', describe: 'Write the steam balance diagram and a self-contained HTML report of a plant case' },
  { command: 'watch <case>', describe: 'Serve the report of a case on this machine (127.0.0.1) and redraw it whenever the case (or its readings or profile) is saved' },
  { command: 'check <case>', describe: 'Check a plant case file: every problem with its line and column, or a summary of the plant' },
  { command: 'init <file>', describe: 'Write a commented starter case file (never overwrites)' },
  { command: 'state', describe: 'Water or steam properties by IAPWS-IF97 from p with T, h, s or x (or T with x)' },
  { command: 'reconcile <case>', describe: 'Fit meter readings to the plant balances, estimate unmetered flows and name suspect meters' },
];
