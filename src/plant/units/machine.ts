// A machine (pump, fan, compressor) with a fixed shaft demand, driven by a
// turbine, by its motor, or by both sharing the load.
import { expr, type Variable } from '../../lp/index.js';
import type { DrivenMachine } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import type { PassSolution } from '../passSolution.js';
import type { LinearExpression } from '../../lp/index.js';

export class MachineContribution implements UnitContribution {
  readonly kind = 'machine';
  private motor: Variable | null = null;
  private turbine: LinearExpression | null = null;

  constructor(private readonly machine: DrivenMachine) {}

  get id(): string {
    return this.machine.id;
  }

  build(): void {}

  finish(context: BuildContext): void {
    const machine = this.machine;
    const drive = expr();
    this.motor = null;
    if (machine.motor) {
      this.motor = context.variable(`${machine.id}.motor`);
      drive.add(this.motor, 1);
      context.electricLoad.add(this.motor, 1 / machine.motor.efficiency);
    }
    this.turbine = context.shaftSupply.get(machine.id) ?? null;
    if (this.turbine) drive.addExpression(this.turbine);
    context.row(machine.id, `${machine.id}.shaft`, drive, '=', machine.shaftPower);
  }

  report(solution: PassSolution): UnitReport {
    const motorShaft = solution.value(this.motor);
    return {
      id: this.machine.id,
      kind: this.kind,
      values: {
        shaft_kW: this.machine.shaftPower,
        turbine_shaft_kW: this.turbine ? solution.evaluate(this.turbine) : 0,
        motor_shaft_kW: motorShaft,
        motor_electric_kW: this.machine.motor ? motorShaft / this.machine.motor.efficiency : 0,
      },
      binding: [],
    };
  }
}
