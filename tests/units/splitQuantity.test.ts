import { describe, expect, test } from 'vitest';
import { splitQuantity } from '../../src/units/splitQuantity.js';

describe('splitQuantity', () => {
  test.each([
    ['42 barg', 42, 'barg'],
    ['42barg', 42, 'barg'],
    ['-40 degF', -40, 'degF'],
    ['−40 degF', -40, 'degF'],
    ['+3 K', 3, 'K'],
    ['0.5 percent', 0.5, 'percent'],
    ['.5 K', 0.5, 'K'],
    ['5. K', 5, 'K'],
    ['2.5e3 kPa', 2500, 'kPa'],
    ['2.5E-3 MPa', 0.0025, 'MPa'],
    ['1,200 lb/h', 1200, 'lb/h'],
    ['1,200.5 lb/h', 1200.5, 'lb/h'],
    ['12,500,000 lb/h', 12_500_000, 'lb/h'],
    ['9 EUR/GJ', 9, 'EUR/GJ'],
    ['9EUR/GJ', 9, 'EUR/GJ'],
    ['$9/GJ', 9, '$/GJ'],
    ['USD 4.5/MMBtu', 4.5, 'USD/MMBtu'],
    ['2%', 2, '%'],
  ])('"%s" is %s and "%s"', (text, value, unitText) => {
    expect(splitQuantity(text)).toMatchObject({ status: 'ok', value, unitText });
  });

  test.each(['1,5 bar', '1,20 t/h', '1234,567 kg', '0,5 %', '1.2.3 bar'])('"%s" has a malformed number', (text) => {
    expect(splitQuantity(text).status).toBe('badNumber');
  });

  test.each(['', 'barg', 'sixty t/h', '$ per GJ', 'USD 9 bar'])('"%s" has no number', (text) => {
    expect(splitQuantity(text).status).toBe('noNumber');
  });
});
