// Sweeps: the values a swept quantity takes, and the overlay that sets one
// value at a dotted target path ("power.import.price",
// "users.building_heating.steam": list items are named by id).
import type { CasePath } from './issue.js';
import { describeFound } from './issue.js';

type Raw = Record<string, unknown>;

/** Most steps a sweep may have: each is a full solve. */
export const MOST_SWEEP_STEPS = 1000;

const NUMBER_THEN_UNIT = /^\s*([-+]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][-+]?[0-9]+)?)\s*(.*?)\s*$/;

/** Evenly spaced values from `from` to `to` in `steps` points, written in from's unit. */
export function sweepValues(item: Raw, path: CasePath, report: (code: string, at: CasePath, message: string) => void): string[] | null {
  const { from, to, steps } = item;
  if (typeof from !== 'string' || typeof to !== 'string' || typeof steps !== 'number') return null; // the schema reports it
  const start = NUMBER_THEN_UNIT.exec(from);
  const end = NUMBER_THEN_UNIT.exec(to);
  if (!start) {
    report('bad-quantity', [...path, 'from'], `expected a number and its unit such as "40 $/MWh", found "${from}"`);
    return null;
  }
  if (!end) {
    report('bad-quantity', [...path, 'to'], `expected a number and its unit such as "120 $/MWh", found "${to}"`);
    return null;
  }
  if (start[2] !== end[2]) {
    report('sweep-units', [...path, 'to'], `expected the same unit as from ("${start[2]}"), found "${end[2]}"`);
    return null;
  }
  if (!Number.isInteger(steps) || steps < 2 || steps > MOST_SWEEP_STEPS) {
    report('sweep-steps', [...path, 'steps'], `expected a whole number of steps from 2 to ${MOST_SWEEP_STEPS}, found ${steps}`);
    return null;
  }
  const first = Number(start[1]);
  const last = Number(end[1]);
  const unit = start[2] === '' ? '' : ` ${start[2]}`;
  return Array.from({ length: steps }, (_, index) => {
    const value = index === steps - 1 ? last : first + ((last - first) * index) / (steps - 1);
    return `${Number(value.toPrecision(12))}${unit}`;
  });
}

/** The overlay that writes `value` at the target; null (and a report) when the target is not in the case. */
export function sweepChanges(data: Raw, target: string, value: string, report: (code: string, message: string) => void): Raw | null {
  const segments = target.split('.');
  const build = (current: unknown, index: number): unknown => {
    const segment = segments[index];
    const last = index === segments.length - 1;
    if (Array.isArray(current)) {
      const item = current.find((entry) => entry !== null && typeof entry === 'object' && (entry as Raw).id === segment);
      if (!item) {
        const known = current.map((entry) => String((entry as Raw)?.id)).join(', ');
        report('unknown-sweep-target', `no item with id "${segment}" at ${segments.slice(0, index).join('.')}; known: ${known}`);
        return undefined;
      }
      if (last) {
        report('unknown-sweep-target', `the target ${target} names a whole item; expected a value inside it, such as ${target}.steam`);
        return undefined;
      }
      const inner = build(item, index + 1);
      return inner === undefined ? undefined : [{ id: segment, ...(inner as Raw) }];
    }
    if (current === null || typeof current !== 'object') {
      report('unknown-sweep-target', `expected a map or a list at ${segments.slice(0, index).join('.') || 'the top'}, found ${describeFound(current)}`);
      return undefined;
    }
    const map = current as Raw;
    if (last) {
      if (typeof map[segment] !== 'string') {
        report('unknown-sweep-target', `expected a quantity at ${target}, found ${describeFound(map[segment])}; a sweep varies a value the case already has`);
        return undefined;
      }
      return { [segment]: value };
    }
    if (!(segment in map)) {
      report('unknown-sweep-target', `no key "${segment}" at ${segments.slice(0, index).join('.') || 'the top of the case'}`);
      return undefined;
    }
    const inner = build(map[segment], index + 1);
    return inner === undefined ? undefined : { [segment]: inner };
  };
  const changes = build(data, 0);
  return changes === undefined ? null : (changes as Raw);
}
