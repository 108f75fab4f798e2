// Geometry of the balance diagram. Headers are horizontal lines, highest
// pressure at the top; the space between two header lines is a band. Every
// item occupies one column over the bands it spans (a feeder the band above
// its header, a hanging item the band below, a turbine or letdown every
// band from its inlet header down to its lowest exit), and columns are
// shared by items whose bands do not meet (interval colouring, left-edge
// order), so the diagram stays as narrow as the busiest band. Column widths
// and band heights come from the measured label boxes, so labels are clear
// of each other by construction; resolveCollisions is the safety net.
import { resolveCollisions } from './collisions.js';
import type { BottomNode, DiagramItem, DiagramModel } from './diagramModel.js';
import { textBlockBox, textWidth, type Box } from './textBox.js';

export const FONT_SIZE = 11;
const TITLE_FONT = 15;
const GLYPH = 24;
const LABEL_OFFSET = 6;
const COLUMN_GAP = 22;
const TOP_PAD = 18;
const BOTTOM_PAD = 26;
const MARGIN = 16;
const HEADER_LABEL_GAP = 8;
const NODE_PAD = 7;

export type LegendStyle = 'steam' | 'water' | 'vent' | 'pass';

const LEGEND: [LegendStyle, string][] = [
  ['steam', 'steam (line width grows with flow)'],
  ['water', 'condensate and water'],
  ['vent', 'VENT: steam lost to air'],
  ['pass', 'crosses a header without joining it'],
];
const LEGEND_SAMPLE = 34;

export interface PlacedLabel {
  /** the header, item or node it belongs to */
  owner: string;
  lines: string[];
  /** left edge and first baseline */
  x: number;
  baseline: number;
  fontSize: number;
  /** first line bold */
  boldFirst: boolean;
  /** indices of lines drawn in the vent style */
  alarmLines: number[];
  box: Box;
}

export interface Segment {
  x: number;
  y1: number;
  y2: number;
  width: number;
}

export interface PlacedHeader {
  id: string;
  y: number;
  x1: number;
  x2: number;
  width: number;
  label: PlacedLabel;
}

export interface PlacedItem {
  item: DiagramItem;
  x: number;
  /** centre of the glyph */
  glyphY: number;
  /** lines of the item, thickness scaled to flow */
  segments: Segment[];
  /** header lines this item joins (a dot), and those it only passes (a gap) */
  joins: { y: number }[];
  passes: { y: number }[];
  label: PlacedLabel;
}

export interface PlacedNode {
  node: BottomNode;
  box: Box;
  /** centre of a vent mark beside the box, when the node vents */
  ventMark?: { x: number; y: number };
  label: PlacedLabel;
}

export interface DiagramLayout {
  width: number;
  height: number;
  title: PlacedLabel;
  headers: PlacedHeader[];
  items: PlacedItem[];
  /** the condensate collector line */
  collector: { y: number; x1: number; x2: number };
  nodes: PlacedNode[];
  legendY: number;
  /** legend entries: a line sample starting at sampleX, then its label */
  legend: { style: LegendStyle; sampleX: number; label: PlacedLabel }[];
  /** every label, for collision checks */
  labels: PlacedLabel[];
  /** labels the safety net had to move (0 when the layout was clean) */
  moved: number;
}

/** Line thickness for a flow: area-like (square root) so small flows stay visible and big ones stand out. */
export function strokeFor(flow_kg_s: number, maxFlow_kg_s: number): number {
  if (maxFlow_kg_s <= 0) return 1.25;
  return 1.25 + 8.5 * Math.sqrt(Math.max(0, flow_kg_s) / maxFlow_kg_s);
}

function labelAt(owner: string, lines: string[], x: number, baseline: number, fontSize: number, boldFirst: boolean, alarmLines: number[] = []): PlacedLabel {
  const box = unionBox(lines.map((line, index) => textBlockBox([line], x, baseline + index * fontSize * 1.3, fontSize, boldFirst && index === 0)));
  return { owner, lines, x, baseline, fontSize, boldFirst, alarmLines, box };
}

function unionBox(boxes: Box[]): Box {
  const x = Math.min(...boxes.map((box) => box.x));
  const y = Math.min(...boxes.map((box) => box.y));
  const right = Math.max(...boxes.map((box) => box.x + box.width));
  const bottom = Math.max(...boxes.map((box) => box.y + box.height));
  return { x, y, width: right - x, height: bottom - y };
}

