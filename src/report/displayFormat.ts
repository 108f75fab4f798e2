// How report figures are shown in the case's unit system: one set of
// formatters for the diagram, the HTML, Markdown and CSV tables.
import { displayUnit, formatQuantity, fromSI, type UnitSystem } from '../units/index.js';

/** 1 kW = 3412.1416 Btu/h (Btu, International Table). */
const BTU_PER_H_PER_KW = 3412.1416;
const KG_PER_LB = 0.45359237;
/** 1 Btu(IT) = 1.05505585262 kJ. */
const KJ_PER_BTU = 1.05505585262;

export interface DisplayFormat {
  system: UnitSystem;
  currency: string;
  /** "t" or "klb": the mass that prices and marginal values are quoted per */
  perMass: string;
  flow(kg_s: number): string;
  power(kW: number): string;
  /** fuel as a heat rate: MW in SI, MMBtu/h in US units */
  fuelRate(kW: number): string;
  pressure(MPa: number): string;
  temperature(K: number): string;
  enthalpy(kJ_kg: number): string;
  money(amount: number): string;
  /** a value per tonne shown per t (SI) or per klb (US); null as "n/a" */
  /** a marginal steam value per t in its objective's unit (currency by default), in the case's units */
  valuePerMass(perT: number | null, unit?: SteamValueUnit): string;
  /** the label of a steam value's unit: "EUR/t", "MMBtu/klb" */
  valueUnit(unit?: SteamValueUnit): string;
  percent(fraction: number | null): string;
  /** For tables whose cells are bare numbers under a heading with the unit. */
  flowUnit: string;
  flowValue(kg_s: number): number;
  fuelRateUnit: string;
  fuelRateValue(kW: number): number;
  enthalpyUnit: string;
  /** an enthalpy or an enthalpy difference (the scales share their zero) */
  enthalpyValue(kJ_kg: number): number;
  /** turbine steam rate: kg/kWh (SI) or lb/kWh (US) */
  steamRate(kg_kWh: number): string;
  /** power per tonne of steam, shown per t or per klb; null as "n/a" */
  powerPerMass(kWh_t: number | null): string;
  /** fuel per unit of power: MJ/kWh (SI) or Btu/kWh (US); null as "n/a" */
  fuelPerPower(kJ_kWh: number | null): string;
  fuelPerPowerUnit: string;
  fuelPerPowerValue(kJ_kWh: number): number;
  /** a heat rate (process heat, heat loss): kW (SI) or MMBtu/h (US) */
  heatRate(kW: number): string;
  /** CO2 emitted: t/h (SI) or klb/h (US) */
  co2Rate(kg_h: number): string;
  co2RateUnit: string;
  co2RateValue(kg_h: number): number;
  /** a mass residual in exponent form, t/h or klb/h */
  massResidual(kg_s: number): string;
  /** entropy generation rate: kW/K (SI) or Btu/(h R) (US) */
  entropyRate(kW_K: number): string;
  /** a heat rate or an energy residual: kW (SI) or Btu/h (US), to `digits` significant figures in exponent form */
  heatResidual(kW: number): string;
}

/** Values within solver round-off of zero show as zero. */
export function clean(value: number): number {
  return Math.abs(value) < 1e-7 ? 0 : value;
}

