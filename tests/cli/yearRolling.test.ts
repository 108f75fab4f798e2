// steamwright year on a plant whose peaking boiler has switching rules: the
// text and JSON say rolling windows and why, start costs are listed, a shard is
// refused, and a minimum longer than the profile is located in the case.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../helpers/cli.js';

const plantText = readFileSync(new URL('../year/fixtures/peaker-plant.yaml', import.meta.url), 'utf8');
const SHAPE = 'HHHLHHLLLLLLLLHH';

function folderWith(text: string): string {
  const folder = mkdtempSync(join(tmpdir(), 'steamwright-rolling-'));
  writeFileSync(join(folder, 'plant.yaml'), `${text}\nprofile: { file: hours.csv }\n`);
  const lines = ['timestamp,process.steam [t/h]', ...[...SHAPE].map((level, at) => `2026-03-01T${String(at).padStart(2, '0')}:00,${level === 'H' ? 18 : 9}`)];
  writeFileSync(join(folder, 'hours.csv'), `${lines.join('\n')}\n`);
  return folder;
}

describe('steamwright year with switching rules', () => {
  test('text and --json say rolling windows and why, with the start costs', async () => {
    const folder = folderWith(plantText);
    const text = await runCli(['year', join(folder, 'plant.yaml')]);
    expect(text.stderr).toBe('');
    expect(text.code).toBe(0);
    expect(text.stdout).toContain('On/off across periods: rolling windows; peaker declares start costs or minimum running or stopped hours');
    expect(text.stdout).toMatch(/start-ups +\d/);
    expect(text.stdout).toContain('start costs (EUR)');
    const json = await runCli(['year', join(folder, 'plant.yaml'), '--json']);
    expect(json.code).toBe(0);
    const result = JSON.parse(json.stdout);
    expect(result.mode).toBe('rolling windows');
    expect(result.switching_units).toEqual(['peaker']);
    expect(result.window).toEqual({ kept: 168, overlap: 24 });
    const peaker = result.units.find((unit: { id: string }) => unit.id === 'peaker');
    expect(peaker.start_up_cost).toBe(100 * peaker.starts);
    expect(result.annual.start_up_cost).toBe(peaker.start_up_cost);
  });

  test('a shard is refused: the windows chain', async () => {
    const folder = folderWith(plantText);
    const run = await runCli(['year', join(folder, 'plant.yaml'), '--shard', '1/2', '--part', join(folder, 'part.json')]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('cannot be split into shards');
  });

  test('a minimum longer than the profile is located in the case; nothing is solved', async () => {
    const folder = folderWith(plantText.replace('min_hours_on: 4', 'min_hours_on: 20'));
    const run = await runCli(['year', join(folder, 'plant.yaml')]);
    expect(run.code).toBe(1);
    expect(run.stdout).toBe('');
    expect(run.stderr.replaceAll(folder, 'DIR')).toMatchInlineSnapshot(`
      "DIR/plant.yaml:55:21  boiler peaker switching.min_hours_on: expected at most the profile's 16 h, found 20 h: a run that long could never end within the year
      steamwright: DIR/plant.yaml: 1 switching rule longer than the profile; nothing was solved
      "
    `);
  });
});
