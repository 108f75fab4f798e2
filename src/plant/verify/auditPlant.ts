// The independent audit: every stream's state and every unit's relation
// worked out again from the case and IAPWS-IF97, and the solve's flows put
// through them. Per unit and node: mass, energy and entropy generation.
import type { Plant } from '../../model/index.js';
import { PropertyRangeError } from '../../properties/index.js';
import { AuditStates } from './auditStates.js';
import { Ledger, type AuditStream, type RelationCheck } from './ledger.js';
import { auditDeaerator, auditDeaeratorVent, auditFlashTanks, auditHeaders, auditLetdowns, auditUsers } from './network.js';
import { auditPower } from './power.js';
import { solvedPlantFromReports, type ReportedUnit, type SolvedPlant } from './solvedPlant.js';
import { auditBoilers, auditFeedPumps } from './supplies.js';
import { AUDIT_FLOOR_SHARE, BALANCE_TOLERANCE, ENTROPY_TOLERANCE } from './tolerances.js';
import { auditTurbines } from './turbines.js';
import { auditAbsorptionChillers, auditTrapGroups } from './chillersAndTraps.js';

export interface UnitAudit {
  /** unit or node id ("feedwater pumps" and "site power" for those balances) */
  id: string;
  kind: string;
  /** mass entering, kg/s, and in - out */
  mass_in_kg_s: number;
  mass_residual_kg_s: number;
  mass_relative: number;
  /** energy in - out, kW (streams, work and heat); null where the balance defines the heat crossing */
  energy_residual_kW: number | null;
  energy_relative: number | null;
  /** entropy generated, kW/K: sum out m s - sum in m s + heat out / T - heat in / T; null for power balances */
  entropy_generation_kW_K: number | null;
  /** the unit's own relations against the solve's figures */
  checks: RelationCheck[];
  /** what fails, in words; empty when the unit passes */
  problems: string[];
}

export interface IndependentAudit {
  ok: boolean;
  tolerance: { balance_relative: number; entropy_relative: number };
  units: UnitAudit[];
  /** largest relative mass or energy residual over every unit and node */
  worst_balance_relative: number;
  /** least entropy generation over every unit and node, kW/K */
  least_entropy_generation_kW_K: number;
  /** largest relative difference of any relation, with what it is */
  worst_check: { id: string; what: string; relative: number } | null;
  /** one line per failing unit */
  failures: string[];
  /** one sentence: passes, or which units fail and why */
  summary: string;
}

