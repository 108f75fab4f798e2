// Turns the text a user gives (`--p "10 barg" --x 1`, or one JSON line of a batch)
// into a property call. Only dispatch lives here; the physics is in src/properties.
import { parseQuantity, type ParseOptions, type QuantityKind } from '../units/index.js';
import {
  PropertyRangeError,
  statePH,
  statePS,
  statePT,
  statePX,
  stateTX,
  type SteamState,
} from '../properties/index.js';

/** The inputs of one state request, as text with units (or bare numbers in SI). */
export interface StateInputs {
  p?: unknown;
  T?: unknown;
  h?: unknown;
  s?: unknown;
  x?: unknown;
}

export type StateOutcome = { ok: true; state: SteamState } | { ok: false; message: string };

const SECOND_INPUTS = ['T', 'h', 's', 'x'] as const;
const KIND_OF: Record<'p' | 'T' | 'h' | 's', QuantityKind> = {
  p: 'pressure',
  T: 'temperature',
  h: 'specificEnthalpy',
  s: 'specificEntropy',
};
const EXAMPLE_OF: Record<'p' | 'T' | 'h' | 's', string> = {
  p: '"10 barg" or "3 MPa"',
  T: '"300 degC" or "573.15 K"',
  h: '"2800 kJ/kg" or "1200 Btu/lb"',
  s: '"6.5 kJ/(kg K)"',
};
const ACCEPTED = 'give p with one of T, h, s or x, or T with x';

/** Parses and evaluates one request; never throws for bad input. */
export function evaluateState(inputs: StateInputs, options: ParseOptions = {}): StateOutcome {
  const given = (['p', ...SECOND_INPUTS] as const).filter((key) => inputs[key] !== undefined && inputs[key] !== null);
  const seconds = given.filter((key) => key !== 'p');
  const hasP = given.includes('p');
  const byTemperature = !hasP && seconds.length === 2 && seconds.includes('T') && seconds.includes('x');
  if (!byTemperature) {
    if (!hasP) return fail(`no pressure given; ${ACCEPTED}`);
    if (seconds.length === 0) return fail(`only a pressure given; ${ACCEPTED}`);
    if (seconds.length > 1) return fail(`${seconds.join(' and ')} given together; ${ACCEPTED}`);
  }

  const values: Partial<Record<'p' | 'T' | 'h' | 's' | 'x', number>> = {};
  for (const key of given) {
    const parsed = key === 'x' ? readQuality(inputs.x) : readQuantity(key, inputs[key], options);
    if (!parsed.ok) return parsed;
    values[key] = parsed.value;
  }

  try {
    if (byTemperature) return { ok: true, state: stateTX(values.T!, values.x!) };
    const p = values.p!;
    if (values.T !== undefined) return { ok: true, state: statePT(p, values.T) };
    if (values.h !== undefined) return { ok: true, state: statePH(p, values.h) };
    if (values.s !== undefined) return { ok: true, state: statePS(p, values.s) };
    return { ok: true, state: statePX(p, values.x!) };
  } catch (error) {
    if (error instanceof PropertyRangeError) return fail(error.message);
    throw error;
  }
}

function readQuantity(
  key: 'p' | 'T' | 'h' | 's',
  raw: unknown,
  options: ParseOptions,
): { ok: true; value: number } | { ok: false; message: string } {
  // Bare numbers are taken in the internal units (MPa, K, kJ/kg, kJ/(kg K)), for
  // batch files written by programs.
  if (typeof raw === 'number') {
    return Number.isFinite(raw) ? { ok: true, value: raw } : fail(`${key} must be a finite number, found ${raw}`);
  }
  if (typeof raw !== 'string') return fail(`${key} must be a quantity such as ${EXAMPLE_OF[key]}, found ${JSON.stringify(raw)}`);
  const parsed = parseQuantity(raw, KIND_OF[key], options);
  return parsed.ok ? { ok: true, value: parsed.value } : fail(`${key}: ${parsed.message}`);
}

function readQuality(raw: unknown): { ok: true; value: number } | { ok: false; message: string } {
  const value = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : raw;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    return fail(`x must be a vapour quality between 0 and 1, found ${JSON.stringify(raw)}`);
  }
  if (value < 0 || value > 1) return fail(`x must be a vapour quality between 0 and 1, found ${value}`);
  return { ok: true, value };
}

function fail(message: string): { ok: false; message: string } {
  return { ok: false, message };
}

/** The SI record of a state, as `--json` and `--batch` write it. */
export function stateRecord(state: SteamState): Record<string, number | null> {
  return {
    p_MPa: state.p,
    T_K: state.T,
    h_kJ_kg: state.h,
    s_kJ_kgK: state.s,
    v_m3_kg: state.v,
    cp_kJ_kgK: state.cp,
    x: state.x,
    region: state.region,
    Tsat_K: state.Tsat,
    superheat_K: state.superheat,
  };
}
