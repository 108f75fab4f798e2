// Builds dist/ once before the suite, so command-line tests run the real binary.
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export default function setup(): void {
  const root = fileURLToPath(new URL('..', import.meta.url));
  try {
    execFileSync(process.execPath, ['node_modules/typescript/bin/tsc', '-p', 'tsconfig.json'], { cwd: root, stdio: 'pipe' });
  } catch (error) {
    // Type errors still emit JavaScript; the type check is its own CI step, so
    // only a missing compiler or a crash stops the suite here.
    const output = (error as { stdout?: Buffer }).stdout?.toString() ?? '';
    if (!/error TS\d+/.test(output)) throw error;
  }
  // The second build step: the case schema's precompiled validator.
  execFileSync(process.execPath, ['dist/scripts/buildValidator.js'], { cwd: root, stdio: 'pipe' });
}
