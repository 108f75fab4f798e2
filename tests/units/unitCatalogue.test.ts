import { describe, expect, test } from 'vitest';
import { quantityKinds, type QuantityKind } from '../../src/units/kinds.js';
import { canonicalUnits, findUnit, kindsOfUnit, unitKey } from '../../src/units/unitCatalogue.js';

describe('unit catalogue', () => {
  test('spaces and middle dots do not matter', () => {
    expect(unitKey(' kJ / (kg · K) ')).toBe('kJ/(kgK)');
    expect(findUnit('temperature', 'deg C')?.unit).toBe('degC');
  });

  test('letter case is free when the kind has no unit differing only in case', () => {
    expect(findUnit('pressure', 'KPAG')?.unit).toBe('kPag');
    expect(findUnit('energy', 'mmbtu')?.unit).toBe('MMBtu');
    expect(findUnit('specificEntropy', 'BTU/(LB R)')?.unit).toBe('Btu/(lb R)');
  });

  test('an exact spelling wins over a case-folded one', () => {
    expect(findUnit('pressure', 'MPa')?.unit).toBe('MPa');
  });

  test('a spelling shared by two kinds is found in both, temperature first', () => {
    expect(kindsOfUnit('degC')).toEqual(['temperature', 'temperatureDifference']);
    expect(kindsOfUnit('bananas')).toEqual([]);
  });

  test('a price unit needs a currency and a slash', () => {
    expect(findUnit('energyPrice', 'GJ')).toBeUndefined();
    expect(findUnit('energyPrice', '$GJ')).toBeUndefined();
    expect(findUnit('energyPrice', 'JPY/GJ')).toMatchObject({ unit: 'JPY/GJ', currency: 'JPY' });
  });

  // DESIGN.md, "Internal units"; percent is stored as a fraction, so 100 % is 1.
  const internalUnits: Record<QuantityKind, string> = {
    pressure: 'MPa',
    temperature: 'K',
    temperatureDifference: 'K',
    massFlow: 'kg/s',
    mass: 'kg',
    energy: 'GJ',
    power: 'kW',
    specificEnthalpy: 'kJ/kg',
    specificEntropy: 'kJ/(kg K)',
    energyPrice: '$/GJ',
    massPrice: '$/t',
    emissionFactor: 'kg/GJ',
    percent: '%',
  };
  test.each(quantityKinds)('the internal unit of %s is one of its canonical units with factor 1 (100 for percent)', (kind) => {
    const unit = internalUnits[kind];
    expect(canonicalUnits(kind)).toContain(unit);
    const definition = findUnit(kind, unit)?.definition;
    expect(definition?.factor).toBe(kind === 'percent' ? 0.01 : 1);
    expect(definition?.zero ?? 0).toBe(0);
  });
});
