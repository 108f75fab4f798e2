// The case's meters (flow meters, thermometers, power meters), read with their
// positions so that a meter naming no stream or turbine can be located by the
// reconciliation (which knows the streams).
import type { CasePath, Issue } from './issue.js';
import { makeIssue, parseYaml } from './yamlSource.js';
import { ResolveContext } from './resolveContext.js';
import { BAR_KPA, PSI_KPA } from '../units/exactFactors.js';

export type MeteredFlow = 'steam' | 'feedwater' | 'blowdown' | 'condensate' | 'letdown' | 'spray' | 'extraction' | 'exhaust' | 'vent' | 'makeup' | 'heating_steam' | 'flash_vapour' | 'flash_liquid';

/** What a meter reads: a flow word, `temperature` (a thermometer), `pressure` (a header's gauge), `power` (a turbine's output) or `fuel` (a fired boiler's fuel, energy per hour). */
export type MeterMeasure = MeteredFlow | 'temperature' | 'pressure' | 'power' | 'fuel';

export interface Meter {
  tag: string;
  name: string;
  /** unit, header, flash tank or deaerator whose stream it measures; for a pressure gauge, the header; for a power meter, the turbine; for a fuel meter, the boiler */
  unit: string;
  measures: MeterMeasure;
  /** the stream's other end, where the unit has several of that kind */
  to: string | null;
  /** expanded uncertainty as a fraction of the reading, or null */
  relativeUncertainty: number | null;
  /** expanded uncertainty as a flow, kg/s (a thermometer's as a temperature difference, K; a pressure gauge's as a pressure difference, MPa; a power or fuel meter's in kW), or null */
  absoluteUncertainty: number | null;
  /** two-sided confidence of the stated uncertainty, e.g. 0.95 */
  confidence: number;
  /** where the meter is in the case */
  path: CasePath;
  /** an issue located at one of the meter's keys */
  issueAt(key: string, code: string, message: string): Issue;
}

/**
 * The meters of a case's text (the case itself loaded without errors first;
 * the schema has checked their shape). Issues: a duplicate tag, an
 * uncertainty of zero or below, a confidence outside (0 %, 100 %).
 */
export function resolveMeters(text: string): { meters: Meter[]; issues: Issue[] } {
  const parsed = parseYaml(text);
  if (!parsed.ok) return { meters: [], issues: parsed.issues };
  const source = parsed.source;
  const context = new ResolveContext(source);
  const meters: Meter[] = [];
  const tags = new Map<string, CasePath>();
  for (const { item, path } of context.entries(['meters'])) {
    const tag = typeof item.tag === 'string' ? item.tag : '';
    const unit = typeof item.unit === 'string' ? item.unit : '';
    if (tags.has(tag)) {
      context.error('duplicate-tag', [...path, 'tag'], `meter tag "${tag}" is used twice; each meter needs its own tag`);
      continue;
    }
    tags.set(tag, path);
    const uncertainty = uncertaintyOf(context, [...path, 'uncertainty'], item.measures === 'temperature' ? 'temperature' : item.measures === 'pressure' ? 'pressure' : item.measures === 'power' || item.measures === 'fuel' ? 'power' : 'flow');
    let confidence = 0.95;
    if (item.confidence !== undefined) {
      const value = context.quantity([...path, 'confidence'], 'percent');
      if (value !== undefined && (value <= 0 || value >= 1)) {
        context.error('percent-range', [...path, 'confidence'], `expected a confidence above 0 % and below 100 %, found "${context.text([...path, 'confidence'])}"`);
      } else if (value !== undefined) {
        confidence = value;
      }
    }
    if (!uncertainty) continue;
    meters.push({
      tag,
      name: typeof item.name === 'string' ? item.name : tag,
      unit,
      measures: item.measures as MeterMeasure,
      to: typeof item.to === 'string' ? item.to : null,
      ...uncertainty,
      confidence,
      path,
      issueAt: (key, code, message) => makeIssue(source, 'error', code, [...path, key], message),
    });
  }
  return { meters, issues: context.issues };
}

function uncertaintyOf(context: ResolveContext, path: CasePath, reads: 'flow' | 'temperature' | 'pressure' | 'power'): { relativeUncertainty: number | null; absoluteUncertainty: number | null } | null {
  const text = context.text(path);
  if (text === undefined) return null;
  const relative = /%\s*$/.test(text);
  if (reads === 'temperature') {
    // A share of a temperature depends on its scale (degC, K): only a difference means anything.
    if (relative) {
      context.error('uncertainty-kind', path, `expected a thermometer's uncertainty as a temperature difference such as "1 K" or "2 degF", found "${text}"`);
      return null;
    }
    const value = context.quantity(path, 'temperatureDifference');
    if (value === undefined) return null;
    if (!(value > 0)) {
      context.error('uncertainty-not-positive', path, `expected an uncertainty above zero (such as "1 K"), found "${text}"`);
      return null;
    }
    return { relativeUncertainty: null, absoluteUncertainty: value };
  }
  if (reads === 'pressure' && !relative) return pressureDifference(context, path, text);
  const value = context.quantity(path, relative ? 'percent' : reads === 'power' ? 'power' : 'massFlow');
  if (value === undefined) return null;
  if (!(value > 0)) {
    context.error('uncertainty-not-positive', path, `expected an uncertainty above zero (such as "2 %" or ${reads === 'power' ? '"20 kW"' : '"0.5 t/h"'}), found "${text}"`);
    return null;
  }
  return relative ? { relativeUncertainty: value, absoluteUncertainty: null } : { relativeUncertainty: null, absoluteUncertainty: value };
}

/**
 * A pressure gauge's uncertainty as a difference of pressures, MPa: "0.1 bar",
 * "2 psi", "5 kPa". Here a bare bar or psi is a difference (elsewhere the case
 * must say bara or barg); a gauge unit counts from the atmosphere, so it is
 * refused.
 */
function pressureDifference(context: ResolveContext, path: CasePath, text: string): { relativeUncertainty: null; absoluteUncertainty: number } | null {
  const match = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*(bar|psi|kPa|MPa|Pa)\s*$/i.exec(text);
  if (!match) {
    context.error('uncertainty-kind', path, `expected a pressure gauge's uncertainty as a pressure difference such as "0.1 bar", "2 psi" or "5 kPa", or as a share such as "0.5 %", found "${text}"`);
    return null;
  }
  const perUnit: Record<string, number> = { bar: BAR_KPA / 1000, psi: PSI_KPA / 1000, kpa: 1e-3, mpa: 1, pa: 1e-6 };
  const value = Number(match[1]) * perUnit[match[2].toLowerCase()];
  if (!(value > 0)) {
    context.error('uncertainty-not-positive', path, `expected an uncertainty above zero (such as "0.1 bar"), found "${text}"`);
    return null;
  }
  return { relativeUncertainty: null, absoluteUncertainty: value };
}
