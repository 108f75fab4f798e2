// One period's plant: the base plant (resolved once) with the period's profile
// values written straight into its SI fields. This is a path independent of
// the case resolver that scenarios use, so the two check each other in tests.
import type { Plant } from '../model/index.js';
import { statePT } from '../properties/index.js';
import type { ProfileColumn } from './profileColumns.js';

/** GJ per kWh: prices per GJ become prices per kWh for the power balance. */
const GJ_PER_KWH = 0.0036;

/** A unit a period takes out of service that others depend on, said plainly. */
export class PeriodPlantError extends Error {}

/**
 * The base plant with one period's values (internal units, in column order).
 * Units out of service are removed with every reference to them, as a
 * scenario's `disable` would.
 */
export function periodPlant(base: Plant, columns: readonly ProfileColumn[], values: ArrayLike<number>, offset = 0): Plant {
  let plant: Plant = { ...base };
  const out = new Set<string>();
  columns.forEach((column, slot) => {
    const value = values[offset + slot];
    const target = column.target;
    switch (target.kind) {
      case 'userSteam':
        plant.users = plant.users.map((user) => (user.id === target.id ? { ...user, demand: { kind: 'flow', massFlow: value } } : user));
        break;
      case 'userHeat':
        plant.users = plant.users.map((user) => (user.id === target.id ? { ...user, demand: { kind: 'duty', heat: value } } : user));
        break;
      case 'recoverySteam':
        plant.heatRecoveryBoilers = plant.heatRecoveryBoilers.map((boiler) => (boiler.id === target.id ? { ...boiler, steam: { min: value, max: value } } : boiler));
        break;
      case 'fuelPrice':
        plant.fuels = plant.fuels.map((fuel) => (fuel.id === target.id ? { ...fuel, price: value } : fuel));
        break;
      case 'importPrice':
        plant.power = { ...plant.power, import: { ...plant.power.import, price: value * GJ_PER_KWH } };
        break;
      case 'exportPrice':
        plant.power = { ...plant.power, export: { ...plant.power.export, price: value * GJ_PER_KWH } };
        break;
      case 'siteDemand':
        plant.power = { ...plant.power, siteDemand: value };
        break;
      case 'makeupTemperature':
        plant.site = { ...plant.site, makeupWater: { ...plant.site.makeupWater, temperature: value, h: statePT(plant.site.atmosphericPressure, value).h } };
        break;
      case 'ambientTemperature':
        plant.site = { ...plant.site, ambientTemperature: value };
        break;
      case 'available':
        if (value === 0) out.add(target.id);
        break;
    }
  });
  if (out.size > 0) plant = withoutUnits(plant, out);
  return plant;
}

/** The plant without these units, every reference to them removed (a machine a stopped turbine drove keeps its motor). */
export function withoutUnits(plant: Plant, out: ReadonlySet<string>): Plant {
  const kept = <T extends { id: string }>(list: T[]): T[] => list.filter((item) => !out.has(item.id));
  const result: Plant = {
    ...plant,
    boilers: kept(plant.boilers),
    heatRecoveryBoilers: kept(plant.heatRecoveryBoilers),
    steamImports: kept(plant.steamImports),
    turbines: kept(plant.turbines),
    letdowns: kept(plant.letdowns),
    flashTanks: plant.flashTanks.map((tank) => ({ ...tank, receives: tank.receives.filter((id) => !out.has(id)) })),
  };
  // A pump or machine that a stopped turbine could drive keeps its motor; one with no motor cannot run.
  result.machines = plant.machines.map((machine) => {
    if (machine.turbine === null || !out.has(machine.turbine)) return machine;
    if (machine.motor === null) throw new PeriodPlantError(`machine ${machine.id} has no motor and its turbine ${machine.turbine} is out of service`);
    return { ...machine, turbine: null };
  });
  result.deaerator = {
    ...plant.deaerator,
    feedwaterPumps: plant.deaerator.feedwaterPumps.map((pump) => {
      if (pump.turbine === null || !out.has(pump.turbine)) return pump;
      if (pump.motor === null) throw new PeriodPlantError(`feedwater pump ${pump.id} has no motor and its turbine ${pump.turbine} is out of service`);
      return { ...pump, turbine: null };
    }),
  };
  return result;
}
