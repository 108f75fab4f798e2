import { ATMOSPHERE_KPA, BAR_KPA, PSI_KPA } from './exactFactors.js';
import { gaugeUnit, unit, type UnitDefinition } from './unitDefinition.js';

// Internal unit: MPa absolute. Pa, kPa, MPa and atm are absolute; gauge units
// add the atmospheric pressure, which is 0.101325 MPa unless the caller passes
// the site's own. Bare "bar" and "psi" are refused (unitCatalogue.ts): trade
// usage reads them either way, so the case must say bara/barg or psia/psig.
const KPA_MPA = 1e-3;
const BAR_MPA = BAR_KPA * KPA_MPA;
const PSI_MPA = PSI_KPA * KPA_MPA;

export const pressureUnits: readonly UnitDefinition[] = [
  unit('Pa', 1e-6),
  unit('kPa', KPA_MPA, ['kPa(a)', 'kPaa']),
  gaugeUnit('kPag', KPA_MPA, 'kPa', ['kPa(g)']),
  unit('MPa', 1, ['MPa(a)', 'MPaa']),
  gaugeUnit('MPag', 1, 'MPa', ['MPa(g)']),
  unit('bara', BAR_MPA, ['bar(a)']),
  gaugeUnit('barg', BAR_MPA, 'bar', ['bar(g)']),
  unit('psia', PSI_MPA, ['psi(a)']),
  gaugeUnit('psig', PSI_MPA, 'psia', ['psi(g)']),
  unit('atm', ATMOSPHERE_KPA * KPA_MPA),
];
