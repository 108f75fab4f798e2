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
  meters: { tag: string; quantity: string; reconciled: number; redundant: boolean }[];
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
