// Linear data reconciliation: weighted least squares under linear balances,
// A x = 0, with some variables measured and the rest not.
//
// Method (textbook, named): minimise sum ((y_i - x_i) / sigma_i)^2 subject to
// A x = 0. The Lagrange solution (Kuehn and Davidson, Chem. Eng. Prog. 57
// (1961) 44) is x = y - V B' (B V B')^-1 B y once the unmeasured flows are
// projected out (Crowe, Garcia Campos and Hrymak, AIChE J. 29 (1983) 881):
// P A_u = 0 with P's rows a basis of A_u's left null space, B = P A_x.
// Observability and redundancy follow from the same projection (Crowe 1989,
// Narasimhan and Jordache 2000, ch. 3): an unmeasured flow is observable when
// its unit vector lies in A_u's row space; a reading is redundant when its
// column of B is not zero.
//
// Both steps use rank-revealing decompositions from ml-matrix (an
// eigendecomposition of A_u A_u', a singular value decomposition of G), where
// QR without pivoting would not reveal rank. With G = B D (D = diag sigma),
// Pi = G+ G projects onto G's row space and every result is a product of it:
// adjustments a = -D Pi (y / sigma), cov(a) = D Pi D, the global statistic
// w' Pi w (w = y / sigma) with rank(G) degrees of freedom, and the
// reconciled covariance D (I - Pi) D.
import { EigenvalueDecomposition, Matrix, SingularValueDecomposition } from 'ml-matrix';

/** A balance as sparse coefficients over variable indices: sum terms x + constant = 0. */
export interface BalanceRow {
  name: string;
  terms: ReadonlyMap<number, number>;
  /** known part of the balance (a heat loss, a linearisation's offset); 0 when absent */
  constant?: number;
}

export interface Reading {
  /** index of the measured variable */
  variable: number;
  value: number;
  /** standard deviation, > 0 */
  sigma: number;
}

export interface LinearProblem {
  variableCount: number;
  balances: readonly BalanceRow[];
  /** at most one reading per variable */
  readings: readonly Reading[];
}

export interface ReadingResult {
  variable: number;
  reconciled: number;
  /** standard deviation of the reconciled value */
  sigma: number;
  /** reconciled - measured */
  adjustment: number;
  /** standard deviation of the adjustment; 0 when the reading is not redundant */
  adjustmentSigma: number;
  redundant: boolean;
  /** |adjustment| / adjustmentSigma; null when not redundant (it cannot be checked) */
  statistic: number | null;
}

export interface LinearResult {
  /** every variable's estimate; null where an unmeasured flow is not observable */
  estimate: (number | null)[];
  /** standard deviation of each estimate; null where not observable */
  sigma: (number | null)[];
  observable: boolean[];
  readings: ReadingResult[];
  /** w' Pi w: chi-square with `dof` degrees of freedom when there is no gross error */
  globalStatistic: number;
  dof: number;
}

/** Relative size below which a singular value (or eigenvalue of A_u A_u') counts as zero. */
const RANK_TOLERANCE = 1e-10;

