// compare shows each header's superheat and moisture, and the steam-quality
// warnings of every scenario.
import { describe, expect, it } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { compareText, plantDisplayFormat } from '../../src/report/index.js';
import { compareScenarios } from '../../src/scenarios/index.js';
import { demoCaseText } from './helpers/solvedCases.js';

describe('compare and steam quality', () => {
  it('the creamery scenarios show the wet 15 psig header, row and warning', async () => {
    const loaded = loadCaseText(demoCaseText('millbrook-creamery'), 'millbrook-creamery.yaml');
    if (!loaded.ok) throw new Error('the creamery does not load');
    const comparison = await compareScenarios(loaded.variants, [], { workers: 1 });
    const text = compareText('Millbrook', comparison.runs, plantDisplayFormat(loaded.plant), comparison.annual);
    expect(text).toMatch(/lp moisture, % +4\.\d/);
    expect(text).toMatch(/hp superheat, degF +0\.0/);
    expect(text).toContain('Steam quality warnings');
    expect(text).toMatch(/ {2}winter: lp is wet: 4\.\d % moisture/);
  });
});
