// Small LPs with published optima, shared by the backend tests. Each names its
// source; all were transcribed from memory of the books, and each optimum is
// re-derived in a comment by checking the optimal point's binding rows.
import { LinearModel, expr } from '../../src/lp/index.js';

export interface TextbookCase {
  readonly title: string;
  readonly source: string;
  readonly build: () => LinearModel;
  readonly objective: number;
  readonly point: Readonly<Record<string, number>>;
  /** Published shadow prices, where the source gives them. */
  readonly shadowPrices?: Readonly<Record<string, number>>;
}

/**
 * Wyndor Glass Co.: Hillier & Lieberman, Introduction to Operations Research
 * (9th ed., sec. 3.1; shadow prices sec. 4.7), from memory:
 * maximise Z = 3 x1 + 5 x2, x1 <= 4, 2 x2 <= 12, 3 x1 + 2 x2 <= 18.
 * Z* = 36 at (2, 6); shadow prices y1 = 0, y2 = 3/2, y3 = 1.
 */
export function wyndor(): LinearModel {
  const model = new LinearModel('wyndor');
  const x1 = model.addVariable('x1');
  const x2 = model.addVariable('x2');
  model.addRow('plant1', expr().add(x1), '<=', 4);
  model.addRow('plant2', expr().add(x2, 2), '<=', 12);
  model.addRow('plant3', expr().add(x1, 3).add(x2, 2), '<=', 18);
  model.setObjective('maximize', expr().add(x1, 3).add(x2, 5));
  return model;
}

/**
 * Radiation therapy design: Hillier & Lieberman, Introduction to Operations
 * Research (9th ed., sec. 3.4), from memory: minimise 0.4 x1 + 0.5 x2,
 * 0.3 x1 + 0.1 x2 <= 2.7, 0.5 x1 + 0.5 x2 = 6, 0.6 x1 + 0.4 x2 >= 6.
 * Optimum 5.25 at (7.5, 4.5): rows 1 and 2 bind (2.25 + 0.45 = 2.7, 3.75 + 2.25 = 6).
 */
export function radiationTherapy(): LinearModel {
  const model = new LinearModel('radiation');
  const x1 = model.addVariable('beam1');
  const x2 = model.addVariable('beam2');
  model.addRow('healthy.anatomy', expr().add(x1, 0.3).add(x2, 0.1), '<=', 2.7);
  model.addRow('tumour.region', expr().add(x1, 0.5).add(x2, 0.5), '=', 6);
  model.addRow('center.of.tumour', expr().add(x1, 0.6).add(x2, 0.4), '>=', 6);
  model.setObjective('minimize', expr().add(x1, 0.4).add(x2, 0.5));
  return model;
}

/**
 * Chvátal, Linear Programming (1983), ch. 2 opening example, also Vanderbei,
 * Linear Programming: Foundations and Extensions, sec. 2.1; from memory:
 * maximise 5 x1 + 4 x2 + 3 x3, 2 x1 + 3 x2 + x3 <= 5, 4 x1 + x2 + 2 x3 <= 11,
 * 3 x1 + 4 x2 + 2 x3 <= 8. z* = 13 at (2, 0, 1): rows 1 and 3 bind.
 */
export function chvatalChapter2(): LinearModel {
  const model = new LinearModel('chvatal2');
  const x = [1, 2, 3].map((index) => model.addVariable(`x${index}`));
  model.addRow('r1', expr().add(x[0], 2).add(x[1], 3).add(x[2], 1), '<=', 5);
  model.addRow('r2', expr().add(x[0], 4).add(x[1], 1).add(x[2], 2), '<=', 11);
  model.addRow('r3', expr().add(x[0], 3).add(x[1], 4).add(x[2], 2), '<=', 8);
  model.setObjective('maximize', expr().add(x[0], 5).add(x[1], 4).add(x[2], 3));
  return model;
}

/**
 * Vanderbei, Linear Programming: Foundations and Extensions, sec. 2.2
 * (initialisation example), from memory: maximise -2 x1 - x2,
 * -x1 + x2 <= -1, -x1 - 2 x2 <= -2, x2 <= 1. Optimum -3 at (4/3, 1/3):
 * the first two rows bind.
 */
