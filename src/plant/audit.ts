// The audit: every balance recomputed from the final flows and the states the
// pass used, independent of the solver's own row activities.
import { ATMOSPHERE, DRAIN, MAKEUP, PROCESS, headerLoss, solvedEnergy } from './network.js';
import type { Pass } from './buildPass.js';
import type { PassSolution } from './passSolution.js';
import type { UnitReport } from './contribution.js';
import { siteBalance, type SiteEnergyBalance } from './siteBalance.js';

export interface BalanceResidual {
  /** node or unit id */
  id: string;
  kind: 'header' | 'deaerator' | 'flashTank' | 'unit';
  /** sum in - sum out, kg/s */
  mass: number;
  /** sum in (m h) - sum out (m h) - heat loss, kW; null where work or heat crosses the unit's boundary */
  energy: number | null;
  /** |mass| / throughput and |energy| / energy throughput */
  massRelative: number;
  energyRelative: number | null;
}

export interface Audit {
  balances: BalanceResidual[];
  maxMassResidual: number;
  maxEnergyResidual: number;
  worstRelative: number;
  worstDescription: string;
  /** fuel and energy in against useful heat, work and losses out */
  site: SiteEnergyBalance;
}

const TERMINALS = new Set([ATMOSPHERE, DRAIN, MAKEUP, PROCESS]);
/** Units that neither do work nor exchange heat: their energy must close too. */
const ADIABATIC_STREAMS = new Set(['letdown', 'spray']);

export function auditPass(pass: Pass, solution: PassSolution, reports: readonly UnitReport[]): Audit {
  const context = pass.context;
  const endpoints = new Set<string>();
  for (const stream of context.streams) {
    endpoints.add(stream.from);
    endpoints.add(stream.to);
  }
  const balances: BalanceResidual[] = [];
  for (const id of endpoints) {
    if (TERMINALS.has(id)) continue;
    const into = context.streamsInto(id);
    const outOf = context.streamsOutOf(id);
    // Sources and sinks of one side only (imports, users' process take-off) have no balance of their own.
    if (into.length === 0 || outOf.length === 0) continue;
    const node = context.nodes.get(id);
    let massIn = 0;
    let massOut = 0;
    let energyIn = 0;
    let energyOut = node ? headerLoss(node.heatLoss, into, solution) : 0;
    for (const stream of into) {
      const flow = solution.evaluate(stream.flow);
      massIn += flow;
      energyIn += solvedEnergy(stream, solution);
    }
    for (const stream of outOf) {
      const flow = solution.evaluate(stream.flow);
      massOut += flow;
      energyOut += solvedEnergy(stream, solution);
    }
    const adiabatic = node !== undefined || [...into, ...outOf].every((stream) => ADIABATIC_STREAMS.has(stream.kind));
    const mass = massIn - massOut;
    const energy = adiabatic ? energyIn - energyOut : null;
    const kind = node ? (id === 'deaerator' ? 'deaerator' : context.plant.headers.some((header) => header.id === id) ? 'header' : 'flashTank') : 'unit';
    balances.push({
      id,
      kind,
      mass,
      energy,
      massRelative: Math.abs(mass) / Math.max(massIn, massOut, 1e-9),
      energyRelative: energy === null ? null : Math.abs(energy) / Math.max(Math.abs(energyIn), Math.abs(energyOut), 1e-9),
    });
  }
  let worst = 0;
  let worstDescription = 'every balance closes';
  let maxMass = 0;
  let maxEnergy = 0;
  for (const balance of balances) {
    maxMass = Math.max(maxMass, Math.abs(balance.mass));
    if (balance.energy !== null) maxEnergy = Math.max(maxEnergy, Math.abs(balance.energy));
    // Flows below a gram per hour are round-off, not imbalance.
    const massRelative = Math.abs(balance.mass) < 1e-7 ? 0 : balance.massRelative;
    const energyRelative = balance.energy === null || Math.abs(balance.energy) < 1e-4 ? 0 : (balance.energyRelative ?? 0);
    if (massRelative > worst) {
      worst = massRelative;
      worstDescription = `${balance.id} mass residual ${balance.mass.toPrecision(3)} kg/s (${massRelative.toExponential(2)} of its throughput)`;
    }
    if (energyRelative > worst) {
      worst = energyRelative;
      worstDescription = `${balance.id} energy residual ${balance.energy!.toPrecision(3)} kW (${energyRelative.toExponential(2)} of its throughput)`;
    }
  }
  const site = siteBalance(pass, solution, reports);
  if (site.relative > worst) {
    worst = site.relative;
    worstDescription = `site energy balance residual ${site.residual_kW.toPrecision(3)} kW (${site.relative.toExponential(2)} of the energy in)`;
  }
  return { balances, maxMassResidual: maxMass, maxEnergyResidual: maxEnergy, worstRelative: worst, worstDescription, site };
}
