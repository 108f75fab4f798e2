// The one place that knows which equipment lists a plant has: each list maps
// to the contribution class of its kind. Order matters only for `finish`:
// flash tanks from high to low pressure (a tank may feed the next), then the
// deaerator and machines, which collect pumping and shaft loads, then the grid.
import type { Plant } from '../model/index.js';
import type { UnitContribution } from './contribution.js';
import { BoilerContribution } from './units/boiler.js';
import { DeaeratorContribution } from './units/deaerator.js';
import { FlashTankContribution } from './units/flashTank.js';
import { GridContribution } from './units/grid.js';
import { HeaderContribution } from './units/header.js';
import { HeatRecoveryBoilerContribution } from './units/heatRecoveryBoiler.js';
import { LetdownContribution } from './units/letdown.js';
import { MachineContribution } from './units/machine.js';
import { SteamImportContribution } from './units/steamImport.js';
import { TurbineContribution } from './units/turbine.js';
import { UserContribution } from './units/user.js';
import { AbsorptionChillerContribution } from './units/absorptionChiller.js';
import { TrapGroupContribution } from './units/trapGroup.js';

export function contributionsOf(plant: Plant): UnitContribution[] {
  const flashTanks = [...plant.flashTanks].sort((a, b) => b.pressure - a.pressure);
  return [
    ...plant.headers.map((header) => new HeaderContribution(header)),
    ...plant.boilers.map((boiler) => new BoilerContribution(boiler)),
    ...plant.heatRecoveryBoilers.map((boiler) => new HeatRecoveryBoilerContribution(boiler)),
    ...plant.steamImports.map((supply) => new SteamImportContribution(supply)),
    ...plant.turbines.map((turbine) => new TurbineContribution(turbine)),
    ...plant.letdowns.map((letdown) => new LetdownContribution(letdown)),
    ...plant.users.map((user) => new UserContribution(user)),
    ...(plant.absorptionChillers ?? []).map((chiller) => new AbsorptionChillerContribution(chiller)),
    ...(plant.steamTraps ?? []).map((group) => new TrapGroupContribution(group)),
    ...flashTanks.map((tank) => new FlashTankContribution(tank)),
    new DeaeratorContribution(plant.deaerator),
    ...plant.machines.map((machine) => new MachineContribution(machine)),
    new GridContribution(plant.power),
  ];
}
