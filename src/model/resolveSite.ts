// Site, fuels, electricity, objective and solver options.
import { statePT } from '../properties/index.js';
import type { Fuel, Objective, PowerSupply, Site, SolverOptions } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

/** 1 kWh = 0.0036 GJ: prices are parsed per GJ and stored per kWh of electricity. */
const GJ_PER_KWH = 0.0036;

export function resolveSite(context: ResolveContext): Site | null {
  const path = ['site'];
  if (context.raw(['site', 'atmospheric_pressure']) === undefined) {
    context.addDefault([...path, 'atmospheric_pressure'], '101.325 kPa', 'standard atmosphere (ISO 2533); gauge pressures are measured from it');
  } else {
    const atmosphere = context.quantity([...path, 'atmospheric_pressure'], 'pressure');
    if (atmosphere !== undefined && (atmosphere < 0.05 || atmosphere > 0.11)) {
      context.error('out-of-range', [...path, 'atmospheric_pressure'], `expected an atmospheric pressure from 50 kPa to 110 kPa, found "${context.text([...path, 'atmospheric_pressure'])}"`);
    } else if (atmosphere !== undefined) {
      context.atmosphericPressure = atmosphere;
    }
  }
  const currency = context.text([...path, 'currency']);
  if (currency !== undefined && /^[A-Z]{3}$/.test(currency)) context.currency = currency;
  const units = context.raw([...path, 'units']);
  if (units === 'si' || units === 'us') context.unitSystem = units;

  const ambient = context.quantity([...path, 'ambient_temperature'], 'temperature');
  const makeupTemperature = context.quantity([...path, 'makeup_water', 'temperature'], 'temperature');
  const makeupCost = context.amount([...path, 'makeup_water', 'cost'], 'massPrice');
  let carbonPrice = 0;
  if (context.raw([...path, 'carbon_price']) === undefined) {
    context.addDefault([...path, 'carbon_price'], '0', 'no carbon price given: CO2 adds nothing to cost');
  } else {
    carbonPrice = context.amount([...path, 'carbon_price'], 'massPrice') ?? 0;
  }
  let makeupH: number | undefined;
  if (makeupTemperature !== undefined) {
    if (makeupTemperature <= 273.15 || makeupTemperature >= 373.15) {
      context.error('out-of-range', [...path, 'makeup_water', 'temperature'], `expected a makeup water temperature above 0 degC and below 100 degC, found "${context.text([...path, 'makeup_water', 'temperature'])}"`);
    } else {
      makeupH = context.property([...path, 'makeup_water', 'temperature'], 'makeup water', () => statePT(context.atmosphericPressure, makeupTemperature).h);
    }
  }
  if (ambient === undefined || makeupTemperature === undefined || makeupH === undefined || makeupCost === undefined || currency === undefined) return null;
  return {
    atmosphericPressure: context.atmosphericPressure,
    ambientTemperature: ambient,
    makeupWater: { temperature: makeupTemperature, h: makeupH, cost: makeupCost },
    currency,
    unitSystem: context.unitSystem,
    carbonPrice,
  };
}

export function resolveFuels(context: ResolveContext): Fuel[] {
  return context.entries(['fuels']).flatMap(({ item, path }) => {
    const price = context.amount([...path, 'price'], 'energyPrice');
    const co2 = context.amount([...path, 'co2'], 'emissionFactor');
    const basis = item.basis;
    if (price === undefined || co2 === undefined || (basis !== 'HHV' && basis !== 'LHV') || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'fuel' as const, price, basis, co2 }];
  });
}

