// Ways to end a header's vent that change what is already there, each an
// overlay proven by solving: a higher set point (a controlled header's set
// temperature, or a letdown's desuperheater target), so less spray water
// turns into steam the header cannot use; and a lower back-pressure for a
// single-stage turbine held at its minimum flow into the vented header, so its
// steam goes on to the header below and makes more power on the way.
import type { Plant } from '../model/index.js';
import { expandIsentropic } from '../plant/index.js';
import { statePH, temperaturePH } from '../properties/index.js';
import type { Measure } from './measureTypes.js';
import { kelvin, percent, tonnesPerHour } from './quantities.js';
import { headerState, largest, unitValue, type SolvedRun } from './sizing.js';
import { NEW_TURBINE, turbineCapital } from './turbineMeasures.js';

/** A new set point stays this far below the temperature the steam arrives at with no spray, K (common practice, no source). */
const SET_POINT_MARGIN = 2;
/** Below this rise a new set point is not worth proposing, K. */
const LEAST_RISE = 1;

function common(plant: Plant, cause: string): Pick<Measure, 'lifeYears' | 'discountRate' | 'fixedOmPerYear' | 'cause' | 'ways' | 'alternativeOf'> {
  return { lifeYears: plant.costs!.lifeYears, discountRate: plant.costs!.discountRate, fixedOmPerYear: 0, cause, ways: [], alternativeOf: null };
}

const CONTROL_CHANGE = 'a control change: no capital counted (the review that the users take the hotter steam is not costed)';

/** The lowest over the runs where `pick` gives a number. */
function lowest(runs: readonly SolvedRun[], pick: (run: SolvedRun) => number | null): number | null {
  const values = runs.map(pick).filter((value): value is number => value !== null && Number.isFinite(value));
  return values.length > 0 ? Math.min(...values) : null;
}

/** Higher set points on the vented header, or on the desuperheaters of letdowns into it, where spray feeds it. */
export function setPointMeasures(plant: Plant, runs: SolvedRun[], headerId: string, cause: string): Measure[] {
  const measures: Measure[] = [];
  const header = plant.headers.find((entry) => entry.id === headerId);
  if (!header) return measures;
  const state = header.state;
  if (state.kind === 'controlled' && largest(runs, (run) => unitValue(run, headerId, 'spray_kg_s')) > 1e-6) {
    // The temperature the header's inflows mix to with no spray, in the scenario where it is lowest.
    const arrives = lowest(runs, (run) => {
      const inflows = run.result.streams.filter((stream) => stream.to === headerId && stream.kind !== 'spray' && stream.mass_kg_s > 1e-9);
      const mass = inflows.reduce((total, stream) => total + stream.mass_kg_s, 0);
      return mass > 0 ? temperaturePH(header.pressure, inflows.reduce((total, stream) => total + stream.mass_kg_s * stream.h_kJ_kg, 0) / mass) : null;
    });
    const target = arrives === null ? null : arrives - SET_POINT_MARGIN;
    if (target !== null && target > state.T + LEAST_RISE) {
      measures.push({
        ...common(plant, cause),
        id: `set_point_${headerId}`,
        kind: 'ventSetPoint',
        title: `raise the set temperature of ${headerId} to ${(target - 273.15).toFixed(0)} degC`,
        change: `${headerId} held at ${(target - 273.15).toFixed(1)} degC instead of ${(state.T - 273.15).toFixed(1)} degC, ${SET_POINT_MARGIN} K below what its steam arrives at unsprayed in the coolest scenario: less spray water turned into steam it vents. Check that its users take the hotter steam.`,
        touches: [headerId],
        capital: 0,
        capitalBasis: CONTROL_CHANGE,
        changes: { headers: [{ id: headerId, temperature: kelvin(target), ...(state.specifiedBy === 'enthalpy' ? { enthalpy: null } : {}) }] },
      });
    }
  }
  for (const letdown of plant.letdowns.filter((entry) => entry.to === headerId && entry.desuperheater)) {
    const desuperheater = letdown.desuperheater!;
    if (!(largest(runs, (run) => unitValue(run, letdown.id, 'spray_kg_s')) > 1e-6)) continue;
    // Throttled, the steam leaves at its inlet enthalpy: the hottest target that still needs no heating.
    const throttled = lowest(runs, (run) => {
      const inlet = headerState(run, letdown.from);
      return inlet && unitValue(run, letdown.id, 'steam_kg_s') > 1e-9 ? temperaturePH(header.pressure, inlet.h) : null;
    });
    const target = throttled === null ? null : throttled - SET_POINT_MARGIN;
    if (target === null || !(target > desuperheater.targetTemperature + LEAST_RISE)) continue;
    measures.push({
      ...common(plant, cause),
      id: `set_point_${letdown.id}`,
      kind: 'ventSetPoint',
      title: `raise the desuperheater target of ${letdown.id} to ${(target - 273.15).toFixed(0)} degC`,
      change: `${letdown.id}'s desuperheater holds ${(target - 273.15).toFixed(1)} degC instead of ${(desuperheater.targetTemperature - 273.15).toFixed(1)} degC, ${SET_POINT_MARGIN} K below the throttled steam in the coolest scenario: less spray water turned into steam ${headerId} vents. Check that ${headerId}'s users take the hotter steam.`,
      touches: [letdown.id, headerId],
      capital: 0,
      capitalBasis: CONTROL_CHANGE,
      changes: { letdowns: [{ id: letdown.id, desuperheater: { target_temperature: kelvin(target), spray_water: desuperheater.water } }] },
    });
  }
  return measures;
}

