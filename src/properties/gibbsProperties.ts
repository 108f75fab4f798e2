import { GAS_CONSTANT } from './constants.js';

/**
 * The dimensionless Gibbs free energy gamma = g / (R T) of a region and its
 * derivatives by the reduced pressure pi = p / p* and the inverse reduced
 * temperature tau = T* / T (ideal and residual parts already added).
 */
export interface ReducedGibbs {
  gamma: number;
  gammaPi: number;
  gammaPiPi: number;
  gammaTau: number;
  gammaTauTau: number;
  gammaPiTau: number;
}

/** One phase at (p, T) in the release's units. */
export interface PhaseProperties {
  p: number; // MPa
  T: number; // K
  v: number; // m3/kg
  h: number; // kJ/kg
  u: number; // kJ/kg
  s: number; // kJ/(kg K)
  cp: number; // kJ/(kg K)
  w: number; // m/s
}

export function emptyReducedGibbs(): ReducedGibbs {
  return { gamma: 0, gammaPi: 0, gammaPiPi: 0, gammaTau: 0, gammaTauTau: 0, gammaPiTau: 0 };
}

/**
 * The property relations of IAPWS R7-97(2012) Tables 3 and 12, written once
 * for every region given by a Gibbs function. R T / p is in kJ/(kg MPa),
 * i.e. 1e-3 m3/kg, and R T in kJ/kg is 1e3 m2/s2 for the speed of sound.
 */
export function propertiesFromGibbs(p: number, T: number, pi: number, tau: number, g: ReducedGibbs): PhaseProperties {
  const RT = GAS_CONSTANT * T;
  const v = (RT * pi * g.gammaPi) / (p * 1000);
  const h = RT * tau * g.gammaTau;
  const u = RT * (tau * g.gammaTau - pi * g.gammaPi);
  const s = GAS_CONSTANT * (tau * g.gammaTau - g.gamma);
  const cp = -GAS_CONSTANT * tau * tau * g.gammaTauTau;
  const coupling = g.gammaPi - tau * g.gammaPiTau;
  const w = Math.sqrt(
    (RT * 1000 * g.gammaPi * g.gammaPi) / ((coupling * coupling) / (tau * tau * g.gammaTauTau) - g.gammaPiPi),
  );
  return { p, T, v, h, u, s, cp, w };
}
