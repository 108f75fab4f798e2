// A flash tank: hot liquid let down to its pressure splits into saturated
// vapour and liquid. The split follows the mixed inlet enthalpy of the pass.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { FlashTank } from '../../model/index.js';
import { saturatedLiquid, saturatedVapour } from '../../properties/index.js';
import type { BuildContext } from '../context.js';
import type { PointChange, UnitContribution, UnitReport } from '../contribution.js';
import { ATMOSPHERE, type Stream } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { liquidNode } from './steamRaising.js';

export class FlashTankContribution implements UnitContribution {
  readonly kind = 'flashTank';
  /** mixed enthalpy of everything entering, kJ/kg; null until a pass has flows */
  private inletH: number | null = null;
  private vapour!: Variable;
  private liquid!: Variable;
  private inflow: LinearExpression = expr();
  private inflows: Stream[] = [];
  private fraction = 0;

  constructor(private readonly tank: FlashTank) {}

  get id(): string {
    return this.tank.id;
  }

  build(context: BuildContext): void {
    context.node({ id: this.tank.id, energyRow: false, heatLoss: 0 });
    this.vapour = context.variable(`${this.tank.id}.vapour`);
    this.liquid = context.variable(`${this.tank.id}.liquid`);
  }

  finish(context: BuildContext): void {
    const tank = this.tank;
    this.inflows = context.streamsInto(tank.id);
    this.inflow = expr();
    for (const stream of this.inflows) this.inflow.addExpression(stream.flow);
    if (this.inletH === null) {
      // First pass: no flows yet, so weigh every inlet equally.
      this.inletH = this.inflows.length > 0 ? this.inflows.reduce((total, stream) => total + stream.h, 0) / this.inflows.length : saturatedLiquid(tank.pressure).h;
    }
    const liquidH = saturatedLiquid(tank.pressure).h;
    const vapourH = saturatedVapour(tank.pressure).h;
    this.fraction = Math.min(1, Math.max(0, (this.inletH - liquidH) / (vapourH - liquidH)));
    // vapour = x (sum of inflows): x from the mixed inlet enthalpy, x = (h_mix - h_f) / h_fg
    context.row(tank.id, `${tank.id}.flash`, expr().add(this.vapour, 1).addExpression(this.inflow, -this.fraction), '=', 0);
    const vapourTo = tank.vapourTo.kind === 'header' ? tank.vapourTo.id : ATMOSPHERE;
    context.stream({ from: tank.id, to: vapourTo, kind: 'flashVapour', flow: term(this.vapour), h: vapourH, p: tank.pressure });
    // Liquid below saturation does not flash and leaves at the mixed enthalpy.
    const outH = this.fraction > 0 ? liquidH : this.inletH;
    context.stream({ from: tank.id, to: liquidNode(tank.liquidTo), kind: 'flashLiquid', flow: term(this.liquid), h: outH, p: tank.pressure });
  }

  update(solution: PassSolution): PointChange[] {
    let mass = 0;
    let energy = 0;
    for (const stream of this.inflows) {
      const flow = solution.evaluate(stream.flow);
      mass += flow;
      energy += flow * stream.h;
    }
    if (mass <= 1e-12 || this.inletH === null) return [];
    const next = energy / mass;
    const change = Math.abs(next - this.inletH);
    this.inletH = next;
    return [{ what: `${this.tank.id}.h`, change, unit: 'kJ/kg' }];
  }

  report(solution: PassSolution): UnitReport {
    return {
      id: this.tank.id,
      kind: this.kind,
      values: {
        inflow_kg_s: solution.evaluate(this.inflow),
        vapour_kg_s: solution.value(this.vapour),
        liquid_kg_s: solution.value(this.liquid),
        flash_fraction: this.fraction,
        inlet_h_kJ_kg: this.inletH,
      },
      binding: [],
    };
  }
}
