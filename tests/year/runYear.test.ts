// runYear on a day of the mill's invented profile: totals equal the sum over
// periods to the cent; identical periods are solved once and copied exactly;
// warm-started periods agree with cold independent solves; four shards merge
// into exactly the single run's result.
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, test } from 'vitest';
import { solvePlant } from '../../src/plant/index.js';
import { displayFormat, yearCsv } from '../../src/report/index.js';
import { COMPONENTS, mergeParts, partText, periodPlant, runYear, yearFingerprint, yearMeta, type PeriodRecord, type YearInput, type YearResult } from '../../src/year/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { loadPlant, millBase, profileOf } from './helpers.js';

type Solved = Extract<PeriodRecord, { ok: true }>;

// The first 24 hours of the bundled profile, with hours 3 and 4 given hour 2's
// values (a steady spell) so that identical periods occur within a block, and
// hour 7 too, in the next block (blocks of 6 here).
const bundled = readFileSync(new URL('../../cases/profiles/kestrel-bay-year.csv', import.meta.url), 'utf8').split('\n');
const rows = bundled.slice(1, 25).map((line) => line.split(','));
for (const copy of [3, 4, 7]) rows[copy] = [rows[copy][0], ...rows[2].slice(1)];
const text = [bundled[0], ...rows.map((row) => row.join(','))].join('\n');

let input: YearInput;
let single: { result: YearResult; records: PeriodRecord[] };

beforeAll(async () => {
  const plant = loadPlant(millBase);
  input = { plant, profile: profileOf(plant, text), profileFile: 'profile.csv', blockPeriods: 6 };
  const run = await runYear(input, { workers: 1, keepRecords: true });
  single = { result: run.result!, records: run.records! };
});

describe('runYear', () => {
  test('every period solves; annual totals equal the sum over the CSV rows to the cent', () => {
    expect(single.result.failed).toEqual([]);
    const csv = yearCsv(single.result, single.records, displayFormat('si', 'EUR', 0.1013)).trim().split('\n').map((line) => line.split(','));
    const heading = csv[0];
    const column = (name: string): number => heading.indexOf(name);
    const sum = (name: string): number => csv.slice(1).reduce((total, row) => total + Number(row[column(name)]) * Number(row[column('hours')]), 0);
    expect(csv).toHaveLength(25);
    expect(Math.abs(sum('cost [EUR/h]') - single.result.annual.cost)).toBeLessThan(0.005);
    for (const component of COMPONENTS) expect(Math.abs(sum(`${component} cost [EUR/h]`) - single.result.annual.cost_by_component[component]), component).toBeLessThan(0.005);
    // A second sum: the components add up to the total, and the months to the year.
    const components = COMPONENTS.reduce((total, component) => total + single.result.annual.cost_by_component[component], 0);
    expect(Math.abs(components - single.result.annual.cost)).toBeLessThan(0.005);
    const months = single.result.months.reduce((total, month) => total + month.cost, 0);
    expect(Math.abs(months - single.result.annual.cost)).toBeLessThan(0.005);
    // Energy from the CSV's own units: t/h x h = t.
    expectClose(sum('steam raised [t/h]'), single.result.annual.steam_raised_t, 1e-9, 'steam raised');
    expectClose(sum('power imported [kW]') / 1000, single.result.annual.power_imported_MWh, 1e-9, 'import');
  });

  test('running hours and starts follow from the periods\' on/off choices', () => {
    for (const [slot, unit] of single.result.units.entries()) {
      const running = single.records.map((record) => ((record as Solved).units[slot].running));
      expect(unit.hours_running, unit.id).toBe(running.filter((value) => value === 1).length);
      const starts = running.filter((value, at) => at > 0 && value === 1 && running[at - 1] === 0).length;
      expect(unit.starts, unit.id).toBe(starts);
    }
  });

  test('identical periods within a block are solved once and copied exactly; a block solves its own', () => {
    const [two, three, four, seven] = [2, 3, 4, 7].map((index) => single.records[index] as Solved);
    expect(three.how).toBe('same as an earlier period');
    expect(four.how).toBe('same as an earlier period');
    const strip = (record: Solved) => ({ ...record, index: 0, label: '', how: '' });
    expect(strip(three)).toEqual(strip(two));
    expect(strip(four)).toEqual(strip(two));
    // In the next block it is solved again, so no block depends on another.
    expect(seven.how).not.toBe('same as an earlier period');
    expectClose(seven.cost_per_h, two.cost_per_h, 1e-6, 'hour 7 as hour 2');
    expect(single.result.how.same_as_earlier).toBe(2);
    expect(single.result.how.full).toBeGreaterThanOrEqual(4); // each block of 6 starts cold
  });

  test('warm-started and deduplicated periods agree with cold independent solves', async () => {
    const width = input.profile.columns.length;
    for (const index of [1, 3, 5, 7, 9, 13, 17, 23]) {
      const record = single.records[index] as Solved;
      const cold = await solvePlant(periodPlant(input.plant, input.profile.columns, input.profile.values, index * width), { probeMarginalValues: false });
      if (!cold.ok) throw new Error(`period ${index} should solve cold`);
      // Converged optima of the same plant agree to the convergence tolerance.
      expectClose(record.cost_per_h, cold.result.objective!, 1e-6, `period ${index} cost`);
      const onOff = [...cold.commitment].filter(([name]) => name.endsWith('.on'));
      for (const [name, value] of onOff) {
        const slot = single.result.units.findIndex((unit) => `${unit.id}.on` === name);
        expect(record.units[slot].running, `period ${index} ${name}`).toBe(value > 0.5 ? 1 : 0);
      }
    }
  });

  test('four shards merge into exactly the single run\'s result', async () => {
    const parts: { name: string; text: string }[] = [];
    for (let index = 1; index <= 4; index += 1) {
      const shard = { index, count: 4 };
      const run = await runYear(input, { workers: 1, shard });
      expect(run.result).toBeNull();
      parts.push({ name: `part-${index}.json`, text: partText(yearMeta(input), input.plant, yearFingerprint(input), shard, run.records!) });
    }
    const merged = mergeParts([parts[2], parts[0], parts[3], parts[1]]);
    if (!merged.ok) throw new Error(merged.problems.join('; '));
    expect(JSON.stringify(merged.result)).toBe(JSON.stringify(single.result));
    expect(merged.records).toEqual(single.records);
  });

  test('merging refuses missing, repeated and foreign parts, listing every problem', () => {
    const part = (index: number, fingerprint: string) => ({ name: `p${index}.json`, text: partText(yearMeta(input), input.plant, fingerprint, { index, count: 3 }, []) });
    const merged = mergeParts([part(1, 'a'), part(1, 'a'), part(2, 'b'), { name: 'x.json', text: '{"format":"other"}' }]);
    expect(merged.ok).toBe(false);
    if (merged.ok) return;
    expect(merged.problems).toEqual(['x.json: expected a part file written by "steamwright year --shard", found format "other"']);
    const again = mergeParts([part(1, 'a'), part(1, 'a'), part(2, 'b')]);
    expect(again.ok ? [] : again.problems).toEqual([
      'p1.json: shard 1/3 is also given as p1.json; expected each shard once',
      'p2.json: expected a part of the same case and profile as p1.json, found one of other inputs (fingerprints differ)',
      'expected all 3 shards, missing 3/3',
    ]);
  });
});
