// Headers, and the superheated-or-saturated steam states fixed at a header's pressure.
import { CRITICAL_PRESSURE, saturatedVapour, saturationTemperature, statePH, statePT } from '../properties/index.js';
import type { CasePath } from './issue.js';
import type { FixedState, Header, HeaderState } from './plantTypes.js';
import type { ResolveContext } from './resolveContext.js';

/** A pressure in MPa abs, checked to lie between atmospheric and the critical pressure. */
export function steamPressure(context: ResolveContext, path: CasePath, options: { belowAtmosphereAllowed: boolean }): number | undefined {
  const pressure = context.quantity(path, 'pressure');
  if (pressure === undefined) return undefined;
  if (pressure >= CRITICAL_PRESSURE) {
    context.error('outside-if97', path, `pressure ${context.text(path)} is at or above the critical pressure ${context.show(CRITICAL_PRESSURE, 'pressure')}; a steam header or vessel must be below it`);
    return undefined;
  }
  if (pressure <= 0.000611657) {
    context.error('outside-if97', path, `pressure ${context.text(path)} is below the triple-point pressure 611.657 Pa absolute`);
    return undefined;
  }
  if (!options.belowAtmosphereAllowed && pressure < context.atmosphericPressure) {
    context.error('out-of-range', path, `pressure ${context.text(path)} is below atmospheric (${context.show(context.atmosphericPressure, 'pressure')}); only a condenser runs under vacuum`);
    return undefined;
  }
  return pressure;
}

/** A temperature that must be above saturation at `pressure`, or the word "saturated". */
export function steamAt(context: ResolveContext, path: CasePath, pressure: number, what: string): (FixedState & { saturated: boolean }) | undefined {
  if (context.raw(path) === 'saturated') {
    const vapour = context.property(path, what, () => saturatedVapour(pressure));
    return vapour && { T: vapour.T, h: vapour.h, saturated: true };
  }
  const temperature = context.quantity(path, 'temperature');
  if (temperature === undefined) return undefined;
  const saturation = saturationTemperature(pressure);
  if (temperature <= saturation) {
    context.error('below-saturation', path,
      `${what} ${context.text(path)} is at or below saturation (${context.show(saturation, 'temperature')} at ${context.show(pressure, 'pressure')}); give a higher temperature, or "saturated"`);
    return undefined;
  }
  const state = context.property(path, what, () => statePT(pressure, temperature));
  return state && { T: state.T, h: state.h, saturated: false };
}

function headerState(context: ResolveContext, path: CasePath, pressure: number, saturation: number): HeaderState | undefined {
  const state = context.raw([...path, 'state']);
  if (state === 'floating') return { kind: 'floating' };
  if (state !== 'controlled') return undefined;
  if (context.raw([...path, 'temperature']) !== undefined) {
    const temperaturePath = [...path, 'temperature'];
    const temperature = context.quantity(temperaturePath, 'temperature');
    if (temperature === undefined) return undefined;
    if (temperature <= saturation) {
      context.error('below-saturation', temperaturePath,
        `header temperature ${context.text(temperaturePath)} is at or below saturation (${context.show(saturation, 'temperature')} at ${context.show(pressure, 'pressure')}); give a higher temperature, or make the header floating`);
      return undefined;
    }
    const steam = context.property(temperaturePath, 'header state', () => statePT(pressure, temperature));
    return steam && { kind: 'controlled', specifiedBy: 'temperature', T: steam.T, h: steam.h };
  }
  const enthalpyPath = [...path, 'enthalpy'];
  const enthalpy = context.quantity(enthalpyPath, 'specificEnthalpy');
  if (enthalpy === undefined) return undefined;
  const vapour = saturatedVapour(pressure);
  if (enthalpy <= vapour.h) {
    context.error('below-saturation', enthalpyPath,
      `header enthalpy ${context.text(enthalpyPath)} is at or below that of saturated steam (${context.show(vapour.h, 'specificEnthalpy')} at ${context.show(pressure, 'pressure')}); give a higher enthalpy, or make the header floating`);
    return undefined;
  }
  const steam = context.property(enthalpyPath, 'header state', () => statePH(pressure, enthalpy));
  return steam && { kind: 'controlled', specifiedBy: 'enthalpy', T: steam.T, h: steam.h };
}

export function resolveHeaders(context: ResolveContext): Header[] {
  return context.entries(['headers']).flatMap(({ item, path }) => {
    const pressure = steamPressure(context, [...path, 'pressure'], { belowAtmosphereAllowed: false });
    if (pressure === undefined || typeof item.id !== 'string') return [];
    const saturation = saturationTemperature(pressure);
    const state = headerState(context, path, pressure, saturation);
    if (item.venting === undefined) {
      context.addDefault([...path, 'venting'], 'forbidden', 'venting not stated: steam may not be vented from this header');
    }
    let heatLoss = 0;
    if (item.heat_loss !== undefined) heatLoss = context.amount([...path, 'heat_loss'], 'power') ?? 0;
    if (!state) return [];
    return [{
      id: item.id,
      kind: 'header' as const,
      name: typeof item.name === 'string' ? item.name : item.id,
      pressure,
      saturationTemperature: saturation,
      state,
      venting: item.venting === 'allowed',
      heatLoss,
    }];
  });
}
