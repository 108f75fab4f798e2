// The deaerator: heats and strips makeup and returned condensate with steam,
// delivers saturated feedwater, and vents a small share to atmosphere.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { Deaerator } from '../../model/index.js';
import { saturatedVapour } from '../../properties/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
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
  private pumpShaft: LinearExpression = expr();

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
    // Vent: a fixed share of the feedwater leaving, as saturated vapour.
    this.feedwater = expr();
    for (const stream of context.streamsOutOf('deaerator')) this.feedwater.addExpression(stream.flow);
    const vent = expr().addExpression(this.feedwater, deaerator.ventFraction).add(this.excessVent, 1);
    context.stream({ from: 'deaerator', to: ATMOSPHERE, kind: 'vent', flow: vent, h: saturatedVapour(deaerator.pressure).h, p: deaerator.pressure });

    // Feedwater pumps: motors and turbine drives share the pumping power.
    this.pumpShaft = context.pumpShaft.clone();
    const drive = expr();
    this.motors = [];
    for (const pump of deaerator.feedwaterPumps) {
      if (pump.motor) {
        const variable = context.variable(`${pump.id}.motor`);
        drive.add(variable, 1);
        context.electricLoad.add(variable, 1 / pump.motor.efficiency);
        this.motors.push({ id: pump.id, variable, efficiency: pump.motor.efficiency });
      }
      const turbine = context.shaftSupply.get(pump.id);
      if (turbine) drive.addExpression(turbine);
    }
    if (deaerator.feedwaterPumps.length === 0) {
      // No pumps described: their work is still done, and counted as electricity.
      context.electricLoad.addExpression(this.pumpShaft);
      return;
    }
    context.row('deaerator', 'feedwater.pumping', drive.addExpression(this.pumpShaft, -1), '=', 0);
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
        pump_shaft_kW: solution.evaluate(this.pumpShaft),
        pump_motor_kW: this.motors.reduce((total, motor) => total + solution.value(motor.variable) / motor.efficiency, 0),
        pump_motor_shaft_kW: this.motors.reduce((total, motor) => total + solution.value(motor.variable), 0),
      },
      binding: excess > 1e-7 ? ['venting above its design share: the returns bring more heat than the feedwater can take'] : [],
    };
  }
}
