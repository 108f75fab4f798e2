/** Exit codes: 0 success, 1 a case with errors or an unsolvable case, 2 bad command-line input. */
export const EXIT_PROBLEMS = 1;
export const EXIT_USAGE = 2;

/** An error meant for the user: printed as one line on stderr, never with a stack trace. */
export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode: number = EXIT_USAGE,
  ) {
    super(message);
    this.name = 'CliError';
  }
}
