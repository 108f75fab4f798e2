// Steam sources: fired boilers, waste-heat boilers and purchased steam.
import type { CasePath } from './issue.js';
import { resolveSwitching } from './resolveSwitching.js';
import type { EfficiencyPoint, FiredBoiler, FixedState, Header, HeatRecoveryBoiler, LiquidDestination, SteamImport } from './plantTypes.js';
import { saturatedLiquid, statePH } from '../properties/index.js';
import type { ResolveContext } from './resolveContext.js';
import { steamAt } from './resolveHeaders.js';

/** Boiler efficiency above this is suspicious: condensing boilers on HHV only just reach it. Common practice, no single source. */
export const SUSPICIOUS_EFFICIENCY = 0.95;
/** Blowdown above this share of feedwater is suspicious. Common practice, no single source. */
export const SUSPICIOUS_BLOWDOWN = 0.1;

export function blowdownFraction(context: ResolveContext, path: CasePath): number | undefined {
  const value = context.raw(path);
  if (value !== null && typeof value === 'object') {
    const cycles = (value as Record<string, unknown>).cycles_of_concentration;
    // UFC 3-240-13FN: blowdown as a share of feedwater = 1 / cycles of concentration.
    return typeof cycles === 'number' && cycles > 1 ? 1 / cycles : undefined;
  }
  const fraction = context.fraction(path);
  if (fraction === undefined) return undefined;
  if (fraction >= 1) {
    context.error('percent-range', path, `expected a blowdown below 100 % of feedwater, found "${context.text(path)}"`);
    return undefined;
  }
  if (fraction > SUSPICIOUS_BLOWDOWN) {
    context.warn('suspicious-blowdown', path, `blowdown ${context.text(path)} of feedwater is above 10 %; check the value (typical blowdown is 1 to 8 %)`);
  }
  return fraction;
}

export function liquidDestination(context: ResolveContext, path: CasePath, words: ('deaerator' | 'drain')[], fallback?: LiquidDestination): LiquidDestination | undefined {
  if (context.raw(path) === undefined) return fallback;
  const target = context.reference(path, ['flashTank'], words);
  if (target === undefined) return undefined;
  if (target === 'drain') return { kind: 'drain' };
  if (target === 'deaerator') return { kind: 'deaerator' };
  return { kind: 'flashTank', id: target };
}

function efficiencyTable(context: ResolveContext, path: CasePath): EfficiencyPoint[] | undefined {
  const value = context.raw(path);
  const check = (pointPath: CasePath, efficiency: number | undefined) => {
    if (efficiency !== undefined && efficiency > SUSPICIOUS_EFFICIENCY) {
      context.warn('suspicious-efficiency', pointPath, `boiler efficiency ${context.text(pointPath)} is above 95 %; check the value and its heating-value basis`);
    }
  };
  if (typeof value === 'string') {
    const efficiency = context.fraction(path, { zeroAllowed: false });
    check(path, efficiency);
    return efficiency === undefined ? undefined : [{ load: 1, efficiency }];
  }
  if (!Array.isArray(value)) return undefined;
  const points: EfficiencyPoint[] = [];
  let complete = true;
  value.forEach((_, index) => {
    const load = context.fraction([...path, index, 'load'], { zeroAllowed: false });
    const efficiency = context.fraction([...path, index, 'efficiency'], { zeroAllowed: false });
    check([...path, index, 'efficiency'], efficiency);
    if (load === undefined || efficiency === undefined) complete = false;
    else if (points.some((point) => point.load === load)) {
      context.error('duplicate-load', [...path, index, 'load'], `load ${context.text([...path, index, 'load'])} appears twice in the efficiency table`);
      complete = false;
    } else points.push({ load, efficiency });
  });
  return complete && points.length > 0 ? points.sort((a, b) => a.load - b.load) : undefined;
}

function headerOf(context: ResolveContext, path: CasePath, headers: Map<string, Header>): Header | undefined {
  const id = context.reference(path, ['header']);
  return id === undefined ? undefined : headers.get(id);
}

