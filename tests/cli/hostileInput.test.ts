// Every command under hostile input: each case ends in the expected exit
// code and a clear message, never a stack trace, never a changed input and
// never a leftover temporary file.
import { describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { closeSync, statSync, mkdirSync, mkdtempSync, openSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { projectRoot } from '../helpers/cli.js';
import { smallCase } from '../plant/helpers/cases.js';

const binary = join(projectRoot, 'dist', 'src', 'cli', 'main.js');

/** A stack frame as V8 prints it: "    at fn (file:line:col)" or "    at file:line:col". */
export const STACK_FRAME = /^\s+at .*(\(.*:\d+:\d+\)|:\d+:\d+)$/m;

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}

/** Runs the built binary; stdin and stdout may be file descriptors (a folder, /dev/full). */
function run(args: string[], options: { cwd: string; stdin?: string | number; stdout?: number }): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [binary, ...args], {
      cwd: options.cwd,
      env: { ...process.env, FORCE_COLOR: '0', NO_COLOR: '1' },
      stdio: [typeof options.stdin === 'number' ? options.stdin : 'pipe', options.stdout ?? 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout?.setEncoding('utf8').on('data', (chunk: string) => (stdout += chunk));
    child.stderr!.setEncoding('utf8').on('data', (chunk: string) => (stderr += chunk));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
    if (child.stdin) {
      child.stdin.on('error', () => undefined);
      child.stdin.end(typeof options.stdin === 'string' ? options.stdin : '');
    }
  });
}

const ABSURD = smallCase({ boilerMax: '1e308 t/h', boilerEfficiency: '1e-320 %' })
  .replace('price: 10 USD/GJ', 'price: 1e308 USD/GJ')
  .replace('venting: forbidden\n', 'venting: forbidden\n    heat_loss: 1e25 kW\n');

/** A fresh folder holding c.yaml (a small plant that solves), and the other inputs the table names. */
function workspace(): string {
  const dir = mkdtempSync(join(tmpdir(), 'steamwright-hostile-'));
  writeFileSync(join(dir, 'c.yaml'), smallCase());
  writeFileSync(join(dir, 'absurd.yaml'), ABSURD);
  writeFileSync(join(dir, 'zero.yaml'), smallCase({ extra: '' }).replace('price: 10 USD/GJ', 'price: 0 USD/GJ').replace('cost: 0.5 USD/t', 'cost: 0 USD/t').replace('price: 100 USD/MWh', 'price: 0 USD/MWh'));
  writeFileSync(join(dir, 'badcost.yaml'), `${smallCase()}\ncosts:\n  trap_repair: 350 USD/t\n`);
  // year: the peaker plant, whose switching rules make the year rolling windows; and with bad rules.
  const peaker = readFileSync(join(projectRoot, 'tests', 'year', 'fixtures', 'peaker-plant.yaml'), 'utf8');
  writeFileSync(join(dir, 'pk.yaml'), `${peaker}\nprofile: { file: pk.csv }\n`);
  writeFileSync(join(dir, 'pk.csv'), `timestamp,process.steam [t/h]\n${[18, 9, 9, 18, 18, 9].map((flow, hour) => `2026-03-01T0${hour}:00,${flow}`).join('\n')}\n`);
  writeFileSync(join(dir, 'pk-bad.yaml'), peaker.replace('start_cost: 100 EUR', 'start_cost: lots').replace('min_hours_on: 4', 'min_hours_on: -4'));
  writeFileSync(join(dir, 'existing.html'), 'old report');
  writeFileSync(join(dir, 'plain.txt'), 'not a folder');
  mkdirSync(join(dir, 'folder'));
  const deep = `${'['.repeat(20_000)}${']'.repeat(20_000)}`;
  const lines = ['{"p":"3 MPa","T":"300 K"}', deep, `{"p":"3 MPa","T":"300\rK"}`, 'x'.repeat(100_000), '{"p":"[[[[","T":"300 K"}', '{"p":"3 MPa","T":"400 K"}\r'];
  writeFileSync(join(dir, 'batch.jsonl'), `${lines.join('\n')}\n`);
  // reconcile: the Millbrook demo with its meters, a meter on no stream, and readings with bad rows.
  const metered = readFileSync(join(projectRoot, 'cases', 'millbrook-creamery.yaml'), 'utf8');
  writeFileSync(join(dir, 'm.yaml'), metered);
  writeFileSync(join(dir, 'm-bad.yaml'), metered.replace('{ tag: FT-101, unit: boiler_a,', '{ tag: FT-101, unit: boiler_z,'));
  writeFileSync(join(dir, 'r.csv'), 'tag,value,unit\nFT-101,28.0,\nFT-201,-3,klb/h\nFT-202,"7.0,klb/h\n');
  writeFileSync(join(dir, 'r-good.csv'), readFileSync(join(projectRoot, 'cases', 'millbrook-creamery.readings.csv'), 'utf8'));
  // A thermometer on the creamery's header, read in a flow unit and given as a share.
  writeFileSync(join(dir, 'm-tt.yaml'), `${metered}  - { tag: TT-1, unit: hp, measures: temperature, uncertainty: 1 K }\n`);
  writeFileSync(join(dir, 'r-tt.csv'), 'tag,value,unit\nFT-101,28.0,klb/h\nTT-1,28,klb/h\n');
  writeFileSync(join(dir, 'm-tt-pct.yaml'), `${metered}  - { tag: TT-1, unit: hp, measures: temperature, uncertainty: 1 % }\n`);
  return dir;
}

