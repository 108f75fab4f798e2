// A fired boiler: steam between its limits, fuel from its efficiency curve,
// optionally switched off.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { FiredBoiler } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import type { PassSolution } from '../passSolution.js';
import type { Stream } from '../network.js';
import { efficiencyAt, fuelCurve } from '../pieces.js';
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
  private steamStream: Stream | null = null;

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
    // A curve that is not convex needs binaries, but only where its slope falls
    // (a concave kink): between such kinks the pieces are convex and a
    // cost-minimising solve fills them in order by itself. Each group of pieces
    // has one gate; a group opens only when every piece before it is full.
    let gate: Variable | null = this.on;
    let groupStart = 1;
    const slopes = curve.steam.map((_, k) => (k === 0 ? 0 : (curve.fuel[k] - curve.fuel[k - 1]) / (curve.steam[k] - curve.steam[k - 1])));
    const segments: Variable[] = [];
    for (let k = 1; k < curve.steam.length; k += 1) {
      const width = curve.steam[k] - curve.steam[k - 1];
      const segment = context.variable(`${id}.load${k}`, { upper: width });
      segments.push(segment);
      steam.add(segment, 1);
      fuel.add(segment, slopes[k]);
      if (curve.convex) {
        // A stopped boiler makes nothing: every segment closes with it.
        if (this.on) context.row(id, `${id}.load${k}.on`, expr().add(segment, 1).add(this.on, -width), '<=', 0);
        continue;
      }
      const concaveKink = k > 1 && slopes[k] < slopes[k - 1] - 1e-12 * Math.abs(slopes[k - 1]);
      if (k === 1 || concaveKink) {
        const next = context.variable(`${id}.load${k}.gate`, { type: 'binary' });
        if (gate) context.row(id, `${id}.load${k}.order`, expr().add(next, 1).add(gate, -1), '<=', 0);
        // Every piece of the group before must be full for this group to open.
        for (let j = groupStart; j < k; j += 1) {
          const previousWidth = curve.steam[j] - curve.steam[j - 1];
          context.row(id, `${id}.load${j}.full${k}`, expr().add(segments[j - 1], 1).add(next, -previousWidth), '>=', 0);
        }
        gate = next;
        groupStart = k;
      }
      context.row(id, `${id}.load${k}.fill`, expr().add(segment, 1).add(gate!, -width), '<=', 0);
    }
    this.fuel = fuel;
    declareSteamRaising(context, id, boiler.header, steam, boiler.outlet, probe, boiler.blowdownTo);
    this.steamStream = context.streams.find((stream) => stream.from === id && stream.kind === 'steam') ?? null;

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

  /**
   * Fuel for a steam flow, running: steam x heat per kg (steam and its share
   * of blowdown raised from feedwater, at this pass's states) over the
   * efficiency the case's table gives at that load (outside the table, its
   * end value). The model's own curve is this one's chords, within
   * FUEL_CURVE_ACCURACY.
   */
  fuelOfSteam(): { stream: Stream; fuel: (steam: number) => number } {
    if (!this.steamStream) throw new Error(`boiler ${this.boiler.id} has no steam stream to read its fuel against`);
    const { efficiency, steam } = this.boiler;
    const heatPerKg = this.heatPerKg;
    return { stream: this.steamStream, fuel: (flow) => (flow * heatPerKg) / efficiencyAt(efficiency, flow / steam.max) };
  }

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
