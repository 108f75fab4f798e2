// The resolved plant: every quantity in steamwright's internal SI units (DESIGN.md),
// every reference checked to name a unit that exists. The optimiser builds its
// linear model from this type alone, so nothing here is left to interpretation.

/** A closed interval of a quantity, in the quantity's internal unit; min <= max. */
export interface Range {
  /** lower bound */
  min: number;
  /** upper bound */
  max: number;
}

/** A fixed steam or water state. */
export interface FixedState {
  /** temperature, K */
  T: number;
  /** specific enthalpy, kJ/kg */
  h: number;
}

/** A default that changes physics or cost, applied because the case left the key out. */
export interface DefaultApplied {
  /** where the key would have been, e.g. "headers[2].venting" */
  path: string;
  /** the value used, in the case's words, e.g. "forbidden" or "101.325 kPa" */
  value: string;
  /** why this value */
  reason: string;
}

export type UnitSystem = 'si' | 'us';

export interface Site {
  /** atmospheric pressure, MPa abs; the zero of every gauge pressure in the case */
  atmosphericPressure: number;
  /** ambient air temperature, K */
  ambientTemperature: number;
  /** makeup (treated) water */
  makeupWater: {
    /** temperature, K */
    temperature: number;
    /** specific enthalpy at temperature and atmospheric pressure, kJ/kg */
    h: number;
    /** cost of water plus treatment, currency per tonne */
    cost: number;
  };
  /** ISO-like currency code every price in the case is stated in, e.g. "EUR" */
  currency: string;
  /** unit system for display and reports */
  unitSystem: UnitSystem;
  /** price of emitted CO2, currency per tonne of CO2 (0 when none) */
  carbonPrice: number;
}

export interface Fuel {
  id: string;
  kind: 'fuel';
  /** price, currency per GJ on the stated heating-value basis */
  price: number;
  /** heating-value basis of price, CO2 factor and every boiler efficiency burning it */
  basis: 'HHV' | 'LHV';
  /** CO2 emitted, kg per GJ of fuel on the same basis */
  co2: number;
}

export interface PowerSupply {
  /** site electric demand, kW (not counting motors of machines modelled in the case) */
  siteDemand: number;
  /** electricity bought from the grid */
  import: {
    /** price, currency per kWh */
    price: number;
    /** upper limit, kW (0 when import is not allowed) */
    max: number;
    /** take-or-pay: import below this, kW, is billed anyway */
    minimumBilled: number;
    /** price of each kWh of shortfall below minimumBilled, currency per kWh */
    shortfallPrice: number;
    /** CO2 of grid electricity, kg per kWh */
    co2: number;
  };
  /** electricity sold to the grid */
  export: {
    /** price, currency per kWh */
    price: number;
    /** upper limit, kW (0 when export is not allowed) */
    max: number;
  };
}

export type HeaderState =
  /** held at a set point by the plant's controls; both T and h are given (one computed from the other) */
  | { kind: 'controlled'; specifiedBy: 'temperature' | 'enthalpy'; T: number; h: number }
  /** set by mixing the flows that enter; the optimiser finds it */
  | { kind: 'floating' };

export interface Header {
  id: string;
  kind: 'header';
  /** display name */
  name: string;
  /** pressure, MPa abs */
  pressure: number;
  /** saturation temperature at pressure, K */
  saturationTemperature: number;
  /** temperature or enthalpy state */
  state: HeaderState;
  /** whether steam may be vented to atmosphere from this header */
  venting: boolean;
  /** fixed heat loss from the header piping, kW */
  heatLoss: number;
}

/** Boiler efficiency at one load. */
export interface EfficiencyPoint {
  /** load as a fraction of the boiler's maximum steam flow */
  load: number;
  /** fuel-to-steam efficiency, fraction, on the fuel's heating-value basis */
  efficiency: number;
}

/** Where a liquid stream (condensate, blowdown, flash liquid) is sent. */
export type LiquidDestination =
  | { kind: 'flashTank'; id: string }
  | { kind: 'deaerator' }
  | { kind: 'drain' };

