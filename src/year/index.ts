// src/year: a year of operation from a profile of periods: the CSV read onto
// the case, blocks of periods warm-started from their neighbours on worker
// threads, identical periods solved once, totals folded in period order, and
// shards that merge into exactly the single run's result.
export { readColumn, PERIOD_COLUMNS, type ColumnTarget, type ProfileColumn } from './profileColumns.js';
export { readProfile, formatProfileIssue, type Profile, type ProfileIssue, type ProfileRead } from './readProfile.js';
export { loadProfile, MAX_PROFILE_BYTES } from './loadProfile.js';
export { periodPlant, PeriodPlantError } from './periodPlant.js';
export { periodRecord, trackedUnits, COMPONENTS, type PeriodRecord, type UnitState, type TrackedUnit } from './periodRecord.js';
export { solveBlock, blockTasks, BLOCK_PERIODS, type BlockTask, type BlockSettings } from './solveBlock.js';
export { solveBlocks, type YearRunOptions } from './solveYear.js';
export { YearAccumulator, type YearTotals, type EnergyTotals, type MonthTotals, type UnitYear, type HeaderYear, type FailedPeriod } from './yearTotals.js';
export { runYear, yearMeta, yearFingerprint, shardBlocks, totalsOf, YearModeError, type YearInput, type YearMeta, type YearResult, type Shard, type UnscheduledWindow } from './runYear.js';
export { mergeParts, partText, PART_FORMAT, type PartFile, type MergeOutcome } from './parts.js';
export { ruledUnits, heldPlant, type RuledUnit } from './switchingUnits.js';
export { windowModel, type UnitHistory, type WayToRun, type WindowPeriod, type WindowModel } from './windowModel.js';
export { solveRolling, WINDOW_KEPT, WINDOW_OVERLAP, type WindowSize, type WindowNote } from './solveRolling.js';
export { switchingIssues } from './switchingIssues.js';
