// Meter readings from a CSV file: one snapshot (one row per tag) or a time
// series (a `time` column, several rows per tag) averaged over a window.
//
// Columns, by header name: tag, value, unit, and optionally time. Every row
// that does not parse, names an unknown tag, has no unit, a unit that is not
// the meter's quantity (a mass flow, a temperature, a power), or a negative
// flow, power or fuel is reported with its line, all at once.
import { parse } from 'csv-parse/sync';
import { parseQuantity, type ParseOptions } from '../units/index.js';

export interface ReadingIssue {
  line: number;
  message: string;
}

export interface AveragedReading {
  tag: string;
  /** mean of the readings in the window, kg/s (a thermometer's in K, a power or fuel meter's in kW) */
  value: number;
  /** readings averaged */
  count: number;
  /** for a series: mean of the second half less mean of the first half, in the reading's unit (kg/s, K or kW) */
  drift: number | null;
  /** first line of the tag in the file */
  line: number;
}

export interface ReadingsWindow {
  /** readings at or after this time (ms since 1970), or null */
  from: number | null;
  /** readings at or before this time, or null */
  to: number | null;
}

export type ReadingsResult = { ok: true; readings: Map<string, AveragedReading>; series: boolean; rows: number } | { ok: false; issues: ReadingIssue[] };

/** What a tag that is not a flow meter reads. */
export type ReadingKind = 'temperature' | 'power' | 'fuel' | 'pressure';

/**
 * `kinds`: the known tags that are not flow meters: thermometers, read as
 * temperatures (K inside); power and fuel meters, read as powers (kW
 * inside); pressure gauges, read as pressures (MPa abs inside, a gauge unit
 * from `options`' atmosphere). Every other tag is a flow meter (kg/s inside).
 */
