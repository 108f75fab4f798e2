// Reading a profile CSV against the plant: every cell checked, every problem
// located as file:row:column with what was expected and what was found, all
// of them at once. The values are kept compactly, one row of numbers per
// period, already in internal units.
import { parse } from 'csv-parse/sync';
import { MOST_PROFILE_HOURS, PHYSICAL_RANGES, type Plant, type ProfileReference } from '../model/index.js';
import { PERIOD_COLUMNS, readColumn, type ProfileColumn } from './profileColumns.js';

export interface ProfileIssue {
  /** the file as the user named it */
  file: string;
  /** 1-based line in the file (0 for the file as a whole) */
  line: number;
  /** 1-based column (0 for the whole row) */
  column: number;
  message: string;
}

export interface Profile {
  columns: ProfileColumn[];
  /** hourly rows with timestamps, or periods with their hours */
  kind: 'hourly' | 'periods';
  /** a label per period: its timestamp or its name */
  labels: string[];
  /** hours each period stands for */
  hours: Float64Array;
  /** month 1 to 12, 0 when unknown */
  months: Uint8Array;
  /** internal values, periods x columns, row by row */
  values: Float64Array;
  /** 1-based line of each period in the file */
  lines: Uint32Array;
}

export type ProfileRead = { ok: true; profile: Profile } | { ok: false; issues: ProfileIssue[] };

const TIMESTAMP = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2}))?$/;
const HOUR_MS = 3_600_000;

/** A cell as a number: plain decimal notation only ("12.5", "-3", "1e3"). */
function numberOf(cell: string): number | null {
  const text = cell.trim();
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(text)) return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}

function found(cell: string): string {
  return cell.trim() === '' ? 'an empty cell' : JSON.stringify(cell.length > 40 ? `${cell.slice(0, 37)}...` : cell);
}

/** The hour a timestamp names, in ms since 1970 (UTC arithmetic on local standard time), or null. */
function hourOf(cell: string): { ms: number; month: number } | null {
  const match = TIMESTAMP.exec(cell.trim());
  if (!match) return null;
  const [year, month, day, hour, minute, second] = match.slice(1).map((part) => (part === undefined ? 0 : Number(part)));
  if (minute !== 0 || second !== 0 || hour > 23) return null;
  const ms = Date.UTC(year, month - 1, day, hour);
  const date = new Date(ms);
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day) return null;
  return { ms, month };
}

function stamp(ms: number): string {
  return new Date(ms).toISOString().slice(0, 16);
}

/** Checks a value cell's internal value against what its column may hold; a message, or null. */
function valueProblem(column: ProfileColumn, value: number): string | null {
  if (column.quantity === null) return value === 0 || value === 1 ? null : 'expected 1 (in service) or 0 (out of service)';
  const limits = PHYSICAL_RANGES[column.quantity];
  if (value < limits.min || value > limits.max) return `expected a value ${limits.words}`;
  const kind = column.target.kind;
  if ((kind === 'userSteam' || kind === 'userHeat' || kind === 'recoverySteam' || kind === 'siteDemand') && value < 0) return 'expected zero or more';
  if (kind === 'makeupTemperature' && (value <= 273.15 || value >= 373.15)) return 'expected a makeup water temperature above 0 degC and below 100 degC';
  return null;
}

/**
 * Reads the profile text against the plant. `file` labels issues;
 * `caseFile` and `reference` locate the check of the declared hours.
 */