/** Audits a solve: the plant it solved and the flows and header states it reports. */
export function auditPlant(plant: Plant, solved: SolvedPlant): IndependentAudit {
  const ledger = new Ledger();
  const broken = new Map<string, string[]>();
  // A state outside IF97 is a finding about that unit, not a crash.
  const attempt = (id: string, work: () => void): void => {
    try {
      work();
    } catch (error) {
      if (!(error instanceof PropertyRangeError)) throw error;
      broken.set(id, [...(broken.get(id) ?? []), `a state left IF97: ${error.message}`]);
    }
  };
  const states = new AuditStates(plant, solved);
  auditHeaders(plant, solved, states, ledger, attempt);
  auditBoilers(plant, solved, states, ledger, attempt);
  const turbinePower = auditTurbines(plant, solved, states, ledger, attempt);
  auditLetdowns(plant, solved, states, ledger, attempt);
  auditUsers(plant, solved, states, ledger, attempt);
  auditAbsorptionChillers(plant, solved, states, ledger, attempt);
  auditTrapGroups(plant, solved, states, ledger, attempt);
  auditFlashTanks(plant, solved, states, ledger, attempt);
  auditDeaerator(plant, solved, states, ledger, attempt);
  auditDeaeratorVent(plant, solved, ledger);
  const pumpShaft = auditFeedPumps(plant, solved, states, ledger);
  auditPower(plant, solved, ledger, turbinePower, pumpShaft);

  // A unit that is off can carry the solver's round-off (flows of 1e-13 kg/s,
  // even slightly negative); its balances are then noise. Each relative test
  // is scaled to at least a share of the plant's largest stream figure.
  const floor = (figure: (stream: AuditStream) => number): number => Math.max(AUDIT_FLOOR_SHARE * ledger.streams.reduce((largest, stream) => Math.max(largest, Math.abs(figure(stream))), 0), 1e-9);
  const massFloor = floor((stream) => stream.m);
  const energyFloor = floor((stream) => stream.m * stream.h);
  const entropyFloor = floor((stream) => stream.m * stream.s);

  const units: UnitAudit[] = [];
  for (const volume of ledger.volumes.values()) {
    const into = ledger.into(volume.id);
    const outOf = ledger.outOf(volume.id);
    const crossings = ledger.crossings.filter((crossing) => crossing.volume === volume.id);
    const massIn = into.reduce((total, stream) => total + stream.m, 0);
    const massOut = outOf.reduce((total, stream) => total + stream.m, 0);
    let energyIn = into.reduce((total, stream) => total + stream.m * stream.h, 0);
    let energyOut = outOf.reduce((total, stream) => total + stream.m * stream.h, 0);
    let entropy = outOf.reduce((total, stream) => total + stream.m * stream.s, 0) - into.reduce((total, stream) => total + stream.m * stream.s, 0);
    const entropyFlow = Math.max(...[...into, ...outOf].map((stream) => Math.abs(stream.m * stream.s)), 0);
    for (const crossing of crossings) {
      if (crossing.direction === 'in') energyIn += crossing.kW;
      else energyOut += crossing.kW;
      if (crossing.kind === 'heat' && crossing.temperature !== null) entropy += (crossing.direction === 'out' ? 1 : -1) * (crossing.kW / crossing.temperature);
    }
    const hasStreams = into.length + outOf.length > 0;
    const massResidual = massIn - massOut;
    const massRelative = Math.abs(massResidual) / Math.max(Math.abs(massIn), Math.abs(massOut), massFloor);
    const energyResidual = hasStreams && volume.energyCloses ? energyIn - energyOut : null;
    const energyRelative = energyResidual === null ? null : Math.abs(energyResidual) / Math.max(Math.abs(energyIn), Math.abs(energyOut), energyFloor);
    const generation = hasStreams ? entropy : null;
    const checks = ledger.checks.get(volume.id) ?? [];
    const problems = [...(broken.get(volume.id) ?? [])];
    if (massRelative > BALANCE_TOLERANCE) problems.push(`mass does not close: ${massResidual.toPrecision(3)} kg/s (${massRelative.toExponential(2)} of ${massIn.toPrecision(4)} kg/s in)`);
    if (energyRelative !== null && energyResidual !== null && energyRelative > BALANCE_TOLERANCE) {
      problems.push(`energy does not close: ${energyResidual.toPrecision(3)} kW (${energyRelative.toExponential(2)} of the energy through it)`);
    }
    if (generation !== null && generation < -ENTROPY_TOLERANCE * Math.max(entropyFlow, entropyFloor)) {
      problems.push(`entropy generation ${generation.toPrecision(3)} kW/K is negative: the second law forbids it`);
    }
    for (const check of checks) {
      if (check.relative > check.tolerance) {
        problems.push(`${check.what}: the audit gives ${check.expected.toPrecision(6)} ${check.unit}, the solve ${check.found.toPrecision(6)} ${check.unit} (${check.relative.toExponential(2)} apart, tolerance ${check.tolerance})`);
      }
    }
    units.push({
      id: volume.id,
      kind: volume.kind,
      mass_in_kg_s: massIn,
      mass_residual_kg_s: massResidual,
      mass_relative: massRelative,
      energy_residual_kW: energyResidual,
      energy_relative: energyRelative,
      entropy_generation_kW_K: generation,
      checks,
      problems,
    });
  }
  let worstBalance = 0;
  let leastEntropy = Infinity;
  let worstCheck: IndependentAudit['worst_check'] = null;
  for (const unit of units) {
    worstBalance = Math.max(worstBalance, unit.mass_relative, unit.energy_relative ?? 0);
    if (unit.entropy_generation_kW_K !== null) leastEntropy = Math.min(leastEntropy, unit.entropy_generation_kW_K);
    for (const check of unit.checks) if (!worstCheck || check.relative > worstCheck.relative) worstCheck = { id: unit.id, what: check.what, relative: check.relative };
  }
  const failures = units.filter((unit) => unit.problems.length > 0).map((unit) => `${unit.id}: ${unit.problems.join('; ')}`);
  return {
    ok: failures.length === 0,
    tolerance: { balance_relative: BALANCE_TOLERANCE, entropy_relative: ENTROPY_TOLERANCE },
    units,
    worst_balance_relative: worstBalance,
    least_entropy_generation_kW_K: Number.isFinite(leastEntropy) ? leastEntropy : 0,
    worst_check: worstCheck,
    failures,
    summary:
      failures.length === 0
        ? `every unit passes (balances within ${worstBalance.toExponential(2)} relative, no negative entropy generation)`
        : `the independent audit fails at ${failures.length === 1 ? 'unit' : 'units'} ${failures.join('; and ')}`,
  };
}

/**
 * The audit of a finished solve: the plant, the header enthalpies it converged
 * to (kJ/kg by id) and its unit reports. The one call the solver makes.
 */
export function auditSolve(plant: Plant, headerEnthalpy: ReadonlyMap<string, number>, reports: readonly ReportedUnit[]): IndependentAudit {
  const headers = [...headerEnthalpy].map(([id, h]) => ({ id, h_kJ_kg: h }));
  return auditPlant(plant, solvedPlantFromReports(headers, reports));
}
