// A year whose peaking boiler has a start cost and minimum running and stopped
// hours is solved as rolling windows. Checked three ways: the minimum times
// hold in the kept periods (read from the per-period results, not from the
// program's rows); the rolling windows reach the same cost as one program
// over all the periods, and as an independent dynamic program over the
// peaker's two states built from separate solves of each period with the
// peaker held running and left out; start costs are in the totals to the cent.
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, test, vi } from 'vitest';
import { createFakeBackend, highsBackend } from '../../src/lp/index.js';
import type { Plant } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { displayFormat, yearCsv, yearText } from '../../src/report/index.js';
import { COMPONENTS, periodPlant, runYear, switchingIssues, YearModeError, type PeriodRecord, type Profile, type YearInput, type YearResult } from '../../src/year/index.js';
import { loadPlant, profileOf } from './helpers.js';

type Solved = Extract<PeriodRecord, { ok: true }>;

const plantText = readFileSync(new URL('./fixtures/peaker-plant.yaml', import.meta.url), 'utf8');
// Process steam high (18 t/h, more than the base boiler's 15 t/h) or low
// (9 t/h): dips of 1, 2, 3, 8 and 10 hours, and a 2-hour peak between them.
const SHAPE = 'HHHLHHLLHHHLLLHHHLLLLLLLLHHLLLLLLLLLLH';
const START_COST = 100;
const MIN_ON = 4;
const MIN_OFF = 3;

function profileText(shape: string, out: ReadonlySet<number> = new Set()): string {
  const lines = ['timestamp,process.steam [t/h],peaker.available'];
  [...shape].forEach((level, at) => {
    const day = 1 + Math.floor(at / 24);
    lines.push(`2026-03-0${day}T${String(at % 24).padStart(2, '0')}:00,${level === 'H' ? 18 : 9},${out.has(at) ? 0 : 1}`);
  });
  return `${lines.join('\n')}\n`;
}

let plant: Plant;
let profile: Profile;
let rolling: { result: YearResult; records: PeriodRecord[] };
let whole: { result: YearResult; records: PeriodRecord[] };

async function run(input: YearInput): Promise<{ result: YearResult; records: PeriodRecord[] }> {
  const outcome = await runYear(input, { workers: 1, keepRecords: true });
  return { result: outcome.result!, records: outcome.records! };
}

beforeAll(async () => {
  plant = loadPlant(plantText);
  profile = profileOf(plant, profileText(SHAPE));
  // Windows of 18 periods, 12 kept, 6 looking ahead; and one window over all 38.
  rolling = await run({ plant, profile, profileFile: 'profile.csv', window: { kept: 12, overlap: 6 } });
  whole = await run({ plant, profile, profileFile: 'profile.csv', window: { kept: SHAPE.length, overlap: 0 } });
});

/** The peaker's running state per period, read from the results. */
function peakerStates(result: YearResult, records: readonly PeriodRecord[]): { running: 0 | 1; out: boolean; hours: number }[] {
  const slot = result.units.findIndex((unit) => unit.id === 'peaker');
  return records.map((record) => {
    expect(record.ok, record.label).toBe(true);
    const state = (record as Solved).units[slot];
    return { running: state.running, out: state.out, hours: record.hours };
  });
}

/**
 * Every run the plant chose to begin (a start, or a stop) lasts at least its
 * minimum, unless the profile ends or an outage cuts it first.
 */
function minimumTimesHold(states: readonly { running: 0 | 1; out: boolean; hours: number }[]): string[] {
  const broken: string[] = [];
  for (let at = 1; at < states.length; at += 1) {
    const before = states[at - 1];
    const now = states[at];
    if (now.out || before.out || now.running === before.running) continue;
    const minimum = now.running === 1 ? MIN_ON : MIN_OFF;
    let hours = 0;
    let end = at;
    while (end < states.length && !states[end].out && states[end].running === now.running) hours += states[end++].hours;
    const cutShort = end === states.length || states[end].out;
    if (hours < minimum && !cutShort) broken.push(`${now.running ? 'run' : 'stop'} from period ${at} lasts ${hours} h < ${minimum} h`);
  }
  return broken;
}

/**
 * The independent optimum: each period solved twice on its own (peaker held
 * running, peaker left out), then a dynamic program over (state, hours in it).
 */
