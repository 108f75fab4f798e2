// A US-units case prints every figure in US units: flows in klb/h, heat and
// fuel in MMBtu/h, CO2 in klb/h, pressures in psig, temperatures in degF.
// Electricity stays in kW, as US utilities bill it.
import { describe, expect, it } from 'vitest';
import { reportTables, solveSummary, tablesMarkdown, plantDisplayFormat } from '../../src/report/index.js';
import { demoCaseText, solveText } from './helpers/solvedCases.js';

const SI_UNITS = /\bt\/h\b|kg\/s|kJ|degC|barg|bara|kPa|\bMW\b|kW\/K|\bGJ\b|\bt\b/;
/** Rows where kW is right: electric power and the turbines that make it. */
const ELECTRIC = /power|bptg|pump_turbine|kWh/;

function offending(text: string): string[] {
  return text.split('\n').filter((line) => SI_UNITS.test(line) || (/\bkW\b/.test(line) && !ELECTRIC.test(line)));
}

describe('a US-units case', () => {
  it('the solve summary and the report tables show no SI figure', async () => {
    const solved = await solveText(demoCaseText('millbrook-creamery'), 'millbrook-creamery.yaml');
    const summary = solveSummary(solved.result, { atmosphericPressure_MPa: solved.plant.site.atmosphericPressure });
    expect(summary).toContain('MMBtu/h');
    expect(summary).toMatch(/CO2 +[\d.]+ klb\/h/);
    expect(summary).toMatch(/Btu\/\(h R\)/);
    expect(offending(summary)).toEqual([]);
    const markdown = tablesMarkdown('report', reportTables(solved.result, plantDisplayFormat(solved.plant)));
    expect(offending(markdown)).toEqual([]);
  });
});
