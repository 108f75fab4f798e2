import type { Highs, Model as HighsModel } from 'highs';
import { describe, expect, it } from 'vitest';
import { compileModel, highsStatusTable } from '../../src/lp/index.js';
import { runHighs } from '../../src/lp/highsRun.js';
import { wyndor } from './textbookModels.js';

/** A stand-in for a persistent HiGHS model: answers 9 with presolve on, then a scripted status. */
function scriptedModel(afterPresolveOff: number) {
  const calls: string[] = [];
  let presolve = 'choose';
  const model = {
    options: {
      set(name: string | Record<string, unknown>, value?: unknown) {
        if (name === 'presolve') presolve = String(value);
        calls.push(typeof name === 'string' ? `set ${name}=${String(value)}` : 'set options');
        return { status: 0, warnings: [] };
      },
    },
    clearSolver: () => calls.push('clearSolver'),
    zeroAllClocks: () => calls.push('zeroAllClocks'),
    run: () => {
      calls.push(`run presolve=${presolve}`);
      return { modelStatus: presolve === 'off' ? afterPresolveOff : 9, status: 0, warnings: [] };
    },
    info: { get: () => 0 },
  };
  return { model: model as unknown as HighsModel, calls };
}

describe('runHighs', () => {
  it('re-solves without presolve when presolve says "infeasible or unbounded", then restores presolve', () => {
    const { model, calls } = scriptedModel(8);
    const result = runHighs({} as Highs, model, compileModel(wyndor()), {}, true);
    expect(result.status).toBe('infeasible');
    expect(result.message).toBe('presolve could not tell infeasible from unbounded, so the model was re-solved without presolve');
    expect(calls).toEqual([
      'zeroAllClocks',
      'run presolve=choose',
      'set presolve=off',
      'clearSolver',
      'zeroAllClocks',
      'run presolve=off',
      'set presolve=choose',
    ]);
  });

  it('reports "unknown" with the reason when even the re-solve cannot tell', () => {
    const { model } = scriptedModel(9);
    const result = runHighs({} as Highs, model, compileModel(wyndor()), {}, false);
    expect(result.status).toBe('unknown');
    expect(result.message).toContain('HiGHS could not tell infeasible from unbounded even without presolve');
  });

  it('maps every HiGHS model status code 0..17 through one table', () => {
    expect([...highsStatusTable.keys()]).toEqual(Array.from({ length: 18 }, (_, code) => code));
    expect(highsStatusTable.get(7)).toBe('optimal');
    expect(highsStatusTable.get(13)).toBe('time_limit');
  });
});
