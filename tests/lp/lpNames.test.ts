import { describe, expect, it } from 'vitest';
import { isSafeLpName, loadHighs, sanitizeLpName } from '../../src/lp/index.js';

describe('LP-format names', () => {
  it('keeps plain plant names as they are', () => {
    for (const name of ['boiler1', 'hp.mass', 'turbine1.exh', 'steam', 'generator', 'minload', 'end_user', 'free_cooling', '_x']) {
      expect(isSafeLpName(name), name).toBe(true);
    }
  });

  it('renames the names the HiGHS reader refuses or misreads', () => {
    expect(['free', 'st', 'bounds', 'end', 'inf', 'inflow', 'Maximise', 'boiler[1]', 'a:b', '2nd', 'a b', 'x/y'].map(sanitizeLpName)).toEqual([
      '_free', '_st', '_bounds', '_end', '_inf', '_inflow', '_Maximise', 'boiler_1_', 'a_b', '_2nd', 'a_b', 'x_y',
    ]);
  });

  it('every name called safe is read back exactly by the HiGHS 1.15 LP reader (probe of the rule)', async () => {
    const highs = await loadHighs();
    for (const name of ['boiler1', 'hp.mass', 'steam', 'generator', 'end_user', 'a.b.c', '_free', '_inf', '_2nd', 'boiler_1_']) {
      expect(isSafeLpName(name), name).toBe(true);
      // minimise 2 N + y with N + y >= 3 and N - y >= 1: N = 2, y = 1, objective 5
      const text = `Minimize\n obj: 2 ${name} + y\nSubject To\n ${name}: ${name} + y >= 3\n c2: ${name} - y >= 1\nEnd\n`;
      const solution = highs.solve(text, { output_flag: false });
      expect(solution.Status, name).toBe('Optimal');
      expect(solution.ObjectiveValue, name).toBeCloseTo(5, 12);
      expect(Object.keys(solution.Columns), name).toEqual([name, 'y']);
      expect((solution.Rows[0] as { Name?: string }).Name, name).toBe(name);
    }
  });
});
