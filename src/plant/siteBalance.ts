// The site energy balance: fuel and other energy in, against useful heat,
// work and every loss out. It closes when every node and unit closes, so it
// checks the bookkeeping as a whole.
import type { Pass } from './buildPass.js';
import type { UnitReport } from './contribution.js';
import { ATMOSPHERE, DRAIN, MAKEUP, headerLoss, solvedEnergy } from './network.js';
import type { PassSolution } from './passSolution.js';

export interface SiteEnergyBalance {
  /** energy in, kW */
  fuel_kW: number;
  waste_heat_kW: number;
  pump_work_kW: number;
  makeup_water_kW: number;
  imported_steam_kW: number;
  /** energy out, kW */
  process_heat_kW: number;
  turbine_work_kW: number;
  condenser_kW: number;
  stack_kW: number;
  vents_kW: number;
  drains_kW: number;
  header_losses_kW: number;
  /** in - out, kW */
  residual_kW: number;
  /** |residual| / energy in */
  relative: number;
}

export function siteBalance(pass: Pass, solution: PassSolution, reports: readonly UnitReport[]): SiteEnergyBalance {
  const context = pass.context;
  const sum = (kind: string, key: string): number =>
    reports.filter((unit) => unit.kind === kind).reduce((total, unit) => total + (typeof unit.values[key] === 'number' ? (unit.values[key] as number) : 0), 0);
  const flowEnergy = (predicate: (from: string, to: string) => boolean): number =>
    context.streams.filter((stream) => predicate(stream.from, stream.to)).reduce((total, stream) => total + solvedEnergy(stream, solution), 0);
  const importIds = new Set(context.plant.steamImports.map((supply) => supply.id));

  let fuel = 0;
  for (const fired of context.fuel.values()) fuel += solution.evaluate(fired);
  // Heat taken up by the water side of every fired boiler and duct burner.
  const firedAbsorbed = sum('boiler', 'heat_absorbed_kW') + sum('heatRecoveryBoiler', 'fired_heat_kW');
  const balance = {
    fuel_kW: fuel,
    waste_heat_kW: sum('heatRecoveryBoiler', 'waste_heat_kW'),
    pump_work_kW: solution.evaluate(context.pumpShaft),
    makeup_water_kW: flowEnergy((from) => from === MAKEUP),
    imported_steam_kW: flowEnergy((from) => importIds.has(from)),
    process_heat_kW: sum('user', 'heat_kW') + sum('absorptionChiller', 'steam_heat_kW'),
    turbine_work_kW: sum('turbine', 'steam_work_kW'),
    condenser_kW: sum('turbine', 'condenser_kW'),
    stack_kW: fuel - firedAbsorbed,
    vents_kW: flowEnergy((_, to) => to === ATMOSPHERE),
    drains_kW: flowEnergy((_, to) => to === DRAIN),
    header_losses_kW: context.plant.headers.reduce((total, header) => total + headerLoss(header.heatLoss, context.streamsInto(header.id), solution), 0),
  };
  const energyIn = balance.fuel_kW + balance.waste_heat_kW + balance.pump_work_kW + balance.makeup_water_kW + balance.imported_steam_kW;
  const energyOut =
    balance.process_heat_kW + balance.turbine_work_kW + balance.condenser_kW + balance.stack_kW + balance.vents_kW + balance.drains_kW + balance.header_losses_kW;
  const residual = energyIn - energyOut;
  return { ...balance, residual_kW: residual, relative: Math.abs(residual) / Math.max(energyIn, 1e-9) };
}
