// Demo cases solved once per test file, and a copy whose texts try to inject markup.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect } from 'vitest';
import { loadCaseText, type Plant } from '../../../src/model/index.js';
import { plantResult, solvePlant, type PlantResult } from '../../../src/plant/index.js';
import type { ScenarioSection } from '../../../src/report/index.js';
import { projectRoot } from '../../helpers/cli.js';

export const DEMO_CASES = ['kestrel-bay-board-mill', 'millbrook-creamery', 'orchard-vale-foods'] as const;

export interface Solved {
  plant: Plant;
  result: PlantResult;
}

export function demoCaseText(name: string): string {
  return readFileSync(join(projectRoot, 'cases', `${name}.yaml`), 'utf8');
}

export const HOSTILE_NAME = `Mill <script>alert("x")</script> & 'Sons' "Ltd"`;
export const HOSTILE_HEADER = `<img src=x onerror=alert(1)> & "high"`;

/** The board-mill demo with markup, quotes and ampersands in its name, description and a header name. */
export function hostileCaseText(): string {
  return demoCaseText('kestrel-bay-board-mill')
    .replace('name: Kestrel Bay Board Mill', `name: ${JSON.stringify(HOSTILE_NAME)}`)
    .replace('name: High-pressure header', `name: ${JSON.stringify(HOSTILE_HEADER)}`)
    .replace(/description: >\n/, 'description: >\n  <b>bold</b> & <script>document.title="owned"</script>\n');
}

export async function solveText(text: string, fileName = 'case.yaml'): Promise<Solved> {
  const loaded = loadCaseText(text, fileName);
  if (!loaded.ok) throw new Error(`${fileName} did not load: ${loaded.issues.map((issue) => issue.message).join('; ')}`);
  const outcome = await solvePlant(loaded.plant);
  expect(outcome.ok, outcome.ok ? '' : outcome.message).toBe(true);
  if (!outcome.ok) throw new Error(outcome.message);
  return { plant: loaded.plant, result: plantResult(outcome) };
}

/** Every scenario of a demo case, solved in process (none when the case has no scenarios). */
export async function scenarioSections(name: string): Promise<ScenarioSection[]> {
  const loaded = loadCaseText(demoCaseText(name), `${name}.yaml`);
  if (!loaded.ok || loaded.variants.implicitBase) return [];
  const sections: ScenarioSection[] = [];
  for (const scenario of loaded.variants.scenarios) {
    const solved = await solvePlant(scenario.plant);
    if (!solved.ok) throw new Error(`scenario ${scenario.id}: ${solved.message}`);
    sections.push({ id: scenario.id, name: scenario.name, hours: scenario.hours, plant: scenario.plant, result: plantResult(solved) });
  }
  return sections;
}

export function solveDemo(name: string): Promise<Solved> {
  return solveText(demoCaseText(name), `${name}.yaml`);
}
