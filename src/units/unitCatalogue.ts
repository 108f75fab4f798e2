import { currencyCode } from './currency.js';
import { energyUnits, powerUnits } from './energyUnits.js';
import { quantityKinds, type QuantityKind } from './kinds.js';
import { massFlowUnits, massUnits } from './massUnits.js';
import { percentUnits } from './percentUnits.js';
import { pressureUnits } from './pressureUnits.js';
import { emissionFactorUnits, energyPriceUnits, massPriceUnits } from './priceUnits.js';
import { specificEnthalpyUnits, specificEntropyUnits } from './specificUnits.js';
import { temperatureDifferenceUnits, temperatureUnits } from './temperatureUnits.js';
import type { UnitDefinition } from './unitDefinition.js';

// Matching rules, in order: spaces and middle dots are ignored; an exact
// spelling wins; otherwise a spelling that differs only in letter case is
// accepted ("BARG", "MMBTU", "kpa"), which is safe because no two units of one
// kind differ only in case (buildIndex refuses such a table), except a mega "M"
// written as a milli "m" ("mW", "mPa"), which is refused. Price units are
// "<currency>/<denominator>".

const tables: Record<QuantityKind, readonly UnitDefinition[]> = {
  pressure: pressureUnits,
  temperature: temperatureUnits,
  temperatureDifference: temperatureDifferenceUnits,
  massFlow: massFlowUnits,
  mass: massUnits,
  energy: energyUnits,
  power: powerUnits,
  specificEnthalpy: specificEnthalpyUnits,
  specificEntropy: specificEntropyUnits,
  energyPrice: energyPriceUnits,
  massPrice: massPriceUnits,
  emissionFactor: emissionFactorUnits,
  percent: percentUnits,
};

/** Kinds whose units carry a currency in front of the slash. */
export function isPriceKind(kind: QuantityKind): boolean {
  return kind === 'energyPrice' || kind === 'massPrice';
}

export function unitKey(spelling: string): string {
  return spelling.replace(/[\s·⋅]/g, '');
}

interface KindIndex {
  readonly exact: ReadonlyMap<string, UnitDefinition>;
  readonly folded: ReadonlyMap<string, UnitDefinition>;
}

function buildIndex(kind: QuantityKind): KindIndex {
  const exact = new Map<string, UnitDefinition>();
  const folded = new Map<string, UnitDefinition>();
  for (const definition of tables[kind]) {
    for (const spelling of [definition.name, ...definition.aliases]) {
      const key = unitKey(spelling);
      if (exact.has(key)) throw new Error(`${kind} unit spelling "${spelling}" is listed twice`);
      exact.set(key, definition);
      const previous = folded.get(key.toLowerCase());
      if (previous !== undefined && previous !== definition) {
        throw new Error(`${kind} units "${previous.name}" and "${definition.name}" differ only in letter case`);
      }
      folded.set(key.toLowerCase(), definition);
    }
  }
  return { exact, folded };
}

const indexes = new Map<QuantityKind, KindIndex>(quantityKinds.map((kind) => [kind, buildIndex(kind)]));

function lookUp(kind: QuantityKind, key: string): UnitDefinition | undefined {
  const index = indexes.get(kind);
  if (index === undefined) throw new Error(`unknown quantity kind "${kind}"`);
  const exact = index.exact.get(key);
  if (exact !== undefined) return exact;
  const folded = index.folded.get(key.toLowerCase());
  return folded !== undefined && megaReadAsMilli(key, folded) === undefined ? folded : undefined;
}

/**
 * The spelling of `definition` whose mega prefix "M" the written key has as a
 * lower-case "m" (milli): "mW" for MW, "mPa" for MPa, "mJ/kg" for MJ/kg. Such a
 * folded match is refused, as no reader should guess a factor of 10^9. The
 * US "MM" (a thousand thousand) may be written "mm": "mmBtu" is MMBtu.
 */
function megaReadAsMilli(key: string, definition: UnitDefinition): string | undefined {
  for (const spelling of [definition.name, ...definition.aliases]) {
    const canonical = unitKey(spelling);
    if (canonical.toLowerCase() !== key.toLowerCase()) continue;
    for (let i = 0; i < key.length; i += 1) {
      const doubled = canonical[i - 1] === 'M' || canonical[i + 1] === 'M';
      if (key[i] === 'm' && canonical[i] === 'M' && !doubled) return spelling;
    }
  }
  return undefined;
}

/**
 * When `spelling` would match a unit of `kind` only by reading a milli "m" as
 * a mega "M", the unit it differs from ("MW" for "mW"); otherwise undefined.
 */
export function caseOnlyPrefix(kind: QuantityKind, spelling: string): string | undefined {
  const key = unitKey(spelling);
  const index = indexes.get(kind);
  if (index === undefined) return undefined;
  const slash = key.indexOf('/');
  const candidates = isPriceKind(kind) && slash >= 0 ? [key.slice(slash + 1)] : [key];
  for (const candidate of candidates) {
    if (index.exact.has(candidate)) continue;
    const folded = index.folded.get(candidate.toLowerCase());
    const found = folded === undefined ? undefined : megaReadAsMilli(candidate, folded);
    if (found !== undefined) return isPriceKind(kind) ? `${key.slice(0, slash)}/${found}` : found;
  }
  return undefined;
}

/** Pressure units that do not say whether they are absolute or gauge. */
export function isUnmarkedPressure(spelling: string): boolean {
  return ['bar', 'psi'].includes(unitKey(spelling).toLowerCase());
}

/** A unit spelling resolved for one kind. */
export interface UnitMatch {
  readonly kind: QuantityKind;
  readonly definition: UnitDefinition;
  /** Canonical spelling; for prices the currency as written, a slash and the canonical denominator ("USD/MMBtu"). */
  readonly unit: string;
  /** ISO 4217 code, prices only. */
  readonly currency?: string;
}

/** The unit of the given kind spelled by `spelling`, if there is one. */
export function findUnit(kind: QuantityKind, spelling: string): UnitMatch | undefined {
  const key = unitKey(spelling);
  if (!isPriceKind(kind)) {
    const definition = lookUp(kind, key);
    return definition === undefined ? undefined : { kind, definition, unit: definition.name };
  }
  const slash = key.indexOf('/');
  if (slash < 0) return undefined;
  const currencyText = key.slice(0, slash);
  const currency = currencyCode(currencyText);
  const definition = lookUp(kind, key.slice(slash + 1));
  if (currency === undefined || definition === undefined) return undefined;
  return { kind, definition, unit: `${currencyText}/${definition.name}`, currency };
}

/** Every kind that has a unit spelled `spelling`, in the order of `quantityKinds`. */
export function kindsOfUnit(spelling: string): QuantityKind[] {
  return quantityKinds.filter((kind) => findUnit(kind, spelling) !== undefined);
}

/** Canonical spellings of a kind, prices with "$" in front. */
export function canonicalUnits(kind: QuantityKind): string[] {
  const prefix = isPriceKind(kind) ? '$/' : '';
  return tables[kind].map((definition) => prefix + definition.name);
}

/** Every accepted spelling of a kind (before case folding), prices with "$" in front. */
export function allSpellings(kind: QuantityKind): string[] {
  const prefix = isPriceKind(kind) ? '$/' : '';
  return tables[kind].flatMap((definition) => [definition.name, ...definition.aliases].map((spelling) => prefix + spelling));
}
