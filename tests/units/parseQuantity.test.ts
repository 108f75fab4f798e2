import { describe, expect, test } from 'vitest';
import { parseQuantity, type ParseResult, type QuantityKind } from '../../src/units/index.js';
import { expectClose } from '../helpers/expectClose.js';

// 1 psi = 4.4482216152605 N / (0.0254 m)^2 = 6894.757293168361 Pa (exact
// definition, NIST SP 811 B.8), here in MPa.
const PSI_MPA = 0.006894757293168361;

function valueOf(result: ParseResult): number {
  if (!result.ok) throw new Error(`expected a value, got: ${result.message}`);
  return result.value;
}

function messageOf(text: string, kind: QuantityKind, options?: { atmosphericPressure_MPa?: number }): string {
  const result = parseQuantity(text, kind, options);
  if (result.ok) throw new Error(`expected an error for "${text}", got ${result.value} ${result.unit}`);
  return result.message;
}

describe('parseQuantity reads numbers and units', () => {
  const cases: [text: string, kind: QuantityKind, expected: number][] = [
    ['42 barg', 'pressure', 4.301325],
    ['42barg', 'pressure', 4.301325],
    ['  42   barg  ', 'pressure', 4.301325],
    ['42 bar(g)', 'pressure', 4.301325],
    ['42 BARG', 'pressure', 4.301325],
    ['4.2 MPa', 'pressure', 4.2],
    ['4.2 MPA', 'pressure', 4.2],
    ['4.2e6 Pa', 'pressure', 4.2],
    ['4.2E+6 Pa', 'pressure', 4.2],
    ['600 psig', 'pressure', 600 * PSI_MPA + 0.101325],
    ['-0.5 barg', 'pressure', 0.051325],
    ['400 degC', 'temperature', 673.15],
    ['-40 degF', 'temperature', 233.15],
    ['−40 °F', 'temperature', 233.15],
    ['+100 C', 'temperature', 373.15],
    ['.5 K', 'temperatureDifference', 0.5],
    ['1,200 lb/h', 'massFlow', (1200 * 0.45359237) / 3600],
    ['12,500,000 lb/h', 'massFlow', (12.5e6 * 0.45359237) / 3600],
    ['60 t/h', 'massFlow', 60 / 3.6],
    ['120 klb/h', 'massFlow', (120_000 * 0.45359237) / 3600],
    ['900 MMBTU', 'energy', 900 * 1.05505585262],
    ['1200 hp', 'power', 1200 * 0.74569987158227022],
    ['1200 Btu/lb', 'specificEnthalpy', 2791.2],
    ['1.6 Btu/(lb R)', 'specificEntropy', 1.6 * 4.1868],
    ['6.5 kJ/(kg·K)', 'specificEntropy', 6.5],
    ['2 %', 'percent', 0.02],
    ['2%', 'percent', 0.02],
    ['0.5 percent', 'percent', 0.005],
    ['56.1 kg CO2/GJ', 'emissionFactor', 56.1],
    ['-5 $/MWh', 'energyPrice', -5 / 3.6],
  ];
  test.each(cases)('"%s" as %s is %s in internal units', (text, kind, expected) => {
    expectClose(valueOf(parseQuantity(text, kind)), expected, 1e-14, text);
  });

  test('the result names the canonical unit, not the spelling written', () => {
    expect(parseQuantity('42 bar(g)', 'pressure')).toEqual({ ok: true, value: 4.301325, unit: 'barg' });
    expect(parseQuantity('100 psi(a)', 'pressure')).toMatchObject({ ok: true, unit: 'psia' });
    expect(parseQuantity('5 mmbtu', 'energy')).toMatchObject({ ok: true, unit: 'MMBtu' });
  });

  test('prices carry their currency code, with the currency as written in the unit', () => {
    expect(parseQuantity('9 $/GJ', 'energyPrice')).toEqual({ ok: true, value: 9, unit: '$/GJ', currency: 'USD' });
    expect(parseQuantity('$9/GJ', 'energyPrice')).toEqual({ ok: true, value: 9, unit: '$/GJ', currency: 'USD' });
    expect(parseQuantity('€30/MWh', 'energyPrice')).toMatchObject({ ok: true, unit: '€/MWh', currency: 'EUR' });
    expect(parseQuantity('3 £/t', 'massPrice')).toEqual({ ok: true, value: 3, unit: '£/t', currency: 'GBP' });
    expect(parseQuantity('1.2 CHF/klb', 'massPrice')).toMatchObject({ ok: true, unit: 'CHF/klb', currency: 'CHF' });
    expect(parseQuantity('4.5 USD / MMBtu', 'energyPrice')).toMatchObject({ unit: 'USD/MMBtu', currency: 'USD' });
  });

  test('a temperature in degC and a temperature difference in degC differ by 273.15 K', () => {
    expect(valueOf(parseQuantity('15 degC', 'temperature')) - valueOf(parseQuantity('15 degC', 'temperatureDifference'))).toBe(273.15);
  });
});

