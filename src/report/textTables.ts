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
 * so the whole file loads as one sheet and filters by table. Cells keep their
 * units ("42.0 barg"), exactly as the report shows them.
 */
export function tablesCsv(tables: ReportTable[]): string {
  const field = csvCell;
  const lines: string[] = [];
  for (const table of tables) {
    lines.push(['table', ...table.headings].map(field).join(','));
    for (const row of table.rows) lines.push([table.id, ...row].map(field).join(','));
    lines.push('');
  }
  return lines.join('\r\n');
}