export function reconcileLinear(problem: LinearProblem): LinearResult {
  const n = problem.variableCount;
  const m = problem.balances.length;
  const measuredIndex = new Map<number, number>();
  problem.readings.forEach((reading, i) => {
    if (measuredIndex.has(reading.variable)) throw new Error(`variable ${reading.variable} has two readings`);
    if (!(reading.sigma > 0)) throw new Error(`reading of variable ${reading.variable} has sigma ${reading.sigma}`);
    measuredIndex.set(reading.variable, i);
  });
  const unmeasured: number[] = [];
  const unmeasuredIndex = new Map<number, number>();
  for (let j = 0; j < n; j++) {
    if (!measuredIndex.has(j)) {
      unmeasuredIndex.set(j, unmeasured.length);
      unmeasured.push(j);
    }
  }
  const p = problem.readings.length;
  const k = unmeasured.length;

  // A_u A_u' (m x m) from A_u's sparse columns. Its eigenvectors are A_u's left
  // singular vectors and its eigenvalues their squared singular values: the
  // symmetric eigensolver is several times faster than a full SVD of A_u, and a
  // balance matrix of +-1 entries is far from the precision squaring loses.
  const columns = new Map<number, [number, number][]>(); // unmeasured -> (row, coefficient)
  problem.balances.forEach((row, i) => {
    for (const [variable, coefficient] of row.terms) {
      const u = unmeasuredIndex.get(variable);
      if (u === undefined || coefficient === 0) continue;
      const list = columns.get(u) ?? [];
      list.push([i, coefficient]);
      columns.set(u, list);
    }
  });
  let projector: Matrix; // rows: basis of A_u's left null space, (m - r) x m
  let rowSpace: Matrix | null = null; // k x r: orthonormal basis of A_u's row space
  let values: number[] = [];
  let rank = 0;
  let leftVectors: Matrix | null = null;
  if (m === 0) {
    projector = Matrix.zeros(0, 0);
  } else if (k === 0) {
    projector = Matrix.eye(m);
  } else {
    const normal = Matrix.zeros(m, m);
    for (const list of columns.values()) {
      for (const [a, ca] of list) for (const [b, cb] of list) normal.set(a, b, normal.get(a, b) + ca * cb);
    }
    const eigen = new EigenvalueDecomposition(normal, { assumeSymmetric: true });
    const order = eigen.realEigenvalues.map((value, index) => ({ value, index })).sort((a, b) => b.value - a.value);
    const largest = Math.max(order[0]?.value ?? 0, 0);
    rank = order.filter(({ value }) => value > RANK_TOLERANCE * Math.max(1, largest) * m).length;
    const vectors = eigen.eigenvectorMatrix;
    const sorted = Matrix.zeros(m, m);
    order.forEach(({ index }, c) => {
      for (let i = 0; i < m; i++) sorted.set(i, c, vectors.get(i, index));
    });
    values = order.slice(0, rank).map(({ value }) => Math.sqrt(value));
    projector = rank < m ? new Matrix(sorted.subMatrix(0, m - 1, rank, m - 1).transpose()) : Matrix.zeros(0, m);
    leftVectors = sorted;
    if (rank > 0) {
      // Right singular vectors: U_r = A_u' V_r S_r^-1.
      const basisOfRows = new Matrix(k, rank);
      for (const [u, list] of columns) {
        for (let c = 0; c < rank; c++) {
          let sum = 0;
          for (const [i, coefficient] of list) sum += coefficient * sorted.get(i, c);
          basisOfRows.set(u, c, sum / values[c]);
        }
      }
      rowSpace = basisOfRows;
    }
  }

  // B = P A_x, written from A_x's sparse columns.
  const reduced = Matrix.zeros(projector.rows, p);
  problem.balances.forEach((row, i) => {
    for (const [variable, coefficient] of row.terms) {
      const x = measuredIndex.get(variable);
      if (x === undefined) continue;
      for (let q = 0; q < projector.rows; q++) reduced.set(q, x, reduced.get(q, x) + projector.get(q, i) * coefficient);
    }
  });

  const sigma = problem.readings.map((reading) => reading.sigma);
  const scaled = problem.readings.map((reading) => reading.value / reading.sigma);
  // G' = D B' (p x (m - r)), padded to at least as many rows as columns.
  const gRows = Math.max(p, reduced.rows);
  const gT = Matrix.zeros(gRows, reduced.rows);
  for (let q = 0; q < reduced.rows; q++) for (let x = 0; x < p; x++) gT.set(x, q, reduced.get(q, x) * sigma[x]);
  let basis: Matrix | null = null; // p x dof: orthonormal basis of G's row space
  let dof = 0;
  let gSvd: SingularValueDecomposition | null = null;
  if (reduced.rows > 0 && p > 0) {
    gSvd = new SingularValueDecomposition(gT, { autoTranspose: false });
    const largest = Math.max(...gSvd.diagonal, 0);
    dof = gSvd.diagonal.filter((value) => value > RANK_TOLERANCE * Math.max(1, largest) * gRows).length;
    if (dof > 0) basis = gSvd.leftSingularVectors.subMatrix(0, p - 1, 0, dof - 1);
  }

  // The reduced balances' known part P c. With constants the measured flows
  // satisfy G z = -P c (z = x / sigma): z = w - G+ (G w + P c), so each
  // coordinate of the adjustment in G's row space gains (V' P c)_c / s_c.
  const constants = problem.balances.map((row) => row.constant ?? 0);
  const hasConstants = constants.some((value) => value !== 0);
  const reducedConstant = new Array<number>(projector.rows).fill(0);
  if (hasConstants) {
    for (let q = 0; q < projector.rows; q++) {
      let sum = 0;
      for (let i = 0; i < m; i++) sum += projector.get(q, i) * constants[i];
      reducedConstant[q] = sum;
    }
    checkConsistent(reducedConstant, gSvd, dof, problem.balances);
  }

  // Pi w and diag(Pi).
  const coordinates = new Array<number>(dof).fill(0);
  const piDiagonal = new Array<number>(p).fill(0);
  const piW = new Array<number>(p).fill(0);
  if (basis) {
    for (let c = 0; c < dof; c++) {
      let sum = 0;
      for (let x = 0; x < p; x++) sum += basis.get(x, c) * scaled[x];
      if (hasConstants && gSvd) {
        let projected = 0;
        for (let q = 0; q < reducedConstant.length; q++) projected += gSvd.rightSingularVectors.get(q, c) * reducedConstant[q];
        sum += projected / gSvd.diagonal[c];
      }
      coordinates[c] = sum;
    }
    for (let x = 0; x < p; x++) {
      let diagonal = 0;
      let projected = 0;
      for (let c = 0; c < dof; c++) {
        const value = basis.get(x, c);
        diagonal += value * value;
        projected += value * coordinates[c];
      }
      piDiagonal[x] = diagonal;
      piW[x] = projected;
    }
  }
  const globalStatistic = coordinates.reduce((sum, value) => sum + value * value, 0);

  const readings: ReadingResult[] = problem.readings.map((reading, x) => {
    const adjustment = -sigma[x] * piW[x];
    const redundant = piDiagonal[x] > 1e-9;
    const adjustmentSigma = redundant ? sigma[x] * Math.sqrt(piDiagonal[x]) : 0;
    return {
      variable: reading.variable,
      reconciled: reading.value + adjustment,
      sigma: sigma[x] * Math.sqrt(Math.max(0, 1 - piDiagonal[x])),
      adjustment,
      adjustmentSigma,
      redundant,
      statistic: redundant ? Math.abs(adjustment) / adjustmentSigma : null,
    };
  });

  const estimate: (number | null)[] = new Array(n).fill(null);
  const estimateSigma: (number | null)[] = new Array(n).fill(null);
  const observable: boolean[] = new Array(n).fill(false);
  for (const result of readings) {
    estimate[result.variable] = result.reconciled;
    estimateSigma[result.variable] = result.sigma;
    observable[result.variable] = true;
  }

  if (k > 0 && rowSpace && leftVectors) {
    // u = -A_u+ A_x x: with A_u' = U S V', A_u+ = U S^-1 V'. K = U S^-1 V' A_x (k x p).
    const vtAx = Matrix.zeros(rank, p); // V_r' A_x
    problem.balances.forEach((row, i) => {
      for (const [variable, coefficient] of row.terms) {
        const x = measuredIndex.get(variable);
        if (x === undefined) continue;
        for (let c = 0; c < rank; c++) vtAx.set(c, x, vtAx.get(c, x) + leftVectors.get(i, c) * coefficient);
      }
    });
    for (let c = 0; c < rank; c++) {
      const inverse = 1 / values[c];
      for (let x = 0; x < p; x++) vtAx.set(c, x, vtAx.get(c, x) * inverse * sigma[x]); // S^-1 V' A_x D
    }
    const reconciledScaled = readings.map((result, x) => result.reconciled / sigma[x]);
    const vtRows = vtAx.to2DArray();
    // S^-1 V_r' c: the constants' share of u = -A_u+ (A_x x + c).
    const vtc = new Array<number>(rank).fill(0);
    if (hasConstants) {
      for (let c = 0; c < rank; c++) {
        let sum = 0;
        for (let i = 0; i < m; i++) sum += leftVectors.get(i, c) * constants[i];
        vtc[c] = sum / values[c];
      }
    }
    const gainRow = new Float64Array(p); // (K D)_u, only for observable u
    for (let u = 0; u < k; u++) {
      let inRowSpace = 0;
      for (let c = 0; c < rank; c++) inRowSpace += rowSpace.get(u, c) ** 2;
      const variable = unmeasured[u];
      if (inRowSpace < 1 - 1e-8) continue;
      observable[variable] = true;
      gainRow.fill(0);
      for (let c = 0; c < rank; c++) {
        const weight = rowSpace.get(u, c);
        if (weight === 0) continue;
        const row = vtRows[c];
        for (let x = 0; x < p; x++) gainRow[x] += weight * row[x];
      }
      let value = 0;
      for (let c = 0; c < rank; c++) value -= rowSpace.get(u, c) * vtc[c];
      let total = 0;
      for (let x = 0; x < p; x++) {
        value -= gainRow[x] * reconciledScaled[x];
        total += gainRow[x] ** 2;
      }
      // var = |(K D)_u|^2 - |(K D)_u Basis|^2: cov of the reconciled readings is D (I - Pi) D.
      let projected = 0;
      if (basis) {
        for (let c = 0; c < dof; c++) {
          let dot = 0;
          for (let x = 0; x < p; x++) dot += gainRow[x] * basis.get(x, c);
          projected += dot * dot;
        }
      }
      estimate[variable] = value;
      estimateSigma[variable] = Math.sqrt(Math.max(0, total - projected));
    }
  }

  return { estimate, sigma: estimateSigma, observable, readings, globalStatistic, dof };
}

