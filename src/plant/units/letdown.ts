// A letdown (pressure-reducing) station, with or without a desuperheater.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { Letdown } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import { MAKEUP } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { sprayWaterRatio } from '../physics/desuperheater.js';

export class LetdownContribution implements UnitContribution {
  readonly kind = 'letdown';
  private flow!: Variable;
  private sprayPerKg = 0;
  private inletH = 0;
  private outletH = 0;
  private waterH = 0;
  /** spray water, kg/s */
  private spray: LinearExpression = expr();

  constructor(private readonly letdown: Letdown) {}

  get id(): string {
    return this.letdown.id;
  }

  build(context: BuildContext): void {
    const letdown = this.letdown;
    this.flow = context.variable(`${letdown.id}.steam`, { upper: letdown.capacity });
    // Throttling is isenthalpic: the valve's outlet has the inlet's enthalpy,
    // and moves with it.
    this.inletH = context.h(letdown.from);
    const inletMove = context.headerMove(letdown.from);
    this.outletH = this.inletH;
    let outletMove = inletMove;
    this.sprayPerKg = 0;
    this.spray = expr();
    const desuperheater = letdown.desuperheater;
    const deaerator = context.plant.deaerator;
    if (desuperheater) {
      this.waterH = desuperheater.water === 'feedwater' ? deaerator.feedwaterH : context.plant.site.makeupWater.h;
      this.sprayPerKg = sprayWaterRatio(this.inletH, desuperheater.targetH, this.waterH);
      if (this.sprayPerKg > 0) {
        // Spray m (h_in - h_t) / (h_t - h_w): bilinear where the inlet floats,
        // so taken to first order about the point flow.
        this.outletH = desuperheater.targetH;
        outletMove = expr();
        this.spray = term(this.flow, this.sprayPerKg).addExpression(inletMove, context.pointValue(term(this.flow)) / (desuperheater.targetH - this.waterH));
      }
    }
    const toPressure = context.pressure(letdown.to);
    context.stream({ from: letdown.from, to: letdown.id, kind: 'letdown', flow: term(this.flow), h: this.inletH, dh: inletMove, p: context.pressure(letdown.from) });
    context.stream({ from: letdown.id, to: letdown.to, kind: 'letdown', flow: term(this.flow).addExpression(this.spray), h: this.outletH, dh: outletMove, p: toPressure });
    if (this.sprayPerKg > 0 && desuperheater) {
      const source = desuperheater.water === 'feedwater' ? 'deaerator' : MAKEUP;
      const sourcePressure = desuperheater.water === 'feedwater' ? deaerator.pressure : context.plant.site.atmosphericPressure;
      context.stream({ from: source, to: letdown.id, kind: 'spray', flow: this.spray.clone(), h: this.waterH, p: sourcePressure });
    }
  }

  report(solution: PassSolution): UnitReport {
    const flow = solution.value(this.flow);
    const atCapacity = Math.abs(flow - this.letdown.capacity) < 1e-7 * Math.max(1, this.letdown.capacity);
    return {
      id: this.letdown.id,
      kind: this.kind,
      values: {
        steam_kg_s: flow,
        spray_kg_s: solution.evaluate(this.spray),
        outlet_kg_s: flow + solution.evaluate(this.spray),
        inlet_h_kJ_kg: this.inletH,
        outlet_h_kJ_kg: this.outletH,
        spray_h_kJ_kg: this.sprayPerKg > 0 ? this.waterH : null,
      },
      binding: atCapacity ? ['at capacity'] : [],
    };
  }
}
