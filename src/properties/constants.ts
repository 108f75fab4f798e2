// Constants of IAPWS R7-97(2012), in the release's units (MPa, K, kJ/kg).

/** Specific gas constant of water, kJ/(kg K). IAPWS R7-97(2012) Eq. 1. */
export const GAS_CONSTANT = 0.461526;

/** Critical point, IAPWS R7-97(2012) Eqs. 2 and 3. */
export const CRITICAL_PRESSURE = 22.064; // MPa
export const CRITICAL_TEMPERATURE = 647.096; // K

/** Range of validity, IAPWS R7-97(2012) section 2. */
export const MIN_TEMPERATURE = 273.15; // K
export const MAX_TEMPERATURE = 1073.15; // K, upper limit of regions 1-3
export const MAX_PRESSURE = 100; // MPa
export const REGION5_MAX_TEMPERATURE = 2273.15; // K
export const REGION5_MAX_PRESSURE = 50; // MPa

/** Upper temperature of region 1 and lower end of the B23 line, K. */
export const REGION1_MAX_TEMPERATURE = 623.15;
/** Above this temperature region 2 reaches up to 100 MPa (top of the B23 line), K. */
export const B23_MAX_TEMPERATURE = 863.15;

/** Region 2 is split into 2a and 2b at 4 MPa; IAPWS R7-97(2012) section 6.3.1. */
export const REGION2A_MAX_PRESSURE = 4;
/** Region 2b/2c boundary for T(p,s), kJ/(kg K); IAPWS R7-97(2012) section 6.3.2. */
export const REGION2BC_ENTROPY = 5.85;

/** What this package covers, quoted in every refusal. */
export const COVERAGE =
  'it covers p <= 100 MPa, 273.15 K <= T <= 1073.15 K outside region 3';
