// The `costs` section: unit costs for savings measures in the site currency.
// Each one left out takes a default with its source (or "common practice, no
// source") recorded for `check --verbose`. Every estimate is a screening one.
import { parseYears } from './money.js';
import type { DefaultApplied, UnitCosts } from './plantTypes.js';
import { displayPath } from './issue.js';
import type { ResolveContext } from './resolveContext.js';

/** The accuracy class every capital estimate carries. */
export const ACCURACY_CLASS = 'screening estimate, -30 % to +50 % (order of magnitude, before any vendor quote)';

interface CostRule {
  key: string;
  /** denominators accepted, each with its factor to the internal denominator */
  per: Record<string, number>;
  /** what an example looks like, after the currency */
  example: string;
  /** default in the internal denominator, or null for the size curve */
  fallback: number | null;
  reason: string;
}

const TR_KW = (12_000 * 1.05505585262) / 3600;
const KLB_H_KG_S = 453.59237 / 3600;

// Installed-cost defaults. Only the turbine has a published figure; the rest
// are from memory of common practice and say so.
const RULES: Record<Exclude<keyof UnitCosts, 'lifeYears' | 'discountRate' | 'accuracy' | 'defaults'>, CostRule> = {
  backPressureTurbinePerKW: {
    key: 'back_pressure_turbine', per: { kW: 1, MW: 1e-3 }, example: '600 USD/kW', fallback: null,
    reason: 'the size curve of US DOE Steam Tip Sheet #20 ("Replace Pressure-Reducing Valves with Backpressure Turbogenerators"): equipment with switchgear about $700/kW at 50 kW to $200/kW at 2,000 kW (log-linear between), installation 75 % of equipment',
  },
  absorptionPerKWCooling: {
    key: 'absorption_chilling', per: { TR: 1 / TR_KW, ton: 1 / TR_KW, kW: 1 }, example: '1500 USD/TR', fallback: 1500 / TR_KW,
    reason: '1,500 per ton of refrigeration installed (common practice, no source; from memory)',
  },
  trapRepair: {
    key: 'trap_repair', per: { trap: 1 }, example: '350 USD/trap', fallback: 350,
    reason: '350 per failed trap replaced, parts and labour (common practice, no source; from memory)',
  },
  condensateReturnPerKgS: {
    key: 'condensate_return', per: { 't/h': 3.6, 'klb/h': 1 / KLB_H_KG_S }, example: '20000 USD/(t/h)', fallback: 20_000 * 3.6,
    reason: '20,000 per t/h of condensate returned: piping, receiver and pump (common practice, no source; from memory)',
  },
  insulationPerMetre: {
    key: 'insulation', per: { m: 1, ft: 1 / 0.3048 }, example: '120 USD/m', fallback: 120,
    reason: '120 per m of pipe insulated, 2 to 6 inch pipe (common practice, no source; from memory)',
  },
  flashTank: {
    key: 'flash_tank', per: { '': 1 }, example: '30000 USD', fallback: 30_000,
    reason: '30,000 for a packaged flash tank with piping, trap and level control, installed (common practice, no source; from memory)',
  },
  makeupPreheater: {
    key: 'makeup_preheater', per: { '': 1 }, example: '25000 USD', fallback: 25_000,
    reason: '25,000 for a blowdown heat exchanger warming makeup water, with its piping, installed (common practice, no source; from memory)',
  },
  turbineDrivePerKW: {
    key: 'turbine_drive', per: { kW: 1, MW: 1e-3, hp: 1 / 0.745699872 }, example: '400 USD/kW', fallback: 400,
    reason: '400 per kW of shaft power for a single-stage steam turbine drive with its piping, installed (common practice, no source; from memory)',
  },
  motorDrivePerKW: {
    key: 'motor_drive', per: { kW: 1, MW: 1e-3, hp: 1 / 0.745699872 }, example: '150 USD/kW', fallback: 150,
    reason: '150 per kW of shaft power for an electric motor with its starter and supply, installed (common practice, no source; from memory)',
  },
};

