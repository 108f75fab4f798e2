// A steam turbine, section by section: flows in series, extraction or exhaust
// to headers, an optional condensing end, power to a generator or a machine.
import { expr, term, type LinearExpression, type Variable } from '../../lp/index.js';
import type { Turbine, TurbineStage } from '../../model/index.js';
import { saturatedLiquid, statePH, statePT } from '../../properties/index.js';
import type { BuildContext } from '../context.js';
import type { PointChange, PowerInFlows, UnitContribution, UnitReport } from '../contribution.js';
import type { Stream } from '../network.js';
import type { PassSolution } from '../passSolution.js';
import { expandIsentropic } from '../physics/turbineStage.js';
import { liquidNode } from './steamRaising.js';
import { PlantPhysicsError } from './user.js';

export class TurbineContribution implements UnitContribution {
  readonly kind = 'turbine';
  private on: Variable | null = null;
  private sections: Variable[] = [];
  private power: LinearExpression = expr();
  private inletH = 0;
  private exhaustH: number[] = [];
  private drops: number[] = [];
  /** d h_k / d h_in of each section's exhaust at the point */
  private exhaustSlope: number[] = [];
  private inletMove: LinearExpression = expr();
  private stagePower: LinearExpression[] = [];
  /** the stream each section's outflow leaves by, as declared this pass */
  private outflows: Stream[] = [];
  /** each Willans point's last move, for damping */
  private readonly lastStep: number[];
  /** enthalpy drop per kg of each Willans section, from the previous pass's flow */
  private readonly willansDrop: (number | null)[];

  constructor(private readonly turbine: Turbine) {
    const overall = turbine.mechanicalEfficiency * turbine.generatorEfficiency;
    this.willansDrop = turbine.stages.map((stage) => (stage.performance.kind === 'willans' ? stage.performance.slope / overall : null));
    this.lastStep = turbine.stages.map(() => 0);
  }

  get id(): string {
    return this.turbine.id;
  }

  private get overallEfficiency(): number {
    return this.turbine.mechanicalEfficiency * this.turbine.generatorEfficiency;
  }

