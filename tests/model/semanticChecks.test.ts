// One small failing case per semantic check, with the exact message a user reads.
import { describe, expect, test } from 'vitest';
import { loadCaseText } from '../../src/model/index.js';
import { edited, issuesOf, starter } from './caseText.js';

test('the starter case passes with no issues', () => {
  const result = loadCaseText(starter, 'case.yaml');
  expect(result.ok).toBe(true);
  expect(issuesOf(starter)).toBe('');
});

describe('references and ids', () => {
  test('an unknown header is named with the known ones', () => {
    expect(issuesOf(edited(['    header: lp\n    steam: 6 t/h', '    header: lpp\n    steam: 6 t/h']))).toMatchInlineSnapshot(`"case.yaml:55:13  users[0].header  no header with id "lpp"; known: hp, lp"`);
  });
  test('a reference to the wrong kind of unit says what it is', () => {
    expect(issuesOf(edited(['fuels: [gas]', 'fuels: [hp]']))).toMatchInlineSnapshot(`"case.yaml:40:13  boilers[0].fuels[0]  expected a fuel, found "hp", which is a header"`);
  });
  test('a duplicate id names the first use and its line', () => {
    expect(issuesOf(edited(['  - id: process', '  - id: boiler_1']))).toMatchInlineSnapshot(`"case.yaml:54:9  users[0].id  id "boiler_1" is already used by the boiler at boilers[0] (line 38); ids must be unique across the plant"`);
  });
  test('a reserved word cannot be an id', () => {
    expect(issuesOf(edited(['  - id: process', '  - id: drain']))).toMatchInlineSnapshot(`"case.yaml:54:9  users[0].id  "drain" is a reserved word in references (deaerator, drain, atmosphere, generator, none, saturated); choose another id"`);
  });
});

describe('pressures only fall', () => {
  test('a letdown to a higher pressure', () => {
    expect(issuesOf(edited(['    from: hp\n    to: lp', '    from: lp\n    to: hp']))).toMatchInlineSnapshot(`
      "case.yaml:32:5  headers[1]  header lp has no possible source of steam: no boiler, steam import, turbine stage, letdown or flash tank feeds it
      case.yaml:49:9  letdowns[0].to  letdown goes from lp at 3.000 barg to hp at 10.00 barg; a letdown must go to a lower pressure"
    `);
  });
  test('a turbine stage to a higher pressure', () => {
    const text = edited(['letdowns:', 'turbines:\n  - id: t1\n    inlet: lp\n    stages:\n      - to: hp\n        isentropic_efficiency: 70 %\nletdowns:']);
    expect(issuesOf(text)).toMatchInlineSnapshot(`"case.yaml:50:13  turbines[0].stages[0].to  stage exhausts to header hp at 10.00 barg, not below the inlet header lp at 3.000 barg; steam only expands to a lower pressure"`);
  });
});

describe('states', () => {
  test('a controlled header at or below saturation', () => {
    expect(issuesOf(edited(['temperature: 220 degC', 'temperature: 180 degC']))).toMatchInlineSnapshot(`"case.yaml:31:18  headers[0].temperature  header temperature 180 degC is at or below saturation (184.1 degC at 10.00 barg); give a higher temperature, or make the header floating"`);
  });
  test('a header above the critical pressure is outside the steam tables', () => {
    expect(issuesOf(edited(['pressure: 10 barg', 'pressure: 250 bara']))).toMatchInlineSnapshot(`"case.yaml:29:15  headers[0].pressure  pressure 250 bara is at or above the critical pressure 219.6 barg; a steam header or vessel must be below it"`);
  });
  test('a header temperature beyond IF97 region 2 is refused with its limit', () => {
    expect(issuesOf(edited(['temperature: 220 degC', 'temperature: 900 degC'], ['outlet_temperature: 225 degC', 'outlet_temperature: 905 degC']))).toMatchInlineSnapshot(`"case.yaml:31:18  headers[0].temperature  header state is outside the steam tables (IAPWS-IF97 regions 1, 2 and 4): state at 1.10133 MPa, 1173.15 K lies in IF97 region 5 (above 1073.15 K), which steamwright does not implement; it covers p <= 100 MPa, 273.15 K <= T <= 1073.15 K outside region 3"`);
  });
  test('a desuperheater target at saturation', () => {
    expect(issuesOf(edited(['desuperheater: none', 'desuperheater: { target_temperature: 140 degC, spray_water: feedwater }']))).toMatchInlineSnapshot(`"case.yaml:51:42  letdowns[0].desuperheater.target_temperature  desuperheater target 140 degC is at or below saturation (143.7 degC at 3.000 barg); give a temperature above it"`);
  });
});

describe('limits', () => {
  test('min above max', () => {
    expect(issuesOf(edited(['steam: { min: 3 t/h, max: 15 t/h }', 'steam: { min: 30 t/h, max: 15 t/h }']))).toMatchInlineSnapshot(`"case.yaml:41:19  boilers[0].steam.min  min 30.00 t/h is above max 15.00 t/h"`);
  });
  test('percentages outside 0 to 100', () => {
    expect(issuesOf(edited(['efficiency: 84 %', 'efficiency: 184 %'], ['return: 80 %', 'return: -5 %']))).toMatchInlineSnapshot(`
      "case.yaml:43:17  boilers[0].efficiency  expected a percentage of at least 0.1 % and at most 100 %, found "184 %"
      case.yaml:57:27  users[0].condensate.return  expected a percentage from 0 % to 100 %, found "-5 %""
    `);
  });
  test('a price in another currency', () => {
    expect(issuesOf(edited(['price: 9 EUR/GJ', 'price: 9 USD/GJ']))).toMatchInlineSnapshot(`"case.yaml:19:12  fuels[0].price  expected a price in EUR (the site currency), found "9 USD/GJ" in USD"`);
  });
});

