// Every bundled case, its scenarios and its projects pass the independent
// audit: balances within 1e-6 relative, no negative entropy generation.
import { describe, expect, it } from 'vitest';
import { readdirSync } from 'node:fs';
import { loadCase, type Plant } from '../../../src/model/index.js';
import { solvePlant } from '../../../src/plant/index.js';
import { BALANCE_TOLERANCE } from '../../../src/plant/verify/index.js';

describe('the independent audit on the bundled cases', () => {
  const cases = readdirSync('cases').filter((name) => name.endsWith('.yaml'));
  for (const name of cases) {
    it(`${name}: the plant, every scenario and every project variant pass`, async () => {
      const loaded = await loadCase(`cases/${name}`);
      if (!loaded.ok) throw new Error(`${name} does not load`);
      const plants: [string, Plant][] = [
        ['plant', loaded.plant],
        ...loaded.variants.scenarios.map((scenario): [string, Plant] => [`scenario ${scenario.id}`, scenario.plant]),
        ...loaded.variants.projects.flatMap((project) => project.plants.map((entry): [string, Plant] => [`project ${project.id} in ${entry.scenario}`, entry.plant])),
      ];
      expect(plants.length).toBeGreaterThan(3);
      for (const [label, plant] of plants) {
        const outcome = await solvePlant(plant);
        if (!outcome.ok) throw new Error(`${name} ${label}: ${outcome.message}`);
        const audit = outcome.independentAudit;
        expect(audit.ok, `${name} ${label}: ${audit.summary}`).toBe(true);
        expect(audit.worst_balance_relative, `${name} ${label}`).toBeLessThanOrEqual(BALANCE_TOLERANCE);
        for (const unit of audit.units) {
          if (unit.entropy_generation_kW_K === null) continue;
          // Round-off allowance of ENTROPY_TOLERANCE, scaled by the unit's entropy flow (a few kW/K at most).
          expect(unit.entropy_generation_kW_K, `${name} ${label} ${unit.id}`).toBeGreaterThanOrEqual(-1e-3);
        }
        // Every unit of the plant is audited.
        const audited = new Set(audit.units.map((unit) => unit.id));
        for (const id of [...plant.headers, ...plant.boilers, ...plant.turbines, ...plant.letdowns, ...plant.users, ...plant.flashTanks, ...(plant.absorptionChillers ?? []), ...(plant.steamTraps ?? [])].map((unit) => unit.id)) {
          expect(audited.has(id), `${name} ${label}: ${id} audited`).toBe(true);
        }
      }
    });
  }
});