  build(context: BuildContext): void {
    const turbine = this.turbine;
    const id = turbine.id;
    const inletPressure = context.pressure(turbine.inlet);
    this.inletH = context.h(turbine.inlet);
    this.inletMove = context.headerMove(turbine.inlet);
    this.expand(inletPressure, this.inletH);
    // Where the inlet floats, each exhaust moves with it: d h_k / d h_in by a
    // central difference of the same expansion (Willans drops held at the point).
    this.exhaustSlope = this.inletMove.terms.size > 0 ? this.expansionSlopes(inletPressure) : turbine.stages.map(() => 0);

    this.on = context.onOff(`${id}.on`, turbine.canSwitchOff);
    const onTimes = (value: number): LinearExpression => (this.on ? expr().add(this.on, value) : expr().addConstant(value));
    this.sections = turbine.stages.map((stage, k) => context.variable(`${id}.section${k + 1}`, { upper: stage.sectionFlow.max }));

    this.power = expr();
    this.stagePower = [];
    this.outflows = [];
    turbine.stages.forEach((stage, k) => {
      const flow = this.sections[k];
      const next = this.sections[k + 1];
      if (stage.sectionFlow.min > 0) context.row(id, `${id}.section${k + 1}.min`, expr().add(flow, 1).addExpression(onTimes(stage.sectionFlow.min), -1), '>=', 0);
      // outflow at this point = section flow - next section flow
      const outflow = expr().add(flow, 1);
      if (next) outflow.add(next, -1);
      if (Number.isFinite(stage.outflow.max)) context.row(id, `${id}.out${k + 1}.max`, outflow.clone(), '<=', stage.outflow.max);
      context.row(id, `${id}.out${k + 1}.min`, outflow.clone().addExpression(onTimes(stage.outflow.min), -1), '>=', 0);

      const stagePower = expr();
      if (stage.performance.kind === 'willans') {
        // Exactly linear in flow and on/off: no property point.
        stagePower.add(flow, stage.performance.slope).addExpression(onTimes(stage.performance.intercept), -1);
        // Running, it passes at least its no-load flow: below it the line gives negative power.
        if (stage.performance.intercept > 0) context.row(id, `${id}.section${k + 1}.no_load`, stagePower.clone(), '>=', 0);
      } else {
        // m (h_in - h_out) x efficiency, to first order in the inlet's move.
        const slopeIn = k === 0 ? 1 : this.exhaustSlope[k - 1];
        const dropSlope = slopeIn - this.exhaustSlope[k];
        stagePower.add(flow, this.drops[k] * this.overallEfficiency).addExpression(this.inletMove, context.pointValue(term(flow)) * dropSlope * this.overallEfficiency);
      }
      this.stagePower.push(stagePower);
      this.power.addExpression(stagePower);
      this.declareOutflow(context, stage, k, outflow, stagePower);
    });

    const inflow = this.sections[0];
    context.stream({ from: turbine.inlet, to: id, kind: 'steam', flow: expr().add(inflow, 1), h: this.inletH, dh: this.inletMove, p: inletPressure });
    // A stopped turbine passes nothing. With no stated maximum, the steam the whole
    // plant can raise bounds the flow.
    const inletMax = Number.isFinite(turbine.inletFlow.max) ? turbine.inletFlow.max : plantSteamCapacity(context);
    if (this.on || Number.isFinite(inletMax)) context.row(id, `${id}.inlet.max`, expr().add(inflow, 1).addExpression(onTimes(inletMax), -1), '<=', 0);
    if (turbine.inletFlow.min > 0) context.row(id, `${id}.inlet.min`, expr().add(inflow, 1).addExpression(onTimes(turbine.inletFlow.min), -1), '>=', 0);
    if (Number.isFinite(turbine.power.max)) context.row(id, `${id}.power.max`, this.power.clone().addExpression(onTimes(turbine.power.max), -1), '<=', 0);
    if (turbine.power.min > 0) context.row(id, `${id}.power.min`, this.power.clone().addExpression(onTimes(turbine.power.min), -1), '>=', 0);

    if (turbine.drives.kind === 'generator') context.generation.addExpression(this.power);
    else context.supplyShaft(turbine.drives.id, this.power);
  }

  /** Exhaust states of every section for this pass, in series from the inlet. */
  private expand(inletPressure: number, inletH: number): void {
    const { exhaustH, drops } = this.expansion(inletPressure, inletH);
    this.exhaustH = exhaustH;
    this.drops = drops;
  }

  private expansion(inletPressure: number, inletH: number): { exhaustH: number[]; drops: number[] } {
    let state = statePH(inletPressure, inletH);
    const exhaustH: number[] = [];
    const drops: number[] = [];
    this.turbine.stages.forEach((stage, k) => {
      const pressure = stage.exhaust.pressure;
      const performance = stage.performance;
      let h: number;
      if (performance.kind === 'isentropic') h = expandIsentropic(state, pressure, performance.efficiency).exhaust.h;
      else if (performance.kind === 'exhaustEnthalpy') h = performance.h;
      else if (performance.kind === 'exhaustTemperature') h = statePT(pressure, performance.T).h;
      else h = state.h - (this.willansDrop[k] ?? 0);
      if (!(h < state.h)) {
        throw new PlantPhysicsError(
          `turbine ${this.turbine.id} stage ${k + 1}: exhaust enthalpy ${h.toFixed(1)} kJ/kg is not below its inlet's ${state.h.toFixed(1)} kJ/kg, so the stage would make no power. Check its exhaust enthalpy or temperature.`,
        );
      }
      drops.push(state.h - h);
      exhaustH.push(h);
      state = statePH(pressure, h);
    });
    return { exhaustH, drops };
  }

  /** d h_k / d h_in for every section's exhaust, by a central difference of the expansion. */
  private expansionSlopes(inletPressure: number): number[] {
    const step = 0.5;
    const up = this.expansion(inletPressure, this.inletH + step).exhaustH;
    const down = this.expansion(inletPressure, this.inletH - step).exhaustH;
    return up.map((h, k) => (h - down[k]) / (2 * step));
  }

