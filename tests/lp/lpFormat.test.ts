import { describe, expect, it } from 'vitest';
import { LinearModel, expr, getBackend, loadHighs, toLpFormat } from '../../src/lp/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { randomFeasibleLp } from './randomLp.js';
import { textbookCases } from './textbookModels.js';

/** Export, read back with the HiGHS one-shot text reader, solve; values under our names. */
async function roundTrip(model: LinearModel): Promise<{ objective: number; values: Map<string, number>; status: string }> {
  const highs = await loadHighs();
  const exported = toLpFormat(model);
  const solution = highs.solve(exported.text, { output_flag: false });
  const values = new Map<string, number>();
  for (const [lpName, column] of Object.entries(solution.Columns)) {
    values.set(exported.fromLp.get(lpName) ?? `?${lpName}`, (column as { Primal: number }).Primal);
  }
  return { objective: solution.ObjectiveValue, values, status: solution.Status };
}

function awkwardlyNamed(): LinearModel {
  const model = new LinearModel('awkward');
  const names = ['free', 'st', 'bounds', 'end', 'inf', 'infinity', 'inflow', 'boiler[1]', 'hp:steam', '2nd.turbine', 'a b', 'x/y', 'e1', 'free_'];
  const variables = names.map((name, index) => model.addVariable(name, { upper: 5 + index, type: index === 3 ? 'integer' : 'continuous' }));
  const total = expr();
  variables.forEach((variable, index) => total.add(variable, 1 + (index % 3)));
  model.addRow('st', total, '<=', 40);
  model.addRow('end', expr().add(variables[0]).add(variables[1], -1), '>=', -2);
  model.addRangeRow('bounds[range]', 1, expr().add(variables[2]).add(variables[3]), 6);
  model.addRow('fixed:row', expr().add(variables[4]).addConstant(1), '=', 3);
  const objective = expr().addConstant(2.5);
  variables.forEach((variable, index) => objective.add(variable, (index % 4) - 1.5));
  model.setObjective('maximize', objective);
  return model;
}

describe('toLpFormat', () => {
  it('writes Wyndor as plain CPLEX LP text with Maximize (never Maximise)', () => {
    expect(toLpFormat(textbookCases[0].build()).text).toMatchInlineSnapshot(`
      "\\ Model wyndor, written by steamwright
      Maximize
       obj: 3 x1 + 5 x2
      Subject To
       plant1: x1 <= 4
       plant2: 2 x2 <= 12
       plant3: 3 x1 + 2 x2 <= 18
      Bounds
       0 <= x1 <= +inf
       0 <= x2 <= +inf
      End
      "
    `);
  });

  for (const testCase of textbookCases) {
    it(`round trip through the HiGHS LP reader keeps the optimum of ${testCase.title} (${testCase.objective})`, async () => {
      const read = await roundTrip(testCase.build());
      expect(read.status).toBe('Optimal');
      expectClose(read.objective, testCase.objective, 1e-9, testCase.title);
    });
  }

  it('renames keywords, brackets, colons, slashes, spaces and leading digits, and maps results back', async () => {
    const model = awkwardlyNamed();
    const exported = toLpFormat(model);
    for (const name of ['free', 'st', 'bounds', 'end', 'inf', 'infinity', 'inflow', 'boiler[1]', 'hp:steam', '2nd.turbine', 'a b', 'x/y']) {
      expect(exported.names.get(name), name).not.toBe(name);
    }
    expect(new Set(model.variables.map((variable) => exported.names.get(variable.name))).size).toBe(model.variables.length);
    expect(exported.rowParts.get('bounds[range]')).toHaveLength(2);
    const direct = await getBackend('highs').solve(model);
    const read = await roundTrip(model);
    expect(read.status).toBe('Optimal');
    expectClose(read.objective, direct.objective!, 1e-9, 'objective');
    for (const variable of model.variables) {
      expect(Math.abs(read.values.get(variable.name)! - direct.value(variable)), variable.name).toBeLessThan(1e-7);
    }
  });

  it('round trip keeps the optimum of 50 random LPs, ranged rows and negative bounds included', async () => {
    for (let seed = 2001; seed <= 2050; seed++) {
      const model = randomFeasibleLp(seed);
      const direct = await getBackend('highs').solve(model);
      const read = await roundTrip(model);
      expectClose(read.objective, direct.objective!, 1e-9, `seed ${seed}`);
    }
  });

  it('refuses a model with a NaN coefficient, naming the row', () => {
    const model = new LinearModel('bad');
    const x = model.addVariable('x');
    model.addRow('hp.mass', expr().add(x, Number.NaN), '=', 0);
    model.setObjective('minimize', expr().add(x));
    expect(() => toLpFormat(model)).toThrow('row "hp.mass": coefficient of "x" is NaN; expected a finite number');
  });
});
