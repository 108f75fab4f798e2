// Standard output that fails (a full disk, a closed reader) ends the command
// with one line, never a stack trace; a reader that closes early
// (`steamwright solve x.yaml | head`) is not an error at all.
import { EXIT_PROBLEMS } from './errors.js';
import { removePending } from './pendingFiles.js';

const REASONS: Record<string, string> = {
  ENOSPC: 'no space left on the device',
  EDQUOT: 'disk quota exceeded',
  EIO: 'input/output error',
  EBADF: 'it is closed',
  EACCES: 'permission denied',
  EAGAIN: 'it would block',
};

/** Installs the one handler for errors on standard output. */
export function handleStdoutErrors(): void {
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    removePending();
    const reason = (error.code && REASONS[error.code]) ?? error.message;
    process.stderr.write(`steamwright: cannot write to standard output: ${reason}\n`);
    process.exit(EXIT_PROBLEMS);
  });
}

/** Writes to standard output and waits until the text is handed on (a failure ends the process through the handler). */
export function writeStdout(text: string): Promise<void> {
  return new Promise((resolve) => {
    if (process.stdout.write(text)) resolve();
    else process.stdout.once('drain', () => resolve());
  });
}
