// Checks that need the whole plant: drives of machines, what each flash tank
// receives, headers nothing can feed, and warnings for legal but odd choices.
import type { Plant } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

type PlantParts = Omit<Plant, 'defaults'>;

export function linkDrives(context: ResolveContext, plant: PlantParts): void {
  const driven = new Map<string, { turbine: string | null; motor: unknown; id: string }>();
  for (const machine of plant.machines) driven.set(machine.id, machine);
  for (const pump of plant.deaerator.feedwaterPumps) driven.set(pump.id, pump);
  plant.turbines.forEach((turbine) => {
    if (turbine.drives.kind !== 'machine') return;
    const machine = driven.get(turbine.drives.id);
    if (!machine) return;
    const path = context.ids.get(turbine.id)?.path ?? ['turbines'];
    if (machine.turbine !== null) {
      context.error('driven-twice', [...path, 'drives'], `${machine.id} is already driven by turbine ${machine.turbine}; one turbine per machine`);
      return;
    }
    machine.turbine = turbine.id;
  });
  for (const machine of driven.values()) {
    if (machine.turbine === null && machine.motor === null) {
      const path = context.ids.get(machine.id)?.path ?? [];
      context.error('no-drive', path, `${machine.id} has no drive: give motor_efficiency for an electric motor, or name it in a turbine's drives`);
    }
  }
  // An alternative drive replaces the installed one, so the installed one must be the other kind.
  for (const machine of [...plant.machines, ...plant.deaerator.feedwaterPumps]) {
    const alternative = machine.alternativeDrive;
    if (!alternative) continue;
    const path = [...(context.ids.get(machine.id)?.path ?? []), 'alternative_drive'];
    if (alternative.kind === 'motor' && machine.motor !== null) {
      context.error('alternative-drive-installed', [...path, 'motor_efficiency'], `${machine.id} already has a motor (motor_efficiency); a motor alternative replaces a turbine drive, so leave it out or give a turbine alternative`);
    }
    if (alternative.kind === 'turbine' && machine.turbine !== null) {
      context.error('alternative-drive-installed', [...path, 'turbine_from'], `${machine.id} is already driven by turbine ${machine.turbine}; a turbine alternative replaces a motor, so leave it out or give a motor alternative`);
    }
  }
}

export function linkFlashTanks(context: ResolveContext, plant: PlantParts): void {
  const tanks = new Map(plant.flashTanks.map((tank) => [tank.id, tank]));
  const send = (source: string, to: { kind: string; id?: string }) => {
    if (to.kind === 'flashTank' && to.id) tanks.get(to.id)?.receives.push(source);
  };
  for (const user of plant.users) if (user.condensate.returnFraction > 0) send(user.id, user.condensate.to);
  for (const boiler of plant.boilers) send(boiler.id, boiler.blowdownTo);
  for (const boiler of plant.heatRecoveryBoilers) send(boiler.id, boiler.blowdownTo);
  for (const tank of plant.flashTanks) send(tank.id, tank.liquidTo);
  for (const turbine of plant.turbines) for (const stage of turbine.stages) if (stage.exhaust.kind === 'condenser') send(turbine.id, stage.exhaust.condensateTo);
  // Read from the case as written, so a user that failed its own checks still counts.
  const named = new Set<unknown>();
  for (const { item } of context.entries(['users'])) named.add((item.condensate as Record<string, unknown> | undefined)?.to);
  for (const list of ['boilers', 'heat_recovery_boilers']) for (const { item } of context.entries([list])) named.add(item.blowdown_to);
  for (const { item } of context.entries(['flash_tanks'])) named.add(item.liquid_to);
  for (const tank of plant.flashTanks) {
    if (tank.receives.length === 0 && !named.has(tank.id)) {
      context.warn('flash-tank-unused', context.ids.get(tank.id)?.path ?? [], `flash tank ${tank.id} receives nothing: no user condensate, blowdown or flash liquid is sent to it`);
    }
  }
}

/**
 * A header nothing can feed. Sources are read from the case as written, so a
 * boiler that failed its own checks still counts and no second error follows.
 */
export function checkSources(context: ResolveContext, plant: PlantParts): void {
  const fed = new Set<unknown>();
  const named = (list: string, key: string) => context.entries([list]).forEach(({ item }) => fed.add(item[key]));
  named('boilers', 'header');
  named('heat_recovery_boilers', 'header');
  named('steam_imports', 'header');
  named('letdowns', 'to');
  named('flash_tanks', 'vapour_to');
  for (const { path } of context.entries(['turbines'])) {
    for (const { item } of context.entries([...path, 'stages'])) fed.add(item.to);
  }
  for (const header of plant.headers) {
    if (!fed.has(header.id)) {
      context.error('no-source', context.ids.get(header.id)?.path ?? [],
        `header ${header.id} has no possible source of steam: no boiler, steam import, turbine stage, letdown or flash tank feeds it`);
    }
  }
}

export function checkVenting(context: ResolveContext, plant: PlantParts): void {
  if (plant.headers.length < 2) return;
  const highest = Math.max(...plant.headers.map((header) => header.pressure));
  for (const header of plant.headers) {
    if (header.venting && header.pressure === highest) {
      const path = context.ids.get(header.id)?.path ?? [];
      context.warn('venting-highest', [...path, 'venting'], `venting is allowed on ${header.id}, the highest-pressure header; venting the most valuable steam is rarely intended`);
    }
  }
}
