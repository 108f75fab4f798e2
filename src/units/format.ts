import type { ParseOptions } from './atmosphere.js';
import { fromSI } from './convert.js';
import { currencyMark } from './currency.js';
import { isPriceKind } from './unitCatalogue.js';
import type { QuantityKind } from './kinds.js';

export type UnitSystem = 'si' | 'us';

// Display units: gauge pressure because that is what plant gauges and
// header names say; power stays in kW in both systems so tables line up.
const displayUnits: Record<QuantityKind, Record<UnitSystem, string>> = {
  pressure: { si: 'barg', us: 'psig' },
  temperature: { si: 'degC', us: 'degF' },
  temperatureDifference: { si: 'K', us: 'degF' },
  massFlow: { si: 't/h', us: 'klb/h' },
  mass: { si: 't', us: 'klb' },
  energy: { si: 'GJ', us: 'MMBtu' },
  power: { si: 'kW', us: 'kW' },
  specificEnthalpy: { si: 'kJ/kg', us: 'Btu/lb' },
  specificEntropy: { si: 'kJ/(kg K)', us: 'Btu/(lb R)' },
  energyPrice: { si: '$/GJ', us: '$/MMBtu' },
  massPrice: { si: '$/t', us: '$/klb' },
  emissionFactor: { si: 'kg/GJ', us: 'lb/MMBtu' },
  percent: { si: '%', us: '%' },
};

/** The unit a kind is shown in by default; prices with "$". */
export function displayUnit(kind: QuantityKind, system: UnitSystem): string {
  return displayUnits[kind][system];
}

export interface FormatOptions extends ParseOptions {
  /** Significant digits, 3 if absent; digits left of the point are never dropped (2803.4 shows as "2803"). */
  digits?: number;
  /** Show in this unit instead of the system's display unit. */
  unit?: string;
  /** ISO 4217 code of the case's currency, for prices shown in the display unit; USD if absent. */
  currency?: string;
}

/** Largest number of decimals shown, so tiny values do not print pages of zeros. */
const MAX_DECIMALS = 12;

/** A number with `digits` significant digits, keeping every integer digit: 42 -> "42.0", 0.0234 -> "0.0234". */
export function formatNumber(value: number, digits: number): string {
  if (!Number.isFinite(value)) return String(value);
  const magnitude = value === 0 ? 0 : Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.min(MAX_DECIMALS, Math.max(0, digits - 1 - magnitude));
  const text = value.toFixed(decimals);
  // toFixed keeps the sign of a value that rounds to zero ("-0.00").
  return /^-[0.]+$/.test(text) ? text.slice(1) : text;
}

function unitFor(kind: QuantityKind, system: UnitSystem, options: FormatOptions | undefined): string {
  if (options?.unit !== undefined) return options.unit;
  const unit = displayUnit(kind, system);
  if (!isPriceKind(kind) || options?.currency === undefined) return unit;
  return currencyMark(options.currency) + unit.slice(1);
}

/** `valueSI` (internal unit of `kind`) as text such as "42.0 barg" or "9.00 $/GJ". */
export function formatQuantity(valueSI: number, kind: QuantityKind, system: UnitSystem, options?: FormatOptions): string {
  const digits = options?.digits ?? 3;
  if (!Number.isInteger(digits) || digits < 1) throw new RangeError(`digits must be a positive integer, found ${digits}`);
  const unit = unitFor(kind, system, options);
  return `${formatNumber(fromSI(valueSI, kind, unit, options), digits)} ${unit}`;
}
