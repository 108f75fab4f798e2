// The top-level help is drawn from a light list so that it loads no command;
// the list must say exactly what the commands themselves say.
import { describe, expect, it } from 'vitest';
import { COMMAND_SUMMARIES } from '../../src/cli/commandSummaries.js';
import { commands } from '../../src/cli/commands/index.js';
import { runCli } from '../helpers/cli.js';

describe('the top-level command list', () => {
  it('names every command, in order, with its own usage and description', () => {
    expect(COMMAND_SUMMARIES.map(({ command, describe }) => ({ command, describe }))).toEqual(commands.map((command) => ({ command: command.command, describe: command.describe })));
  });

  it('loads each command from its own module when it is named', async () => {
    for (const [at, summary] of COMMAND_SUMMARIES.entries()) expect(await summary.load()).toBe(commands[at]);
  });

  it('--help, written without loading yargs, is the text yargs itself gives', async () => {
    const ours = await runCli(['--help']);
    const theirs = await runCli(['--help'], { env: { STEAMWRIGHT_YARGS_HELP: '1' } });
    expect(theirs.code).toBe(0);
    expect(ours.code).toBe(0);
    expect(theirs.stdout).toContain('Commands:');
    expect(ours.stdout).toBe(theirs.stdout);
    expect(ours.stderr).toBe('');
  });
});
