// When a case cannot be met: re-solve with penalised slack on every balance and
// name the headers that are short or cannot shed steam, and by how much.
import type { SolveOptions, SolverBackend } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { formatQuantity } from '../units/index.js';
import { buildPass, ENERGY_ROW_SCALE } from './buildPass.js';
import type { UnitContribution } from './contribution.js';
import { passSolution } from './passSolution.js';

export interface Shortfall {
  node: string;
  quantity: 'mass' | 'energy' | 'power';
  /** positive: the node is short by this much (kg/s, or kW of heat or power); negative: it has this much it cannot get rid of */
  amount: number;
}

export interface Diagnosis {
  shortfalls: Shortfall[];
  /** limits the relaxed solution sits at, by unit */
  binding: { id: string; limits: string[] }[];
  summary: string;
}

export async function diagnose(
  plant: Plant,
  contributions: readonly UnitContribution[],
  headerEnthalpy: ReadonlyMap<string, number>,
  objective: Objective,
  backend: SolverBackend,
  options: SolveOptions,
): Promise<Diagnosis> {
  const pass = buildPass(plant, contributions, headerEnthalpy, objective, true);
  const result = await backend.solve(pass.context.model, options);
  if (!result.hasSolution) {
    return { shortfalls: [], binding: [], summary: `the case cannot be met, and even with every balance relaxed the solver ended "${result.status}"; check the equipment limits for contradictions (a minimum above a maximum).` };
  }
  const solution = passSolution(result);
  const shortfalls: Shortfall[] = [];
  for (const slack of pass.slacks) {
    // Energy slack is in MW, like the energy rows; shortfalls are reported in kW.
    const scale = slack.quantity === 'energy' ? 1 / ENERGY_ROW_SCALE : 1;
    const amount = (solution.value(slack.short) - solution.value(slack.surplus)) * scale;
    if (Math.abs(amount) > 1e-6) shortfalls.push({ node: slack.node, quantity: slack.quantity, amount });
  }
  const binding = contributions
    .map((unit) => ({ id: unit.id, limits: unit.report(solution).binding }))
    .filter((entry) => entry.limits.length > 0);
  const phrases = shortfalls.map((item) => {
    const unit = item.quantity === 'mass' ? 'kg/s' : 'kW';
    const size = Math.abs(item.amount);
    const figure = size >= 100 ? Math.round(size).toLocaleString('en-US') : size.toPrecision(3);
    // In a US-units case the diagnosis speaks klb/h and MMBtu/h, as the rest of the output.
    const us = plant.site.unitSystem === 'us';
    const shown =
      item.quantity === 'mass'
        ? us ? formatQuantity(size, 'massFlow', 'us') : `${size.toPrecision(3)} ${unit} (${(size * 3.6).toPrecision(3)} t/h)`
        : item.quantity === 'energy' && us ? formatQuantity(size, 'power', 'us', { unit: 'MMBtu/h' }) : `${figure} ${unit}`;
    const what = item.quantity === 'mass' ? 'steam or water' : item.quantity === 'energy' ? 'heat' : 'electricity';
    if (item.amount > 0) return `${item.node} is short of ${shown} of ${what}`;
    return item.quantity === 'mass' ? `${item.node} has ${shown} it cannot send anywhere` : `${item.node} has ${shown} of surplus ${what} it cannot shed`;
  });
  const limits = binding.map((entry) => `${entry.id} ${entry.limits.join(', ')}`);
  const summary =
    phrases.length > 0
      ? `the case cannot be met: ${phrases.join('; ')}.${limits.length > 0 ? ` Limits reached: ${limits.join('; ')}.` : ''}`
      : 'the case cannot be met, but no single balance is short; check the equipment limits for contradictions.';
  return { shortfalls, binding, summary };
}
