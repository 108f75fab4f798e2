// The one-page balance diagram of a solved plant, as SVG text.
import type { PlantResult } from '../plant/index.js';
import { diagramModel, layoutDiagram, renderDiagramSvg, type DiagramLayout } from './diagram/index.js';
import type { DisplayFormat } from './displayFormat.js';

export function balanceDiagramLayout(result: PlantResult, format: DisplayFormat): DiagramLayout {
  return layoutDiagram(diagramModel(result, format));
}

export function balanceDiagram(result: PlantResult, format: DisplayFormat): string {
  const description = `Steam balance of ${result.plant}: ${result.headers.length} headers, ${result.units.length} units, flows in ${format.system === 'si' ? 't/h' : 'klb/h'}.`;
  return renderDiagramSvg(balanceDiagramLayout(result, format), description);
}
