import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.js';

describe('steamwright state', () => {
  it('wet steam at 1 MPa sits at Tsat = 453.035632 K (R7-97 Table 35) with no cp', async () => {
    const run = await runCli(['state', '--p', '1 MPa', '--x', '0.5', '--json']);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    const state = JSON.parse(run.stdout);
    expect(state.region).toBe(4);
    expect(state.x).toBe(0.5);
    expect(state.T_K).toBeCloseTo(453.035632, 5);
    expect(state.cp_kJ_kgK).toBeNull();
  });

  it('3 MPa, 300 K is region 1 with h = 115.331273 kJ/kg (R7-97 Table 5)', async () => {
    const run = await runCli(['state', '--p', '3 MPa', '--T', '300 K', '--json']);
    const state = JSON.parse(run.stdout);
    expect(state.region).toBe(1);
    expect(state.h_kJ_kg).toBeCloseTo(115.331273, 5);
    expect(state.x).toBeNull();
  });

  it('prints a readable table in US units', async () => {
    const run = await runCli(['state', '--p', '150 psig', '--x', '1', '--units', 'us']);
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/psig/);
    expect(run.stdout).toMatch(/degF/);
    expect(run.stdout).toMatch(/Btu\/lb/);
    expect(run.stdout).toMatch(/IAPWS-IF97/);
  });

  it('a malformed quantity is one line on stderr with exit code 2', async () => {
    const run = await runCli(['state', '--p', 'ten barg', '--x', '1']);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/^steamwright: p: /);
    expect(run.stderr).not.toMatch(/ at .*\.js/);
  });

  it('a missing second property is refused with exit code 2', async () => {
    const run = await runCli(['state', '--p', '1 MPa']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatchInlineSnapshot(`
      "steamwright: only a pressure given; give p with one of T, h, s or x, or T with x
      "
    `);
  });

  it('two second properties at once are refused', async () => {
    const run = await runCli(['state', '--p', '1 MPa', '--T', '500 K', '--h', '2800 kJ/kg']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatchInlineSnapshot(`
      "steamwright: T and h given together; give p with one of T, h, s or x, or T with x
      "
    `);
  });

  it('a doubled option is refused', async () => {
    const run = await runCli(['state', '--p', '1 MPa', '--p', '2 MPa', '--x', '0']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatchInlineSnapshot(`
      "steamwright: --p was given 2 times ("1 MPa", "2 MPa"); give it once
      "
    `);
  });

  it('a state outside IF97 names the value and the limit', async () => {
    const run = await runCli(['state', '--p', '120 MPa', '--T', '500 K']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/120 MPa/);
    expect(run.stderr).toMatch(/100 MPa/);
  });

  it('an unknown option is refused with exit code 2', async () => {
    const run = await runCli(['state', '--p', '1 MPa', '--q', '3']);
    expect(run.code).toBe(2);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });
});

describe('steamwright state --batch', () => {
  it('writes one JSON line per input line, in order, and goes on past bad lines', async () => {
    const input = [
      '{"p":"3 MPa","T":"300 K"}',
      '{"p":"1 MPa","h":"2800 kJ/kg"}',
      'not json',
      '{"p":"0.5 MPa","s":"7 kJ/(kg K)"}',
      '{"p":"1 MPa","x":0.5}',
      '{"p":"1 MPa"}',
      '{"p":3,"T":300}',
    ].join('\n');
    const run = await runCli(['state', '--batch', '-'], { input });
    expect(run.code).toBe(0);
    const out = run.stdout.trim().split('\n').map((line) => JSON.parse(line));
    expect(out).toHaveLength(7);
    // R7-97 Table 5: region 1 at 3 MPa, 300 K, h = 0.115331273e3 kJ/kg
    expect(out[0].h_kJ_kg).toBeCloseTo(115.331273, 5);
    expect(out[0].region).toBe(1);
    expect(out[1].region).toBe(2);
    expect(out[2].error).toMatch(/^line 3: not a JSON object/);
    expect(out[3].region).toBe(2);
    expect(out[4]).toMatchObject({ region: 4, x: 0.5, cp_kJ_kgK: null });
    expect(out[5].error).toMatch(/^line 6: only a pressure given/);
    // Bare numbers are taken in the internal units (MPa, K).
    expect(out[6].h_kJ_kg).toBeCloseTo(115.331273, 5);
    for (const key of ['p_MPa', 'T_K', 'h_kJ_kg', 's_kJ_kgK', 'v_m3_kg', 'cp_kJ_kgK', 'x', 'region']) {
      expect(out[0]).toHaveProperty(key);
    }
  });

  it('a missing batch file is one clear line and exit code 2', async () => {
    const run = await runCli(['state', '--batch', 'no/such/file.jsonl']);
    expect(run.code).toBe(2);
    expect(run.stderr).toMatchInlineSnapshot(`
      "steamwright: --batch: cannot read "no/such/file.jsonl"; give a file of JSON lines, or - for stdin
      "
    `);
  });
});
