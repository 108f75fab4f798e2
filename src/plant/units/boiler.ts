// A fired boiler: steam between its limits, fuel from its efficiency curve,
// optionally switched off.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { FiredBoiler } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import type { PassSolution } from '../passSolution.js';
import { fuelCurve } from '../pieces.js';
import { declareSteamRaising, steamRaisingPoint } from './steamRaising.js';

export class BoilerContribution implements UnitContribution {
  readonly kind = 'boiler';
  private steam!: LinearExpression;
  private fuel!: LinearExpression;
  private fuelCost: LinearExpression = expr();
  private on: Variable | null = null;
  private fuelShares: { fuel: string; variable: Variable }[] = [];
  private heatPerKg = 0;
  private convex = true;

  constructor(private readonly boiler: FiredBoiler) {}

  get id(): string {
    return this.boiler.id;
  }

  build(context: BuildContext): void {
    const boiler = this.boiler;
    const id = boiler.id;
    this.on = context.onOff(`${id}.on`, boiler.canSwitchOff);
    const steam = expr();
    this.steam = steam;
    const probe = steamRaisingPoint(context, boiler.header, boiler.outlet, boiler.blowdownFraction);
    this.heatPerKg = probe.heatPerKg;
    const curve = fuelCurve(boiler.efficiency, boiler.steam.min, boiler.steam.max, probe.heatPerKg);
    this.convex = curve.convex;

    // steam = s0 u + sum(seg_k), fuel = f0 u + sum(slope_k seg_k), seg_k in [0, width_k]
    const fuel = expr();
    const baseSteam = curve.steam[0];
    const baseFuel = curve.fuel[0];
    if (this.on) {
      steam.add(this.on, baseSteam);
      fuel.add(this.on, baseFuel);
    } else {
      steam.addConstant(baseSteam);
      fuel.addConstant(baseFuel);
    }
    let previousGate: Variable | null = this.on;
    for (let k = 1; k < curve.steam.length; k += 1) {
      const width = curve.steam[k] - curve.steam[k - 1];
      const slope = (curve.fuel[k] - curve.fuel[k - 1]) / width;
      const segment = context.variable(`${id}.load${k}`, { upper: width });
      steam.add(segment, 1);
      fuel.add(segment, slope);
      if (this.on && curve.convex) {
        // A stopped boiler makes nothing: every segment closes with it.
        context.row(id, `${id}.load${k}.on`, expr().add(segment, 1).add(this.on, -width), '<=', 0);
      }
      if (!curve.convex) {
        // Non-convex curve: segments fill in order (incremental formulation, one binary each).
        const gate = context.variable(`${id}.load${k}.gate`, { type: 'binary' });
        context.row(id, `${id}.load${k}.fill`, expr().add(segment, 1).add(gate, -width), '<=', 0);
        if (k > 1) {
          context.row(id, `${id}.load${k - 1}.full`, expr().add(this.lastSegment!, 1).add(gate, -this.lastWidth), '>=', 0);
        }
        if (previousGate) context.row(id, `${id}.load${k}.order`, expr().add(gate, 1).add(previousGate, -1), '<=', 0);
        previousGate = gate;
      }
      this.lastSegment = segment;
      this.lastWidth = width;
    }
    this.fuel = fuel;
    declareSteamRaising(context, id, boiler.header, steam, boiler.outlet, probe, boiler.blowdownTo);

    this.fuelCost = expr();
    if (boiler.fuels.length === 1) {
      this.fuelCost.addExpression(context.addFuel(boiler.fuels[0], fuel));
      this.fuelShares = [];
    } else {
      const split = expr();
      this.fuelShares = boiler.fuels.map((fuelId) => {
        const variable = context.variable(`${id}.fuel.${fuelId}`);
        split.add(variable, 1);
        this.fuelCost.addExpression(context.addFuel(fuelId, term(variable)));
        return { fuel: fuelId, variable };
      });
      context.row(id, `${id}.fuel`, split.addExpression(fuel, -1), '=', 0);
    }
  }

  private lastSegment: Variable | null = null;
  private lastWidth = 0;

  report(solution: PassSolution): UnitReport {
    const steam = solution.evaluate(this.steam);
    const fuel = solution.evaluate(this.fuel);
    const running = this.on ? solution.value(this.on) > 0.5 : true;
    const binding: string[] = [];
    if (running && Math.abs(steam - this.boiler.steam.max) < 1e-7 * Math.max(1, this.boiler.steam.max)) binding.push('at maximum steam');
    if (running && this.boiler.steam.min > 0 && Math.abs(steam - this.boiler.steam.min) < 1e-7 * Math.max(1, this.boiler.steam.max)) binding.push('at minimum steam');
    if (!running) binding.push('switched off');
    return {
      id: this.boiler.id,
      kind: this.kind,
      values: {
        running,
        steam_kg_s: steam,
        load: steam / this.boiler.steam.max,
        fuel_kW: fuel,
        fuel_cost_per_h: solution.evaluate(this.fuelCost),
        heat_absorbed_kW: steam * this.heatPerKg,
        efficiency: fuel > 0 ? (steam * this.heatPerKg) / fuel : null,
        convex_fuel_curve: this.convex,
        ...Object.fromEntries(this.fuelShares.map((share) => [`fuel_${share.fuel}_kW`, solution.value(share.variable)])),
      },
      binding,
    };
  }
}
