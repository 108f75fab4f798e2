// Turbines: a back-pressure turbine generator beside, or in place of, each
// letdown that carries steam, sized for the largest flow it carries over the
// scenarios; and a condensing turbine on a header that vents.
import { tipSheet20TurbineCost, type Plant } from '../model/index.js';
import { expandIsentropic } from '../plant/index.js';
import { statePH } from '../properties/index.js';
import type { Measure } from './measureTypes.js';
import { kilopascals, percent, tonnesPerHour } from './quantities.js';
import { flowWords } from './quantities.js';
import { headerState, largest, unitValue, type SolvedRun } from './sizing.js';

/**
 * A small single-stage back-pressure set: 65 % isentropic (the letdown screen's
 * figure, common practice, no single source), 98 % mechanical and 97 %
 * generator efficiency (the case defaults).
 */
export const NEW_TURBINE = { isentropic: 0.65, mechanical: 0.98, generator: 0.97 } as const;
/** A condensing set's section to the condenser: 70 % isentropic, common practice, no source. */
export const CONDENSING = { isentropic: 0.7, condenserPressure: 0.01 } as const;
/** A turbine in place of a letdown may pass this much more than the letdown's largest outlet flow (common practice, no source). */
const IN_PLACE_MARGIN = 0.15;
/** Flows below this are not worth a turbine: 0.5 t/h. */
const LEAST_FLOW = 0.5 / 3.6;

export function turbineCapital(plant: Plant, kW: number, factor = 1): { capital: number; basis: string } {
  const perKW = plant.costs?.backPressureTurbinePerKW ?? null;
  if (perKW !== null) return { capital: kW * perKW * factor, basis: `${Math.round(kW)} kW at ${Math.round(perKW * factor)} ${plant.site.currency}/kW (costs.back_pressure_turbine${factor !== 1 ? ` x ${factor}` : ''})` };
  return { capital: tipSheet20TurbineCost(kW) * factor, basis: `${Math.round(kW)} kW on the DOE Steam Tip Sheet #20 cost curve${factor !== 1 ? ` x ${factor}` : ''}` };
}

/**
 * Two measures per letdown that carries steam: a back-pressure turbine
 * generator beside it (the valve stays for the rest and as a bypass), and one
 * in place of it (the valve taken out, so the turbine passes every tonne).
 * Both are sized from the letdown's largest flow over the scenarios; they are
 * alternatives, so the roadmap applies at most one.
 */
