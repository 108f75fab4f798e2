import { describe, expect, test } from 'vitest';
import { enthalpyPT, temperaturePH } from '../../src/properties/index.js';
import { reconcileLinear, reconcileWithEnergy, type EnergyProblem, type Reading } from '../../src/reconcile/index.js';
import { expectClose } from '../helpers/expectClose.js';
import { normalDraws, seededRandom } from './helpers/generatedNetworks.js';

// A mixing header at 1.0 MPa fed by two superheated streams, one outlet.
// Invented true state (demo numbers): 10 kg/s at 300 degC and 5 kg/s at
// 210 degC mix to 15 kg/s at the temperature IF97 gives for the mixed
// enthalpy.
const P_MIX = 1.0;
const TRUE_MIX = { m: [10, 5, 15], T: [573.15, 483.15, 0] };
TRUE_MIX.T[2] = temperaturePH(P_MIX, (10 * enthalpyPT(P_MIX, 573.15) + 5 * enthalpyPT(P_MIX, 483.15)) / 15);
const MIX_FLOW_SIGMA = [0.2, 0.1, 0.3];
const MIX_T_SIGMA = [1, 1, 1];

function mixer(flows: readonly number[], temperatures: readonly number[], temperatureSigma: readonly number[] = MIX_T_SIGMA): EnergyProblem {
  return {
    streams: [
      { id: 'in1', from: 'environment', to: 'hp', p: P_MIX, h: 0, point: 0 },
      { id: 'in2', from: 'environment', to: 'hp', p: P_MIX, h: 0, point: 1 },
      { id: 'out', from: 'hp', to: 'environment', p: P_MIX, h: 0, point: 2 },
    ],
    nodes: [{ id: 'hp', energy: true, heatLoss: 0 }],
    points: [0, 1, 2].map((k) => ({ id: `T${k + 1}`, p: P_MIX, guess: TRUE_MIX.T[k] })),
    flows: flows.map((value, j) => ({ variable: j, value, sigma: MIX_FLOW_SIGMA[j] })),
    temperatures: temperatures.map((value, k) => ({ variable: k, value, sigma: temperatureSigma[k] })),
  };
}

/**
 * Independent minimisation: eliminate the outlet (m3 = m1 + m2 and T3 from
 * the mixed enthalpy by IF97's backward T(p, h)) and minimise the weighted
 * sum of squares over (m1, m2, T1, T2) by Nelder-Mead (Nelder and Mead,
 * Computer Journal 7 (1965) 308), restarted until it stops improving. It
 * shares no code with the projection, the linearisation or cp.
 */
function bruteForceMixer(flows: readonly number[], temperatures: readonly number[]): number[] {
  const objective = (z: readonly number[]): number => {
    const [m1, m2] = [flows[0] + z[0] * MIX_FLOW_SIGMA[0], flows[1] + z[1] * MIX_FLOW_SIGMA[1]];
    const [T1, T2] = [temperatures[0] + z[2] * MIX_T_SIGMA[0], temperatures[1] + z[3] * MIX_T_SIGMA[1]];
    const m3 = m1 + m2;
    const T3 = temperaturePH(P_MIX, (m1 * enthalpyPT(P_MIX, T1) + m2 * enthalpyPT(P_MIX, T2)) / m3);
    return z[0] ** 2 + z[1] ** 2 + z[2] ** 2 + z[3] ** 2 + ((m3 - flows[2]) / MIX_FLOW_SIGMA[2]) ** 2 + ((T3 - temperatures[2]) / MIX_T_SIGMA[2]) ** 2;
  };
  let best = [0, 0, 0, 0];
  for (let restart = 0; restart < 8; restart++) best = nelderMead(objective, best, restart === 0 ? 1 : 0.05);
  const [m1, m2] = [flows[0] + best[0] * MIX_FLOW_SIGMA[0], flows[1] + best[1] * MIX_FLOW_SIGMA[1]];
  const [T1, T2] = [temperatures[0] + best[2] * MIX_T_SIGMA[0], temperatures[1] + best[3] * MIX_T_SIGMA[1]];
  const T3 = temperaturePH(P_MIX, (m1 * enthalpyPT(P_MIX, T1) + m2 * enthalpyPT(P_MIX, T2)) / (m1 + m2));
  return [m1, m2, m1 + m2, T1, T2, T3];
}

