// A condensing stage's condensate goes where the case says: here to drain.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { loadPlant } from './helpers/cases.js';

describe('condensing stage condensate_to', () => {
  it('drain: the condenser stream goes to drain, the deaerator gets none of it, the independent audit passes', async () => {
    const text = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8').replace('condensate_to: deaerator      # or drain, or a flash tank id', 'condensate_to: drain');
    const plant = loadPlant(text);
    expect(plant.turbines[0].stages[1].exhaust).toMatchObject({ kind: 'condenser', condensateTo: { kind: 'drain' } });
    const outcome = await solvePlant(plant);
    if (!outcome.ok) throw new Error(outcome.message);
    expect(outcome.independentAudit.ok, outcome.independentAudit.summary).toBe(true);
    const streams = plantResult(outcome).streams.filter((stream) => stream.from === 'tg1' && stream.kind === 'condensate');
    expect(streams.map((stream) => stream.to)).toEqual(['drain']);
  });
});
