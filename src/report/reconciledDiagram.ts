// The balance diagram drawn with reconciled flows: every stream the meters
// make observable carries its reconciled estimate, each header's flow is the
// sum of what now enters it, and each suspect meter is noted in the warning
// style under the unit it sits on. What the meters cannot see keeps the
// model's figure, and the caller says which streams those are.
import type { PlantResult } from '../plant/index.js';
import { reconciledDiagram as reconciledFlows, type ReconcileOutcome } from '../reconcile/index.js';
import { balanceDiagram } from './balanceDiagram.js';
import type { TitleBlock } from './diagram/index.js';
import type { DisplayFormat } from './displayFormat.js';

export interface ReconciledDrawing {
  result: PlantResult;
  /** notes by drawn item id: "suspect meter FT-103" */
  marks: Map<string, string[]>;
  /** stream ids drawn at the model's flow: the meters do not make them observable */
  modelled: string[];
  /** stream ids whose estimate the fit held at zero (flows are zero or more) */
  atZero: string[];
}

/** The solve's result with the reconciled flows put in, each header's inflow summed again, and the notes for the suspect meters. */
export function reconciledDrawing(result: PlantResult, outcome: ReconcileOutcome): ReconciledDrawing {
  const flows = reconciledFlows(result, outcome);
  const streams = flows.result.streams;
  const modelled = flows.streams.filter((stream) => stream.reconciled === null && stream.solved > 1e-9).map((stream) => stream.id);
  const atZero = flows.streams.filter((stream) => stream.atBound).map((stream) => stream.id);
  const headers = result.headers.map((header) => ({ ...header, inflow_kg_s: streams.filter((stream) => stream.to === header.id).reduce((total, stream) => total + stream.mass_kg_s, 0) }));

  // A meter sits on a stream; its note goes under the unit at the stream's far end from a header.
  const headerIds = new Set(result.headers.map((header) => header.id));
  const marks = new Map<string, string[]>();
  for (const suspect of flows.suspects) {
    const owner = suspect.to === 'atmosphere' ? `${suspect.from}.vent` : suspect.to === 'deaerator' && headerIds.has(suspect.from) ? `${suspect.from}.deaerator` : !headerIds.has(suspect.to) && !['drain', 'process', 'makeup'].includes(suspect.to) ? suspect.to : suspect.from;
    marks.set(owner, [...(marks.get(owner) ?? []), `suspect meter ${suspect.tag}`]);
  }
  return { result: { ...flows.result, headers }, marks, modelled, atZero };
}

/** The diagram as SVG with the reconciled flows and the suspect meters noted. */
export function reconciledDiagram(result: PlantResult, outcome: ReconcileOutcome, format: DisplayFormat, block: TitleBlock | null): { svg: string; drawing: ReconciledDrawing } {
  const drawing = reconciledDrawing(result, outcome);
  return { svg: balanceDiagram(drawing.result, format, block, drawing.marks), drawing };
}
