// Absorption chillers and trap survey groups, as the audit sees them.
import type { Plant } from '../../model/index.js';
import { liquidAt, type AuditStates } from './auditStates.js';
import type { Ledger } from './ledger.js';
import type { SolvedPlant } from './solvedPlant.js';
import { find, liquidTarget } from './supplies.js';
import { BALANCE_TOLERANCE, DRAIN } from './tolerances.js';

type Attempt = (id: string, work: () => void) => void;

/**
 * A chiller's generator condenses its steam to its condensate temperature;
 * the heat it takes is absorption cooling / COP, received at the condensate
 * temperature. Cooling made by both kinds of chiller meets the demand.
 */
export function auditAbsorptionChillers(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  for (const chiller of plant.absorptionChillers ?? []) {
    ledger.volume(chiller.id, 'absorptionChiller', false);
    attempt(chiller.id, () => {
      const result = find(solved.absorptionChillers, chiller.id);
      const steam = states.header(chiller.header);
      const condensate = liquidAt(steam.p, chiller.condensate.temperature);
      const returned = result.steam * chiller.condensate.returnFraction;
      ledger.stream({ from: chiller.header, to: chiller.id, label: 'steam', m: result.steam, ...steam });
      if (returned !== 0) ledger.stream({ from: chiller.id, to: liquidTarget(chiller.condensate.to), label: 'condensate', m: returned, ...condensate });
      if (result.steam - returned !== 0) ledger.stream({ from: chiller.id, to: DRAIN, label: 'condensate lost', m: result.steam - returned, ...condensate });
      const heat = result.steam * (steam.h - condensate.h);
      ledger.cross({ volume: chiller.id, kind: 'heat', direction: 'out', kW: heat, temperature: result.steam >= 0 ? condensate.T : null });
      // steam = cooling / (COP x latent heat given up); sized at the last pass's header state,
      // so off by at most the loop's enthalpy tolerance over the heat each kg gives up.
      const tolerance = Math.max(BALANCE_TOLERANCE, plant.solver.enthalpyTolerance / (steam.h - condensate.h));
      ledger.check(chiller.id, 'absorption cooling = COP x heat from the steam', result.absorptionCooling, chiller.cop * heat, 'kW', tolerance, 1e-3);
      ledger.check(chiller.id, 'cooling demand met', chiller.cooling, result.absorptionCooling + result.electricCooling, 'kW', BALANCE_TOLERANCE, 1e-3);
      if (result.absorptionCooling > chiller.capacity * (1 + BALANCE_TOLERANCE) + 1e-6) {
        ledger.check(chiller.id, 'absorption within capacity', chiller.capacity, result.absorptionCooling, 'kW', BALANCE_TOLERANCE, 1e-3);
      }
    });
  }
}

/**
 * A trap group's failed traps blow header steam to drain at Napier's rate,
 * W = Cd A p / 70 (lb/s, in^2, psia), worked out again here in US units.
 */
export function auditTrapGroups(plant: Plant, solved: SolvedPlant, states: AuditStates, ledger: Ledger, attempt: Attempt): void {
  for (const group of plant.steamTraps ?? []) {
    ledger.volume(group.id, 'trapGroup');
    attempt(group.id, () => {
      const result = find(solved.trapGroups, group.id);
      const steam = states.header(group.header);
      const inches = group.orifice / 0.0254;
      const psia = (steam.p * 1e6) / 6894.757293168361;
      const poundsPerHour = group.failedOpen * group.dischargeCoefficient * 3600 * ((Math.PI * inches * inches) / 4) * psia / 70;
      ledger.check(group.id, 'steam through failed traps (Napier)', poundsPerHour * 0.45359237 / 3600, result.steam, 'kg/s', BALANCE_TOLERANCE, 1e-6);
      if (result.steam !== 0) {
        ledger.stream({ from: group.header, to: group.id, label: 'steam', m: result.steam, ...steam });
        ledger.stream({ from: group.id, to: DRAIN, label: 'steam blown through', m: result.steam, ...steam });
      }
    });
  }
}
