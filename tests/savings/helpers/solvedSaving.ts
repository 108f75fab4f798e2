// The check every savings test leans on: a changed plant's annual saving
// computed apart from findSavings, each scenario's base and changed plant
// solved on their own and weighted by the scenario's hours.
import { loadCaseText, type LoadResult } from '../../../src/model/index.js';
import { plantResult, solvePlant } from '../../../src/plant/index.js';
import { caseWithProjects } from '../../../src/savings/index.js';

export type Loaded = Extract<LoadResult, { ok: true }>;

export function load(text: string, file = 'case.yaml'): Loaded {
  const loaded = loadCaseText(text, file);
  if (!loaded.ok) throw new Error(loaded.issues.map((issue) => `${issue.path}: ${issue.message}`).join('\n'));
  return loaded;
}

/** Hours x (base cost - changed cost) over the scenarios, each plant solved on its own here. */
export async function solvedSaving(text: string, changes: Record<string, unknown>): Promise<number> {
  const base = load(text);
  const changed = load(caseWithProjects(text, [{ id: 'check', capital_cost: '1 USD', life: 10, discount_rate: '8 %', changes }]));
  let saving = 0;
  for (const scenario of base.variants.scenarios) {
    const before = await solvePlant(scenario.plant);
    if (!before.ok) throw new Error(before.message);
    const plant = changed.variants.projects[0].plants.find((entry) => entry.scenario === scenario.id)!.plant;
    const after = await solvePlant(plant, { commitment: new Map(Object.entries(plantResult(before).commitment)), start: before.start });
    if (!after.ok) throw new Error(after.message);
    saving += scenario.hours * (plantResult(before).totals.cost_per_h - plantResult(after).totals.cost_per_h);
  }
  return saving;
}
