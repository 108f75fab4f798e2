// src/scenarios: scenarios and sweeps solved side by side (on worker threads
// when there are several), annual weighting, project evaluation, and the
// letdown-to-power screen.
export { annualTotals, scenarioRun, COST_COMPONENTS, type AnnualTotals, type CostComponentName, type ScenarioRun } from './annual.js';
export { AS_WRITTEN, compareScenarios, findScenario, runSweep, ScenarioLookupError, type Comparison } from './compareScenarios.js';
export { internalRateOfReturn, netPresentValue, projectCashFlows, simplePayback } from './economics.js';
export { evaluateProject, evaluateProjects, ProjectLookupError, type ProjectEvaluation, type ProjectScenarioChange, type ProjectsOutcome } from './evaluateProjects.js';
export { plantOfJob, jobLabel, type Job, type JobOptions, type JobOutcome } from './jobs.js';
export { screenLetdowns, SCREEN_DEFAULTS, type LetdownScreenRow, type ScreenOptions } from './screenLetdowns.js';
export { solveOne } from './solveOne.js';
export { solvePlants, workerCount, workersAvailable, type PoolOptions } from './solvePool.js';
export { progressLine, type ProgressStream } from './progressLine.js';
export { WorkerPool } from './workerPool.js';