export function parseReadings(text: string, knownTags: ReadonlySet<string>, window: ReadingsWindow = { from: null, to: null }, kinds: ReadonlyMap<string, ReadingKind> = new Map(), options: ParseOptions = {}): ReadingsResult {
  const issues: ReadingIssue[] = [];
  let records: { record: string[]; info: { lines: number } }[];
  const skipped = (error: { message?: string; lines?: number } | undefined): undefined => {
    issues.push({ line: error?.lines ?? 1, message: `the row does not parse as CSV (${(error?.message ?? 'unknown error').replace(/\s+/g, ' ')})` });
    return undefined;
  };
  try {
    records = parse(text, { info: true, relax_column_count: true, skip_empty_lines: true, trim: true, comment: '#', bom: true, skip_records_with_error: true, on_skip: skipped }) as unknown as { record: string[]; info: { lines: number } }[];
  } catch (error) {
    // An error the parser cannot skip past (an unclosed quote runs to the end of the file).
    const lines = (error as { lines?: number }).lines;
    const message = error instanceof Error ? error.message : String(error);
    return { ok: false, issues: [...issues, { line: lines ?? 1, message: `the file does not parse as CSV (${message.replace(/\s+/g, ' ')})` }] };
  }
  if (records.length === 0) return { ok: false, issues: [{ line: 1, message: 'the file has no header row; expected the columns tag, value, unit (and time for a series)' }] };
  const header = records[0].record.map((name) => name.toLowerCase());
  const column = (name: string): number => header.indexOf(name);
  const [tagAt, valueAt, unitAt, timeAt] = ['tag', 'value', 'unit', 'time'].map(column);
  const missing = ['tag', 'value', 'unit'].filter((name) => column(name) < 0);
  if (missing.length > 0) return { ok: false, issues: [{ line: records[0].info.lines, message: `the header row has no ${missing.join(', ')} column; expected tag, value, unit (and time for a series), found "${records[0].record.join(',')}"` }] };

  const rows = new Map<string, { time: number; value: number; line: number }[]>();
  let count = 0;
  for (const { record, info } of records.slice(1)) {
    const line = info.lines;
    if (record.length !== header.length) {
      issues.push({ line, message: `expected ${header.length} fields (${header.join(', ')}), found ${record.length}` });
      continue;
    }
    const tag = record[tagAt];
    const valueText = record[valueAt];
    const unit = record[unitAt];
    if (!knownTags.has(tag)) {
      issues.push({ line, message: tag === '' ? 'the row has no tag' : `tag "${tag}" is not a meter of the case` });
      continue;
    }
    let time = 0;
    if (timeAt >= 0) {
      time = Date.parse(record[timeAt]);
      if (Number.isNaN(time)) {
        issues.push({ line, message: `time: expected a date and time such as "2026-11-02T08:00", found "${record[timeAt]}"` });
        continue;
      }
      if ((window.from !== null && time < window.from) || (window.to !== null && time > window.to)) continue;
    }
    const kind = kinds.get(tag);
    const thermometer = kind === 'temperature';
    const fuelMeter = kind === 'fuel';
    const wattmeter = kind === 'power' || fuelMeter;
    const gauge = kind === 'pressure';
    if (unit === '') {
      issues.push({ line, message: `reading of ${tag} has no unit; expected ${thermometer ? 'a temperature unit such as degC, degF or K' : fuelMeter ? 'an energy per hour such as MW, GJ/h or MMBtu/h' : wattmeter ? 'a power unit such as kW or MW' : gauge ? 'a pressure unit such as barg, bara or psig' : 'a mass flow unit such as t/h, kg/s or klb/h'}, found "${valueText}"` });
      continue;
    }
    if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(valueText)) {
      issues.push({ line, message: `value of ${tag}: expected a number, found "${valueText}"` });
      continue;
    }
    const parsed = parseQuantity(`${valueText} ${unit}`, thermometer ? 'temperature' : wattmeter ? 'power' : gauge ? 'pressure' : 'massFlow', options);
    if (!parsed.ok) {
      issues.push({ line, message: `unit of ${tag}: ${parsed.message}` });
      continue;
    }
    if (thermometer && !(parsed.value > 273.15 && parsed.value < 1073.15)) {
      issues.push({ line, message: `reading of ${tag} is ${valueText} ${unit}; expected a water or steam temperature above 0 degC and below 800 degC (the IF97 range the balances use)` });
      continue;
    }
    if (wattmeter && parsed.value < 0) {
      issues.push({ line, message: fuelMeter ? `reading of ${tag} is a negative fuel rate, "${valueText} ${unit}"; a fuel meter reads zero or more` : `reading of ${tag} is a negative power, "${valueText} ${unit}"; a turbine's power meter reads zero or more (a motoring generator is not modelled)` });
      continue;
    }
    if (gauge && !(parsed.value > 0)) {
      issues.push({ line, message: `reading of ${tag} is ${valueText} ${unit}, not above vacuum; expected a header's pressure` });
      continue;
    }
    if (!thermometer && !wattmeter && !gauge && parsed.value < 0) {
      issues.push({ line, message: `reading of ${tag} is a negative flow, "${valueText} ${unit}"; a flow meter reads zero or more (check the sign or the meter's direction)` });
      continue;
    }
    const list = rows.get(tag) ?? [];
    list.push({ time, value: parsed.value, line });
    rows.set(tag, list);
    count++;
  }
  const series = timeAt >= 0;
  if (!series) {
    for (const [tag, list] of rows) {
      if (list.length > 1) issues.push({ line: list[1].line, message: `tag ${tag} is read twice (first on line ${list[0].line}); a snapshot has one row per tag, a series needs a time column` });
    }
  }
  if (issues.length > 0) return { ok: false, issues: issues.sort((a, b) => a.line - b.line) };

  const readings = new Map<string, AveragedReading>();
  for (const [tag, list] of rows) {
    list.sort((a, b) => a.time - b.time);
    const mean = (part: { value: number }[]): number => part.reduce((sum, row) => sum + row.value, 0) / part.length;
    const half = Math.floor(list.length / 2);
    const drift = series && list.length >= 4 ? mean(list.slice(list.length - half)) - mean(list.slice(0, half)) : null;
    readings.set(tag, { tag, value: mean(list), count: list.length, drift, line: Math.min(...list.map((row) => row.line)) });
  }
  return { ok: true, readings, series, rows: count };
}
