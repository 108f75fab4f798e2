#!/usr/bin/env node
// The steamwright command line: thin commands over the library, no physics here.
import { COMMAND_SUMMARIES } from './commandSummaries.js';
import { CliError, EXIT_USAGE } from './errors.js';
import { joinNegativeValues } from './negativeValues.js';
import { removePendingOnExit } from './pendingFiles.js';
import { handleStdoutErrors } from './stdout.js';
import { packageVersion } from '../version.js';
import { setFlagsFromString } from 'node:v8';

// HiGHS is a large WebAssembly module. V8 compiles it at once with its
// baseline compiler (Liftoff), then recompiles hot functions with its
// optimising one on background threads; for our runs that recompilation costs
// more CPU than it saves, and the process waits for it at exit. Measured on
// the mill (user CPU, same machine, one run after another): solve 1.9 s -> 0.9 s,
// compare 2.9 s -> 1.2 s, a 48-hour year on one worker 5.6 s -> 4.0 s.
// Set before any command (and so HiGHS) is loaded; worker threads share it.
// STEAMWRIGHT_WASM_TIERING=1 keeps V8's default, for measuring.
if (process.env.STEAMWRIGHT_WASM_TIERING !== '1') setFlagsFromString('--liftoff-only');

const ABOUT = 'Industrial steam-system planning: IAPWS-IF97 properties, plant cases, optimised steam balances.';

/** `steamwright --help` as yargs lays it out (no wrapping), from the command list alone. */
function topLevelHelp(): string {
  const usages = COMMAND_SUMMARIES.map((summary) => `steamwright ${summary.command}`);
  const width = Math.max(...usages.map((usage) => usage.length)) + 2;
  return [
    'steamwright <command> [options]',
    '',
    ABOUT,
    '',
    'Commands:',
    ...COMMAND_SUMMARIES.map((summary, at) => `  ${usages[at].padEnd(width)}${summary.describe}`),
    '',
    'Options:',
    '  --help     Show help  [boolean]',
    '  --version  Show version number  [boolean]',
    '',
  ].join('\n');
}

/** yargs reads a lone "-" as an unknown argument, not as an option's value ("--batch -" for stdin). */
function joinStdinValues(argv: string[]): string[] {
  const joined: string[] = [];
  for (const arg of argv) {
    const previous = joined[joined.length - 1];
    if (arg === '-' && previous !== undefined && /^--[a-z][\w-]*$/.test(previous)) joined[joined.length - 1] = `${previous}=-`;
    else joined.push(arg);
  }
  return joined;
}

/** Options that take no value: a negative number after one is not its value. */
const BOOLEAN_FLAGS = new Set(['json', 'verbose', 'screen', 'help', 'version']);
/** Options whose empty value means something ("--md" alone: standard output). */
const EMPTY_ALLOWED = new Set(['md', 'csv']);
/** Positionals and options that take several values (`year merge PART...`, `report --year-parts PART...`): a list there is not an option given twice. */
const LIST_POSITIONALS = new Set(['parts', 'year-parts']);

/**
 * Every command: an option given twice, or given an empty value, is a usage
 * error (exit 2) rather than an array or an empty string reaching a handler.
 */
function checkOptionValues(argv: Record<string, unknown>): true {
  const problems: string[] = [];
  // yargs also stores "export-lp" as "exportLp", and "--out" under its alias "o".
  const keys = Object.keys(argv).filter((key) => key !== '_' && key !== '$0' && !(key.length > 1 && /[A-Z]/.test(key)));
  const long = keys.filter((key) => key.length > 1);
  const isAlias = (key: string): boolean => key.length === 1 && long.some((other) => JSON.stringify(argv[other]) === JSON.stringify(argv[key]));
  for (const key of keys) {
    const value = argv[key];
    if (!(Array.isArray(value) || (value === '' && !EMPTY_ALLOWED.has(key))) || isAlias(key) || LIST_POSITIONALS.has(key)) continue;
    const flag = `--${key}`;
    problems.push(Array.isArray(value)
      ? `${flag} was given ${value.length} times (${value.map((item) => JSON.stringify(item)).join(', ')}); give it once`
      : `${flag} needs a value, found an empty one`);
  }
  if (problems.length > 0) throw new CliError(problems.join('; '), EXIT_USAGE);
  return true;
}

export async function main(argv: string[]): Promise<number> {
  // No command named: the top-level help, the version or the request for a
  // command need none of the commands' code, so none of it is loaded.
  const named = argv.some((arg) => !arg.startsWith('-'));
  if (!named && argv.length === 1 && argv[0] === '--version') {
    process.stdout.write(`${packageVersion()}\n`);
    return 0;
  }
  // The top-level help is written here, not by yargs, whose loading alone
  // takes longer than Node's start; a test keeps it equal to yargs's own.
  if (!named && argv.length === 1 && argv[0] === '--help' && process.env.STEAMWRIGHT_YARGS_HELP !== '1') {
    process.stdout.write(topLevelHelp());
    return 0;
  }
  const { default: yargs } = await import('yargs');
  const parser = yargs(joinNegativeValues(joinStdinValues(argv), BOOLEAN_FLAGS))
    .scriptName('steamwright')
    .usage(`$0 <command> [options]\n\n${ABOUT}`)
    .strict()
    .demandCommand(1, 'Name a command, for example: steamwright state --p "10 barg" --x 1')
    .recommendCommands()
    .check(checkOptionValues, true)
    .help()
    .version()
    .wrap(null)
    .fail((message, error) => {
      // Errors thrown by a command (ours or a bug) go on to the catch below;
      // yargs' own usage errors (unknown option, missing argument) end here.
      throw error ?? new CliError(message, EXIT_USAGE);
    });
  if (named) {
    // Only the named command's module (and what it imports) is loaded; a word
    // that names no command loads them all, so yargs can suggest the nearest.
    const word = argv.find((arg) => !arg.startsWith('-'));
    const one = COMMAND_SUMMARIES.find((summary) => summary.command.split(' ')[0] === word);
    const { commands } = one ? { commands: [await one.load()] } : await import('./commands/index.js');
    for (const command of commands) parser.command(command);
  } else {
    for (const summary of COMMAND_SUMMARIES) parser.command(summary.command, summary.describe);
  }
  try {
    await parser.parseAsync();
  } catch (error) {
    if (error instanceof CliError) {
      process.stderr.write(`steamwright: ${error.message}\n`);
      return error.exitCode;
    }
    throw error;
  }
  return (process.exitCode as number | undefined) ?? 0;
}

handleStdoutErrors();
removePendingOnExit();

// The arguments after node and the script (what yargs' hideBin gives for Node).
main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    // A stack trace here is a bug in steamwright, not a user error.
    process.stderr.write(`steamwright: internal error: ${error instanceof Error ? error.stack : String(error)}\n`);
    process.exitCode = 70;
  },
);
