// Turbines as the audit sees them: each section expanded from its own inlet
// state by its own performance figure, power from the drops.
import type { Plant, StagePerformance } from '../../model/index.js';
import { saturatedLiquid, statePH, statePS, statePT, type SteamState } from '../../properties/index.js';
import { point, type AuditStates } from './auditStates.js';
import type { Ledger } from './ledger.js';
import type { SolvedPlant } from './solvedPlant.js';
import { find, liquidTarget } from './supplies.js';
import { BALANCE_TOLERANCE } from './tolerances.js';

/**
 * Exhaust enthalpy of one section from its inlet state, kJ/kg:
 * isentropic efficiency eta: h_out = h_in - eta (h_in - h_s(p_out, s_in));
 * a stated exhaust enthalpy or temperature; or a Willans line, whose section
 * power P = slope m - intercept gives the drop P / (eta_m eta_g m).
 */
export function sectionExhaust(inlet: SteamState, pressure: number, performance: StagePerformance, flow: number, running: boolean, overall: number): number {
  switch (performance.kind) {
    case 'isentropic':
      return inlet.h - performance.efficiency * (inlet.h - statePS(pressure, inlet.s).h);
    case 'exhaustEnthalpy':
      return performance.h;
    case 'exhaustTemperature':
      return statePT(pressure, performance.T).h;
    case 'willans': {
      // A section that passes nothing has no drop to speak of; its slope alone gives one.
      if (!(flow > 1e-9) || !running) return inlet.h - performance.slope / overall;
      return inlet.h - (performance.slope * flow - performance.intercept) / (overall * flow);
    }
  }
}

/** Section power delivered, kW. */
function sectionPower(performance: StagePerformance, flow: number, drop: number, running: boolean, overall: number): number {
  if (performance.kind === 'willans') return running ? performance.slope * flow - performance.intercept : 0;
  return flow * drop * overall;
}

/** Audits every turbine; returns the power each delivers by the audit's reckoning, kW. */
export function auditTurbines(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: (id: string, work: () => void) => void): Map<string, number> {
  const powers = new Map<string, number>();
  for (const turbine of plant.turbines) {
    ledger.volume(turbine.id, 'turbine');
    attempt(turbine.id, () => {
      const result = find(solved.turbines, turbine.id);
      if (result.sectionFlows.length !== turbine.stages.length) {
        throw new Error(`the solve reports ${result.sectionFlows.length} sections for turbine ${turbine.id}, the plant has ${turbine.stages.length}.`);
      }
      const overall = turbine.mechanicalEfficiency * turbine.generatorEfficiency;
      const inlet = states.header(turbine.inlet);
      let state: SteamState = statePH(inlet.p, inlet.h);
      ledger.stream({ from: turbine.inlet, to: turbine.id, label: 'steam', m: result.sectionFlows[0] ?? 0, ...inlet });
      let work = 0;
      let power = 0;
      turbine.stages.forEach((stage, k) => {
        const flow = result.sectionFlows[k];
        const pressure = stage.exhaust.pressure;
        const h = sectionExhaust(state, pressure, stage.performance, flow, result.running, overall);
        const drop = state.h - h;
        work += flow * drop;
        power += sectionPower(stage.performance, flow, drop, result.running, overall);
        const exhaust = statePH(pressure, h);
        const outflow = flow - (result.sectionFlows[k + 1] ?? 0);
        if (stage.exhaust.kind === 'header') {
          ledger.stream({ from: turbine.id, to: stage.exhaust.id, label: `stage ${k + 1} exhaust`, m: outflow, ...point(exhaust) });
        } else {
          // The condenser: exhaust condensed to saturated liquid, its heat to cooling water at ambient.
          const condensate = point(saturatedLiquid(pressure));
          ledger.stream({ from: turbine.id, to: liquidTarget(stage.exhaust.condensateTo), label: 'condensate', m: outflow, ...condensate });
          ledger.cross({ volume: turbine.id, kind: 'heat', direction: 'out', kW: outflow * (h - condensate.h), temperature: states.ambient });
        }
        state = exhaust;
      });
      ledger.cross({ volume: turbine.id, kind: 'work', direction: 'out', kW: work, temperature: null });
      const scale = Number.isFinite(turbine.power.max) ? turbine.power.max : 1000;
      ledger.check(turbine.id, 'power', power, result.power, 'kW', BALANCE_TOLERANCE, 1e-6 * scale);
      powers.set(turbine.id, power);
    });
  }
  return powers;
}