export interface FiredBoiler {
  id: string;
  kind: 'boiler';
  /** header the boiler discharges into */
  header: string;
  /** fuels it may burn (ids); the optimiser chooses the split */
  fuels: string[];
  /** steam flow when running, kg/s */
  steam: Range;
  /** outlet steam state at the header pressure */
  outlet: FixedState & { saturated: boolean };
  /** efficiency against load, sorted by load, at least one point */
  efficiency: EfficiencyPoint[];
  /** blowdown as a fraction of feedwater */
  blowdownFraction: number;
  /** where blowdown goes */
  blowdownTo: LiquidDestination;
  /** whether the optimiser may switch it off (otherwise it runs at least at steam.min) */
  canSwitchOff: boolean;
  /** start cost and minimum running and stopped hours, for a year solved hour by hour */
  switching?: SwitchingRules;
}

/**
 * A unit's start cost and minimum running and stopped hours. They matter only
 * across the periods of a year (src/year solves such a year as rolling
 * windows); one solve has no history and ignores them.
 */
export interface SwitchingRules {
  /** cost of one start, in the site currency */
  startCost: number;
  /** hours it must run once started */
  minHoursOn: number;
  /** hours it must stay stopped once stopped */
  minHoursOff: number;
  /** where the case writes each, for messages that need the profile (min hours longer than the year) */
  at: { switching: Place; min_hours_on: Place; min_hours_off: Place };
}

export interface Place {
  line: number;
  column: number;
}

export interface HeatRecoveryBoiler {
  id: string;
  kind: 'heatRecoveryBoiler';
  header: string;
  /** unfired steam flow, kg/s; min = max when fixed */
  steam: Range;
  outlet: FixedState & { saturated: boolean };
  /** blowdown as a fraction of feedwater */
  blowdownFraction: number;
  blowdownTo: LiquidDestination;
  /** optional duct burner adding steam */
  supplementaryFiring: {
    fuel: string;
    /** extra steam it can raise, kg/s */
    maxSteam: number;
    /** fuel-to-steam efficiency of the extra firing, fraction */
    efficiency: number;
  } | null;
}

export interface SteamImport {
  id: string;
  kind: 'steamImport';
  header: string;
  /** price, currency per tonne of steam */
  price: number;
  /** flow, kg/s */
  flow: Range;
  /** delivered state at the header pressure */
  delivered: FixedState & { saturated: boolean };
  /** the case gave the delivered enthalpy (T is then the state's, saturation when wet) */
  byEnthalpy?: boolean;
}

export type StageExhaust =
  /** exhausts or extracts into a header */
  | { kind: 'header'; id: string; pressure: number }
  /** exhausts to a condenser at this pressure, MPa abs */
  | { kind: 'condenser'; pressure: number; condensateTo: LiquidDestination };

export type StagePerformance =
  /** isentropic efficiency of the section, fraction */
  | { kind: 'isentropic'; efficiency: number }
  /** exhaust enthalpy fixed, kJ/kg */
  | { kind: 'exhaustEnthalpy'; h: number }
  /** exhaust temperature fixed, K (superheated exhaust) */
  | { kind: 'exhaustTemperature'; T: number }
  /** Willans line: section power kW = slope (kJ/kg) x section flow (kg/s) - intercept (kW) while running */
  | { kind: 'willans'; intercept: number; slope: number };

export interface TurbineStage {
  /** where the steam leaving at the end of this section goes */
  exhaust: StageExhaust;
  /** how the section between the previous point (or the inlet) and this one performs */
  performance: StagePerformance;
  /** flow leaving the turbine at this point, kg/s */
  outflow: Range;
  /** flow passing through this section, kg/s (outflow of this and all later stages) */
  sectionFlow: Range;
}

export type TurbineDrive = { kind: 'generator' } | { kind: 'machine'; id: string };

export interface Turbine {
  id: string;
  kind: 'turbine';
  /** inlet header */
  inlet: string;
  /** stages in flow order, pressures strictly falling; the last takes what is left */
  stages: TurbineStage[];
  /** inlet flow, kg/s (equals the first section's flow) */
  inletFlow: Range;
  /** shaft mechanical efficiency, fraction */
  mechanicalEfficiency: number;
  /** generator efficiency, fraction (1 when it drives a machine) */
  generatorEfficiency: number;
  /** power delivered (electric, or shaft when driving a machine), kW */
  power: Range;
  /** whether it may be stopped */
  canSwitchOff: boolean;
  /** start cost and minimum running and stopped hours, for a year solved hour by hour */
  switching?: SwitchingRules;
  /** what the shaft turns */
  drives: TurbineDrive;
}

export interface Desuperheater {
  /** target outlet temperature, K, above saturation of the outlet header */
  targetTemperature: number;
  /** enthalpy at the target, kJ/kg */
  targetH: number;
  /** spray water source: boiler feedwater from the deaerator, or makeup water */
  water: 'feedwater' | 'makeup';
}

