// A flash tank: hot liquid let down to its pressure splits into saturated
// vapour and liquid. The split follows the mixed inlet enthalpy of the pass.
// With a makeup preheater, the liquid on its way to drain warms the makeup
// water: heat into the deaerator with the makeup, at most what cools the
// liquid to the exchanger's leaving temperature and at most what warms the
// makeup to the liquid's temperature (a bypass takes the rest).
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { FlashTank } from '../../model/index.js';
import { saturatedLiquid, saturatedVapour } from '../../properties/index.js';
import type { BuildContext } from '../context.js';
import type { PointChange, UnitContribution, UnitReport } from '../contribution.js';
import { ATMOSPHERE, MAKEUP, type Stream } from '../network.js';
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
  private makeupHeat: Variable | null = null;
  private liquidH = 0;

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
    this.liquidH = outH;
    const liquidStream: Stream = { from: tank.id, to: liquidNode(tank.liquidTo), kind: 'flashLiquid', flow: term(this.liquid), h: outH, p: tank.pressure };
    this.makeupHeat = null;
    if (tank.makeupPreheater && tank.liquidTo.kind === 'drain') {
      const heat = context.variable(`${tank.id}.makeup_heat`);
      this.makeupHeat = heat;
      // The liquid gives up at most down to the leaving temperature ...
      context.row(tank.id, `${tank.id}.preheater.liquid`, expr().add(heat, 1).add(this.liquid, -Math.max(0, outH - tank.makeupPreheater.leavingH)), '<=', 0);
      // ... and the makeup takes at most up to the liquid's temperature (a guard: the
      // makeup replaces at least the liquid drained, so the first limit binds first).
      const makeup = expr();
      for (const stream of context.streamsOutOf(MAKEUP)) if (stream.to === 'deaerator') makeup.addExpression(stream.flow);
      const makeupH = context.plant.site.makeupWater.h;
      context.row(tank.id, `${tank.id}.preheater.makeup`, expr().add(heat, 1).addExpression(makeup, -Math.max(0, outH - makeupH)), '<=', 0);
      liquidStream.energy = expr().add(this.liquid, outH).add(heat, -1);
      // Heat alone, no mass: the makeup's warming, into the deaerator's energy row.
      context.stream({ from: tank.id, to: 'deaerator', kind: 'makeupHeat', flow: expr(), h: makeupH, p: context.plant.site.atmosphericPressure, energy: term(heat) });
    }
    context.stream(liquidStream);
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

  /** The liquid's enthalpy leaving the preheater, to drain, kJ/kg. */
  private leavingH(solution: PassSolution): number {
    const liquid = solution.value(this.liquid);
    return liquid > 1e-12 ? this.liquidH - solution.value(this.makeupHeat) / liquid : this.liquidH;
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
        ...(this.makeupHeat ? { makeup_heat_kW: solution.value(this.makeupHeat), liquid_leaving_h_kJ_kg: this.leavingH(solution) } : {}),
      },
      binding: [],
    };
  }
}
