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
const COLUMN_GAP = 16;
const TOP_PAD = 18;
const BOTTOM_PAD = 26;
const MARGIN = 16;
const HEADER_LABEL_GAP = 8;
const NODE_PAD = 7;
/** Space between the zone of items hanging from a header and the zone of items feeding the next one down. */
const ZONE_GAP = 26;
/** Height of the strip under the title that carries the feedwater rail. */
const RAIL_SPACE = 26;
/** Distance of the feedwater riser from the right end of the headers. */
const RISER_GAP = 18;

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
  /** the feedwater path from the deaerator to the rail, and a drop into each boiler it feeds */
  feedwater: { path: { x: number; y: number }[]; drops: { x: number; y1: number; y2: number; passes: number[] }[]; label: PlacedLabel } | null;
  /** the title block: plant, scenario, objective, cost, date, version, case hash */
  titleBlock: { box: Box; label: PlacedLabel } | null;
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

/** The band an item's glyph sits in: a feeder the band above its header, a hanging item or crossing the band below. */
export function homeBand(item: DiagramItem): number {
  const placement = item.placement;
  if (placement.kind === 'feeds') return placement.header;
  if (placement.kind === 'hangs') return placement.header + 1;
  return placement.from + 1;
}

/**
 * First and last band an item's column is taken over: its home band, and
 * further where its lines run on: a boiler fed from the feedwater rail at
 * the top up to band 0, a condensing turbine down to the water side.
 */
export function bandsOf(item: DiagramItem, headerCount = Infinity): [number, number] {
  const placement = item.placement;
  if (placement.kind === 'feeds') return [item.feedwater ? 0 : placement.header, placement.header];
  if (placement.kind === 'hangs') return [placement.header + 1, placement.header + 1];
  const last = Math.max(placement.from + 1, ...placement.to);
  return [placement.from + 1, item.toCondenser_kg_s !== undefined && Number.isFinite(headerCount) ? headerCount : last];
}

const RANK = { crosses: 0, feeds: 1, hangs: 2 } as const;

