// Meter reconciliation: readings fitted to the plant's balances, tested, and
// the suspect meters found.
export { reconcileLinear, InconsistentBalancesError, type BalanceRow, type LinearProblem, type LinearResult, type Reading, type ReadingResult } from './linearReconciliation.js';
export { testReconciliation, type GlobalTest, type Suspect, type TestSettings, type TestedReconciliation } from './serialElimination.js';
export { globalCritical, globalPValue, sidakCritical, normalCritical, coverageFactor } from './statistics.js';
export { meterStreams, type MeteredStream } from './meterStreams.js';
export { fuelMeters, fuelRow, powerMeters, powerRow, steamForFuel, POWER_SCALE, type FuelMeter, type PowerMeter } from './powerMeters.js';
export { parseReadings, type AveragedReading, type ReadingIssue, type ReadingKind, type ReadingsResult, type ReadingsWindow } from './readings.js';
export { pressureMeters, type PressureMeter } from './pressureMeters.js';
export { reconcilePlant, readingSigma, balanceRows, METHOD, type MeterResult, type ReconcileOutcome, type ReconcileSettings, type StreamResult, type SuspectResult } from './reconcilePlant.js';
export { planThermometers, type Thermometer, type ThermometerPlan } from './thermometers.js';
export { reconciledDiagram, type ReconciledDiagram, type ReconciledStream, type SuspectOnStream } from './diagramFlows.js';
export { reconcileBounded, type BoundedResult } from './boundedReconciliation.js';
export { reconcileWithEnergy, EnergyIterationError, type EnergyNode, type EnergyProblem, type EnergyResult, type EnergySettings, type EnergyStream, type TemperaturePoint } from './energyReconciliation.js';
export { reconciledCase, type WrittenCase } from './writeCase.js';