/** The installed cost of a back-pressure turbine generator of `kW` from the DOE Tip Sheet #20 curve, in USD. */
export function tipSheet20TurbineCost(kW: number): number {
  const clamped = Math.min(Math.max(kW, 50), 2000);
  const t = Math.log(clamped / 50) / Math.log(2000 / 50);
  const equipmentPerKW = Math.exp(Math.log(700) + t * (Math.log(200) - Math.log(700)));
  return kW * equipmentPerKW * 1.75;
}

function parseUnitCost(text: string, currency: string, rule: CostRule): { ok: true; value: number } | { ok: false; message: string } {
  const match = /^\s*([$€£]|[A-Z]{3})?\s*([0-9][0-9,_]*(?:\.[0-9]*)?(?:[eE][-+]?[0-9]+)?)\s*([$€£]|[A-Z]{3})?\s*(?:\/\s*\(?\s*([^)]*?)\s*\)?)?\s*$/.exec(text);
  const expected = `expected a cost such as "${rule.example.replace('USD', currency)}"${Object.keys(rule.per).filter((per) => per !== '').length > 0 ? ` (per ${Object.keys(rule.per).join(' or per ')})` : ''}`;
  if (!match || (match[1] === undefined) === (match[3] === undefined)) return { ok: false, message: `${expected}, found "${text}"` };
  const symbol = match[1] ?? match[3];
  const code = symbol === '$' ? 'USD' : symbol === '€' ? 'EUR' : symbol === '£' ? 'GBP' : symbol;
  if (code !== currency) return { ok: false, message: `expected a cost in ${currency} (the site currency), found "${text}" in ${code}` };
  const per = (match[4] ?? '').replace(/\s+/g, '');
  const factor = Object.entries(rule.per).find(([unit]) => unit.toLowerCase() === per.toLowerCase())?.[1];
  if (factor === undefined) return { ok: false, message: `${expected}, found "${text}" per ${per === '' ? 'nothing' : per}` };
  const value = Number(match[2].replace(/[,_]/g, ''));
  if (!(value >= 0 && value < 1e12)) return { ok: false, message: `expected a cost from 0 to 1e12 ${currency}, found "${text}"` };
  return { ok: true, value: value * factor };
}

export function resolveCosts(context: ResolveContext): UnitCosts {
  const currency = context.currency || 'USD';
  const costs = { defaults: [] as DefaultApplied[] } as UnitCosts;
  // Kept apart from the plant's defaults: they change no balance, only the savings estimates.
  const addDefault = (path: (string | number)[], value: string, reason: string): void => void costs.defaults.push({ path: displayPath(path), value, reason });
  const foreign = currency !== 'USD' ? ` The default is in USD and is taken as ${currency} one for one: give the cost in ${currency}.` : '';
  for (const [field, rule] of Object.entries(RULES) as [keyof typeof RULES, CostRule][]) {
    const path = ['costs', rule.key];
    const raw = context.raw(path);
    if (typeof raw === 'string') {
      const parsed = parseUnitCost(raw, currency, rule);
      if (parsed.ok) {
        costs[field] = parsed.value as never;
        continue;
      }
      context.error('bad-cost', path, parsed.message);
    } else {
      addDefault(path, rule.fallback === null ? 'DOE Tip Sheet #20 size curve' : rule.example.replace(/^[0-9]+/, (n) => n).replace('USD', currency), `cost not stated: ${rule.reason}.${foreign}`);
    }
    costs[field] = rule.fallback as never;
  }
  const lifeRaw = context.raw(['costs', 'life']);
  costs.lifeYears = 15;
  if (lifeRaw === undefined) addDefault(['costs', 'life'], '15 years', 'life of measures not stated: 15 years (common practice, no source)');
  else {
    const life = parseYears(lifeRaw);
    if (life.ok) costs.lifeYears = life.years;
    else context.error('bad-life', ['costs', 'life'], life.message);
  }
  costs.discountRate = 0.1;
  if (context.raw(['costs', 'discount_rate']) === undefined) addDefault(['costs', 'discount_rate'], '10 %', 'discount rate not stated: 10 % a year (common practice, no source)');
  else costs.discountRate = context.fraction(['costs', 'discount_rate']) ?? 0.1;
  costs.accuracy = ACCURACY_CLASS;
  return costs;
}
