// The package's own name and version, read once from its package.json (found
// by walking up from this module, so it works from src/ under the test runner
// and from dist/src/ when installed).
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

let cached: string | null = null;

export function packageVersion(): string {
  if (cached !== null) return cached;
  let folder = dirname(fileURLToPath(import.meta.url));
  for (let depth = 0; depth < 6; depth++) {
    const file = join(folder, 'package.json');
    if (existsSync(file)) {
      const data = JSON.parse(readFileSync(file, 'utf8')) as { name?: string; version?: string };
      if (data.name === 'steamwright' && typeof data.version === 'string') return (cached = data.version);
    }
    folder = dirname(folder);
  }
  return (cached = 'unknown');
}
