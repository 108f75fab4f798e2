// One pass of the successive linearisation: with every property point fixed,
// the plant becomes a linear model.
import { expr, term, type LinearExpression } from '../lp/index.js';
import type { Objective, Plant } from '../model/index.js';
import { BuildContext, GJ_PER_KWH, T_PER_H_PER_KG_S, type BalanceSlack, type CostComponent, type PassPoint } from './context.js';
import type { UnitContribution } from './contribution.js';
import { MAKEUP, PROCESS, type Stream } from './network.js';

/**
 * Penalty of balance slack when diagnosing a case that cannot be met: per kg/s
 * for mass, per MW for heat (energy rows are in MW), per kW for power. A kg/s of
 * steam carries some 2.5 MW, so heat and power slack cost less per unit of
 * steam, and the diagnosis does not trade a missing tonne of steam for a few kW
 * of pumping power.
 */
export const SLACK_PENALTY = { mass: 1e7, energy: 1e7, power: 1e4 } as const;

export type { BalanceSlack };

export interface Pass {
  context: BuildContext;
  slacks: BalanceSlack[];
  /** the objective's components, for totals */
  costs: Map<CostComponent, LinearExpression>;
}

export function massRowName(node: string): string {
  return `${node}.mass`;
}

/**
 * Energy rows are written in MW (kW x this scale): their coefficients are then
 * enthalpies in MJ/kg, of the order of the mass rows' ones, which keeps both
 * solvers well conditioned. A dual of an energy row is per MW.
 */
export const ENERGY_ROW_SCALE = 1e-3;

export function energyRowName(node: string): string {
  return `${node}.energy`;
}

export interface BuildOptions {
  /** slack on every balance, for diagnosing a case that cannot be met */
  withSlack?: boolean;
  /** integer variables held at these values, by name */
  fixedIntegers?: ReadonlyMap<string, number> | null;
  /** steam drawn from headers beyond their users' demand, kg/s, by header (variables `<id>.extra_draw` held there): the probe for marginal values */
  extraDemand?: ReadonlyMap<string, number>;
  /** a unit whose limits are lifted (its inequalities dropped, its bounds widened), when diagnosing */
  relaxUnit?: string;
}

export function buildPass(plant: Plant, contributions: readonly UnitContribution[], point: PassPoint, objective: Objective, options: BuildOptions = {}): Pass {
  const withSlack = options.withSlack ?? false;
  const context = new BuildContext(plant, point, withSlack, options.fixedIntegers ?? null, options.relaxUnit ?? null);
  for (const unit of contributions) unit.build(context);
  for (const [header, flow] of options.extraDemand ?? []) {
    // A variable held at the draw, so that a solver session can move it without a rebuild.
    const draw = context.variable(`${header}.extra_draw`, { lower: flow, upper: flow });
    context.stream({ from: header, to: PROCESS, kind: 'process', flow: term(draw), h: context.h(header), dh: context.headerMove(header), p: context.pressure(header) });
  }
  for (const unit of contributions) unit.finish?.(context);

  // Makeup water is bought wherever it is used.
  const makeup = expr();
  for (const stream of context.streamsOutOf(MAKEUP)) makeup.addExpression(stream.flow);
  context.cost.set('water', expr().addExpression(makeup, T_PER_H_PER_KG_S * plant.site.makeupWater.cost));

  // Carbon is priced on every tonne emitted.
  if (plant.site.carbonPrice > 0) context.addCost('carbon', expr().addExpression(context.co2, plant.site.carbonPrice / 1000));

  for (const node of context.nodes.values()) {
    const mass = expr();
    const energy = expr();
    for (const stream of context.streamsInto(node.id)) {
      mass.addExpression(stream.flow);
      energy.addExpression(streamEnergy(context, stream));
    }
    for (const stream of context.streamsOutOf(node.id)) {
      mass.addExpression(stream.flow, -1);
      energy.addExpression(streamEnergy(context, stream), -1);
    }
    energy.addConstant(-node.heatLoss);
    const energyMW = expr().addExpression(energy, ENERGY_ROW_SCALE);
    context.relax(massRowName(node.id), node.id, 'mass', mass);
    context.model.addRow(massRowName(node.id), mass, '=', 0);
    if (node.energyRow) {
      context.relax(energyRowName(node.id), node.id, 'energy', energyMW);
      context.model.addRow(energyRowName(node.id), energyMW, '=', 0);
    }
  }

  const goal = objectiveExpression(context, objective);
  const slacks = context.slacks;
  if (withSlack) {
    for (const slack of slacks) {
      const penalty = SLACK_PENALTY[slack.quantity] * goal.sign;
      goal.expression.add(slack.short, penalty).add(slack.surplus, penalty);
    }
  }
  context.model.setObjective(goal.sense, goal.expression);
  return { context, slacks, costs: context.cost };
}

/**
 * The energy a stream carries into a node's row, kW: its own expression where it
 * has one, else m h, plus m0 dh where its enthalpy moves with the pass (the
 * first-order expansion of m (h + dh) about the point flow m0).
 */
function streamEnergy(context: BuildContext, stream: Stream): LinearExpression {
  if (stream.energy) return stream.energy;
  const energy = expr().addExpression(stream.flow, stream.h);
  if (stream.dh && stream.dh.terms.size > 0) energy.addExpression(stream.dh, context.pointValue(stream.flow));
  return energy;
}

/** Total cost per hour over every component. */
export function totalCost(context: BuildContext): LinearExpression {
  const total = expr();
  for (const component of context.cost.values()) total.addExpression(component);
  return total;
}

function objectiveExpression(context: BuildContext, objective: Objective): { sense: 'minimize' | 'maximize'; sign: 1 | -1; expression: LinearExpression } {
  const cost = totalCost(context);
  // A tiny cost term breaks ties among the many optima of the physical objectives.
  const tieBreak = 1e-6;
  if (objective === 'minimumCost') return { sense: 'minimize', sign: 1, expression: cost };
  if (objective === 'minimumFuel') {
    const fuel = expr();
    for (const fired of context.fuel.values()) fuel.addExpression(fired, GJ_PER_KWH);
    return { sense: 'minimize', sign: 1, expression: fuel.addExpression(cost, tieBreak) };
  }
  if (objective === 'minimumCo2') return { sense: 'minimize', sign: 1, expression: context.co2.clone().addExpression(cost, tieBreak) };
  return { sense: 'maximize', sign: -1, expression: context.generation.clone().addExpression(cost, -tieBreak) };
}
