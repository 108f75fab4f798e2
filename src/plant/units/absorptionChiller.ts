// A chilled-water plant with absorption capacity: absorption cooling q (a
// variable up to the capacity) takes steam m = q / (COP (h - h_c)) from its
// header; the electric chillers make the rest of the demand at their kW per
// kW of cooling. The optimiser chooses the split.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { AbsorptionChiller } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import { DRAIN } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { liquidNode } from './steamRaising.js';
import { PlantPhysicsError } from './user.js';

export class AbsorptionChillerContribution implements UnitContribution {
  readonly kind = 'absorptionChiller';
  private absorption!: Variable;
  private steam: LinearExpression = expr();
  private headerH = 0;

  constructor(private readonly chiller: AbsorptionChiller) {}

  get id(): string {
    return this.chiller.id;
  }

  build(context: BuildContext): void {
    const chiller = this.chiller;
    const condensate = chiller.condensate;
    this.headerH = context.h(chiller.header);
    const drop = this.headerH - condensate.h;
    if (!(drop > 0)) {
      throw new PlantPhysicsError(`absorption chiller ${chiller.id}: steam at ${this.headerH.toFixed(1)} kJ/kg cannot heat its generator down to condensate at ${condensate.h.toFixed(1)} kJ/kg. Lower the condensate temperature.`);
    }
    this.absorption = context.variable(`${chiller.id}.absorption`, { upper: Math.min(chiller.capacity, chiller.cooling) });
    // m = q / (COP (h - h_c)): bilinear in q and the header's move, so taken
    // to first order about the last pass's q0, as a duty user's flow is. The
    // heat it brings, q / COP, is exact in the energy row.
    const perKW = 1 / (chiller.cop * drop);
    const q0 = context.pointValue(term(this.absorption));
    this.steam = term(this.absorption, perKW);
    if (context.linearises(chiller.header)) this.steam.addExpression(context.headerMove(chiller.header), -q0 * perKW / drop);
    const energy = term(this.absorption, 1 / chiller.cop).addExpression(this.steam, condensate.h);
    const pressure = context.pressure(chiller.header);
    context.stream({ from: chiller.header, to: chiller.id, kind: 'process', flow: this.steam, h: this.headerH, p: pressure, energy });
    if (condensate.returnFraction > 0) {
      context.stream({ from: chiller.id, to: liquidNode(condensate.to), kind: 'condensate', flow: expr().addExpression(this.steam, condensate.returnFraction), h: condensate.h, p: pressure });
    }
    if (condensate.returnFraction < 1) {
      context.stream({ from: chiller.id, to: DRAIN, kind: 'condensate', flow: expr().addExpression(this.steam, 1 - condensate.returnFraction), h: condensate.h, p: pressure });
    }
    // Electric chillers make cooling - q at their kW per kW.
    context.electricLoad.addConstant(chiller.cooling * chiller.electricPerCooling).add(this.absorption, -chiller.electricPerCooling);
  }

  report(solution: PassSolution): UnitReport {
    const chiller = this.chiller;
    const absorption = solution.value(this.absorption);
    const steam = solution.evaluate(this.steam);
    const capacity = Math.min(chiller.capacity, chiller.cooling);
    const binding = capacity > 0 && absorption >= capacity * (1 - 1e-7) ? [chiller.capacity < chiller.cooling ? 'absorption at capacity' : 'absorption meets the whole demand'] : [];
    return {
      id: chiller.id,
      kind: this.kind,
      values: {
        cooling_kW: chiller.cooling,
        absorption_cooling_kW: absorption,
        electric_cooling_kW: chiller.cooling - absorption,
        electric_chiller_kW: (chiller.cooling - absorption) * chiller.electricPerCooling,
        steam_kg_s: steam,
        steam_heat_kW: absorption / chiller.cop,
        condensate_returned_kg_s: steam * chiller.condensate.returnFraction,
        condensate_lost_kg_s: steam * (1 - chiller.condensate.returnFraction),
      },
      binding,
    };
  }
}
