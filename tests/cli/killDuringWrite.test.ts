// A command stopped by SIGINT or SIGTERM while its outputs are half written
// leaves every old file as it was and no temporary file behind.
import { describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { projectRoot } from '../helpers/cli.js';
import { smallCase } from '../plant/helpers/cases.js';

const binary = join(projectRoot, 'dist', 'src', 'cli', 'main.js');

/** Runs the command with the write hold on, sends `signal` once it holds, and resolves its exit. */
function killWhileWriting(args: string[], signal: NodeJS.Signals): Promise<{ code: number | null; stderr: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [binary, ...args], { env: { ...process.env, STEAMWRIGHT_TEST_HOLD_OUTPUTS: '1' } });
    let stderr = '';
    let sent = false;
    child.stderr.setEncoding('utf8').on('data', (chunk: string) => {
      stderr += chunk;
      if (!sent && stderr.includes('steamwright: holding outputs\n')) {
        sent = true;
        child.kill(signal);
      }
    });
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stderr }));
  });
}

describe('killed during a write', () => {
  for (const [signal, code] of [['SIGTERM', 143], ['SIGINT', 130]] as const) {
    it(`report with two outputs, ${signal}: old file kept, no new file, no temporary file`, async () => {
      const dir = mkdtempSync(join(tmpdir(), 'steamwright-kill-'));
      writeFileSync(join(dir, 'c.yaml'), smallCase());
      writeFileSync(join(dir, 'r.html'), 'old report');
      const run = await killWhileWriting(['report', join(dir, 'c.yaml'), '--out', join(dir, 'r.html'), '--svg', join(dir, 'r.svg')], signal);
      expect(run.code).toBe(code);
      expect(run.stderr).toMatch(new RegExp(`steamwright: stopped by ${signal}; no output was written\\n$`));
      expect(run.stderr).not.toMatch(/\n\s+at /);
      expect(readdirSync(dir).sort()).toEqual(['c.yaml', 'r.html']);
      expect(readFileSync(join(dir, 'r.html'), 'utf8')).toBe('old report');
    });
  }

  it('solve --export-lp, SIGTERM: no LP file and no temporary file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'steamwright-kill-'));
    writeFileSync(join(dir, 'c.yaml'), smallCase());
    const run = await killWhileWriting(['solve', join(dir, 'c.yaml'), '--export-lp', join(dir, 'm.lp')], 'SIGTERM');
    expect(run.code).toBe(143);
    expect(readdirSync(dir)).toEqual(['c.yaml']);
  });
});
