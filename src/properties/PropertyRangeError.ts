/**
 * A state the property engine refuses: outside IAPWS-IF97, or in a region
 * (3 or 5) that steamwright does not implement. The message is one line that
 * names the value, the limit and the unit, so a command line can print it as is.
 */
export class PropertyRangeError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PropertyRangeError';
  }
}

/** A number as people write it in a message: at most six significant digits. */
export function formatValue(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(6)));
}

/** Refuses NaN and infinities before any comparison can silently pass them. */
export function requireFinite(quantity: string, value: number, unit: string): void {
  if (!Number.isFinite(value)) {
    throw new PropertyRangeError(`${quantity} must be a finite number in ${unit}, found ${String(value)}`);
  }
}
