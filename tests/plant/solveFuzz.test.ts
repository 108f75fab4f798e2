import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { loadCaseText } from '../../src/model/index.js';
import { solvePlant } from '../../src/plant/index.js';

// Every quantity in the demo case, found by its number-and-unit shape.
const MILL = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');
const QUANTITY = /(?<=: |\{ |, |min: |max: )(\d+(?:\.\d+)?)(?= ?(?:t\/h|MW|kW|barg|degC|%|EUR\/GJ|EUR\/MWh|kJ\/kg))/g;
const SITES = [...MILL.matchAll(QUANTITY)].map((match) => match.index!);

function scaled(text: string, edits: { site: number; factor: number }[]): string {
  let out = text;
  // One factor per place, applied right to left so earlier offsets stay valid.
  const factors = new Map(edits.map((edit) => [SITES[edit.site % SITES.length], edit.factor]));
  for (const [at, factor] of [...factors].sort((a, b) => b[0] - a[0])) {
    const number = /^\d+(?:\.\d+)?/.exec(out.slice(at))![0];
    out = out.slice(0, at) + String(Number((Number(number) * factor).toPrecision(4))) + out.slice(at + number.length);
  }
  return out;
}

describe('solvePlant on perturbed demo plants', () => {
  it('property: a case that loads ends in a balance or a located diagnosis, never an exception', async () => {
    expect(SITES.length).toBeGreaterThan(50);
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.record({ site: fc.nat(), factor: fc.constantFrom(0.05, 0.5, 0.8, 1.25, 2, 10) }), { minLength: 1, maxLength: 4 }),
        async (edits) => {
          const loaded = loadCaseText(scaled(MILL, edits), 'mill.yaml');
          if (!loaded.ok) return;
          const outcome = await solvePlant(loaded.plant);
          if (outcome.ok) expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
          else expect(outcome.message.length).toBeGreaterThan(10);
        },
      ),
      { numRuns: Number(process.env.FUZZ_RUNS ?? 40) },
    );
  });
});