  /**
   * A section's outflow: to a header at its exhaust state, or condensed. A
   * Willans stage that takes the whole remaining flow carries its inflow's
   * energy less the work it did, which is exact; its enthalpy is only reported.
   */
  private declareOutflow(context: BuildContext, stage: TurbineStage, k: number, outflow: LinearExpression, stagePower: LinearExpression): void {
    const id = this.turbine.id;
    const last = k === this.turbine.stages.length - 1;
    if (stage.exhaust.kind === 'header') {
      const dh = expr().addExpression(this.inletMove, this.exhaustSlope[k]);
      const stream = { from: id, to: stage.exhaust.id, kind: last ? ('exhaust' as const) : ('extraction' as const), flow: outflow, h: this.exhaustH[k], dh, p: stage.exhaust.pressure };
      if (last && stage.performance.kind === 'willans') {
        const flow = this.sections[k];
        const inletH = k === 0 ? this.inletH : this.exhaustH[k - 1];
        const inletSlope = k === 0 ? 1 : this.exhaustSlope[k - 1];
        const energy = term(flow, inletH).addExpression(this.inletMove, context.pointValue(term(flow)) * inletSlope).addExpression(stagePower, -1 / this.overallEfficiency);
        this.outflows.push(context.stream({ ...stream, energy }));
      } else {
        this.outflows.push(context.stream(stream));
      }
    } else {
      // The condenser's condensate leaves as saturated liquid, to the deaerator unless the case says otherwise.
      const condensate = saturatedLiquid(stage.exhaust.pressure).h;
      this.outflows.push(context.stream({ from: id, to: liquidNode(stage.exhaust.condensateTo), kind: 'condensate', flow: outflow, h: condensate, p: stage.exhaust.pressure }));
    }
  }

  /**
   * Power, running, in the outflows: section k carries every outflow from k
   * on, so with power = sum a_k section_k - b (a_k the section's kW per kg/s:
   * its drop at this pass's states times the mechanical and generator
   * efficiencies, or a Willans slope; b the Willans intercepts), outflow j's
   * coefficient is a_1 + ... + a_j. On a first pass the inlet does not move,
   * so this is the pass's own power expression rewritten, exactly.
   */
  powerInFlows(): PowerInFlows {
    let perFlow = 0;
    let constant = 0;
    const terms = this.turbine.stages.map((stage, k) => {
      if (stage.performance.kind === 'willans') {
        perFlow += stage.performance.slope;
        constant -= stage.performance.intercept;
      } else {
        perFlow += this.drops[k] * this.overallEfficiency;
      }
      return { stream: this.outflows[k], coefficient: perFlow };
    });
    return { terms, constant };
  }

  /**
   * A Willans stage's drop per kg follows its flow. Where the stage exhausts the
   * whole remaining flow its energy is exact in the rows and the drop is only
   * reported; where later sections follow, the drop is a property point, damped
   * when it turns back so that it cannot flip between two values.
   */
  update(solution: PassSolution): PointChange[] {
    const changes: PointChange[] = [];
    const last = this.turbine.stages.length - 1;
    this.turbine.stages.forEach((stage, k) => {
      if (stage.performance.kind !== 'willans') return;
      const flow = solution.value(this.sections[k]);
      if (flow <= 1e-9) return;
      const drop = solution.evaluate(this.stagePower[k]) / (this.overallEfficiency * flow);
      const previous = this.willansDrop[k] ?? 0;
      if (k === last) {
        this.willansDrop[k] = drop;
        return;
      }
      const step = drop - previous;
      const turnedBack = this.lastStep[k] !== 0 && Math.sign(step) !== Math.sign(this.lastStep[k]);
      const damped = turnedBack ? previous + step / 2 : drop;
      this.lastStep[k] = damped - previous;
      changes.push({ what: `${this.turbine.id}.section${k + 1}.h`, change: Math.abs(damped - previous), unit: 'kJ/kg' });
      this.willansDrop[k] = damped;
    });
    return changes;
  }

