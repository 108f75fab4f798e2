// The resolver proper: the raw case (the file's, or a scenario's merged copy)
// held by a ResolveContext, turned into the plant in SI with every check.
import { checkFuelBasis } from './checkFuelBasis.js';
import { checkSecondLaw } from './checkSecondLaw.js';
import { checkTopology } from './checkTopology.js';
import { checkSources, checkVenting, linkDrives, linkFlashTanks } from './plantChecks.js';
import type { Plant } from './plantTypes.js';
import { ResolveContext, type IdKind } from './resolveContext.js';
import { resolveHeaders } from './resolveHeaders.js';
import { resolveProfile } from './resolveProfile.js';
import { resolveDeaerator, resolveFlashTanks, resolveLetdowns, resolveMachines, resolveUsers } from './resolveNetwork.js';
import { resolveFuels, resolveObjective, resolvePower, resolveSite, resolveSolver } from './resolveSite.js';
import { resolveBoilers, resolveHeatRecoveryBoilers, resolveSteamImports } from './resolveSupply.js';
import { resolveTurbines } from './resolveTurbines.js';
import { resolveAbsorptionChillers } from './resolveChillers.js';
import { resolveCosts } from './resolveCosts.js';
import { resolveSteamTraps } from './resolveTraps.js';
import { resolveInsulation } from './resolveInsulation.js';

const ID_LISTS: [string, IdKind][] = [
  ['fuels', 'fuel'], ['headers', 'header'], ['boilers', 'boiler'], ['heat_recovery_boilers', 'heatRecoveryBoiler'],
  ['steam_imports', 'steamImport'], ['turbines', 'turbine'], ['letdowns', 'letdown'], ['users', 'user'],
  ['flash_tanks', 'flashTank'], ['machines', 'machine'], ['absorption_chillers', 'absorptionChiller'], ['steam_traps', 'trapGroup'],
];

/** Words with a fixed meaning in references; a unit may not take one as its id. */
const RESERVED_IDS = ['deaerator', 'drain', 'atmosphere', 'generator', 'none', 'saturated'];

function declareIds(context: ResolveContext): void {
  const lists: [(string | number)[], IdKind][] = [...ID_LISTS.map(([key, kind]) => [[key], kind] as [(string | number)[], IdKind]), [['deaerator', 'feedwater_pumps'], 'feedwaterPump']];
  for (const [listPath, kind] of lists) {
    for (const { item, path } of context.entries(listPath)) {
      if (typeof item.id === 'string' && RESERVED_IDS.includes(item.id)) {
        context.error('reserved-id', [...path, 'id'], `"${item.id}" is a reserved word in references (${RESERVED_IDS.join(', ')}); choose another id`);
        continue;
      }
      context.declareId(item.id, kind, path);
    }
  }
}

/** Resolves the raw case held by the context into a plant, or null when a required part failed. */
export function resolvePlant(context: ResolveContext): Plant | null {
  declareIds(context);
  const site = resolveSite(context);
  const fuels = resolveFuels(context);
  const power = resolvePower(context);
  const headers = resolveHeaders(context);
  const byId = new Map(headers.map((header) => [header.id, header]));
  const parts = {
    name: String(context.raw(['name']) ?? ''),
    description: typeof context.raw(['description']) === 'string' ? String(context.raw(['description'])) : '',
    fuels,
    headers,
    boilers: resolveBoilers(context, byId),
    heatRecoveryBoilers: resolveHeatRecoveryBoilers(context, byId),
    steamImports: resolveSteamImports(context, byId),
    turbines: resolveTurbines(context, byId),
    letdowns: resolveLetdowns(context, byId),
    users: resolveUsers(context, byId),
    flashTanks: resolveFlashTanks(context, byId, site),
    machines: resolveMachines(context, byId),
    absorptionChillers: resolveAbsorptionChillers(context, byId),
    steamTraps: resolveSteamTraps(context, byId),
    insulation: resolveInsulation(context, byId),
    costs: resolveCosts(context),
    objective: resolveObjective(context),
    solver: resolveSolver(context),
    scenarios: [],
    projects: [],
  };
  const deaerator = resolveDeaerator(context, byId);
  if (!site || !power || !deaerator) return null;
  const plant = { ...parts, site, power, deaerator };
  linkDrives(context, plant);
  linkFlashTanks(context, plant);
  checkSources(context, plant);
  checkSecondLaw(context, plant);
  checkFuelBasis(context, plant);
  checkTopology(context, plant);
  checkVenting(context, plant);
  const profile = resolveProfile(context);
  return { ...plant, defaults: context.defaults, ...(profile ? { profile } : {}) };
}

