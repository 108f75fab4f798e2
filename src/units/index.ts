// src/units: quantity text in, internal SI out, and back for display.
//
// Library decision: the factors are our own small table (exactFactors.ts)
// rather than an npm unit library. convert-units 2.3.4, the best-known, has
// no gauge pressure, no mass flow, no Btu or MMBtu, no specific enthalpy or
// entropy and no currency rates, and its psi comes from a rounded ratio
// (0.00014503768078) rather than the exact definition. A dozen exact factors
// with their sources are easier to check than a dependency that covers half
// of what a steam balance needs.
export type { ParseOptions } from './atmosphere.js';
export { STANDARD_ATMOSPHERE_MPA } from './atmosphere.js';
export { fromSI, toSI, unitsOf } from './convert.js';
export { displayUnit, formatQuantity, type FormatOptions, type UnitSystem } from './format.js';
export { quantityKinds, type QuantityKind } from './kinds.js';
export { parseQuantity, type ParseResult } from './parseQuantity.js';
