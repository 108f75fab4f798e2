// Steam quality at every header: the creamery's wet LP header and the margin
// a floating header should keep (10 K: common practice, no source).
import { describe, expect, it } from 'vitest';
import { displayFormat, reportTables, solveSummary } from '../../src/report/index.js';
import { SUPERHEAT_MARGIN_K, steamQualityCell, steamQualityWarnings } from '../../src/report/steamQuality.js';
import { demoCaseText, solveText } from './helpers/solvedCases.js';

const si = displayFormat('si', 'EUR', 0.101325);
const us = displayFormat('us', 'USD', 0.101325);

describe('steamQualityWarnings', () => {
  it('a wet header gives its moisture; a floating header below the margin gives its superheat and the margin', () => {
    const headers = [
      { id: 'a', state: 'floating' as const, quality: 0.955, superheat_K: null },
      { id: 'b', state: 'floating' as const, quality: null, superheat_K: 4 },
      { id: 'c', state: 'controlled' as const, quality: null, superheat_K: 4 },
      { id: 'd', state: 'floating' as const, quality: null, superheat_K: SUPERHEAT_MARGIN_K + 0.1 },
    ];
    expect(steamQualityWarnings(headers, us)).toMatchInlineSnapshot(`
      [
        "a is wet: 4.5 % moisture (x 0.955); users and turbines on it get wet steam and its lines collect condensate",
        "b floats with 7.20 degF of superheat, less than the 18.0 degF margin common practice keeps (no single source); a little heat loss makes it wet",
      ]
    `);
    expect(steamQualityWarnings(headers, si)[1]).toContain('4.00 K of superheat, less than the 10.0 K margin');
    expect(headers.map((header) => steamQualityCell(header, si))).toEqual(['wet, x 0.955 (4.5 % moisture)', 'superheat 4.00 K', 'superheat 4.00 K', 'superheat 10.1 K']);
  });
});

describe('steam quality in the creamery demo', () => {
  it('its 15 psig header is wet with 4.5 % moisture, in the solve summary and the report', async () => {
    const solved = await solveText(demoCaseText('millbrook-creamery'), 'millbrook-creamery.yaml');
    const lp = solved.result.headers.find((header) => header.id === 'lp')!;
    expect((1 - lp.quality!) * 100).toBeCloseTo(4.5, 1);
    expect(lp.superheat_K).toBeNull();
    const summary = solveSummary(solved.result, { atmosphericPressure_MPa: solved.plant.site.atmosphericPressure });
    expect(summary).toContain('warning: lp is wet: 4.5 % moisture (x 0.955)');
    const tables = reportTables(solved.result, us);
    expect(tables.find((table) => table.id === 'steam-quality')?.rows.map((row) => row[0])).toContain(
      'lp is wet: 4.5 % moisture (x 0.955); users and turbines on it get wet steam and its lines collect condensate',
    );
  });

  it('the board mill keeps every header superheated beyond the margin: no warning', async () => {
    const solved = await solveText(demoCaseText('kestrel-bay-board-mill'), 'kestrel-bay-board-mill.yaml');
    expect(steamQualityWarnings(solved.result.headers, si)).toEqual([]);
    for (const header of solved.result.headers) expect(header.superheat_K!).toBeGreaterThan(SUPERHEAT_MARGIN_K);
  });
});
