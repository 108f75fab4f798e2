// Shaft and electric power: machines and feedwater pumps driven by turbines
// or motors, and the site's electricity balance.
import type { Plant } from '../../model/index.js';
import type { Ledger } from './ledger.js';
import type { SolvedPlant } from './solvedPlant.js';
import { find } from './supplies.js';
import { BALANCE_TOLERANCE, FEED_PUMPS, SITE_POWER } from './tolerances.js';

/**
 * Every driven machine gets its shaft power from its turbine (by the audit's
 * power) and its motor; the site's electricity closes: generation + import -
 * export - motors = site demand.
 */
export function auditPower(plant: Plant, solved: SolvedPlant, ledger: Ledger, turbinePower: ReadonlyMap<string, number>, pumpShaft: number): void {
  const turbineShaft = (machine: string): number =>
    plant.turbines.filter((turbine) => turbine.drives.kind === 'machine' && turbine.drives.id === machine).reduce((total, turbine) => total + (turbinePower.get(turbine.id) ?? 0), 0);
  let motors = 0;
  for (const machine of plant.machines) {
    const result = find(solved.machines, machine.id);
    ledger.volume(machine.id, 'machine');
    ledger.check(machine.id, 'shaft power from turbine and motor', machine.shaftPower, turbineShaft(machine.id) + result.motorShaft, 'kW', BALANCE_TOLERANCE, 1e-3);
    motors += result.motorElectric;
  }
  const pumps = plant.deaerator.feedwaterPumps;
  if (pumps.length > 0) {
    const driven = pumps.reduce((total, pump) => total + turbineShaft(pump.id), 0) + solved.deaerator.pumpMotorShaft;
    ledger.check(FEED_PUMPS, 'shaft power from turbines and motors', pumpShaft, driven, 'kW', BALANCE_TOLERANCE, 1e-3);
    // Each pump's share is driven by its own turbine and motor.
    for (const pump of pumps) {
      const share = solved.deaerator.pumps.find((entry) => entry.id === pump.id);
      if (!share) throw new Error(`the solve reports no shaft power for feedwater pump "${pump.id}". The plant and the solve must match.`);
      ledger.check(FEED_PUMPS, `${pump.id} shaft power from its turbine and motor`, share.shaft, turbineShaft(pump.id) + share.motorShaft, 'kW', BALANCE_TOLERANCE, 1e-3);
    }
    motors += solved.deaerator.pumpMotorElectric;
  } else {
    // No pumps described: their work is bought as electricity.
    motors += pumpShaft;
  }
  // Electric chillers: the cooling not made by absorption, at their kW per kW.
  for (const chiller of plant.absorptionChillers ?? []) {
    const result = find(solved.absorptionChillers, chiller.id);
    ledger.check(chiller.id, 'electric chillers\' power', result.electricCooling * chiller.electricPerCooling, result.electric, 'kW', BALANCE_TOLERANCE, 1e-3);
    motors += result.electric;
  }
  const generated = plant.turbines.filter((turbine) => turbine.drives.kind === 'generator').reduce((total, turbine) => total + (turbinePower.get(turbine.id) ?? 0), 0);
  ledger.volume(SITE_POWER, 'sitePower');
  const met = generated + solved.grid.imported - solved.grid.exported - motors;
  ledger.check(SITE_POWER, 'site demand met', plant.power.siteDemand, met, 'kW', BALANCE_TOLERANCE, Math.max(1, generated + solved.grid.imported) * 1e-3);
}
