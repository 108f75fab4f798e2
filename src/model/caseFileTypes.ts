// The case file as written: YAML keys in the trade's words, every quantity a
// string with its unit ("42 barg", "60 t/h"). schema/case.schema.json describes
// exactly these shapes; tests/model/schemaDrift.test.ts keeps the two in step.

/** A number with its unit, e.g. "42 barg", "60 t/h", "9.5 EUR/GJ", "3 %". */
export type QuantityText = string;

export interface CaseFile {
  format_version: 1;
  name: string;
  description?: string;
  site: SiteEntry;
  fuels?: FuelEntry[];
  power: PowerEntry;
  headers: HeaderEntry[];
  boilers?: BoilerEntry[];
  heat_recovery_boilers?: HeatRecoveryBoilerEntry[];
  steam_imports?: SteamImportEntry[];
  turbines?: TurbineEntry[];
  letdowns?: LetdownEntry[];
  users?: UserEntry[];
  flash_tanks?: FlashTankEntry[];
  deaerator: DeaeratorEntry;
  machines?: MachineEntry[];
  absorption_chillers?: AbsorptionChillerEntry[];
  steam_traps?: TrapGroupEntry[];
  insulation_survey?: InsulationRepairEntry[];
  costs?: CostsEntry;
  objective?: 'minimum_cost' | 'minimum_fuel' | 'maximum_power' | 'minimum_co2';
  solver?: SolverEntry;
  scenarios?: ScenarioEntry[];
  projects?: ProjectEntry[];
  sweeps?: SweepEntry[];
  meters?: MeterEntry[];
  profile?: ProfileEntry;
}

/** The year's profile: a CSV file of periods (see the schema's description of its columns). */
export interface ProfileEntry {
  file: string;
  hours?: number;
}

/** Changes to one listed item, matched by id; its other keys are checked after merging. */
export interface ChangedItemEntry {
  id: string;
  [key: string]: unknown;
}

export interface ChangesEntry {
  fuels?: ChangedItemEntry[];
  headers?: ChangedItemEntry[];
  boilers?: ChangedItemEntry[];
  heat_recovery_boilers?: ChangedItemEntry[];
  steam_imports?: ChangedItemEntry[];
  turbines?: ChangedItemEntry[];
  letdowns?: ChangedItemEntry[];
  users?: ChangedItemEntry[];
  flash_tanks?: ChangedItemEntry[];
  machines?: ChangedItemEntry[];
  absorption_chillers?: ChangedItemEntry[];
  steam_traps?: ChangedItemEntry[];
  site?: Record<string, unknown>;
  power?: Record<string, unknown>;
  deaerator?: Record<string, unknown>;
  solver?: Record<string, unknown>;
  objective?: CaseFile['objective'];
  disable?: string[];
  add?: AddEntry;
}

export interface AddEntry {
  fuels?: FuelEntry[];
  headers?: HeaderEntry[];
  boilers?: BoilerEntry[];
  heat_recovery_boilers?: HeatRecoveryBoilerEntry[];
  steam_imports?: SteamImportEntry[];
  turbines?: TurbineEntry[];
  letdowns?: LetdownEntry[];
  users?: UserEntry[];
  flash_tanks?: FlashTankEntry[];
  machines?: MachineEntry[];
  absorption_chillers?: AbsorptionChillerEntry[];
  steam_traps?: TrapGroupEntry[];
}

export interface ScenarioEntry {
  id: string;
  name?: string;
  hours: number | string;
  base?: string;
  changes?: ChangesEntry;
}

export interface ProjectEntry {
  id: string;
  name?: string;
  capital_cost: string;
  life: number | string;
  discount_rate: QuantityText;
  fixed_om?: string;
  changes: ChangesEntry;
}

export interface SweepEntry {
  id: string;
  name?: string;
  scenario?: string;
  target: string;
  from: string;
  to: string;
  steps: number;
}

export interface SiteEntry {
  atmospheric_pressure?: QuantityText;
  ambient_temperature: QuantityText;
  makeup_water: MakeupWaterEntry;
  currency: string;
  units: 'si' | 'us';
  carbon_price?: QuantityText;
}

export interface MakeupWaterEntry {
  temperature: QuantityText;
  cost: QuantityText;
}

