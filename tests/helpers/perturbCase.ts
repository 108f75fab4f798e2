// Perturbed copies of a demo case: quantities scaled by a factor in place, for
// fuzz tests of the layers after loading.

/** Offsets of the numbers of every quantity in the text (number followed by a common unit). */
export function quantitySites(text: string): number[] {
  const quantity = /(?<=: |\{ |, |min: |max: )(\d+(?:\.\d+)?)(?= ?(?:t\/h|MW|kW|barg|degC|%|EUR\/GJ|EUR\/MWh|kJ\/kg))/g;
  return [...text.matchAll(quantity)].map((match) => match.index!);
}

export interface Edit {
  site: number;
  factor: number;
}

/** The text with each chosen quantity scaled; one factor per place. */
export function scaledCase(text: string, sites: readonly number[], edits: readonly Edit[]): string {
  let out = text;
  const factors = new Map(edits.map((edit) => [sites[edit.site % sites.length], edit.factor]));
  // Right to left, so earlier offsets stay valid.
  for (const [at, factor] of [...factors].sort((a, b) => b[0] - a[0])) {
    const number = /^\d+(?:\.\d+)?/.exec(out.slice(at))![0];
    out = out.slice(0, at) + String(Number((Number(number) * factor).toPrecision(4))) + out.slice(at + number.length);
  }
  return out;
}
