import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { parse } from 'yaml';
import { runCli, projectRoot } from '../helpers/cli.js';

/** A stack frame as V8 prints it (the same pattern as hostileInput.test.ts). */
const STACK_FRAME = /^\s+at .*(\(.*:\d+:\d+\)|:\d+:\d+)$/m;

const DEMO = join(projectRoot, 'cases', 'millbrook-creamery.yaml');
const READINGS = join(projectRoot, 'cases', 'millbrook-creamery.readings.csv');

function workspace(caseText: string, readings: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'steamwright-reconcile-'));
  writeFileSync(join(dir, 'plant.yaml'), caseText);
  writeFileSync(join(dir, 'readings.csv'), readings);
  return dir;
}

describe('steamwright reconcile', () => {
  test('the demo: the global test rejects and serial elimination names the turbine inlet meter', async () => {
    const result = await runCli(['reconcile', DEMO, '--readings', READINGS]);
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/Global test: chi-square [\d.]+ on 5 degrees of freedom, critical 11\.07 at 5 %: rejected/);
    expect(result.stdout).toMatch(/ 1 {2}FT-111 /);
    expect(result.stdout).toMatch(/Not redundant, so not checked by any balance: FT-103, /);
    expect(result.stdout).toMatch(/ASME|licensed engineers/);
  });

  test('--json and --csv carry every reading with its statistic', async () => {
    const json = await runCli(['reconcile', DEMO, '--readings', READINGS, '--json']);
    expect(json.code).toBe(0);
    const outcome = JSON.parse(json.stdout) as { meters: { tag: string; statistic: number | null; redundant: boolean }[]; suspects: { tag: string; bias: number }[]; global: { dof: number } };
    expect(outcome.meters).toHaveLength(20);
    expect(outcome.suspects[0].tag).toBe('FT-111');
    // The demo's turbine inlet reading is 15 % above the flow its readings file was drawn from (12.29 klb/h, invented).
    expect(outcome.suspects[0].bias * 3.6 / 0.45359237).toBeGreaterThan(1.0);
    const bounded = JSON.parse(json.stdout) as { meters: { tag: string; reconciled: number; unbounded: number; atBound: boolean }[]; streams: { id: string; value: number | null; unbounded: number | null; atBound: boolean }[]; notes: string[] };
    // The unbounded fit puts the idle pump turbine's and the letdown's meters
    // below zero; reported flows are zero or more (held there by their own
    // bound or by one on a stream they balance with), and the streams held at
    // zero are named in the notes.
    for (const tag of ['FT-112', 'FT-121']) {
      const meter = bounded.meters.find((entry) => entry.tag === tag)!;
      expect(meter.unbounded, tag).toBeLessThan(0);
      expect(Math.abs(meter.reconciled), tag).toBeLessThan(1e-9);
    }
    for (const meter of bounded.meters) expect(meter.reconciled, meter.tag).toBeGreaterThanOrEqual(-1e-9);
    for (const stream of bounded.streams) if (stream.value !== null) expect(stream.value, stream.id).toBeGreaterThanOrEqual(-1e-9);
    for (const stream of bounded.streams.filter((entry) => entry.atBound)) expect(bounded.notes.join('\n')).toContain(`${stream.id} is held at zero`);
    expect(bounded.streams.filter((entry) => entry.atBound).map((entry) => entry.id)).toEqual(['boiler_b->drain:blowdown', 'hp->pump_turbine:steam']);
    const csv = await runCli(['reconcile', DEMO, '--readings', READINGS, '--csv']);
    expect(csv.code).toBe(0);
    expect(csv.stdout.split('\r\n')[0]).toBe('table,tag,stream,measured_kg_s,sigma_kg_s,reconciled_kg_s,reconciled_sigma_kg_s,adjustment_kg_s,adjustment_sigma_kg_s,redundant,statistic,flagged,suspect_rank,bias_kg_s,bias_sigma_kg_s,equivalent,unbounded_kg_s,at_bound,quantity');
    expect(csv.stdout).toMatch(/\r\nreading,FT-111,hp->bptg:steam,/);
  });

  test('--write-case writes a case that solves, its users at the reconciled steam', async () => {
    const dir = workspace(readFileSync(DEMO, 'utf8'), readFileSync(READINGS, 'utf8'));
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv', '--write-case', 'measured.yaml'], { cwd: dir });
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/Wrote measured\.yaml: 5 users at reconciled steam/);
    const written = readFileSync(join(dir, 'measured.yaml'), 'utf8');
    const users = (parse(written) as { users: { id: string; steam?: string; heat?: string }[] }).users;
    // The evaporator was given by its duty; it now draws its reconciled steam.
    expect(users.find((user) => user.id === 'evaporator')).toMatchObject({ steam: expect.stringMatching(/^[\d.]+ klb\/h$/) });
    expect(users.find((user) => user.id === 'evaporator')?.heat).toBeUndefined();
    const solved = await runCli(['solve', 'measured.yaml'], { cwd: dir });
    expect(solved.stderr).toBe('');
    expect(solved.code).toBe(0);
  });

  test('bad meters in the case: every one located, nothing reconciled', async () => {
    const text = readFileSync(DEMO, 'utf8')
      .replace('{ tag: FT-101, unit: boiler_a,', '{ tag: FT-101, unit: boiler_z,')
      .replace('{ tag: FT-201, unit: pasteurisers, measures: steam, uncertainty: 3 % }', '{ tag: FT-201, unit: pasteurisers, measures: steam, uncertainty: 0 % }')
      .replace('{ tag: FT-303, unit: direct_injection, measures: steam,', '{ tag: FT-303, unit: direct_injection, measures: spray,');
    const dir = workspace(text, readFileSync(READINGS, 'utf8'));
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(result.code).toBe(1);
    expect(result.stdout).toBe('');
    expect(result.stderr).not.toMatch(STACK_FRAME);
    expect(result.stderr).toMatchInlineSnapshot(`
      "plant.yaml:206:26  meters[0].unit  meter FT-101 names "boiler_z", which no stream of the plant starts or ends at; expected the id of a unit, header, flash tank or "deaerator"
      plant.yaml:213:70  meters[7].uncertainty  expected an uncertainty above zero (such as "2 %" or "0.5 t/h"), found "0 %"
      plant.yaml:217:54  meters[11].measures  meter FT-303: direct_injection has no spray stream; its streams are process from lp, condensate to environment
      steamwright: plant.yaml: 3 errors in the meters; nothing was reconciled
      "
    `);
  });

  test('check finds the same meter problems without readings', async () => {
    const text = readFileSync(DEMO, 'utf8').replace('{ tag: FT-101, unit: boiler_a,', '{ tag: FT-101, unit: boiler_z,');
    const dir = workspace(text, '');
    const result = await runCli(['check', 'plant.yaml'], { cwd: dir });
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/plant\.yaml:\d+:\d+ +meters\[0\]\.unit +meter FT-101 names "boiler_z"[\s\S]*1 error in the meters/);
  });

  test('bad readings: every row located, nothing reconciled', async () => {
    const readings = ['tag,value,unit', 'FT-101,28.0,', 'FT-201,-3,klb/h', 'FT-999,1,klb/h', 'FT-202,"7.0,klb/h', ''].join('\n');
    const dir = workspace(readFileSync(DEMO, 'utf8'), readings);
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(result.code).toBe(1);
    expect(result.stderr).not.toMatch(STACK_FRAME);
    expect(result.stderr).toMatchInlineSnapshot(`
      "readings.csv:2: reading of FT-101 has no unit; expected a mass flow unit such as t/h, kg/s or klb/h, found "28.0"
      readings.csv:3: unit of FT-201: "-3 klb/h" is negative; a mass flow cannot be below zero
      readings.csv:4: tag "FT-999" is not a meter of the case
      readings.csv:5: the row does not parse as CSV (Quote Not Closed: the parsing is finished with an opening quote at line 5)
      steamwright: readings.csv: 4 errors; nothing was reconciled
      "
    `);
  });

  test('a power meter: one on a header is located by check and reconcile; a power read in a flow unit, or below zero, is located in the readings', async () => {
    const onHeader = readFileSync(DEMO, 'utf8').replace('{ tag: JT-111, unit: bptg, measures: power,', '{ tag: JT-111, unit: hp, measures: power,');
    const dir = workspace(onHeader, readFileSync(READINGS, 'utf8'));
    for (const args of [['check', 'plant.yaml'], ['reconcile', 'plant.yaml', '--readings', 'readings.csv']]) {
      const result = await runCli(args, { cwd: dir });
      expect(result.code, args[0]).toBe(1);
      expect(result.stderr, args[0]).not.toMatch(STACK_FRAME);
      expect(result.stderr, args[0]).toMatch(/plant\.yaml:\d+:\d+ +meters\[18\]\.unit +power meter JT-111 names "hp", which is not a turbine; expected a turbine: "bptg", "pump_turbine"/);
    }
    const readings = readFileSync(READINGS, 'utf8').replace('JT-111,238,kW', 'JT-111,238,t/h') + 'FT-999,1,klb/h\n';
    const badUnit = workspace(readFileSync(DEMO, 'utf8'), readings);
    const unit = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: badUnit });
    expect(unit.code).toBe(1);
    expect(unit.stderr).toMatch(/readings\.csv:21: unit of JT-111: .*power/);
    const negative = workspace(readFileSync(DEMO, 'utf8'), readFileSync(READINGS, 'utf8').replace('JT-111,238,kW', 'JT-111,-0.2,MW'));
    const below = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: negative });
    expect(below.code).toBe(1);
    expect(below.stderr).toContain('readings.csv:21: reading of JT-111 is a negative power, "-0.2 MW"; a turbine\'s power meter reads zero or more');
    expect(below.stdout).toBe('');
  });

  test('a fuel meter: one on a turbine is located; a fuel rate in a flow unit, or below zero, is located in the readings', async () => {
    const onTurbine = readFileSync(DEMO, 'utf8').replace('{ tag: FQ-101, unit: boiler_a, measures: fuel,', '{ tag: FQ-101, unit: bptg, measures: fuel,');
    const result = await runCli(['check', 'plant.yaml'], { cwd: workspace(onTurbine, readFileSync(READINGS, 'utf8')) });
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/plant\.yaml:\d+:\d+ +meters\[19\]\.unit +fuel meter FQ-101 names "bptg", which is not a fired boiler; expected a fired boiler: "boiler_a", "boiler_b"/);
    const readings = readFileSync(READINGS, 'utf8').replace('FQ-101,34.6,MMBtu/h', 'FQ-101,34.6,klb/h').replace('JT-111,238,kW', 'JT-111,-238,kW');
    const run = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: workspace(readFileSync(DEMO, 'utf8'), readings) });
    expect(run.code).toBe(1);
    expect(run.stderr).not.toMatch(STACK_FRAME);
    expect(run.stderr).toMatch(/readings\.csv:21: reading of JT-111 is a negative power[\s\S]*readings\.csv:22: unit of FQ-101: /);
    const negative = readFileSync(READINGS, 'utf8').replace('FQ-101,34.6,MMBtu/h', 'FQ-101,-1,GJ/h');
    const below = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: workspace(readFileSync(DEMO, 'utf8'), negative) });
    expect(below.stderr).toContain('readings.csv:22: reading of FQ-101 is a negative fuel rate, "-1 GJ/h"; a fuel meter reads zero or more');
  });

  test('the demo\'s generator meter: in the text in kW, in --json as quantity power, and checking the turbine\'s steam meters', async () => {
    const text = await runCli(['reconcile', DEMO, '--readings', READINGS]);
    expect(text.stdout).toMatch(/\n {2}JT-111 +238\.0 kW +[\d.]+ kW /);
    const json = JSON.parse((await runCli(['reconcile', DEMO, '--readings', READINGS, '--json'])).stdout) as { meters: { tag: string; quantity: string; stream: string; redundant: boolean; measured: number }[]; suspects: { tag: string; globalAfter: { passed: boolean } }[] };
    expect(json.meters.find((meter) => meter.tag === 'JT-111')).toMatchObject({ quantity: 'power', stream: 'bptg', redundant: true, measured: 238 });
    // The gas meter reads energy per hour: 34.6 MMBtu/h in the file, kW in the JSON.
    expect(json.meters.find((meter) => meter.tag === 'FQ-101')).toMatchObject({ quantity: 'fuel', stream: 'boiler_a', redundant: true });
    expect(json.meters.find((meter) => meter.tag === 'FQ-101')!.measured).toBeCloseTo((34.6 * 1_055_055.85262) / 3600, 6);
    expect(text.stdout).toMatch(/\n {2}FQ-101 +34\.60 MMBtu\/h /);
    // The power meter agrees with the exhaust meter, so the inlet meter is the one set aside, and then every test passes.
    expect(json.suspects.map((suspect) => suspect.tag)).toEqual(['FT-111']);
    expect(json.suspects[0].globalAfter.passed).toBe(true);
  });

  test('a row with too few fields, a bad number and a unit that is no flow', async () => {
    const readings = ['tag,value,unit', 'FT-101,28.0', 'FT-201,nine,klb/h', 'FT-202,7,barg', 'FT-301,5.7,klb/h', 'FT-301,5.8,klb/h', ''].join('\n');
    const dir = workspace(readFileSync(DEMO, 'utf8'), readings);
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(result.code).toBe(1);
    expect(result.stderr).toMatchInlineSnapshot(`
      "readings.csv:2: expected 3 fields (tag, value, unit), found 2
      readings.csv:3: value of FT-201: expected a number, found "nine"
      readings.csv:4: unit of FT-202: "7 barg" is a pressure, not a mass flow; expected one of kg/s, kg/min, kg/h, t/h, t/d, lb/s, lb/min, lb/h, klb/h
      readings.csv:6: tag FT-301 is read twice (first on line 5); a snapshot has one row per tag, a series needs a time column
      steamwright: readings.csv: 4 errors; nothing was reconciled
      "
    `);
  });

  test('a time series: averaged, and a drifting meter is reported', async () => {
    const base = readFileSync(READINGS, 'utf8').split('\n').filter((line) => /^FT-/.test(line));
    const rows = ['time,tag,value,unit'];
    for (let hour = 8; hour < 12; hour++) {
      for (const line of base) {
        const [tag, value, unit] = line.split(',');
        // FT-301 climbs 10 % over the window; the others hold.
        const drift = tag === 'FT-301' ? 1 + 0.033 * (hour - 8) : 1;
        rows.push(`2026-11-02T${String(hour).padStart(2, '0')}:00,${tag},${(Number(value) * drift).toFixed(3)},${unit}`);
      }
    }
    const dir = workspace(readFileSync(DEMO, 'utf8'), `${rows.join('\n')}\n`);
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv', '--json'], { cwd: dir });
    expect(result.code).toBe(0);
    const outcome = JSON.parse(result.stdout) as { meters: { tag: string; count: number; unsteady: boolean }[]; notes: string[] };
    expect(outcome.meters.find((meter) => meter.tag === 'FT-301')).toMatchObject({ count: 4, unsteady: true });
    expect(outcome.meters.filter((meter) => meter.unsteady).map((meter) => meter.tag)).toEqual(['FT-301']);
    expect(outcome.notes.join('\n')).toMatch(/FT-301 drifted .* the window may not be steady/);
    const windowed = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv', '--json', '--from', '2026-11-02T10:00', '--to', '2026-11-02T11:00'], { cwd: dir });
    expect((JSON.parse(windowed.stdout) as { meters: { count: number }[] }).meters[0].count).toBe(2);
  });

  test('a case without meters says how to add them', async () => {
    const result = await runCli(['reconcile', join(projectRoot, 'cases', 'kestrel-bay-board-mill.yaml'), '--readings', READINGS]);
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/the case has no meters; add a "meters:" list/);
  });
});
