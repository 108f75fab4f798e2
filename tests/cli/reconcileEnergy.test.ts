// steamwright reconcile with thermometers: the board mill's medium-pressure
// header (superheated) metered all round, with thermometers on the header
// and on both streams into it, read at the solved balance with small
// invented offsets.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { loadCase } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { enthalpyPT } from '../../src/properties/index.js';
import { runCli, projectRoot } from '../helpers/cli.js';

const MILL = join(projectRoot, 'cases', 'kestrel-bay-board-mill.yaml');
const STACK_FRAME = /^\s+at .*(\(.*:\d+:\d+\)|:\d+:\d+)$/m;

const METERS = `
meters:
  - { tag: FT-E, unit: tg1, measures: extraction, to: mp, uncertainty: 2 % }
  - { tag: FT-L, unit: prv_hp_mp, measures: letdown, to: mp, uncertainty: 2 % }
  - { tag: FT-B, unit: bpt1, measures: steam, uncertainty: 2 % }
  - { tag: FT-P, unit: prv_mp_lp, measures: steam, uncertainty: 2 % }
  - { tag: FT-D, unit: digester, measures: steam, uncertainty: 2 % }
  - { tag: FT-V, unit: evaporators, measures: steam, uncertainty: 2 % }
  - { tag: FT-S, unit: starch_cooker, measures: steam, uncertainty: 3 % }
  - { tag: TT-MP, unit: mp, measures: temperature, uncertainty: 1 K }
  - { tag: TT-E, unit: tg1, measures: temperature, to: mp, uncertainty: 1 K }
  - { tag: TT-L, unit: prv_hp_mp, measures: temperature, to: mp, uncertainty: 1 K }
`;

/** The mill without its year profile (a file beside the case), with the meters above. */
function millWithMeters(meters = METERS): string {
  return readFileSync(MILL, 'utf8').replace(/^profile:\n(?: .*\n?)+/m, '') + meters;
}

/** Readings at the solved balance, each flow moved by a small invented share, each temperature by a few tenths of a kelvin. */
async function solvedReadings(): Promise<string> {
  const loaded = await loadCase(MILL);
  if (!loaded.ok) throw new Error('the mill does not load');
  const solved = await solvePlant(loaded.plant);
  if (!solved.ok) throw new Error('the mill does not solve');
  const result = plantResult(solved);
  const flow = (from: string, to: string): number => result.streams.find((stream) => stream.from === from && stream.to === to)!.mass_kg_s * 3.6;
  const temperature = (from: string, to: string): number => result.streams.find((stream) => stream.from === from && stream.to === to)!.T_K! - 273.15;
  const rows: [string, number, string][] = [
    ['FT-E', flow('tg1', 'mp') * 1.006, 't/h'],
    ['FT-L', flow('prv_hp_mp', 'mp') * 0.992, 't/h'],
    ['FT-B', flow('mp', 'bpt1') * 1.004, 't/h'],
    ['FT-P', flow('mp', 'prv_mp_lp') * 0.995, 't/h'],
    ['FT-D', flow('mp', 'digester') * 1.01, 't/h'],
    ['FT-V', flow('mp', 'evaporators') * 0.993, 't/h'],
    ['FT-S', flow('mp', 'starch_cooker') * 1.012, 't/h'],
    ['TT-MP', temperature('mp', 'digester') + 0.3, 'degC'],
    ['TT-E', temperature('tg1', 'mp') - 0.4, 'degC'],
    ['TT-L', temperature('prv_hp_mp', 'mp') + 0.2, 'degC'],
  ];
  return `tag,value,unit\n${rows.map(([tag, value, unit]) => `${tag},${value.toFixed(3)},${unit}`).join('\n')}\n`;
}

function workspace(caseText: string, readings: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'steamwright-reconcile-energy-'));
  writeFileSync(join(dir, 'plant.yaml'), caseText);
  writeFileSync(join(dir, 'readings.csv'), readings);
  return dir;
}

interface Outcome {
  meters: { tag: string; quantity: string; measured: number; reconciled: number; redundant: boolean; statistic: number | null }[];
  streams: { id: string; value: number | null }[];
  global: { dof: number; passed: boolean };
  notes: string[];
}

