import { POUND_KG, TONNE_KG } from './exactFactors.js';
import { unit, type UnitDefinition } from './unitDefinition.js';

// "t" is always the metric tonne (1000 kg); short and long tons are not
// accepted because "ton" alone is ambiguous. "klb" and "kpph" are thousands
// of pounds, as written on US steam balances.
const SECONDS_PER_MINUTE = 60;
const SECONDS_PER_HOUR = 3600;
const SECONDS_PER_DAY = 86_400;

/** Mass, internal unit kg. */
export const massUnits: readonly UnitDefinition[] = [
  unit('g', 1e-3),
  unit('kg', 1),
  unit('t', TONNE_KG, ['tonne']),
  unit('lb', POUND_KG, ['lbm']),
  unit('klb', 1000 * POUND_KG, ['1000 lb']),
];

/** Mass flow, internal unit kg/s. */
export const massFlowUnits: readonly UnitDefinition[] = [
  unit('kg/s', 1),
  unit('kg/min', 1 / SECONDS_PER_MINUTE),
  unit('kg/h', 1 / SECONDS_PER_HOUR, ['kg/hr']),
  unit('t/h', TONNE_KG / SECONDS_PER_HOUR, ['t/hr', 'tonne/h', 'tph']),
  unit('t/d', TONNE_KG / SECONDS_PER_DAY, ['t/day', 'tonne/d']),
  unit('lb/s', POUND_KG, ['lbm/s']),
  unit('lb/min', POUND_KG / SECONDS_PER_MINUTE, ['lbm/min']),
  unit('lb/h', POUND_KG / SECONDS_PER_HOUR, ['lb/hr', 'lbm/h', 'pph']),
  unit('klb/h', (1000 * POUND_KG) / SECONDS_PER_HOUR, ['klb/hr', 'kpph', '1000 lb/h']),
];