export function readProfile(plant: Plant, text: string, file: string, reference: ProfileReference, caseFile: string): ProfileRead {
  const issues: ProfileIssue[] = [];
  const at = (line: number, column: number, message: string): void => {
    issues.push({ file, line, column, message });
  };
  let rows: { record: string[]; info: { lines: number } }[];
  try {
    rows = parse(text, { info: true, relax_column_count: true, skip_empty_lines: true, bom: true }) as unknown as { record: string[]; info: { lines: number } }[];
  } catch (error) {
    const lines = (error as { lines?: number }).lines ?? 0;
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, issues: [{ file, line: lines, column: 0, message: `expected CSV (comma-separated, quotes closed), found a malformed file: ${detail}` }] };
  }
  if (rows.length === 0) return { ok: false, issues: [{ file, line: 0, column: 0, message: 'the profile is empty; expected a header row naming the columns, then one row per period' }] };

  const header = rows[0].record;
  const columns: ProfileColumn[] = [];
  const special = new Map<string, number>();
  const seenKeys = new Map<string, number>();
  header.forEach((rawName, position) => {
    const name = rawName.trim();
    if ((PERIOD_COLUMNS as readonly string[]).includes(name)) {
      if (special.has(name)) at(1, position + 1, `column "${name}" appears twice (also column ${special.get(name)! + 1}); expected it once`);
      else special.set(name, position);
      return;
    }
    const read = readColumn(plant, name, position);
    if (!read.ok) {
      at(1, position + 1, read.message);
      return;
    }
    const earlier = seenKeys.get(read.column.key);
    if (earlier !== undefined) {
      at(1, position + 1, `"${read.column.key}" is already set by column ${earlier + 1}; expected each case value in one column`);
      return;
    }
    seenKeys.set(read.column.key, position);
    columns.push(read.column);
  });
  const hourly = special.has('timestamp');
  if (hourly && (special.has('period') || special.has('hours'))) at(1, special.get('timestamp')! + 1, 'expected either a "timestamp" column (hourly rows) or "period" and "hours" columns, found both');
  if (!hourly && !(special.has('period') && special.has('hours'))) at(1, 1, `expected a "timestamp" column (hourly rows) or "period" and "hours" columns, found ${special.has('period') ? 'no "hours" column' : special.has('hours') ? 'no "period" column' : 'neither'}`);
  const periodCount = rows.length - 1;
  if (periodCount === 0) at(1, 0, 'expected at least one period row after the header row, found none');
  if (periodCount > MOST_PROFILE_HOURS) at(rows[MOST_PROFILE_HOURS + 1].info.lines, 0, `expected at most ${MOST_PROFILE_HOURS} period rows (a leap year of hours), found ${periodCount}`);
  if (issues.length > 0) return { ok: false, issues };

  const width = columns.length;
  const profile: Profile = {
    columns,
    kind: hourly ? 'hourly' : 'periods',
    labels: new Array<string>(periodCount),
    hours: new Float64Array(periodCount),
    months: new Uint8Array(periodCount),
    values: new Float64Array(periodCount * width),
    lines: new Uint32Array(periodCount),
  };
  let previousHour: { ms: number; line: number } | null = null;
  let totalHours = 0;
  for (let index = 0; index < periodCount; index += 1) {
    const { record, info } = rows[index + 1];
    const line = info.lines;
    profile.lines[index] = line;
    if (record.length !== header.length) {
      at(line, 0, `expected ${header.length} cells as in the header row, found ${record.length}`);
      // Its hour still counts for the row below, so one short row is one problem, not two.
      const hour = hourly ? hourOf(record[special.get('timestamp')!] ?? '') : null;
      previousHour = hour ? { ms: hour.ms, line } : null;
      continue;
    }
    if (hourly) {
      const position = special.get('timestamp')!;
      const cell = record[position];
      const hour = hourOf(cell);
      if (!hour) {
        at(line, position + 1, `timestamp: expected an hour such as "2026-01-01T00:00" (YYYY-MM-DDTHH:00, local standard time), found ${found(cell)}`);
        previousHour = null;
      } else {
        if (previousHour) {
          const expected = previousHour.ms + HOUR_MS;
          if (hour.ms === previousHour.ms) at(line, position + 1, `timestamp: expected ${stamp(expected)}, one hour after line ${previousHour.line}, found the same hour again (a duplicate)`);
          else if (hour.ms < expected) at(line, position + 1, `timestamp: expected ${stamp(expected)}, one hour after line ${previousHour.line}, found ${stamp(hour.ms)}, earlier (rows must run forward in time)`);
          else if (hour.ms > expected) at(line, position + 1, `timestamp: expected ${stamp(expected)}, one hour after line ${previousHour.line}, found ${stamp(hour.ms)} (a gap of ${(hour.ms - expected) / HOUR_MS} h)`);
        }
        previousHour = { ms: hour.ms, line };
        profile.labels[index] = stamp(hour.ms);
        profile.months[index] = hour.month;
      }
      profile.hours[index] = 1;
      totalHours += 1;
    } else {
      const labelCell = record[special.get('period')!].trim();
      if (labelCell === '') at(line, special.get('period')! + 1, 'period: expected a label for the period, found an empty cell');
      profile.labels[index] = labelCell;
      const hoursPosition = special.get('hours')!;
      const hours = numberOf(record[hoursPosition]);
      if (hours === null || hours <= 0 || hours > MOST_PROFILE_HOURS) at(line, hoursPosition + 1, `hours: expected the hours this period stands for, more than 0 and at most ${MOST_PROFILE_HOURS}, found ${found(record[hoursPosition])}`);
      else {
        profile.hours[index] = hours;
        totalHours += hours;
      }
      if (special.has('month')) {
        const monthPosition = special.get('month')!;
        const month = numberOf(record[monthPosition]);
        if (month === null || !Number.isInteger(month) || month < 1 || month > 12) at(line, monthPosition + 1, `month: expected a month number from 1 to 12, found ${found(record[monthPosition])}`);
        else profile.months[index] = month;
      }
    }
    for (const [slot, column] of columns.entries()) {
      const cell = record[column.position];
      const number = numberOf(cell);
      const unitWords = column.unit === '' ? '' : ` in ${column.unit}`;
      if (number === null) {
        at(line, column.position + 1, `${column.key}: expected a number${unitWords}, found ${found(cell)}`);
        continue;
      }
      const value = column.offset + column.slope * number;
      const problem = valueProblem(column, value);
      if (problem) {
        at(line, column.position + 1, `${column.key}: ${problem}, found ${found(cell)}${unitWords}`);
        continue;
      }
      profile.values[index * width + slot] = value;
    }
  }
  if (!hourly && totalHours > MOST_PROFILE_HOURS + 1e-9) at(0, 0, `expected the periods' hours to add up to at most ${MOST_PROFILE_HOURS} h (a leap year), found ${totalHours} h`);
  if (reference.hours !== null && issues.length === 0 && Math.abs(totalHours - reference.hours) > 1e-9) {
    issues.push({
      file: caseFile,
      line: reference.hoursLine,
      column: reference.hoursColumn,
      message: `profile.hours: expected the profile's ${periodCount} rows to cover ${reference.hours} h, found ${totalHours} h in ${file}`,
    });
  }
  return issues.length > 0 ? { ok: false, issues } : { ok: true, profile };
}

/** `file:line:column  message` (line and column left out where they are 0). */
export function formatProfileIssue(issue: ProfileIssue): string {
  const where = issue.line > 0 ? (issue.column > 0 ? `${issue.file}:${issue.line}:${issue.column}` : `${issue.file}:${issue.line}`) : issue.file;
  return `${where}  ${issue.message}`;
}
