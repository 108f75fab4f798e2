// Vents: every vent over the scenarios with its cause (from the solved
// balance's vent explanation) and the ways to end it; the ways that are an
// overlay on the case become measures: absorption chilling fed from the
// vented header, a condensing turbine taking the vented steam, a lower
// back-pressure for a turbine that must pass steam into it, and higher set
// points where spray feeds it (ventWays.ts).
import type { Plant } from '../model/index.js';
import { saturatedLiquid } from '../properties/index.js';
import type { Measure } from './measureTypes.js';
import { kilowatts, tonnesPerHour } from './quantities.js';
import { flowWords } from './quantities.js';
import { headerState, largest, type SolvedRun } from './sizing.js';
import { condensingTurbine } from './turbineMeasures.js';
import { lowerBackPressureMeasures, setPointMeasures } from './ventWays.js';

export interface VentFinding {
  /** header id, "deaerator" or a flash tank id */
  where: string;
  kind: 'header' | 'deaerator excess' | 'flash vapour';
  /** vented flow per scenario, kg/s */
  by_scenario: { scenario: string; flow_kg_s: number }[];
  /** hours-weighted mean over the year, kg/s */
  average_kg_s: number;
  /** the cause in the scenario where it is largest */
  cause: string;
  /** ways to end it, in words */
  ways: string[];
  /** ids of the measures generated to end it */
  measures: string[];
}

export function findVents(runs: SolvedRun[]): VentFinding[] {
  const byPlace = new Map<string, VentFinding & { largest: number }>();
  const hours = runs.reduce((total, run) => total + run.hours, 0);
  for (const run of runs) {
    for (const vent of run.result.vents) {
      const key = `${vent.kind}|${vent.where}`;
      const finding = byPlace.get(key) ?? { where: vent.where, kind: vent.kind, by_scenario: [], average_kg_s: 0, cause: vent.reason, ways: [], measures: [], largest: 0 };
      finding.by_scenario.push({ scenario: run.id, flow_kg_s: vent.flow_kg_s });
      finding.average_kg_s += hours > 0 ? (vent.flow_kg_s * run.hours) / hours : 0;
      if (vent.flow_kg_s > finding.largest) [finding.largest, finding.cause] = [vent.flow_kg_s, vent.reason];
      byPlace.set(key, finding);
    }
  }
  // Largest first: venting is usually the largest avoidable loss.
  return [...byPlace.values()].sort((a, b) => b.average_kg_s - a.average_kg_s).map(({ largest: _largest, ...finding }) => (void _largest, finding));
}

