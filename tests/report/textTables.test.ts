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
      // One unit down the column: it goes to the heading, the cells keep the number; "-" (none) is empty.
      'table,header,pressure (barg)',
      'headers,hp,42.0',
      'headers,a|b,',
      '',
      'table,where,flow',
      '',
      'table,text,formula',
      // Quotes alone do not stop a spreadsheet reading a formula; the apostrophe does (OWASP, CSV Injection).
      `odd,"say ""hi"", then\nleave",'=1+1`,
      '',
    ]);
  });

  it('keeps columns of words or of mixed units as shown, and drops thousands separators and plus signs from numbers', () => {
    const tables: ReportTable[] = [
      {
        id: 't',
        title: 'T',
        headings: ['cost', 'change', 'mixed', 'words', 'count'],
        rows: [
          ['1,866,568 EUR', '+2.50 kW', '3 t/h', 'at minimum steam', '12'],
          ['-389,333 EUR', '-26 kW', '4 kW', '-', '1,200'],
        ],
      },
    ];
    expect(tablesCsv(tables).split('\r\n')).toEqual(['table,cost (EUR),change (kW),mixed,words,count', 't,1866568,2.50,3 t/h,at minimum steam,12', `t,-389333,-26,4 kW,-,1200`, '']);
  });
});
