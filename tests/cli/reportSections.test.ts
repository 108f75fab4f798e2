// steamwright report --year, --year-parts and --readings: the sections carry
// the same figures as the commands that compute them on their own (year
// --json, reconcile --json), a year merged from parts gives the same section
// as a year solved in the report, and bad part files are refused with nothing
// written.
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { projectRoot, runCli } from '../helpers/cli.js';

const mill = readFileSync(join(projectRoot, 'cases', 'kestrel-bay-board-mill.yaml'), 'utf8');
const bundled = readFileSync(join(projectRoot, 'cases', 'profiles', 'kestrel-bay-year.csv'), 'utf8').split('\n');
const CREAMERY = join(projectRoot, 'cases', 'millbrook-creamery.yaml');
const READINGS = join(projectRoot, 'cases', 'millbrook-creamery.readings.csv');

/** The mill without its scenarios (a short report), naming a profile of its first hours. */
function millWithHours(count: number): string {
  const folder = mkdtempSync(join(tmpdir(), 'steamwright-report-year-'));
  mkdirSync(join(folder, 'profiles'));
  const base = mill.slice(0, mill.indexOf('# Scenarios:'));
  writeFileSync(join(folder, 'mill.yaml'), `${base}\nprofile:\n  file: profiles/short.csv\n  hours: ${count}\n`);
  writeFileSync(join(folder, 'profiles', 'short.csv'), `${bundled.slice(0, count + 1).join('\n')}\n`);
  return folder;
}

/** The text of a report section, tags stripped, spaces folded. */
function sectionText(html: string, id: string): string {
  const start = html.indexOf(`<section id="${id}">`);
  expect(start).toBeGreaterThan(0);
  const end = html.indexOf('</section>', start);
  return html.slice(start, end).replace(/<svg[\s\S]*?<\/svg>/g, '').replace(/<[^>]+>/g, ' ').replace(/\s+/g, ' ');
}

