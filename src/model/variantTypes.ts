// Scenarios, projects and sweeps: as declared in the case, and resolved,
// each to its own plant through the same resolver as the base.
import type { Plant } from './plantTypes.js';

export interface ScenarioDefinition {
  id: string;
  name: string;
  /** operating hours per year in this scenario, h */
  hours: number;
  /** "plant" (the case as written) or the id of another scenario */
  base: string;
}

export interface ProjectDefinition {
  id: string;
  name: string;
  /** capital cost, site currency */
  capitalCost: number;
  /** economic life, years */
  lifeYears: number;
  /** discount rate, fraction per year */
  discountRate: number;
  /** fixed operating and maintenance cost, site currency per year */
  fixedOmPerYear: number;
}

export interface SweepDefinition {
  id: string;
  name: string;
  /** the scenario varied ("plant" for the case as written) */
  scenario: string;
  /** dotted path of the value varied, list items by id: "power.import.price" */
  target: string;
  /** the values taken, as written into the case: "40 $/MWh", "50 $/MWh", ... */
  values: string[];
}

export interface ScenarioPlant {
  id: string;
  name: string;
  hours: number;
  plant: Plant;
}

export interface ProjectPlants extends ProjectDefinition {
  /** the project applied to each scenario, in scenario order */
  plants: { scenario: string; plant: Plant }[];
}

export interface SweepPlants extends SweepDefinition {
  steps: { value: string; plant: Plant }[];
}

export interface CaseVariants {
  /** every scenario; a case without any has one, "base", of 8760 h */
  scenarios: ScenarioPlant[];
  /** true when `scenarios` is only the implicit base */
  implicitBase: boolean;
  projects: ProjectPlants[];
  sweeps: SweepPlants[];
}

/** The hours of a year without scenarios: 365 x 24. */
export const HOURS_PER_YEAR = 8760;
