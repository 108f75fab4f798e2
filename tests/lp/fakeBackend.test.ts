import { describe, expect, it } from 'vitest';
import { LinearModel, createFakeBackend, expr } from '../../src/lp/index.js';
import { wyndor } from './textbookModels.js';

describe('createFakeBackend', () => {
  it('returns canned values under our names and records each model', async () => {
    const fake = createFakeBackend({ primal: { x1: 2, x2: 6 }, dual: { plant2: 1.5, plant3: 1 } });
    const model = wyndor();
    const result = await fake.solve(model);
    expect(result.status).toBe('optimal');
    expect(result.objective).toBe(36); // computed from the canned point: 3 * 2 + 5 * 6
    expect(result.shadowPrice('plant3')).toBe(1);
    expect(result.shadowPrice('plant1')).toBe(0);
    expect(result.rowActivity.get('plant3')).toBe(18);
    expect(fake.calls).toEqual([model]);
  });

  it('turns a canned point that breaks a row into an error naming the row', async () => {
    const fake = createFakeBackend({ primal: { x1: 5, x2: 6 } });
    const result = await fake.solve(wyndor());
    expect(result.status).toBe('error');
    expect(result.message).toContain('row "plant3" activity 27 is above its upper bound 18 by 9');
    expect(result.message).toContain('row "plant1" activity 5 is above its upper bound 4 by 1');
  });

  it('refuses a canned value for a variable the model does not have', async () => {
    const model = new LinearModel('m');
    const x = model.addVariable('x');
    model.setObjective('minimize', expr().add(x));
    await expect(createFakeBackend({ primal: { y: 1 } }).solve(model)).rejects.toThrow('Canned value for "y", which is not a variable of model "m".');
  });
});
