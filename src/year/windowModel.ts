// One rolling window of a year as one mixed-integer program: every period's
// own linear model (its plant linearised about its converged point, every
// integer free), side by side under a prefix, with the switching units' on/off
// linked across the periods by start, stop and minimum running and stopped
// time rows. The objective is each period's objective times its hours, plus
// the start costs when the objective is cost.
import { expr, LinearModel, type LinearExpression, type Variable } from '../lp/index.js';
import type { Objective } from '../model/index.js';
import type { Pass } from '../plant/index.js';
import type { RuledUnit } from './switchingUnits.js';

/** A unit's state where the window begins, and for how many hours it has held it (Infinity: longer than any rule). */
export interface UnitHistory {
  on: 0 | 1;
  hours: number;
}

export interface WindowPeriod {
  hours: number;
  /** the period's pass, integers free; null when the period could not be solved (left out, and no rule holds across it) */
  pass: Pass | null;
}

export interface WindowModel {
  model: LinearModel;
  /** each period's on/off variable per ruled unit (units order); null where the unit is out of service or the period left out */
  on: (Variable | null)[][];
}

/** The prefix of period t's names in the window model. */
export function periodPrefix(t: number): string {
  return `t${t}:`;
}

/**
 * Builds the window. `history` gives each unit's state before the first
 * period (null: none known, as at the start of the year, so the first
 * period's choice is free and not a start).
 */
export function windowModel(periods: readonly WindowPeriod[], units: readonly RuledUnit[], history: ReadonlyMap<string, UnitHistory | null>, objective: Objective): WindowModel {
  const model = new LinearModel('window');
  const goal = expr();
  let sense: 'minimize' | 'maximize' = objective === 'maximumPower' ? 'maximize' : 'minimize';
  const on: (Variable | null)[][] = [];
  periods.forEach((period, t) => {
    if (!period.pass) {
      on.push(units.map(() => null));
      return;
    }
    const copied = copyInto(model, period.pass.context.model, periodPrefix(t));
    const source = period.pass.context.model.objective;
    if (source) {
      sense = source.sense;
      goal.addExpression(mapped(source.expression, copied), period.hours);
    }
    on.push(units.map((unit) => {
      if (!period.pass!.context.model.hasVariable(unit.onName)) return null;
      const variable = period.pass!.context.model.variable(unit.onName);
      return variable.isInteger ? copied.get(variable)! : null;
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
    // While no period has been left out since the window began, the history's minimum times still hold.
    let historyHolds = before !== null;
    const starts: { t: number; variable: Variable }[] = [];
    const stops: { t: number; variable: Variable }[] = [];
    periods.forEach((_, t) => {
      const x = on[t][slot];
      if (!x) {
        // Out of service or left out: no rule holds across it, and a run after it starts anew.
        previous = periods[t].pass ? 0 : null;
        historyHolds = false;
        starts.length = 0;
        stops.length = 0;
        return;
      }
      const name = `${periodPrefix(t)}${unit.id}`;
      if (previous !== null) {
        // start >= x - previous; stop >= previous - x
        const start = model.addVariable(`${name}.start`, { upper: 1 });
        model.addRow(`${name}.start`, linkTerm(expr().add(start, 1).add(x, -1), previous, 1), '>=', 0);
        starts.push({ t, variable: start });
        if (unit.rules.startCost > 0 && objective === 'minimumCost') goal.add(start, startCost);
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
  return { model, on };
}

/** `row + sign * previous`, the previous state a variable or a constant (moved into the row's constant). */
function linkTerm(row: LinearExpression, previous: Variable | 0 | 1, sign: number): LinearExpression {
  if (typeof previous === 'number') return row.addConstant(sign * previous);
  return row.add(previous, sign);
}

/** Copies every variable and row of `source` into `target` under a prefix; returns the variable map. */
function copyInto(target: LinearModel, source: LinearModel, prefix: string): Map<Variable, Variable> {
  const map = new Map<Variable, Variable>();
  for (const variable of source.variables) map.set(variable, target.addVariable(`${prefix}${variable.name}`, { lower: variable.lower, upper: variable.upper, type: variable.type }));
  for (const row of source.rows) {
    const terms = expr();
    for (const [variable, coefficient] of row.expression.terms) terms.add(map.get(variable)!, coefficient);
    const name = `${prefix}${row.name}`;
    if (row.sense === 'range') target.addRangeRow(name, row.lower, terms, row.upper);
    else if (row.sense === '<=') target.addRow(name, terms, '<=', row.upper);
    else if (row.sense === '>=') target.addRow(name, terms, '>=', row.lower);
    else target.addRow(name, terms, '=', row.lower);
  }
  return map;
}

function mapped(expression: LinearExpression, map: ReadonlyMap<Variable, Variable>): LinearExpression {
  const result = expr().addConstant(expression.constant);
  for (const [variable, coefficient] of expression.terms) result.add(map.get(variable)!, coefficient);
  return result;
}
