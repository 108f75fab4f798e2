// Currency in front of a price's slash: "$", "€" and "£" or an ISO 4217
// code in capitals ("USD", "EUR"). Codes are checked against the runtime's
// own ISO 4217 list so that "BTU/lb" can never read as a price in "BTU".
// Lower-case codes are refused: "kgs" is also the code of the Kyrgyz som.

const symbols: Readonly<Record<string, string>> = { $: 'USD', '€': 'EUR', '£': 'GBP' };

const isoCodes: ReadonlySet<string> | undefined =
  typeof Intl.supportedValuesOf === 'function' ? new Set(Intl.supportedValuesOf('currency')) : undefined;

/** The ISO 4217 code for a currency symbol or code, or undefined if it is neither. */
export function currencyCode(text: string): string | undefined {
  const fromSymbol = symbols[text];
  if (fromSymbol !== undefined) return fromSymbol;
  if (!/^[A-Z]{3}$/.test(text)) return undefined;
  if (isoCodes !== undefined && !isoCodes.has(text)) return undefined;
  return text;
}

/** The usual way to write a currency in a unit: "$" for USD, "€" for EUR, "£" for GBP, the code otherwise. */
export function currencyMark(code: string): string {
  const entry = Object.entries(symbols).find(([, value]) => value === code);
  return entry === undefined ? code : entry[0];
}
