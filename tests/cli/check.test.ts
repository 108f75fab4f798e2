// `steamwright check` and `steamwright init` as a user runs them.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../helpers/cli.js';

describe('steamwright check', () => {
  test('a good case prints its summary and exits 0', async () => {
    const run = await runCli(['check', 'cases/millbrook-creamery.yaml']);
    expect(run.code).toBe(0);
    expect(run.stderr).toBe('');
    expect(run.stdout).toMatchInlineSnapshot(`
      "cases/millbrook-creamery.yaml: no errors, 0 warnings
      Millbrook Creamery: 2 headers, 1 fuel, 2 fired boilers, 2 turbines, 1 letdown, 5 users, 1 flash tank, 1 deaerator, 2 feedwater pumps
      headers:
        hp   150.0 psig  saturation 365.8 degF  floating
        lp   15.00 psig  saturation 249.3 degF  floating, venting allowed
      scenarios: winter (3,000 h), summer (3,200 h), reduced (1,800 h); 8,000 h a year in all
      projects: cip_condensate, blowdown_flash
      "
    `);
  });

  test('--verbose lists the defaults applied', async () => {
    const run = await runCli(['check', 'cases/kestrel-bay-board-mill.yaml', '--verbose']);
    expect(run.code).toBe(0);
    expect(run.stdout.split('\n').filter((line) => line.startsWith('  turbines') || line.startsWith('defaults'))).toMatchInlineSnapshot(`
      [
        "defaults applied:",
        "  turbines[1].mechanical_efficiency = 98 %  (mechanical efficiency not stated: 98 % (common practice, no single source))",
        "  turbines[1].drives = generator  (drive not stated: the turbine drives a generator)",
      ]
    `);
  });

  test('a case with errors prints every issue, a count, and exits 1', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-check-'));
    const file = join(folder, 'bad.yaml');
    const good = readFileSync('cases/millbrook-creamery.yaml', 'utf8');
    writeFileSync(file, good.replace('pressure: 150 psig', 'pressure: 150').replace('capacity: 35 klb/h', 'capacity: lots').replace('efficiency: 80 %', 'efficiency: 97 %'));
    const run = await runCli(['check', file]);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(run.stderr.replaceAll(file, 'bad.yaml')).toMatchInlineSnapshot(`
      "bad.yaml:44:15  headers[0].pressure  expected a pressure with its unit, such as "42 barg", found 150
      bad.yaml:101:15  letdowns[0].capacity  expected a mass flow with its unit, such as "40 t/h", found "lots"
      bad.yaml:71:17  boilers[1].efficiency  warning: boiler efficiency 97 % is above 95 %; check the value and its heating-value basis
      bad.yaml: 2 errors, 1 warning
      "
    `);
  });

  test('a missing file is one line and exit 1', async () => {
    const run = await runCli(['check', 'no/such/case.yaml']);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatchInlineSnapshot(`
      "no/such/case.yaml  cannot read the case file: no such file
      no/such/case.yaml: 1 error, 0 warnings
      "
    `);
  });

  test('no case named is a usage error, exit 2', async () => {
    const run = await runCli(['check']);
    expect(run.code).toBe(2);
    expect(run.stderr).not.toContain('    at ');
  });
});

describe('steamwright init', () => {
  test('writes a starter case that passes check', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-init-'));
    const file = join(folder, 'plant.yaml');
    const run = await runCli(['init', file]);
    expect(run.code).toBe(0);
    const check = await runCli(['check', file]);
    expect(check.stderr).toBe('');
    expect(check.code).toBe(0);
    expect(readFileSync(file, 'utf8')).toMatch(/^# yaml-language-server: \$schema=.*schema\/case\.schema\.json\n/);
  });

  test('--units us writes the same starter in US units; both have a turbine, scenarios and a project, and both solve', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-init-'));
    const si = join(folder, 'si.yaml');
    const us = join(folder, 'us.yaml');
    expect((await runCli(['init', si])).code).toBe(0);
    expect((await runCli(['init', us, '--units', 'us'])).code).toBe(0);
    const usText = readFileSync(us, 'utf8');
    expect(usText).toContain('units: us');
    expect(usText).toMatch(/psig/);
    expect(usText).not.toMatch(/\d (barg|degC|t\/h|EUR)\b/);
    for (const file of [si, us]) {
      const text = readFileSync(file, 'utf8');
      for (const key of ['turbines:', 'scenarios:', 'projects:']) expect(text, `${file} has ${key}`).toContain(key);
      const check = await runCli(['check', file]);
      expect(check.stderr, file).toBe('');
      const solved = await runCli(['solve', file, '--json']);
      expect(solved.code, solved.stderr).toBe(0);
      const result = JSON.parse(solved.stdout);
      expect(result.units.find((unit: { id: string }) => unit.id === 'bpt_1').values.power_kW).toBeGreaterThan(0);
    }
    // The same invented plant in either system (prices aside): boiler steam within the rounding of the US figures.
    const steam = await Promise.all([si, us].map(async (file) => JSON.parse((await runCli(['solve', file, '--json'])).stdout).units.find((unit: { id: string }) => unit.id === 'boiler_1').values.steam_kg_s as number));
    expect(Math.abs(steam[1] / steam[0] - 1)).toBeLessThan(0.03);
  });

  test('refuses to overwrite an existing file, exit 2', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-init-'));
    const file = join(folder, 'plant.yaml');
    writeFileSync(file, 'mine\n');
    const run = await runCli(['init', file]);
    expect(run.code).toBe(2);
    expect(run.stderr.replaceAll(file, 'plant.yaml')).toMatchInlineSnapshot(`
      "steamwright: plant.yaml already exists; choose another name or remove it first
      "
    `);
    expect(readFileSync(file, 'utf8')).toBe('mine\n');
  });
});