  report(solution: PassSolution): UnitReport {
    const turbine = this.turbine;
    const flows = this.sections.map((section) => solution.value(section));
    const power = solution.evaluate(this.power);
    const running = this.on ? solution.value(this.on) > 0.5 : true;
    const move = solution.evaluate(this.inletMove);
    const inletH = this.inletH + move;
    const values: Record<string, number | string | boolean | null> = {
      running,
      // the machine the shaft drives, or null for a generator
      drives_machine: turbine.drives.kind === 'generator' ? null : turbine.drives.id,
      inlet_kg_s: flows[0] ?? 0,
      power_kW: power,
      inlet_h_kJ_kg: inletH,
    };
    // The solved states: each stage's exhaust moved with the inlet, and a
    // Willans stage's drop is its work over its flow.
    let stageInletH = inletH;
    let condenserKW = 0;
    let steamWork = 0;
    turbine.stages.forEach((stage, k) => {
      const outflow = flows[k] - (flows[k + 1] ?? 0);
      const work = solution.evaluate(this.stagePower[k]) / this.overallEfficiency;
      const exhaustH = stage.performance.kind === 'willans' ? (flows[k] > 1e-9 ? stageInletH - work / flows[k] : stageInletH - (this.willansDrop[k] ?? 0)) : this.exhaustH[k] + this.exhaustSlope[k] * move;
      values[`stage${k + 1}_outflow_kg_s`] = outflow;
      values[`stage${k + 1}_exhaust_h_kJ_kg`] = exhaustH;
      if (stage.exhaust.kind === 'condenser') condenserKW += outflow * (exhaustH - saturatedLiquid(stage.exhaust.pressure).h);
      steamWork += work;
      stageInletH = exhaustH;
    });
    values.condenser_kW = condenserKW;
    // Work taken from the steam, before mechanical and generator losses.
    values.steam_work_kW = steamWork;
    values.steam_rate_kg_kWh = power > 0 ? ((flows[0] ?? 0) * 3600) / power : null;
    const binding: string[] = [];
    // A limit the case leaves open (infinite) is never reached.
    const near = (a: number, b: number): boolean => Number.isFinite(b) && Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(b));
    if (!running) binding.push('stopped');
    if (running && near(flows[0] ?? 0, turbine.inletFlow.max)) binding.push('inlet flow at maximum');
    if (running && turbine.inletFlow.min > 0 && near(flows[0] ?? 0, turbine.inletFlow.min)) binding.push('inlet flow at minimum');
    if (running && near(power, turbine.power.max)) binding.push('power at maximum');
    if (running && turbine.power.min > 0 && near(power, turbine.power.min)) binding.push('power at minimum');
    turbine.stages.forEach((stage, k) => {
      const outflow = flows[k] - (flows[k + 1] ?? 0);
      if (running && near(outflow, stage.outflow.max) && stage.outflow.max < Infinity) binding.push(`stage ${k + 1} outflow at maximum`);
      if (running && stage.outflow.min > 0 && near(outflow, stage.outflow.min)) binding.push(`stage ${k + 1} outflow at minimum`);
      if (running && near(flows[k], stage.sectionFlow.max) && stage.sectionFlow.max < Infinity) binding.push(`section ${k + 1} flow at maximum`);
    });
    return { id: turbine.id, kind: this.kind, values, binding };
  }
}

/** Most steam the plant's sources can raise, kg/s: a bound for flows the case leaves open. */
function plantSteamCapacity(context: BuildContext): number {
  const plant = context.plant;
  let total = 0;
  for (const boiler of plant.boilers) total += boiler.steam.max;
  for (const boiler of plant.heatRecoveryBoilers) total += boiler.steam.max + (boiler.supplementaryFiring?.maxSteam ?? 0);
  for (const supply of plant.steamImports) total += supply.flow.max;
  // Letdown spray and turbine-to-turbine cascades cannot multiply steam: twice the sources is safe.
  return Number.isFinite(total) ? 2 * total + 1 : 1e4;
}