/** Column of each item (by index in model.items). */
export function assignColumns(items: DiagramItem[], headerCount = Infinity): number[] {
  const order = items.map((_, index) => index).sort((a, b) => {
    const [startA] = bandsOf(items[a], headerCount);
    const [startB] = bandsOf(items[b], headerCount);
    return startA - startB || RANK[items[a].placement.kind] - RANK[items[b].placement.kind] || a - b;
  });
  const lastBand: number[] = [];
  const columns = items.map(() => 0);
  for (const index of order) {
    const [start, end] = bandsOf(items[index], headerCount);
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

  const columns = assignColumns(model.items, headerCount);
  const columnCount = Math.max(0, ...columns.map((column) => column + 1));
  const columnWidths = Array.from({ length: columnCount }, () => 0);
  model.items.forEach((item, index) => {
    columnWidths[columns[index]] = Math.max(columnWidths[columns[index]], GLYPH + LABEL_OFFSET + labelWidth(item.lines) + COLUMN_GAP);
  });
  const columnX: number[] = [];
  columnWidths.reduce((x, width, column) => ((columnX[column] = x), x + width), gutter);

  // Band heights. A band has two zones: at its top, the items that hang from
  // the header above it (users, turbines and letdowns leaving it); at its
  // bottom, the items that feed the header below it. So a user sits right under
  // the header it draws from, never beside the next header down.
  const hangZone = Array.from({ length: headerCount + 1 }, () => 0);
  const feedZone = Array.from({ length: headerCount + 1 }, () => 0);
  model.items.forEach((item) => {
    const start = homeBand(item);
    const tall = Math.max(GLYPH, blockHeight(item.lines));
    if (item.placement.kind === 'feeds') feedZone[start] = Math.max(feedZone[start], tall);
    else hangZone[start] = Math.max(hangZone[start], tall);
  });
  const bandHeights = Array.from({ length: headerCount + 1 }, (_, band) => {
    const header = band < headerCount ? blockHeight(model.headers[band].lines) + HEADER_LABEL_GAP + 14 : 30;
    const zones = hangZone[band] + feedZone[band] + (hangZone[band] > 0 && feedZone[band] > 0 ? ZONE_GAP : 0);
    return Math.max(header, zones > 0 ? TOP_PAD + zones + BOTTOM_PAD : 0);
  });
  // Room under the title for the feedwater rail, when there is one.
  const titleHeight = MARGIN + TITLE_FONT * 1.6 + (model.feedwater ? RAIL_SPACE : 0);
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

  // The water side's collector line, under the last band.
  const collectorY = bandTops[headerCount] + bandHeights[headerCount] + 6;

  const items: PlacedItem[] = model.items.map((item, index) => {
    const column = columns[index];
    const x = columnX[column] + GLYPH / 2;
    const start = homeBand(item);
    // Feeders sit at the bottom of their band, just above the header they feed; the rest at its top.
    const top = item.placement.kind === 'feeds' ? bandTops[start] + bandHeights[start] - BOTTOM_PAD - feedZone[start] - TOP_PAD : bandTops[start];
    const glyphY = top + TOP_PAD + GLYPH / 2;
    const label = labelAt(item.id, item.lines, columnX[column] + GLYPH + LABEL_OFFSET, top + TOP_PAD - 2 + fontSize * 0.95 - 4, fontSize, true, item.alarm ? item.lines.map((_, line) => line) : (item.alarmLines ?? []));
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
      let last = Math.max(placement.from, ...placement.to);
      if (item.toCondenser_kg_s !== undefined) {
        // The exhaust runs on down past the lower headers to the condenser on the water side.
        segments.push({ x, y1: y, y2: collectorY, width: strokeFor(item.toCondenser_kg_s, model.maxFlow_kg_s) });
        last = headerCount;
      }
      for (let header = placement.from + 1; header < last; header++) if (!placement.to.includes(header)) passes.push({ y: headerY(header) });
    }
    return { item, x, glyphY, segments, joins, passes, label };
  });

  // The nodes of the water side, in rows under the collector.
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
  const nodesBottom = rowTop + rowHeight;

  // Feedwater: from the deaerator down under the nodes, across to a riser
  // right of the headers, up to a rail under the title, and down into each
  // boiler it feeds.
  let feedwater: DiagramLayout['feedwater'] = null;
  const deaeratorNode = nodes.find((node) => node.node.kind === 'deaerator');
  if (model.feedwater && deaeratorNode) {
    const riserX = contentRight + RISER_GAP;
    const railY = bandTops[0] - RAIL_SPACE / 2;
    const underY = nodesBottom + 12;
    const fedIds = new Set(model.feedwater.to);
    const drops = items
      .filter((placed) => fedIds.has(placed.item.id))
      .map((placed) => {
        const header = placed.item.placement.kind === 'feeds' ? placed.item.placement.header : 0;
        return { x: placed.x, y1: railY, y2: placed.glyphY - GLYPH / 2, passes: headers.slice(0, header).map((entry) => entry.y) };
      });
    const railX1 = Math.min(riserX, ...drops.map((drop) => drop.x));
    const startX = deaeratorNode.box.x + deaeratorNode.box.width / 2;
    const path = [
      { x: startX, y: deaeratorNode.box.y + deaeratorNode.box.height },
      { x: startX, y: underY },
      { x: riserX, y: underY },
      { x: riserX, y: railY },
      { x: railX1, y: railY },
    ];
    const text = model.feedwater.label;
    const label = labelAt('feedwater', [text], riserX - textWidth(text, fontSize) - 4, railY - 5, fontSize, false);
    feedwater = { path, drops, label };
  }

  const legendY = nodesBottom + 26 + (feedwater ? 14 : 0);
  const legendWidth = LEGEND.reduce((total, [, text]) => total + LEGEND_SAMPLE + 6 + textWidth(text, fontSize) + COLUMN_GAP, MARGIN);
  const width = Math.max(rowLimit, legendWidth, textWidth(model.title, TITLE_FONT, true) + MARGIN, (feedwater ? contentRight + RISER_GAP + 8 : 0), ...nodes.map((node) => node.box.x + node.box.width + (node.ventMark ? GLYPH + 10 : 0))) + MARGIN;
  let height = legendY + 20 + MARGIN;

  // The title block, bottom right as on a drawing.
  let titleBlock: DiagramLayout['titleBlock'] = null;
  if (model.titleBlock) {
    const boxWidth = labelWidth(model.titleBlock) + 2 * NODE_PAD;
    const boxHeight = blockHeight(model.titleBlock) + 2 * NODE_PAD;
    const box = { x: width - MARGIN - boxWidth, y: legendY + 18, width: boxWidth, height: boxHeight };
    titleBlock = { box, label: labelAt('title-block', model.titleBlock, box.x + NODE_PAD, box.y + NODE_PAD + fontSize * 0.95, fontSize, true) };
    height = box.y + boxHeight + MARGIN;
  }

  const legend: DiagramLayout['legend'] = [];
  let legendX = MARGIN;
  for (const [style, text] of LEGEND) {
    const label = labelAt(`legend.${style}`, [text], legendX + LEGEND_SAMPLE + 6, legendY + fontSize * 0.35, fontSize, false);
    legend.push({ style, sampleX: legendX, label });
    legendX = label.box.x + label.box.width + COLUMN_GAP;
  }
  const labels = [
    title,
    ...headers.map((header) => header.label),
    ...items.map((item) => item.label),
    ...nodes.map((node) => node.label),
    ...legend.map((entry) => entry.label),
    ...(feedwater ? [feedwater.label] : []),
    ...(titleBlock ? [titleBlock.label] : []),
  ];
  const resolved = resolveCollisions(labels.map((label) => ({ box: label.box, fixed: label.owner === 'title' })));
  let moved = 0;
  labels.forEach((label, index) => {
    const shift = resolved.shifts[index];
    if (shift === 0) return;
    moved++;
    label.baseline += shift;
    label.box = resolved.boxes[index];
  });
  const collectorEnd = feedwater ? contentRight + RISER_GAP - 10 : width - MARGIN;
  return { width, height: height + Math.max(0, ...resolved.shifts), title, headers, items, collector: { y: collectorY, x1: MARGIN, x2: collectorEnd }, nodes, feedwater, titleBlock, legendY, legend, labels, moved };
}
