// What the independent audit reads from a solve: the flows the solver chose,
// unit by unit, and the header states it converged to. Plain numbers, no
// enthalpy of any stream the linear model was built with: the audit works
// those out again from the case and IAPWS-IF97.

/** Solved values of one plant, in the internal units (kg/s, kW, kJ/kg). */
export interface SolvedPlant {
  /** header states the solve converged to; pressure comes from the plant */
  headers: { id: string; h: number; vent: number; spray: number }[];
  boilers: { id: string; running: boolean; steam: number; fuel: number }[];
  heatRecoveryBoilers: { id: string; unfiredSteam: number; firedSteam: number; fuel: number }[];
  steamImports: { id: string; steam: number }[];
  /** flow through each section (inlet first) and the power delivered */
  turbines: { id: string; running: boolean; sectionFlows: number[]; power: number }[];
  letdowns: { id: string; steam: number; spray: number; outlet: number }[];
  users: { id: string; steam: number }[];
  flashTanks: { id: string; vapour: number; liquid: number; makeupHeat: number }[];
  deaerator: {
    heatingSteam: number;
    makeup: number;
    vent: number;
    pumpShaft: number;
    pumpMotorElectric: number;
    pumpMotorShaft: number;
    /** each feedwater pump's shaft power and its motor's part of it, kW, as the solve shared the lift */
    pumps: { id: string; shaft: number; motorShaft: number }[];
  };
  machines: { id: string; motorShaft: number; motorElectric: number }[];
  absorptionChillers: { id: string; steam: number; absorptionCooling: number; electricCooling: number; electric: number }[];
  trapGroups: { id: string; steam: number }[];
  grid: { imported: number; exported: number };
}

/** A unit's solved values as its report gives them (the shape of UnitReport). */
export interface ReportedUnit {
  id: string;
  kind: string;
  values: Record<string, number | string | boolean | null>;
}

/** A header's converged state as the result gives it. */
export interface ReportedHeader {
  id: string;
  h_kJ_kg: number;
}

/**
 * Reads a solve's unit reports and header states (a PlantResult's `units` and
 * `headers`, or the same data before the result is built) into SolvedPlant.
 * A missing unit or value is a programmer error: the reports and the plant
 * must come from the same solve.
 */
export function solvedPlantFromReports(headers: readonly ReportedHeader[], units: readonly ReportedUnit[]): SolvedPlant {
  const byKind = (kind: string): ReportedUnit[] => units.filter((unit) => unit.kind === kind);
  const one = (kind: string): ReportedUnit => {
    const found = byKind(kind)[0];
    if (!found) throw new Error(`no ${kind} report in the solve. The audit needs the reports of the same solve.`);
    return found;
  };
  const num = (unit: ReportedUnit, key: string, fallback?: number): number => {
    const value = unit.values[key];
    if (typeof value === 'number') return value;
    if (fallback !== undefined) return fallback;
    throw new Error(`report of ${unit.id} has no number "${key}". The audit reads it from every ${unit.kind} report.`);
  };
  const flag = (unit: ReportedUnit, key: string): boolean => unit.values[key] !== false;
  const headerReports = new Map(byKind('header').map((unit) => [unit.id, unit]));
  const deaerator = one('deaerator');
  const grid = one('grid');
  return {
    headers: headers.map((header) => {
      const report = headerReports.get(header.id);
      return { id: header.id, h: header.h_kJ_kg, vent: report ? num(report, 'vent_kg_s', 0) : 0, spray: report ? num(report, 'spray_kg_s', 0) : 0 };
    }),
    boilers: byKind('boiler').map((unit) => ({ id: unit.id, running: flag(unit, 'running'), steam: num(unit, 'steam_kg_s'), fuel: num(unit, 'fuel_kW') })),
    heatRecoveryBoilers: byKind('heatRecoveryBoiler').map((unit) => ({
      id: unit.id,
      unfiredSteam: num(unit, 'unfired_steam_kg_s'),
      firedSteam: num(unit, 'fired_steam_kg_s'),
      fuel: num(unit, 'fuel_kW'),
    })),
    steamImports: byKind('steamImport').map((unit) => ({ id: unit.id, steam: num(unit, 'steam_kg_s') })),
    turbines: byKind('turbine').map((unit) => {
      const outflows: number[] = [];
      for (let k = 1; typeof unit.values[`stage${k}_outflow_kg_s`] === 'number'; k += 1) outflows.push(num(unit, `stage${k}_outflow_kg_s`));
      // Section k carries the outflow of stage k and of every later stage.
      const sectionFlows = outflows.map((_, k) => outflows.slice(k).reduce((total, flow) => total + flow, 0));
      return { id: unit.id, running: flag(unit, 'running'), sectionFlows, power: num(unit, 'power_kW') };
    }),
    letdowns: byKind('letdown').map((unit) => ({ id: unit.id, steam: num(unit, 'steam_kg_s'), spray: num(unit, 'spray_kg_s'), outlet: num(unit, 'outlet_kg_s') })),
    users: byKind('user').map((unit) => ({ id: unit.id, steam: num(unit, 'steam_kg_s') })),
    flashTanks: byKind('flashTank').map((unit) => ({ id: unit.id, vapour: num(unit, 'vapour_kg_s'), liquid: num(unit, 'liquid_kg_s'), makeupHeat: num(unit, 'makeup_heat_kW', 0) })),
    deaerator: {
      heatingSteam: num(deaerator, 'heating_steam_kg_s'),
      makeup: num(deaerator, 'makeup_kg_s'),
      vent: num(deaerator, 'vent_kg_s'),
      pumpShaft: num(deaerator, 'pump_shaft_kW'),
      pumpMotorElectric: num(deaerator, 'pump_motor_kW'),
      pumpMotorShaft: num(deaerator, 'pump_motor_shaft_kW'),
      pumps: Object.keys(deaerator.values)
        .filter((key) => key.startsWith('pump_shaft_kW:'))
        .map((key) => {
          const id = key.slice('pump_shaft_kW:'.length);
          return { id, shaft: num(deaerator, key), motorShaft: num(deaerator, `pump_motor_shaft_kW:${id}`) };
        }),
    },
    machines: byKind('machine').map((unit) => ({ id: unit.id, motorShaft: num(unit, 'motor_shaft_kW'), motorElectric: num(unit, 'motor_electric_kW') })),
    absorptionChillers: byKind('absorptionChiller').map((unit) => ({
      id: unit.id,
      steam: num(unit, 'steam_kg_s'),
      absorptionCooling: num(unit, 'absorption_cooling_kW'),
      electricCooling: num(unit, 'electric_cooling_kW'),
      electric: num(unit, 'electric_chiller_kW'),
    })),
    trapGroups: byKind('trapGroup').map((unit) => ({ id: unit.id, steam: num(unit, 'steam_lost_kg_s') })),
    grid: { imported: num(grid, 'import_kW'), exported: num(grid, 'export_kW') },
  };
}
