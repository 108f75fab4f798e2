import { unit, type UnitDefinition } from './unitDefinition.js';

/** Percent, stored as a fraction: 2 % is 0.02. "per cent" matches "percent" since spaces are ignored. */
export const percentUnits: readonly UnitDefinition[] = [unit('%', 0.01, ['percent', 'pct'])];
