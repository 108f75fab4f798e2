// A letdown (pressure-reducing) station, with or without a desuperheater.
import { term, type Variable } from '../../lp/index.js';
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

  constructor(private readonly letdown: Letdown) {}

  get id(): string {
    return this.letdown.id;
  }

  build(context: BuildContext): void {
    const letdown = this.letdown;
    this.flow = context.variable(`${letdown.id}.steam`, { upper: letdown.capacity });
    // Throttling is isenthalpic: the valve's outlet has the inlet's enthalpy.
    this.inletH = context.h(letdown.from);
    this.outletH = this.inletH;
    this.sprayPerKg = 0;
    const desuperheater = letdown.desuperheater;
    const deaerator = context.plant.deaerator;
    if (desuperheater) {
      this.waterH = desuperheater.water === 'feedwater' ? deaerator.feedwaterH : context.plant.site.makeupWater.h;
      this.sprayPerKg = sprayWaterRatio(this.inletH, desuperheater.targetH, this.waterH);
      if (this.sprayPerKg > 0) this.outletH = desuperheater.targetH;
    }
    const toPressure = context.pressure(letdown.to);
    context.stream({ from: letdown.from, to: letdown.id, kind: 'letdown', flow: term(this.flow), h: this.inletH, p: context.pressure(letdown.from) });
    context.stream({ from: letdown.id, to: letdown.to, kind: 'letdown', flow: term(this.flow, 1 + this.sprayPerKg), h: this.outletH, p: toPressure });
    if (this.sprayPerKg > 0 && desuperheater) {
      const source = desuperheater.water === 'feedwater' ? 'deaerator' : MAKEUP;
      const sourcePressure = desuperheater.water === 'feedwater' ? deaerator.pressure : context.plant.site.atmosphericPressure;
      context.stream({ from: source, to: letdown.id, kind: 'spray', flow: term(this.flow, this.sprayPerKg), h: this.waterH, p: sourcePressure });
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
        spray_kg_s: flow * this.sprayPerKg,
        outlet_kg_s: flow * (1 + this.sprayPerKg),
        inlet_h_kJ_kg: this.inletH,
        outlet_h_kJ_kg: this.outletH,
        spray_h_kJ_kg: this.sprayPerKg > 0 ? this.waterH : null,
      },
      binding: atCapacity ? ['at capacity'] : [],
    };
  }
}