export function letdownTurbines(plant: Plant, runs: SolvedRun[]): Measure[] {
  const costs = plant.costs!;
  const measures: Measure[] = [];
  for (const letdown of plant.letdowns) {
    const flow = largest(runs, (run) => unitValue(run, letdown.id, 'steam_kg_s'));
    if (!(flow >= LEAST_FLOW)) continue;
    // Rating: the most power over the scenarios at the turbine's full flow share.
    const kW = largest(runs, (run) => {
      const inlet = headerState(run, letdown.from);
      const outlet = headerState(run, letdown.to);
      const steam = unitValue(run, letdown.id, 'steam_kg_s');
      if (!inlet || !outlet || steam <= 0) return 0;
      const drop = expandIsentropic(statePH(inlet.p, inlet.h), outlet.p, NEW_TURBINE.isentropic).enthalpyDrop;
      return steam * drop * NEW_TURBINE.mechanical * NEW_TURBINE.generator;
    });
    if (!(kW > 1)) continue;
    const { capital, basis } = turbineCapital(plant, kW);
    const turbine = (id: string, name: string, max: number) => ({
      id,
      name,
      inlet: letdown.from,
      stages: [{ to: letdown.to, isentropic_efficiency: percent(NEW_TURBINE.isentropic), section_flow: { max: tonnesPerHour(max) } }],
      mechanical_efficiency: percent(NEW_TURBINE.mechanical),
      generator_efficiency: percent(NEW_TURBINE.generator),
      can_switch_off: true,
    });
    const common = {
      cause: null,
      ways: [],
      touches: [letdown.id, letdown.from, letdown.to],
      alternativeOf: `letdown ${letdown.id}`,
      capital,
      capitalBasis: basis,
      lifeYears: costs.lifeYears,
      discountRate: costs.discountRate,
      fixedOmPerYear: 0,
    };
    const beside = `bptg_${letdown.id}`;
    measures.push({
      ...common,
      id: beside,
      kind: 'letdownTurbine',
      title: `back-pressure turbine generator beside ${letdown.id} (${letdown.from} to ${letdown.to})`,
      change: `a turbine generator of about ${Math.round(kW)} kW in parallel with ${letdown.id}, passing up to ${flowWords(flow)} (the letdown's largest flow over the scenarios); the valve stays for the rest and as a bypass`,
      changes: { add: { turbines: [turbine(beside, `Back-pressure turbine generator beside ${letdown.id}`, flow)] } },
    });
    // In its place the turbine must pass everything the letdown delivered, spray included,
    // and its exhaust carries less heat per tonne than throttled steam: a margin over the
    // letdown's largest outlet flow.
    const insteadMax = largest(runs, (run) => unitValue(run, letdown.id, 'outlet_kg_s')) * (1 + IN_PLACE_MARGIN);
    const instead = `bptg_for_${letdown.id}`;
    measures.push({
      ...common,
      id: instead,
      kind: 'letdownReplacement',
      title: `back-pressure turbine generator in place of ${letdown.id} (${letdown.from} to ${letdown.to})`,
      change: `${letdown.id} taken out and a turbine generator of about ${Math.round(kW)} kW put in its place, passing up to ${flowWords(insteadMax)} (the letdown's largest outlet flow over the scenarios and ${IN_PLACE_MARGIN * 100} %); every tonne let down now makes power, and the plant has no letdown path beside it`,
      changes: { disable: [letdown.id], add: { turbines: [turbine(instead, `Back-pressure turbine generator in place of ${letdown.id}`, insteadMax)] } },
    });
  }
  return measures;
}

/** A condensing turbine generator taking what a header vents (its largest vent over the scenarios). */
export function condensingTurbine(plant: Plant, runs: SolvedRun[], headerId: string, vent: number, cause: string): Measure | null {
  const kW = largest(runs, (run) => {
    const state = headerState(run, headerId);
    if (!state) return 0;
    const drop = expandIsentropic(statePH(state.p, state.h), CONDENSING.condenserPressure, CONDENSING.isentropic).enthalpyDrop;
    return vent * drop * NEW_TURBINE.mechanical * NEW_TURBINE.generator;
  });
  if (!(kW > 1)) return null;
  // A condensing set carries a condenser and cooling water: 1.5 times the
  // back-pressure figure (common practice, no source).
  const { capital, basis } = turbineCapital(plant, kW, 1.5);
  const id = `condensing_tg_${headerId}`;
  return {
    id,
    kind: 'ventTurbine',
    title: `condensing turbine generator on ${headerId} for the steam it vents`,
    change: `a condensing turbine generator of about ${Math.round(kW)} kW taking up to ${flowWords(vent)} from ${headerId} to a condenser at ${kilopascals(CONDENSING.condenserPressure)}, condensate to the deaerator`,
    cause,
    ways: [],
    touches: [headerId],
    alternativeOf: `vent ${headerId}`,
    capital,
    capitalBasis: basis,
    lifeYears: plant.costs!.lifeYears,
    discountRate: plant.costs!.discountRate,
    fixedOmPerYear: 0,
    changes: {
      add: {
        turbines: [{
          id,
          name: `Condensing turbine generator on ${headerId}`,
          inlet: headerId,
          stages: [{ condenser_pressure: kilopascals(CONDENSING.condenserPressure), condensate_to: 'deaerator', isentropic_efficiency: percent(CONDENSING.isentropic), section_flow: { max: tonnesPerHour(vent) } }],
          mechanical_efficiency: percent(NEW_TURBINE.mechanical),
          generator_efficiency: percent(NEW_TURBINE.generator),
          can_switch_off: true,
        }],
      },
    },
  };
}
