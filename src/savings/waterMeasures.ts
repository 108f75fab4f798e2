// Condensate, flash and traps: more condensate returned from each user that
// drains it, flash tanks for blowdown and hot condensate that go to drain or
// straight to the deaerator, and a trap repair programme from the survey.
import type { Plant } from '../model/index.js';
import { saturationTemperature } from '../properties/index.js';
import type { Measure } from './measureTypes.js';
import { kelvin, kilopascals, percent, tonnesPerHour } from './quantities.js';
import { flowWords } from './quantities.js';
import { largest, unitValue, type SolvedRun } from './sizing.js';

/** The return a repaired condensate system reaches: 90 % (common practice, no source). */
export const RETURN_TARGET = 0.9;
/** A flash tank sits this far above the header its vapour enters, MPa: 20 kPa (common practice, no source). */
const TANK_MARGIN = 0.02;
/** Condensate at least this much above the lower header's saturation is worth flashing, K. */
const FLASH_MARGIN = 5;

function base(plant: Plant): Pick<Measure, 'lifeYears' | 'discountRate' | 'fixedOmPerYear' | 'cause' | 'ways' | 'alternativeOf'> {
  return { lifeYears: plant.costs!.lifeYears, discountRate: plant.costs!.discountRate, fixedOmPerYear: 0, cause: null, ways: [], alternativeOf: null };
}

export function condensateMeasures(plant: Plant, runs: SolvedRun[]): Measure[] {
  const costs = plant.costs!;
  const unstated = new Set(plant.defaults.filter((entry) => /^users\[\d+\]\.condensate$/.test(entry.path)).map((entry) => Number(/\[(\d+)\]/.exec(entry.path)![1])));
  return plant.users.flatMap((user, index) => {
    // A user whose condensate the case leaves out returns none by nature (direct injection).
    if (unstated.has(index) || user.condensate.returnFraction >= RETURN_TARGET) return [];
    const added = largest(runs, (run) => unitValue(run, user.id, 'steam_kg_s') * (RETURN_TARGET - user.condensate.returnFraction));
    if (!(added > 0.05 / 3.6)) return [];
    const to = user.condensate.to.kind === 'drain' ? 'deaerator' : user.condensate.to.kind === 'flashTank' ? user.condensate.to.id : 'deaerator';
    const id = `return_${user.id}`;
    return [{
      ...base(plant),
      id,
      kind: 'condensateReturn' as const,
      title: `return ${percent(RETURN_TARGET)} of the condensate of ${user.id}`,
      change: `${user.id} returns ${percent(RETURN_TARGET)} of its condensate instead of ${percent(user.condensate.returnFraction)}, up to ${flowWords(added)} more, to ${to}`,
      touches: [user.id, to],
      capital: added * costs.condensateReturnPerKgS,
      capitalBasis: `${(added * 3.6).toPrecision(3)} t/h more returned at ${Math.round(costs.condensateReturnPerKgS / 3.6)} ${plant.site.currency} per t/h (costs.condensate_return)`,
      changes: { users: [{ id: user.id, condensate: { return: percent(RETURN_TARGET), temperature: kelvin(user.condensate.temperature), to } }] },
    }];
  });
}

/** The lowest-pressure header below `pressure` and above the deaerator, if any. */
function lowerHeader(plant: Plant, pressure: number): Plant['headers'][number] | undefined {
  return plant.headers.filter((header) => header.pressure < pressure - 1e-6 && header.pressure > plant.deaerator.pressure).sort((a, b) => a.pressure - b.pressure)[0];
}

