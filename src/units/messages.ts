import { describeKind, type QuantityKind } from './kinds.js';
import { canonicalUnits, isPriceKind } from './unitCatalogue.js';

// The sentences users read when a quantity cannot be taken. Each quotes the
// text as written and says what was expected.

/** A number as people write it in a message: up to six significant digits, no trailing zeros. */
export function plainNumber(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/** "one of Pa, kPa, ...", with a note on currencies for prices. */
export function expectedUnits(kind: QuantityKind): string {
  const list = `one of ${canonicalUnits(kind).join(', ')}`;
  return isPriceKind(kind) ? `${list} ($ may be €, £ or an ISO 4217 code such as EUR)` : list;
}

export function notANumber(text: string, kind: QuantityKind): string {
  const { phrase, examples } = describeKind(kind);
  return `"${text}" is not ${phrase}: expected a number and a unit such as "${examples[0]}", "${examples[1]}" or "${examples[2]}"`;
}

export function badNumber(text: string, kind: QuantityKind, numberText: string): string {
  const base = `"${text}" is not ${describeKind(kind).phrase}: "${numberText}" is not a number`;
  if (!numberText.includes(',')) return base;
  return `${base}; write decimals with a point ("1.5") and commas only between groups of three digits ("1,200")`;
}

export function numberTooLarge(text: string, kind: QuantityKind, numberText: string): string {
  return `"${text}" is not ${describeKind(kind).phrase}: the number ${numberText} is too large`;
}

export function noUnit(text: string, kind: QuantityKind): string {
  const { phrase, examples } = describeKind(kind);
  return `"${text}" has no unit; expected ${phrase} such as "${examples[0]}" or "${examples[1]}"`;
}

export function wrongKind(text: string, kind: QuantityKind, foundKind: QuantityKind): string {
  return `"${text}" is ${describeKind(foundKind).phrase}, not ${describeKind(kind).phrase}; expected ${expectedUnits(kind)}`;
}

export function unknownUnit(text: string, kind: QuantityKind, unitText: string): string {
  return `"${text}" is not ${describeKind(kind).phrase}: unknown unit "${unitText}"; expected ${expectedUnits(kind)}`;
}

export function unmarkedPressure(text: string, unitText: string): string {
  return `"${text}" does not say whether "${unitText}" is absolute or gauge: write psia/psig or bara/barg`;
}

export function milliForMega(text: string, kind: QuantityKind, unitText: string, mega: string): string {
  return `"${text}" is not ${describeKind(kind).phrase}: "${unitText}" differs from "${mega}" only in letter case, and m (milli) is not M (mega); write "${mega}" if that is meant`;
}

export function unknownCurrency(text: string, kind: QuantityKind, currencyText: string): string {
  return `"${text}" is not ${describeKind(kind).phrase}: unknown currency "${currencyText}"; expected $, €, £ or an ISO 4217 code in capitals such as USD or EUR`;
}

export function pressureNotAboveZero(text: string, valueSI: number, atmosphere?: { value: number; unit: string }): string {
  const where = valueSI < 0 ? 'below' : 'at';
  const note = atmosphere === undefined ? '' : ` (atmospheric pressure ${plainNumber(atmosphere.value)} ${atmosphere.unit})`;
  return `"${text}" is ${where} absolute zero pressure${note}`;
}

export function temperatureNotAboveZero(text: string, valueSI: number, absoluteZero: number, unit: string): string {
  const where = valueSI < 0 ? 'below' : 'at';
  return `"${text}" is ${where} absolute zero (${plainNumber(absoluteZero)} ${unit})`;
}

export function negativeAmount(text: string, kind: QuantityKind): string {
  return `"${text}" is negative; ${describeKind(kind).phrase} cannot be below zero`;
}
