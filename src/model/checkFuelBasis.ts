// The heating-value basis of fuels. A boiler's efficiency, a fuel's price and
// its CO2 factor are all on the fuel's stated basis (HHV or LHV); steamwright
// does not convert between them, so it refuses what would mix them.
import type { Plant } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

type PlantParts = Omit<Plant, 'defaults'>;

export function checkFuelBasis(context: ResolveContext, plant: PlantParts): void {
  const basis = new Map(plant.fuels.map((fuel) => [fuel.id, fuel.basis]));
  for (const boiler of plant.boilers) {
    const bases = new Set(boiler.fuels.map((id) => basis.get(id)).filter((value) => value !== undefined));
    if (bases.size > 1) {
      const path = context.ids.get(boiler.id)?.path ?? [];
      const listed = boiler.fuels.map((id) => `${id} (${basis.get(id)})`).join(', ');
      context.error('mixed-basis', [...path, 'fuels'],
        `boiler ${boiler.id} burns ${listed}; its one efficiency table cannot be on both heating-value bases. State every fuel it burns on one basis (HHV or LHV)`);
    }
  }
  const used = new Set(plant.fuels.map((fuel) => fuel.basis));
  if (used.size > 1) {
    context.warn('mixed-basis', ['fuels'],
      'the fuels are stated on both HHV and LHV bases: fuel totals, CO2 and the boiler fuel-to-steam efficiency add figures on different bases. Steamwright does not convert between them; state every fuel on one basis');
  }
}