export function displayFormat(system: UnitSystem, currency: string, atmosphericPressure_MPa: number): DisplayFormat {
  const atmosphere = { atmosphericPressure_MPa };
  return {
    system,
    currency,
    perMass: system === 'si' ? 't' : 'klb',
    flow: (kg_s) => formatQuantity(clean(kg_s), 'massFlow', system),
    power: (kW) => formatQuantity(clean(kW), 'power', system),
    fuelRate: (kW) => (system === 'si' ? `${(clean(kW) / 1000).toFixed(2)} MW` : `${((clean(kW) * BTU_PER_H_PER_KW) / 1e6).toFixed(2)} MMBtu/h`),
    pressure: (MPa) => formatQuantity(MPa, 'pressure', system, atmosphere),
    temperature: (K) => formatQuantity(K, 'temperature', system),
    enthalpy: (kJ_kg) => formatQuantity(kJ_kg, 'specificEnthalpy', system),
    money: (amount) => `${clean(amount).toLocaleString('en-US', { maximumFractionDigits: 0 })} ${currency}`,
    valuePerMass: (perT, unit = 'currency') => {
      if (perT === null) return 'n/a';
      const value = steamValueNumber(perT, unit, system);
      return `${(Math.abs(value) < 0.005 ? 0 : value).toFixed(2)} ${steamValueLabel(unit, system, currency)}`;
    },
    valueUnit: (unit = 'currency') => steamValueLabel(unit, system, currency),
    percent: (fraction) => (fraction === null ? 'n/a' : `${(fraction * 100).toFixed(1)} %`),
    flowUnit: displayUnit('massFlow', system),
    flowValue: (kg_s) => fromSI(clean(kg_s), 'massFlow', displayUnit('massFlow', system)),
    fuelRateUnit: system === 'si' ? 'MW' : 'MMBtu/h',
    fuelRateValue: (kW) => (system === 'si' ? clean(kW) / 1000 : (clean(kW) * BTU_PER_H_PER_KW) / 1e6),
    enthalpyUnit: displayUnit('specificEnthalpy', system),
    enthalpyValue: (kJ_kg) => fromSI(kJ_kg, 'specificEnthalpy', displayUnit('specificEnthalpy', system)),
    steamRate: (kg_kWh) => (system === 'si' ? `${kg_kWh.toFixed(2)} kg/kWh` : `${(kg_kWh / KG_PER_LB).toFixed(2)} lb/kWh`),
    powerPerMass: (kWh_t) => {
      if (kWh_t === null) return 'n/a';
      return `${(system === 'si' ? kWh_t : kWh_t * KG_PER_LB).toFixed(1)} kWh/${system === 'si' ? 't' : 'klb'}`;
    },
    fuelPerPower: (kJ_kWh) => {
      if (kJ_kWh === null) return 'n/a';
      return system === 'si' ? `${(kJ_kWh / 1000).toFixed(2)} MJ/kWh` : `${(kJ_kWh / KJ_PER_BTU).toFixed(0)} Btu/kWh`;
    },
    fuelPerPowerUnit: system === 'si' ? 'MJ/kWh' : 'Btu/kWh',
    fuelPerPowerValue: (kJ_kWh) => (system === 'si' ? kJ_kWh / 1000 : kJ_kWh / KJ_PER_BTU),
    heatRate: (kW) => (system === 'si' ? formatQuantity(clean(kW), 'power', system) : `${((clean(kW) * BTU_PER_H_PER_KW) / 1e6).toFixed(3)} MMBtu/h`),
    co2Rate: (kg_h) => (system === 'si' ? `${(clean(kg_h) / 1000).toFixed(2)} t/h` : `${(clean(kg_h) / KG_PER_LB / 1000).toFixed(2)} klb/h`),
    co2RateUnit: system === 'si' ? 't/h' : 'klb/h',
    co2RateValue: (kg_h) => (system === 'si' ? kg_h / 1000 : kg_h / KG_PER_LB / 1000),
    massResidual: (kg_s) => `${fromSI(kg_s, 'massFlow', displayUnit('massFlow', system)).toExponential(2)} ${displayUnit('massFlow', system)}`,
    // 1 kW/K = 3412.1416 Btu/h per 1.8 R
    entropyRate: (kW_K) => (system === 'si' ? `${kW_K.toPrecision(4)} kW/K` : `${((kW_K * BTU_PER_H_PER_KW) / 1.8).toPrecision(4)} Btu/(h R)`),
    heatResidual: (kW) => (system === 'si' ? `${kW.toExponential(2)} kW` : `${(kW * BTU_PER_H_PER_KW).toExponential(2)} Btu/h`),
  };
}

/** What a marginal steam value counts: the objective's own unit, per t of steam. */
export type SteamValueUnit = 'currency' | 'GJ' | 'kg CO2' | 'kWh';

/** A steam value per t in the case's units: per klb in US units, GJ as MMBtu, kg CO2 as lb. */
export function steamValueNumber(perT: number, unit: SteamValueUnit, system: UnitSystem): number {
  if (system === 'si') return perT;
  // per t -> per klb; a kg of CO2 per t is a lb per klb (both 1e-3 of the steam's mass)
  if (unit === 'kg CO2') return perT;
  if (unit === 'GJ') return perT * KG_PER_LB * (1e6 / KJ_PER_BTU / 1e6);
  return perT * KG_PER_LB;
}

export function steamValueLabel(unit: SteamValueUnit, system: UnitSystem, currency: string): string {
  const perMass = system === 'si' ? 't' : 'klb';
  if (unit === 'currency') return `${currency}/${perMass}`;
  if (unit === 'GJ') return system === 'si' ? 'GJ/t' : 'MMBtu/klb';
  if (unit === 'kg CO2') return system === 'si' ? 'kg CO2/t' : 'lb CO2/klb';
  return `kWh/${perMass}`;
}

/** A value per t converted to per klb in US units (for charts that need the number). */
export function perMassValue(perT: number, system: UnitSystem): number {
  return system === 'si' ? perT : perT * KG_PER_LB;
}
