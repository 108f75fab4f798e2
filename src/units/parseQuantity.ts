import { atmosphericPressureOf, type ParseOptions } from './atmosphere.js';
import type { QuantityKind } from './kinds.js';
import * as messages from './messages.js';
import { splitQuantity } from './splitQuantity.js';
import { caseOnlyPrefix, findUnit, isPriceKind, isUnmarkedPressure, kindsOfUnit, type UnitMatch } from './unitCatalogue.js';
import { fromInternal, toInternal } from './unitDefinition.js';

export type ParseResult =
  | { ok: true; value: number; unit: string; currency?: string }
  | { ok: false; message: string };

/** Kinds whose amounts cannot be negative. Pressure and temperature are checked against absolute zero instead. */
const nonNegativeKinds: ReadonlySet<QuantityKind> = new Set(['massFlow', 'mass']);

/**
 * Reads quantity text such as "42 barg", "750 psig", "400 degF", "120 klb/h"
 * or "9 $/GJ" into the internal unit of its kind (see DESIGN.md). Never
 * throws for bad text; the message says what was expected.
 */
export function parseQuantity(text: string, kind: QuantityKind, options?: ParseOptions): ParseResult {
  const atmosphere_MPa = atmosphericPressureOf(options);
  const trimmed = text.trim();
  const split = splitQuantity(trimmed);
  if (split.status === 'noNumber') return failure(messages.notANumber(trimmed, kind));
  if (split.status === 'badNumber') return failure(messages.badNumber(trimmed, kind, split.numberText));
  if (!Number.isFinite(split.value)) return failure(messages.numberTooLarge(trimmed, kind, split.numberText));
  if (split.unitText === '') return failure(messages.noUnit(trimmed, kind));

  const match = findUnit(kind, split.unitText);
  if (match === undefined) return failure(unmatchedUnit(trimmed, kind, split.unitText));

  const value = toInternal(match.definition, split.value, atmosphere_MPa);
  const problem = physicalProblem(trimmed, kind, value, match, atmosphere_MPa);
  if (problem !== undefined) return failure(problem);
  return match.currency === undefined
    ? { ok: true, value, unit: match.unit }
    : { ok: true, value, unit: match.unit, currency: match.currency };
}

function failure(message: string): ParseResult {
  return { ok: false, message };
}

function unmatchedUnit(text: string, kind: QuantityKind, unitText: string): string {
  if (kind === 'pressure' && isUnmarkedPressure(unitText)) return messages.unmarkedPressure(text, unitText);
  const mega = caseOnlyPrefix(kind, unitText);
  if (mega !== undefined) return messages.milliForMega(text, kind, unitText, mega);
  const otherKind = kindsOfUnit(unitText)[0];
  if (otherKind !== undefined) return messages.wrongKind(text, kind, otherKind);
  if (isPriceKind(kind)) {
    // A known denominator behind an unknown currency: say which part is wrong.
    const slash = unitText.indexOf('/');
    if (slash > 0 && findUnit(kind, `$${unitText.slice(slash)}`) !== undefined) {
      return messages.unknownCurrency(text, kind, unitText.slice(0, slash).trim());
    }
  }
  return messages.unknownUnit(text, kind, unitText);
}

function physicalProblem(
  text: string,
  kind: QuantityKind,
  value: number,
  match: UnitMatch,
  atmosphere_MPa: number,
): string | undefined {
  if (kind === 'pressure' && value <= 0) {
    const absoluteName = match.definition.gaugeOf;
    const atmosphere =
      absoluteName === undefined ? undefined : { value: atmosphere_MPa / match.definition.factor, unit: absoluteName };
    return messages.pressureNotAboveZero(text, value, atmosphere);
  }
  if (kind === 'temperature' && value <= 0) {
    return messages.temperatureNotAboveZero(text, value, fromInternal(match.definition, 0, atmosphere_MPa), match.unit);
  }
  if (nonNegativeKinds.has(kind) && value < 0) return messages.negativeAmount(text, kind);
  return undefined;
}
