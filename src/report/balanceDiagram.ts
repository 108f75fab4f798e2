// The one-page balance diagram of a solved plant, as SVG text.
import type { PlantResult } from '../plant/index.js';
import { diagramModel, layoutDiagram, markDiagram, renderDiagramSvg, type DiagramLayout, type TitleBlock } from './diagram/index.js';
import type { DisplayFormat } from './displayFormat.js';

export function balanceDiagramLayout(result: PlantResult, format: DisplayFormat, block: TitleBlock | null = null, marks: ReadonlyMap<string, string[]> = new Map()): DiagramLayout {
  const model = diagramModel(result, format, block);
  markDiagram(model, marks);
  return layoutDiagram(model);
}

/** The diagram as SVG; with `block`, a title block in its corner (plant, scenario, objective, cost, date, version, case). */
export function balanceDiagram(result: PlantResult, format: DisplayFormat, block: TitleBlock | null = null, marks: ReadonlyMap<string, string[]> = new Map()): string {
  const description = `Steam balance of ${result.plant}: ${result.headers.length} headers, ${result.units.length} units, flows in ${format.system === 'si' ? 't/h' : 'klb/h'}.`;
  return renderDiagramSvg(balanceDiagramLayout(result, format, block, marks), description);
}
