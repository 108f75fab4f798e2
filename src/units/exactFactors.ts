// Exact conversion factors. Each is either a definition or derived by exact
// arithmetic from definitions; the derivation is written out so a reader can
// check it. Factors are to the internal units: MPa, K, kJ, kg, s.

/** International avoirdupois pound in kg: exact by the 1959 international yard and pound agreement (NIST SP 811, B.8). */
export const POUND_KG = 0.45359237;

/** International foot in m: exact by the 1959 international yard and pound agreement. */
export const FOOT_M = 0.3048;

/** International inch in m: exact, 1/12 ft. */
export const INCH_M = 0.0254;

/** Standard acceleration of gravity in m/s2: exact by the 3rd CGPM (1901). */
export const STANDARD_GRAVITY_M_S2 = 9.80665;

/** Pound-force in N: exact, 0.45359237 kg x 9.80665 m/s2 (NIST SP 811, B.8). */
export const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY_M_S2;

/** psi in kPa: exact, lbf / in2 = 4.4482216152605 N / (0.0254 m)^2 = 6.894757293168... kPa. */
export const PSI_KPA = POUND_FORCE_N / (INCH_M * INCH_M) / 1000;

/** Standard atmosphere in kPa: exact by the 10th CGPM (1954). */
export const ATMOSPHERE_KPA = 101.325;

/** bar in kPa: exact by definition (NIST SP 811, B.8). */
export const BAR_KPA = 100;

/** International Table calorie in kJ: exact, 4.1868 J (5th International Conference on the Properties of Steam, 1956). */
export const CALORIE_IT_KJ = 4.1868e-3;

/**
 * International Table Btu in kJ: exact, 1.05505585262 kJ (ISO 31-4; NIST SP 811, B.8).
 * Derived as cal_IT/(g degC) x lb x degF/degC = 4.1868 J x 453.59237 x 5/9.
 * Written as the literal because the float product rounds in the last digit.
 */
export const BTU_IT_KJ = 1.05505585262;

/** Btu(IT)/lb in kJ/kg: exact, 1.05505585262 / 0.45359237 = 2.326 (NIST SP 811, B.8). */
export const BTU_PER_LB_KJ_PER_KG = 2.326;

/** Btu(IT)/(lb degR) in kJ/(kg K): exact, 2.326 x 9/5 = 4.1868 (NIST SP 811, B.8). */
export const BTU_PER_LB_RANKINE_KJ_PER_KG_K = 4.1868;

/**
 * therm in kJ: taken as 100,000 Btu(IT) = 105,505.585262 kJ exactly. This is
 * neither the EC therm (105.506 MJ, Directive 80/181/EEC) nor the US therm
 * (100,000 Btu at 59 degF, 105.4804 MJ, NIST SP 811, B.8); both differ from it
 * by less than 3 in 10,000 (the two figures are quoted from memory).
 */
export const THERM_KJ = 1e5 * BTU_IT_KJ;

/** kWh in kJ: exact, 3600 s x 1 kW. */
export const KILOWATT_HOUR_KJ = 3600;

/** Mechanical horsepower in kW: exact, 550 ft lbf/s = 745.69987158227022 W (NIST SP 811, B.8). */
export const HORSEPOWER_KW = 0.74569987158227022;

/** Kelvin offset of the Celsius scale: exact by definition of the Celsius scale. */
export const CELSIUS_ZERO_K = 273.15;

/** Rankine offset of the Fahrenheit scale: exact, 459.67 degR = 273.15 K x 9/5. */
export const FAHRENHEIT_ZERO_R = 459.67;

/** Size of one degF or degR in K: exact, 5/9. */
export const RANKINE_K = 5 / 9;

/** Metric tonne in kg: exact by definition. */
export const TONNE_KG = 1000;