export interface Letdown {
  id: string;
  kind: 'letdown';
  from: string;
  to: string;
  /** largest steam flow through the valve, kg/s */
  capacity: number;
  /** null for throttling only */
  desuperheater: Desuperheater | null;
}

export type SteamDemand =
  /** a steam flow, kg/s */
  | { kind: 'flow'; massFlow: number }
  /** a heat duty, kW, met by condensing steam down to the condensate temperature */
  | { kind: 'duty'; heat: number };

export interface SteamUser {
  id: string;
  kind: 'user';
  header: string;
  demand: SteamDemand;
  condensate: {
    /** share of the steam returned as condensate, fraction */
    returnFraction: number;
    /** condensate temperature, K */
    temperature: number;
    /** condensate enthalpy (liquid at the header pressure), kJ/kg */
    h: number;
    /** where returned condensate goes; drain when nothing is returned */
    to: LiquidDestination;
  };
}

export interface FlashTank {
  id: string;
  kind: 'flashTank';
  /** pressure, MPa abs */
  pressure: number;
  /** saturation temperature at pressure, K */
  saturationTemperature: number;
  /** ids of users, boilers and flash tanks whose liquid enters this tank */
  receives: string[];
  vapourTo: { kind: 'header'; id: string } | { kind: 'atmosphere' };
  liquidTo: LiquidDestination;
  /**
   * A heat exchanger on the liquid to drain that warms the makeup water
   * (blowdown heat recovery): the liquid leaves it at `leavingTemperature`,
   * K, with enthalpy `leavingH`, kJ/kg (at atmospheric pressure). Absent
   * when the case has none.
   */
  makeupPreheater?: { leavingTemperature: number; leavingH: number };
}

/** A drive a machine or pump could have in place of its own: a motor, or a back-pressure turbine between two headers. */
export type AlternativeDrive = { kind: 'motor'; efficiency: number } | { kind: 'turbine'; from: string; to: string; isentropicEfficiency: number };

export interface FeedwaterPump {
  id: string;
  kind: 'feedwaterPump';
  /** hydraulic efficiency, fraction */
  pumpEfficiency: number;
  /** electric motor drive, or null when only a turbine can drive it */
  motor: { efficiency: number } | null;
  /** id of the turbine that can drive it, or null */
  turbine: string | null;
  /** the other drive the case says it could have (for the savings drive measure), absent when none */
  alternativeDrive?: AlternativeDrive;
}

export interface Deaerator {
  id: 'deaerator';
  kind: 'deaerator';
  /** pressure, MPa abs */
  pressure: number;
  /** saturation temperature = feedwater temperature, K */
  saturationTemperature: number;
  /** feedwater enthalpy (saturated liquid at pressure), kJ/kg */
  feedwaterH: number;
  /** header supplying heating steam */
  heatingSteam: string;
  /** vent as a fraction of feedwater */
  ventFraction: number;
  feedwaterPumps: FeedwaterPump[];
  /** whether feedwater pump work is counted (false when the case says feedwater_pumps: none) */
  pumpWork: boolean;
}

export interface DrivenMachine {
  id: string;
  kind: 'machine';
  machine: 'pump' | 'fan' | 'compressor';
  /** shaft power it needs while running, kW */
  shaftPower: number;
  /** electric motor alternative, or null when only its turbine can drive it */
  motor: { efficiency: number } | null;
  /** id of the turbine that can drive it, or null */
  turbine: string | null;
  /**
   * The drive it could have in place of its own, for the savings drive
   * measure: a motor in place of its turbine, or a back-pressure turbine
   * (headers, isentropic efficiency) in place of its motor. Absent when the
   * case gives none.
   */
  alternativeDrive?: AlternativeDrive;
}

/**
 * A chilled-water plant with absorption capacity: a cooling demand met by
 * absorption chillers on steam (up to their capacity) and electric chillers
 * for the rest. Steam = absorption cooling / (COP x latent heat given up).
 */
export interface AbsorptionChiller {
  id: string;
  kind: 'absorptionChiller';
  /** header the generator takes steam from */
  header: string;
  /** cooling demand of the chilled-water plant, kW */
  cooling: number;
  /** absorption cooling that can be made, kW (0: electric chillers only) */
  capacity: number;
  effect: 'single' | 'double';
  /** cooling over heat given up by the steam, fraction */
  cop: number;
  /** electricity of the electric chillers per kW of cooling they make, kW/kW */
  electricPerCooling: number;
  condensate: SteamUser['condensate'];
}

