// Schema problems in plain words: missing and unknown keys, wrong types and units, one message per union.
import { expect, test } from 'vitest';
import { edited, issuesOf } from './caseText.js';

test('a missing key names what it wants', () => {
  expect(issuesOf(edited(['    capacity: 12 t/h\n', '']))).toMatchInlineSnapshot(`"case.yaml:47:5  letdowns[0].capacity  missing key "capacity": expected a mass flow with its unit, such as "40 t/h""`);
});

test('an unknown key suggests the nearest known one', () => {
  expect(issuesOf(edited(['    capacity: 12 t/h', '    capacty: 12 t/h']))).toMatchInlineSnapshot(`
    "case.yaml:47:5  letdowns[0].capacity  missing key "capacity": expected a mass flow with its unit, such as "40 t/h"
    case.yaml:50:5  letdowns[0].capacty  unknown key "capacty"; did you mean "capacity"?"
  `);
});

test('a bare number where a quantity belongs asks for its unit', () => {
  expect(issuesOf(edited(['pressure: 10 barg', 'pressure: 10']))).toMatchInlineSnapshot(`"case.yaml:29:15  headers[0].pressure  expected a pressure with its unit, such as "42 barg", found 10"`);
});

test('a word where a flow belongs', () => {
  expect(issuesOf(edited(['steam: 6 t/h', 'steam: sixty']))).toMatchInlineSnapshot(`"case.yaml:56:12  users[0].steam  expected a mass flow with its unit, such as "12 t/h", found "sixty""`);
});

test('a unit of the wrong kind names the kinds', () => {
  expect(issuesOf(edited(['steam: 6 t/h', 'steam: 6 t']))).toMatchInlineSnapshot(`"case.yaml:56:12  users[0].steam  "6 t" is a mass, not a mass flow; expected one of kg/s, kg/min, kg/h, t/h, t/d, lb/s, lb/min, lb/h, klb/h"`);
});

test('a union reports the branch the data was meant for', () => {
  expect(issuesOf(edited(['blowdown: 3 %', 'blowdown: { cycles: 30 }']))).toMatchInlineSnapshot(`
    "case.yaml:44:15  boilers[0].blowdown.cycles_of_concentration  missing key "cycles_of_concentration": expected boiler water over feedwater concentration
    case.yaml:44:17  boilers[0].blowdown.cycles  unknown key "cycles"; expected one of cycles_of_concentration"
  `);
});

test('a union with no fitting branch gives its own message', () => {
  expect(issuesOf(edited(['desuperheater: none', 'desuperheater: nothing']))).toMatchInlineSnapshot(`"case.yaml:51:20  letdowns[0].desuperheater  expected none or { target_temperature, spray_water }; found "nothing""`);
});

test('a floating header with a temperature', () => {
  expect(issuesOf(edited(['state: floating', 'state: floating\n    temperature: 150 degC']))).toMatchInlineSnapshot(`"case.yaml:32:5  headers[1]  a floating header takes no temperature or enthalpy: its state is set by mixing"`);
});

test('every problem at once', () => {
  expect(issuesOf(edited(['units: si', 'units: metric'], ['currency: EUR', 'currency: euro'], ['vent: 0.5 %', 'vent: lots']))).toMatchInlineSnapshot(`
    "case.yaml:14:13  site.currency  expected a three-letter currency code such as "EUR", found "euro"
    case.yaml:15:10  site.units  expected one of si, us, found "metric"
    case.yaml:62:9  deaerator.vent  expected a percentage with its unit, such as "0.5 %", found "lots""
  `);
});
