// A process user: steam by flow or by heat duty, with its condensate return.
import { expr, type LinearExpression } from '../../lp/index.js';
import type { SteamUser } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import { DRAIN } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { liquidNode } from './steamRaising.js';

export class UserContribution implements UnitContribution {
  readonly kind = 'user';
  /** steam flow, kg/s: a constant, or linear in the header's move */
  private process: LinearExpression = expr();
  private headerH = 0;
  private headerMove: LinearExpression = expr();

  constructor(private readonly user: SteamUser) {}

  get id(): string {
    return this.user.id;
  }

  build(context: BuildContext): void {
    const user = this.user;
    this.headerH = context.h(user.header);
    this.headerMove = context.headerMove(user.header);
    const pressure = context.pressure(user.header);
    const condensate = user.condensate;
    const demand = user.demand;
    // A duty needs m = Q / (h - h_c) of steam: where the header's enthalpy
    // moves, the flow follows to first order, dm = -Q / (h - h_c)^2 dh.
    const pointFlow = this.steamFlow(this.headerH);
    this.process = expr().addConstant(pointFlow);
    const moves = demand.kind === 'duty' && context.linearises(user.header);
    if (moves) this.process.addExpression(this.headerMove, -demand.heat / (this.headerH - condensate.h) ** 2);
    // Its steam then brings exactly its duty plus its condensate's enthalpy.
    const energy = moves && demand.kind === 'duty' ? expr().addConstant(demand.heat).addExpression(this.process, condensate.h) : undefined;
    context.stream({ from: user.header, to: user.id, kind: 'process', flow: this.process, h: this.headerH, dh: this.headerMove, p: pressure, ...(energy ? { energy } : {}) });
    const flowOf = (share: number): LinearExpression => expr().addExpression(this.process, share);
    if (condensate.returnFraction > 0) {
      context.stream({ from: user.id, to: liquidNode(condensate.to), kind: 'condensate', flow: flowOf(condensate.returnFraction), h: condensate.h, p: pressure });
    }
    if (condensate.returnFraction < 1) {
      context.stream({ from: user.id, to: DRAIN, kind: 'condensate', flow: flowOf(1 - condensate.returnFraction), h: condensate.h, p: pressure });
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

  report(solution: PassSolution): UnitReport {
    const condensate = this.user.condensate;
    const flow = solution.evaluate(this.process);
    const h = this.headerH + solution.evaluate(this.headerMove);
    return {
      id: this.user.id,
      kind: this.kind,
      values: {
        steam_kg_s: flow,
        heat_kW: flow * (h - condensate.h),
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
