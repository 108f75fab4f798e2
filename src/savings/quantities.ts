// Values written into generated overlays: SI text the case loader reads back
// exactly (flows in t/h, pressures in kPa absolute, temperatures in K).

export function tonnesPerHour(kgPerSecond: number): string {
  return `${+(kgPerSecond * 3.6).toPrecision(8)} t/h`;
}

export function kilopascals(megapascals: number): string {
  return `${+(megapascals * 1000).toPrecision(8)} kPa`;
}

export function kelvin(temperature: number): string {
  return `${+temperature.toPrecision(8)} K`;
}

export function kilowatts(kW: number): string {
  return `${+kW.toPrecision(8)} kW`;
}

export function percent(fraction: number): string {
  return `${+(fraction * 100).toPrecision(8)} %`;
}

/** A flow for a sentence: three significant figures, t/h. */
export function flowWords(kgPerSecond: number): string {
  return `${+(kgPerSecond * 3.6).toPrecision(3)} t/h`;
}