export function vanderbeiInitialisation(): LinearModel {
  const model = new LinearModel('vanderbei2.2');
  const x1 = model.addVariable('x1');
  const x2 = model.addVariable('x2');
  model.addRow('r1', expr().add(x1, -1).add(x2, 1), '<=', -1);
  model.addRow('r2', expr().add(x1, -1).add(x2, -2), '<=', -2);
  model.addRow('r3', expr().add(x2, 1), '<=', 1);
  model.setObjective('maximize', expr().add(x1, -2).add(x2, -1));
  return model;
}

/**
 * Beale's cycling example (E. M. L. Beale, 1955), as given in Chvátal,
 * Linear Programming, ch. 3, from memory: a degenerate LP on which the
 * textbook largest-coefficient rule cycles. Minimise
 * -3/4 x4 + 20 x5 - 1/2 x6 + 6 x7, 1/4 x4 - 8 x5 - x6 + 9 x7 <= 0,
 * 1/2 x4 - 12 x5 - 1/2 x6 + 3 x7 <= 0, x6 <= 1. Optimum -5/4 at x4 = 1, x6 = 1.
 */
export function bealeCycling(): LinearModel {
  const model = new LinearModel('beale');
  const x4 = model.addVariable('x4');
  const x5 = model.addVariable('x5');
  const x6 = model.addVariable('x6');
  const x7 = model.addVariable('x7');
  model.addRow('r1', expr().add(x4, 0.25).add(x5, -8).add(x6, -1).add(x7, 9), '<=', 0);
  model.addRow('r2', expr().add(x4, 0.5).add(x5, -12).add(x6, -0.5).add(x7, 3), '<=', 0);
  model.addRow('r3', expr().add(x6, 1), '<=', 1);
  model.setObjective('minimize', expr().add(x4, -0.75).add(x5, 20).add(x6, -0.5).add(x7, 6));
  return model;
}

/** Wyndor with Z >= 50 added: no feasible point, as Hillier & Lieberman sec. 3.2 shows (from memory). */
export function wyndorInfeasible(): LinearModel {
  const model = wyndor();
  model.addRow('profit.floor', expr().add(model.variable('x1'), 3).add(model.variable('x2'), 5), '>=', 50);
  return model;
}

/** Wyndor with only x1 <= 4 kept: Z grows without bound in x2 (Hillier & Lieberman sec. 3.2, from memory). */
export function wyndorUnbounded(): LinearModel {
  const model = new LinearModel('wyndor.unbounded');
  const x1 = model.addVariable('x1');
  const x2 = model.addVariable('x2');
  model.addRow('plant1', expr().add(x1), '<=', 4);
  model.setObjective('maximize', expr().add(x1, 3).add(x2, 5));
  return model;
}

export const textbookCases: readonly TextbookCase[] = [
  {
    title: 'Wyndor Glass',
    source: 'Hillier & Lieberman, Introduction to Operations Research, 9th ed., sec. 3.1 (from memory)',
    build: wyndor,
    objective: 36,
    point: { x1: 2, x2: 6 },
    shadowPrices: { plant1: 0, plant2: 1.5, plant3: 1 },
  },
  {
    title: 'radiation therapy',
    source: 'Hillier & Lieberman, Introduction to Operations Research, 9th ed., sec. 3.4 (from memory)',
    build: radiationTherapy,
    objective: 5.25,
    point: { beam1: 7.5, beam2: 4.5 },
  },
  {
    title: 'Chvátal ch. 2',
    source: 'Chvátal, Linear Programming (1983), ch. 2; Vanderbei sec. 2.1 (from memory)',
    build: chvatalChapter2,
    objective: 13,
    point: { x1: 2, x2: 0, x3: 1 },
  },
  {
    title: 'Vanderbei initialisation',
    source: 'Vanderbei, Linear Programming: Foundations and Extensions, sec. 2.2 (from memory)',
    build: vanderbeiInitialisation,
    objective: -3,
    point: { x1: 4 / 3, x2: 1 / 3 },
  },
  {
    title: 'Beale cycling (degenerate)',
    source: 'Beale (1955) as in Chvátal, Linear Programming, ch. 3 (from memory)',
    build: bealeCycling,
    objective: -1.25,
    point: { x4: 1, x5: 0, x6: 1, x7: 0 },
  },
];
