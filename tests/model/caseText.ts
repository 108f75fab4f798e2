// Helpers for model tests: a small invented plant as a base, edited by plain
// text replacement. It is a fixture of its own (the first starter case), so the
// line numbers the tests expect do not move when `init`'s starter changes.
import { readFileSync } from 'node:fs';
import { expect } from 'vitest';
import { formatIssue, loadCaseText } from '../../src/model/index.js';

export const starter = readFileSync(new URL('./fixtures/small-plant.yaml', import.meta.url), 'utf8');

/** The starter with each [from, to] replacement applied; each `from` must occur. */
export function edited(...replacements: [string, string][]): string {
  let text = starter;
  for (const [from, to] of replacements) {
    expect(text, `"${from}" is not in the starter case`).toContain(from);
    text = text.replace(from, to);
  }
  return text;
}

/** Every issue as the command line prints it, one per line, for a file of that name. */
export function issuesOf(text: string, fileName = 'case.yaml'): string {
  const result = loadCaseText(text, fileName);
  const issues = result.ok ? result.warnings : result.issues;
  return issues.map((issue) => formatIssue(issue, fileName)).join('\n');
}

/** `text` with one replacement, whose `from` must occur. */
export function replaced(text: string, from: string, to: string): string {
  expect(text).toContain(from);
  return text.replace(from, to);
}