export function resolveBoilers(context: ResolveContext, headers: Map<string, Header>): FiredBoiler[] {
  return context.entries(['boilers']).flatMap(({ item, path }) => {
    const header = headerOf(context, [...path, 'header'], headers);
    const fuelList = Array.isArray(item.fuels) ? item.fuels : [];
    const fuels = fuelList.map((_, index) => context.reference([...path, 'fuels', index], ['fuel']));
    const steam = context.range([...path, 'steam'], 'massFlow');
    if (steam.max === 0) context.error('out-of-range', [...path, 'steam', 'max'], 'expected a maximum steam flow above zero, found "0"');
    const outlet = header && steamAt(context, [...path, 'outlet_temperature'], header.pressure, 'boiler outlet temperature');
    const efficiency = efficiencyTable(context, [...path, 'efficiency']);
    if (efficiency && efficiency.length > 1 && Array.isArray(item.efficiency) && steam.max > 0 && steam.min / steam.max < efficiency[0].load - 1e-12) {
      // Below the table the efficiency is held at the first point's: the case is extrapolated there.
      const stated = context.raw([...path, 'steam', 'min']) !== undefined;
      context.warn('below-efficiency-table', stated ? [...path, 'steam', 'min'] : [...path, 'efficiency', 0, 'load'],
        `boiler ${String(item.id)} may run down to ${(100 * steam.min / steam.max).toFixed(0)} % load${stated ? '' : ' (no minimum steam stated)'}, below its efficiency table's first point at ${(100 * efficiency[0].load).toFixed(0)} %; there the efficiency is taken as ${(100 * efficiency[0].efficiency).toFixed(1)} %, the first point's. Add a point at the minimum load`);
    }
    const blowdown = blowdownFraction(context, [...path, 'blowdown']);
    if (item.blowdown_to === undefined) context.addDefault([...path, 'blowdown_to'], 'drain', 'blowdown destination not stated: blowdown goes to drain');
    const blowdownTo = liquidDestination(context, [...path, 'blowdown_to'], ['drain'], { kind: 'drain' });
    if (item.can_switch_off === undefined) context.addDefault([...path, 'can_switch_off'], 'true', 'on/off not stated: the optimiser may switch this boiler off');
    const switching = resolveSwitching(context, [...path, 'switching'], item.can_switch_off !== false, `boiler ${String(item.id)}`);
    if (!header || !outlet || !efficiency || blowdown === undefined || !blowdownTo || typeof item.id !== 'string' || fuels.some((fuel) => fuel === undefined) || fuels.length === 0) return [];
    return [{
      id: item.id, kind: 'boiler' as const, header: header.id, fuels: fuels as string[], steam, outlet, efficiency,
      blowdownFraction: blowdown, blowdownTo, canSwitchOff: item.can_switch_off !== false, ...(switching ? { switching } : {}),
    }];
  });
}

export function resolveHeatRecoveryBoilers(context: ResolveContext, headers: Map<string, Header>): HeatRecoveryBoiler[] {
  return context.entries(['heat_recovery_boilers']).flatMap(({ item, path }) => {
    const header = headerOf(context, [...path, 'header'], headers);
    let steam: { min: number; max: number } | undefined;
    if (typeof item.steam === 'string') {
      const fixed = context.amount([...path, 'steam'], 'massFlow');
      steam = fixed === undefined ? undefined : { min: fixed, max: fixed };
    } else if (item.steam !== null && typeof item.steam === 'object') {
      steam = context.range([...path, 'steam'], 'massFlow');
    }
    const outlet = header && steamAt(context, [...path, 'outlet_temperature'], header.pressure, 'outlet temperature');
    const blowdown = blowdownFraction(context, [...path, 'blowdown']);
    if (item.blowdown_to === undefined) context.addDefault([...path, 'blowdown_to'], 'drain', 'blowdown destination not stated: blowdown goes to drain');
    const blowdownTo = liquidDestination(context, [...path, 'blowdown_to'], ['drain'], { kind: 'drain' });
    let firing: HeatRecoveryBoiler['supplementaryFiring'] = null;
    let firingOk = true;
    if (item.supplementary_firing !== undefined) {
      const firingPath = [...path, 'supplementary_firing'];
      const fuel = context.reference([...firingPath, 'fuel'], ['fuel']);
      const maxSteam = context.amount([...firingPath, 'max_steam'], 'massFlow');
      const efficiency = context.fraction([...firingPath, 'efficiency'], { zeroAllowed: false });
      if (fuel === undefined || maxSteam === undefined || efficiency === undefined) firingOk = false;
      else firing = { fuel, maxSteam, efficiency };
    }
    if (!header || !steam || !outlet || blowdown === undefined || !blowdownTo || !firingOk || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'heatRecoveryBoiler' as const, header: header.id, steam, outlet, blowdownFraction: blowdown, blowdownTo, supplementaryFiring: firing }];
  });
}

export function resolveSteamImports(context: ResolveContext, headers: Map<string, Header>): SteamImport[] {
  return context.entries(['steam_imports']).flatMap(({ item, path }) => {
    const header = headerOf(context, [...path, 'header'], headers);
    const price = context.amount([...path, 'price'], 'massPrice');
    const flow = context.range(path, 'massFlow');
    const byEnthalpy = context.raw([...path, 'enthalpy']) !== undefined;
    const delivered = header && (byEnthalpy ? deliveredByEnthalpy(context, [...path, 'enthalpy'], header.pressure) : steamAt(context, [...path, 'temperature'], header.pressure, 'delivered steam temperature'));
    if (!header || price === undefined || !delivered || typeof item.id !== 'string') return [];
    return [{ id: item.id, kind: 'steamImport' as const, header: header.id, price, flow, delivered, ...(byEnthalpy ? { byEnthalpy } : {}) }];
  });
}

/** Steam delivered at a stated enthalpy: superheated, or wet below the saturated vapour enthalpy; never liquid. */
function deliveredByEnthalpy(context: ResolveContext, path: CasePath, pressure: number): (FixedState & { saturated: boolean }) | undefined {
  const h = context.quantity(path, 'specificEnthalpy');
  if (h === undefined) return undefined;
  const state = context.property(path, 'delivered steam', () => statePH(pressure, h));
  if (!state) return undefined;
  if (state.x === null && state.superheat === null) {
    context.error('liquid-import', path, `delivered enthalpy ${context.text(path)} is liquid water at ${context.show(pressure, 'pressure')} (saturated liquid is ${context.show(saturatedLiquid(pressure).h, 'specificEnthalpy')}); a steam import delivers steam`);
    return undefined;
  }
  return { T: state.T, h, saturated: false };
}
