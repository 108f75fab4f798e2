// A steam trap survey: per header, traps installed, failed open and their
// orifice; the steam they blow from Napier's orifice relation.
import type { Header, TrapGroup } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';
import { napierSteamFlow } from './napier.js';

/**
 * Discharge coefficient on Napier's relation when the case gives none: 0.73,
 * the ratio of the DOE Steam Tip Sheet #1 table ("Inspect and Repair Steam
 * Traps", leaking steam trap discharge rate) to Napier's full-bore figure,
 * e.g. 75.8 lb/h for a 1/8 in orifice at 150 psig against 103.9 lb/h.
 */
export const DEFAULT_DISCHARGE_COEFFICIENT = 0.73;

/** An orifice diameter in metres from "1/8 in", "0.125 in", "0.125 inch" or "3.2 mm". */
export function parseOrifice(text: string): { ok: true; metres: number } | { ok: false; message: string } {
  const match = /^\s*(?:([0-9]+)\s*\/\s*([0-9]+)|([0-9]*\.?[0-9]+))\s*(in|inch|inches|mm)\s*$/i.exec(text);
  if (!match) return { ok: false, message: `expected an orifice diameter such as "1/8 in", "0.125 in" or "3.2 mm", found "${text}"` };
  const value = match[3] !== undefined ? Number(match[3]) : Number(match[1]) / Number(match[2]);
  const metres = match[4].toLowerCase() === 'mm' ? value / 1000 : value * 0.0254;
  if (!(metres > 0 && metres <= 0.05)) return { ok: false, message: `expected an orifice above 0 and at most 50 mm (2 in), found "${text}"` };
  return { ok: true, metres };
}

export function resolveSteamTraps(context: ResolveContext, headers: Map<string, Header>): TrapGroup[] {
  return context.entries(['steam_traps']).flatMap(({ item, path }) => {
    const headerId = context.reference([...path, 'header'], ['header']);
    const header = headerId === undefined ? undefined : headers.get(headerId);
    const installed = typeof item.installed === 'number' && Number.isInteger(item.installed) && item.installed >= 0 ? item.installed : undefined;
    let failedOpen: number | undefined;
    const failed = item.failed_open;
    if (typeof failed === 'number' && Number.isInteger(failed) && failed >= 0) {
      failedOpen = failed;
      if (installed !== undefined && failed > installed) {
        context.error('impossible-count', [...path, 'failed_open'], `${failed} traps failed open is more than the ${installed} installed; a survey cannot find more failed traps than there are`);
        failedOpen = undefined;
      }
    } else if (typeof failed === 'string') {
      const share = context.fraction([...path, 'failed_open']);
      if (share !== undefined && installed !== undefined) failedOpen = share * installed;
    }
    let orifice: number | undefined;
    if (typeof item.orifice === 'string') {
      const parsed = parseOrifice(item.orifice);
      if (parsed.ok) orifice = parsed.metres;
      else context.error('bad-quantity', [...path, 'orifice'], parsed.message);
    }
    let dischargeCoefficient = DEFAULT_DISCHARGE_COEFFICIENT;
    if (typeof item.discharge_coefficient === 'number') dischargeCoefficient = item.discharge_coefficient;
    else context.addDefault([...path, 'discharge_coefficient'], String(DEFAULT_DISCHARGE_COEFFICIENT), 'discharge coefficient not stated: 0.73, which makes Napier\'s relation match the DOE Steam Tip Sheet #1 table of leaking trap discharge');
    if (!header || installed === undefined || failedOpen === undefined || orifice === undefined || typeof item.id !== 'string') return [];
    const perTrap = napierSteamFlow(header.pressure, orifice, dischargeCoefficient);
    return [{ id: item.id, kind: 'trapGroup' as const, header: header.id, installed, failedOpen, orifice, dischargeCoefficient, loss: failedOpen * perTrap }];
  });
}
