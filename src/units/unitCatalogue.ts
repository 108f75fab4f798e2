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
// kind differ only in case (buildIndex refuses such a table). Price units are
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
  return index.exact.get(key) ?? index.folded.get(key.toLowerCase());
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