describe('gauge pressure is relative to the atmosphere', () => {
  test('0 barg and 0 psig are the standard atmosphere, 0.101325 MPa, by default', () => {
    expect(valueOf(parseQuantity('0 barg', 'pressure'))).toBe(0.101325);
    expect(valueOf(parseQuantity('0 psig', 'pressure'))).toBe(0.101325);
  });

  test('a site atmospheric pressure replaces the standard one for gauge units only', () => {
    const site = { atmosphericPressure_MPa: 0.0835 }; // an invented site at about 1600 m altitude
    expectClose(valueOf(parseQuantity('10 barg', 'pressure', site)), 1.0835, 1e-15, 'barg at site');
    expectClose(valueOf(parseQuantity('10 bara', 'pressure', site)), 1, 1e-15, 'bara at site');
  });

  test('a vacuum reading is accepted while the absolute pressure stays above zero', () => {
    expectClose(valueOf(parseQuantity('-1 barg', 'pressure')), 0.001325, 1e-12, '-1 barg');
    expectClose(valueOf(parseQuantity('-14 psig', 'pressure')), 0.101325 - 14 * PSI_MPA, 1e-13, '-14 psig');
  });

  test('a bad site atmospheric pressure is a programmer error', () => {
    expect(() => parseQuantity('1 barg', 'pressure', { atmosphericPressure_MPa: 0 })).toThrowErrorMatchingInlineSnapshot(`[RangeError: atmosphericPressure_MPa must be a positive number of MPa, found 0]`);
  });
});

