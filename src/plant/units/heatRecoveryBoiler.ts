// A waste-heat boiler: steam raised by heat that would otherwise be lost,
// with optional supplementary (duct) firing.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { HeatRecoveryBoiler } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import type { PassSolution } from '../passSolution.js';
import { declareSteamRaising, steamRaisingPoint } from './steamRaising.js';

export class HeatRecoveryBoilerContribution implements UnitContribution {
  readonly kind = 'heatRecoveryBoiler';
  private unfired!: Variable;
  private fired: Variable | null = null;
  private steam!: LinearExpression;
  private heatPerKg = 0;
  private fuelCost: LinearExpression = expr();

  constructor(private readonly boiler: HeatRecoveryBoiler) {}

  get id(): string {
    return this.boiler.id;
  }

  build(context: BuildContext): void {
    const boiler = this.boiler;
    this.unfired = context.variable(`${boiler.id}.steam`, { lower: boiler.steam.min, upper: boiler.steam.max });
    this.steam = term(this.unfired);
    const point = steamRaisingPoint(context, boiler.header, boiler.outlet, boiler.blowdownFraction);
    this.heatPerKg = point.heatPerKg;
    const firing = boiler.supplementaryFiring;
    if (firing && firing.maxSteam > 0) {
      this.fired = context.variable(`${boiler.id}.fired`, { upper: firing.maxSteam });
      this.steam.add(this.fired, 1);
      this.fuelCost = context.addFuel(firing.fuel, term(this.fired, point.heatPerKg / firing.efficiency));
    } else {
      this.fired = null;
      this.fuelCost = expr();
    }
    declareSteamRaising(context, boiler.id, boiler.header, this.steam, boiler.outlet, point, boiler.blowdownTo);
  }

  report(solution: PassSolution): UnitReport {
    const unfired = solution.value(this.unfired);
    const fired = solution.value(this.fired);
    const firing = this.boiler.supplementaryFiring;
    const binding: string[] = [];
    if (this.boiler.steam.max > this.boiler.steam.min && Math.abs(unfired - this.boiler.steam.max) < 1e-7 * Math.max(1, this.boiler.steam.max)) {
      binding.push('at maximum unfired steam');
    }
    // Waste heat the process makes is raised whether the steam plant wants it or not.
    if (this.boiler.steam.min > 0 && Math.abs(unfired - this.boiler.steam.min) < 1e-7 * Math.max(1, this.boiler.steam.min)) {
      binding.push(this.boiler.steam.max > this.boiler.steam.min ? 'at minimum unfired steam' : 'unfired steam fixed by its process');
    }
    if (firing && this.fired && Math.abs(fired - firing.maxSteam) < 1e-7 * Math.max(1, firing.maxSteam)) binding.push('at maximum supplementary firing');
    return {
      id: this.boiler.id,
      kind: this.kind,
      values: {
        steam_kg_s: unfired + fired,
        unfired_steam_kg_s: unfired,
        fired_steam_kg_s: fired,
        waste_heat_kW: unfired * this.heatPerKg,
        fired_heat_kW: fired * this.heatPerKg,
        fuel_kW: firing ? (fired * this.heatPerKg) / firing.efficiency : 0,
        fuel_cost_per_h: solution.evaluate(this.fuelCost),
      },
      binding,
    };
  }
}
