// Spray-water desuperheating after a letdown valve.

/**
 * Spray water per kg of inlet steam so that the mixture reaches `targetEnthalpy`:
 * m_w / m_in = (h_in - h_out) / (h_out - h_w), from the mass and energy balance of
 * an adiabatic mixing (throttling is isenthalpic, so h_in is the valve's inlet).
 * Returns 0 when the steam is already at or below the target.
 */
export function sprayWaterRatio(inletEnthalpy: number, targetEnthalpy: number, waterEnthalpy: number): number {
  if (targetEnthalpy <= waterEnthalpy) {
    throw new Error(
      `desuperheater target enthalpy ${targetEnthalpy.toFixed(1)} kJ/kg is not above the spray water's ${waterEnthalpy.toFixed(1)} kJ/kg. ` +
        'Check the target temperature and the water source.',
    );
  }
  return Math.max(0, (inletEnthalpy - targetEnthalpy) / (targetEnthalpy - waterEnthalpy));
}
