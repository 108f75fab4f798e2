// Boilers, waste-heat boilers, steam imports and the feedwater pumps, as the
// audit sees them: feedwater in, steam and blowdown out, heat from the fire.
import type { EfficiencyPoint, FiredBoiler, HeatRecoveryBoiler, LiquidDestination, Plant } from '../../model/index.js';
import { saturatedLiquid } from '../../properties/index.js';
import { deliveredSteam, point, pointPH, type AuditStates } from './auditStates.js';
import type { Ledger } from './ledger.js';
import type { SolvedPlant } from './solvedPlant.js';
import { BALANCE_TOLERANCE, DRAIN, FEED_PUMPS, FUEL_CURVE_TOLERANCE, OUTSIDE } from './tolerances.js';

/** Where a liquid destination's stream goes. */
export function liquidTarget(destination: LiquidDestination): string {
  if (destination.kind === 'flashTank') return destination.id;
  if (destination.kind === 'deaerator') return 'deaerator';
  return DRAIN;
}

/** Efficiency at a load: straight lines between the table's points, flat beyond its ends. */
export function curveEfficiency(table: readonly EfficiencyPoint[], load: number): number {
  if (load <= table[0].load) return table[0].efficiency;
  for (let k = 1; k < table.length; k += 1) {
    if (load <= table[k].load) {
      const share = (load - table[k - 1].load) / (table[k].load - table[k - 1].load);
      return table[k - 1].efficiency + share * (table[k].efficiency - table[k - 1].efficiency);
    }
  }
  return table[table.length - 1].efficiency;
}

/**
 * Declares a boiler's streams: feedwater F = S / (1 - b) from the pumps,
 * steam S, blowdown B = S b / (1 - b) of saturated drum water. Returns the
 * heat the water takes up, kW.
 */
function raiseSteam(ledger: Ledger, states: AuditStates, unit: FiredBoiler | HeatRecoveryBoiler, steam: number): number {
  const pressure = states.headerPressure(unit.header);
  const outlet = deliveredSteam(pressure, unit.outlet);
  const blowdown = (steam * unit.blowdownFraction) / (1 - unit.blowdownFraction);
  const feed = states.boilerFeed(pressure);
  states.lift += (steam + blowdown) * states.pumpLift(pressure);
  const drum = point(saturatedLiquid(pressure));
  ledger.stream({ from: 'deaerator', to: FEED_PUMPS, label: `feedwater for ${unit.id}`, m: steam + blowdown, ...states.feedwater });
  ledger.stream({ from: FEED_PUMPS, to: unit.id, label: 'feedwater', m: steam + blowdown, ...feed });
  ledger.stream({ from: unit.id, to: unit.header, label: 'steam', m: steam, ...outlet });
  if (blowdown > 0) ledger.stream({ from: unit.id, to: liquidTarget(unit.blowdownTo), label: 'blowdown', m: blowdown, ...drum });
  ledger.cross({ volume: FEED_PUMPS, kind: 'work', direction: 'in', kW: (steam + blowdown) * (feed.h - states.feedwater.h), temperature: null });
  const heat = steam * outlet.h + blowdown * drum.h - (steam + blowdown) * feed.h;
  ledger.cross({ volume: unit.id, kind: 'heat', direction: 'in', kW: heat, temperature: null });
  return heat;
}

export function auditBoilers(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: (id: string, work: () => void) => void): void {
  ledger.volume(FEED_PUMPS, 'feedwaterPumps');
  for (const boiler of plant.boilers) {
    ledger.volume(boiler.id, 'boiler', false);
    attempt(boiler.id, () => {
      const result = find(solved.boilers, boiler.id);
      const heat = raiseSteam(ledger, states, boiler, result.steam);
      // Fuel = heat taken up by the water / efficiency at the solved load.
      const load = result.steam / boiler.steam.max;
      const fuel = result.steam > 0 ? heat / curveEfficiency(boiler.efficiency, load) : 0;
      const fullLoad = boiler.steam.max * 2000;
      ledger.check(boiler.id, 'fuel from the efficiency curve', fuel, result.fuel, 'kW', FUEL_CURVE_TOLERANCE, 1e-6 * fullLoad);
    });
  }
  for (const boiler of plant.heatRecoveryBoilers) {
    ledger.volume(boiler.id, 'heatRecoveryBoiler', false);
    attempt(boiler.id, () => {
      const result = find(solved.heatRecoveryBoilers, boiler.id);
      const steam = result.unfiredSteam + result.firedSteam;
      const heat = raiseSteam(ledger, states, boiler, steam);
      const firing = boiler.supplementaryFiring;
      const perKg = steam > 0 ? heat / steam : 0;
      const fuel = firing ? (result.firedSteam * perKg) / firing.efficiency : 0;
      ledger.check(boiler.id, 'duct-burner fuel', fuel, result.fuel, 'kW', BALANCE_TOLERANCE, 1e-6 * Math.max(1, (boiler.steam.max + (firing?.maxSteam ?? 0)) * 2000));
    });
  }
  for (const supply of plant.steamImports) {
    ledger.volume(supply.id, 'steamImport');
    attempt(supply.id, () => {
      const result = find(solved.steamImports, supply.id);
      const pressure = states.headerPressure(supply.header);
      const delivered = supply.byEnthalpy ? pointPH(pressure, supply.delivered.h) : deliveredSteam(pressure, supply.delivered);
      ledger.stream({ from: OUTSIDE, to: supply.id, label: 'purchased steam', m: result.steam, ...delivered });
      ledger.stream({ from: supply.id, to: supply.header, label: 'steam', m: result.steam, ...delivered });
    });
  }
}

/**
 * The pumps' shaft work against the solve's, and the lift the pumps' shares
 * give (each share times its pump's own efficiency) against the ideal lift
 * v dp m the boilers' feedwater needs.
 */
export function auditFeedPumps(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger): number {
  const work = ledger.crossings.filter((crossing) => crossing.volume === FEED_PUMPS).reduce((total, crossing) => total + crossing.kW, 0);
  ledger.check(FEED_PUMPS, 'pump shaft power', work, solved.deaerator.pumpShaft, 'kW', BALANCE_TOLERANCE, 1e-3);
  const pumps = plant.deaerator.feedwaterPumps;
  if (pumps.length > 0 && plant.deaerator.pumpWork) {
    const given = pumps.reduce((total, pump) => total + (solved.deaerator.pumps.find((entry) => entry.id === pump.id)?.shaft ?? 0) * pump.pumpEfficiency, 0);
    ledger.check(FEED_PUMPS, 'lift of the pumps (shaft x own efficiency) against v dp of the feedwater', states.lift, given, 'kW', BALANCE_TOLERANCE, 1e-3);
  }
  return work;
}

export function find<T extends { id: string }>(list: readonly T[], id: string): T {
  const found = list.find((entry) => entry.id === id);
  if (!found) throw new Error(`the solve reports nothing for "${id}". The plant and the solve must match.`);
  return found;
}
