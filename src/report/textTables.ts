// The report's tables as Markdown and as CSV.
import type { ReportTable } from './reportTables.js';
import { csvCell, markdownCell } from './safeCells.js';

/** Markdown: one `##` section per table; cells are HTML escaped and pipes escaped. */
export function tablesMarkdown(title: string, tables: ReportTable[], notes: string[] = []): string {
  const cell = markdownCell;
  const lines: string[] = [`# ${cell(title)}`, ''];
  for (const table of tables) {
    lines.push(`## ${cell(table.title)}`, '');
    if (table.rows.length === 0) {
      lines.push('none', '');
      continue;
    }
    lines.push(`| ${table.headings.map(cell).join(' | ')} |`, `|${table.headings.map(() => '---').join('|')}|`);
    for (const row of table.rows) lines.push(`| ${row.map(cell).join(' | ')} |`);
    lines.push('');
  }
  for (const note of notes) lines.push(note, '');
  return lines.join('\n');
}

/**
 * CSV (RFC 4180): each table is a block whose first column is the table id,
 * so the whole file loads as one sheet and filters by table. A column whose
 * every figure is a number in one unit carries the unit in its heading
 * ("pressure (psig)") and plain numbers in its cells (no thousands
 * separators; "-" for none becomes an empty cell), so a spreadsheet reads
 * them as numbers. Columns of words, or of mixed units, stay as shown.
 */
export function tablesCsv(tables: ReportTable[]): string {
  const field = csvCell;
  const lines: string[] = [];
  for (const table of tables) {
    const columns = table.headings.map((heading, column) => numericColumn(heading, table.rows.map((row) => row[column] ?? '')));
    lines.push(['table', ...columns.map((column) => column.heading)].map(field).join(','));
    table.rows.forEach((_, row) => lines.push([table.id, ...columns.map((column) => column.cells[row])].map(field).join(',')));
    lines.push('');
  }
  return lines.join('\r\n');
}

/** A figure as the tables show it: a number with thousands separators, then one unit word or none. */
const FIGURE = /^([-+]?(?:\d{1,3}(?:,\d{3})+|\d+)(?:\.\d+)?(?:[eE][-+]?\d+)?)(?: ([^\s\d][^\s]*))?$/;
const NONE = new Set(['-', '']);

/** The column as plain numbers under "heading (unit)" when every figure has the same unit; else unchanged. */
export function numericColumn(heading: string, cells: string[]): { heading: string; cells: string[] } {
  const figures = cells.filter((cell) => !NONE.has(cell));
  if (figures.length === 0) return { heading, cells };
  const parsed = figures.map((cell) => FIGURE.exec(cell));
  if (parsed.some((match) => match === null)) return { heading, cells };
  const units = new Set(parsed.map((match) => match![2] ?? ''));
  if (units.size !== 1) return { heading, cells };
  const [unit] = units;
  return {
    heading: unit ? `${heading} (${unit})` : heading,
    cells: cells.map((cell) => (NONE.has(cell) ? '' : FIGURE.exec(cell)![1].replace(/,/g, '').replace(/^\+/, ''))),
  };
}