function nelderMead(f: (x: readonly number[]) => number, start: readonly number[], step: number): number[] {
  const n = start.length;
  let simplex = [start.slice(), ...start.map((_, i) => start.map((value, j) => value + (i === j ? step : 0)))].map((x) => ({ x, f: f(x) }));
  for (let iteration = 0; iteration < 4000; iteration++) {
    simplex.sort((a, b) => a.f - b.f);
    if (simplex[n].f - simplex[0].f < 1e-15) break;
    const centroid = start.map((_, j) => simplex.slice(0, n).reduce((sum, vertex) => sum + vertex.x[j], 0) / n);
    const along = (t: number): number[] => centroid.map((value, j) => value + t * (simplex[n].x[j] - value));
    const reflected = along(-1);
    const fr = f(reflected);
    if (fr < simplex[0].f) {
      const expanded = along(-2);
      const fe = f(expanded);
      simplex[n] = fe < fr ? { x: expanded, f: fe } : { x: reflected, f: fr };
    } else if (fr < simplex[n - 1].f) {
      simplex[n] = { x: reflected, f: fr };
    } else {
      const contracted = along(fr < simplex[n].f ? -0.5 : 0.5);
      const fc = f(contracted);
      if (fc < Math.min(fr, simplex[n].f)) simplex[n] = { x: contracted, f: fc };
      else simplex = simplex.map((vertex, i) => (i === 0 ? vertex : { x: vertex.x.map((value, j) => simplex[0].x[j] + 0.5 * (value - simplex[0].x[j])), f: 0 })).map((vertex, i) => (i === 0 ? vertex : { x: vertex.x, f: f(vertex.x) }));
    }
  }
  simplex.sort((a, b) => a.f - b.f);
  return simplex[0].x;
}

