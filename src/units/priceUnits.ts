import { TONNE_KG } from './exactFactors.js';
import { energyUnits } from './energyUnits.js';
import { massUnits } from './massUnits.js';
import { unit, type UnitDefinition } from './unitDefinition.js';

// Prices and emission factors are built from the energy and mass tables so a
// factor is written once. A price entry is named by its denominator only
// ("GJ"); the currency in front of the slash is read separately (currency.ts).

function pick(table: readonly UnitDefinition[], name: string): UnitDefinition {
  const found = table.find((definition) => definition.name === name);
  if (found === undefined) throw new Error(`unit table has no "${name}"`);
  return found;
}

function perEnergy(name: string): UnitDefinition {
  const energy = pick(energyUnits, name);
  return unit(energy.name, 1 / energy.factor, energy.aliases);
}

function perMass(name: string): UnitDefinition {
  const mass = pick(massUnits, name);
  return unit(mass.name, TONNE_KG / mass.factor, mass.aliases);
}

/** Energy price: the denominator after "$/", internal unit currency per GJ. */
export const energyPriceUnits: readonly UnitDefinition[] = ['GJ', 'MJ', 'kWh', 'MWh', 'MMBtu', 'therm', 'Dth'].map(perEnergy);

/** Mass price: the denominator after "$/", internal unit currency per tonne. */
export const massPriceUnits: readonly UnitDefinition[] = ['t', 'kg', 'lb', 'klb'].map(perMass);

// "kg CO2/GJ" and "kg CO2e/GJ" are accepted beside "kg/GJ": the gas is
// always CO2 (or its equivalent), so the label only documents.
function emission(massName: string, energyName: string): UnitDefinition {
  const mass = pick(massUnits, massName);
  const energy = pick(energyUnits, energyName);
  const aliases = ['CO2', 'CO2e'].map((gas) => `${massName} ${gas}/${energyName}`);
  return unit(`${massName}/${energyName}`, mass.factor / energy.factor, aliases);
}

/** Emission factor, internal unit kg CO2 per GJ. */
export const emissionFactorUnits: readonly UnitDefinition[] = [
  emission('kg', 'GJ'),
  emission('kg', 'TJ'),
  emission('t', 'TJ'),
  emission('g', 'kWh'),
  emission('kg', 'kWh'),
  emission('kg', 'MWh'),
  emission('t', 'MWh'),
  emission('lb', 'MWh'),
  emission('kg', 'MMBtu'),
  emission('lb', 'MMBtu'),
];
