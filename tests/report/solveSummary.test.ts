// solve's text summary: each vent's reason under Losses, for a plant whose LP
// header must vent.
import { beforeAll, describe, expect, it } from 'vitest';
import { solveSummary } from '../../src/report/index.js';
import { ventingCase } from '../plant/helpers/ventingCase.js';
import { solveText, type Solved } from './helpers/solvedCases.js';

let solved: Solved;
beforeAll(async () => {
  solved = await solveText(ventingCase({ turbineMin: '30 t/h', lpUser: '5 t/h', wasteHeat: '4 t/h' }), 'venting.yaml');
});

describe('solveSummary', () => {
  it("solve's summary gives each vent's reason under Losses", () => {
    const text = solveSummary(solved.result, { atmosphericPressure_MPa: solved.plant.site.atmosphericPressure });
    const losses = text.slice(text.indexOf('Losses'), text.indexOf('Sources'));
    expect(losses).toContain('Why each vent has no better use:');
    const reason = solved.result.vents.find((vent) => vent.where === 'lp')!.reason;
    expect(losses).toContain(`  - ${reason}`);
    expect(reason).toContain("bpt1's exhaust (30.0 t/h, inlet flow at minimum)");
  });
});
