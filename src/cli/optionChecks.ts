// Checks shared by the commands' yargs builders; each throws a CliError (exit 2).
import { CliError } from './errors.js';

/** `--workers`: a whole number of 1 or more (yargs reads "abc" as NaN). */
export function checkWorkers(workers: number | undefined): void {
  if (workers === undefined) return;
  if (Number.isNaN(workers)) throw new CliError('--workers expects a whole number of 1 or more, found a value that is not a number');
  if (!(Number.isInteger(workers) && workers >= 1)) throw new CliError(`--workers expects a whole number of 1 or more, found ${workers}`);
}

/** At most one of several output-format flags. */
export function checkOneOf(args: Record<string, unknown>, flags: string[]): void {
  const given = flags.filter((flag) => args[flag] === true);
  if (given.length > 1) throw new CliError(`--${given.join(' and --')} cannot be used together; choose one of --${flags.join(', --')}`);
}
