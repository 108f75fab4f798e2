// Turbine stages with ids: a scenario changes one stage and keeps the others.
import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { formatIssue, loadCaseText } from '../../src/model/index.js';

const mill = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');
const withIds = mill
  .replace('      - to: mp                      # controlled extraction to the MP header', '      - id: extraction\n        to: mp')
  .replace('      - condenser_pressure: 0.1 bara', '      - id: condensing\n        condenser_pressure: 0.1 bara');

describe('turbine stage ids', () => {
  test('a scenario changes the condensing stage alone', () => {
    expect(withIds).not.toBe(mill);
    const text = withIds.replace('        - { id: tank_tracing, steam: 1.0 t/h }\n', `        - { id: tank_tracing, steam: 1.0 t/h }
      turbines:
        - id: tg1
          stages:
            - { id: condensing, isentropic_efficiency: 65 % }
`);
    const loaded = loadCaseText(text, 'mill.yaml');
    if (!loaded.ok) throw new Error(loaded.issues.map((issue) => formatIssue(issue, 'mill.yaml')).join('\n'));
    const summer = loaded.variants.scenarios.find((scenario) => scenario.id === 'summer')!.plant.turbines[0];
    expect(summer.stages.map((stage) => stage.performance)).toEqual([{ kind: 'isentropic', efficiency: 0.76 }, { kind: 'isentropic', efficiency: 0.65 }]);
    expect(summer.stages[1].sectionFlow).toEqual(loaded.plant.turbines[0].stages[1].sectionFlow);
    expect(loaded.plant.turbines[0].stages[1].performance).toEqual({ kind: 'isentropic', efficiency: 0.72 });
  });
  test('a stage id used twice in one turbine is refused', () => {
    const result = loadCaseText(withIds.replace('id: condensing', 'id: extraction'), 'mill.yaml');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((issue) => formatIssue(issue, 'mill.yaml')).join('\n')).toMatch(/turbines\[0\]\.stages\[1\]\.id {2}stage id "extraction" is used twice in turbine tg1/);
  });
});
