import { atmosphericPressureOf, type ParseOptions } from './atmosphere.js';
import type { QuantityKind } from './kinds.js';
import { expectedUnits } from './messages.js';
import { allSpellings, findUnit, type UnitMatch } from './unitCatalogue.js';
import { fromInternal, toInternal } from './unitDefinition.js';

// Conversions for code that already holds a number and a unit name. They do
// not check physical sense (a negative absolute pressure converts like any
// other number); parseQuantity does that for text from users.

function requireUnit(kind: QuantityKind, unit: string): UnitMatch {
  const match = findUnit(kind, unit);
  if (match === undefined) throw new Error(`unknown ${kind} unit "${unit}"; expected ${expectedUnits(kind)}`);
  return match;
}

/** `value` in `unit` converted to the internal unit of `kind`. Throws on an unknown unit. */
export function toSI(value: number, kind: QuantityKind, unit: string, options?: ParseOptions): number {
  return toInternal(requireUnit(kind, unit).definition, value, atmosphericPressureOf(options));
}

/** `valueSI` in the internal unit of `kind` converted to `unit`. Throws on an unknown unit. */
export function fromSI(valueSI: number, kind: QuantityKind, unit: string, options?: ParseOptions): number {
  return fromInternal(requireUnit(kind, unit).definition, valueSI, atmosphericPressureOf(options));
}

/**
 * Every accepted spelling of a kind's units, for messages and docs. Letter
 * case is also free where it is unambiguous; spaces and middle dots are
 * ignored. Prices are listed with "$", which may be €, £ or an ISO 4217 code.
 */
export function unitsOf(kind: QuantityKind): string[] {
  return allSpellings(kind);
}