export interface FuelEntry {
  id: string;
  name?: string;
  price: QuantityText;
  basis: 'HHV' | 'LHV';
  co2: QuantityText;
}

export interface PowerEntry {
  site_demand: QuantityText;
  import?: PowerImportEntry;
  export?: PowerExportEntry;
}

export interface PowerImportEntry {
  price: QuantityText;
  max: QuantityText;
  minimum_billed?: QuantityText;
  shortfall_price?: QuantityText;
  co2?: QuantityText;
}

export interface PowerExportEntry {
  price: QuantityText;
  max: QuantityText;
}

export interface HeaderEntry {
  id: string;
  name?: string;
  pressure: QuantityText;
  state: 'controlled' | 'floating';
  temperature?: QuantityText;
  enthalpy?: QuantityText;
  venting?: 'allowed' | 'forbidden';
  heat_loss?: QuantityText;
}

/** A flow range; a missing min is zero. */
export interface FlowRangeEntry {
  min?: QuantityText;
  max: QuantityText;
}

/** A range where either end may be left open. */
export interface OpenRangeEntry {
  min?: QuantityText;
  max?: QuantityText;
}

export interface EfficiencyPointEntry {
  load: QuantityText;
  efficiency: QuantityText;
}

export interface CyclesEntry {
  cycles_of_concentration: number;
}

export interface BoilerEntry {
  id: string;
  name?: string;
  header: string;
  fuels: string[];
  steam: FlowRangeEntry;
  /** a temperature, or "saturated" */
  outlet_temperature: QuantityText;
  /** one efficiency, or a table against load */
  efficiency: QuantityText | EfficiencyPointEntry[];
  /** % of feedwater, or cycles of concentration */
  blowdown: QuantityText | CyclesEntry;
  /** a flash tank id or "drain" */
  blowdown_to?: string;
  can_switch_off?: boolean;
  switching?: SwitchingEntry;
}

/** Start cost and minimum running and stopped hours of a unit that may switch off. */
export interface SwitchingEntry {
  /** money in the site currency, "1800 EUR" */
  start_cost?: string;
  /** hours: 6 or "6 h" */
  min_hours_on?: number | string;
  min_hours_off?: number | string;
}

export interface SupplementaryFiringEntry {
  fuel: string;
  max_steam: QuantityText;
  efficiency: QuantityText;
}

export interface HeatRecoveryBoilerEntry {
  id: string;
  name?: string;
  header: string;
  /** a fixed flow, or a range */
  steam: QuantityText | FlowRangeEntry;
  outlet_temperature: QuantityText;
  blowdown: QuantityText | CyclesEntry;
  blowdown_to?: string;
  supplementary_firing?: SupplementaryFiringEntry;
}

export interface SteamImportEntry {
  id: string;
  name?: string;
  header: string;
  price: QuantityText;
  min?: QuantityText;
  max: QuantityText;
  /** one of temperature (or "saturated") and enthalpy */
  temperature?: QuantityText;
  enthalpy?: QuantityText;
}

export interface WillansLineEntry {
  intercept: QuantityText;
  slope: QuantityText;
}

export interface StageEntry {
  /** unique within its turbine; lets a scenario change this stage alone */
  id?: string;
  /** a header id */
  to?: string;
  condenser_pressure?: QuantityText;
  /** condensing stage only: deaerator (default), drain or a flash tank id */
  condensate_to?: string;
  isentropic_efficiency?: QuantityText;
  exhaust_enthalpy?: QuantityText;
  exhaust_temperature?: QuantityText;
  willans_line?: WillansLineEntry;
  outflow?: OpenRangeEntry;
  section_flow?: OpenRangeEntry;
}

export interface TurbineEntry {
  id: string;
  name?: string;
  inlet: string;
  stages: StageEntry[];
  mechanical_efficiency?: QuantityText;
  generator_efficiency?: QuantityText;
  power?: OpenRangeEntry;
  can_switch_off?: boolean;
  switching?: SwitchingEntry;
  /** "generator" or a machine / feedwater pump id */
  drives?: string;
}

export interface DesuperheaterEntry {
  target_temperature: QuantityText;
  spray_water: 'feedwater' | 'makeup';
}

