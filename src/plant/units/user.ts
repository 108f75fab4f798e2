// A process user: steam by flow or by heat duty, with its condensate return.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { SteamUser } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { PointChange, UnitContribution, UnitReport } from '../contribution.js';
import { DRAIN } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { liquidNode } from './steamRaising.js';

export class UserContribution implements UnitContribution {
  readonly kind = 'user';
  /** steam flow at the pass's header enthalpy, kg/s */
  private flow = 0;
  private headerH = 0;
  /** the header's duty scale when this user's flow rides on it */
  private scale: Variable | null = null;

  constructor(private readonly user: SteamUser) {}

  get id(): string {
    return this.user.id;
  }

  build(context: BuildContext): void {
    const user = this.user;
    this.headerH = context.h(user.header);
    this.flow = this.steamFlow(this.headerH);
    const pressure = context.pressure(user.header);
    const condensate = user.condensate;
    this.scale = user.demand.kind === 'duty' ? (context.dutyScale.get(user.header) ?? null) : null;
    // Flows are constants, or the point flow times the header's duty scale.
    const flowOf = (share: number): LinearExpression => (this.scale ? term(this.scale, this.flow * share) : expr().addConstant(this.flow * share));
    const process = flowOf(1);
    // On a floating header a duty user takes its duty plus its condensate's enthalpy.
    const energy = this.scale && user.demand.kind === 'duty' ? expr().addConstant(user.demand.heat).addExpression(process, condensate.h) : undefined;
    context.stream({ from: user.header, to: user.id, kind: 'process', flow: process, h: this.headerH, p: pressure, ...(energy ? { energy } : {}) });
    if (condensate.returnFraction > 0) {
      context.stream({ from: user.id, to: liquidNode(condensate.to), kind: 'condensate', flow: flowOf(condensate.returnFraction), h: condensate.h, p: pressure });
    }
    if (condensate.returnFraction < 1) {
      context.stream({ from: user.id, to: DRAIN, kind: 'condensate', flow: flowOf(1 - condensate.returnFraction), h: condensate.h, p: pressure });
    }
  }

  /** Steam flow in the solution, kg/s. */
  private solvedFlow(solution: PassSolution): number {
    return this.scale ? this.flow * solution.value(this.scale) : this.flow;
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

  update(solution: PassSolution, headerEnthalpy: (id: string) => number): PointChange[] {
    if (this.user.demand.kind === 'flow') return [];
    return [{ what: `${this.user.id}.steam`, change: Math.abs(this.steamFlow(headerEnthalpy(this.user.header)) - this.solvedFlow(solution)), unit: 'kg/s' }];
  }

  report(solution: PassSolution): UnitReport {
    const condensate = this.user.condensate;
    const flow = this.solvedFlow(solution);
    return {
      id: this.user.id,
      kind: this.kind,
      values: {
        steam_kg_s: flow,
        heat_kW: flow * (this.headerH - condensate.h),
        condensate_returned_kg_s: flow * condensate.returnFraction,
        condensate_lost_kg_s: flow * (1 - condensate.returnFraction),
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
