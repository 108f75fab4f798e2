// steamwright year (the built binary, on worker threads): outputs, located
// profile problems, a period that cannot be met, shards merged on the command
// line into the single run's result, and usage errors.
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../helpers/cli.js';

const mill = readFileSync(new URL('../../cases/kestrel-bay-board-mill.yaml', import.meta.url), 'utf8');
const bundled = readFileSync(new URL('../../cases/profiles/kestrel-bay-year.csv', import.meta.url), 'utf8').split('\n');

/** A folder with the mill naming a profile of the given rows (the bundled header). */
function caseWith(rows: string[], hours = rows.length): string {
  const folder = mkdtempSync(join(tmpdir(), 'steamwright-year-'));
  mkdirSync(join(folder, 'profiles'));
  writeFileSync(join(folder, 'mill.yaml'), mill.replace(/hours: 8760\s*$/, `hours: ${hours}\n`));
  writeFileSync(join(folder, 'profiles', 'kestrel-bay-year.csv'), `${[bundled[0], ...rows].join('\n')}\n`);
  return folder;
}

describe('steamwright year', () => {
  test('text, --json, --csv and --html of 4 hours on worker threads', async () => {
    const folder = caseWith(bundled.slice(1, 5));
    const text = await runCli(['year', join(folder, 'mill.yaml'), '--csv', join(folder, 'hours.csv'), '--html', join(folder, 'year.html')]);
    expect(text.stderr).toBe('');
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/^Kestrel Bay Board Mill: the year from profiles\/kestrel-bay-year.csv \(4 hourly periods, 4 h\)/);
    for (const heading of ['Annual cost:', 'Month by month', 'Units over the year', 'Hours at each limit', 'Marginal value of steam by header (EUR/t, weighted by hours)', 'ASME B31.1']) expect(text.stdout).toContain(heading);
    const html = readFileSync(join(folder, 'year.html'), 'utf8');
    expect(html.match(/<svg /g)).toHaveLength(5);
    const csv = readFileSync(join(folder, 'hours.csv'), 'utf8').trim().split('\n');
    expect(csv).toHaveLength(5);
    expect(csv[1]).toMatch(/^2026-01-01T00:00,1,1,solved,full,/);
    const json = await runCli(['year', join(folder, 'mill.yaml'), '--json', '--workers', '1']);
    expect(json.code).toBe(0);
    const result = JSON.parse(json.stdout);
    expect(result.periods).toBe(4);
    expect(result.mode).toBe('independent periods');
    expect(result.failed).toEqual([]);
    // The CSV rows (worker threads) add up to the JSON total (in process) to the cent.
    const heading = csv[0].split(',');
    const cost = csv.slice(1).reduce((sum, line) => sum + Number(line.split(',')[heading.indexOf('cost [EUR/h]')]), 0);
    expect(Math.abs(cost - result.annual.cost)).toBeLessThan(0.005);
  });

  test('a bad profile: every problem located, exit 1, nothing solved or written', async () => {
    const rows = bundled.slice(1, 5).map((line) => line.split(','));
    rows[1][1] = 'lots';
    rows[2][0] = '2026-01-01T05:00';
    rows[3][14] = '2';
    const folder = caseWith(rows.map((row) => row.join(',')), 5);
    const run = await runCli(['year', join(folder, 'mill.yaml'), '--csv', join(folder, 'hours.csv')]);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(existsSync(join(folder, 'hours.csv'))).toBe(false);
    expect(run.stderr.replaceAll(folder, 'DIR')).toMatchInlineSnapshot(`
      "DIR/profiles/kestrel-bay-year.csv:3:2  dryer_section.steam: expected a number in t/h, found "lots"
      DIR/profiles/kestrel-bay-year.csv:4:1  timestamp: expected 2026-01-01T02:00, one hour after line 3, found 2026-01-01T05:00 (a gap of 3 h)
      DIR/profiles/kestrel-bay-year.csv:5:1  timestamp: expected 2026-01-01T06:00, one hour after line 4, found 2026-01-01T03:00, earlier (rows must run forward in time)
      DIR/profiles/kestrel-bay-year.csv:5:15  boiler_1.available: expected 1 (in service) or 0 (out of service), found "2"
      steamwright: DIR/profiles/kestrel-bay-year.csv: 4 problems in the profile; nothing was solved
      "
    `);
  });

  test('a period that cannot be met is listed with its diagnosis; the others are solved; exit 1', async () => {
    const rows = bundled.slice(1, 5).map((line) => line.split(','));
    rows[2][1] = '400';
    const folder = caseWith(rows.map((row) => row.join(',')));
    const run = await runCli(['year', join(folder, 'mill.yaml'), '--json']);
    expect(run.code).toBe(1);
    const result = JSON.parse(run.stdout);
    expect(result.failed).toHaveLength(1);
    expect(result.failed[0]).toMatchObject({ index: 2, label: '2026-01-01T02:00', reason: 'infeasible' });
    expect(result.failed[0].message).toMatch(/lp|mp|short/i);
    expect(result.complete).toBe(false);
    expect(result.hours_solved).toBe(3);
    expect(run.stderr).toMatch(/1 of 4 periods could not be solved \(2026-01-01T02:00\); the totals cover the others/);
  });

  test('four shards on the command line merge into exactly the single run\'s result', async () => {
    const folder = caseWith(bundled.slice(1, 9));
    const single = await runCli(['year', join(folder, 'mill.yaml'), '--json', '--block', '2']);
    expect(single.code).toBe(0);
    const parts: string[] = [];
    for (let index = 1; index <= 4; index += 1) {
      const part = join(folder, `part-${index}.json`);
      const run = await runCli(['year', join(folder, 'mill.yaml'), '--block', '2', '--shard', `${index}/4`, '--part', part, '--workers', '1']);
      expect(run.code).toBe(0);
      expect(run.stderr).toBe(`steamwright: shard ${index}/4: 2 periods written to ${part}\n`);
      parts.push(part);
    }
    const merged = await runCli(['year', 'merge', ...parts.reverse(), '--json']);
    expect(merged.stderr).toBe('');
    expect(merged.code).toBe(0);
    expect(merged.stdout).toBe(single.stdout);
    const missing = await runCli(['year', 'merge', parts[0], parts[1]]);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toMatch(/expected all 4 shards, missing 1\/4, 2\/4/);
  });

  test('usage: shard without part, a shard out of range, merge without parts, a case without a profile', async () => {
    const noPart = await runCli(['year', 'cases/kestrel-bay-board-mill.yaml', '--shard', '1/4']);
    expect(noPart.code).toBe(2);
    expect(noPart.stderr).toMatch(/--shard K\/N and --part FILE go together/);
    const outOfRange = await runCli(['year', 'cases/kestrel-bay-board-mill.yaml', '--shard', '5/4', '--part', 'x.json']);
    expect(outOfRange.code).toBe(2);
    expect(outOfRange.stderr).toMatch(/--shard expects K\/N with 1 <= K <= N <= 10000, such as 3\/8, found "5\/4"/);
    const noParts = await runCli(['year', 'merge']);
    expect(noParts.code).toBe(2);
    expect(noParts.stderr).toMatch(/year merge expects the part files/);
    const noProfile = await runCli(['year', 'cases/millbrook-creamery.yaml']);
    expect(noProfile.code).toBe(1);
    expect(noProfile.stderr).toMatch(/^cases\/millbrook-creamery.yaml {2}the case names no profile/);
  });
});
