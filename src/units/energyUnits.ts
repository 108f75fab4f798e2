import { BTU_IT_KJ, HORSEPOWER_KW, KILOWATT_HOUR_KJ, THERM_KJ } from './exactFactors.js';
import { unit, type UnitDefinition } from './unitDefinition.js';

// Every Btu here is the International Table Btu; MMBtu is one million Btu
// and Dth (dekatherm) ten therms, also one million Btu.
const KJ_GJ = 1e-6;
const KWH_GJ = KILOWATT_HOUR_KJ * KJ_GJ;
const BTU_GJ = BTU_IT_KJ * KJ_GJ;

/** Energy, internal unit GJ. */
export const energyUnits: readonly UnitDefinition[] = [
  unit('kJ', KJ_GJ),
  unit('MJ', 1e-3),
  unit('GJ', 1),
  unit('TJ', 1e3),
  unit('kWh', KWH_GJ),
  unit('MWh', 1e3 * KWH_GJ),
  unit('GWh', 1e6 * KWH_GJ),
  unit('Btu', BTU_GJ),
  unit('kBtu', 1e3 * BTU_GJ),
  unit('MMBtu', 1e6 * BTU_GJ),
  unit('therm', THERM_KJ * KJ_GJ, ['thm']),
  unit('Dth', 10 * THERM_KJ * KJ_GJ, ['dekatherm']),
];

const SECONDS_PER_HOUR = 3600;

/** Power, internal unit kW. "hp" is mechanical horsepower, 550 ft lbf/s. */
export const powerUnits: readonly UnitDefinition[] = [
  unit('W', 1e-3),
  unit('kW', 1),
  unit('MW', 1e3),
  unit('hp', HORSEPOWER_KW),
  unit('GJ/h', 1e6 / SECONDS_PER_HOUR, ['GJ/hr']),
  unit('Btu/h', BTU_IT_KJ / SECONDS_PER_HOUR, ['Btu/hr']),
  unit('kBtu/h', (1e3 * BTU_IT_KJ) / SECONDS_PER_HOUR, ['kBtu/hr']),
  unit('MMBtu/h', (1e6 * BTU_IT_KJ) / SECONDS_PER_HOUR, ['MMBtu/hr']),
  // A ton of refrigeration is 12,000 Btu/h of cooling (the heat to melt a short ton of ice in a day).
  unit('TR', (12_000 * BTU_IT_KJ) / SECONDS_PER_HOUR, ['ton_refrigeration', 'tons_refrigeration']),
];
