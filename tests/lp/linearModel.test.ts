import { describe, expect, it } from 'vitest';
import { InvalidModelError, LinearModel, expr, getBackend, sum, term, validateModel } from '../../src/lp/index.js';

describe('LinearModel', () => {
  it('describe() prints the model as mathematics, constants moved to the right-hand side', () => {
    const model = new LinearModel('site');
    const boiler = model.addVariable('boiler1', { upper: 20 });
    const turbine = model.addVariable('turbine1.exh', { lower: 2, upper: 15 });
    const letdown = model.addVariable('prv1');
    const unit = model.addVariable('boiler1.on', { type: 'binary' });
    const steps = model.addVariable('pumps', { type: 'integer', upper: 3 });
    const slack = model.addVariable('slack', { lower: -Infinity });
    model.addRow('hp.mass', expr().add(boiler).add(turbine).add(letdown, -1), '=', 0);
    model.addRow('cap', expr().add(boiler).add(unit, -20), '<=', 0);
    model.addRow('lp.demand', sum(letdown, term(slack, 0.5)).addConstant(-4), '>=', 6);
    model.addRangeRow('band', 1, expr().add(steps, 2).add(turbine), 9);
    model.setObjective('minimize', expr().add(boiler, 3.5).add(unit, 12).addConstant(100));
    expect(model.describe()).toMatchInlineSnapshot(`
      "model site
      minimize 3.5 boiler1 + 12 boiler1.on + 100
      subject to
        hp.mass: boiler1 + turbine1.exh - prv1 = 0
        cap: boiler1 - 20 boiler1.on <= 0
        lp.demand: prv1 + 0.5 slack >= 10
        band: 1 <= 2 pumps + turbine1.exh <= 9
      bounds
        0 <= boiler1 <= 20
        2 <= turbine1.exh <= 15
        boiler1.on binary
        0 <= pumps <= 3, integer
        slack free"
    `);
  });

  it('keeps terms in insertion order and accumulates a repeated variable', () => {
    const model = new LinearModel('order');
    const b = model.addVariable('b');
    const a = model.addVariable('a');
    const expression = expr().add(b, 2).add(a).add(b, 3);
    expect([...expression.terms].map(([variable, coefficient]) => `${variable.name}:${coefficient}`)).toEqual(['b:5', 'a:1']);
  });

  it('refuses a duplicate variable or row name', () => {
    const model = new LinearModel('dup');
    const x = model.addVariable('x');
    expect(() => model.addVariable('x')).toThrow('Model "dup" already has a variable named "x". Names must be unique.');
    model.addRow('r', expr().add(x), '<=', 1);
    expect(() => model.addRow('r', expr().add(x), '>=', 0)).toThrow('Model "dup" already has a row named "r". Names must be unique.');
  });

  it('refuses a binary whose bounds leave [0, 1]', () => {
    expect(() => new LinearModel('m').addVariable('b', { type: 'binary', upper: 2 })).toThrow(
      'Binary variable "b" has bounds [0, 2]; a binary\'s bounds must lie within [0, 1].',
    );
  });
});

describe('validateModel, before any solver sees the model', () => {
  it('lists NaN and infinite coefficients, foreign variables, NaN bounds, naming each row or variable', () => {
    const model = new LinearModel('bad');
    const other = new LinearModel('other');
    const x = model.addVariable('x', { upper: Number.NaN });
    const stranger = other.addVariable('stranger');
    model.addRow('hp.mass', expr().add(x, Number.NaN), '=', 0);
    model.addRow('cap', expr().add(x, Number.POSITIVE_INFINITY), '<=', Infinity);
    model.addRow('foreign', expr().add(stranger), '<=', 1);
    model.addRow('rhs', expr().add(x), '>=', Number.NaN);
    model.setObjective('minimize', expr().add(x));
    expect(validateModel(model).map((issue) => `${issue.where}: ${issue.message}`)).toEqual([
      'variable "x": upper bound is NaN; expected a number or Infinity',
      'row "hp.mass": coefficient of "x" is NaN; expected a finite number',
      'row "cap": coefficient of "x" is Infinity; expected a finite number',
      'row "foreign": uses variable "stranger", which is not declared in model "bad"',
      'row "rhs": right-hand side is NaN; expected a number',
    ]);
  });

  it('accepts an objective with no non-zero term as a feasibility problem; both backends return a feasible point', async () => {
    // A plant whose prices are all zero builds such a model under minimum cost.
    const model = new LinearModel('empty');
    const x = model.addVariable('x', { upper: 5 });
    model.addRow('r', expr().add(x), '>=', 1);
    model.setObjective('maximize', expr().add(x, 0));
    for (const name of ['highs', 'jslp'] as const) {
      const result = await getBackend(name).solve(model);
      expect(result.status, name).toBe('optimal');
      expect(result.objective, name).toBe(0);
      expect(result.value(x), name).toBeGreaterThanOrEqual(1 - 1e-9);
      expect(result.value(x), name).toBeLessThanOrEqual(5 + 1e-9);
    }
  });

  it('accepts infinite bounds', () => {
    const model = new LinearModel('free');
    const x = model.addVariable('x', { lower: -Infinity, upper: Infinity });
    model.addRow('r', expr().add(x), '<=', Infinity);
    model.setObjective('minimize', expr().add(x));
    expect(validateModel(model)).toEqual([]);
  });
});