describe('reconcileWithEnergy', () => {
  test('a mixing header: matches an independent brute-force minimisation', () => {
    const flows = [10.3, 4.9, 15.1];
    const temperatures = [TRUE_MIX.T[0] + 0.8, TRUE_MIX.T[1] - 0.5, TRUE_MIX.T[2] - 1.2];
    const result = reconcileWithEnergy(mixer(flows, temperatures));
    const brute = bruteForceMixer(flows, temperatures);
    const ours = [...result.flows, ...result.temperatures].map((value) => value!);
    ours.forEach((value, i) => expectClose(value, brute[i], 2e-7, `estimate ${i}`));
    // Two balances, six readings, no unmeasured: two degrees of freedom.
    expect(result.last.dof).toBe(2);
  });

  test('a mixing header: the estimate closes the mass and the IF97 energy balance', () => {
    const result = reconcileWithEnergy(mixer([10.3, 4.9, 15.1], [574, 482.5, TRUE_MIX.T[2] - 1.2]));
    expect(Math.abs(result.massResidual[0]!)).toBeLessThan(1e-9);
    // kW, against some 44,000 kW through the header.
    expect(Math.abs(result.energyResidual[0]!)).toBeLessThan(1e-5);
    const [m1, m2, m3] = result.flows.map((value) => value!);
    const [T1, T2, T3] = result.temperatures.map((value) => value!);
    expectClose(m1 * enthalpyPT(P_MIX, T1) + m2 * enthalpyPT(P_MIX, T2), m3 * enthalpyPT(P_MIX, T3), 1e-10, 'energy in = energy out');
    expect(result.iterations).toBeGreaterThan(1);
    expect(result.iterations).toBeLessThan(10);
  });

  test('a biased inlet meter: the energy balance moves its estimate towards the truth, more so with better thermometers', () => {
    // Only the first inlet's meter is off (+4 %); the temperatures are read
    // true. By mass alone the 0.4 kg/s imbalance is shared among the three
    // meters by their variances; the temperatures fix the mixing ratio, which
    // points at the first inlet, the more firmly the tighter they are.
    const flows = [10.4, 5, 15];
    const massOnly = reconcileLinear({
      variableCount: 3,
      balances: [{ name: 'hp', terms: new Map([[0, 1], [1, 1], [2, -1]]) }],
      readings: flows.map((value, j) => ({ variable: j, value, sigma: MIX_FLOW_SIGMA[j] })),
    });
    const errorMassOnly = Math.abs(massOnly.estimate[0]! - 10);
    const loose = reconcileWithEnergy(mixer(flows, TRUE_MIX.T, [1, 1, 1]));
    const tight = reconcileWithEnergy(mixer(flows, TRUE_MIX.T, [0.1, 0.1, 0.1]));
    expect(Math.abs(loose.flows[0]! - 10)).toBeLessThan(errorMassOnly);
    expect(Math.abs(tight.flows[0]! - 10)).toBeLessThan(errorMassOnly / 2);
    // and the adjustment falls on the biased meter: its statistic is the largest.
    for (const result of [loose, tight]) {
      const statistics = result.last.readings.map((reading) => reading.statistic ?? 0);
      expect(statistics.indexOf(Math.max(...statistics))).toBe(0);
    }
  });

  test('500 noisy draws: the energy balance lowers the flows\' mean squared error as its covariance predicts, and the global statistic averages its degrees of freedom', () => {
    const normal = normalDraws(seededRandom(15));
    let squaredMassOnly = 0;
    let squaredEnergy = 0;
    let predictedMassOnly = 0;
    let predictedEnergy = 0;
    let globalSum = 0;
    const draws = 500;
    for (let draw = 0; draw < draws; draw++) {
      const flows = TRUE_MIX.m.map((value, j) => value + MIX_FLOW_SIGMA[j] * normal());
      const temperatures = TRUE_MIX.T.map((value, k) => value + MIX_T_SIGMA[k] * normal());
      const massOnly = reconcileLinear({
        variableCount: 3,
        balances: [{ name: 'hp', terms: new Map([[0, 1], [1, 1], [2, -1]]) }],
        readings: flows.map((value, j) => ({ variable: j, value, sigma: MIX_FLOW_SIGMA[j] })),
      });
      const withEnergy = reconcileWithEnergy(mixer(flows, temperatures));
      for (let j = 0; j < 3; j++) {
        squaredMassOnly += (massOnly.estimate[j]! - TRUE_MIX.m[j]) ** 2;
        squaredEnergy += (withEnergy.flows[j]! - TRUE_MIX.m[j]) ** 2;
        predictedMassOnly += massOnly.sigma[j]! ** 2;
        predictedEnergy += withEnergy.flowSigma[j]! ** 2;
      }
      globalSum += withEnergy.last.globalStatistic;
    }
    expect(squaredEnergy).toBeLessThan(squaredMassOnly);
    expect(predictedEnergy).toBeLessThan(predictedMassOnly);
    // Observed over predicted squared error: 1500 squared normals, so within
    // 1 +- 0.15 (about four standard errors of a mean of correlated squares).
    expect(Math.abs(squaredEnergy / predictedEnergy - 1)).toBeLessThan(0.15);
    expect(Math.abs(squaredMassOnly / predictedMassOnly - 1)).toBeLessThan(0.15);
    // A chi-square on 2 degrees of freedom has mean 2 and standard deviation 2:
    // the mean of 500 lies within 2 +- 0.36 (four standard errors).
    expect(Math.abs(globalSum / draws - 2)).toBeLessThan(0.36);
  });

  test('an unmeasured user: observable, and checkable only through the energy balance', () => {
    // A 0.4 MPa header fed by a letdown at a measured temperature and by a
    // turbine exhaust at a known enthalpy; two users leave at the header's
    // measured temperature, one of them unmetered. By mass alone nothing can
    // be checked; the energy balance adds one degree of freedom.
    const p = 0.4;
    const hExhaust = 2750;
    const hHeader = (3 * enthalpyPT(p, 523.15) + 6 * hExhaust) / 9;
    const THeader = temperaturePH(p, hHeader);
    const problem: EnergyProblem = {
      streams: [
        { id: 'letdown', from: 'environment', to: 'lp', p, h: 0, point: 0 },
        { id: 'exhaust', from: 'environment', to: 'lp', p, h: hExhaust, point: null },
        { id: 'user1', from: 'lp', to: 'environment', p, h: 0, point: 1 },
        { id: 'user2', from: 'lp', to: 'environment', p, h: 0, point: 1 },
      ],
      nodes: [{ id: 'lp', energy: true, heatLoss: 0 }],
      points: [
        { id: 'letdown outlet', p, guess: 523.15 },
        { id: 'lp header', p, guess: THeader },
      ],
      flows: [
        { variable: 0, value: 3.05, sigma: 0.06 },
        { variable: 1, value: 5.9, sigma: 0.12 },
        { variable: 2, value: 5.02, sigma: 0.1 },
      ] satisfies Reading[],
      temperatures: [
        { variable: 0, value: 523.4, sigma: 1 },
        { variable: 1, value: THeader - 0.3, sigma: 1 },
      ],
    };
    const massOnly = reconcileLinear({ variableCount: 4, balances: [{ name: 'lp', terms: new Map([[0, 1], [1, 1], [2, -1], [3, -1]]) }], readings: problem.flows });
    expect(massOnly.dof).toBe(0);
    const result = reconcileWithEnergy(problem);
    expect(result.last.dof).toBe(1);
    expect(result.flows[3]).not.toBeNull();
    // user1's meter drops out: with user2 = letdown + exhaust - user1 the
    // energy balance reads letdown (hL - hH) + exhaust (hx - hH) = 0, free of
    // user1. The other four readings are checked by it.
    expect(result.last.readings.map((reading) => reading.redundant)).toEqual([true, true, false, true, true]);
    expect(Math.abs(result.massResidual[0]!)).toBeLessThan(1e-9);
    expect(Math.abs(result.energyResidual[0]!)).toBeLessThan(1e-6);
    // The unmetered user is the balance of the others.
    expectClose(result.flows[3]!, result.flows[0]! + result.flows[1]! - result.flows[2]!, 1e-12, 'user2');
  });
});
