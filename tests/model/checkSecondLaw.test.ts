// The second law at input: stages that would beat an isentropic expansion,
// and Willans stages allowed below their no-load flow, are refused by check.
import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { issuesOf as sharedIssuesOf, replaced } from './caseText.js';
import { statePH, statePS, statePT } from '../../src/properties/index.js';

const mill = readFileSync('cases/kestrel-bay-board-mill.yaml', 'utf8');

/** Issues as printed for mill.yaml. */
const issuesOf = (text: string): string => sharedIssuesOf(text, 'mill.yaml');

const millWith = (from: string, to: string): string => replaced(mill, from, to);

describe('checkSecondLaw', () => {
  test('the bundled board mill passes', () => {
    expect(issuesOf(mill)).toBe('');
  });

  test('an exhaust enthalpy of 2750 kJ/kg on tg1 stage 1 implies 150 %', () => {
    const text = millWith('        isentropic_efficiency: 76 %', '        exhaust_enthalpy: 2750 kJ/kg');
    expect(issuesOf(text)).toMatchInlineSnapshot(`"mill.yaml:140:27  turbines[0].stages[0].exhaust_enthalpy  stage 1 of turbine tg1: its exhaust enthalpy 2750 kJ/kg implies an isentropic efficiency of 150 % from hp at its set point; no turbine passes 100 %. Check the figure and its units"`);
    // By hand with IF97: hp at 42 barg on 101.3 kPa and 400 degC, isentropic to 12 barg.
    const inlet = statePT(0.1013 + 4.2, 673.15);
    const isentropic = statePS(0.1013 + 1.2, inlet.s);
    expect(((inlet.h - 2750) / (inlet.h - isentropic.h)) * 100).toBeCloseTo(150, -0.3);
  });

  test('a Willans slope of 300 kJ/kg on bpt1 implies at least 136 % from any state its floating inlet can reach', () => {
    const text = millWith('slope: 150 kJ/kg', 'slope: 300 kJ/kg');
    expect(issuesOf(text)).toMatchInlineSnapshot(`"mill.yaml:157:23  turbines[1].stages[0].willans_line  stage 1 of turbine bpt1: its Willans line (slope 300 kJ/kg, intercept 60 kW) at 20.00 t/h implies an isentropic efficiency of at least 136 % from any state mp can reach; no turbine passes 100 %. Check the figure and its units"`);
  });

  test('an exhaust temperature too cold for its stage is refused, naming the stage', () => {
    // 42 barg 400 degC to 12 barg isentropically ends near 260 degC; 200 degC needs more than isentropic work.
    const text = millWith('        isentropic_efficiency: 76 %', '        exhaust_temperature: 200 degC');
    expect(issuesOf(text)).toMatch(/^mill\.yaml:140:\d+ {2}turbines\[0\]\.stages\[0\]\.exhaust_temperature {2}stage 1 of turbine tg1: its exhaust temperature 200 degC implies an isentropic efficiency of 1\d\d % from hp at its set point/);
    const inlet = statePT(0.1013 + 4.2, 673.15);
    expect(statePS(0.1013 + 1.2, inlet.s).T - 273.15).toBeGreaterThan(200);
  });

  test('a stage just inside the second law passes: exhaust at the isentropic enthalpy plus 1 kJ/kg', () => {
    const inlet = statePT(0.1013 + 4.2, 673.15);
    const isentropic = statePS(0.1013 + 1.2, inlet.s).h;
    const text = millWith('        isentropic_efficiency: 76 %', `        exhaust_enthalpy: ${(isentropic + 1).toFixed(1)} kJ/kg`);
    expect(issuesOf(text)).toBe('');
    expect(statePH(0.1013 + 1.2, isentropic + 1).s).toBeGreaterThan(inlet.s);
  });

  test('a Willans stage allowed below its no-load flow gets a no-load warning', () => {
    const text = millWith('section_flow: { min: 4 t/h, max: 20 t/h }', 'section_flow: { min: 1 t/h, max: 20 t/h }');
    // No-load flow = intercept / slope = 60 kW / 150 kJ/kg = 0.4 kg/s = 1.44 t/h.
    expect(issuesOf(text)).toMatchInlineSnapshot(`"mill.yaml:158:23  turbines[1].stages[0].section_flow  warning: stage 1 of turbine bpt1 may run down to 1.000 t/h, below its Willans line's no-load flow of 1.440 t/h (intercept / slope), where it makes no power; running, it passes at least the no-load flow. Set section_flow min to it"`);
  });
});