/** One group of steam traps on a header from a trap survey. */
export interface TrapGroup {
  id: string;
  kind: 'trapGroup';
  header: string;
  /** traps installed */
  installed: number;
  /** traps failed open (blowing steam), a count; may be fractional when given as a share */
  failedOpen: number;
  /** orifice diameter, m */
  orifice: number;
  /** discharge coefficient on Napier's relation */
  dischargeCoefficient: number;
  /** steam lost through the failed traps, kg/s (Napier's relation at the header pressure) */
  loss: number;
}

/** Bare pipe on one header: insulating it brings the header's heat loss down to lossAfter. */
export interface InsulationRepair {
  header: string;
  /** bare length, m */
  bareLength: number;
  /** the header's whole heat loss once insulated, kW */
  lossAfter: number;
}

/** Unit costs for screening estimates, each in the site currency. */
export interface UnitCosts {
  /** back-pressure turbine generator installed, currency per kW; null: the size curve of DOE Steam Tip Sheet #20 */
  backPressureTurbinePerKW: number | null;
  /** absorption chilling installed, currency per kW of cooling */
  absorptionPerKWCooling: number;
  /** one failed trap repaired or replaced, currency */
  trapRepair: number;
  /** condensate return, currency per kg/s of condensate returned */
  condensateReturnPerKgS: number;
  /** insulation repaired, currency per m */
  insulationPerMetre: number;
  /** a flash tank with its piping and trap, installed, currency */
  flashTank: number;
  /** a heat exchanger warming makeup with blowdown, installed, currency */
  makeupPreheater: number;
  /** a steam turbine drive for a machine, installed, currency per kW of shaft power */
  turbineDrivePerKW: number;
  /** an electric motor drive for a machine (with its starter and supply), installed, currency per kW of shaft power */
  motorDrivePerKW: number;
  /** economic life of measures, years */
  lifeYears: number;
  /** discount rate, fraction per year */
  discountRate: number;
  /** accuracy class in words */
  accuracy: string;
  /** the unit costs the case left out and the defaults taken, each with its source */
  defaults: DefaultApplied[];
}

export type Objective = 'minimumCost' | 'minimumFuel' | 'maximumPower' | 'minimumCo2';

export interface SolverOptions {
  /** relative MIP gap at which to stop, fraction */
  mipGap: number;
  /** time limit per solve, s */
  timeLimit: number;
  /** most successive-linearisation passes */
  maxPasses: number;
  /** convergence: largest enthalpy change between passes, kJ/kg */
  enthalpyTolerance: number;
}

import type { ProjectDefinition, ScenarioDefinition } from './variantTypes.js';

export interface Plant {
  /** plant name from the case */
  name: string;
  /** free text */
  description: string;
  site: Site;
  fuels: Fuel[];
  power: PowerSupply;
  headers: Header[];
  boilers: FiredBoiler[];
  heatRecoveryBoilers: HeatRecoveryBoiler[];
  steamImports: SteamImport[];
  turbines: Turbine[];
  letdowns: Letdown[];
  users: SteamUser[];
  flashTanks: FlashTank[];
  deaerator: Deaerator;
  machines: DrivenMachine[];
  /** absorption chilling (absent on plants built in code before it existed) */
  absorptionChillers?: AbsorptionChiller[];
  /** the trap survey's groups */
  steamTraps?: TrapGroup[];
  /** bare pipe from an insulation survey */
  insulation?: InsulationRepair[];
  /** unit costs for savings measures, defaults applied */
  costs?: UnitCosts;
  objective: Objective;
  solver: SolverOptions;
  /** the case's scenarios as declared (each resolved plant is in LoadResult.variants); [] on a variant */
  scenarios: ScenarioDefinition[];
  /** the case's projects as declared; [] on a variant */
  projects: ProjectDefinition[];
  /** every default that changes physics or cost, for `check --verbose` */
  defaults: DefaultApplied[];
  /** the year's profile (a CSV file of periods) the case names, if any; read by src/year */
  profile?: ProfileReference;
}

/** Where the case names its profile: the file as written (relative to the case) and the hours it declares. */
export interface ProfileReference {
  file: string;
  /** total hours the profile must cover, when the case states them */
  hours: number | null;
  /** where `profile.file` is written in the case */
  line: number;
  column: number;
  /** where `profile.hours` is written (the file's place when absent) */
  hoursLine: number;
  hoursColumn: number;
}