export function resolvePower(context: ResolveContext): PowerSupply | null {
  const path = ['power'];
  const siteDemand = context.amount([...path, 'site_demand'], 'power');
  const supply: PowerSupply = {
    siteDemand: siteDemand ?? 0,
    import: { price: 0, max: 0, minimumBilled: 0, shortfallPrice: 0, co2: 0 },
    export: { price: 0, max: 0 },
  };
  if (context.raw([...path, 'import']) === undefined) {
    context.addDefault([...path, 'import'], 'none', 'no import given: the site may not buy electricity');
  } else {
    const importPath = [...path, 'import'];
    supply.import.price = (context.amount([...importPath, 'price'], 'energyPrice') ?? 0) * GJ_PER_KWH;
    supply.import.max = context.amount([...importPath, 'max'], 'power') ?? 0;
    if (context.raw([...importPath, 'minimum_billed']) !== undefined) {
      supply.import.minimumBilled = context.amount([...importPath, 'minimum_billed'], 'power') ?? 0;
      if (context.raw([...importPath, 'shortfall_price']) === undefined) {
        context.error('missing-key', importPath, 'a minimum_billed import needs a shortfall_price: the price of each MWh below it');
      }
      if (supply.import.minimumBilled > supply.import.max) {
        context.error('min-above-max', [...importPath, 'minimum_billed'], `minimum billed ${context.show(supply.import.minimumBilled, 'power')} is above the import limit ${context.show(supply.import.max, 'power')}`);
      }
    }
    if (context.raw([...importPath, 'shortfall_price']) !== undefined) {
      supply.import.shortfallPrice = (context.amount([...importPath, 'shortfall_price'], 'energyPrice') ?? 0) * GJ_PER_KWH;
    }
    if (context.raw([...importPath, 'co2']) === undefined) {
      context.addDefault([...importPath, 'co2'], '0', 'no grid CO2 factor given: imported electricity counts as CO2-free');
    } else {
      supply.import.co2 = (context.amount([...importPath, 'co2'], 'emissionFactor') ?? 0) * GJ_PER_KWH;
    }
  }
  if (context.raw([...path, 'export']) === undefined) {
    context.addDefault([...path, 'export'], 'none', 'no export given: the site may not sell electricity');
  } else {
    supply.export.price = (context.amount([...path, 'export', 'price'], 'energyPrice') ?? 0) * GJ_PER_KWH;
    supply.export.max = context.amount([...path, 'export', 'max'], 'power') ?? 0;
  }
  return siteDemand === undefined ? null : supply;
}

const OBJECTIVES: Record<string, Objective> = {
  minimum_cost: 'minimumCost', minimum_fuel: 'minimumFuel', maximum_power: 'maximumPower', minimum_co2: 'minimumCo2',
};

export function resolveObjective(context: ResolveContext): Objective {
  const value = context.raw(['objective']);
  if (value === undefined) {
    context.addDefault(['objective'], 'minimum_cost', 'no objective given');
    return 'minimumCost';
  }
  return OBJECTIVES[String(value)] ?? 'minimumCost';
}

export function resolveSolver(context: ResolveContext): SolverOptions {
  const path = ['solver'];
  const options: SolverOptions = { mipGap: 0.0001, timeLimit: 60, maxPasses: 30, enthalpyTolerance: 0.1 };
  if (context.raw([...path, 'mip_gap']) !== undefined) options.mipGap = context.fraction([...path, 'mip_gap']) ?? options.mipGap;
  const timeLimit = context.raw([...path, 'time_limit_seconds']);
  if (typeof timeLimit === 'number' && timeLimit > 0) options.timeLimit = timeLimit;
  const passes = context.raw([...path, 'max_passes']);
  if (typeof passes === 'number' && Number.isInteger(passes) && passes >= 1) options.maxPasses = passes;
  if (context.raw([...path, 'enthalpy_tolerance']) !== undefined) {
    const tolerance = context.amount([...path, 'enthalpy_tolerance'], 'specificEnthalpy');
    if (tolerance !== undefined && tolerance > 0) options.enthalpyTolerance = tolerance;
    else if (tolerance !== undefined) context.error('out-of-range', [...path, 'enthalpy_tolerance'], `expected a tolerance above 0 kJ/kg, found "${context.text([...path, 'enthalpy_tolerance'])}"`);
  }
  return options;
}
