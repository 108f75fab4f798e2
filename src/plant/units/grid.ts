// The site's electricity: what is made, used, bought and sold, and the
// take-or-pay shortfall below a minimum billed import.
import { expr, term, type Variable } from '../../lp/index.js';
import type { PowerSupply } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import type { PassSolution } from '../passSolution.js';
import type { LinearExpression } from '../../lp/index.js';

export const SITE_POWER_ROW = 'site.power';

export class GridContribution implements UnitContribution {
  readonly kind = 'grid';
  readonly id = 'grid';
  private bought!: Variable;
  private sold!: Variable;
  private shortfall: Variable | null = null;
  private generation: LinearExpression = expr();
  private load: LinearExpression = expr();

  constructor(private readonly power: PowerSupply) {}

  build(context: BuildContext): void {
    const power = this.power;
    this.bought = context.variable('grid.import', { upper: power.import.max });
    this.sold = context.variable('grid.export', { upper: power.export.max });
    context.addCost('power', expr().add(this.bought, power.import.price).add(this.sold, -power.export.price));
    context.co2.add(this.bought, power.import.co2);
    this.shortfall = null;
    if (power.import.minimumBilled > 0) {
      // shortfall >= minimum billed - import: the unused part of a take-or-pay contract
      this.shortfall = context.variable('grid.shortfall', { upper: power.import.minimumBilled });
      context.row('grid', 'grid.take_or_pay', expr().add(this.shortfall, 1).add(this.bought, 1), '>=', power.import.minimumBilled);
      context.addCost('power', term(this.shortfall, power.import.shortfallPrice));
    }
  }

  finish(context: BuildContext): void {
    this.generation = context.generation.clone();
    this.load = context.electricLoad.clone();
    // made + bought - sold - modelled loads = site demand
    const balance = expr().addExpression(this.generation).add(this.bought, 1).add(this.sold, -1).addExpression(this.load, -1);
    context.relax(SITE_POWER_ROW, 'site power', 'power', balance);
    context.row('grid', SITE_POWER_ROW, balance, '=', this.power.siteDemand);
  }

  report(solution: PassSolution): UnitReport {
    const bought = solution.value(this.bought);
    const sold = solution.value(this.sold);
    const binding: string[] = [];
    if (this.power.import.max > 0 && Math.abs(bought - this.power.import.max) < 1e-6 * this.power.import.max) binding.push('import at its limit');
    if (this.power.export.max > 0 && Math.abs(sold - this.power.export.max) < 1e-6 * this.power.export.max) binding.push('export at its limit');
    const shortfall = solution.value(this.shortfall);
    if (this.shortfall && shortfall > 1e-6 * Math.max(1, this.power.import.minimumBilled)) binding.push(`import below its take-or-pay minimum: ${shortfall.toFixed(0)} kW billed unused`);
    return {
      id: this.id,
      kind: this.kind,
      values: {
        generated_kW: solution.evaluate(this.generation),
        modelled_loads_kW: solution.evaluate(this.load),
        site_demand_kW: this.power.siteDemand,
        import_kW: bought,
        export_kW: sold,
        shortfall_kW: solution.value(this.shortfall),
        marginal_power_value_per_kWh: solution.shadowPrice(SITE_POWER_ROW),
      },
      binding,
    };
  }
}
