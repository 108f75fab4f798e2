// Napier's relation for saturated steam through an orifice to atmosphere
// (choked flow): W = A p / 70, W in lb/s, A in square inches, p in psia.
// Common in steam handbooks (e.g. the DOE steam sourcebook's leak and trap
// tables); valid where the downstream pressure is below about 58 % of p.

const INCH_M = 0.0254;
const POUND_KG = 0.45359237;
/** psi in MPa: 1 lbf / in^2 */
const PSI_MPA = (POUND_KG * 9.80665) / (INCH_M * INCH_M) / 1e6;

/** Steam through one orifice, kg/s, from its upstream pressure (MPa abs) and diameter (m). */
export function napierSteamFlow(pressureMPa: number, diameterM: number, dischargeCoefficient: number): number {
  const areaSquareInches = (Math.PI / 4) * (diameterM / INCH_M) ** 2;
  const psia = pressureMPa / PSI_MPA;
  const poundsPerSecond = (areaSquareInches * psia) / 70;
  return dischargeCoefficient * poundsPerSecond * POUND_KG;
}
