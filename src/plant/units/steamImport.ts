// Steam bought from a neighbour, priced per tonne.
import { term, type Variable } from '../../lp/index.js';
import type { SteamImport } from '../../model/index.js';
import { T_PER_H_PER_KG_S, type BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import type { PassSolution } from '../passSolution.js';

export class SteamImportContribution implements UnitContribution {
  readonly kind = 'steamImport';
  private flow!: Variable;

  constructor(private readonly supply: SteamImport) {}

  get id(): string {
    return this.supply.id;
  }

  build(context: BuildContext): void {
    const supply = this.supply;
    this.flow = context.variable(`${supply.id}.steam`, { lower: supply.flow.min, upper: supply.flow.max });
    context.stream({ from: supply.id, to: supply.header, kind: 'steam', flow: term(this.flow), h: supply.delivered.h, p: context.pressure(supply.header) });
    context.addCost('steam', term(this.flow, T_PER_H_PER_KG_S * supply.price));
  }

  report(solution: PassSolution): UnitReport {
    const flow = solution.value(this.flow);
    const atMax = Math.abs(flow - this.supply.flow.max) < 1e-7 * Math.max(1, this.supply.flow.max);
    return {
      id: this.supply.id,
      kind: this.kind,
      values: { steam_kg_s: flow, cost_per_h: flow * T_PER_H_PER_KG_S * this.supply.price },
      binding: [
        ...(atMax && this.supply.flow.max > this.supply.flow.min ? ['at its contract limit'] : []),
        ...(this.supply.flow.min > 0 && Math.abs(flow - this.supply.flow.min) < 1e-7 * Math.max(1, this.supply.flow.min) ? ['at its contract minimum'] : []),
      ],
    };
  }
}
