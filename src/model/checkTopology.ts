// Connections that load but cannot work as drawn: warnings, with the numbers.
import type { Plant } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

type PlantParts = Omit<Plant, 'defaults'>;

export function checkTopology(context: ResolveContext, plant: PlantParts): void {
  const headers = new Map(plant.headers.map((header) => [header.id, header]));
  const tanks = new Map(plant.flashTanks.map((tank) => [tank.id, tank]));
  const pathOf = (id: string): (string | number)[] => context.ids.get(id)?.path ?? [];

  // Liquid flows down in pressure on its own: a tank above the source needs a pump the case does not have.
  for (const user of plant.users) {
    const destination = user.condensate.to;
    const tank = destination.kind === 'flashTank' ? tanks.get(destination.id) : undefined;
    const header = headers.get(user.header);
    if (!tank || !header || user.condensate.returnFraction === 0 || tank.pressure <= header.pressure) continue;
    context.warn('uphill-condensate', [...pathOf(user.id), 'condensate', 'to'],
      `${user.id}'s condensate leaves at ${header.id}'s ${context.show(header.pressure, 'pressure')}, below flash tank ${tank.id} at ${context.show(tank.pressure, 'pressure')}; condensate does not flow up into it without a pump`);
  }

  for (const turbine of plant.turbines) {
    turbine.stages.forEach((stage, k) => {
      const exhaust = stage.exhaust;
      if (exhaust.kind !== 'condenser' || exhaust.condensateTo.kind !== 'flashTank') return;
      const tank = tanks.get(exhaust.condensateTo.id);
      if (!tank || tank.pressure <= exhaust.pressure) return;
      context.warn('uphill-condensate', [...pathOf(turbine.id), 'stages', k, 'condensate_to'],
        `turbine ${turbine.id}'s condensate leaves its condenser at ${context.show(exhaust.pressure, 'pressure')}, below flash tank ${tank.id} at ${context.show(tank.pressure, 'pressure')}; it does not flow up into it without a pump`);
    });
  }

  // Blowdown carries the boiler water's dissolved solids; its flash liquid belongs in the drain.
  const blowdownTanks = new Set<string>();
  for (const boiler of [...plant.boilers, ...plant.heatRecoveryBoilers]) if (boiler.blowdownFraction > 0 && boiler.blowdownTo.kind === 'flashTank') blowdownTanks.add(boiler.blowdownTo.id);
  for (const id of blowdownTanks) {
    const tank = tanks.get(id);
    if (tank && tank.liquidTo.kind === 'deaerator') {
      context.warn('blowdown-to-deaerator', [...pathOf(tank.id), 'liquid_to'],
        `flash tank ${tank.id} receives boiler blowdown and sends its liquid to the deaerator: that returns the concentrated solids the blowdown removes; send it to drain`);
    }
  }

  // A controlled header is held by spray: it can cool steam, never heat it.
  for (const supply of plant.steamImports) {
    const header = headers.get(supply.header);
    if (!header || header.state.kind !== 'controlled' || supply.delivered.h >= header.state.h) continue;
    context.warn('import-too-cold', [...pathOf(supply.id), 'temperature'],
      `steam import ${supply.id} delivers at ${context.show(supply.delivered.T, 'temperature')}, colder than ${header.id}'s set point of ${context.show(header.state.T, 'temperature')}; the header is held by spray, which cools but cannot heat, so the import fits only with hotter steam mixed in`);
  }
}
