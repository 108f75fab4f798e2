// Connections that load but cannot work as drawn are warned about.
import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { issuesOf as sharedIssuesOf, replaced } from './caseText.js';

const mill = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');

/** Issues as printed for mill.yaml. */
const issuesOf = (text: string): string => sharedIssuesOf(text, 'mill.yaml');

const millWith = (from: string, to: string): string => replaced(mill, from, to);

describe('checkTopology', () => {
  test('condensate sent up into a flash tank at a higher pressure', () => {
    const text = millWith('condensate: { return: 88 %, temperature: 140 degC, to: deaerator }', 'condensate: { return: 88 %, temperature: 140 degC, to: condensate_flash }');
    expect(issuesOf(text)).toMatchInlineSnapshot(`"mill.yaml:198:60  users[3].condensate.to  warning: dryer_section's condensate leaves at lp's 3.500 barg, below flash tank condensate_flash at 3.800 barg; condensate does not flow up into it without a pump"`);
  });
  test('blowdown flash liquid sent to the deaerator', () => {
    const text = millWith('    liquid_to: drain                # blowdown liquid is too dirty to return', '    liquid_to: deaerator');
    expect(issuesOf(text)).toMatchInlineSnapshot(`"mill.yaml:228:16  flash_tanks[1].liquid_to  warning: flash tank blowdown_flash receives boiler blowdown and sends its liquid to the deaerator: that returns the concentrated solids the blowdown removes; send it to drain"`);
  });
  test('a steam import colder than its controlled header names the import and both temperatures', () => {
    const text = millWith('# Turbines: stages in flow order', `steam_imports:
  - { id: neighbour, header: hp, price: 30 EUR/t, max: 10 t/h, temperature: 350 degC }

# Turbines: stages in flow order`);
    expect(issuesOf(text)).toMatchInlineSnapshot(`"mill.yaml:130:77  steam_imports[0].temperature  warning: steam import neighbour delivers at 350.0 degC, colder than hp's set point of 400.0 degC; the header is held by spray, which cools but cannot heat, so the import fits only with hotter steam mixed in"`);
  });
});
