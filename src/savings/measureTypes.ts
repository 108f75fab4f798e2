// A savings measure: an overlay on the case (what a planner would write as a
// project), with its capital estimate and why it was proposed.

export type MeasureKind =
  | 'ventChiller'
  | 'ventTurbine'
  | 'ventSetPoint'
  | 'ventBackPressure'
  | 'letdownTurbine'
  | 'letdownReplacement'
  | 'condensateReturn'
  | 'blowdownFlash'
  | 'blowdownPreheater'
  | 'condensateFlash'
  | 'trapRepair'
  | 'turbineDrive'
  | 'motorDrive'
  | 'insulation';

export interface Measure {
  /** id, usable as a project id */
  id: string;
  kind: MeasureKind;
  /** one line, e.g. "back-pressure turbine generator beside prv_1 (hp to lp)" */
  title: string;
  /** what changes physically, in words, with its size */
  change: string;
  /** for a vent: why it vents (from the solved balance) and the ways to end it */
  cause: string | null;
  ways: string[];
  /** ids of the units and headers the overlay touches, to say which measures interact */
  touches: string[];
  /**
   * Measures with the same value are alternatives (ways to end one vent, a
   * turbine beside or in place of one letdown): the roadmap applies only the
   * best ranked of them. null when the measure has no alternative.
   */
  alternativeOf: string | null;
  /** capital, site currency */
  capital: number;
  /** how the capital was estimated */
  capitalBasis: string;
  lifeYears: number;
  discountRate: number;
  fixedOmPerYear: number;
  /** the overlay, exactly as it would be written under a project's `changes` */
  changes: Record<string, unknown>;
}

/** A measure written as a case project (the raw YAML object). */
export function measureAsProject(measure: Measure, currency: string): Record<string, unknown> {
  return {
    id: measure.id,
    name: measure.title,
    capital_cost: `${Math.round(measure.capital)} ${currency}`,
    life: measure.lifeYears,
    discount_rate: `${+(measure.discountRate * 100).toFixed(6)} %`,
    ...(measure.fixedOmPerYear > 0 ? { fixed_om: `${Math.round(measure.fixedOmPerYear)} ${currency}/yr` } : {}),
    changes: measure.changes,
  };
}
