// src/savings: measures generated from a solved balance, each an overlay
// proven by solving; ranking; the cumulative roadmap.
export { findSavings, rankKey, RANK_CRITERIA, type Interaction, type MeasureResult, type RankCriterion, type RoadmapStep, type SavingsOptions, type SavingsResult } from './findSavings.js';
export { generateMeasures } from './generateMeasures.js';
export { evaluateChanges, physicalChange, solveBase, type SavingsPoolOptions, type BaseSolves, type ChangeOutcome, type PhysicalChange, type SolvedChange } from './evaluateMeasures.js';
export { caseWithProjects, resolveMeasurePlants, type MeasurePlants } from './measurePlants.js';
export { measureAsProject, type Measure, type MeasureKind } from './measureTypes.js';
export { mergeChanges } from './mergeChanges.js';
export { findVents, type VentFinding } from './ventMeasures.js';
export { NEW_TURBINE, CONDENSING } from './turbineMeasures.js';
export { RETURN_TARGET } from './waterMeasures.js';
