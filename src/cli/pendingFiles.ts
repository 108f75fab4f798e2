// Temporary and backup files that exist only while outputs are being written.
// Whatever ends the process (an error, SIGINT, SIGTERM, SIGHUP), they are
// removed, so no half-written file is ever left behind.
import { unlinkSync } from 'node:fs';

const pending = new Set<string>();

/** Remembers a file to remove should the process end before `release`. */
export function holdPending(path: string): void {
  pending.add(path);
}

/** The file was renamed into place or removed: nothing left to clean. */
export function releasePending(path: string): void {
  pending.delete(path);
}

/** Removes every pending file now (synchronously: it runs on exit and on signals). */
export function removePending(): void {
  for (const path of pending) {
    try {
      unlinkSync(path);
    } catch {
      // Already gone.
    }
  }
  pending.clear();
}

const SIGNAL_EXIT: Record<string, number> = { SIGINT: 130, SIGTERM: 143, SIGHUP: 129 };

/**
 * Installs the handlers once: on a signal, remove pending files, say so in one
 * line and exit with 128 + the signal's number, as a shell reports it.
 */
export function removePendingOnExit(): void {
  process.on('exit', removePending);
  for (const [signal, code] of Object.entries(SIGNAL_EXIT)) {
    process.once(signal, () => {
      const had = pending.size;
      removePending();
      process.stderr.write(`steamwright: stopped by ${signal}${had > 0 ? '; no output was written' : ''}\n`);
      process.exit(code);
    });
  }
}
