// Seeded random LPs that are feasible and bounded by construction: a point
// inside the variable boxes is drawn first and every row's bounds are set so
// that it satisfies them; every variable has finite bounds.
import { LinearModel, expr } from '../../src/lp/index.js';
export { seededRandom } from '../../src/seededRandom.js';
import { seededRandom } from '../../src/seededRandom.js';

export function randomFeasibleLp(seed: number): LinearModel {
  const random = seededRandom(seed);
  const pick = (low: number, high: number): number => low + (high - low) * random();
  const whole = (low: number, high: number): number => Math.floor(pick(low, high + 1));
  const columnCount = whole(2, 8);
  const rowCount = whole(1, 7);
  const model = new LinearModel(`random${seed}`);
  const point: number[] = [];
  const variables = Array.from({ length: columnCount }, (_, column) => {
    const lower = random() < 0.3 ? Math.round(pick(-5, 0)) : 0;
    const upper = lower + Math.round(pick(1, 10));
    point.push(pick(lower, upper));
    return model.addVariable(`v${column}`, { lower, upper });
  });
  for (let row = 0; row < rowCount; row++) {
    const expression = expr();
    let activity = 0;
    variables.forEach((variable, column) => {
      if (random() < 0.6) {
        const coefficient = Math.round(pick(-9, 9) * 10) / 10 || 1;
        expression.add(variable, coefficient);
        activity += coefficient * point[column];
      }
    });
    if (expression.terms.size === 0) {
      expression.add(variables[0], 1);
      activity = point[0];
    }
    const kind = random();
    const slack = pick(0, 5);
    if (kind < 0.4) model.addRow(`r${row}`, expression, '<=', activity + slack);
    else if (kind < 0.7) model.addRow(`r${row}`, expression, '>=', activity - slack);
    else if (kind < 0.85) model.addRow(`r${row}`, expression, '=', activity);
    else model.addRangeRow(`r${row}`, activity - slack, expression, activity + pick(0, 5));
  }
  const objective = expr();
  for (const variable of variables) objective.add(variable, Math.round(pick(-10, 10) * 100) / 100 || 0.5);
  model.setObjective(random() < 0.5 ? 'minimize' : 'maximize', objective);
  return model;
}
