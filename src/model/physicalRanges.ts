// The largest magnitude each kind of quantity may have in a case file, in the
// internal units. Finite but absurd numbers (a fuel price of 1e308, a heat
// loss of 1e25 kW) are refused where they are read, with the limit named, so
// that nothing past `check` can overflow the linear model. The limits sit far
// beyond any real plant (common practice, no source) except where a source is
// named; they are guards against typing errors, not design limits.
import type { QuantityKind } from '../units/index.js';

export interface PhysicalRange {
  /** Smallest value accepted, internal units. */
  min: number;
  /** Largest value accepted, internal units. */
  max: number;
  /** The limit as the message gives it. */
  words: string;
}

export const PHYSICAL_RANGES: Readonly<Record<QuantityKind, PhysicalRange>> = {
  // IAPWS R7-97(2012): IF97 covers p <= 100 MPa and T <= 2273.15 K.
  pressure: { min: 0, max: 100, words: 'from 0 to 100 MPa absolute, the range of IAPWS-IF97' },
  temperature: { min: 0, max: 2273.15, words: 'from 0 K to 2000 degC, the range of IAPWS-IF97' },
  temperatureDifference: { min: -2000, max: 2000, words: 'within 2000 K either way' },
  // 10 000 kg/s is 36 000 t/h, ten times the largest utility boiler.
  massFlow: { min: -1e4, max: 1e4, words: 'within 36 000 t/h' },
  mass: { min: -1e9, max: 1e9, words: 'within 1 000 000 t' },
  energy: { min: -1e9, max: 1e9, words: 'within 1e9 GJ' },
  // 1e7 kW is 10 GW, several times the largest generating unit.
  power: { min: -1e7, max: 1e7, words: 'within 10 GW' },
  specificEnthalpy: { min: -1e4, max: 1e4, words: 'within 10 000 kJ/kg' },
  specificEntropy: { min: -100, max: 100, words: 'within 100 kJ/(kg K)' },
  // Prices allow for currencies with many units to the dollar.
  energyPrice: { min: -1e8, max: 1e8, words: 'within 1e8 per GJ' },
  massPrice: { min: -1e9, max: 1e9, words: 'within 1e9 per tonne' },
  emissionFactor: { min: -1e4, max: 1e4, words: 'within 10 000 kg/GJ' },
  percent: { min: -100, max: 100, words: 'within 10 000 %' },
};

/** The smallest efficiency (or other positive fraction) a unit may have: 0.1 %. */
export const MIN_POSITIVE_FRACTION = 0.001;

/** Largest sum of money accepted in a project (capital cost, fixed O&M). */
export const MAX_MONEY = 1e15;
