// Splits "42 barg", "42barg", "1,200 lb/h", "-40 degF", "2.5e3 kPa" and
// "$9/GJ" into a number and a unit. Numbers: an optional sign (ASCII or
// U+2212 minus), digits with an optional decimal point, an optional exponent.
// A comma is read only as a thousands separator between groups of exactly
// three digits ("1,200", "12,500,000"); anything else with a comma ("1,5",
// "1,20") is refused rather than guessed, since "1,5" is 1.5 in much of the
// world. A decimal comma is never accepted.

export type SplitQuantity =
  | { readonly status: 'noNumber' }
  | { readonly status: 'badNumber'; readonly numberText: string }
  | { readonly status: 'ok'; readonly value: number; readonly numberText: string; readonly unitText: string };

const leadingNumber = /^[+\-−]?[0-9.,]*[0-9][0-9.,]*(?:[eE][+\-−]?[0-9]+)?/;
const wellFormedNumber = /^[+\-−]?(?:[0-9]{1,3}(?:,[0-9]{3})+|[0-9]+)?(?:\.[0-9]*)?(?:[eE][+\-−]?[0-9]+)?$/;
const leadingCurrency = /^([$€£]|[A-Z]{3})\s*(?=[+\-−]?[.0-9])/;

function splitPlain(text: string): SplitQuantity {
  const match = leadingNumber.exec(text);
  if (match === null) return { status: 'noNumber' };
  const numberText = match[0];
  if (!wellFormedNumber.test(numberText)) return { status: 'badNumber', numberText };
  const value = Number(numberText.replace(/,/g, '').replace(/−/g, '-'));
  return { status: 'ok', value, numberText, unitText: text.slice(numberText.length).trim() };
}

/** Splits trimmed quantity text into its number and unit. */
export function splitQuantity(text: string): SplitQuantity {
  const currency = leadingCurrency.exec(text);
  if (currency === null) return splitPlain(text);
  // "$9/GJ": the currency moves behind the number, giving the unit "$/GJ".
  const rest = splitPlain(text.slice(currency[0].length));
  if (rest.status !== 'ok') return rest;
  if (!rest.unitText.startsWith('/')) return { status: 'noNumber' };
  return { ...rest, unitText: currency[1] + rest.unitText };
}