/** Measures that end a header's vent, and the ways in words; fills the finding's ways and measures. */
export function ventMeasures(plant: Plant, runs: SolvedRun[], finding: VentFinding): Measure[] {
  const measures: Measure[] = [];
  const vent = Math.max(...finding.by_scenario.map((entry) => entry.flow_kg_s));
  if (finding.kind === 'deaerator excess') {
    finding.ways.push(
      'send hot returns through a flash tank to a low-pressure header before the deaerator, so the deaerator needs its heating steam again',
      'cool the returns that force it (a makeup preheater on the hottest return)',
    );
    return measures;
  }
  if (finding.kind === 'flash vapour') {
    finding.ways.push(`send the vapour of ${finding.where} to a header (vapour_to) instead of the atmosphere, at a tank pressure above that header's`);
    return measures;
  }
  const header = finding.where;
  const chiller = (plant.absorptionChillers ?? []).find((entry) => entry.capacity < entry.cooling);
  if (chiller) {
    const measure = chillerMeasure(plant, runs, header, vent, finding.cause, chiller.id);
    if (measure) measures.push(measure);
  } else {
    finding.ways.push(`a new low-pressure steam user that displaces electricity, such as absorption chilling in place of electric chillers (the case has no cooling demand to evaluate it: add an absorption_chillers entry with capacity 0 TR)`);
  }
  const turbine = condensingTurbine(plant, runs, header, vent, finding.cause);
  if (turbine) measures.push(turbine);
  const backPressure = lowerBackPressureMeasures(plant, runs, header, finding.cause);
  const setPoints = setPointMeasures(plant, runs, header, finding.cause);
  measures.push(...backPressure, ...setPoints);
  finding.ways.push(...measures.map((measure) => measure.title));
  // What is not an overlay here stays in words.
  const rebuilt = new Set(backPressure.flatMap((measure) => measure.touches));
  const exhausting = plant.turbines.filter((entry) => entry.stages.some((stage) => stage.exhaust.kind === 'header' && stage.exhaust.id === header)).map((entry) => entry.id);
  const others = exhausting.filter((id) => !rebuilt.has(id));
  if (others.length > 0) finding.ways.push(`less steam through ${others.join(', ')} into ${header}: a lower back-pressure (a stage to a lower header) or a lower minimum flow`);
  if (exhausting.length > others.length) finding.ways.push(`a lower minimum flow through ${exhausting.filter((id) => rebuilt.has(id)).join(', ')}`);
  const sprayed = plant.letdowns.filter((letdown) => letdown.to === header && letdown.desuperheater && !setPoints.some((measure) => measure.touches.includes(letdown.id))).map((letdown) => letdown.id);
  const controlled = plant.headers.find((entry) => entry.id === header)?.state.kind === 'controlled' && !setPoints.some((measure) => measure.id === `set_point_${header}`);
  if (sprayed.length > 0 || controlled) finding.ways.push(`a changed set point: ${controlled ? `a higher set temperature on ${header} needs less spray to hold it` : `a higher outlet temperature on ${sprayed.join(', ')} needs less spray water`}`);
  const minimums = plant.steamImports.filter((supply) => supply.flow.min > 0).map((supply) => supply.id);
  if (minimums.length > 0) finding.ways.push(`a lower contract minimum on ${minimums.join(', ')}, where the purchase's minimum forces steam the plant cannot use`);
  finding.measures.push(...measures.map((measure) => measure.id));
  return measures;
}

function chillerMeasure(plant: Plant, runs: SolvedRun[], header: string, vent: number, cause: string, chillerId: string): Measure | null {
  const chiller = (plant.absorptionChillers ?? []).find((entry) => entry.id === chillerId)!;
  const pressure = plant.headers.find((entry) => entry.id === header)?.pressure;
  if (pressure === undefined) return null;
  // Cooling the vented steam could make: vent x COP x heat given up to saturated condensate.
  const condensateH = saturatedLiquid(pressure).h;
  const coolingFromVent = largest(runs, (run) => {
    const state = headerState(run, header);
    return state ? vent * chiller.cop * (state.h - condensateH) : 0;
  });
  const demand = largest(runs, (run) => {
    const value = run.units.find((unit) => unit.id === chiller.id)?.values.cooling_kW;
    return typeof value === 'number' ? value : chiller.cooling;
  });
  const added = Math.min(coolingFromVent, demand - chiller.capacity);
  if (!(added > 1)) return null;
  const costs = plant.costs!;
  const newCapacity = chiller.capacity + added;
  const id = `absorption_${chiller.id}_on_${header}`;
  const moved = chiller.header !== header;
  return {
    id,
    kind: 'ventChiller',
    title: `absorption chilling on ${header} in place of electric chillers (${chiller.id})`,
    change: `${Math.round(added)} kW (${(added / 3.5168528).toFixed(0)} TR) more absorption capacity in ${chiller.id}${moved ? `, fed from ${header} instead of ${chiller.header}` : ''}, sized to the cooling the vented ${flowWords(vent)} can make, at most the cooling demand`,
    cause,
    ways: [],
    touches: [chiller.id, header, ...(moved ? [chiller.header] : [])],
    alternativeOf: `vent ${header}`,
    capital: added * costs.absorptionPerKWCooling,
    capitalBasis: `${Math.round(added)} kW of cooling at ${Math.round(costs.absorptionPerKWCooling)} ${plant.site.currency}/kW (costs.absorption_chilling)`,
    lifeYears: costs.lifeYears,
    discountRate: costs.discountRate,
    fixedOmPerYear: 0,
    changes: {
      absorption_chillers: [{ id: chiller.id, capacity: kilowatts(newCapacity), ...(moved ? { header, condensate: null } : {}) }],
    },
  };
}
