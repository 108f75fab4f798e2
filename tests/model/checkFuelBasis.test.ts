// Fuels on different heating-value bases are refused where they would mix.
import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { issuesOf as sharedIssuesOf } from './caseText.js';

const mill = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');

/** Issues as printed for mill.yaml. */
const issuesOf = (text: string): string => sharedIssuesOf(text, 'mill.yaml');

describe('checkFuelBasis', () => {
  test('a dual-fuel boiler whose fuels are on different bases is refused; the mixed plant is warned about', () => {
    const text = mill.replace('    price: 13.8 EUR/GJ\n    basis: HHV', '    price: 13.8 EUR/GJ\n    basis: LHV');
    expect(text).not.toBe(mill);
    expect(issuesOf(text)).toMatchInlineSnapshot(`
      "mill.yaml:106:12  boilers[1].fuels  boiler boiler_2 burns natural_gas (HHV), fuel_oil (LHV); its one efficiency table cannot be on both heating-value bases. State every fuel it burns on one basis (HHV or LHV)
      mill.yaml:38:3  fuels  warning: the fuels are stated on both HHV and LHV bases: fuel totals, CO2 and the boiler fuel-to-steam efficiency add figures on different bases. Steamwright does not convert between them; state every fuel on one basis"
    `);
  });
  test('one basis throughout passes', () => {
    expect(issuesOf(mill)).toBe('');
  });
});
