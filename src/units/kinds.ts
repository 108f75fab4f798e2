/** Every kind of quantity the case file and reports carry. */
export type QuantityKind =
  | 'pressure'
  | 'temperature'
  | 'temperatureDifference'
  | 'massFlow'
  | 'energy'
  | 'power'
  | 'specificEnthalpy'
  | 'specificEntropy'
  | 'energyPrice'
  | 'massPrice'
  | 'emissionFactor'
  | 'percent'
  | 'mass';

/** All kinds, in the order a unit of the wrong kind is looked up (temperature before temperature difference). */
export const quantityKinds: readonly QuantityKind[] = [
  'pressure',
  'temperature',
  'temperatureDifference',
  'massFlow',
  'mass',
  'energy',
  'power',
  'specificEnthalpy',
  'specificEntropy',
  'energyPrice',
  'massPrice',
  'emissionFactor',
  'percent',
];

interface KindDescription {
  /** The kind with its article, as it reads in a sentence: "a pressure". */
  readonly phrase: string;
  /** Three typical inputs, used in messages. */
  readonly examples: readonly [string, string, string];
}

const descriptions: Record<QuantityKind, KindDescription> = {
  pressure: { phrase: 'a pressure', examples: ['42 barg', '4.2 MPa', '600 psig'] },
  temperature: { phrase: 'a temperature', examples: ['400 degC', '750 degF', '673.15 K'] },
  temperatureDifference: { phrase: 'a temperature difference', examples: ['10 K', '15 degC', '25 degF'] },
  massFlow: { phrase: 'a mass flow', examples: ['60 t/h', '120 klb/h', '15 kg/s'] },
  mass: { phrase: 'a mass', examples: ['500 kg', '20 t', '1000 lb'] },
  energy: { phrase: 'an energy', examples: ['12 GJ', '150 MWh', '900 MMBtu'] },
  power: { phrase: 'a power', examples: ['750 kW', '5 MW', '1200 hp'] },
  specificEnthalpy: { phrase: 'a specific enthalpy', examples: ['2800 kJ/kg', '1200 Btu/lb', '419 kJ/kg'] },
  specificEntropy: { phrase: 'a specific entropy', examples: ['6.5 kJ/(kg K)', '1.6 Btu/(lb R)', '1.3 kJ/kg/K'] },
  energyPrice: { phrase: 'an energy price', examples: ['9 $/GJ', '4.5 USD/MMBtu', '30 EUR/MWh'] },
  massPrice: { phrase: 'a mass price', examples: ['2.5 $/t', '1.2 USD/klb', '3 EUR/t'] },
  emissionFactor: { phrase: 'an emission factor', examples: ['56.1 kg/GJ', '117 lb/MMBtu', '0.2 t/MWh'] },
  percent: { phrase: 'a percentage', examples: ['2 %', '98%', '0.5 percent'] },
};

export function describeKind(kind: QuantityKind): KindDescription {
  return descriptions[kind];
}

/** A phrase without its article: "mass flow". */
export function kindNoun(kind: QuantityKind): string {
  return descriptions[kind].phrase.replace(/^an? /, '');
}
