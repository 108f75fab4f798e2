// The builder's workspace for one pass: the linear model being written, the
// streams, the site power balance and the cost, fuel and CO2 ledgers.
import { LinearModel, expr, term, type LinearExpression, type Variable, type VariableOptions } from '../lp/index.js';
import type { Plant } from '../model/index.js';
import type { BalanceNode, Stream } from './network.js';
import { meanPumpEfficiency } from './feedwater.js';

/** The point a pass linearises about. */
export interface PassPoint {
  /** every header's enthalpy, kJ/kg */
  headerEnthalpy: ReadonlyMap<string, number>;
  /** variable values of the previous pass, by name; null for a first pass */
  previous: ReadonlyMap<string, number> | null;
  /** largest move of each floating header's enthalpy in the pass, kJ/kg */
  trust: ReadonlyMap<string, number>;
}

export type CostComponent = 'fuel' | 'power' | 'steam' | 'water' | 'carbon';

/** GJ per hour in one kW sustained for an hour. */
export const GJ_PER_KWH = 0.0036;
/** tonnes per hour in one kg/s. */
export const T_PER_H_PER_KG_S = 3.6;

/** Slack on one balance row, present only when diagnosing a case that cannot be met. */
export interface BalanceSlack {
  row: string;
  node: string;
  quantity: 'mass' | 'energy' | 'power';
  /** supplied from nowhere: the node is short */
  short: Variable;
  /** taken to nowhere: the node has a surplus it cannot shed */
  surplus: Variable;
}

export class BuildContext {
  /** slack variables added by `relax`, when diagnosing */
  readonly slacks: BalanceSlack[] = [];
  readonly model: LinearModel;
  readonly streams: Stream[] = [];
  readonly nodes = new Map<string, BalanceNode>();
  /** currency per hour, by component */
  readonly cost = new Map<CostComponent, LinearExpression>();
  /** fuel fired, kW, by fuel id */
  readonly fuel = new Map<string, LinearExpression>();
  /** CO2 emitted, kg/h */
  readonly co2 = expr();
  /** electricity made on site, kW */
  readonly generation = expr();
  /** electricity used by modelled motors and pumps, kW (site demand is added by the builder) */
  readonly electricLoad = expr();
  /** feedwater pumps' ideal lift power v dp m, kW, declared by every unit fed from the deaerator */
  readonly pumpLift = expr();
  /** feedwater pumps' shaft power, kW: each pump's share of the lift over its own efficiency (set by the deaerator) */
  readonly pumpShaft = expr();
  /** the pumps' mean efficiency this pass's feedwater enthalpies assume (lift / shaft at the point) */
  readonly pumpEfficiency: number;
  /** the largest lift per kg of feedwater in this pass, kJ/kg */
  largestLift = 0;
  /** shaft power supplied to a driven machine or pump by turbines, kW, by machine id */
  readonly shaftSupply = new Map<string, LinearExpression>();
  /**
   * The move of each linearised floating header's enthalpy in this pass,
   * kJ/kg, bounded by its trust radius (see `PassPoint`).
   */
  readonly headerMoves = new Map<string, Variable>();
  /** rows named per unit, so reports can find a unit's limits */
  readonly unitRows = new Map<string, string[]>();

  /** enthalpy of each header for this pass, kJ/kg (a copy: the loop moves its own points on) */
  readonly headerEnthalpy: ReadonlyMap<string, number>;

  /** variable values of the pass this one linearises about, by name; null for a first pass */
  readonly previous: ReadonlyMap<string, number> | null;
  /** largest move of each floating header's enthalpy in this pass, kJ/kg */
  readonly trust: ReadonlyMap<string, number>;

  constructor(
    readonly plant: Plant,
    point: PassPoint,
    /** slack on every balance, for diagnosing a case that cannot be met */
    readonly withSlack: boolean,
    /** integer variables held at these values (by name): the pass is then a linear program */
    readonly fixedIntegers: ReadonlyMap<string, number> | null = null,
    /** a unit whose limits are lifted, when diagnosing: does relaxing them help? */
    readonly relaxedUnit: string | null = null,
  ) {
    this.model = new LinearModel(plant.name);
    this.headerEnthalpy = new Map(point.headerEnthalpy);
    this.previous = point.previous;
    this.trust = point.trust;
    this.pumpEfficiency = meanPumpEfficiency(plant, point.previous);
  }

  /**
   * Whether a floating header's enthalpy is a variable of this pass: from the
   * second pass on, once flows through it are known to linearise about.
   */
  linearises(headerId: string): boolean {
    return this.headerMoves.has(headerId);
  }

  /** The move of a header's enthalpy in this pass: its variable, or nothing where the enthalpy is fixed. */
  headerMove(headerId: string): LinearExpression {
    const move = this.headerMoves.get(headerId);
    return move ? term(move) : expr();
  }

  /** An expression's value at the point the pass linearises about (0 on a first pass). */
  pointValue(expression: LinearExpression): number {
    const previous = this.previous;
    if (!previous) return 0;
    return expression.evaluate((variable) => previous.get(variable.name) ?? 0);
  }

