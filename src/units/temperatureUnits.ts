import { CELSIUS_ZERO_K, FAHRENHEIT_ZERO_R, RANKINE_K } from './exactFactors.js';
import { offsetUnit, unit, type UnitDefinition } from './unitDefinition.js';

// Spellings: "deg C" and "degC" are one key because spaces are ignored; the
// degree sign may be U+00B0 or the often-typed ordinal U+00BA; U+2103 and
// U+2109 are the single-character Celsius and Fahrenheit signs.

/** Temperature, internal unit K. */
export const temperatureUnits: readonly UnitDefinition[] = [
  unit('K', 1),
  offsetUnit('degC', 1, CELSIUS_ZERO_K, ['°C', 'ºC', '℃', 'C']),
  offsetUnit('degF', RANKINE_K, FAHRENHEIT_ZERO_R, ['°F', 'ºF', '℉', 'F']),
  unit('degR', RANKINE_K, ['°R', 'ºR', 'R']),
];

/** Temperature difference, internal unit K: a degree of either scale, with no offset. */
export const temperatureDifferenceUnits: readonly UnitDefinition[] = [
  unit('K', 1, ['delta K', 'ΔK']),
  unit('degC', 1, ['°C', 'ºC', 'C', 'delta degC', 'Δ°C', 'ΔdegC']),
  unit('degF', RANKINE_K, ['°F', 'ºF', 'F', 'delta degF', 'Δ°F', 'ΔdegF']),
  unit('degR', RANKINE_K, ['°R', 'ºR', 'R', 'delta degR']),
];
