// A progress line while a batch of solves runs: only on a terminal, only
// after the first second, never when quiet (--json).

export interface ProgressStream {
  isTTY?: boolean;
  write(text: string): unknown;
}

export function progressLine(label: string, stream: ProgressStream, quiet: boolean): { onProgress?: (done: number, total: number) => void; finish: () => void } {
  if (quiet || !stream.isTTY) return { finish: () => undefined };
  const started = Date.now();
  let shown = false;
  return {
    onProgress: (done, total) => {
      if (Date.now() - started < 1000) return;
      shown = true;
      stream.write(`\r${label}: ${done} of ${total} solved`);
    },
    finish: () => {
      if (shown) stream.write('\r\x1b[K');
    },
  };
}