describe('parseQuantity explains what it cannot read', () => {
  test('text with no number', () => {
    expect(messageOf('sixty t/h', 'massFlow')).toMatchInlineSnapshot(`""sixty t/h" is not a mass flow: expected a number and a unit such as "60 t/h", "120 klb/h" or "15 kg/s""`);
    expect(messageOf('', 'pressure')).toMatchInlineSnapshot(`""" is not a pressure: expected a number and a unit such as "42 barg", "4.2 MPa" or "600 psig""`);
    expect(messageOf('barg', 'pressure')).toMatchInlineSnapshot(`""barg" is not a pressure: expected a number and a unit such as "42 barg", "4.2 MPa" or "600 psig""`);
  });

  test('a number with a decimal comma or misplaced separators', () => {
    expect(messageOf('1,5 bar', 'pressure')).toMatchInlineSnapshot(`""1,5 bar" is not a pressure: "1,5" is not a number; write decimals with a point ("1.5") and commas only between groups of three digits ("1,200")"`);
    expect(messageOf('1,20 t/h', 'massFlow')).toMatchInlineSnapshot(`""1,20 t/h" is not a mass flow: "1,20" is not a number; write decimals with a point ("1.5") and commas only between groups of three digits ("1,200")"`);
    expect(messageOf('1.2.3 bar', 'pressure')).toMatchInlineSnapshot(`""1.2.3 bar" is not a pressure: "1.2.3" is not a number"`);
  });

  test('a number too large for a double', () => {
    expect(messageOf('1e999 kW', 'power')).toMatchInlineSnapshot(`""1e999 kW" is not a power: the number 1e999 is too large"`);
  });

  test('a number without a unit', () => {
    expect(messageOf('42', 'pressure')).toMatchInlineSnapshot(`""42" has no unit; expected a pressure such as "42 barg" or "4.2 MPa""`);
    expect(messageOf('0.02', 'percent')).toMatchInlineSnapshot(`""0.02" has no unit; expected a percentage such as "2 %" or "98%""`);
  });

  test('an unknown unit', () => {
    expect(messageOf('42 bananas', 'pressure')).toMatchInlineSnapshot(`""42 bananas" is not a pressure: unknown unit "bananas"; expected one of Pa, kPa, kPag, MPa, MPag, bara, barg, psia, psig, atm"`);
    expect(messageOf('5 ton/h', 'massFlow')).toMatchInlineSnapshot(`""5 ton/h" is not a mass flow: unknown unit "ton/h"; expected one of kg/s, kg/min, kg/h, t/h, t/d, lb/s, lb/min, lb/h, klb/h"`);
    expect(messageOf('9 $/bananas', 'energyPrice')).toMatchInlineSnapshot(`""9 $/bananas" is not an energy price: unknown unit "$/bananas"; expected one of $/GJ, $/MJ, $/kWh, $/MWh, $/MMBtu, $/therm, $/Dth ($ may be €, £ or an ISO 4217 code such as EUR)"`);
  });

  test('an unknown currency before a known denominator', () => {
    expect(messageOf('9 XYZ/GJ', 'energyPrice')).toMatchInlineSnapshot(`""9 XYZ/GJ" is not an energy price: unknown currency "XYZ"; expected $, €, £ or an ISO 4217 code in capitals such as USD or EUR"`);
    expect(messageOf('9 usd/GJ', 'energyPrice')).toMatchInlineSnapshot(`""9 usd/GJ" is not an energy price: unknown currency "usd"; expected $, €, £ or an ISO 4217 code in capitals such as USD or EUR"`);
  });

  test('a known unit of another kind', () => {
    expect(messageOf('60 t/h', 'pressure')).toMatchInlineSnapshot(`""60 t/h" is a mass flow, not a pressure; expected one of Pa, kPa, kPag, MPa, MPag, bara, barg, psia, psig, atm"`);
    expect(messageOf('400 degC', 'pressure')).toMatchInlineSnapshot(`""400 degC" is a temperature, not a pressure; expected one of Pa, kPa, kPag, MPa, MPag, bara, barg, psia, psig, atm"`);
    expect(messageOf('9 $/t', 'energyPrice')).toMatchInlineSnapshot(`""9 $/t" is a mass price, not an energy price; expected one of $/GJ, $/MJ, $/kWh, $/MWh, $/MMBtu, $/therm, $/Dth ($ may be €, £ or an ISO 4217 code such as EUR)"`);
    expect(messageOf('9 GJ', 'energyPrice')).toMatchInlineSnapshot(`""9 GJ" is an energy, not an energy price; expected one of $/GJ, $/MJ, $/kWh, $/MWh, $/MMBtu, $/therm, $/Dth ($ may be €, £ or an ISO 4217 code such as EUR)"`);
    expect(messageOf('1200 Btu/lb', 'massPrice')).toMatchInlineSnapshot(`""1200 Btu/lb" is a specific enthalpy, not a mass price; expected one of $/t, $/kg, $/lb, $/klb ($ may be €, £ or an ISO 4217 code such as EUR)"`);
  });

  test('a pressure at or below absolute zero', () => {
    expect(messageOf('-2 barg', 'pressure')).toMatchInlineSnapshot(`""-2 barg" is below absolute zero pressure (atmospheric pressure 1.01325 bar)"`);
    expect(messageOf('-15 psig', 'pressure')).toMatchInlineSnapshot(`""-15 psig" is below absolute zero pressure (atmospheric pressure 14.6959 psia)"`);
    expect(messageOf('-1 barg', 'pressure', { atmosphericPressure_MPa: 0.09 })).toMatchInlineSnapshot(`""-1 barg" is below absolute zero pressure (atmospheric pressure 0.9 bar)"`);
    expect(messageOf('-0.2 MPa', 'pressure')).toMatchInlineSnapshot(`""-0.2 MPa" is below absolute zero pressure"`);
    expect(messageOf('0 bara', 'pressure')).toMatchInlineSnapshot(`""0 bara" is at absolute zero pressure"`);
  });

  test('a temperature at or below absolute zero', () => {
    expect(messageOf('-300 degC', 'temperature')).toMatchInlineSnapshot(`""-300 degC" is below absolute zero (-273.15 degC)"`);
    expect(messageOf('-500 degF', 'temperature')).toMatchInlineSnapshot(`""-500 degF" is below absolute zero (-459.67 degF)"`);
    expect(messageOf('0 K', 'temperature')).toMatchInlineSnapshot(`""0 K" is at absolute zero (0 K)"`);
  });

  test('a negative mass flow or mass', () => {
    expect(messageOf('-5 t/h', 'massFlow')).toMatchInlineSnapshot(`""-5 t/h" is negative; a mass flow cannot be below zero"`);
    expect(messageOf('-1 kg', 'mass')).toMatchInlineSnapshot(`""-1 kg" is negative; a mass cannot be below zero"`);
  });
});

