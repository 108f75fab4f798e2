import { describe, expect, it } from 'vitest';
import { csvCell, markdownCell } from '../../src/report/safeCells.js';

describe('markdownCell', () => {
  it('escapes HTML, backslashes and pipes, and keeps one line', () => {
    expect(markdownCell('<img src=x onerror=alert(1)> & co')).toBe('&lt;img src=x onerror=alert(1)&gt; &amp; co');
    expect(markdownCell('a|b\\c\nd\re')).toBe('a\\|b\\\\c d e');
  });
});

describe('csvCell', () => {
  // OWASP, "CSV Injection": cells starting with = + - @ tab or CR are read as
  // formulas; a leading apostrophe makes them text.
  it.each([
    ['=HYPERLINK("http://x","y")', `"'=HYPERLINK(""http://x"",""y"")"`],
    ['+cmd|calc', "'+cmd|calc"],
    ['-1+cmd|calc', "'-1+cmd|calc"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tboiler', "'\tboiler"],
  ])('neutralises %j', (text, expected) => {
    expect(csvCell(text)).toBe(expected);
  });

  it.each(['-3.2', '-3.2 kW', '+5 %', '1e-3', 'boiler 1', '-'])('leaves %j alone (a number, or plain text)', (text) => {
    expect(csvCell(text)).toBe(text);
  });

  it('quotes a signed number with a thousands separator but adds no apostrophe', () => {
    expect(csvCell('-1,250.5 USD/h')).toBe('"-1,250.5 USD/h"');
  });

  it('quotes commas, quotes and line breaks (RFC 4180)', () => {
    expect(csvCell('a, "b"')).toBe('"a, ""b"""');
    expect(csvCell('a\nb')).toBe('"a\nb"');
  });
});