describe('steamwright reconcile with thermometers', () => {
  test('the medium-pressure header gets an energy balance: one more degree of freedom, and the estimate closes it by IF97', async () => {
    const readings = await solvedReadings();
    const withThermometers = workspace(millWithMeters(), readings);
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv', '--json'], { cwd: withThermometers });
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    const outcome = JSON.parse(result.stdout) as Outcome;
    expect(outcome.notes.join('\n')).toMatch(/energy balances written at mp/);
    // The same flow meters without the thermometers: mass balances only.
    const flowsOnly = workspace(millWithMeters(METERS.split('\n').filter((line) => !line.includes('TT-')).join('\n')), readings.split('\n').filter((line) => !line.startsWith('TT-')).join('\n'));
    const massOnly = JSON.parse((await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv', '--json'], { cwd: flowsOnly })).stdout) as Outcome;
    expect(outcome.global.dof).toBe(massOnly.global.dof + 1);
    expect(outcome.global.passed).toBe(true);
    // The thermometers are in the fit and checked by the balance.
    for (const tag of ['TT-MP', 'TT-E', 'TT-L']) expect(outcome.meters.find((meter) => meter.tag === tag)).toMatchObject({ quantity: 'temperature', redundant: true });

    // Independent check of the energy balance at mp from the output alone:
    // IF97 enthalpies at the reconciled temperatures, the reconciled flows and
    // the header's stated 90 kW loss.
    const value = (id: string): number => outcome.streams.find((stream) => stream.id === id)!.value!;
    const temperature = (tag: string): number => outcome.meters.find((meter) => meter.tag === tag)!.reconciled;
    const p = 1.3013; // 12 barg with the mill's site atmosphere (1.3013 MPa abs in the solved result)
    const into = value('tg1->mp:extraction') * enthalpyPT(p, temperature('TT-E')) + value('prv_hp_mp->mp:letdown') * enthalpyPT(p, temperature('TT-L'));
    const outflows = ['mp->bpt1:steam', 'mp->prv_mp_lp:letdown', 'mp->digester:process', 'mp->evaporators:process', 'mp->starch_cooker:process'];
    const out = outflows.reduce((sum, id) => sum + value(id), 0) * enthalpyPT(p, temperature('TT-MP'));
    // kW; some 60 MW flow through the header, and p is rounded to 0.1 kPa here.
    expect(Math.abs(into - out - 90)).toBeLessThan(2);
  });

  test('a pressure gauge on mp: read, never checked, and the energy balance takes its enthalpies at the gauge\'s pressure', async () => {
    // The header read at 11.5 barg against the case's 12 barg.
    const gauge = '  - { tag: PT-MP, unit: mp, measures: pressure, uncertainty: 0.05 bar }\n';
    const readings = `${await solvedReadings()}PT-MP,11.5,barg\n`;
    const dir = workspace(millWithMeters(`${METERS}${gauge}`), readings);
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv', '--json'], { cwd: dir });
    expect(result.stderr).toBe('');
    const outcome = JSON.parse(result.stdout) as Outcome;
    const pt = outcome.meters.find((meter) => meter.tag === 'PT-MP')!;
    const p = 1.3013 - 0.05; // 11.5 barg on the mill's site atmosphere, MPa abs
    expect(pt).toMatchObject({ quantity: 'pressure', redundant: false, statistic: null });
    expect(pt.measured).toBeCloseTo(p, 9);
    expect(pt.reconciled).toBe(pt.measured);
    expect(outcome.notes.join('\n')).toMatch(/PT-MP: mp reads 12\.513 bar abs against the case's 13\.013 bar abs, more than the gauge's uncertainty: the case's steam states there are not the day's; the energy balance at mp takes its enthalpies at the reading/);
    // The balance closes by IF97 at the gauge's pressure (to a watt), and not at the case's, 0.5 bar away
    // (by 0.8 kW: at a fixed temperature superheated steam's enthalpy moves little with pressure).
    const value = (id: string): number => outcome.streams.find((stream) => stream.id === id)!.value!;
    const temperature = (tag: string): number => outcome.meters.find((meter) => meter.tag === tag)!.reconciled;
    const outflows = ['mp->bpt1:steam', 'mp->prv_mp_lp:letdown', 'mp->digester:process', 'mp->evaporators:process', 'mp->starch_cooker:process'];
    const residual = (at: number): number =>
      value('tg1->mp:extraction') * enthalpyPT(at, temperature('TT-E')) + value('prv_hp_mp->mp:letdown') * enthalpyPT(at, temperature('TT-L')) - outflows.reduce((sum, id) => sum + value(id), 0) * enthalpyPT(at, temperature('TT-MP')) - 90;
    expect(Math.abs(residual(pt.measured))).toBeLessThan(1e-3);
    expect(Math.abs(residual(1.3013))).toBeGreaterThan(0.1);
    // The text shows it in bar abs, and "not checkable".
    const text = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(text.stdout).toMatch(/ PT-MP +12\.51 bara +12\.51 bara +±0\.05000 bar +0\.000 bar +not checkable/);
  });

  test('a pressure gauge on a turbine, or with its uncertainty in a gauge unit, is located; a reading in a flow unit too', async () => {
    const meters = `${METERS}  - { tag: PT-1, unit: tg1, measures: pressure, uncertainty: 0.1 bar }\n  - { tag: PT-2, unit: mp, measures: pressure, uncertainty: 0.1 barg }\n`;
    const text = millWithMeters(meters);
    const dir = workspace(text, 'tag,value,unit\nFT-E,50,t/h\n');
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(result.code).toBe(1);
    const lines = text.split('\n');
    const lineOf = (tag: string): number => lines.findIndex((line) => line.includes(`tag: ${tag}`)) + 1;
    expect(result.stderr).toContain(`plant.yaml:${lineOf('PT-1')}:`);
    expect(result.stderr).toMatch(/pressure gauge PT-1 names "tg1", which is not a header; expected a header: "hp", "mp", "lp"/);
    expect(result.stderr).toContain(`plant.yaml:${lineOf('PT-2')}:`);
    expect(result.stderr).toMatch(/expected a pressure gauge's uncertainty as a pressure difference such as "0\.1 bar", "2 psi" or "5 kPa", or as a share such as "0\.5 %", found "0\.1 barg"/);
    expect(result.stderr).not.toMatch(STACK_FRAME);
    const good = workspace(millWithMeters(`${METERS}  - { tag: PT-MP, unit: mp, measures: pressure, uncertainty: 0.5 % }\n`), 'tag,value,unit\nFT-E,50,t/h\nPT-MP,12,t/h\n');
    const read = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: good });
    expect(read.code).toBe(1);
    expect(read.stderr).toMatch(/readings\.csv:3: unit of PT-MP: /);
  });

  test('text output shows the thermometers in degrees', async () => {
    const dir = workspace(millWithMeters(), await solvedReadings());
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/ TT-MP +2\d\d\.\d+ °C|TT-MP +2\d\d\.\d+ degC/);
  });

  test('bad thermometers are located: a share of a temperature, a unit with no header named, a reading in a flow unit', async () => {
    const meters = `
meters:
  - { tag: FT-E, unit: tg1, measures: extraction, to: mp, uncertainty: 2 % }
  - { tag: TT-MP, unit: mp, measures: temperature, uncertainty: 1 % }
  - { tag: TT-E, unit: tg1, measures: temperature, uncertainty: 1 K }
`;
    const text = millWithMeters(meters);
    const dir = workspace(text, 'tag,value,unit\nFT-E,50,t/h\n');
    const result = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: dir });
    expect(result.code).toBe(1);
    expect(result.stdout).toBe('');
    const lines = text.split('\n');
    const lineOf = (tag: string): number => lines.findIndex((line) => line.includes(`tag: ${tag}`)) + 1;
    expect(result.stderr).toContain(`plant.yaml:${lineOf('TT-MP')}:`);
    expect(result.stderr).toMatch(/expected a thermometer's uncertainty as a temperature difference such as "1 K" or "2 degF", found "1 %"/);
    expect(result.stderr).toContain(`plant.yaml:${lineOf('TT-E')}:`);
    expect(result.stderr).toMatch(/thermometer TT-E: expected a header id in "unit", or a unit with "to:" naming the header its stream enters \(tg1 feeds "mp"/);
    expect(result.stderr).not.toMatch(STACK_FRAME);

    const good = workspace(millWithMeters(METERS), 'tag,value,unit\nFT-E,50,t/h\nTT-MP,50,t/h\nTT-E,-300,degC\n');
    const read = await runCli(['reconcile', 'plant.yaml', '--readings', 'readings.csv'], { cwd: good });
    expect(read.code).toBe(1);
    expect(read.stderr).toMatch(/readings\.csv:3: unit of TT-MP: /);
    expect(read.stderr).toMatch(/readings\.csv:4: /);
    expect(read.stderr).not.toMatch(STACK_FRAME);
  });
});
