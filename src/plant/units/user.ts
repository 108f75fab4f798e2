// A process user: steam by flow or by heat duty, with its condensate return.
import { expr, type LinearExpression } from '../../lp/index.js';
import type { SteamUser } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { PointChange, UnitContribution, UnitReport } from '../contribution.js';
import { DRAIN } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { liquidNode } from './steamRaising.js';

export class UserContribution implements UnitContribution {
  readonly kind = 'user';
  private flow = 0;
  private headerH = 0;

  constructor(private readonly user: SteamUser) {}

  get id(): string {
    return this.user.id;
  }

  build(context: BuildContext): void {
    const user = this.user;
    this.headerH = context.h(user.header);
    this.flow = this.steamFlow(this.headerH);
    const pressure = context.pressure(user.header);
    const constant = (value: number): LinearExpression => expr().addConstant(value);
    const condensate = user.condensate;
    context.stream({ from: user.header, to: user.id, kind: 'process', flow: constant(this.flow), h: this.headerH, p: pressure });
    const returned = this.flow * condensate.returnFraction;
    if (returned > 0) {
      context.stream({ from: user.id, to: liquidNode(condensate.to), kind: 'condensate', flow: constant(returned), h: condensate.h, p: pressure });
    }
    if (this.flow - returned > 0) {
      context.stream({ from: user.id, to: DRAIN, kind: 'condensate', flow: constant(this.flow - returned), h: condensate.h, p: pressure });
    }
  }

  /** Steam needed at the header's enthalpy: the flow, or the duty over h_steam - h_condensate. */
  private steamFlow(headerH: number): number {
    const demand = this.user.demand;
    if (demand.kind === 'flow') return demand.massFlow;
    const drop = headerH - this.user.condensate.h;
    if (!(drop > 0)) {
      throw new PlantPhysicsError(
        `user ${this.user.id}: steam at ${headerH.toFixed(1)} kJ/kg cannot deliver heat to condensate at ${this.user.condensate.h.toFixed(1)} kJ/kg. Lower the condensate temperature.`,
      );
    }
    return demand.heat / drop;
  }

  update(_solution: PassSolution, headerEnthalpy: (id: string) => number): PointChange[] {
    if (this.user.demand.kind === 'flow') return [];
    return [{ what: `${this.user.id}.steam`, change: Math.abs(this.steamFlow(headerEnthalpy(this.user.header)) - this.flow), unit: 'kg/s' }];
  }

  report(): UnitReport {
    const condensate = this.user.condensate;
    return {
      id: this.user.id,
      kind: this.kind,
      values: {
        steam_kg_s: this.flow,
        heat_kW: this.flow * (this.headerH - condensate.h),
        condensate_returned_kg_s: this.flow * condensate.returnFraction,
        condensate_lost_kg_s: this.flow * (1 - condensate.returnFraction),
      },
      binding: [],
    };
  }
}

/** A case that loads but whose physics contradict each other; reported to the user, not a bug. */
export class PlantPhysicsError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PlantPhysicsError';
  }
}
