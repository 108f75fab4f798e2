// A group of steam traps from a survey: those failed open blow a fixed flow
// of header steam (Napier's relation, worked out by the resolver) into the
// condensate system, where it is lost: made up again as fresh water.
import { expr, type LinearExpression } from '../../lp/index.js';
import type { TrapGroup } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import { DRAIN } from '../network.js';
import type { PassSolution } from '../passSolution.js';

export class TrapGroupContribution implements UnitContribution {
  readonly kind = 'trapGroup';
  private loss: LinearExpression = expr();

  constructor(private readonly group: TrapGroup) {}

  get id(): string {
    return this.group.id;
  }

  build(context: BuildContext): void {
    const group = this.group;
    if (!(group.loss > 0)) return;
    this.loss = expr().addConstant(group.loss);
    const h = context.h(group.header);
    const p = context.pressure(group.header);
    context.stream({ from: group.header, to: group.id, kind: 'trapLoss', flow: this.loss.clone(), h, dh: context.headerMove(group.header), p });
    context.stream({ from: group.id, to: DRAIN, kind: 'trapLoss', flow: this.loss.clone(), h, dh: context.headerMove(group.header), p });
  }

  report(solution: PassSolution): UnitReport {
    return {
      id: this.group.id,
      kind: this.kind,
      values: { installed: this.group.installed, failed_open: this.group.failedOpen, steam_lost_kg_s: solution.evaluate(this.loss) },
      binding: [],
    };
  }
}
