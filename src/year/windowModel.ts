// One rolling window of a year as one mixed-integer program. Given the
// switching units' on/off, the periods are independent (every other choice
// has no history), so each period offers a few ways to run: each an on/off of
// the switching units with the period's own converged optimum for it (a full,
// audited solve). The program chooses one way per period (binaries), and links
// the periods by start, stop and minimum running and stopped time rows on the
// units' on/off. The objective is each way's objective times the period's
// hours, plus the start costs when the objective is cost.
import { expr, LinearModel, type LinearExpression, type Variable } from '../lp/index.js';
import type { Objective } from '../model/index.js';
import type { RuledUnit } from './switchingUnits.js';

/** A unit's state where the window begins, and for how many hours it has held it (Infinity: longer than any rule). */
export interface UnitHistory {
  on: 0 | 1;
  hours: number;
}

/** One way to run a period: the switching units' on/off (units order; null out of service) and its converged objective per hour. */
export interface WayToRun {
  onOff: (0 | 1 | null)[];
  objective: number;
}

export interface WindowPeriod {
  hours: number;
  /** the ways to run it; null when the period could not be solved (left out, and no rule holds across it) */
  ways: WayToRun[] | null;
}

export interface WindowModel {
  model: LinearModel;
  /** each period's choice variables, one per way */
  choose: (Variable[] | null)[];
  /** each period's on/off per ruled unit (units order); null where the unit is out of service or the period left out */
  on: (Variable | null)[][];
}

export function windowModel(periods: readonly WindowPeriod[], units: readonly RuledUnit[], history: ReadonlyMap<string, UnitHistory | null>, objective: Objective): WindowModel {
  const model = new LinearModel('window');
  const goal = expr();
  const sense = objective === 'maximumPower' ? 'maximize' : 'minimize';
  const choose: (Variable[] | null)[] = [];
  const on: (Variable | null)[][] = [];
  periods.forEach((period, t) => {
    if (!period.ways || period.ways.length === 0) {
      choose.push(null);
      on.push(units.map(() => null));
      return;
    }
    const ways = period.ways;
    const variables = ways.map((way, k) => {
      const variable = model.addVariable(`t${t}.way${k}`, { type: 'binary' });
      goal.add(variable, way.objective * period.hours);
      return variable;
    });
    const one = expr();
    for (const variable of variables) one.add(variable, 1);
    model.addRow(`t${t}.one_way`, one, '=', 1);
    choose.push(variables);
    on.push(units.map((unit, slot) => {
      if (ways[0].onOff[slot] === null) return null;
      // on = the sum of the ways that run it
      const x = model.addVariable(`t${t}.${unit.id}.on`, { upper: 1 });
      const row = expr().add(x, 1);
      ways.forEach((way, k) => {
        if (way.onOff[slot] === 1) row.add(variables[k], -1);
      });
      model.addRow(`t${t}.${unit.id}.on`, row, '=', 0);
      return x;
    }));
  });

  // Hours from the window's start to each period's start.
  const startsAt: number[] = [];
  periods.reduce((at, period) => (startsAt.push(at), at + period.hours), 0);
  units.forEach((unit, slot) => {
    const { minHoursOn, minHoursOff, startCost } = unit.rules;
    const before = history.get(unit.id) ?? null;
    // The state before period t: a variable, a known constant, or none (no start or stop is defined).
    let previous: Variable | 0 | 1 | null = before ? before.on : null;
    // While nothing has broken the run since the window began, the history's minimum times still hold.
    let historyHolds = before !== null;
    const starts: { t: number; variable: Variable }[] = [];
    const stops: { t: number; variable: Variable }[] = [];
    periods.forEach((period, t) => {
      const x = on[t][slot];
      if (!x) {
        // Out of service (a run after it starts anew) or left out (nothing known): no rule holds across it.
        previous = period.ways && period.ways.length > 0 ? 0 : null;
        historyHolds = false;
        starts.length = 0;
        stops.length = 0;
        return;
      }
      const name = `t${t}.${unit.id}`;
      if (previous !== null) {
        // start >= x - previous; stop >= previous - x
        const start = model.addVariable(`${name}.start`, { upper: 1 });
        model.addRow(`${name}.start`, linkTerm(expr().add(start, 1).add(x, -1), previous, 1), '>=', 0);
        starts.push({ t, variable: start });
        if (startCost > 0 && objective === 'minimumCost') goal.add(start, startCost);
        if (previous !== 0) {
          const stop = model.addVariable(`${name}.stop`, { upper: 1 });
          model.addRow(`${name}.stop`, linkTerm(expr().add(stop, 1).add(x, 1), previous, -1), '>=', 0);
          stops.push({ t, variable: stop });
        }
      }
      // A start within the last min_hours_on keeps it running; a stop within the last min_hours_off keeps it stopped.
      const recentStarts = starts.filter((entry) => startsAt[t] - startsAt[entry.t] < minHoursOn - 1e-9);
      if (recentStarts.length > 0) {
        const row = expr().add(x, -1);
        for (const entry of recentStarts) row.add(entry.variable, 1);
        model.addRow(`${name}.min_on`, row, '<=', 0);
      }
      const recentStops = stops.filter((entry) => startsAt[t] - startsAt[entry.t] < minHoursOff - 1e-9);
      if (recentStops.length > 0) {
        const row = expr().add(x, 1);
        for (const entry of recentStops) row.add(entry.variable, 1);
        model.addRow(`${name}.min_off`, row, '<=', 1);
      }
      if (historyHolds && before) {
        if (before.on === 1 && startsAt[t] + before.hours < minHoursOn - 1e-9) model.addRow(`${name}.held_on`, expr().add(x, 1), '>=', 1);
        if (before.on === 0 && startsAt[t] + before.hours < minHoursOff - 1e-9) model.addRow(`${name}.held_off`, expr().add(x, 1), '<=', 0);
      }
      previous = x;
    });
  });
  model.setObjective(sense, goal);
  return { model, choose, on };
}

/** `row + sign * previous`, the previous state a variable or a constant (moved into the row's constant). */
function linkTerm(row: LinearExpression, previous: Variable | 0 | 1, sign: number): LinearExpression {
  if (typeof previous === 'number') return row.addConstant(sign * previous);
  return row.add(previous, sign);
}
