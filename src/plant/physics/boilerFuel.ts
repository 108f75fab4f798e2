// Fuel fired in a boiler for a given steam output.

/**
 * Fuel energy (kW when flows are kg/s) for steam at `steamEnthalpy` and blowdown
 * at `blowdownEnthalpy` (saturated liquid at drum pressure), both raised from
 * feedwater at `feedwaterEnthalpy`:
 * fuel = (m_s (h_s - h_fw) + m_bd (h_bd - h_fw)) / efficiency.
 */
export function boilerFuel(
  steamFlow: number,
  steamEnthalpy: number,
  blowdownFlow: number,
  blowdownEnthalpy: number,
  feedwaterEnthalpy: number,
  efficiency: number,
): number {
  if (!(efficiency > 0 && efficiency <= 1)) {
    throw new Error(`boiler efficiency ${efficiency} is outside (0, 1]. Give it as a fraction.`);
  }
  return (steamFlow * (steamEnthalpy - feedwaterEnthalpy) + blowdownFlow * (blowdownEnthalpy - feedwaterEnthalpy)) / efficiency;
}

/**
 * Blowdown flow from cycles of concentration: B = S / (COC - 1), since the
 * feedwater F = S + B carries the dissolved solids that leave only with B,
 * F c_fw = B c_bd and COC = c_bd / c_fw (US DOD UFC 3-240-13FN).
 */
export function blowdownFromCycles(steamFlow: number, cyclesOfConcentration: number): number {
  if (!(cyclesOfConcentration > 1)) {
    throw new Error(`cycles of concentration ${cyclesOfConcentration} must be above 1.`);
  }
  return steamFlow / (cyclesOfConcentration - 1);
}

/** Blowdown as a fraction of feedwater b: B = S b / (1 - b), from B = b F and F = S + B. */
export function blowdownFromFraction(steamFlow: number, fractionOfFeedwater: number): number {
  if (!(fractionOfFeedwater >= 0 && fractionOfFeedwater < 1)) {
    throw new Error(`blowdown fraction ${fractionOfFeedwater} must be in [0, 1).`);
  }
  return (steamFlow * fractionOfFeedwater) / (1 - fractionOfFeedwater);
}
