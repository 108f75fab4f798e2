import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { loadCaseText } from '../../src/model/index.js';
import { plantResult, solvePlant } from '../../src/plant/index.js';
import { balanceDiagram, htmlReport, plantDisplayFormat } from '../../src/report/index.js';
import { quantitySites, scaledCase } from '../helpers/perturbCase.js';

const MILL = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');
const SITES = quantitySites(MILL);

describe('solvePlant on perturbed demo plants', () => {
  it('property: a case that loads ends in a balance (that the report can draw) or a diagnosis, never an exception', async () => {
    expect(SITES.length).toBeGreaterThan(50);
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.record({ site: fc.nat(), factor: fc.constantFrom(0.05, 0.5, 0.8, 1.25, 2, 10) }), { minLength: 1, maxLength: 4 }),
        async (edits) => {
          const loaded = loadCaseText(scaledCase(MILL, SITES, edits), 'mill.yaml');
          if (!loaded.ok) return;
          const outcome = await solvePlant(loaded.plant);
          if (!outcome.ok) {
            expect(outcome.message.length).toBeGreaterThan(10);
            return;
          }
          expect(outcome.audit.worstRelative).toBeLessThan(1e-6);
          const result = plantResult(outcome);
          // Every vented header says why, and about the flow it vents.
          for (const header of result.headers.filter((candidate) => candidate.vent_kg_s > 1e-6)) {
            expect(result.vents.find((vent) => vent.where === header.id)?.flow_kg_s).toBe(header.vent_kg_s);
          }
          expect(balanceDiagram(result, plantDisplayFormat(loaded.plant))).toMatch(/^<svg/);
          expect(htmlReport(loaded.plant, result)).toMatch(/<\/html>\s*$/);
        },
      ),
      { numRuns: Number(process.env.FUZZ_RUNS ?? 40) },
    );
  });
});