describe('flows need somewhere to go and something to come from', () => {
  test('returned condensate with nowhere to go', () => {
    expect(issuesOf(edited(['return: 80 %, temperature: 95 degC, to: deaerator', 'return: 80 %, temperature: 95 degC']))).toMatchInlineSnapshot(`"case.yaml:57:17  users[0].condensate  80 % of the condensate is returned but has nowhere to go: add to (a flash tank id, deaerator or drain)"`);
  });
  test('a header with no possible source', () => {
    expect(issuesOf(edited(['    from: hp\n    to: lp', '    from: hp\n    to: hp']))).toMatchInlineSnapshot(`
      "case.yaml:32:5  headers[1]  header lp has no possible source of steam: no boiler, steam import, turbine stage, letdown or flash tank feeds it
      case.yaml:49:9  letdowns[0].to  letdown goes from hp at 10.00 barg to hp at 10.00 barg; a letdown must go to a lower pressure"
    `);
  });
  test('a machine with no drive', () => {
    expect(issuesOf(edited(['objective:', 'machines:\n  - { id: fan_1, type: fan, shaft_power: 200 kW }\nobjective:']))).toMatchInlineSnapshot(`"case.yaml:65:5  machines[0]  fan_1 has no drive: give motor_efficiency for an electric motor, or name it in a turbine's drives"`);
  });
});

describe('warnings for legal but suspicious values', () => {
  test('efficiency above 95 %, blowdown above 10 %, venting on the highest header', () => {
    const text = edited(['efficiency: 84 %', 'efficiency: 96 %'], ['blowdown: 3 %', 'blowdown: 12 %'], ['temperature: 220 degC', 'temperature: 220 degC\n    venting: allowed']);
    const result = loadCaseText(text, 'case.yaml');
    expect(result.ok).toBe(true);
    expect(issuesOf(text)).toMatchInlineSnapshot(`
      "case.yaml:32:14  headers[0].venting  warning: venting is allowed on hp, the highest-pressure header; venting the most valuable steam is rarely intended
      case.yaml:44:17  boilers[0].efficiency  warning: boiler efficiency 96 % is above 95 %; check the value and its heating-value basis
      case.yaml:45:15  boilers[0].blowdown  warning: blowdown 12 % of feedwater is above 10 %; check the value (typical blowdown is 1 to 8 %)"
    `);
  });
  test('errors come before warnings', () => {
    expect(issuesOf(edited(['efficiency: 84 %', 'efficiency: 96 %'], ['ambient_temperature: 15 degC', 'ambient_temperature: 15 degrees']))).toMatchInlineSnapshot(`
      "case.yaml:12:24  site.ambient_temperature  "15 degrees" is not a temperature: unknown unit "degrees"; expected one of K, degC, degF, degR
      case.yaml:43:17  boilers[0].efficiency  warning: boiler efficiency 96 % is above 95 %; check the value and its heating-value basis"
    `);
  });
});

describe('defaults are listed, never silent', () => {
  test('the starter relies on these defaults', () => {
    const result = loadCaseText(starter, 'case.yaml');
    if (!result.ok) throw new Error('starter must load');
    expect(result.plant.defaults.map((entry) => `${entry.path} = ${entry.value}`)).toMatchInlineSnapshot(`
      [
        "site.atmospheric_pressure = 101.325 kPa",
        "site.carbon_price = 0",
        "power.import.co2 = 0",
        "power.export = none",
        "headers[0].venting = forbidden",
        "boilers[0].blowdown_to = drain",
        "boilers[0].can_switch_off = true",
        "deaerator.feedwater_pumps = pump work at 100 % efficiency, bought as electricity",
      ]
    `);
  });
});

describe('scenario hours', () => {
  const withScenario = (hours: string): string => `${starter}\nscenarios:\n  - id: winter\n    hours: ${hours}\n    changes: {}\n`;
  test('hours as a number or as a quantity in hours', () => {
    for (const hours of ['3000', '"3000 h"', '"3,000 hours"', '"3000 h/yr"']) {
      const result = loadCaseText(withScenario(hours), 'case.yaml');
      expect(result.ok, hours).toBe(true);
      if (result.ok) expect(result.variants.scenarios[0].hours, hours).toBe(3000);
    }
  });
  test('hours in another unit, or beyond a leap year, are refused with their line', () => {
    expect(issuesOf(withScenario('"125 days"'))).toMatch(/^case\.yaml:\d+:12 {2}scenarios\[0\]\.hours {2}expected hours a year such as 3000 or "3000 h", found "125 days"$/);
    expect(issuesOf(withScenario('"9000 h"'))).toMatch(/expected hours a year above 0 and at most 8784 \(a leap year\), found "9000 h"$/);
  });
});
