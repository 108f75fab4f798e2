import { describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { projectRoot, runCli } from '../helpers/cli.js';
import { smallCase } from '../plant/helpers/cases.js';

const DEMO = join(projectRoot, 'cases', 'kestrel-bay-board-mill.yaml');
const folder = (): string => mkdtempSync(join(tmpdir(), 'steamwright-report-'));

describe('steamwright report', () => {
  it('writes CASE-NAME.report.html in the current directory by default', async () => {
    const cwd = folder();
    const run = await runCli(['report', DEMO], { cwd });
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(run.stdout).toBe('wrote kestrel-bay-board-mill.report.html\n');
    const html = readFileSync(join(cwd, 'kestrel-bay-board-mill.report.html'), 'utf8');
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain('Kestrel Bay Board Mill');
    expect(readdirSync(cwd)).toEqual(['kestrel-bay-board-mill.report.html']);
  });

  it('--out and --svg write the report and the diagram alone; an existing file is replaced', async () => {
    const dir = folder();
    const out = join(dir, 'mill.html');
    writeFileSync(out, 'old report');
    const svg = join(dir, 'mill.svg');
    const run = await runCli(['report', DEMO, '--out', out, '--svg', svg]);
    expect(run.code).toBe(0);
    expect(readFileSync(out, 'utf8')).toMatch(/^<!doctype html>/);
    const diagram = readFileSync(svg, 'utf8');
    expect(diagram).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg" class="balance-diagram"/);
    expect(diagram).toContain('data-id="tg1"');
    expect(readdirSync(dir).sort()).toEqual(['mill.html', 'mill.svg']);
  });

  it('--md alone prints the tables as Markdown and writes no HTML; --csv FILE writes CSV', async () => {
    const cwd = folder();
    const csv = join(cwd, 'tables.csv');
    const run = await runCli(['report', DEMO, '--md', '--csv', csv], { cwd });
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/^# Kestrel Bay Board Mill\n\n## Headers\n\n\| header \| name \| pressure/);
    expect(run.stdout).toContain('| hp | High-pressure header | 42.0 barg |');
    expect(run.stderr).toBe(`wrote ${csv}\n`);
    expect(readFileSync(csv, 'utf8')).toMatch(/^table,header,name,pressure/);
    expect(readdirSync(cwd)).toEqual(['tables.csv']);
  });

  it('a case with errors gives the same located messages as solve, exit code 1, and no file', async () => {
    const dir = folder();
    const casePath = join(dir, 'bad.yaml');
    writeFileSync(casePath, smallCase({ boilerMax: 'fifty' }));
    const out = join(dir, 'bad.html');
    writeFileSync(out, 'old report');
    const report = await runCli(['report', casePath, '--out', out, '--svg', join(dir, 'bad.svg')]);
    const solve = await runCli(['solve', casePath]);
    expect(report.code).toBe(1);
    expect(report.stderr).toMatch(/bad\.yaml:\d+:\d+/);
    const located = (text: string): string[] => text.split('\n').filter((line) => /bad\.yaml:\d+:\d+/.test(line));
    expect(located(report.stderr)).toEqual(located(solve.stderr));
    expect(report.stderr).toMatch(/no report was written/);
    expect(readFileSync(out, 'utf8')).toBe('old report');
    expect(readdirSync(dir).sort()).toEqual(['bad.html', 'bad.yaml']);
  });

  it('a case that cannot be met gives the same diagnosis as solve, exit code 1, and no file', async () => {
    const dir = folder();
    const casePath = join(dir, 'short.yaml');
    writeFileSync(casePath, smallCase({ boilerMax: '10 t/h', userSteam: '30 t/h' }));
    const report = await runCli(['report', casePath], { cwd: dir });
    const solve = await runCli(['solve', casePath], { cwd: dir });
    expect(report.code).toBe(1);
    expect(report.stdout).toBe('');
    expect(report.stderr).toBe(solve.stderr);
    expect(report.stderr).toMatch(/the case cannot be met: main is short of/);
    expect(readdirSync(dir)).toEqual(['short.yaml']);
  });

  it('a scenario that cannot be met: the report is still written whole, marks it with the diagnosis solve gives, and the exit code is 1', async () => {
    const dir = folder();
    const casePath = join(dir, 'creamery.yaml');
    const text = readFileSync(join(projectRoot, 'cases', 'millbrook-creamery.yaml'), 'utf8');
    // Summer (and "reduced", which starts from summer) asks for far more heating steam than both boilers can raise.
    const broken = text.replace('- { id: space_heating, steam: 0.5 klb/h }', '- { id: space_heating, steam: 500 klb/h }');
    expect(broken).not.toBe(text);
    writeFileSync(casePath, broken);
    const run = await runCli(['report', casePath, '--out', join(dir, 'r.html')]);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('wrote');
    expect(run.stderr).toMatch(/2 of 3 scenarios could not be solved; the report marks them:\n {2}summer: the case cannot be met.*\n {2}reduced: the case cannot be met/);
    expect(run.stderr).not.toContain('    at ');
    const html = readFileSync(join(dir, 'r.html'), 'utf8');
    expect(html).toMatch(/<\/html>\n$/);
    expect(html).toContain('<section id="failed-scenarios"');
    // The diagnosis in the report is the one `solve --scenario summer` prints.
    const solve = await runCli(['solve', casePath, '--scenario', 'summer']);
    expect(solve.code).toBe(1);
    const diagnosis = /cannot be met: ([^.]*)\./.exec(solve.stderr)?.[1] ?? 'missing';
    expect(html).toContain(diagnosis);
    // The other scenarios are reported as usual.
    expect(html).toContain('<section id="scenario-winter" class="scenario">');
    expect(html).not.toContain('<section id="scenario-summer"');
  });

  it('carries the projects: savings by component, payback, NPV and IRR, as evaluate computes them', async () => {
    const dir = folder();
    const out = join(dir, 'mill.html');
    const run = await runCli(['report', DEMO, '--out', out]);
    expect(run.code).toBe(0);
    const html = readFileSync(out, 'utf8');
    expect(html).toContain('<section id="projects">');
    const evaluated = await runCli(['evaluate', DEMO, '--json', '--no-screen']);
    expect(evaluated.code).toBe(0);
    const projects = JSON.parse(evaluated.stdout).projects as { id: string; ok: boolean; npv: number; annual_saving: number }[];
    expect(projects.length).toBe(2);
    for (const project of projects) {
      const row = new RegExp(`<tr data-id="${project.id}">(.*?)</tr>`).exec(html.slice(html.indexOf('data-table="projects"')))?.[1] ?? '';
      const npv = Math.round(project.npv).toLocaleString('en-US');
      expect(row, project.id).toContain(`>${npv} EUR at`);
      expect(row, project.id).toContain(`>${Math.round(project.annual_saving).toLocaleString('en-US')} EUR<`);
    }
  });

  it('a file that cannot be written is exit code 1 and leaves no temporary file', async () => {
    const dir = folder();
    const run = await runCli(['report', DEMO, '--out', join(dir, 'missing', 'r.html')], { cwd: dir });
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/cannot write ".*r\.html"/);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('reports every scenario of the case side by side, and --scenario ID one alone', async () => {
    const cwd = folder();
    const all = await runCli(['report', DEMO], { cwd });
    expect(all.code).toBe(0);
    const html = readFileSync(join(cwd, 'kestrel-bay-board-mill.report.html'), 'utf8');
    expect(html).toContain('<section id="scenarios">');
    for (const id of ['winter', 'summer', 'reduced']) expect(html).toContain(`<section id="scenario-${id}" class="scenario">`);
    expect(html.match(/class="balance-diagram"/g)).toHaveLength(4);
    const one = await runCli(['report', DEMO, '--scenario', 'winter'], { cwd });
    expect(one.stdout).toBe('wrote kestrel-bay-board-mill.winter.report.html\n');
    const winter = readFileSync(join(cwd, 'kestrel-bay-board-mill.winter.report.html'), 'utf8');
    expect(winter).toContain('Scenario winter: Winter, full production (3600 h a year)');
    expect(winter.match(/class="balance-diagram"/g)).toHaveLength(1);
  });

  it('an unknown --scenario is exit code 2 naming the known ones, and writes nothing', async () => {
    const cwd = folder();
    const run = await runCli(['report', DEMO, '--scenario', 'spring'], { cwd });
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/no scenario "spring" .*known: winter, summer, reduced/);
    expect(readdirSync(cwd)).toEqual([]);
  });

  it('bad usage is exit code 2: no case, an empty --out, an unknown objective', async () => {
    const dir = folder();
    for (const args of [['report'], ['report', DEMO, '--out', ''], ['report', DEMO, '--objective', 'cheapest']]) {
      const run = await runCli(args, { cwd: dir });
      expect(run.code, args.join(' ')).toBe(2);
      expect(run.stderr.length, args.join(' ')).toBeGreaterThan(0);
    }
    expect(existsSync(join(dir, 'kestrel-bay-board-mill.report.html'))).toBe(false);
  });
});