async function dynamicProgramCost(shape: string, out: ReadonlySet<number>): Promise<number> {
  const own = profileOf(plant, profileText(shape, out));
  const width = own.columns.length;
  const costs: { on: number | null; off: number }[] = [];
  for (let at = 0; at < shape.length; at += 1) {
    const period = periodPlant(plant, own.columns, own.values.subarray(at * width, (at + 1) * width));
    const cost = async (variant: Plant): Promise<number | null> => {
      const outcome = await solvePlant(variant, { probeMarginalValues: false });
      return outcome.ok ? plantResult(outcome).totals.cost_per_h * own.hours[at] : null;
    };
    const hasPeaker = period.boilers.some((boiler) => boiler.id === 'peaker');
    const on = hasPeaker ? await cost({ ...period, boilers: period.boilers.map((boiler) => (boiler.id === 'peaker' ? { ...boiler, canSwitchOff: false } : boiler)) }) : null;
    const off = await cost({ ...period, boilers: period.boilers.filter((boiler) => boiler.id !== 'peaker') });
    costs.push({ on, off: off ?? Infinity });
  }
  // state key: running (0/1), hours held (capped at 24), or 'out' of service; hours Infinity at the start.
  type State = { running: 0 | 1; held: number };
  let frontier = new Map<string, { state: State; cost: number }>();
  const put = (map: Map<string, { state: State; cost: number }>, state: State, cost: number): void => {
    const key = `${state.running}:${Math.min(state.held, 24)}`;
    const known = map.get(key);
    if (!known || cost < known.cost) map.set(key, { state: { running: state.running, held: Math.min(state.held, 24) }, cost });
  };
  for (let at = 0; at < shape.length; at += 1) {
    const next = new Map<string, { state: State; cost: number }>();
    const { on, off } = costs[at];
    if (at === 0) {
      if (on !== null) put(next, { running: 1, held: 24 }, on);
      put(next, { running: 0, held: 24 }, off);
    } else if (out.has(at)) {
      // Out of service: stopped, and no minimum time holds across it.
      for (const { cost } of frontier.values()) put(next, { running: 0, held: 24 }, cost + off);
    } else {
      for (const { state, cost } of frontier.values()) {
        const afterOutage = out.has(at - 1);
        // stay
        if (state.running === 1 && on !== null) put(next, { running: 1, held: state.held + 1 }, cost + on);
        if (state.running === 0) put(next, { running: 0, held: state.held + 1 }, cost + off);
        // switch, where the minimum time allows
        if (state.running === 0 && on !== null && (afterOutage || state.held >= MIN_OFF)) put(next, { running: 1, held: 1 }, cost + on + START_COST);
        if (state.running === 1 && state.held >= MIN_ON) put(next, { running: 0, held: 1 }, cost + off);
      }
    }
    frontier = next;
  }
  return Math.min(...[...frontier.values()].map((entry) => entry.cost));
}

