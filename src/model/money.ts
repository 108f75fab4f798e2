// Sums of money and years, as projects write them: "1.2e6 EUR", "$250,000",
// "20000 EUR/yr", "15 years". Kept apart from src/units, whose prices are
// always per unit of energy, mass or power.

const SYMBOLS: Readonly<Record<string, string>> = { $: 'USD', '€': 'EUR', '£': 'GBP' };
const NUMBER = '([-+]?(?:[0-9][0-9,_]*(?:\\.[0-9]*)?|\\.[0-9]+)(?:[eE][-+]?[0-9]+)?)';
const PER_YEAR = '(?:\\s*/\\s*(?:yr|year|a))';
const SUFFIX = new RegExp(`^\\s*${NUMBER}\\s*([A-Z]{3}|[$€£])${PER_YEAR}?\\s*$`);
const PREFIX = new RegExp(`^\\s*([$€£]|[A-Z]{3})\\s*${NUMBER}${PER_YEAR}?\\s*$`);

export type MoneyResult = { ok: true; value: number; currency: string } | { ok: false; message: string };

/**
 * An amount of money in the site currency; perYear requires "/yr" (or
 * "/year", "/a") and a plain amount must not have one.
 */
export function parseMoney(text: string, siteCurrency: string, perYear: boolean): MoneyResult {
  const example = perYear ? `"20000 ${siteCurrency}/yr"` : `"1.2e6 ${siteCurrency}"`;
  const suffix = SUFFIX.exec(text);
  const prefix = suffix ? null : PREFIX.exec(text);
  if (!suffix && !prefix) return { ok: false, message: `expected an amount of money such as ${example}, found "${text}"` };
  const [numberText, mark] = suffix ? [suffix[1], suffix[2]] : [prefix![2], prefix![1]];
  const hasPerYear = new RegExp(`${PER_YEAR}\\s*$`).test(text);
  if (perYear !== hasPerYear) {
    return { ok: false, message: perYear ? `expected an amount per year such as ${example}, found "${text}"` : `expected a one-off amount such as ${example}, found "${text}" (per year)` };
  }
  const currency = SYMBOLS[mark] ?? mark;
  if (siteCurrency !== '' && currency !== siteCurrency) {
    return { ok: false, message: `expected an amount in ${siteCurrency} (the site currency), found "${text}" in ${currency}` };
  }
  const value = Number(numberText.replace(/[,_]/g, ''));
  if (!Number.isFinite(value)) return { ok: false, message: `expected a finite amount, found "${text}"` };
  return { ok: true, value, currency };
}

/** A duration in whole or part years: 15, "15 years", "15 yr", "15 a". */
export function parseYears(value: unknown): { ok: true; years: number } | { ok: false; message: string } {
  const match = typeof value === 'number' ? [String(value), String(value)] : typeof value === 'string' ? /^\s*([0-9]+(?:\.[0-9]*)?)\s*(?:years?|yrs?|a)\s*$/.exec(value) : null;
  if (!match) return { ok: false, message: `expected a number of years such as 15 or "15 years", found ${JSON.stringify(value)}` };
  const years = Number(match[1]);
  if (!(years > 0 && years <= 100)) return { ok: false, message: `expected a life from above 0 to 100 years, found ${JSON.stringify(value)}` };
  return { ok: true, years };
}

/** Hours a year: a number (3000) or a quantity in hours ("3000 h", "3000 hours", "3000 h/yr"). */
export function parseHours(value: unknown): { ok: true; hours: number } | { ok: false; message: string } {
  const match = typeof value === 'number' ? [String(value), String(value)] : typeof value === 'string' ? /^\s*([0-9][0-9,]*(?:\.[0-9]*)?)\s*(?:h|hr|hrs|hours?)(?:\s*\/\s*(?:yr|year|a))?\s*$/.exec(value) : null;
  const number = match ? Number(match[1].replace(/,(?=\d{3}(\D|$))/g, '')) : NaN;
  if (!match || !Number.isFinite(number)) return { ok: false, message: `expected hours a year such as 3000 or "3000 h", found ${JSON.stringify(value)}` };
  if (!(number > 0 && number <= 8784)) return { ok: false, message: `expected hours a year above 0 and at most 8784 (a leap year), found ${JSON.stringify(value)}` };
  return { ok: true, hours: number };
}
