// Access to the IAPWS verification values copied into tests/fixtures/if97-verification.json
// (IAPWS R7-97(2012) and SR3-03(2014); the fixture names the tables).
import { readFileSync } from 'node:fs';
import { expect } from 'vitest';

export interface PublishedRow {
  table: string;
  equation: string;
  inputs: { p_MPa?: number; T_K?: number; h_kJkg?: number; s_kJkgK?: number; rho_kgm3?: number };
  quantity: string;
  unit: string;
  published: string;
  published_value: number;
  last_digit_unit: number;
}

const fixture = JSON.parse(
  readFileSync(new URL('../fixtures/if97-verification.json', import.meta.url), 'utf8'),
) as { rows: PublishedRow[] };

/** Rows of one table (and equation, if given); never empty, so no test passes vacuously. */
export function publishedRows(table: string, equation?: string): PublishedRow[] {
  const rows = fixture.rows.filter((row) => row.table === table && (equation === undefined || row.equation === equation));
  if (rows.length === 0) throw new Error(`no fixture rows for ${table}${equation ? ` / ${equation}` : ''}`);
  return rows;
}

export function describeRow(row: PublishedRow): string {
  const inputs = Object.entries(row.inputs)
    .map(([name, value]) => `${name}=${value}`)
    .join(', ');
  return `${row.table} ${row.equation}: ${row.quantity} at ${inputs} (published ${row.published} ${row.unit})`;
}

/** The printed digits must match: |actual - published| <= half a unit in the last digit. */
export function expectPublished(actual: number, row: PublishedRow): void {
  const difference = Math.abs(actual - row.published_value);
  expect(
    Number.isFinite(actual) && difference <= row.last_digit_unit / 2,
    `${describeRow(row)}: computed ${actual}, off by ${difference.toExponential(2)}`,
  ).toBe(true);
}

/** The row's input, which must be present. */
export function input(row: PublishedRow, name: keyof PublishedRow['inputs']): number {
  const value = row.inputs[name];
  if (value === undefined) throw new Error(`${describeRow(row)} has no input ${name}`);
  return value;
}
