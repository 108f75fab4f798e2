// Blowdown heat recovery: a heat exchanger that warms the makeup water with
// the blowdown liquid on its way to drain, after any flash tank (US DOE Steam
// Tip Sheet #10, "Recover Heat from Boiler Blowdown": flash tank, heat
// exchanger, or both). Where blowdown already flashes in a tank whose liquid
// drains, the exchanger goes on that tank; where boilers blow down straight to
// drain, a flash tank and an exchanger together, an alternative to the flash
// tank alone.
import type { Plant } from '../model/index.js';
import { saturatedLiquid, statePT } from '../properties/index.js';
import type { Measure } from './measureTypes.js';
import { kelvin } from './quantities.js';
import { flowWords } from './quantities.js';
import { largest, unitValue, type SolvedRun } from './sizing.js';

/**
 * The exchanger recovers 90 % of the liquid's heat above the makeup
 * temperature, the figure of Tip Sheet #10's example; the liquid leaves at
 * the temperature that leaves the other 10 %.
 */
export const PREHEATER_RECOVERY = 0.9;

/** The liquid's leaving temperature, K, for saturated liquid from a tank at `tankPressure` (MPa) and the site's makeup. */
export function preheaterLeavingTemperature(plant: Plant, tankPressure: number): number {
  const patm = plant.site.atmosphericPressure;
  const makeup = plant.site.makeupWater;
  const target = makeup.h + (1 - PREHEATER_RECOVERY) * (saturatedLiquid(tankPressure).h - makeup.h);
  // Liquid water's enthalpy is close to c (T - T0): step the temperature to the target enthalpy.
  let T = makeup.temperature + (target - makeup.h) / 4.18;
  for (let i = 0; i < 20; i++) T += (target - statePT(patm, T).h) / 4.18;
  return T;
}

/** Tanks that receive blowdown and drain their liquid, with no preheater yet. */
function blowdownTanks(plant: Plant): Plant['flashTanks'] {
  const fed = new Set([...plant.boilers, ...plant.heatRecoveryBoilers].filter((boiler) => boiler.blowdownFraction > 0 && boiler.blowdownTo.kind === 'flashTank').map((boiler) => (boiler.blowdownTo as { id: string }).id));
  return plant.flashTanks.filter((tank) => fed.has(tank.id) && tank.liquidTo.kind === 'drain' && !tank.makeupPreheater);
}

export function preheaterMeasures(plant: Plant, runs: SolvedRun[], blowdownFlash: Measure | undefined): Measure[] {
  const costs = plant.costs!;
  const common = { lifeYears: costs.lifeYears, discountRate: costs.discountRate, fixedOmPerYear: 0, cause: null, ways: [] };
  const measures: Measure[] = [];
  for (const tank of blowdownTanks(plant)) {
    const liquid = largest(runs, (run) => unitValue(run, tank.id, 'liquid_kg_s'));
    if (!(liquid > 0)) continue;
    const leaving = preheaterLeavingTemperature(plant, tank.pressure);
    measures.push({
      ...common,
      id: `preheat_makeup_${tank.id}`,
      kind: 'blowdownPreheater',
      title: `makeup preheater on the liquid of ${tank.id}`,
      change: `a heat exchanger warms the makeup water with the liquid ${tank.id} sends to drain (up to ${flowWords(liquid)}), cooling it to ${(leaving - 273.15).toFixed(0)} degC: ${PREHEATER_RECOVERY * 100} % of its heat above the makeup temperature`,
      touches: [tank.id, 'deaerator'],
      alternativeOf: null,
      capital: costs.makeupPreheater,
      capitalBasis: 'one blowdown heat exchanger (costs.makeup_preheater)',
      changes: { flash_tanks: [{ id: tank.id, makeup_preheater: { leaving_temperature: kelvin(leaving) } }] },
    });
  }
  // Boilers that blow down straight to drain: the flash measure's tank, with an exchanger on its liquid.
  if (blowdownFlash) {
    const added = (blowdownFlash.changes.add as { flash_tanks: Record<string, unknown>[] }).flash_tanks[0];
    // The flash measure writes the tank's pressure in kPa (absolute).
    const leaving = preheaterLeavingTemperature(plant, Number.parseFloat(String(added.pressure)) / 1000);
    measures.push({
      ...blowdownFlash,
      id: `${blowdownFlash.id}_and_preheater`,
      kind: 'blowdownPreheater',
      title: `${blowdownFlash.title}, and a makeup preheater on its liquid`,
      change: `${blowdownFlash.change}; the liquid then warms the makeup water in a heat exchanger and leaves to drain at ${(leaving - 273.15).toFixed(0)} degC (${PREHEATER_RECOVERY * 100} % of its heat above the makeup temperature recovered)`,
      touches: [...blowdownFlash.touches, 'deaerator'],
      capital: blowdownFlash.capital + costs.makeupPreheater,
      capitalBasis: `${blowdownFlash.capitalBasis} and one blowdown heat exchanger (costs.makeup_preheater)`,
      changes: { ...blowdownFlash.changes, add: { flash_tanks: [{ ...added, makeup_preheater: { leaving_temperature: kelvin(leaving) } }] } },
    });
  }
  return measures;
}
