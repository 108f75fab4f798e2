// The deaerator: heats and strips makeup and returned condensate with steam,
// delivers saturated feedwater, and vents a small share to atmosphere.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { Deaerator, Plant } from '../../model/index.js';
import { saturatedVapour } from '../../properties/index.js';
import type { BuildContext } from '../context.js';
import type { PointChange, UnitContribution, UnitReport } from '../contribution.js';
import { meanPumpEfficiency, pumpLiftName } from '../feedwater.js';
import { ATMOSPHERE, MAKEUP } from '../network.js';
import type { PassSolution } from '../passSolution.js';

export class DeaeratorContribution implements UnitContribution {
  readonly kind = 'deaerator';
  readonly id = 'deaerator';
  private steam!: Variable;
  private makeup!: Variable;
  private excessVent!: Variable;
  private feedwater: LinearExpression = expr();
  private motors: { id: string; variable: Variable; efficiency: number }[] = [];
  private pumps: { id: string; lift: Variable; efficiency: number; motor: Variable | null }[] = [];
  private pumpLift: LinearExpression = expr();
  private pumpShaft: LinearExpression = expr();
  private usedEfficiency = 1;
  private largestLift = 0;
  private plant!: Plant;

  constructor(private readonly deaerator: Deaerator) {}

  build(context: BuildContext): void {
    const deaerator = this.deaerator;
    const plant = context.plant;
    context.node({ id: 'deaerator', energyRow: true, heatLoss: 0 });
    this.steam = context.variable('deaerator.steam');
    this.makeup = context.variable('deaerator.makeup');
    // Returns hotter than the deaerator's saturation flash inside it: what the
    // feedwater cannot absorb leaves through the vent, above its design share.
    this.excessVent = context.variable('deaerator.excess_vent');
    context.stream({ from: deaerator.heatingSteam, to: 'deaerator', kind: 'heatingSteam', flow: term(this.steam), h: context.h(deaerator.heatingSteam), dh: context.headerMove(deaerator.heatingSteam), p: context.pressure(deaerator.heatingSteam) });
    context.stream({ from: MAKEUP, to: 'deaerator', kind: 'makeup', flow: term(this.makeup), h: plant.site.makeupWater.h, p: plant.site.atmosphericPressure });
  }

  finish(context: BuildContext): void {
    const deaerator = this.deaerator;
    this.plant = context.plant;
    this.pumpShaft = context.pumpShaft;
    // Vent: a fixed share of the feedwater leaving, as saturated vapour.
    this.feedwater = expr();
    for (const stream of context.streamsOutOf('deaerator')) this.feedwater.addExpression(stream.flow);
    const vent = expr().addExpression(this.feedwater, deaerator.ventFraction).add(this.excessVent, 1);
    context.stream({ from: 'deaerator', to: ATMOSPHERE, kind: 'vent', flow: vent, h: saturatedVapour(deaerator.pressure).h, p: deaerator.pressure });

    // Feedwater pumps share the lift as the optimiser chooses; each pump's
    // shaft power is its share over its own efficiency, from its motor or turbine.
    this.pumpLift = context.pumpLift.clone();
    this.usedEfficiency = context.pumpEfficiency;
    this.largestLift = context.largestLift;
    this.motors = [];
    this.pumps = [];
    if (deaerator.feedwaterPumps.length === 0) {
      // No pumps described: their work is still done, at 100 %, and counted as electricity.
      context.pumpShaft.addExpression(this.pumpLift);
      context.electricLoad.addExpression(this.pumpLift);
      return;
    }
    const shares = expr();
    for (const pump of deaerator.feedwaterPumps) {
      const lift = context.variable(pumpLiftName(pump.id));
      shares.add(lift, 1);
      context.pumpShaft.add(lift, 1 / pump.pumpEfficiency);
      const drive = expr().add(lift, -1 / pump.pumpEfficiency);
      let motor: Variable | null = null;
      if (pump.motor) {
        motor = context.variable(`${pump.id}.motor`);
        drive.add(motor, 1);
        context.electricLoad.add(motor, 1 / pump.motor.efficiency);
        this.motors.push({ id: pump.id, variable: motor, efficiency: pump.motor.efficiency });
      }
      const turbine = context.shaftSupply.get(pump.id);
      if (turbine) drive.addExpression(turbine);
      context.row(pump.id, `${pump.id}.drive`, drive, '=', 0);
      this.pumps.push({ id: pump.id, lift, efficiency: pump.pumpEfficiency, motor });
    }
    context.row('deaerator', 'feedwater.pumping', shares.addExpression(this.pumpLift, -1), '=', 0);
  }

  /**
   * The feedwater's enthalpy assumed the pumps' mean efficiency at the pass's
   * point; the solved split may differ. Reports how far the largest lift's
   * shaft work per kg moved, so the loop settles it with the other points.
   */
  update(solution: PassSolution): PointChange[] {
    if (this.pumps.length === 0 || this.largestLift === 0) return [];
    const values = new Map(this.pumps.map((pump) => [pumpLiftName(pump.id), solution.value(pump.lift)]));
    const solved = meanPumpEfficiency(this.plant, values);
    const change = Math.abs(this.largestLift / solved - this.largestLift / this.usedEfficiency);
    return [{ what: 'feedwater pumps.h', change, unit: 'kJ/kg' }];
  }

  report(solution: PassSolution): UnitReport {
    const feedwater = solution.evaluate(this.feedwater);
    const excess = solution.value(this.excessVent);
    return {
      id: this.id,
      kind: this.kind,
      values: {
        heating_steam_kg_s: solution.value(this.steam),
        makeup_kg_s: solution.value(this.makeup),
        feedwater_kg_s: feedwater,
        vent_kg_s: feedwater * this.deaerator.ventFraction + excess,
        excess_vent_kg_s: excess,
        pump_lift_kW: solution.evaluate(this.pumpLift),
        pump_shaft_kW: solution.evaluate(this.pumpShaft),
        pump_mean_efficiency: this.usedEfficiency,
        pump_motor_kW: this.motors.reduce((total, motor) => total + solution.value(motor.variable) / motor.efficiency, 0),
        pump_motor_shaft_kW: this.motors.reduce((total, motor) => total + solution.value(motor.variable), 0),
        // Each pump's shaft power and the part of it its motor gives, kW.
        ...Object.fromEntries(this.pumps.flatMap((pump) => [
          [`pump_shaft_kW:${pump.id}`, solution.value(pump.lift) / pump.efficiency],
          [`pump_motor_shaft_kW:${pump.id}`, pump.motor ? solution.value(pump.motor) : 0],
        ])),
      },
      binding: excess > 1e-7 ? ['venting above its design share: the returns bring more heat than the feedwater can take'] : [],
    };
  }
}