/** Thrown when balances with constants cannot all hold whatever the readings (the constants contradict each other). */
export class InconsistentBalancesError extends Error {}

/**
 * P c must lie in G's column space: otherwise no choice of the measured flows
 * closes the balances (for instance two heat losses on one closed loop).
 */
function checkConsistent(reducedConstant: readonly number[], svd: SingularValueDecomposition | null, dof: number, balances: readonly BalanceRow[]): void {
  // The part of P c outside the span of G's first dof left vectors (V's columns), as a vector: no cancellation of squares.
  const outside = [...reducedConstant];
  if (svd) {
    for (let c = 0; c < dof; c++) {
      let projected = 0;
      for (let q = 0; q < reducedConstant.length; q++) projected += svd.rightSingularVectors.get(q, c) * reducedConstant[q];
      for (let q = 0; q < outside.length; q++) outside[q] -= svd.rightSingularVectors.get(q, c) * projected;
    }
  }
  const scale = Math.max(1, ...balances.map((row) => Math.abs(row.constant ?? 0)));
  if (Math.hypot(...outside) > 1e-8 * scale) {
    throw new InconsistentBalancesError(`the balances' known terms contradict each other (${balances.filter((row) => (row.constant ?? 0) !== 0).map((row) => row.name).join(', ')}): no set of flows closes them`);
  }
}
