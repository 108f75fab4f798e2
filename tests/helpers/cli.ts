// Runs the built command line (dist/, made by tests/globalSetup.ts) as a user would.
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const projectRoot = fileURLToPath(new URL('../..', import.meta.url));
const binary = fileURLToPath(new URL('../../dist/src/cli/main.js', import.meta.url));

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

export function runCli(args: string[], options: { input?: string; cwd?: string; env?: Record<string, string> } = {}): Promise<CliRun> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [binary, ...args], {
      cwd: options.cwd ?? projectRoot,
      env: { ...process.env, FORCE_COLOR: '0', NO_COLOR: '1', ...options.env },
    });
    let stdout = '';
    let stderr = '';
    child.stdout.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code: code ?? -1, stdout, stderr }));
    child.stdin.end(options.input ?? '');
  });
}
