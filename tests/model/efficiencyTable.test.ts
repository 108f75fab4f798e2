// A boiler allowed below its efficiency table's first point is warned about.
import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { issuesOf as sharedIssuesOf } from './caseText.js';

const creamery = readFileSync('cases/millbrook-creamery.yaml', 'utf8');

/** Issues as printed for creamery.yaml. */
const issuesOf = (text: string): string => sharedIssuesOf(text, 'creamery.yaml');

describe('the efficiency table and the minimum load', () => {
  test('a minimum load of 20 % under a table that starts at 30 % is warned about, with the efficiency used there', () => {
    const text = creamery.replace('steam: { min: 9 klb/h, max: 30 klb/h }', 'steam: { min: 6 klb/h, max: 30 klb/h }');
    expect(text).not.toBe(creamery);
    expect(issuesOf(text)).toMatchInlineSnapshot(`"creamery.yaml:58:19  boilers[0].steam.min  warning: boiler boiler_a may run down to 20 % load, below its efficiency table's first point at 30 %; there the efficiency is taken as 79.0 %, the first point's. Add a point at the minimum load"`);
  });
  test('a minimum at the first point, or a single efficiency figure, is not', () => {
    expect(issuesOf(creamery)).toBe('');
  });
});
