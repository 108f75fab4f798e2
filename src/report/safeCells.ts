// Cells of the Markdown and CSV tables, made safe to open: text from the case
// (names, ids) is never markup in a Markdown viewer nor a formula in a
// spreadsheet.

const HTML_ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;' };

/** A Markdown table cell: HTML escaped, backslashes and pipes escaped, one line. */
export function markdownCell(text: string): string {
  return text
    .replace(/[&<>]/g, (char) => HTML_ENTITIES[char])
    .replace(/\\/g, '\\\\')
    .replace(/\|/g, '\\|')
    .replace(/\r?\n|\r/g, ' ');
}

/** A number, possibly signed, with an optional unit after a space ("-3.2 kW", "+5 %"): no formula. */
const NUMBER_WITH_UNIT = /^[-+]?(\d[\d,]*(\.\d*)?|\.\d+)([eE][-+]?\d+)?( [^=+\-@\t\r\n]*)?$/;

/**
 * A CSV field (RFC 4180 quoting). A cell that a spreadsheet would read as a
 * formula (starting with =, +, -, @, a tab or CR) gets a leading apostrophe,
 * the neutralisation OWASP recommends against CSV injection, unless it is a
 * plain number.
 */
export function csvCell(text: string): string {
  const safe = /^[=+\-@\t\r]/.test(text) && text !== '-' && !NUMBER_WITH_UNIT.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}
