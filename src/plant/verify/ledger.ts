// The audit's own bookkeeping: streams between control volumes, each with a
// state worked out by the audit, plus the work and heat that cross a volume's
// boundary. Balances of mass, energy and entropy follow from these alone.

/** A flow between two control volumes (or a terminal), at one state. */
export interface AuditStream {
  from: string;
  to: string;
  /** what it is, for messages: "steam", "condensate", ... */
  label: string;
  /** kg/s */
  m: number;
  /** MPa abs */
  p: number;
  /** kJ/kg */
  h: number;
  /** kJ/(kg K) */
  s: number;
}

/** Work or heat crossing a control volume's boundary, kW (>= 0 in its direction). */
export interface Crossing {
  volume: string;
  kind: 'work' | 'heat';
  direction: 'in' | 'out';
  kW: number;
  /**
   * Temperature at which heat crosses, K; null when the case does not give it
   * (fuel and waste heat): the heat then adds no entropy term, so the figure is
   * the least entropy generation consistent with the case.
   */
  temperature: number | null;
}

/** A relation the unit must obey beyond its balances, compared with the solve's figure. */
export interface RelationCheck {
  /** what is compared, e.g. "power", "fuel from the efficiency curve" */
  what: string;
  /** the audit's figure */
  expected: number;
  /** the solve's figure */
  found: number;
  unit: 'kW' | 'kg/s' | 'kJ/kg';
  /** |expected - found| / max(|expected|, scale) */
  relative: number;
  /** largest relative difference accepted */
  tolerance: number;
}

export interface Volume {
  id: string;
  kind: string;
  /** whether its energy must close; false where heat crossing it is defined by its balance */
  energyCloses: boolean;
}

export class Ledger {
  readonly volumes = new Map<string, Volume>();
  readonly streams: AuditStream[] = [];
  readonly crossings: Crossing[] = [];
  readonly checks = new Map<string, RelationCheck[]>();

  volume(id: string, kind: string, energyCloses = true): void {
    if (!this.volumes.has(id)) this.volumes.set(id, { id, kind, energyCloses });
  }

  stream(stream: AuditStream): void {
    this.streams.push(stream);
  }

  cross(crossing: Crossing): void {
    this.crossings.push(crossing);
  }

  /**
   * Compares the audit's figure with the solve's. `scale` keeps a figure near
   * zero (a stopped unit) from turning round-off into a large relative error.
   */
  check(volume: string, what: string, expected: number, found: number, unit: RelationCheck['unit'], tolerance: number, scale: number): void {
    const relative = Math.abs(expected - found) / Math.max(Math.abs(expected), scale, 1e-9);
    const list = this.checks.get(volume) ?? [];
    list.push({ what, expected, found, unit, relative, tolerance });
    this.checks.set(volume, list);
  }

  into(id: string): AuditStream[] {
    return this.streams.filter((stream) => stream.to === id);
  }

  outOf(id: string): AuditStream[] {
    return this.streams.filter((stream) => stream.from === id);
  }
}
