// The schema and the TypeScript types of the case file cannot drift apart:
// each field list below is type-checked against its interface (a missing,
// extra or wrongly optional key fails `tsc`), and this test checks each list
// against the schema's properties and required keys.
import { describe, expect, test } from 'vitest';
import { caseSchema } from '../../src/model/index.js';
import type * as Case from '../../src/model/index.js';

/** Every key of T, marked required or optional exactly as T declares it. */
type FieldList<T> = { [K in keyof Required<T>]: {} extends Pick<T, K> ? 'optional' : 'required' };

const fieldLists: Record<string, Record<string, 'required' | 'optional'>> = {
  root: { format_version: 'required', name: 'required', description: 'optional', site: 'required', fuels: 'optional', power: 'required', headers: 'required', boilers: 'optional', heat_recovery_boilers: 'optional', steam_imports: 'optional', turbines: 'optional', letdowns: 'optional', users: 'optional', flash_tanks: 'optional', deaerator: 'required', machines: 'optional', absorption_chillers: 'optional', steam_traps: 'optional', insulation_survey: 'optional', costs: 'optional', objective: 'optional', solver: 'optional', scenarios: 'optional', projects: 'optional', sweeps: 'optional', meters: 'optional', profile: 'optional' } satisfies FieldList<Case.CaseFile>,
  site: { atmospheric_pressure: 'optional', ambient_temperature: 'required', makeup_water: 'required', currency: 'required', units: 'required', carbon_price: 'optional' } satisfies FieldList<Case.SiteEntry>,
  makeupWater: { temperature: 'required', cost: 'required' } satisfies FieldList<Case.MakeupWaterEntry>,
  fuel: { id: 'required', name: 'optional', price: 'required', basis: 'required', co2: 'required' } satisfies FieldList<Case.FuelEntry>,
  power: { site_demand: 'required', import: 'optional', export: 'optional' } satisfies FieldList<Case.PowerEntry>,
  powerImport: { price: 'required', max: 'required', minimum_billed: 'optional', shortfall_price: 'optional', co2: 'optional' } satisfies FieldList<Case.PowerImportEntry>,
  powerExport: { price: 'required', max: 'required' } satisfies FieldList<Case.PowerExportEntry>,
  header: { id: 'required', name: 'optional', pressure: 'required', state: 'required', temperature: 'optional', enthalpy: 'optional', venting: 'optional', heat_loss: 'optional' } satisfies FieldList<Case.HeaderEntry>,
  flowRange: { min: 'optional', max: 'required' } satisfies FieldList<Case.FlowRangeEntry>,
  openRange: { min: 'optional', max: 'optional' } satisfies FieldList<Case.OpenRangeEntry>,
  efficiencyPoint: { load: 'required', efficiency: 'required' } satisfies FieldList<Case.EfficiencyPointEntry>,
  cycles: { cycles_of_concentration: 'required' } satisfies FieldList<Case.CyclesEntry>,
  boiler: { id: 'required', name: 'optional', header: 'required', fuels: 'required', steam: 'required', outlet_temperature: 'required', efficiency: 'required', blowdown: 'required', blowdown_to: 'optional', can_switch_off: 'optional', switching: 'optional' } satisfies FieldList<Case.BoilerEntry>,
  switching: { start_cost: 'optional', min_hours_on: 'optional', min_hours_off: 'optional' } satisfies FieldList<Case.SwitchingEntry>,
  supplementaryFiring: { fuel: 'required', max_steam: 'required', efficiency: 'required' } satisfies FieldList<Case.SupplementaryFiringEntry>,
  heatRecoveryBoiler: { id: 'required', name: 'optional', header: 'required', steam: 'required', outlet_temperature: 'required', blowdown: 'required', blowdown_to: 'optional', supplementary_firing: 'optional' } satisfies FieldList<Case.HeatRecoveryBoilerEntry>,
  steamImport: { id: 'required', name: 'optional', header: 'required', price: 'required', min: 'optional', max: 'required', temperature: 'optional', enthalpy: 'optional' } satisfies FieldList<Case.SteamImportEntry>,
  willansLine: { intercept: 'required', slope: 'required' } satisfies FieldList<Case.WillansLineEntry>,
  stage: { id: 'optional', to: 'optional', condenser_pressure: 'optional', condensate_to: 'optional', isentropic_efficiency: 'optional', exhaust_enthalpy: 'optional', exhaust_temperature: 'optional', willans_line: 'optional', outflow: 'optional', section_flow: 'optional' } satisfies FieldList<Case.StageEntry>,
  turbine: { id: 'required', name: 'optional', inlet: 'required', stages: 'required', mechanical_efficiency: 'optional', generator_efficiency: 'optional', power: 'optional', can_switch_off: 'optional', switching: 'optional', drives: 'optional' } satisfies FieldList<Case.TurbineEntry>,
  desuperheater: { target_temperature: 'required', spray_water: 'required' } satisfies FieldList<Case.DesuperheaterEntry>,
  letdown: { id: 'required', name: 'optional', from: 'required', to: 'required', capacity: 'required', desuperheater: 'optional' } satisfies FieldList<Case.LetdownEntry>,
  condensate: { return: 'required', temperature: 'optional', to: 'optional' } satisfies FieldList<Case.CondensateEntry>,
  user: { id: 'required', name: 'optional', header: 'required', steam: 'optional', heat: 'optional', condensate: 'optional' } satisfies FieldList<Case.UserEntry>,
  flashTank: { id: 'required', name: 'optional', pressure: 'required', vapour_to: 'required', liquid_to: 'required', makeup_preheater: 'optional' } satisfies FieldList<Case.FlashTankEntry>,
  makeupPreheater: { leaving_temperature: 'required' } satisfies FieldList<Case.MakeupPreheaterEntry>,
  feedwaterPump: { id: 'required', name: 'optional', efficiency: 'required', motor_efficiency: 'optional', alternative_drive: 'optional' } satisfies FieldList<Case.FeedwaterPumpEntry>,
  deaerator: { pressure: 'required', heating_steam: 'required', vent: 'required', feedwater_pumps: 'optional' } satisfies FieldList<Case.DeaeratorEntry>,
  machine: { id: 'required', name: 'optional', type: 'required', shaft_power: 'required', motor_efficiency: 'optional', alternative_drive: 'optional' } satisfies FieldList<Case.MachineEntry>,
  alternativeDrive: { motor_efficiency: 'optional', turbine_from: 'optional', turbine_to: 'optional', isentropic_efficiency: 'optional' } satisfies FieldList<Case.AlternativeDriveEntry>,
  changedItem: { id: 'required' } satisfies Pick<FieldList<Case.ChangedItemEntry>, 'id'>,
  changes: { fuels: 'optional', headers: 'optional', boilers: 'optional', heat_recovery_boilers: 'optional', steam_imports: 'optional', turbines: 'optional', letdowns: 'optional', users: 'optional', flash_tanks: 'optional', machines: 'optional', absorption_chillers: 'optional', steam_traps: 'optional', site: 'optional', power: 'optional', deaerator: 'optional', solver: 'optional', objective: 'optional', disable: 'optional', add: 'optional' } satisfies FieldList<Case.ChangesEntry>,
  add: { fuels: 'optional', headers: 'optional', boilers: 'optional', heat_recovery_boilers: 'optional', steam_imports: 'optional', turbines: 'optional', letdowns: 'optional', users: 'optional', flash_tanks: 'optional', machines: 'optional', absorption_chillers: 'optional', steam_traps: 'optional' } satisfies FieldList<Case.AddEntry>,
  absorptionChiller: { id: 'required', name: 'optional', header: 'required', cooling: 'required', capacity: 'required', effect: 'required', cop: 'optional', electric_chillers: 'required', condensate: 'optional' } satisfies FieldList<Case.AbsorptionChillerEntry>,
  trapGroup: { id: 'required', name: 'optional', header: 'required', installed: 'required', failed_open: 'required', orifice: 'required', discharge_coefficient: 'optional' } satisfies FieldList<Case.TrapGroupEntry>,
  insulationRepair: { header: 'required', bare_length: 'required', heat_loss_after: 'optional' } satisfies FieldList<Case.InsulationRepairEntry>,
  costs: { back_pressure_turbine: 'optional', absorption_chilling: 'optional', trap_repair: 'optional', condensate_return: 'optional', insulation: 'optional', flash_tank: 'optional', makeup_preheater: 'optional', turbine_drive: 'optional', motor_drive: 'optional', life: 'optional', discount_rate: 'optional' } satisfies FieldList<Case.CostsEntry>,
  scenario: { id: 'required', name: 'optional', hours: 'required', base: 'optional', changes: 'optional' } satisfies FieldList<Case.ScenarioEntry>,
  project: { id: 'required', name: 'optional', capital_cost: 'required', life: 'required', discount_rate: 'required', fixed_om: 'optional', changes: 'required' } satisfies FieldList<Case.ProjectEntry>,
  sweep: { id: 'required', name: 'optional', scenario: 'optional', target: 'required', from: 'required', to: 'required', steps: 'required' } satisfies FieldList<Case.SweepEntry>,
  meter: { tag: 'required', name: 'optional', unit: 'required', measures: 'required', to: 'optional', uncertainty: 'required', confidence: 'optional' } satisfies FieldList<Case.MeterEntry>,
  profile: { file: 'required', hours: 'optional' } satisfies FieldList<Case.ProfileEntry>,
  solver: { mip_gap: 'optional', time_limit_seconds: 'optional', max_passes: 'optional', enthalpy_tolerance: 'optional' } satisfies FieldList<Case.SolverEntry>,
};

type ObjectSchema = { properties: Record<string, unknown>; required: string[] };
const defs = caseSchema.$defs as Record<string, ObjectSchema>;
const schemaObjects: Record<string, ObjectSchema> = { root: caseSchema as unknown as ObjectSchema, ...defs };

test('every object of the schema has a field list, and every field list an object', () => {
  expect(Object.keys(fieldLists).sort()).toEqual(Object.keys(schemaObjects).sort());
});

describe.each(Object.keys(fieldLists))('%s', (name) => {
  test('has the same keys in the schema and in the type', () => {
    expect(Object.keys(schemaObjects[name].properties).sort()).toEqual(Object.keys(fieldLists[name]).sort());
  });
  test('requires the same keys in the schema and in the type', () => {
    const required = Object.entries(fieldLists[name]).filter(([, mark]) => mark === 'required').map(([key]) => key);
    expect([...schemaObjects[name].required].sort()).toEqual(required.sort());
  });
});
