// A unit's `switching`: the cost of one start and the hours it must stay
// running or stopped. One solve has no history and does not use them; a year
// with them is solved as rolling windows (src/year). Checks that need the
// profile (a minimum longer than the year) are made there, at these places.
import { parseMoney } from './money.js';
import type { SwitchingRules } from './plantTypes.js';
import type { CasePath } from './issue.js';
import type { ResolveContext } from './resolveContext.js';
import { locate } from './yamlSource.js';

/** Longest minimum running or stopped time: a leap year of hours. */
const MOST_HOURS = 8784;

/** Hours as a number (6) or a quantity in hours ("6 h", "6 hours"); null when not hours. */
function hoursOf(value: unknown): number | null {
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  if (typeof value !== 'string') return null;
  const match = /^\s*([0-9]+(?:\.[0-9]*)?|\.[0-9]+)\s*(?:h|hr|hrs|hours?)?\s*$/.exec(value);
  return match ? Number(match[1]) : null;
}

export function resolveSwitching(context: ResolveContext, path: CasePath, canSwitchOff: boolean, unitWords: string): SwitchingRules | undefined {
  const raw = context.raw(path);
  if (raw === undefined || raw === null || typeof raw !== 'object' || Array.isArray(raw)) return undefined; // absent, or the schema reports it
  const item = raw as Record<string, unknown>;
  let ok = true;
  if (!canSwitchOff) {
    context.error('switching-fixed-unit', path, `${unitWords} has can_switch_off: false, so it never starts or stops; remove switching or set can_switch_off: true`);
    ok = false;
  }
  let startCost = 0;
  if (typeof item.start_cost !== 'string' && item.start_cost !== undefined) ok = false; // the schema reports it
  if (item.start_cost !== undefined && typeof item.start_cost === 'string') {
    const parsed = parseMoney(item.start_cost, context.currency, false);
    if (!parsed.ok) {
      context.error('bad-money', [...path, 'start_cost'], parsed.message);
      ok = false;
    } else if (parsed.value < 0) {
      context.error('negative', [...path, 'start_cost'], `expected a start cost of zero or more, found "${item.start_cost}"`);
      ok = false;
    } else startCost = parsed.value;
  }
  const hours = (key: 'min_hours_on' | 'min_hours_off'): number => {
    const value = item[key];
    if (value === undefined) return 0;
    if (context.flagged([...path, key])) {
      ok = false;
      return 0;
    }
    const parsed = hoursOf(value);
    if (parsed === null) {
      context.error('bad-hours', [...path, key], `expected hours such as 6 or "6 h", found ${JSON.stringify(value)}`);
      ok = false;
      return 0;
    }
    if (parsed < 0) {
      context.error('negative', [...path, key], `expected zero or more hours, found ${JSON.stringify(value)}`);
      ok = false;
      return 0;
    }
    if (parsed > MOST_HOURS) {
      context.error('out-of-range', [...path, key], `expected at most ${MOST_HOURS} hours (a leap year), found ${JSON.stringify(value)}`);
      ok = false;
      return 0;
    }
    return parsed;
  };
  const minHoursOn = hours('min_hours_on');
  const minHoursOff = hours('min_hours_off');
  if (!ok) return undefined;
  const place = (key?: string): { line: number; column: number } => {
    const at = locate(context.source, key && item[key] !== undefined ? [...path, key] : path);
    return { line: at.line, column: at.column };
  };
  return { startCost, minHoursOn, minHoursOff, at: { switching: place(), min_hours_on: place('min_hours_on'), min_hours_off: place('min_hours_off') } };
}
