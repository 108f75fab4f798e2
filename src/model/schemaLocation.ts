// Where the shipped schema file lives, from this module's own location
// (src/model/ under vitest, dist/src/model/ once built).
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export function schemaFilePath(): string {
  for (const relative of ['../../schema/case.schema.json', '../../../schema/case.schema.json']) {
    const candidate = fileURLToPath(new URL(relative, import.meta.url));
    if (existsSync(candidate)) return candidate;
  }
  return fileURLToPath(new URL('../../../schema/case.schema.json', import.meta.url));
}
