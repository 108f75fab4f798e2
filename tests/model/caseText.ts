// Helpers for model tests: the starter case as a base, edited by plain text replacement.
import { expect } from 'vitest';
import { formatIssue, loadCaseText, starterCase } from '../../src/model/index.js';

export const starter = starterCase('case.schema.json');

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