  variable(name: string, options: VariableOptions = {}): Variable {
    if (this.relaxes(name)) return this.model.addVariable(name, relaxedBounds(options));
    const fixed = options.type && options.type !== 'continuous' ? this.fixedIntegers?.get(name) : undefined;
    if (fixed !== undefined) return this.model.addVariable(name, { lower: fixed, upper: fixed, type: 'continuous' });
    return this.model.addVariable(name, options);
  }

  /** A binary, or the constant 1 when the unit may not switch off. */
  onOff(name: string, canSwitchOff: boolean): Variable | null {
    return canSwitchOff ? this.variable(name, { type: 'binary' }) : null;
  }

  row(owner: string, name: string, expression: LinearExpression, sense: '<=' | '>=' | '=', rhs: number): void {
    // A relaxed unit keeps its equations (its physics) and loses its inequalities (its limits).
    if (owner === this.relaxedUnit && sense !== '=') return;
    this.model.addRow(name, expression, sense, rhs);
    const rows = this.unitRows.get(owner) ?? [];
    rows.push(name);
    this.unitRows.set(owner, rows);
  }

  /** Whether a variable belongs to the relaxed unit: every unit names its variables `<id>.<what>`. */
  private relaxes(name: string): boolean {
    return this.relaxedUnit !== null && name.startsWith(`${this.relaxedUnit}.`);
  }

  /** When diagnosing, lets a balance row be missed at a penalty: adds short - surplus to it. */
  relax(row: string, node: string, quantity: BalanceSlack['quantity'], balance: LinearExpression): void {
    if (!this.withSlack) return;
    const short = this.variable(`${node}.${quantity}.short`);
    const surplus = this.variable(`${node}.${quantity}.surplus`);
    balance.add(short, 1).add(surplus, -1);
    this.slacks.push({ row, node, quantity, short, surplus });
  }

  h(headerId: string): number {
    const value = this.headerEnthalpy.get(headerId);
    if (value === undefined) throw new Error(`no enthalpy for header "${headerId}". The builder must set every header's point first.`);
    return value;
  }

  pressure(headerId: string): number {
    const header = this.plant.headers.find((candidate) => candidate.id === headerId);
    if (!header) throw new Error(`unknown header "${headerId}". The loader should have caught this reference.`);
    return header.pressure;
  }

  stream(stream: Stream): Stream {
    this.streams.push(stream);
    return stream;
  }

  node(node: BalanceNode): void {
    if (this.nodes.has(node.id)) throw new Error(`balance node "${node.id}" declared twice.`);
    this.nodes.set(node.id, node);
  }

  supplyShaft(machineId: string, kW: LinearExpression): void {
    const ledger = this.shaftSupply.get(machineId) ?? expr();
    ledger.addExpression(kW);
    this.shaftSupply.set(machineId, ledger);
  }

  /** Streams entering or leaving a node, as declared so far. */
  streamsInto(id: string): Stream[] {
    return this.streams.filter((stream) => stream.to === id);
  }

  streamsOutOf(id: string): Stream[] {
    return this.streams.filter((stream) => stream.from === id);
  }

  addCost(component: CostComponent, perHour: LinearExpression): void {
    const ledger = this.cost.get(component) ?? expr();
    ledger.addExpression(perHour);
    this.cost.set(component, ledger);
  }

  /** Fuel fired, kW of the fuel's heating value; its cost and CO2 follow from the fuel. Returns its cost per hour. */
  addFuel(fuelId: string, firedKW: LinearExpression): LinearExpression {
    const fuel = this.plant.fuels.find((candidate) => candidate.id === fuelId);
    if (!fuel) throw new Error(`unknown fuel "${fuelId}". The loader should have caught this reference.`);
    const ledger = this.fuel.get(fuelId) ?? expr();
    ledger.addExpression(firedKW);
    this.fuel.set(fuelId, ledger);
    const cost = expr().addExpression(firedKW, GJ_PER_KWH * fuel.price);
    this.addCost('fuel', cost);
    this.co2.addExpression(firedKW, GJ_PER_KWH * fuel.co2);
    return cost;
  }
}

/**
 * A relaxed unit's variable: continuous, down to zero, and with its upper
 * bound lifted well past its limit (an on/off may lie anywhere in [0, 1]).
 * Lifted to a finite bound, not removed, so that a relaxed model stays bounded
 * where the case leaves some profitable flow open.
 */
function relaxedBounds(options: VariableOptions): VariableOptions {
  const lower = Math.min(0, options.lower ?? 0);
  if (options.type === 'binary' || options.type === 'integer') return { lower, upper: options.type === 'binary' ? 1 : (options.upper ?? Infinity), type: 'continuous' };
  const upper = options.upper ?? Infinity;
  return { lower, upper: Number.isFinite(upper) ? 2 * Math.abs(upper) + RELAXED_HEADROOM : upper };
}

/** Headroom added to a relaxed upper bound, in the variable's own unit (kg/s, kW). */
const RELAXED_HEADROOM = 100;
