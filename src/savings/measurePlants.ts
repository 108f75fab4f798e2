// Measures resolved to plants through the case's own project mechanism: the
// case text with the measures written as its projects, loaded again, so each
// measure is checked and resolved on every scenario exactly as a planner's
// project would be. A measure that does not load is reported with the reason.
import { parseDocument } from 'yaml';
import { loadCaseText, type Plant } from '../model/index.js';

export type MeasurePlants = { ok: true; plants: { scenario: string; plant: Plant }[] } | { ok: false; reason: string };

/** The case text with its projects replaced by these. */
export function caseWithProjects(caseText: string, projects: Record<string, unknown>[]): string {
  const document = parseDocument(caseText);
  if (projects.length === 0) document.delete('projects');
  else document.set('projects', document.createNode(projects));
  return document.toString({ lineWidth: 0 });
}

export function resolveMeasurePlants(caseText: string, projects: Record<string, unknown>[]): Map<string, MeasurePlants> {
  const resolved = new Map<string, MeasurePlants>();
  if (projects.length === 0) return resolved;
  const together = loadCaseText(caseWithProjects(caseText, projects), 'savings');
  if (together.ok) {
    for (const project of together.variants.projects) resolved.set(project.id, { ok: true, plants: project.plants });
    return resolved;
  }
  // One at a time, to say which measure does not load and why.
  for (const project of projects) {
    const alone = loadCaseText(caseWithProjects(caseText, [project]), 'savings');
    const id = String(project.id);
    if (alone.ok) {
      const found = alone.variants.projects.find((entry) => entry.id === id);
      resolved.set(id, found ? { ok: true, plants: found.plants } : { ok: false, reason: 'the measure did not resolve on any scenario' });
    } else {
      const errors = alone.issues.filter((issue) => issue.severity === 'error');
      resolved.set(id, { ok: false, reason: `the changed case does not load: ${errors.slice(0, 3).map((issue) => `${issue.path}: ${issue.message}`).join('; ')}${errors.length > 3 ? ` (and ${errors.length - 3} more)` : ''}` });
    }
  }
  return resolved;
}