describe('report sections from the year and the meters', () => {
  test('--year: the section shows the charts and the annual cost that year --json computes; --year-parts gives the same section', async () => {
    const folder = millWithHours(6);
    const casePath = join(folder, 'mill.yaml');
    const year = await runCli(['year', casePath, '--json', '--workers', '1']);
    expect(year.code).toBe(0);
    const totals = JSON.parse(year.stdout) as { annual: { cost: number } };
    const solved = await runCli(['report', casePath, '--year', '--workers', '1', '--out', join(folder, 'solved.html')]);
    expect(solved.stderr).toBe('');
    expect(solved.code).toBe(0);
    const html = readFileSync(join(folder, 'solved.html'), 'utf8');
    expect(html).toContain('<a href="#year">Year</a>');
    const section = html.slice(html.indexOf('<section id="year">'), html.indexOf('</section>', html.indexOf('<section id="year">')));
    for (const chart of ['year-steam-duration', 'year-import-duration', 'year-marginal-values', 'year-supply-by-month', 'year-running-hours']) expect(section).toContain(`id="${chart}"`);
    // The annual cost as year --json gives it, rounded to whole euros as the report writes it.
    expect(sectionText(html, 'year')).toContain(`Annual cost: ${Math.round(totals.annual.cost).toLocaleString('en-US')}`);

    for (const shard of ['1/2', '2/2']) expect((await runCli(['year', casePath, '--shard', shard, '--part', join(folder, `part-${shard[0]}.json`)])).code).toBe(0);
    const merged = await runCli(['report', casePath, '--year-parts', join(folder, 'part-1.json'), join(folder, 'part-2.json'), '--out', join(folder, 'merged.html')]);
    expect(merged.code).toBe(0);
    expect(sectionText(readFileSync(join(folder, 'merged.html'), 'utf8'), 'year')).toBe(sectionText(html, 'year'));
  });

  test('--year-parts: missing shards, parts of another objective and unreadable files are refused; nothing is written', async () => {
    const folder = millWithHours(4);
    const casePath = join(folder, 'mill.yaml');
    for (const shard of ['1/2', '2/2']) expect((await runCli(['year', casePath, '--shard', shard, '--part', join(folder, `part-${shard[0]}.json`)])).code).toBe(0);
    const out = join(folder, 'report.html');
    const missing = await runCli(['report', casePath, '--year-parts', join(folder, 'part-1.json'), '--out', out]);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toContain('expected all 2 shards, missing 2/2');
    const other = await runCli(['report', casePath, '--objective', 'min-fuel', '--year-parts', join(folder, 'part-1.json'), join(folder, 'part-2.json'), '--out', out]);
    expect(other.code).toBe(1);
    expect(other.stderr).toMatch(/expected parts of .*mill\.yaml and its profile as they are now with --objective min-fuel, found parts of other inputs/);
    const absent = await runCli(['report', casePath, '--year-parts', join(folder, 'nothing.json'), '--out', out]);
    expect(absent.code).toBe(1);
    expect(absent.stderr).toMatch(/nothing\.json: cannot read the part file: no such file; no report was written\n$/);
    expect(absent.stderr).not.toMatch(/\n\s+at /);
    const both = await runCli(['report', casePath, '--year', '--year-parts', join(folder, 'part-1.json'), '--out', out]);
    expect(both.code).toBe(2);
    expect(existsSync(out)).toBe(false);
  });

  test('--readings: the section names the suspect meter and shows each reading as reconcile --json computes it', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-report-meters-'));
    const alone = await runCli(['reconcile', CREAMERY, '--readings', READINGS, '--json']);
    expect(alone.code).toBe(0);
    const outcome = JSON.parse(alone.stdout) as { suspects: { tag: string }[]; meters: { tag: string; reconciled: number; quantity: string }[] };
    expect(outcome.suspects.length).toBeGreaterThan(0);
    const run = await runCli(['report', CREAMERY, '--readings', READINGS, '--out', join(folder, 'creamery.html')]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const html = readFileSync(join(folder, 'creamery.html'), 'utf8');
    expect(html).toContain('<a href="#reconciliation">Meters</a>');
    const text = sectionText(html, 'reconciliation');
    expect(text).toContain('Global test: chi-square');
    expect(text).toContain(`${outcome.suspects[0].tag} `);
    // The diagram of reconciled flows: the suspect meter is noted under the unit it sits on, and
    // each observable stream into or out of that unit carries the estimate reconcile --json gives.
    const streams = (JSON.parse(alone.stdout) as { streams: { id: string; from: string; to: string; value: number | null; observable: boolean }[] }).streams;
    const suspectMeter = (JSON.parse(alone.stdout) as { meters: { tag: string; stream: string }[] }).meters.find((meter) => meter.tag === outcome.suspects[0].tag)!;
    const section = html.slice(html.indexOf('<section id="reconciliation">'));
    const diagram = section.slice(section.indexOf('<svg'), section.indexOf('</svg>'));
    expect(diagram).toContain(`suspect meter ${outcome.suspects[0].tag}`);
    const metered = streams.find((stream) => stream.id === suspectMeter.stream)!;
    expect(metered.observable).toBe(true);
    const klb = (kgPerS: number): string => `${((kgPerS * 3600) / 453.59237).toPrecision(3)} klb/h`;
    expect(diagram).toContain(klb(metered.value!));
    // Each reading's reconciled value, from reconcile --json (kg/s; kW for the power and fuel meters), in the case's units to the report's digits.
    const rows = [...html.matchAll(/<tr data-id="([^"]+)"><td>[^<]*<\/td><td class="num">([^<]*)<\/td><td class="num">([^<]*)<\/td>/g)];
    expect(outcome.meters.map((meter) => meter.quantity)).toEqual(expect.arrayContaining(['power', 'fuel']));
    for (const meter of outcome.meters) {
      const row = rows.find((match) => match[1] === meter.tag);
      expect(row, meter.tag).toBeDefined();
      if (meter.quantity === 'power') {
        expect(row![3]).toMatch(/ kW$/);
        expect(Number.parseFloat(row![3])).toBeCloseTo(meter.reconciled, 1);
        continue;
      }
      if (meter.quantity === 'fuel') {
        // kW in the JSON, MMBtu/h (1 MMBtu = 1,055,055.85 kJ, IT Btu) on the page.
        expect(row![3]).toMatch(/ MMBtu\/h$/);
        expect(Number.parseFloat(row![3])).toBeCloseTo((meter.reconciled * 3600) / 1_055_055.85262, 1);
        continue;
      }
      const klbPerHour = (meter.reconciled * 3600) / 453.59237;
      expect(Number.parseFloat(row![3])).toBeCloseTo(klbPerHour, 1);
    }
  });

  test('--readings with a bad readings file: located, exit 1, no report', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-report-meters-'));
    const bad = join(folder, 'bad.csv');
    writeFileSync(bad, readFileSync(READINGS, 'utf8').replace(/^(FT-\S+?,)[^,\n]+/m, '$1lots'));
    const out = join(folder, 'creamery.html');
    const run = await runCli(['report', CREAMERY, '--readings', bad, '--out', out]);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/bad\.csv:\d+: /);
    expect(existsSync(out)).toBe(false);
  });
});
