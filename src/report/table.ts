// Plain aligned text tables: text left, numbers right.

export function table(headings: string[], rows: string[][], showHeadings = true): string {
  const all = showHeadings ? [headings, ...rows] : rows;
  const widths = headings.map((_, column) => Math.max(...all.map((row) => (row[column] ?? '').length)));
  const numeric = headings.map((_, column) => rows.length > 0 && rows.every((row) => /^[-+]?[\d.,]/.test(row[column] ?? '') || row[column] === '-'));
  const render = (row: string[]): string =>
    '  ' +
    row
      .map((cell, column) => (numeric[column] && column > 0 ? cell.padStart(widths[column]) : cell.padEnd(widths[column])))
      .join('  ')
      .trimEnd();
  const lines = rows.map(render);
  if (showHeadings) lines.unshift(render(headings), '  ' + widths.map((width) => '-'.repeat(width)).join('  '));
  return lines.join('\n');
}
