// The lines of a --batch input, read with bounds: a line is split only at
// "\n" (a CR before it is dropped; a bare CR stays inside the line, so
// answers stay one per input line), and a line longer than the cap is
// skipped to its end and reported, never held in memory whole.
import { StringDecoder } from 'node:string_decoder';

/** Longest batch line read; a state request is well under a hundred characters. */
export const MAX_BATCH_LINE = 65_536;
/** Deepest nesting of JSON arrays and objects in a batch line; a request is one flat object. */
export const MAX_BATCH_DEPTH = 32;

export type BatchLine = { text: string } | { tooLong: number };

export async function* batchLines(input: AsyncIterable<Buffer | string>, maxLength = MAX_BATCH_LINE): AsyncGenerator<BatchLine> {
  const decoder = new StringDecoder('utf8');
  let current = '';
  let skipped: number | null = null;
  const take = (piece: string): void => {
    if (skipped !== null) {
      skipped += piece.length;
      return;
    }
    current += piece;
    if (current.length > maxLength) {
      skipped = current.length;
      current = '';
    }
  };
  const finish = (): BatchLine => {
    const line: BatchLine = skipped !== null ? { tooLong: skipped } : { text: current.endsWith('\r') ? current.slice(0, -1) : current };
    current = '';
    skipped = null;
    return line;
  };
  for await (const chunk of input) {
    const text = typeof chunk === 'string' ? chunk : decoder.write(chunk);
    let start = 0;
    for (let newline = text.indexOf('\n'); newline >= 0; newline = text.indexOf('\n', start)) {
      take(text.slice(start, newline));
      yield finish();
      start = newline + 1;
    }
    take(text.slice(start));
  }
  take(decoder.end());
  if (current !== '' || skipped !== null) yield finish();
}

/** Whether JSON text nests arrays and objects deeper than `limit` (brackets inside strings do not count). */
export function jsonTooDeep(text: string, limit = MAX_BATCH_DEPTH): boolean {
  let depth = 0;
  let inString = false;
  for (let index = 0; index < text.length; index++) {
    const char = text[index];
    if (inString) {
      if (char === '\\') index++;
      else if (char === '"') inString = false;
    } else if (char === '"') {
      inString = true;
    } else if (char === '[' || char === '{') {
      depth++;
      if (depth > limit) return true;
    } else if (char === ']' || char === '}') {
      depth--;
    }
  }
  return false;
}
