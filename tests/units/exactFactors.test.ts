import { describe, expect, test } from 'vitest';
import {
  ATMOSPHERE_KPA,
  BAR_KPA,
  BTU_IT_KJ,
  BTU_PER_LB_KJ_PER_KG,
  BTU_PER_LB_RANKINE_KJ_PER_KG_K,
  CALORIE_IT_KJ,
  CELSIUS_ZERO_K,
  FAHRENHEIT_ZERO_R,
  FOOT_M,
  HORSEPOWER_KW,
  KILOWATT_HOUR_KJ,
  POUND_FORCE_N,
  POUND_KG,
  PSI_KPA,
  RANKINE_K,
  THERM_KJ,
} from '../../src/units/exactFactors.js';
import { expectClose } from '../helpers/expectClose.js';

// Published values: NIST SP 811 (2008), Appendix B.8, unless named otherwise.
// The printed NIST figures are quoted from memory; the exact values are
// derived from the definitions in the test itself.
// A tolerance of 1e-15 means "equal to double-precision round-off".
describe('exact definitions', () => {
  test('1 lb = 0.45359237 kg (international yard and pound agreement, 1959)', () => {
    expect(POUND_KG).toBe(0.45359237);
  });

  test('1 lbf = 4.4482216152605 N (0.45359237 kg x 9.80665 m/s2, NIST SP 811 B.8)', () => {
    expectClose(POUND_FORCE_N, 4.4482216152605, 1e-15, 'lbf');
  });

  test('1 psi = 6.894757293168 kPa (lbf over (0.0254 m)^2; NIST SP 811 B.8 prints 6.894 757 E+03 Pa)', () => {
    expectClose(PSI_KPA, 6.894757293168, 1e-13, 'psi');
    expectClose(PSI_KPA, 6.894757, 1e-7, 'psi as printed');
  });

  test('1 Btu(IT) = 1.05505585262 kJ (ISO 31-4; NIST SP 811 B.8) and equals cal(IT) x 453.59237 x 5/9', () => {
    expect(BTU_IT_KJ).toBe(1.05505585262);
    expectClose(CALORIE_IT_KJ * 453.59237 * (5 / 9), BTU_IT_KJ, 1e-15, 'Btu from calorie');
  });

  test('1 Btu/lb = 2.326 kJ/kg exactly (NIST SP 811 B.8)', () => {
    expect(BTU_PER_LB_KJ_PER_KG).toBe(2.326);
    expectClose(BTU_IT_KJ / POUND_KG, BTU_PER_LB_KJ_PER_KG, 1e-15, 'Btu/lb derived');
  });

  test('1 Btu/(lb R) = 4.1868 kJ/(kg K) exactly (NIST SP 811 B.8)', () => {
    expect(BTU_PER_LB_RANKINE_KJ_PER_KG_K).toBe(4.1868);
    expectClose(BTU_IT_KJ / POUND_KG / RANKINE_K, BTU_PER_LB_RANKINE_KJ_PER_KG_K, 1e-15, 'Btu/(lb R) derived');
  });

  test('1 therm = 100,000 Btu(IT) = 105,505.585262 kJ', () => {
    expectClose(THERM_KJ, 105_505.585262, 1e-15, 'therm');
  });

  test('1 kWh = 3.6 MJ', () => {
    expect(KILOWATT_HOUR_KJ).toBe(3600);
  });

  test('1 hp (mechanical) = 550 ft lbf/s = 745.69987158227022 W (NIST SP 811 B.8 prints 7.456 999 E+02 W)', () => {
    expectClose(HORSEPOWER_KW, (550 * FOOT_M * POUND_FORCE_N) / 1000, 1e-15, 'hp derived');
    expectClose(HORSEPOWER_KW, 0.7456999, 1e-7, 'hp as printed');
  });

  test('1 atm = 101.325 kPa (10th CGPM, 1954) and 1 bar = 100 kPa', () => {
    expect(ATMOSPHERE_KPA).toBe(101.325);
    expect(BAR_KPA).toBe(100);
  });

  test('0 degC = 273.15 K and 0 degF = 459.67 degR = 273.15 K x 9/5 - 32', () => {
    expect(CELSIUS_ZERO_K).toBe(273.15);
    expectClose(FAHRENHEIT_ZERO_R, CELSIUS_ZERO_K * 1.8 - 32, 1e-15, 'Rankine zero');
  });
});
