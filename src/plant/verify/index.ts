// The independent audit: reads only the resolved plant and the solve's flows
// and header states, and works every stream and unit out again with IF97.
export { auditPlant, auditSolve, type IndependentAudit, type UnitAudit } from './auditPlant.js';
export { solvedPlantFromReports, type SolvedPlant, type ReportedUnit, type ReportedHeader } from './solvedPlant.js';
export type { RelationCheck } from './ledger.js';
export { BALANCE_TOLERANCE, FUEL_CURVE_TOLERANCE, ENTROPY_TOLERANCE } from './tolerances.js';
export { sectionExhaust } from './turbines.js';
export { curveEfficiency } from './supplies.js';
