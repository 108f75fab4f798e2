// src/model: the plant case file, its schema, loading with located issues, and the resolved plant in SI.
export { loadCase, loadCaseText, type LoadResult } from './loadCase.js';
export { displayPath, formatIssue, sortIssues, type CasePath, type Issue, type Severity } from './issue.js';
export { caseSchema, QUANTITY_PATTERN, ID_PATTERN, SCHEMA_ID } from './caseSchema.js';
export type * from './plantTypes.js';
export type * from './caseFileTypes.js';
export { starterCase, type StarterUnits } from './starterCase.js';
export { summarisePlant } from './summary.js';
export { schemaFilePath } from './schemaLocation.js';
export type * from './variantTypes.js';
export { HOURS_PER_YEAR } from './variantTypes.js';
export { parseMoney, parseYears } from './money.js';
export { resolveMeters, type Meter, type MeteredFlow } from './resolveMeters.js';
export { PHYSICAL_RANGES } from './physicalRanges.js';
export { MOST_PROFILE_HOURS } from './resolveProfile.js';
export { ACCURACY_CLASS, tipSheet20TurbineCost } from './resolveCosts.js';
export { napierSteamFlow } from './napier.js';
export { DEFAULT_COP } from './resolveChillers.js';
export { DEFAULT_DISCHARGE_COEFFICIENT } from './resolveTraps.js';
