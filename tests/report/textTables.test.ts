import { describe, expect, it } from 'vitest';
import { tablesCsv, tablesMarkdown, type ReportTable } from '../../src/report/index.js';

const TABLES: ReportTable[] = [
  { id: 'headers', title: 'Headers', headings: ['header', 'pressure'], rows: [['hp', '42.0 barg'], ['a|b', '-']] },
  { id: 'vents', title: 'Vents and losses', headings: ['where', 'flow'], rows: [] },
  { id: 'odd', title: 'Odd cells', headings: ['text', 'formula'], rows: [['say "hi", then\nleave', '=1+1']] },
];

describe('tablesMarkdown', () => {
  it('writes one section per table, escapes pipes and writes "none" for an empty table', () => {
    expect(tablesMarkdown('Mill', TABLES)).toMatchInlineSnapshot(`
      "# Mill

      ## Headers

      | header | pressure |
      |---|---|
      | hp | 42.0 barg |
      | a\\|b | - |

      ## Vents and losses

      none

      ## Odd cells

      | text | formula |
      |---|---|
      | say "hi", then leave | =1+1 |
      "
    `);
  });
});

describe('tablesCsv', () => {
  it('writes each table as a block keyed by its id, quoting by RFC 4180 and neutralising formulas', () => {
    expect(tablesCsv(TABLES).split('\r\n')).toEqual([
      'table,header,pressure',
      'headers,hp,42.0 barg',
      'headers,a|b,-',
      '',
      'table,where,flow',
      '',
      'table,text,formula',
      // Quotes alone do not stop a spreadsheet reading a formula; the apostrophe does (OWASP, CSV Injection).
      `odd,"say ""hi"", then\nleave",'=1+1`,
      '',
    ]);
  });
});
