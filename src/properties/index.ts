// IAPWS-IF97 water and steam properties: regions 1, 2 and 4, the B23 and
// B2bc boundaries, and the region 1 and 2 backward equations refined on the
// forward ones. Units are the release's: MPa, K, kJ/kg, kJ/(kg K), m3/kg.

export { CRITICAL_PRESSURE, CRITICAL_TEMPERATURE } from './constants.js';
export { PropertyRangeError } from './PropertyRangeError.js';
export type { Region, SteamState } from './steamState.js';
export type { PhaseProperties } from './gibbsProperties.js';
export {
  statePT,
  statePH,
  statePS,
  statePX,
  stateTX,
  saturatedLiquid,
  saturatedVapour,
  enthalpyPT,
  entropyPT,
  temperaturePH,
  temperaturePS,
} from './states.js';
export { saturationPressure, saturationTemperature } from './saturation.js';
export { regionOfPT } from './regionOfPT.js';
export { regionOfPH, regionOfPS, type PressureAndLocation } from './regionOfPH.js';

// Low-level, unchecked and allocation-free: for hot loops and benchmarks.
export { enthalpyRegion1, entropyRegion1, propertiesRegion1 } from './region1.js';
export { enthalpyRegion2, entropyRegion2, propertiesRegion2 } from './region2.js';
export { temperaturePHRegion1Backward, temperaturePSRegion1Backward } from './region1Backward.js';
export { temperaturePHRegion2Backward } from './region2BackwardPH.js';
export { temperaturePSRegion2Backward } from './region2BackwardPS.js';
export { temperaturePHRegion1, temperaturePSRegion1, temperaturePHRegion2, temperaturePSRegion2 } from './inverse.js';
export { saturationPressureRegion4, saturationTemperatureRegion4 } from './region4.js';
export { pressureB23, temperatureB23 } from './boundaryB23.js';
export { pressureB2bc, enthalpyB2bc } from './boundaryB2bc.js';
