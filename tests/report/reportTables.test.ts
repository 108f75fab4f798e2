// The report's tables: the vents table gives each vent's reason, for a plant
// whose LP header must vent.
import { beforeAll, describe, expect, it } from 'vitest';
import { displayFormat, reportTables } from '../../src/report/index.js';
import { ventingCase } from '../plant/helpers/ventingCase.js';
import { solveText, type Solved } from './helpers/solvedCases.js';

let solved: Solved;
beforeAll(async () => {
  solved = await solveText(ventingCase({ turbineMin: '30 t/h', lpUser: '5 t/h', wasteHeat: '4 t/h' }), 'venting.yaml');
});

describe('reportTables', () => {
  it("the report's vents table has the reason beside the vent", () => {
    const format = displayFormat(solved.result.unit_system, solved.result.currency, solved.plant.site.atmosphericPressure);
    const vents = reportTables(solved.result, format).find((table) => table.id === 'vents')!;
    expect(vents.headings).toEqual(['where', 'flow', 'why']);
    const row = vents.rows.find((cells) => cells[0] === 'vent from lp')!;
    expect(row[2]).toBe(solved.result.vents.find((vent) => vent.where === 'lp')!.reason);
  });
});