/** First and last band an item occupies; band b lies above header b (band H below the last header). */
export function bandsOf(item: DiagramItem): [number, number] {
  const placement = item.placement;
  if (placement.kind === 'feeds') return [placement.header, placement.header];
  if (placement.kind === 'hangs') return [placement.header + 1, placement.header + 1];
  return [placement.from + 1, Math.max(placement.from + 1, ...placement.to)];
}

const RANK = { crosses: 0, feeds: 1, hangs: 2 } as const;

/** Column of each item (by index in model.items). */
export function assignColumns(items: DiagramItem[]): number[] {
  const order = items.map((_, index) => index).sort((a, b) => {
    const [startA] = bandsOf(items[a]);
    const [startB] = bandsOf(items[b]);
    return startA - startB || RANK[items[a].placement.kind] - RANK[items[b].placement.kind] || a - b;
  });
  const lastBand: number[] = [];
  const columns = items.map(() => 0);
  for (const index of order) {
    const [start, end] = bandsOf(items[index]);
    let column = lastBand.findIndex((last) => last < start);
    if (column === -1) column = lastBand.push(end) - 1;
    else lastBand[column] = end;
    columns[index] = column;
  }
  return columns;
}

export function layoutDiagram(model: DiagramModel): DiagramLayout {
  const fontSize = FONT_SIZE;
  const headerCount = model.headers.length;
  const lineStep = fontSize * 1.3;
  const blockHeight = (lines: string[]): number => fontSize * 1.2 + (lines.length - 1) * lineStep;
  const labelWidth = (lines: string[], boldFirst = true): number => Math.max(...lines.map((line, index) => textWidth(line, fontSize, boldFirst && index === 0)));

  // Gutter: the header labels, left of every column.
  const gutter = MARGIN + Math.max(120, ...model.headers.map((header) => labelWidth(header.lines))) + COLUMN_GAP;

  const columns = assignColumns(model.items);
  const columnCount = Math.max(0, ...columns.map((column) => column + 1));
  const columnWidths = Array.from({ length: columnCount }, () => 0);
  model.items.forEach((item, index) => {
    columnWidths[columns[index]] = Math.max(columnWidths[columns[index]], GLYPH + LABEL_OFFSET + labelWidth(item.lines) + COLUMN_GAP);
  });
  const columnX: number[] = [];
  columnWidths.reduce((x, width, column) => ((columnX[column] = x), x + width), gutter);

  // Band heights: the tallest item label starting in the band, or the header label below it.
  const bandHeights = Array.from({ length: headerCount + 1 }, (_, band) => (band < headerCount ? blockHeight(model.headers[band].lines) + HEADER_LABEL_GAP + 14 : 30));
  model.items.forEach((item) => {
    const [start] = bandsOf(item);
    bandHeights[start] = Math.max(bandHeights[start], TOP_PAD + Math.max(GLYPH, blockHeight(item.lines)) + BOTTOM_PAD);
  });
  const titleHeight = MARGIN + TITLE_FONT * 1.6;
  const bandTops: number[] = [titleHeight];
  for (let band = 1; band <= headerCount; band++) bandTops[band] = bandTops[band - 1] + bandHeights[band - 1];
  const headerY = (index: number): number => bandTops[index + 1];
  const contentRight = columnX.length > 0 ? columnX[columnCount - 1] + columnWidths[columnCount - 1] : gutter + 200;

  const title = labelAt('title', [model.title], MARGIN, MARGIN + TITLE_FONT, TITLE_FONT, true);
  const headers: PlacedHeader[] = model.headers.map((header, index) => {
    const y = headerY(index);
    const baseline = y - HEADER_LABEL_GAP - blockHeight(header.lines) + fontSize * 0.95;
    return { id: header.id, y, x1: MARGIN, x2: contentRight, width: Math.max(3, strokeFor(header.throughput_kg_s, model.maxFlow_kg_s) + 1), label: labelAt(header.id, header.lines, MARGIN, baseline, fontSize, true) };
  });

  const items: PlacedItem[] = model.items.map((item, index) => {
    const column = columns[index];
    const x = columnX[column] + GLYPH / 2;
    const [start] = bandsOf(item);
    const top = bandTops[start];
    const glyphY = top + TOP_PAD + GLYPH / 2;
    const label = labelAt(item.id, item.lines, columnX[column] + GLYPH + LABEL_OFFSET, top + TOP_PAD - 2 + fontSize * 0.95 - 4, fontSize, true, item.alarm ? item.lines.map((_, line) => line) : []);
    const width = strokeFor(item.flow_kg_s, model.maxFlow_kg_s);
    const segments: Segment[] = [];
    const joins: { y: number }[] = [];
    const passes: { y: number }[] = [];
    const placement = item.placement;
    if (placement.kind === 'feeds') {
      segments.push({ x, y1: glyphY + GLYPH / 2, y2: headerY(placement.header), width });
      joins.push({ y: headerY(placement.header) });
    } else if (placement.kind === 'hangs') {
      segments.push({ x, y1: headerY(placement.header), y2: glyphY - GLYPH / 2, width });
      joins.push({ y: headerY(placement.header) });
    } else {
      segments.push({ x, y1: headerY(placement.from), y2: glyphY - GLYPH / 2, width });
      joins.push({ y: headerY(placement.from) });
      let remaining = item.exitFlows_kg_s.reduce((total, value) => total + value, 0);
      let y = glyphY + GLYPH / 2;
      placement.to.forEach((target, exit) => {
        segments.push({ x, y1: y, y2: headerY(target), width: strokeFor(remaining, model.maxFlow_kg_s) });
        joins.push({ y: headerY(target) });
        remaining -= item.exitFlows_kg_s[exit];
        y = headerY(target);
      });
      const last = Math.max(placement.from, ...placement.to);
      for (let header = placement.from + 1; header < last; header++) if (!placement.to.includes(header)) passes.push({ y: headerY(header) });
    }
    return { item, x, glyphY, segments, joins, passes, label };
  });

  // The water side: a collector line, then the nodes in rows.
  const collectorY = bandTops[headerCount] + bandHeights[headerCount] + 6;
  const nodesTop = collectorY + 22;
  const rowLimit = Math.max(contentRight, 640);
  const nodes: PlacedNode[] = [];
  let x = MARGIN;
  let rowTop = nodesTop;
  let rowHeight = 0;
  for (const node of model.bottom) {
    const width = labelWidth(node.lines) + 2 * NODE_PAD;
    const height = blockHeight(node.lines) + 2 * NODE_PAD;
    const mark = node.alarmLines.length > 0 ? GLYPH + 10 : 0;
    if (x + width + mark > rowLimit && x > MARGIN) {
      x = MARGIN;
      rowTop += rowHeight + 18;
      rowHeight = 0;
    }
    const box = { x, y: rowTop, width, height };
    const placed: PlacedNode = { node, box, label: labelAt(node.id, node.lines, x + NODE_PAD, rowTop + NODE_PAD + fontSize * 0.95, fontSize, true, node.alarmLines) };
    // The mark sits level with the first vent line, just right of the box.
    if (mark > 0) placed.ventMark = { x: x + width + 6 + GLYPH / 2, y: placed.label.baseline + node.alarmLines[0] * lineStep - fontSize * 0.35 };
    nodes.push(placed);
    x += width + mark + COLUMN_GAP;
    rowHeight = Math.max(rowHeight, height);
  }
  const legendY = rowTop + rowHeight + 26;
  const legendWidth = LEGEND.reduce((total, [, text]) => total + LEGEND_SAMPLE + 6 + textWidth(text, fontSize) + COLUMN_GAP, MARGIN);
  const width = Math.max(rowLimit, legendWidth, textWidth(model.title, TITLE_FONT, true) + MARGIN, ...nodes.map((node) => node.box.x + node.box.width + (node.ventMark ? GLYPH + 10 : 0))) + MARGIN;
  const height = legendY + 20 + MARGIN;

  const legend: DiagramLayout['legend'] = [];
  let legendX = MARGIN;
  for (const [style, text] of LEGEND) {
    const label = labelAt(`legend.${style}`, [text], legendX + LEGEND_SAMPLE + 6, legendY + fontSize * 0.35, fontSize, false);
    legend.push({ style, sampleX: legendX, label });
    legendX = label.box.x + label.box.width + COLUMN_GAP;
  }
  const labels = [title, ...headers.map((header) => header.label), ...items.map((item) => item.label), ...nodes.map((node) => node.label), ...legend.map((entry) => entry.label)];
  const resolved = resolveCollisions(labels.map((label) => ({ box: label.box, fixed: label.owner === 'title' })));
  let moved = 0;
  labels.forEach((label, index) => {
    const shift = resolved.shifts[index];
    if (shift === 0) return;
    moved++;
    label.baseline += shift;
    label.box = resolved.boxes[index];
  });
  return { width, height: height + Math.max(0, ...resolved.shifts), title, headers, items, collector: { y: collectorY, x1: MARGIN, x2: width - MARGIN }, nodes, legendY, legend, labels, moved };
}