/** The header just below `pressure`, if any. */
function headerBelow(plant: Plant, pressure: number): Plant['headers'][number] | undefined {
  return plant.headers.filter((header) => header.pressure < pressure - 1e-6).sort((a, b) => b.pressure - a.pressure)[0];
}

/**
 * Single-stage turbines (isentropic performance) that exhaust into the vented
 * header: the same machine exhausting one header lower, as a new turbine
 * would (costed as one on the size curve).
 */
export function lowerBackPressureMeasures(plant: Plant, runs: SolvedRun[], headerId: string, cause: string): Measure[] {
  const header = plant.headers.find((entry) => entry.id === headerId);
  const below = header ? headerBelow(plant, header.pressure) : undefined;
  if (!header || !below) return [];
  return plant.turbines.flatMap((turbine): Measure[] => {
    const stage = turbine.stages[0];
    if (turbine.stages.length !== 1 || stage.exhaust.kind !== 'header' || stage.exhaust.id !== headerId || stage.performance.kind !== 'isentropic') return [];
    const efficiency = stage.performance.efficiency;
    const overall = turbine.mechanicalEfficiency * (turbine.drives.kind === 'generator' ? turbine.generatorEfficiency : 1);
    const kW = largest(runs, (run) => {
      const inlet = headerState(run, turbine.inlet);
      const flow = unitValue(run, turbine.id, 'inlet_kg_s');
      return inlet && flow > 0 ? flow * expandIsentropic(statePH(inlet.p, inlet.h), below.pressure, efficiency).enthalpyDrop * overall : 0;
    });
    if (!(kW > 1)) return [];
    const { capital, basis } = turbineCapital(plant, kW);
    const range = (value: { min: number; max: number }) => ({ ...(value.min > 0 ? { min: tonnesPerHour(value.min) } : {}), ...(Number.isFinite(value.max) ? { max: tonnesPerHour(value.max) } : {}) });
    const written = { to: below.id, isentropic_efficiency: percent(efficiency), ...(stage.outflow.min > 0 || Number.isFinite(stage.outflow.max) ? { outflow: range(stage.outflow) } : {}), ...(stage.sectionFlow.min > 0 || Number.isFinite(stage.sectionFlow.max) ? { section_flow: range(stage.sectionFlow) } : {}) };
    return [{
      ...common(plant, cause),
      id: `lower_back_pressure_${turbine.id}`,
      kind: 'ventBackPressure',
      title: `${turbine.id} exhausting to ${below.id} instead of ${headerId}`,
      change: `${turbine.id} rebuilt or replaced to exhaust to ${below.id} (${+(below.pressure * 1000).toPrecision(4)} kPa abs) instead of ${headerId}, with its flow limits and ${percent(efficiency)} isentropic efficiency: what it must pass no longer lands in ${headerId}, and each tonne makes more power (up to about ${Math.round(kW)} kW)`,
      touches: [turbine.id, headerId, below.id],
      alternativeOf: `vent ${headerId}`,
      capital,
      capitalBasis: basis,
      changes: { turbines: [{ id: turbine.id, stages: [written] }] },
    }];
  });
}
