// When a case cannot be met: re-solve with penalised slack on every balance and
// name the headers that are short or cannot shed steam, and by how much, and
// the limits whose relaxation would shrink the shortfall.
import type { SolveOptions, SolverBackend } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { formatQuantity } from '../units/index.js';
import { buildPass, ENERGY_ROW_SCALE, SLACK_PENALTY, type Pass } from './buildPass.js';
import type { PassPoint } from './context.js';
import { integerValues } from './converge.js';
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
  /**
   * Limits the relaxed solution sits at whose relaxation would shrink the
   * shortfall, by unit: a stopped unit only where starting it would help.
   */
  binding: { id: string; limits: string[] }[];
  /** units at a limit that does not matter to the shortfall (lifting it changes nothing) */
  irrelevant: { id: string; limits: string[] }[];
  summary: string;
}

export async function diagnose(
  plant: Plant,
  contributions: readonly UnitContribution[],
  point: PassPoint,
  objective: Objective,
  backend: SolverBackend,
  options: SolveOptions,
): Promise<Diagnosis> {
  const pass = buildPass(plant, contributions, point, objective, { withSlack: true });
  const result = await backend.solve(pass.context.model, options);
  if (!result.hasSolution) {
    return { shortfalls: [], binding: [], irrelevant: [], summary: `the case cannot be met, and even with every balance relaxed the solver ended "${result.status}"; check the equipment limits for contradictions (a minimum above a maximum).` };
  }
  const solution = passSolution(result);
  const shortfalls: Shortfall[] = [];
  for (const slack of pass.slacks) {
    // Energy slack is in MW, like the energy rows; shortfalls are reported in kW.
    const scale = slack.quantity === 'energy' ? 1 / ENERGY_ROW_SCALE : 1;
    const amount = (solution.value(slack.short) - solution.value(slack.surplus)) * scale;
    if (Math.abs(amount) > 1e-6) shortfalls.push({ node: slack.node, quantity: slack.quantity, amount });
  }
  const atLimits = contributions
    .map((unit) => ({ id: unit.id, limits: unit.report(solution).binding }))
    .filter((entry) => entry.limits.length > 0);
  const { binding, irrelevant } = shortfalls.length > 0 ? await limitsThatMatter(pass, result, atLimits, { plant, contributions, point, objective, backend, options }) : { binding: atLimits, irrelevant: [] };
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
  return { shortfalls, binding, irrelevant, summary };
}

interface Rebuild {
  plant: Plant;
  contributions: readonly UnitContribution[];
  point: PassPoint;
  objective: Objective;
  backend: SolverBackend;
  options: SolveOptions;
}

/**
 * Splits the units at a limit into those whose limits matter and those whose
 * do not. With the on/off decisions of the relaxed solution held, the slack
 * model is a linear program; it is solved once as it is and once per unit
 * with that unit's limits lifted (its inequality rows dropped, its bounds
 * widened, its on/off free). A unit matters where lifting its limits lowers
 * the penalised shortfall. Lifting a limit the optimum does not touch cannot
 * change a linear program's optimum, so only units at a limit are tried.
 */
async function limitsThatMatter(
  pass: Pass,
  mip: Awaited<ReturnType<SolverBackend['solve']>>,
  atLimits: { id: string; limits: string[] }[],
  rebuild: Rebuild,
): Promise<{ binding: { id: string; limits: string[] }[]; irrelevant: { id: string; limits: string[] }[] }> {
  const { plant, contributions, point, objective, backend, options } = rebuild;
  const held = integerValues(pass, mip);
  const penaltyOf = async (relaxUnit?: string): Promise<number | null> => {
    const relaxed = buildPass(plant, contributions, point, objective, { withSlack: true, fixedIntegers: held, ...(relaxUnit ? { relaxUnit } : {}) });
    const result = await backend.solve(relaxed.context.model, { ...options, mipDuals: false });
    if (result.status !== 'optimal') return null;
    const solution = passSolution(result);
    return relaxed.slacks.reduce((total, slack) => total + SLACK_PENALTY[slack.quantity] * (solution.value(slack.short) + solution.value(slack.surplus)), 0);
  };
  const base = await penaltyOf();
  // Without a base to compare with, say everything rather than hide a limit.
  if (base === null) return { binding: atLimits, irrelevant: [] };
  const binding: { id: string; limits: string[] }[] = [];
  const irrelevant: { id: string; limits: string[] }[] = [];
  for (const entry of atLimits) {
    const lifted = await penaltyOf(entry.id);
    // A relaxed model the solver cannot settle (unbounded, say) is kept as mattering: never hide a limit on a guess.
    const helps = lifted === null || lifted < base - Math.max(1e-6 * base, 1e-3);
    (helps ? binding : irrelevant).push(entry);
  }
  return { binding, irrelevant };
}