describe('rolling windows', () => {
  test('the result says which mode was used and why', () => {
    expect(rolling.result.mode).toBe('rolling windows');
    expect(rolling.result.switching_units).toEqual(['peaker']);
    expect(rolling.result.window).toEqual({ kept: 12, overlap: 6 });
    expect(rolling.result.mode_note).toContain('peaker declares start costs or minimum running or stopped hours');
    expect(rolling.result.failed).toEqual([]);
  });

  test('minimum running and stopped times hold in the per-period results', () => {
    const states = peakerStates(rolling.result, rolling.records);
    expect(minimumTimesHold(states)).toEqual([]);
    // The check can fail: the plant left to itself (no rules) breaks them on this profile.
    const free = loadPlant(plantText.replace(/    switching:\n(?: {6}.*\n)+/, ''));
    expect(free.boilers[1].switching).toBeUndefined();
    return run({ plant: free, profile: profileOf(free, profileText(SHAPE)), profileFile: 'profile.csv' }).then((unruled) => {
      expect(unruled.result.mode).toBe('independent periods');
      expect(minimumTimesHold(peakerStates(unruled.result, unruled.records)).length).toBeGreaterThan(0);
    });
  });

  test('rolling windows cost the same as one program over all the periods, and as the dynamic program', async () => {
    expect(whole.result.window).toEqual({ kept: SHAPE.length, overlap: 0 });
    const tolerance = 1e-6 * whole.result.annual.cost;
    // A rolling window sees less ahead, so it can only do as well or worse than the whole horizon.
    expect(rolling.result.annual.cost).toBeGreaterThanOrEqual(whole.result.annual.cost - tolerance);
    // Here a 6-period look-ahead is enough: the same cost.
    expect(Math.abs(rolling.result.annual.cost - whole.result.annual.cost)).toBeLessThan(tolerance);
    const independent = await dynamicProgramCost(SHAPE, new Set());
    expect(Math.abs(whole.result.annual.cost - independent)).toBeLessThan(tolerance);
    // The rules bite: the peaker runs through the dips of 1, 2 and 3 hours (a start
    // costs more than the fuel saved) and stops in the 8-hour one and the last.
    const running = peakerStates(rolling.result, rolling.records).map((state) => state.running);
    expect(running.slice(0, 17).every((state) => state === 1)).toBe(true);
    expect(running.slice(17, 25)).toContain(0);
    expect(running.slice(27, 37)).toContain(0);
    expect(running[37]).toBe(1);
    expect(rolling.result.units.find((unit) => unit.id === 'peaker')!.starts).toBe(2);
  });

  test('start costs appear in the annual totals to the cent', () => {
    const { result, records } = rolling;
    const solved = records as Solved[];
    const peaker = result.units.find((unit) => unit.id === 'peaker')!;
    expect(peaker.starts).toBeGreaterThan(0);
    // Three sums of the same money: per period, per unit, and starts times the case's cost.
    const perPeriod = solved.reduce((total, record) => total + (record.start_up_cost ?? 0), 0);
    expect(Math.abs(perPeriod - result.annual.start_up_cost)).toBeLessThan(0.005);
    expect(Math.abs(peaker.start_up_cost - result.annual.start_up_cost)).toBeLessThan(0.005);
    expect(Math.abs(peaker.starts * START_COST - result.annual.start_up_cost)).toBeLessThan(0.005);
    // The annual cost is the hours' costs plus the starts; the components plus the starts make it up.
    const hourly = solved.reduce((total, record) => total + record.cost_per_h * record.hours, 0);
    expect(Math.abs(hourly + perPeriod - result.annual.cost)).toBeLessThan(0.005);
    const components = COMPONENTS.reduce((total, component) => total + result.annual.cost_by_component[component], 0);
    expect(Math.abs(components + result.annual.start_up_cost - result.annual.cost)).toBeLessThan(0.005);
    // The CSV's start-up column sums to the same.
    const csv = yearCsv(result, records, displayFormat('si', 'EUR', 0.1013)).trim().split('\n').map((line) => line.split(','));
    const column = csv[0].indexOf('start-up cost [EUR]');
    expect(column).toBeGreaterThan(0);
    expect(Math.abs(csv.slice(1).reduce((total, row) => total + Number(row[column]), 0) - result.annual.start_up_cost)).toBeLessThan(0.005);
  });

  test('an outage breaks the minimum times; the rolling result still matches the dynamic program', async () => {
    // The peaker out of service for two hours of the 8-hour dip: a run after them starts anew.
    const out = new Set([20, 21]);
    const withOutage = await run({ plant, profile: profileOf(plant, profileText(SHAPE, out)), profileFile: 'profile.csv', window: { kept: 12, overlap: 6 } });
    const states = peakerStates(withOutage.result, withOutage.records);
    expect(states[20].out && states[21].out).toBe(true);
    expect(minimumTimesHold(states)).toEqual([]);
    const independent = await dynamicProgramCost(SHAPE, out);
    expect(Math.abs(withOutage.result.annual.cost - independent)).toBeLessThan(1e-6 * independent);
  });

  test('a window whose program finds no schedule is named in the result, and its periods keep their own optimum', async () => {
    expect(rolling.result.unscheduled_windows).toEqual([]);
    // The window programs answer "infeasible" (as when a rule cannot be kept); every period's own solve is real.
    const solve = highsBackend.solve.bind(highsBackend);
    const refuse = createFakeBackend({ status: 'infeasible' });
    const spy = vi.spyOn(highsBackend, 'solve').mockImplementation((model, options) => (model.name === 'window' ? refuse.solve(model, options) : solve(model, options)));
    let refused: { result: YearResult; records: PeriodRecord[] };
    try {
      refused = await run({ plant, profile, profileFile: 'profile.csv', window: { kept: 12, overlap: 6 } });
    } finally {
      spy.mockRestore();
    }
    expect(refuse.calls.length).toBe(Math.ceil(SHAPE.length / 12));
    expect(refused.result.unscheduled_windows).toEqual([
      { from: profile.labels[0], to: profile.labels[11], periods: 12, status: 'infeasible' },
      { from: profile.labels[12], to: profile.labels[23], periods: 12, status: 'infeasible' },
      { from: profile.labels[24], to: profile.labels[35], periods: 12, status: 'infeasible' },
      { from: profile.labels[36], to: profile.labels[37], periods: 2, status: 'infeasible' },
    ]);
    // Each period is then its own optimum: what the plant left to itself does, rules broken and all.
    const free = loadPlant(plantText.replace(/    switching:\n(?: {6}.*\n)+/, ''));
    const unruled = await run({ plant: free, profile: profileOf(free, profileText(SHAPE)), profileFile: 'profile.csv' });
    expect(peakerStates(refused.result, refused.records).map((state) => state.running)).toEqual(peakerStates(unruled.result, unruled.records).map((state) => state.running));
    expect(yearText(refused.result, displayFormat('si', 'EUR', 0.1013))).toContain(`Warning: the rolling window's program found no schedule (infeasible) for ${profile.labels[0]} to ${profile.labels[11]} (12 periods)`);
  });

  test('a year solved as rolling windows cannot be sharded', async () => {
    await expect(runYear({ plant, profile, profileFile: 'profile.csv' }, { workers: 1, shard: { index: 1, count: 2 } })).rejects.toThrow(YearModeError);
  });

  test('a minimum time longer than the profile is refused at its place in the case', () => {
    const long = loadPlant(plantText.replace('min_hours_off: 3', 'min_hours_off: 40 h'));
    expect(switchingIssues(long, profileOf(long, profileText(SHAPE)), 'peaker.yaml')).toMatchInlineSnapshot(`
      [
        {
          "column": 22,
          "file": "peaker.yaml",
          "line": 56,
          "message": "boiler peaker switching.min_hours_off: expected at most the profile's 38 h, found 40 h: a stop that long could never end within the year",
        },
      ]
    `);
    expect(switchingIssues(plant, profile, 'peaker.yaml')).toEqual([]);
  });
});
