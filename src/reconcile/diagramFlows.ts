// What the balance diagram needs to be drawn from a reconciliation: each
// stream of a solved result with its reconciled flow, and the suspect meters
// with the stream each sits on. The report draws; this only matches streams.
import { streamIds, type PlantResult, type StreamResult } from '../plant/index.js';
import type { ReconcileOutcome } from './reconcilePlant.js';

export interface ReconciledStream {
  /** `from->to:kind` (with `#n` where several share it), as in the reconciliation */
  id: string;
  from: string;
  to: string;
  kind: string;
  /** the optimiser's flow in the solved result, kg/s */
  solved: number;
  /** reconciled flow (suspects set aside, zero or more), kg/s; null where the meters do not determine it */
  reconciled: number | null;
  /** standard deviation of the reconciled flow, kg/s; null where not observable */
  sigma: number | null;
  /** tag of the meter on this stream, or null */
  meter: string | null;
  /** held at zero by the bound */
  atBound: boolean;
}

export interface SuspectOnStream {
  tag: string;
  /** 1 for the first meter serial elimination set aside */
  rank: number;
  /** the stream's id and ends, for marking it on the diagram (a meter on a header or a turbine: its id, as both ends) */
  stream: string;
  from: string;
  to: string;
  kind: string;
  /** the reading less the value the other meters give it, kg/s (K for a thermometer, kW for a power meter) */
  bias: number;
  biasSigma: number;
  /** meters the balances cannot tell apart from this one */
  equivalent: string[];
}

export interface ReconciledDiagram {
  streams: ReconciledStream[];
  suspects: SuspectOnStream[];
  /**
   * A copy of the result whose streams carry the reconciled flows (the solved
   * flow where a stream is not observable; see `streams[].reconciled`), for
   * the diagram model. Everything else in it is the solve's.
   */
  result: PlantResult;
}

/**
 * The reconciliation laid on a solved result of the same case. Throws when the
 * result's streams are not the ones the reconciliation knows (a programmer
 * error: a result of another case or another scenario's plant).
 */
export function reconciledDiagram(result: PlantResult, outcome: ReconcileOutcome): ReconciledDiagram {
  const ids = streamIds(result.streams);
  const byId = new Map(outcome.streams.map((stream) => [stream.id, stream]));
  const missing = ids.filter((id) => !byId.has(id));
  if (missing.length > 0 || ids.length !== outcome.streams.length) {
    throw new Error(`the solved result's streams do not match the reconciliation's (${missing.slice(0, 3).join(', ') || `${ids.length} streams against ${outcome.streams.length}`}): reconcile and solve the same plant`);
  }
  const streams: ReconciledStream[] = result.streams.map((stream, index) => {
    const reconciled = byId.get(ids[index])!;
    return {
      id: ids[index],
      from: stream.from,
      to: stream.to,
      kind: stream.kind,
      solved: stream.mass_kg_s,
      reconciled: reconciled.observable ? reconciled.value : null,
      sigma: reconciled.observable ? reconciled.sigma : null,
      meter: reconciled.meter,
      atBound: reconciled.atBound,
    };
  });
  const meterOf = new Map(outcome.meters.map((meter) => [meter.tag, meter]));
  const suspects: SuspectOnStream[] = outcome.suspects.map((suspect, index) => {
    const meter = meterOf.get(suspect.tag)!;
    const stream = streams.find((entry) => entry.id === meter.stream);
    // A thermometer on a header, or a power meter on a turbine, sits on no one
    // stream: it is marked on that header or turbine itself.
    const at = stream ?? { from: meter.stream, to: meter.stream, kind: meter.quantity };
    return { tag: suspect.tag, rank: index + 1, stream: meter.stream, from: at.from, to: at.to, kind: at.kind, bias: suspect.bias, biasSigma: suspect.biasSigma, equivalent: suspect.equivalent };
  });
  const reconciledStreams: StreamResult[] = result.streams.map((stream, index) => ({ ...stream, mass_kg_s: streams[index].reconciled ?? stream.mass_kg_s }));
  return { streams, suspects, result: { ...result, streams: reconciledStreams } };
}
