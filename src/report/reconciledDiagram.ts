// The balance diagram drawn with reconciled flows: every stream the meters
// make observable carries its reconciled estimate, each header's flow is the
// sum of what now enters it, and each suspect meter is noted in the warning
// style under the unit it sits on. What the meters cannot see keeps the
// model's figure, and the caller says which streams those are.
import type { PlantResult } from '../plant/index.js';
import { streamIds } from '../plant/streamNetwork.js';
import type { ReconcileOutcome } from '../reconcile/index.js';
import { balanceDiagram } from './balanceDiagram.js';
import type { TitleBlock } from './diagram/index.js';
import type { DisplayFormat } from './displayFormat.js';

export interface ReconciledDrawing {
  result: PlantResult;
  /** notes by drawn item id: "suspect meter FT-103" */
  marks: Map<string, string[]>;
  /** stream ids drawn at the model's flow: the meters do not make them observable */
  modelled: string[];
  /** reconciled estimates below zero, drawn as zero (stream id and value, kg/s) */
  negative: { id: string; value: number }[];
}

/** The solve's result with the reconciled flows put in, and the notes for the suspect meters. */
export function reconciledDrawing(result: PlantResult, outcome: ReconcileOutcome): ReconciledDrawing {
  const estimates = new Map(outcome.streams.filter((stream) => stream.observable && stream.value !== null).map((stream) => [stream.id, stream.value as number]));
  const ids = streamIds(result.streams);
  const modelled: string[] = [];
  const negative: { id: string; value: number }[] = [];
  const streams = result.streams.map((stream, at) => {
    const value = estimates.get(ids[at]);
    if (value === undefined) {
      if (stream.mass_kg_s > 1e-9) modelled.push(ids[at]);
      return stream;
    }
    if (value < 0) negative.push({ id: ids[at], value });
    return { ...stream, mass_kg_s: Math.max(0, value) };
  });
  const headers = result.headers.map((header) => ({ ...header, inflow_kg_s: streams.filter((stream) => stream.to === header.id).reduce((total, stream) => total + stream.mass_kg_s, 0) }));

  // A meter sits on a stream; its note goes under the unit at the stream's far end from a header.
  const headerIds = new Set(result.headers.map((header) => header.id));
  const byId = new Map(ids.map((id, at) => [id, result.streams[at]]));
  const marks = new Map<string, string[]>();
  const suspects = new Set(outcome.suspects.map((suspect) => suspect.tag));
  for (const meter of outcome.meters.filter((candidate) => suspects.has(candidate.tag))) {
    const stream = byId.get(meter.stream);
    if (!stream) continue;
    const owner = stream.to === 'atmosphere' ? `${stream.from}.vent` : stream.to === 'deaerator' && headerIds.has(stream.from) ? `${stream.from}.deaerator` : !headerIds.has(stream.to) && !['drain', 'process', 'makeup'].includes(stream.to) ? stream.to : stream.from;
    marks.set(owner, [...(marks.get(owner) ?? []), `suspect meter ${meter.tag}`]);
  }
  return { result: { ...result, streams, headers }, marks, modelled, negative };
}

/** The diagram as SVG with the reconciled flows and the suspect meters noted. */
export function reconciledDiagram(result: PlantResult, outcome: ReconcileOutcome, format: DisplayFormat, block: TitleBlock | null): { svg: string; drawing: ReconciledDrawing } {
  const drawing = reconciledDrawing(result, outcome);
  return { svg: balanceDiagram(drawing.result, format, block, drawing.marks), drawing };
}
