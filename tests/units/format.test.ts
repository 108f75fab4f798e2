import { describe, expect, test } from 'vitest';
import { displayUnit, formatQuantity, quantityKinds, type UnitSystem } from '../../src/units/index.js';
import { formatNumber } from '../../src/units/format.js';

describe('displayUnit', () => {
  test('SI and US display units for every kind', () => {
    const table = Object.fromEntries(
      quantityKinds.map((kind) => [kind, (['si', 'us'] as UnitSystem[]).map((system) => displayUnit(kind, system)).join(' | ')]),
    );
    expect(table).toMatchInlineSnapshot(`
      {
        "emissionFactor": "kg/GJ | lb/MMBtu",
        "energy": "GJ | MMBtu",
        "energyPrice": "$/GJ | $/MMBtu",
        "mass": "t | klb",
        "massFlow": "t/h | klb/h",
        "massPrice": "$/t | $/klb",
        "percent": "% | %",
        "power": "kW | kW",
        "pressure": "barg | psig",
        "specificEnthalpy": "kJ/kg | Btu/lb",
        "specificEntropy": "kJ/(kg K) | Btu/(lb R)",
        "temperature": "degC | degF",
        "temperatureDifference": "K | degF",
      }
    `);
  });
});

describe('formatNumber', () => {
  test.each([
    [42, 3, '42.0'],
    [4.2, 3, '4.20'],
    [0.0234, 3, '0.0234'],
    [2803.4, 3, '2803'],
    [2803.6, 3, '2804'],
    [0, 3, '0.00'],
    [-0.0001, 2, '-0.00010'],
    [-0.0001, 1, '-0.0001'],
    [-1e-9, 3, '-0.00000000100'],
    [-1e-15, 3, '0.000000000000'],
    [600, 4, '600.0'],
  ])('%s with %s digits is "%s"', (value, digits, expected) => {
    expect(formatNumber(value, digits)).toBe(expected);
  });
});

describe('formatQuantity', () => {
  test('a header at 42 barg reads 42.0 barg in SI and 609 psig in US units', () => {
    expect(formatQuantity(4.301325, 'pressure', 'si')).toBe('42.0 barg');
    expect(formatQuantity(4.301325, 'pressure', 'us')).toBe('609 psig');
  });

  test('gauge display follows the site atmospheric pressure', () => {
    expect(formatQuantity(1.085, 'pressure', 'si', { atmosphericPressure_MPa: 0.085 })).toBe('10.0 barg');
  });

  test('one value in each kind, in both systems', () => {
    const values: [kind: Parameters<typeof formatQuantity>[1], valueSI: number][] = [
      ['temperature', 673.15],
      ['temperatureDifference', 10],
      ['massFlow', 60 / 3.6],
      ['mass', 20_000],
      ['energy', 1000],
      ['power', 5000],
      ['specificEnthalpy', 2800],
      ['specificEntropy', 6.5],
      ['energyPrice', 9],
      ['massPrice', 2.5],
      ['emissionFactor', 56.1],
      ['percent', 0.02],
    ];
    const lines = values.map(([kind, value]) => `${kind}: ${formatQuantity(value, kind, 'si')} | ${formatQuantity(value, kind, 'us')}`);
    expect(lines).toMatchInlineSnapshot(`
      [
        "temperature: 400 degC | 752 degF",
        "temperatureDifference: 10.0 K | 18.0 degF",
        "massFlow: 60.0 t/h | 132 klb/h",
        "mass: 20.0 t | 44.1 klb",
        "energy: 1000 GJ | 948 MMBtu",
        "power: 5000 kW | 5000 kW",
        "specificEnthalpy: 2800 kJ/kg | 1204 Btu/lb",
        "specificEntropy: 6.50 kJ/(kg K) | 1.55 Btu/(lb R)",
        "energyPrice: 9.00 $/GJ | 9.50 $/MMBtu",
        "massPrice: 2.50 $/t | 1.13 $/klb",
        "emissionFactor: 56.1 kg/GJ | 130 lb/MMBtu",
        "percent: 2.00 % | 2.00 %",
      ]
    `);
  });

  test('digits, a chosen unit and the case currency can be given', () => {
    expect(formatQuantity(4.301325, 'pressure', 'si', { digits: 5 })).toBe('42.000 barg');
    expect(formatQuantity(4.301325, 'pressure', 'si', { unit: 'MPa' })).toBe('4.30 MPa');
    expect(formatQuantity(9, 'energyPrice', 'si', { currency: 'EUR' })).toBe('9.00 €/GJ');
    expect(formatQuantity(9, 'energyPrice', 'us', { currency: 'CAD' })).toBe('9.50 CAD/MMBtu');
    expect(formatQuantity(9, 'energyPrice', 'si', { unit: 'EUR/MWh' })).toBe('32.4 EUR/MWh');
  });

  test('bad digits and unknown units are programmer errors', () => {
    expect(() => formatQuantity(1, 'power', 'si', { digits: 0 })).toThrowErrorMatchingInlineSnapshot(`[RangeError: digits must be a positive integer, found 0]`);
    expect(() => formatQuantity(1, 'power', 'si', { unit: 'barg' })).toThrowErrorMatchingInlineSnapshot(`[Error: unknown power unit "barg"; expected one of W, kW, MW, hp, GJ/h, Btu/h, kBtu/h, MMBtu/h, TR]`);
  });
});
