// The units whose on/off links periods: those that declare switching rules
// (a start cost, minimum running or stopped hours) and may switch off.
import type { Plant, SwitchingRules } from '../model/index.js';

export interface RuledUnit {
  id: string;
  kind: 'boiler' | 'turbine';
  /** the period model's on/off binary */
  onName: string;
  rules: SwitchingRules;
}

export function ruledUnits(plant: Plant): RuledUnit[] {
  const units: RuledUnit[] = [];
  for (const boiler of plant.boilers) if (boiler.switching && boiler.canSwitchOff) units.push({ id: boiler.id, kind: 'boiler', onName: `${boiler.id}.on`, rules: boiler.switching });
  for (const turbine of plant.turbines) if (turbine.switching && turbine.canSwitchOff) units.push({ id: turbine.id, kind: 'turbine', onName: `${turbine.id}.on`, rules: turbine.switching });
  return units;
}

/** Whether the unit is in this period's plant (the profile may take it out of service). */
export function inService(plant: Plant, unit: RuledUnit): boolean {
  return unit.kind === 'boiler' ? plant.boilers.some((boiler) => boiler.id === unit.id) : plant.turbines.some((turbine) => turbine.id === unit.id);
}

/**
 * The period's plant with the ruled units' on/off held: a unit to run may not
 * switch off (it runs at least at its minimum), a unit to stop is left out.
 * Units out of service stay out. Other switchable units stay free.
 */
export function heldPlant(plant: Plant, units: readonly RuledUnit[], onOff: ReadonlyMap<string, 0 | 1>, without: (plant: Plant, out: ReadonlySet<string>) => Plant): Plant {
  const running = new Set(units.filter((unit) => onOff.get(unit.id) === 1).map((unit) => unit.id));
  const stopped = new Set(units.filter((unit) => onOff.get(unit.id) === 0 && inService(plant, unit)).map((unit) => unit.id));
  let held: Plant = {
    ...plant,
    boilers: plant.boilers.map((boiler) => (running.has(boiler.id) ? { ...boiler, canSwitchOff: false } : boiler)),
    turbines: plant.turbines.map((turbine) => (running.has(turbine.id) ? { ...turbine, canSwitchOff: false } : turbine)),
  };
  if (stopped.size > 0) held = without(held, stopped);
  return held;
}
