// Every command's --help as a newcomer reads it: examples that name files
// that exist, one example per line, and no words run together.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { projectRoot, runCli } from '../helpers/cli.js';

/** The lines of one section ("Examples:") of a help text, up to the next blank line. */
function section(help: string, title: string): string[] {
  const lines = help.split('\n');
  const start = lines.indexOf(title);
  if (start < 0) return [];
  const end = lines.findIndex((line, index) => index > start && line.trim() === '');
  return lines.slice(start + 1, end < 0 ? undefined : end);
}

describe('help texts', () => {
  it('every command has examples that name real files, on one line each, and no words run into their brackets', async () => {
    const top = await runCli(['--help']);
    expect(top.code).toBe(0);
    const names = section(top.stdout, 'Commands:')
      .map((line) => /^\s+steamwright (\w+)/.exec(line)?.[1])
      .filter((name): name is string => name !== undefined);
    expect(names).toEqual(expect.arrayContaining(['solve', 'compare', 'evaluate', 'report', 'check', 'init', 'state']));
    for (const name of names) {
      const help = await runCli([name, '--help']);
      expect(help.code, name).toBe(0);
      // "objective[choices: ...]": a description that ran into its annotation.
      expect(help.stdout, `${name} --help`).not.toMatch(/[a-z0-9)][[(](choices|string|boolean|number|required|default)/);
      const examples = section(help.stdout, 'Examples:');
      expect(examples.length, `${name} has examples`).toBeGreaterThan(0);
      for (const line of examples) {
        // A wrapped example would leave a line that is not a command.
        expect(line, `${name}: an example on one line`).toMatch(/^\s+steamwright \w+/);
        for (const file of line.match(/cases\/[\w.-]+\.yaml/g) ?? []) {
          expect(existsSync(join(projectRoot, file)), `${name}: ${file} exists`).toBe(true);
        }
      }
    }
  });
});
