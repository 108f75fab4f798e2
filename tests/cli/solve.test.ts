import { describe, expect, it } from 'vitest';
import Ajv2020 from 'ajv/dist/2020.js';
import { mkdtempSync, readFileSync, existsSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../helpers/cli.js';
import { smallCase } from '../plant/helpers/cases.js';

const DEMO = 'cases/kestrel-bay-board-mill.yaml';

describe('steamwright solve', () => {
  it('prints the balance with headers, losses, totals, key figures, the audit and the safety caution', async () => {
    const run = await runCli(['solve', DEMO]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    for (const heading of ['Headers', 'Losses', 'Sources', 'Turbines', 'Letdowns', 'Users', 'Totals', 'Key figures', 'Audit:']) {
      expect(run.stdout).toContain(heading);
    }
    expect(run.stdout).toMatch(/marginal steam value/);
    expect(run.stdout).toMatch(/relief capacity/);
    expect(run.stdout).toMatch(/ASME B31\.1/);
  });

  it('labels marginal values in the objective\'s own units, with both sides and what sets them', async () => {
    const fuel = await runCli(['solve', DEMO, '--objective', 'min-fuel']);
    expect(fuel.code).toBe(0);
    expect(fuel.stdout).toMatch(/hp +42\.0 barg .* \d+\.\d\d GJ\/t/);
    expect(fuel.stdout).not.toMatch(/EUR\/t/);
    const co2 = await runCli(['solve', DEMO, '--objective', 'min-co2']);
    expect(co2.stdout).toMatch(/\d+\.\d\d kg CO2\/t/);
    const cost = await runCli(['solve', DEMO]);
    expect(cost.stdout).toMatch(/hp: one more costs \d+\.\d\d EUR\/t \([a-z_0-9]+ (fuel|power given up)/);
    expect(cost.stdout).toMatch(/one less saves \d+\.\d\d EUR\/t/);
    const json = JSON.parse((await runCli(['solve', DEMO, '--json'])).stdout);
    expect(json.marginal_value_unit).toBe('currency');
    for (const header of json.headers) expect(header.marginal).toHaveProperty('more_set_by');
    expect(json.commitments.filter((candidate: { kept: boolean }) => candidate.kept)).toHaveLength(1);
  }, 300_000);

  it('--json gives headers, streams, units, totals and the audit in SI numbers', async () => {
    const run = await runCli(['solve', DEMO, '--json']);
    expect(run.code).toBe(0);
    const result = JSON.parse(run.stdout);
    for (const header of result.headers) {
      for (const key of ['id', 'pressure_MPa', 'T_K', 'h_kJ_kg', 'marginal_value_per_t']) expect(header).toHaveProperty(key);
    }
    for (const stream of result.streams) for (const key of ['from', 'to', 'kind', 'mass_kg_s', 'h_kJ_kg']) expect(stream).toHaveProperty(key);
    expect(typeof result.totals.cost_per_h).toBe('number');
    expect(result.audit.max_mass_residual_kg_s).toBeLessThan(1e-6);
    expect(result.audit).toHaveProperty('max_energy_residual_kW');
    // Every flow into or out of a header is one stream.
    const headerIds = new Set(result.headers.map((header: { id: string }) => header.id));
    const touching = result.streams.filter((stream: { from: string; to: string }) => headerIds.has(stream.from) || headerIds.has(stream.to));
    const listed = result.headers.reduce((total: number, header: { inflows: unknown[]; outflows: unknown[] }) => total + header.inflows.length + header.outflows.length, 0);
    expect(touching.length).toBe(listed);
  });

  it('--objective max-power makes at least as much power as the minimum-cost balance', async () => {
    const cost = JSON.parse((await runCli(['solve', DEMO, '--json'])).stdout);
    const power = JSON.parse((await runCli(['solve', DEMO, '--json', '--objective', 'max-power'])).stdout);
    expect(power.objective).toBe('maximumPower');
    expect(power.totals.power_generated_kW).toBeGreaterThanOrEqual(cost.totals.power_generated_kW - 1e-6);
  });

  it('--export-lp writes the final model in LP format', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-'));
    const file = join(folder, 'mill.lp');
    const run = await runCli(['solve', DEMO, '--export-lp', file]);
    expect(run.code).toBe(0);
    const text = readFileSync(file, 'utf8');
    expect(text).toMatch(/^\\?/m);
    expect(text).toMatch(/Minimize/);
    expect(text).toMatch(/End/);
  });

  it('a case that cannot be met is one located diagnosis on stderr, exit code 1, and no output file', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-'));
    const casePath = join(folder, 'short.yaml');
    writeFileSync(casePath, smallCase({ boilerMax: '10 t/h', userSteam: '30 t/h' }));
    const lp = join(folder, 'short.lp');
    const run = await runCli(['solve', casePath, '--export-lp', lp]);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/the case cannot be met: main is short of .* t\/h\) of steam or water/);
    expect(existsSync(lp)).toBe(false);
  });

  it('a case with errors lists them located and exits 1', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-'));
    const casePath = join(folder, 'bad.yaml');
    writeFileSync(casePath, smallCase({ boilerMax: 'fifty' }));
    const run = await runCli(['solve', casePath]);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/bad\.yaml:\d+:\d+/);
    expect(run.stderr).toMatch(/nothing was solved/);
    expect(run.stderr).not.toMatch(/\n\s+at /);
  });
});

describe('steamwright solve --json output schema', () => {
  it('validates against schema/result.schema.json', async () => {
    const ajv = new Ajv2020.default({ allErrors: true, strict: false });
    const validate = ajv.compile(JSON.parse(readFileSync('schema/result.schema.json', 'utf8')));
    for (const name of ['kestrel-bay-board-mill.yaml', 'millbrook-creamery.yaml']) {
      const run = await runCli(['solve', `cases/${name}`, '--json']);
      expect(run.code).toBe(0);
      const ok = validate(JSON.parse(run.stdout));
      expect(validate.errors ?? [], name).toEqual([]);
      expect(ok).toBe(true);
    }
  });
});
