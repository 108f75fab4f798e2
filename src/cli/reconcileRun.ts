// Reconcile a case's meters against a readings file, for `reconcile` and
// `report --readings`: every problem in the meters or the readings is
// printed located and ends the command with nothing written.
import { open } from 'node:fs/promises';
import { formatIssue, resolveMeters, type Issue, type Plant } from '../model/index.js';
import { streamNetwork } from '../plant/index.js';
import { PropertyRangeError } from '../properties/index.js';
import { EnergyIterationError, InconsistentBalancesError, fuelMeters, meterStreams, parseReadings, planThermometers, powerMeters, pressureMeters, readingSigma, reconcilePlant, type AveragedReading, type ReadingKind, type ReconcileOutcome } from '../reconcile/index.js';
import { CliError, EXIT_PROBLEMS } from './errors.js';

/** A readings file larger than this is refused (a year of minute readings of 50 meters is some 30 MB). */
const MAX_READINGS_BYTES = 64_000_000;

export interface ReconcileRunSettings {
  level: number;
  from?: string;
  to?: string;
}

/** The reconciled readings of a loaded case, or a CliError after the located problems went to `say` (standard error by default). */
export async function reconcileFilesOrFail(casePath: string, readingsPath: string, plant: Plant, settings: ReconcileRunSettings, say: (line: string) => void = toStderr): Promise<{ outcome: ReconcileOutcome; caseText: string }> {
  const caseText = (await readBounded(casePath, 2_000_000)).toString('utf8');
  const { meters, issues: meterIssues } = resolveMeters(caseText);
  const network = streamNetwork(plant);
  const { metered, issues: streamIssues } = meterStreams(meters, network);
  const plan = planThermometers(meters, network, plant);
  const power = powerMeters(meters, network);
  const fuel = fuelMeters(meters, network);
  const pressure = pressureMeters(meters, plant);
  const caseIssues: Issue[] = [...meterIssues, ...streamIssues, ...plan.issues, ...power.issues, ...fuel.issues, ...pressure.issues];
  if (meters.length === 0 && caseIssues.length === 0) throw new CliError(`${casePath}: the case has no meters; add a "meters:" list (tag, unit, measures, uncertainty) to reconcile`, EXIT_PROBLEMS);
  if (caseIssues.length > 0) {
    for (const issue of caseIssues.sort((a, b) => a.line - b.line)) say(formatIssue(issue, casePath));
    throw new CliError(`${casePath}: ${caseIssues.length} error${caseIssues.length === 1 ? '' : 's'} in the meters; nothing was reconciled`, EXIT_PROBLEMS);
  }

  const readingsText = (await readBounded(readingsPath, MAX_READINGS_BYTES)).toString('utf8');
  const window = { from: settings.from === undefined ? null : Date.parse(settings.from), to: settings.to === undefined ? null : Date.parse(settings.to) };
  const kinds = new Map<string, ReadingKind>([
    ...plan.thermometers.map((thermometer) => [thermometer.meter.tag, 'temperature'] as const),
    ...pressure.metered.map(({ meter }) => [meter.tag, 'pressure'] as const),
    ...power.metered.map(({ meter }) => [meter.tag, 'power'] as const),
    ...fuel.metered.map(({ meter }) => [meter.tag, 'fuel'] as const),
  ]);
  const parsed = parseReadings(readingsText, new Set(meters.map((meter) => meter.tag)), window, kinds, { atmosphericPressure_MPa: plant.site.atmosphericPressure });
  const readingProblems = parsed.ok ? [] : parsed.issues;
  if (parsed.ok && !parsed.series && (window.from !== null || window.to !== null)) {
    throw new CliError(`${readingsPath}: --from and --to choose a window of a series, but the file has no time column`, EXIT_PROBLEMS);
  }
  const readings: Map<string, AveragedReading> = parsed.ok ? parsed.readings : new Map();
  for (const { meter } of [...metered, ...power.metered, ...fuel.metered, ...pressure.metered]) {
    const reading = readings.get(meter.tag);
    if (reading && !(readingSigma(meter, reading.value) > 0)) {
      readingProblems.push({ line: reading.line, message: `reading of ${meter.tag} is zero and its uncertainty is a share of the reading, so it has none; give the meter an uncertainty as a ${meter.measures === 'power' || meter.measures === 'fuel' ? 'power (such as "20 kW")' : meter.measures === 'pressure' ? 'pressure difference (such as "0.1 bar")' : 'flow (such as "0.2 t/h")'}` });
    }
  }
  if (readingProblems.length > 0) {
    for (const problem of readingProblems.sort((a, b) => a.line - b.line)) say(`${readingsPath}:${problem.line}: ${problem.message}`);
    throw new CliError(`${readingsPath}: ${readingProblems.length} error${readingProblems.length === 1 ? '' : 's'}; nothing was reconciled`, EXIT_PROBLEMS);
  }
  if (readings.size === 0) throw new CliError(`${readingsPath}: no reading of any meter${window.from !== null || window.to !== null ? ' in the window --from/--to' : ''}; nothing was reconciled`, EXIT_PROBLEMS);

  try {
    const outcome = reconcilePlant(plant, metered, readings, { level: settings.level }, network, { thermometers: plan.thermometers, pressure: pressure.metered, power: power.metered, fuel: fuel.metered });
    return { outcome, caseText };
  } catch (error) {
    // The energy balances can fail on the readings themselves: say which, never a stack trace.
    if (error instanceof EnergyIterationError || error instanceof InconsistentBalancesError || error instanceof PropertyRangeError) {
      throw new CliError(`${readingsPath}: cannot be reconciled: ${error.message}; nothing was reconciled`, EXIT_PROBLEMS);
    }
    throw error;
  }
}

const toStderr = (line: string): void => {
  process.stderr.write(`${line}\n`);
};

/** A file's bytes with a bound; an unreadable or oversized file is one CliError line. */
async function readBounded(path: string, limit: number): Promise<Buffer> {
  let handle;
  try {
    handle = await open(path, 'r');
  } catch (error) {
    throw new CliError(`${path}: cannot read it (${(error as NodeJS.ErrnoException).code ?? String(error)})`, EXIT_PROBLEMS);
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) throw new CliError(`${path}: it is a directory, not a file`, EXIT_PROBLEMS);
    const buffer = Buffer.alloc(Math.min(limit + 1, info.isFile() ? info.size + 1 : limit + 1));
    let filled = 0;
    while (filled < buffer.length) {
      const { bytesRead } = await handle.read(buffer, filled, buffer.length - filled, null);
      if (bytesRead === 0) break;
      filled += bytesRead;
    }
    if (filled > limit) throw new CliError(`${path}: larger than ${limit.toLocaleString('en')} bytes; split the readings or choose a window`, EXIT_PROBLEMS);
    return buffer.subarray(0, filled);
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw new CliError(`${path}: cannot read it (${(error as NodeJS.ErrnoException).code ?? String(error)})`, EXIT_PROBLEMS);
  } finally {
    await handle.close().catch(() => undefined);
  }
}
