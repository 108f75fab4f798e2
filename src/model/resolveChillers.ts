// Absorption chillers: a chilled-water plant's cooling demand, the absorption
// capacity on steam, its COP and the electric chillers it displaces.
import { saturatedLiquid, saturationTemperature, statePT } from '../properties/index.js';
import { parseQuantity } from '../units/index.js';
import type { CasePath } from './issue.js';
import type { AbsorptionChiller, Header, SteamUser } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

/**
 * COP when the case gives none: 0.7 single-effect, 1.2 double-effect
 * (common practice for steam-fired lithium bromide machines, no single source).
 */
export const DEFAULT_COP = { single: 0.7, double: 1.2 } as const;

/** Electric chillers' kW per kW of cooling from "0.65 kW/TR", "0.65 kW/ton" or "0.18 kW/kW". */
export function parseElectricPerCooling(text: string): { ok: true; value: number } | { ok: false; message: string } {
  const match = /^\s*([0-9]*\.?[0-9]+(?:[eE][-+]?[0-9]+)?)\s*kW\s*\/\s*(TR|ton|tons|kW)\s*$/i.exec(text);
  const example = 'expected the electric chillers\' power per cooling such as "0.65 kW/TR" or "0.18 kW/kW"';
  if (!match) return { ok: false, message: `${example}, found "${text}"` };
  const number = Number(match[1]);
  const per = match[2].toLowerCase();
  const trKW = parseQuantity('1 TR', 'power', { atmosphericPressure_MPa: 0.101325 });
  const perKW = per === 'kw' ? number : number / (trKW.ok ? trKW.value : NaN);
  if (!(perKW > 0 && perKW < 2)) return { ok: false, message: `expected from above 0 to 2 kW of electricity per kW of cooling (7 kW/TR), found "${text}"` };
  return { ok: true, value: perKW };
}

function chillerCondensate(context: ResolveContext, path: CasePath, header: Header): SteamUser['condensate'] | undefined {
  const condensatePath = [...path, 'condensate'];
  const saturated = saturatedLiquid(header.pressure);
  if (context.raw(condensatePath) === undefined) {
    context.addDefault(condensatePath, 'all returned, saturated, to the deaerator', 'condensate not stated: an absorption chiller\'s generator returns all its clean condensate (common practice, no source)');
    return { returnFraction: 1, temperature: saturated.T, h: saturated.h, to: { kind: 'deaerator' } };
  }
  const returnFraction = context.fraction([...condensatePath, 'return']);
  const toWord = context.raw([...condensatePath, 'to']);
  let to: SteamUser['condensate']['to'] | undefined = { kind: toWord === undefined && returnFraction === 0 ? 'drain' : 'deaerator' };
  if (toWord === 'drain') to = { kind: 'drain' };
  else if (toWord !== undefined && toWord !== 'deaerator') {
    context.error('wrong-reference', [...condensatePath, 'to'], `expected deaerator or drain for an absorption chiller's condensate, found ${JSON.stringify(toWord)}`);
    to = undefined;
  }
  const temperaturePath = [...condensatePath, 'temperature'];
  let temperature = saturated.T;
  let h = saturated.h;
  if (context.raw(temperaturePath) !== undefined) {
    const given = context.quantity(temperaturePath, 'temperature');
    if (given === undefined) return undefined;
    const saturation = saturationTemperature(header.pressure);
    if (given > saturation + 1e-9 || given <= 273.15) {
      context.error('out-of-range', temperaturePath, `expected a condensate temperature above 0 degC and at most saturation (${context.show(saturation, 'temperature')} at ${context.show(header.pressure, 'pressure')}), found "${context.text(temperaturePath)}"`);
      return undefined;
    }
    temperature = given;
    const state = context.property(temperaturePath, 'condensate', () => (saturation - given < 1e-6 ? saturated.h : statePT(header.pressure, given).h));
    if (state === undefined) return undefined;
    h = state;
  }
  if (returnFraction === undefined || !to) return undefined;
  return { returnFraction, temperature, h, to };
}

export function resolveAbsorptionChillers(context: ResolveContext, headers: Map<string, Header>): AbsorptionChiller[] {
  return context.entries(['absorption_chillers']).flatMap(({ item, path }) => {
    const headerId = context.reference([...path, 'header'], ['header']);
    const header = headerId === undefined ? undefined : headers.get(headerId);
    const cooling = context.amount([...path, 'cooling'], 'power');
    const capacity = context.amount([...path, 'capacity'], 'power');
    const effect = item.effect === 'double' ? 'double' : 'single';
    let cop: number = DEFAULT_COP[effect];
    if (typeof item.cop === 'number') cop = item.cop;
    else context.addDefault([...path, 'cop'], String(cop), `COP not stated: ${cop} for a ${effect}-effect steam absorption chiller (common practice, no single source)`);
    let electricPerCooling: number | undefined;
    if (typeof item.electric_chillers === 'string') {
      const parsed = parseElectricPerCooling(item.electric_chillers);
      if (parsed.ok) electricPerCooling = parsed.value;
      else context.error('bad-quantity', [...path, 'electric_chillers'], parsed.message);
    }
    const condensate = header ? chillerCondensate(context, path, header) : undefined;
    if (!header || cooling === undefined || capacity === undefined || electricPerCooling === undefined || !condensate || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'absorptionChiller' as const, header: header.id, cooling, capacity, effect, cop, electricPerCooling, condensate }];
  });
}
