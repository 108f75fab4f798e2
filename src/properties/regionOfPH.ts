import { MAX_TEMPERATURE, MIN_TEMPERATURE, REGION1_MAX_TEMPERATURE } from './constants.js';
import { temperatureB23 } from './boundaryB23.js';
import { PropertyRangeError, formatValue, requireFinite } from './PropertyRangeError.js';
import { enthalpyRegion1, entropyRegion1 } from './region1.js';
import { enthalpyRegion2, entropyRegion2 } from './region2.js';
import { saturationTemperatureRegion4 } from './region4.js';
import { aboveMaxTemperatureRefusal, region3Refusal, requirePressure } from './regionOfPT.js';
import { MIN_SATURATION_PRESSURE, REGION3_SATURATION_PRESSURE } from './saturation.js';

/** Where (p, h) or (p, s) lies; for wet steam, the saturation temperature and quality. */
export type PressureAndLocation =
  | { region: 1 | 2 }
  | { region: 4; T: number; x: number };

/**
 * A value within this fraction of h_fg (or s_fg) of a saturated one is taken
 * as saturated: the state evaluated along another code path may land an ulp
 * on the other side, and a saturated liquid should come back as x = 0.
 */
const SATURATION_BAND = 1e-12;


/** The forward property that (p, h) and (p, s) share the logic of. */
interface Quantity {
  name: string;
  unit: string;
  region1(p: number, T: number): number;
  region2(p: number, T: number): number;
  /** Typical size; near 273.15 K h and s are small differences of large terms. */
  scale: number;
}

const ENTHALPY: Quantity = { name: 'enthalpy', unit: 'kJ/kg', region1: enthalpyRegion1, region2: enthalpyRegion2, scale: 1000 };
const ENTROPY: Quantity = { name: 'entropy', unit: 'kJ/(kg K)', region1: entropyRegion1, region2: entropyRegion2, scale: 10 };

/**
 * Compares the value with the forward equations along the isobar: at the
 * 273.15 K and 1073.15 K ends, at saturation (up to 16.5292 MPa), or at the
 * edges of region 3 (region 1 at 623.15 K, region 2 on the B23 line).
 */
function locate(p: number, value: number, quantity: Quantity): PressureAndLocation {
  requirePressure(p);
  requireFinite(quantity.name, value, quantity.unit);
  // The edges of the range (273.15 K, 1073.15 K, region 3) are compared with a
  // round-off allowance, so a state computed exactly at an edge is not refused.
  const edge = (limit: number): number => 1e-12 * (Math.abs(limit) + quantity.scale);
  // Written only for a refusal: most calls never need it.
  const second = (): string => `${formatValue(value)} ${quantity.unit}`;
  const liquidExists = p >= MIN_SATURATION_PRESSURE;
  const lowest = liquidExists ? quantity.region1(p, MIN_TEMPERATURE) : quantity.region2(p, MIN_TEMPERATURE);
  if (value < lowest - edge(lowest)) {
    throw new PropertyRangeError(
      `${quantity.name} ${second()} at ${formatValue(p)} MPa is below the IF97 limit of ${formatValue(lowest)} ${quantity.unit} (${MIN_TEMPERATURE} K at this pressure)`,
    );
  }
  const highest = quantity.region2(p, MAX_TEMPERATURE);
  if (value > highest + edge(highest)) throw aboveMaxTemperatureRefusal(p, second());
  if (!liquidExists) return { region: 2 };
  if (p <= REGION3_SATURATION_PRESSURE) {
    const T = saturationTemperatureRegion4(p);
    const liquid = quantity.region1(p, T);
    const vapour = quantity.region2(p, T);
    const band = SATURATION_BAND * (vapour - liquid);
    if (value < liquid - band) return { region: 1 };
    if (value > vapour + band) return { region: 2 };
    if (value <= liquid + band) return { region: 4, T, x: 0 };
    if (value >= vapour - band) return { region: 4, T, x: 1 };
    return { region: 4, T, x: (value - liquid) / (vapour - liquid) };
  }
  const region1Edge = quantity.region1(p, REGION1_MAX_TEMPERATURE);
  if (value <= region1Edge + edge(region1Edge)) return { region: 1 };
  const region2Edge = quantity.region2(p, temperatureB23(p));
  if (value >= region2Edge - edge(region2Edge)) return { region: 2 };
  throw region3Refusal(p, second());
}

/** The IF97 region of (p MPa, h kJ/kg); refuses regions 3 and 5 and states outside IF97. */
export function regionOfPH(p: number, h: number): PressureAndLocation {
  return locate(p, h, ENTHALPY);
}

/** The IF97 region of (p MPa, s kJ/(kg K)); refuses regions 3 and 5 and states outside IF97. */
export function regionOfPS(p: number, s: number): PressureAndLocation {
  return locate(p, s, ENTROPY);
}