export function flashMeasures(plant: Plant): Measure[] {
  const costs = plant.costs!;
  const measures: Measure[] = [];
  // Blowdown that goes to drain: one flash tank for all of it, vapour to the lowest header.
  const drained = [...plant.boilers, ...plant.heatRecoveryBoilers].filter((boiler) => boiler.blowdownTo.kind === 'drain' && boiler.blowdownFraction > 0);
  const boilerPressure = Math.min(...drained.map((boiler) => plant.headers.find((header) => header.id === boiler.header)!.pressure));
  const target = drained.length > 0 ? lowerHeader(plant, boilerPressure) : undefined;
  if (target) {
    const id = 'blowdown_flash_recovery';
    measures.push({
      ...base(plant),
      id,
      kind: 'blowdownFlash',
      alternativeOf: 'blowdown to drain',
      title: `blowdown flash tank to ${target.id}`,
      change: `the blowdown of ${drained.map((boiler) => boiler.id).join(', ')} flashes in a tank at ${kilopascals(target.pressure + TANK_MARGIN)} (abs); its steam goes to ${target.id}, the rest still to drain`,
      touches: [...drained.map((boiler) => boiler.id), target.id],
      capital: costs.flashTank,
      capitalBasis: `one flash tank (costs.flash_tank)`,
      changes: {
        add: { flash_tanks: [{ id, name: 'Blowdown flash tank', pressure: kilopascals(target.pressure + TANK_MARGIN), vapour_to: target.id, liquid_to: 'drain' }] },
        ...groupByList(drained.map((boiler) => [plant.boilers.includes(boiler as never) ? 'boilers' : 'heat_recovery_boilers', { id: boiler.id, blowdown_to: id }])),
      },
    });
  }
  // Hot condensate sent straight to the deaerator: flash it to a lower header first.
  const byHeader = new Map<string, Plant['users']>();
  for (const user of plant.users) {
    if (user.condensate.returnFraction <= 0 || user.condensate.to.kind !== 'deaerator') continue;
    const header = plant.headers.find((entry) => entry.id === user.header)!;
    const lower = lowerHeader(plant, header.pressure);
    if (!lower || user.condensate.temperature < saturationTemperature(lower.pressure + TANK_MARGIN) + FLASH_MARGIN) continue;
    byHeader.set(user.header, [...(byHeader.get(user.header) ?? []), user]);
  }
  for (const [headerId, users] of byHeader) {
    const header = plant.headers.find((entry) => entry.id === headerId)!;
    const lower = lowerHeader(plant, header.pressure)!;
    const id = `${headerId}_condensate_flash`;
    measures.push({
      ...base(plant),
      id,
      kind: 'condensateFlash',
      title: `flash ${headerId} condensate to ${lower.id}`,
      change: `the condensate of ${users.map((user) => user.id).join(', ')} flashes in a tank at ${kilopascals(lower.pressure + TANK_MARGIN)} (abs) before the deaerator; its steam goes to ${lower.id}`,
      touches: [...users.map((user) => user.id), lower.id, 'deaerator'],
      capital: costs.flashTank,
      capitalBasis: 'one flash tank (costs.flash_tank)',
      changes: {
        add: { flash_tanks: [{ id, name: `Flash tank for ${headerId} condensate`, pressure: kilopascals(lower.pressure + TANK_MARGIN), vapour_to: lower.id, liquid_to: 'deaerator' }] },
        users: users.map((user) => ({ id: user.id, condensate: { to: id } })),
      },
    });
  }
  return measures;
}

function groupByList(entries: [string, Record<string, unknown>][]): Record<string, Record<string, unknown>[]> {
  const grouped: Record<string, Record<string, unknown>[]> = {};
  for (const [list, item] of entries) (grouped[list] ??= []).push(item);
  return grouped;
}

export function trapMeasures(plant: Plant): Measure[] {
  const costs = plant.costs!;
  return (plant.steamTraps ?? []).filter((group) => group.failedOpen > 0 && group.loss > 0).map((group) => {
    const traps = Math.ceil(group.failedOpen - 1e-9);
    return {
      ...base(plant),
      id: `repair_${group.id}`,
      kind: 'trapRepair' as const,
      title: `repair the ${traps} failed-open traps of ${group.id}`,
      change: `${traps} of ${group.installed} traps on ${group.header} repaired, ending ${flowWords(group.loss)} of steam blown through them`,
      touches: [group.id, group.header],
      capital: traps * costs.trapRepair,
      capitalBasis: `${traps} traps at ${Math.round(costs.trapRepair)} ${plant.site.currency} each (costs.trap_repair)`,
      changes: { steam_traps: [{ id: group.id, failed_open: 0 }] },
    };
  });
}

/** Insulating the bare pipe an insulation survey found: the header's heat loss down to its figure after. */
export function insulationMeasures(plant: Plant): Measure[] {
  const costs = plant.costs!;
  return (plant.insulation ?? []).flatMap((repair) => {
    const header = plant.headers.find((entry) => entry.id === repair.header)!;
    if (!(header.heatLoss - repair.lossAfter > 1e-6)) return [];
    return [{
      ...base(plant),
      id: `insulate_${repair.header}`,
      kind: 'insulation' as const,
      title: `insulate the bare pipe of ${repair.header}`,
      change: `${+repair.bareLength.toPrecision(3)} m of bare pipe on ${repair.header} insulated: its heat loss from ${+header.heatLoss.toPrecision(3)} kW to ${+repair.lossAfter.toPrecision(3)} kW`,
      touches: [repair.header],
      capital: repair.bareLength * costs.insulationPerMetre,
      capitalBasis: `${+repair.bareLength.toPrecision(3)} m at ${Math.round(costs.insulationPerMetre)} ${plant.site.currency}/m (costs.insulation)`,
      changes: { headers: [{ id: repair.header, heat_loss: `${+repair.lossAfter.toPrecision(8)} kW` }] },
    }];
  });
}
