export { solveSummary, type SummaryOptions } from './solveSummary.js';
export { SAFETY_CAUTION } from './safety.js';
export { table } from './table.js';
export { writeFileAtomic } from './writeFileAtomic.js';
