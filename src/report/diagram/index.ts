export { diagramModel, markDiagram, type DiagramModel, type DiagramItem, type DiagramHeader, type BottomNode, type Glyph, type Placement, type TitleBlock } from './diagramModel.js';
export { layoutDiagram, assignColumns, bandsOf, homeBand, strokeFor, type DiagramLayout, type PlacedLabel, type PlacedItem, type PlacedHeader, type PlacedNode } from './layout.js';
export { renderDiagramSvg } from './svgDiagram.js';
export { resolveCollisions, LABEL_GAP, type Movable, type Resolution } from './collisions.js';
export { textWidth, textBlockBox, overlaps, overlappingPairs, type Box } from './textBox.js';
