// An insulation survey: bare pipe per header and the header's heat loss once
// it is insulated (by default a tenth of today's: insulation cuts a bare
// pipe's loss by about 90 %, common practice, no source).
import type { Header, InsulationRepair } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

/** Share of a header's heat loss left once its bare pipe is insulated, when the case gives none. */
export const LOSS_LEFT_AFTER_INSULATION = 0.1;

export function parseLength(text: string): { ok: true; metres: number } | { ok: false; message: string } {
  const match = /^\s*([0-9][0-9,]*\.?[0-9]*)\s*(m|ft|feet)\s*$/i.exec(text);
  if (!match) return { ok: false, message: `expected a length such as "80 m" or "260 ft", found "${text}"` };
  const value = Number(match[1].replace(/,/g, ''));
  const metres = match[2].toLowerCase() === 'm' ? value : value * 0.3048;
  if (!(metres > 0 && metres <= 1e5)) return { ok: false, message: `expected a length above 0 and at most 100 km, found "${text}"` };
  return { ok: true, metres };
}

export function resolveInsulation(context: ResolveContext, headers: Map<string, Header>): InsulationRepair[] {
  const seen = new Set<string>();
  return context.entries(['insulation_survey']).flatMap(({ item, path }) => {
    const headerId = context.reference([...path, 'header'], ['header']);
    const header = headerId === undefined ? undefined : headers.get(headerId);
    if (header && seen.has(header.id)) {
      context.error('duplicate-id', [...path, 'header'], `header ${header.id} is already in the insulation survey; give one entry per header`);
      return [];
    }
    if (header) seen.add(header.id);
    let bareLength: number | undefined;
    if (typeof item.bare_length === 'string') {
      const parsed = parseLength(item.bare_length);
      if (parsed.ok) bareLength = parsed.metres;
      else context.error('bad-quantity', [...path, 'bare_length'], parsed.message);
    }
    if (!header || bareLength === undefined) return [];
    if (!(header.heatLoss > 0)) {
      context.error('no-heat-loss', [...path, 'header'], `header ${header.id} states no heat_loss, so insulating it saves nothing the balance can see; give the header's heat_loss`);
      return [];
    }
    let lossAfter = header.heatLoss * LOSS_LEFT_AFTER_INSULATION;
    if (item.heat_loss_after === undefined) {
      context.addDefault([...path, 'heat_loss_after'], `${lossAfter} kW`, 'loss after insulation not stated: a tenth of the header\'s heat_loss (insulation cuts a bare pipe\'s loss by about 90 %, common practice, no source)');
    } else {
      const given = context.amount([...path, 'heat_loss_after'], 'power');
      if (given === undefined) return [];
      if (given > header.heatLoss) {
        context.error('out-of-range', [...path, 'heat_loss_after'], `expected at most the header's heat_loss (${context.show(header.heatLoss, 'power')}), found "${context.text([...path, 'heat_loss_after'])}"`);
        return [];
      }
      lossAfter = given;
    }
    return [{ header: header.id, bareLength, lossAfter }];
  });
}
