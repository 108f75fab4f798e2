import { describe, expect, test } from 'vitest';
import { currencyCode, currencyMark } from '../../src/units/currency.js';

describe('currency', () => {
  test('$, € and £ are USD, EUR and GBP', () => {
    expect([currencyCode('$'), currencyCode('€'), currencyCode('£')]).toEqual(['USD', 'EUR', 'GBP']);
  });

  test('ISO 4217 codes in capitals are taken as written', () => {
    expect([currencyCode('USD'), currencyCode('CAD'), currencyCode('INR')]).toEqual(['USD', 'CAD', 'INR']);
  });

  test('unit words and lower-case codes are not currencies', () => {
    expect(currencyCode('BTU')).toBeUndefined();
    expect(currencyCode('kgs')).toBeUndefined();
    expect(currencyCode('usd')).toBeUndefined();
    expect(currencyCode('US$')).toBeUndefined();
  });

  test('the mark shown in a unit is the symbol for USD, EUR and GBP and the code otherwise', () => {
    expect([currencyMark('USD'), currencyMark('EUR'), currencyMark('GBP'), currencyMark('CHF')]).toEqual(['$', '€', '£', 'CHF']);
  });
});