interface HostileCase {
  title: string;
  args: string[];
  code: number;
  /** What stderr must say. */
  says: RegExp;
  /** stderr is exactly one line. */
  oneLine?: boolean;
  stdin?: 'folder';
  stdout?: 'full';
  /** Extra checks on the run and the folder. */
  then?: (result: Run, dir: string) => void;
}

const cases: HostileCase[] = [
  // Class 1: check bounds what solve can take.
  { title: 'check: absurd finite numbers get located messages', args: ['check', 'absurd.yaml'], code: 1, says: /absurd\.yaml:\d+:\d+ +fuels\[0\]\.price +expected a value within 1e8 per GJ, found "1e308 USD\/GJ"[\s\S]*heat_loss +expected a value within 10 GW[\s\S]*steam\.max +expected a value within 36 000 t\/h[\s\S]*efficiency +expected a percentage of at least 0\.1 %/ },
  { title: 'solve: absurd numbers are refused before any model is built', args: ['solve', 'absurd.yaml'], code: 1, says: /4 errors; nothing was solved/ },
  { title: 'solve: a plant whose prices are all zero solves', args: ['solve', 'zero.yaml'], code: 0, says: /^$/, then: (result) => expect(result.stdout).toMatch(/cost +0 USD per hour/) },
  // Class 2: outputs never destroy anything.
  { title: 'report: --out on the case file is refused', args: ['report', 'c.yaml', '--out', 'c.yaml'], code: 2, says: /--out "c\.yaml" is the case file this command reads/, oneLine: true },
  { title: 'solve: --export-lp on the case file, spelt another way, is refused', args: ['solve', 'c.yaml', '--export-lp', './folder/../c.yaml'], code: 2, says: /--export-lp ".*" is the case file this command reads/, oneLine: true },
  { title: 'report: two outputs on one path are refused', args: ['report', 'c.yaml', '--out', 'r.html', '--svg', 'r.html'], code: 2, says: /--svg "r\.html" is the same file as --out "r\.html"/, oneLine: true },
  { title: 'report: --md and --csv both on standard output are refused', args: ['report', 'c.yaml', '--md', '--csv'], code: 2, says: /--md and --csv both write to standard output/, oneLine: true },
  { title: 'report: an output on a folder is refused', args: ['report', 'c.yaml', '--out', 'folder'], code: 2, says: /--out "folder" is a folder/, oneLine: true },
  { title: 'report: a full device as one output writes none of them', args: ['report', 'c.yaml', '--out', 'existing.html', '--svg', '/dev/full'], code: 1, says: /--svg: cannot write "\/dev\/full": no space left on the device; no output was written/, oneLine: true, then: (_, dir) => expect(readFileSync(join(dir, 'existing.html'), 'utf8')).toBe('old report') },
  { title: 'report: --svg /dev/stdout is written directly', args: ['report', 'c.yaml', '--svg', '/dev/stdout'], code: 0, says: /^$/, then: (result) => expect(result.stdout).toMatch(/^<svg /) },
  { title: 'report: --out /dev/null writes into the device and never replaces it', args: ['report', 'c.yaml', '--out', '/dev/null'], code: 0, says: /^$/, then: () => expect(statSync('/dev/null').isCharacterDevice()).toBe(true) },
  { title: 'report: a folder that does not exist', args: ['report', 'c.yaml', '--out', 'missing/r.html'], code: 1, says: /cannot write "missing\/r\.html": the folder "missing" does not exist/, oneLine: true },
  { title: 'report: an output name of 255 bytes is written', args: ['report', 'c.yaml', '--out', `${'a'.repeat(250)}.html`], code: 0, says: /^$/, then: (_, dir) => expect(readdirSync(dir)).toContain(`${'a'.repeat(250)}.html`) },
  // Class 3: I/O errors are one line.
  { title: 'check: a full disk on standard output', args: ['check', 'c.yaml'], stdout: 'full', code: 1, says: /^steamwright: cannot write to standard output: no space left on the device\n$/ },
  { title: 'solve: a full disk on standard output', args: ['solve', 'c.yaml'], stdout: 'full', code: 1, says: /^steamwright: cannot write to standard output: no space left on the device\n$/ },
  { title: 'init: into a folder that does not exist', args: ['init', 'missing/new.yaml'], code: 2, says: /cannot write missing\/new\.yaml: the folder missing does not exist/, oneLine: true },
  { title: 'init: into a file that is not a folder', args: ['init', 'plain.txt/new.yaml'], code: 2, says: /cannot write plain\.txt\/new\.yaml: plain\.txt is not a folder/, oneLine: true },
  { title: 'init: over an existing file', args: ['init', 'c.yaml'], code: 2, says: /c\.yaml already exists/, oneLine: true },
  { title: 'state --batch: a folder', args: ['state', '--batch', 'folder'], code: 2, says: /--batch: "folder" is a folder/, oneLine: true },
  { title: 'state --batch: a file that cannot be opened', args: ['state', '--batch', 'plain.txt/points.jsonl'], code: 2, says: /--batch: cannot read "plain\.txt\/points\.jsonl": a part of the path is not a folder/, oneLine: true },
  { title: 'state --batch -: standard input from a folder', args: ['state', '--batch', '-'], stdin: 'folder', code: 2, says: /--batch -: standard input is a folder/, oneLine: true },
  // Class 4: bounded reads.
  { title: 'check: /dev/zero is read no further than 2 MB', args: ['check', '/dev/zero'], code: 1, says: /reading stopped after 2,000,000 bytes; a case file may be at most 2 MB/ },
  { title: 'solve: /dev/urandom is read no further than 2 MB', args: ['solve', '/dev/urandom'], code: 1, says: /a case file may be at most 2 MB/ },
  { title: 'check: a folder as the case', args: ['check', 'folder'], code: 1, says: /cannot read the case file: it is a directory/ },
  {
    title: 'state --batch: a deep line, a long line and a bare CR each get their own answer and the batch goes on',
    args: ['state', '--batch', 'batch.jsonl'],
    code: 0,
    says: /^$/,
    then: (result) => {
      const answers = result.stdout.trimEnd().split('\n').map((line) => JSON.parse(line) as Record<string, unknown>);
      expect(answers).toHaveLength(6);
      expect(answers[0].T_K).toBe(300);
      expect(answers[1].error).toMatch(/^line 2: arrays and objects nest more than 32 deep/);
      expect(answers[2].error).toMatch(/^line 3: /);
      expect(answers[3].error).toBe('line 4: the line has 100000 characters; a batch line may have at most 65536');
      expect(answers[4].error).toMatch(/^line 5: p: /);
      expect(answers[5].T_K).toBe(400);
    },
  },
  // Class 6: solver end states give advice.
  // The reproducer once ended in the cross-check backend's infeasible point; since header
  // enthalpies became variables of each pass it solves, and the balance must then be whole.
  { title: 'solve: max-power on the cross-check backend solves, or is refused with advice', args: ['solve', join(projectRoot, 'cases', 'kestrel-bay-board-mill.yaml'), '--objective', 'max-power', '--solver', 'jslp'], code: 0, says: /^$/, then: (result) => expect(result.stdout).toMatch(/maximum-power balance, \d+ passes \(jslp\)/) },
  // Class 7: the year.
  { title: 'year: --csv on the case file is refused before anything is solved', args: ['year', 'c.yaml', '--csv', 'c.yaml'], code: 2, says: /--csv "c\.yaml" is the case file this command reads/, oneLine: true },
  { title: 'year: a case without a profile', args: ['year', 'c.yaml'], code: 1, says: /c\.yaml {2}the case names no profile; expected "profile: \{ file: year\.csv \}"/ },
  { title: 'year merge: a folder as a part file', args: ['year', 'merge', 'folder'], code: 1, says: /folder: cannot read the part file: it is a directory/ },
  { title: 'year merge: a part file that is not JSON', args: ['year', 'merge', 'plain.txt'], code: 1, says: /plain\.txt: expected a part file written by "steamwright year --shard", found text that is not JSON/ },
  { title: 'check: switching rules with a bad start cost and negative hours, both located', args: ['check', 'pk-bad.yaml'], code: 1, says: /pk-bad\.yaml:\d+:\d+ {2}boilers\[1\]\.switching\.start_cost {2}expected an amount of money[^]*pk-bad\.yaml:\d+:\d+ {2}boilers\[1\]\.switching\.min_hours_on {2}expected zero or more hours, found -4/ },
  { title: 'year: --shard of a year solved as rolling windows', args: ['year', 'pk.yaml', '--shard', '1/2', '--part', 'p.json'], code: 2, says: /this year is solved as rolling windows \(peaker declares switching rules\)[^]*cannot be split into shards/, oneLine: true },
  { title: 'year: --shard of zero slices', args: ['year', 'c.yaml', '--shard', '0/0', '--part', 'p.json'], code: 2, says: /--shard expects K\/N with 1 <= K <= N <= 10000/, oneLine: true },
  // Class 5: options.
  { title: 'solve: a doubled --solver', args: ['solve', 'c.yaml', '--solver', 'jslp', '--solver', 'highs'], code: 2, says: /--solver was given 2 times \("jslp", "highs"\); give it once/, oneLine: true },
  { title: 'report: a doubled --out', args: ['report', 'c.yaml', '--out', 'a.html', '--out', 'b.html'], code: 2, says: /--out was given 2 times/, oneLine: true },
  { title: 'compare: --json with --csv', args: ['compare', 'c.yaml', '--json', '--csv'], code: 2, says: /--json and --csv cannot be used together/, oneLine: true },
  ...['0', '-1', 'abc', '2.5'].map((workers): HostileCase => ({ title: `compare: --workers ${workers}`, args: ['compare', 'c.yaml', '--workers', workers], code: 2, says: /--workers expects a whole number of 1 or more/, oneLine: true })),
  { title: 'evaluate: --workers 0', args: ['evaluate', 'c.yaml', '--workers', '0'], code: 2, says: /--workers expects a whole number of 1 or more, found 0/, oneLine: true },
  { title: 'savings: --md on the case file is refused', args: ['savings', 'c.yaml', '--md', 'c.yaml'], code: 2, says: /--md "c\.yaml" is the case file this command reads/, oneLine: true },
  { title: 'savings: --json and --md both on standard output are refused', args: ['savings', 'c.yaml', '--json', '--md'], code: 2, says: /only one of --json, --md and --csv may go to standard output/, oneLine: true },
  { title: 'savings: an unknown ranking', args: ['savings', 'c.yaml', '--rank', 'beauty'], code: 2, says: /rank/ },
  { title: 'savings: a cost in the wrong unit gets a located message and nothing is solved', args: ['savings', 'badcost.yaml'], code: 1, says: /badcost\.yaml:\d+:\d+ +costs\.trap_repair +expected a cost such as "350 USD\/trap" \(per trap\), found "350 USD\/t" per t[\s\S]*nothing was solved/ },
  { title: 'savings: a plant that solves lists its measures', args: ['savings', 'c.yaml', '--workers', '1'], code: 0, says: /^$/, then: (result) => expect(result.stdout).toMatch(/Measures ranked by net present value/) },
  { title: 'solve: an empty --export-lp', args: ['solve', 'c.yaml', '--export-lp', ''], code: 2, says: /--export-lp needs a value, found an empty one/, oneLine: true },
  { title: 'compare: an empty --scenarios', args: ['compare', 'c.yaml', '--scenarios', ''], code: 2, says: /--scenarios needs a value, found an empty one/, oneLine: true },
  { title: 'state: an empty --p', args: ['state', '--p', '', '--T', '300 K'], code: 2, says: /--p needs a value/, oneLine: true },
  { title: 'reconcile: a meter that names no stream', args: ['reconcile', 'm-bad.yaml', '--readings', 'r-good.csv'], code: 1, says: /m-bad\.yaml:\d+:\d+ +meters\[0\]\.unit +meter FT-101 names "boiler_z"[\s\S]*nothing was reconciled/ },
  { title: 'reconcile: readings with no unit, a negative flow and a row that does not parse', args: ['reconcile', 'm.yaml', '--readings', 'r.csv'], code: 1, says: /r\.csv:2: reading of FT-101 has no unit[\s\S]*r\.csv:3: .*negative[\s\S]*r\.csv:4: the row does not parse as CSV/ },
  { title: 'reconcile: --write-case over the readings', args: ['reconcile', 'm.yaml', '--readings', 'r-good.csv', '--write-case', 'r-good.csv'], code: 2, says: /--write-case/, oneLine: true },
  { title: 'reconcile: a level of significance of 0', args: ['reconcile', 'm.yaml', '--readings', 'r-good.csv', '--level', '0'], code: 2, says: /--level: expected a level of significance above 0/, oneLine: true },
  { title: 'reconcile: a thermometer read in a flow unit', args: ['reconcile', 'm-tt.yaml', '--readings', 'r-tt.csv'], code: 1, says: /r-tt\.csv:3: unit of TT-1: [\s\S]*nothing was reconciled/ },
  { title: 'reconcile: a thermometer\'s uncertainty as a share', args: ['reconcile', 'm-tt-pct.yaml', '--readings', 'r-good.csv'], code: 1, says: /m-tt-pct\.yaml:\d+:\d+ +meters\[20\]\.uncertainty +expected a thermometer's uncertainty as a temperature difference/ },
  { title: 'reconcile: a case without meters', args: ['reconcile', 'c.yaml', '--readings', 'r-good.csv'], code: 1, says: /the case has no meters/, oneLine: true },
];

describe('every command under hostile input', () => {
  it.each(cases)('$title', async (entry) => {
    const dir = workspace();
    const before = readFileSync(join(dir, 'c.yaml'), 'utf8');
    const stdin = entry.stdin === 'folder' ? openSync(join(dir, 'folder'), 'r') : undefined;
    const stdout = entry.stdout === 'full' ? openSync('/dev/full', 'w') : undefined;
    let result: Run;
    try {
      result = await run(entry.args, { cwd: dir, stdin, stdout });
    } finally {
      if (stdin !== undefined) closeSync(stdin);
      if (stdout !== undefined) closeSync(stdout);
    }
    expect(result.stderr).not.toMatch(STACK_FRAME);
    expect(result.stderr).not.toMatch(/internal error/);
    expect(result.stderr).toMatch(entry.says);
    if (entry.oneLine) expect(result.stderr.split('\n').filter((line) => line !== '')).toHaveLength(1);
    expect(result.code, result.stderr).toBe(entry.code);
    expect(readFileSync(join(dir, 'c.yaml'), 'utf8')).toBe(before);
    expect(readdirSync(dir).filter((name) => /\.(tmp|old)$/.test(name))).toEqual([]);
    entry.then?.(result, dir);
  });
});

// Fuzzed arguments and paths: whatever the command line, the exit code is one
// of the documented ones, stderr has no stack frame, the inputs are unchanged
// and no temporary file is left.
const token = fc.oneof(
  fc.constantFrom('check', 'solve', 'report', 'compare', 'evaluate', 'savings', 'init', 'state'),
  fc.constantFrom('c.yaml', 'absurd.yaml', 'folder', 'plain.txt', 'missing/x', '-', '', '/dev/null', '/dev/full', '/dev/stdout', './c.yaml', 'é.yaml', `${'n'.repeat(255)}`),
  fc.constantFrom('--out', '--svg', '--md', '--csv', '--export-lp', '--json', '--solver', '--workers', '--scenarios', '--sweep', '--scenario', '--objective', '--rank', '--batch', '--p', '--T', '--x', '--units', '--verbose', '--help', '--bogus', '-o', '--'),
  fc.constantFrom('highs', 'jslp', 'min-cost', 'max-power', '0', '-1', '2.5', 'abc', '1e308', 'NaN', '10 barg', '300 K'),
  fc.string({ maxLength: 8 }),
);

describe('fuzzed command lines', () => {
  it('never print a stack frame, change an input or leave a temporary file', async () => {
    const dir = workspace();
    const inputs = ['c.yaml', 'absurd.yaml', 'zero.yaml', 'plain.txt', 'existing.html'];
    const before = new Map(inputs.map((name) => [name, readFileSync(join(dir, name), 'utf8')]));
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom('check', 'solve', 'report', 'compare', 'evaluate', 'savings', 'init', 'state'),
        fc.array(token, { maxLength: 6 }),
        async (command, rest) => {
          const result = await run([command, ...rest], { cwd: dir });
          expect(result.stderr).not.toMatch(STACK_FRAME);
          expect(result.stderr).not.toMatch(/internal error/);
          expect([0, 1, 2]).toContain(result.code);
          for (const [name, text] of before) {
            // "report c.yaml" or "init x" may legitimately write new files, never over these.
            expect(readFileSync(join(dir, name), 'utf8'), name).toBe(text);
          }
          expect(readdirSync(dir).filter((name) => /\.(tmp|old)$/.test(name))).toEqual([]);
        },
      ),
      { numRuns: 12, seed: 1212 },
    );
  });
});
