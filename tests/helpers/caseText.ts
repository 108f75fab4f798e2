// The opening of the small invented test plants: format, name, an SI site
// paying in USD at 101.325 kPa and 15 degC, and one gas fuel.

export interface CaseOpening {
  name: string;
  /** makeup water and treatment, USD per tonne */
  makeupCost?: number;
  /** gas price, USD per GJ */
  fuelPrice?: number;
  /** gas CO2, kg per GJ */
  co2?: number;
}

export function caseOpening({ name, makeupCost = 0.5, fuelPrice = 10, co2 = 50 }: CaseOpening): string {
  return `format_version: 1
name: ${name}
site:
  atmospheric_pressure: 101.325 kPa
  ambient_temperature: 15 degC
  makeup_water: { temperature: 15 degC, cost: ${makeupCost} USD/t }
  currency: USD
  units: si
fuels:
  - { id: gas, price: ${fuelPrice} USD/GJ, basis: HHV, co2: ${co2} kg/GJ }
`;
}
