import { describe, expect, it } from 'vitest';
import { LinearModel, expr, getBackend, loadHighs, openHighsSession } from '../../src/lp/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { wyndor } from './textbookModels.js';

describe('HighsSession', () => {
  it('re-solves Wyndor with changed costs, bounds and right-hand sides, matching fresh solves', async () => {
    const model = wyndor();
    const session = await openHighsSession(model);
    try {
      expectClose(session.solve().objective!, 36, 1e-12, 'base');
      session.setCost('x1', 9); // 9 x1 + 5 x2: optimum moves to the vertex (4, 3), Z = 51
      expectClose(session.solve().objective!, 51, 1e-12, 'cost changed');
      session.setRhs('plant3', 20); // 3 x1 + 2 x2 <= 20: vertex (4, 4), Z = 56
      const changed = session.solve();
      expectClose(changed.objective!, 56, 1e-12, 'rhs changed');
      expectClose(changed.value('x2'), 4, 1e-12, 'x2');
      session.setBounds(model.variable('x2'), 0, 3); // x2 <= 3: (4, 3), Z = 51
      expectClose(session.solve({ warmStart: false }).objective!, 51, 1e-12, 'bound changed, cold');
      session.setCosts([['x1', 3], ['x2', 5]]);
      session.setBounds('x2', 0, Infinity);
      session.setRhs('plant3', 18);
      expectClose(session.solve().objective!, 36, 1e-12, 'back to base');
      expect(model.variable('x2').upper).toBe(Infinity);
    } finally {
      session.dispose();
    }
    expect(session.disposed).toBe(true);
    expect(() => session.solve()).toThrow(/was disposed/);
  });

  it('refuses NaN costs and inverted bounds, naming the variable', async () => {
    const session = await openHighsSession(wyndor());
    try {
      expect(() => session.setCost('x1', Number.NaN)).toThrow('The cost of variable "x1" is NaN; expected a finite number.');
      expect(() => session.setBounds('x2', 5, 1)).toThrow('Bounds of variable "x2": lower 5 is above upper 1.');
      expect(() => session.setCost('nope', 1)).toThrow('Variable "nope" is not in model "wyndor".');
    } finally {
      session.dispose();
    }
  });

  it('checks every re-solved point against the rows as they stand after changes', async () => {
    const model = wyndor();
    const session = await openHighsSession(model);
    try {
      session.setRhs('plant2', 8);
      const result = session.solve();
      expect(result.status).toBe('optimal');
      expect(result.rowActivity.get('plant2')!).toBeLessThanOrEqual(8 + 1e-9);
    } finally {
      session.dispose();
    }
  });

  it('keeps the wasm heap flat over 200 open-solve-dispose cycles', async () => {
    const highs = await loadHighs();
    const model = wyndor();
    for (let cycle = 0; cycle < 50; cycle++) await getBackend('highs').solve(model);
    const before = highs.memoryBytes;
    for (let cycle = 0; cycle < 200; cycle++) await getBackend('highs').solve(model);
    expect(highs.memoryBytes).toBe(before);
  });

  it('gives the time limit to each run, not to the session as a whole', async () => {
    // HiGHS clocks are cumulative on a persistent LP unless zeroed (its MIP
    // search keeps its own clock). Cold re-solves of a 400-column chain, each
    // far below the 1 s limit, are repeated until together they have run 2.5 s:
    // with un-zeroed clocks the later runs would end at the limit. The wall
    // clock only decides when to stop; no assertion depends on speed.
    const model = new LinearModel('chain');
    const flows = Array.from({ length: 400 }, (_, index) => model.addVariable(`f${index}`, { upper: 10 + index }));
    flows.forEach((flow, index) => {
      if (index > 0) model.addRow(`link${index}`, expr().add(flow).add(flows[index - 1], -0.9), '<=', 5);
    });
    model.setObjective('maximize', flows.reduce((total, flow, index) => total.add(flow, 1 + (index % 7)), expr()));
    const session = await openHighsSession(model, { timeLimitSeconds: 1, presolve: 'off' });
    try {
      let runSeconds = 0;
      for (let run = 0; run < 100_000 && runSeconds < 2.5; run++) {
        session.setCost(flows[run % 400], 1 + (run % 5));
        const started = performance.now();
        const result = session.solve({ warmStart: false });
        runSeconds += (performance.now() - started) / 1000;
        expect(result.status, `run ${run}`).toBe('optimal');
      }
      expect(runSeconds).toBeGreaterThanOrEqual(2.5);
    } finally {
      session.dispose();
    }
  });
});
