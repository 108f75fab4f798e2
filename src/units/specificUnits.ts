import { BTU_PER_LB_KJ_PER_KG, BTU_PER_LB_RANKINE_KJ_PER_KG_K } from './exactFactors.js';
import { unit, type UnitDefinition } from './unitDefinition.js';

/** Specific enthalpy, internal unit kJ/kg. */
export const specificEnthalpyUnits: readonly UnitDefinition[] = [
  unit('J/kg', 1e-3),
  unit('kJ/kg', 1),
  unit('MJ/kg', 1e3),
  unit('Btu/lb', BTU_PER_LB_KJ_PER_KG, ['Btu/lbm']),
];

// Spaces and middle dots are ignored when matching, so "kJ/(kg K)",
// "kJ/(kg·K)" and "kJ/(kgK)" are one spelling. A degree of Fahrenheit and
// one of Rankine are the same size, so Btu/(lb degF) equals Btu/(lb R).
/** Specific entropy (and specific heat), internal unit kJ/(kg K). */
export const specificEntropyUnits: readonly UnitDefinition[] = [
  unit('J/(kg K)', 1e-3, ['J/kg/K', 'J/kg-K', 'J/kgK']),
  unit('kJ/(kg K)', 1, ['kJ/kg/K', 'kJ/kg-K', 'kJ/kgK', 'kJ/(kg degC)', 'kJ/(kg °C)']),
  unit('Btu/(lb R)', BTU_PER_LB_RANKINE_KJ_PER_KG_K, [
    'Btu/lb/R', 'Btu/lb-R', 'Btu/(lb degR)', 'Btu/(lb °R)', 'Btu/(lbm R)', 'Btu/lbm/R',
  ]),
  unit('Btu/(lb degF)', BTU_PER_LB_RANKINE_KJ_PER_KG_K, [
    'Btu/lb/degF', 'Btu/lb-degF', 'Btu/(lb °F)', 'Btu/(lb F)', 'Btu/lb/F', 'Btu/lb-F',
  ]),
];
