// A steam header: the balance node itself, its vent and, when its temperature
// is controlled, the spray water that holds it there.
import { term } from '../../lp/index.js';
import type { Header } from '../../model/index.js';
import type { BuildContext } from '../context.js';
import type { UnitContribution, UnitReport } from '../contribution.js';
import { ATMOSPHERE } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import type { Variable } from '../../lp/index.js';

export class HeaderContribution implements UnitContribution {
  readonly kind = 'header';
  private vent: Variable | null = null;
  private spray: Variable | null = null;

  constructor(private readonly header: Header) {}

  get id(): string {
    return this.header.id;
  }

  build(context: BuildContext): void {
    const header = this.header;
    const controlled = header.state.kind === 'controlled';
    // A floating header's enthalpy is set by mixing. From the second pass it is
    // a variable of the pass: its move, within the trust radius the loop gives,
    // and an energy row with every stream's m h linearised about the point.
    const radius = controlled ? undefined : context.trust.get(header.id);
    if (radius !== undefined) context.headerMoves.set(header.id, context.variable(`${header.id}.move`, { lower: -radius, upper: radius }));
    context.node({ id: header.id, energyRow: controlled || radius !== undefined, heatLoss: header.heatLoss });
    const h = context.h(header.id);
    const dh = context.headerMove(header.id);
    if (header.venting) {
      this.vent = context.variable(`${header.id}.vent`);
      context.stream({ from: header.id, to: ATMOSPHERE, kind: 'vent', flow: term(this.vent), h, dh, p: header.pressure });
    } else {
      this.vent = null;
    }
    if (controlled) {
      // Steam arriving hotter than the set point is cooled with feedwater.
      this.spray = context.variable(`${header.id}.spray`);
      const deaerator = context.plant.deaerator;
      context.stream({ from: 'deaerator', to: header.id, kind: 'spray', flow: term(this.spray), h: deaerator.feedwaterH, p: deaerator.pressure });
    } else {
      this.spray = null;
    }
  }

  report(solution: PassSolution): UnitReport {
    const vent = solution.value(this.vent);
    return {
      id: this.header.id,
      kind: this.kind,
      values: { vent_kg_s: this.vent ? vent : null, spray_kg_s: this.spray ? solution.value(this.spray) : null },
      binding: [],
    };
  }
}