export interface LetdownEntry {
  id: string;
  name?: string;
  from: string;
  to: string;
  capacity: QuantityText;
  /** "none" for throttling only */
  desuperheater?: 'none' | DesuperheaterEntry;
}

export interface CondensateEntry {
  return: QuantityText;
  temperature?: QuantityText;
  /** a flash tank id, "deaerator" or "drain" */
  to?: string;
}

export interface UserEntry {
  id: string;
  name?: string;
  header: string;
  steam?: QuantityText;
  heat?: QuantityText;
  condensate?: CondensateEntry;
}

export interface FlashTankEntry {
  id: string;
  name?: string;
  pressure: QuantityText;
  /** a header id or "atmosphere" */
  vapour_to: string;
  /** "deaerator", "drain" or another flash tank's id */
  liquid_to: string;
  /** a heat exchanger warming makeup with the liquid on its way to drain */
  makeup_preheater?: MakeupPreheaterEntry;
}

export interface MakeupPreheaterEntry {
  /** the liquid's temperature leaving the exchanger, to drain */
  leaving_temperature: QuantityText;
}

export interface FeedwaterPumpEntry {
  id: string;
  name?: string;
  efficiency: QuantityText;
  motor_efficiency?: QuantityText;
  /** the other drive it could have in place of its own, for the savings drive measure */
  alternative_drive?: AlternativeDriveEntry;
}

export interface DeaeratorEntry {
  pressure: QuantityText;
  heating_steam: string;
  vent: QuantityText;
  feedwater_pumps?: FeedwaterPumpEntry[] | 'none';
}

export interface AlternativeDriveEntry {
  /** a motor in place of its turbine */
  motor_efficiency?: QuantityText;
  /** a back-pressure turbine in place of its motor: inlet header, exhaust header, isentropic efficiency */
  turbine_from?: string;
  turbine_to?: string;
  isentropic_efficiency?: QuantityText;
}

export interface MachineEntry {
  id: string;
  name?: string;
  type: 'pump' | 'fan' | 'compressor';
  shaft_power: QuantityText;
  motor_efficiency?: QuantityText;
  /** the drive it could have in place of its own */
  alternative_drive?: AlternativeDriveEntry;
}

export interface SolverEntry {
  mip_gap?: QuantityText;
  time_limit_seconds?: number;
  max_passes?: number;
  enthalpy_tolerance?: QuantityText;
}

export interface MeterEntry {
  tag: string;
  name?: string;
  unit: string;
  measures: 'steam' | 'feedwater' | 'blowdown' | 'condensate' | 'letdown' | 'spray' | 'extraction' | 'exhaust' | 'vent' | 'makeup' | 'heating_steam' | 'flash_vapour' | 'flash_liquid' | 'temperature' | 'pressure' | 'power' | 'fuel';
  to?: string;
  uncertainty: QuantityText;
  confidence?: QuantityText;
}

/** A chilled-water plant: absorption chillers on steam up to their capacity, electric chillers for the rest. */
export interface AbsorptionChillerEntry {
  id: string;
  name?: string;
  header: string;
  cooling: QuantityText;
  capacity: QuantityText;
  effect: 'single' | 'double';
  cop?: number;
  /** "0.65 kW/TR" or "0.18 kW/kW" */
  electric_chillers: string;
  condensate?: CondensateEntry;
}

/** Steam traps on one header from a survey. */
export interface TrapGroupEntry {
  id: string;
  name?: string;
  header: string;
  installed: number;
  /** a count, or a share such as "15 %" */
  failed_open: number | QuantityText;
  /** "1/8 in", "0.125 in", "3.2 mm" */
  orifice: string;
  discharge_coefficient?: number;
}

/** Unit costs for savings measures, each in the site currency. */
export interface CostsEntry {
  back_pressure_turbine?: string;
  absorption_chilling?: string;
  trap_repair?: string;
  condensate_return?: string;
  insulation?: string;
  flash_tank?: string;
  life?: number | string;
  discount_rate?: QuantityText;
  makeup_preheater?: string;
  turbine_drive?: string;
  motor_drive?: string;
}

/** Bare pipe on one header from an insulation survey. */
export interface InsulationRepairEntry {
  header: string;
  /** "80 m" or "260 ft" */
  bare_length: string;
  heat_loss_after?: QuantityText;
}
