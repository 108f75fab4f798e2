import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { fromSI, quantityKinds, toSI, unitsOf } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// Round trips over every accepted spelling of every kind. Offsets (degC,
// degF, gauge pressures) lose digits when the value is small beside the
// offset, so the tolerance is relative to the larger of the two.
describe('fromSI undoes toSI for every unit', () => {
  for (const kind of quantityKinds) {
    test(`every ${kind} unit round-trips`, () => {
      const units = unitsOf(kind);
      fc.assert(
        fc.property(
          fc.constantFrom(...units),
          fc.double({ min: -1e6, max: 1e6, noNaN: true }),
          fc.double({ min: 0.05, max: 0.11, noNaN: true }),
          (unit, value, atmosphere) => {
            const options = { atmosphericPressure_MPa: atmosphere };
            const internal = toSI(value, kind, unit, options);
            const back = fromSI(internal, kind, unit, options);
            const scale = Math.max(Math.abs(value), 500);
            expect(Math.abs(back - value) / scale).toBeLessThan(1e-12);
          },
        ),
      );
    });
  }
});

describe('toSI and fromSI', () => {
  test('fromSI(0.101325 MPa) is 0 barg, 0 psig and 1 atm', () => {
    expect(fromSI(0.101325, 'pressure', 'barg')).toBe(0);
    expect(fromSI(0.101325, 'pressure', 'psig')).toBe(0);
    expect(fromSI(0.101325, 'pressure', 'atm')).toBe(1);
  });

  test('fromSI(373.15 K) is 212 degF (NIST SP 811 4.2.1.1)', () => {
    expectClose(fromSI(373.15, 'temperature', 'degF'), 212, 1e-15, 'boiling point in degF');
  });

  test('fromSI takes the same spellings as the parser, prices in any currency', () => {
    expectClose(fromSI(10, 'energyPrice', 'EUR/MWh'), 36, 1e-15, 'EUR/MWh');
    expectClose(fromSI(1, 'massPrice', '$/klb'), 0.45359237, 1e-15, '$/klb');
  });

  test('an unknown unit is a programmer error that lists the units of the kind', () => {
    expect(() => toSI(1, 'pressure', 'bananas')).toThrowErrorMatchingInlineSnapshot(`[Error: unknown pressure unit "bananas"; expected one of Pa, kPa, kPag, MPa, MPag, bara, barg, psia, psig, atm]`);
    expect(() => fromSI(1, 'massFlow', 'barg')).toThrowErrorMatchingInlineSnapshot(`[Error: unknown massFlow unit "barg"; expected one of kg/s, kg/min, kg/h, t/h, t/d, lb/s, lb/min, lb/h, klb/h]`);
  });
});

describe('unitsOf', () => {
  test('lists canonical spellings and their aliases', () => {
    expect(unitsOf('pressure')).toMatchInlineSnapshot(`
      [
        "Pa",
        "kPa",
        "kPa(a)",
        "kPaa",
        "kPag",
        "kPa(g)",
        "MPa",
        "MPa(a)",
        "MPaa",
        "MPag",
        "MPa(g)",
        "bara",
        "bar(a)",
        "barg",
        "bar(g)",
        "psia",
        "psi(a)",
        "psig",
        "psi(g)",
        "atm",
      ]
    `);
    expect(unitsOf('massPrice')).toMatchInlineSnapshot(`
      [
        "$/t",
        "$/tonne",
        "$/kg",
        "$/lb",
        "$/lbm",
        "$/klb",
        "$/1000 lb",
      ]
    `);
  });

  test('every listed spelling converts as its own kind', () => {
    for (const kind of quantityKinds) {
      for (const unit of unitsOf(kind)) expect(Number.isFinite(toSI(1, kind, unit)), `${kind} ${unit}`).toBe(true);
    }
  });
});
