// Candidate measures from a solved balance: vents (with their causes and the
// ways to end them), turbines beside letdowns, condensate return, flash and
// blowdown recovery (flash tanks, makeup preheaters), trap repair,
// insulation, and the other drive of machines and feedwater pumps that could have both.
import type { Plant } from '../model/index.js';
import type { Measure } from './measureTypes.js';
import { driveMeasures } from './driveMeasures.js';
import { preheaterMeasures } from './preheaterMeasures.js';
import type { SolvedRun } from './sizing.js';
import { letdownTurbines } from './turbineMeasures.js';
import { findVents, ventMeasures, type VentFinding } from './ventMeasures.js';
import { condensateMeasures, flashMeasures, insulationMeasures, trapMeasures } from './waterMeasures.js';

export function generateMeasures(plant: Plant, runs: SolvedRun[]): { measures: Measure[]; vents: VentFinding[] } {
  const vents = findVents(runs);
  const measures: Measure[] = [];
  for (const finding of vents) measures.push(...ventMeasures(plant, runs, finding));
  const flash = flashMeasures(plant);
  const blowdownFlash = flash.find((measure) => measure.kind === 'blowdownFlash');
  measures.push(...letdownTurbines(plant, runs), ...condensateMeasures(plant, runs), ...flash, ...preheaterMeasures(plant, runs, blowdownFlash), ...trapMeasures(plant), ...insulationMeasures(plant), ...driveMeasures(plant, runs));
  // Two ways of ending the same vent may propose the same unit change; ids stay unique.
  const seen = new Set<string>();
  return { measures: measures.filter((measure) => (seen.has(measure.id) ? false : (seen.add(measure.id), true))), vents };
}