describe('parseQuantity refuses units that could mislead', () => {
  const messageOf = (text: string, kind: Parameters<typeof parseQuantity>[1]): string => {
    const result = parseQuantity(text, kind);
    return result.ok ? `read as ${result.value} ${result.unit}` : result.message;
  };
  test('a bare psi or bar: absolute or gauge is not said', () => {
    expect(messageOf('150 psi', 'pressure')).toMatchInlineSnapshot(`""150 psi" does not say whether "psi" is absolute or gauge: write psia/psig or bara/barg"`);
    expect(messageOf('10 bar', 'pressure')).toMatchInlineSnapshot(`""10 bar" does not say whether "bar" is absolute or gauge: write psia/psig or bara/barg"`);
    expect(messageOf('10 BAR', 'pressure')).toMatchInlineSnapshot(`""10 BAR" does not say whether "BAR" is absolute or gauge: write psia/psig or bara/barg"`);
  });
  test('a milli "m" where a mega "M" is meant: mW, mPa, mJ/kg', () => {
    expect(messageOf('950 mW', 'power')).toMatchInlineSnapshot(`""950 mW" is not a power: "mW" differs from "MW" only in letter case, and m (milli) is not M (mega); write "MW" if that is meant"`);
    expect(messageOf('4 mPa', 'pressure')).toMatchInlineSnapshot(`""4 mPa" is not a pressure: "mPa" differs from "MPa" only in letter case, and m (milli) is not M (mega); write "MPa" if that is meant"`);
    expect(messageOf('2.8 mJ/kg', 'specificEnthalpy')).toMatchInlineSnapshot(`""2.8 mJ/kg" is not a specific enthalpy: "mJ/kg" differs from "MJ/kg" only in letter case, and m (milli) is not M (mega); write "MJ/kg" if that is meant"`);
    expect(messageOf('9 EUR/mWh', 'energyPrice')).toMatchInlineSnapshot(`""9 EUR/mWh" is not an energy price: "EUR/mWh" differs from "EUR/MWh" only in letter case, and m (milli) is not M (mega); write "EUR/MWh" if that is meant"`);
  });
  test('case is still free where no prefix changes: KW, BARG, mmBtu (a thousand thousand)', () => {
    expect(messageOf('950 KW', 'power')).toBe('read as 950 kW');
    expect(messageOf('5 mmBtu', 'energy')).toMatch(/^read as 5\.27\d* MMBtu$/);
    expect(messageOf('2 Mpa', 'pressure')).toBe('read as 2 MPa');
  });
});
