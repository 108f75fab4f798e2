import { describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { planOutputs, temporaryName, writeOutputs } from '../../src/cli/outputFiles.js';

const folder = (): string => mkdtempSync(join(tmpdir(), 'steamwright-outputs-'));
const caseInput = (path: string): { option: string; path: string }[] => [{ option: 'case file', path }];

describe('planOutputs', () => {
  it('refuses an output on the input, by another spelling, a symlink or a hard link', async () => {
    const dir = folder();
    const input = join(dir, 'c.yaml');
    writeFileSync(input, 'x');
    symlinkSync(input, join(dir, 'link.yaml'));
    for (const path of [input, join(dir, '.', 'c.yaml'), join(dir, 'link.yaml')]) {
      await expect(planOutputs(caseInput(input), [{ option: '--out', path }]), path).rejects.toMatchObject({
        exitCode: 2,
        message: expect.stringMatching(/--out ".*" is the case file this command reads/),
      });
    }
  });

  it('refuses two outputs on one path, an empty name and a folder, all in one message', async () => {
    const dir = folder();
    const error = await planOutputs(caseInput(join(dir, 'c.yaml')), [
      { option: '--out', path: join(dir, 'a') },
      { option: '--svg', path: join(dir, 'a') },
      { option: '--csv', path: '' },
      { option: '--md', path: dir },
    ]).then(() => new Error("no error"), (caught: unknown) => caught as Error);
    expect(error.message.split('\nsteamwright: ')).toEqual([
      `--svg "${join(dir, 'a')}" is the same file as --out "${join(dir, 'a')}"; give each output its own file`,
      '--csv needs a file name, found an empty one',
      `--md "${dir}" is a folder; give a file name`,
    ]);
  });

  it('writes standard output names and device files directly, and renames only over regular files', async () => {
    const dir = folder();
    const planned = await planOutputs([], [
      { option: 'a', path: '-' },
      { option: 'b', path: '/dev/null' },
      { option: 'c', path: join(dir, 'new.txt') },
    ]);
    expect(planned.map((output) => output.kind)).toEqual(['stdout', 'special', 'file']);
  });
});

describe('temporaryName', () => {
  it('stays within 255 bytes for the longest legal name, and cuts no UTF-8 character', () => {
    for (const name of ['a'.repeat(255), 'é'.repeat(127), `${'a'.repeat(200)}.report.html`, 'plain.lp']) {
      const temporary = basename(temporaryName(join('/tmp', name)));
      expect(Buffer.byteLength(temporary), name.slice(0, 12)).toBeLessThanOrEqual(255);
      expect(temporary.includes('\uFFFD')).toBe(false);
      expect(temporary.startsWith('.')).toBe(true);
    }
  });
});

describe('writeOutputs', () => {
  it('writes every file, replacing an existing one and keeping its mode', async () => {
    const dir = folder();
    writeFileSync(join(dir, 'a.txt'), 'old', { mode: 0o640 });
    const planned = await planOutputs([], [{ option: 'a', path: join(dir, 'a.txt') }, { option: 'b', path: join(dir, 'b.txt') }]);
    await writeOutputs(planned.map((output) => ({ ...output, text: `new ${output.option}` })));
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe('new a');
    expect(readFileSync(join(dir, 'b.txt'), 'utf8')).toBe('new b');
    expect(readdirSync(dir).sort()).toEqual(['a.txt', 'b.txt']);
  });

  it('is all or nothing: a rename that fails puts back every file already replaced', async () => {
    const dir = folder();
    writeFileSync(join(dir, 'a.txt'), 'old a');
    const planned = await planOutputs([], [{ option: 'a', path: join(dir, 'a.txt') }, { option: 'b', path: join(dir, 'b.txt') }, { option: 'c', path: join(dir, 'c.txt') }]);
    // After planning, b.txt becomes a folder that is not empty: its rename must fail.
    mkdirSync(join(dir, 'b.txt'));
    writeFileSync(join(dir, 'b.txt', 'inside'), '');
    await expect(writeOutputs(planned.map((output) => ({ ...output, text: 'new' })))).rejects.toMatchObject({
      exitCode: 1,
      message: expect.stringMatching(/^b: cannot write ".*b\.txt": .*; no output was written$/),
    });
    expect(readFileSync(join(dir, 'a.txt'), 'utf8')).toBe('old a');
    expect(readdirSync(dir).sort()).toEqual(['a.txt', 'b.txt']);
  });

  it('writes nothing when a device output fails, and leaves no temporary file', async () => {
    const dir = folder();
    const planned = await planOutputs([], [{ option: '--out', path: join(dir, 'r.html') }, { option: '--svg', path: '/dev/full' }]);
    await expect(writeOutputs(planned.map((output) => ({ ...output, text: 'x'.repeat(10_000) })))).rejects.toMatchObject({
      message: '--svg: cannot write "/dev/full": no space left on the device; no output was written',
    });
    expect(readdirSync(dir)).toEqual([]);
  });
});
