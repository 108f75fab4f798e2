// The balance diagram as standalone SVG text. Every text from the case goes
// through escapeMarkup; every figure was formatted by diagramModel.
import { escapeMarkup } from '../escape.js';
import type { DiagramLayout, LegendStyle, PlacedLabel, PlacedItem } from './layout.js';
import { glyphSvg } from './glyphs.js';

const GLYPH = 24;
const HEADER_INK = '#23303b';
const STEAM_INK = '#4b6f88';
const WATER_INK = '#6c7a86';
const VENT_INK = '#a4301c';
const PAPER = '#fcfbf8';
const WATER_DASH = '6 4';
const VENT_DASH = '1.5 3';

const f = (value: number): string => (Math.round(value * 10) / 10).toString();

export function renderDiagramSvg(layout: DiagramLayout, description: string): string {
  const parts: string[] = [];
  parts.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="balance-diagram" width="${f(layout.width)}" height="${f(layout.height)}" viewBox="0 0 ${f(layout.width)} ${f(layout.height)}" role="img" aria-labelledby="diagram-title" font-family="'DejaVu Sans', Verdana, sans-serif" font-size="11">`,
    `<title id="diagram-title">${escapeMarkup(layout.title.lines[0])}: steam balance</title>`,
    `<desc>${escapeMarkup(description)}</desc>`,
    `<rect x="0" y="0" width="${f(layout.width)}" height="${f(layout.height)}" fill="${PAPER}"/>`,
  );
  parts.push(textSvg(layout.title, 'title'));

  parts.push('<g class="headers">');
  for (const header of layout.headers) {
    parts.push(
      `<g class="header" data-id="${escapeMarkup(header.id)}"><line x1="${f(header.x1)}" x2="${f(header.x2)}" y1="${f(header.y)}" y2="${f(header.y)}" stroke="${HEADER_INK}" stroke-width="${f(header.width)}" stroke-linecap="square"/>${textSvg(header.label, 'header-label')}</g>`,
    );
  }
  parts.push('</g>');

  parts.push('<g class="units">');
  for (const placed of layout.items) parts.push(itemSvg(placed));
  parts.push('</g>');

  // The water side.
  const collector = layout.collector;
  parts.push(`<g class="water-side"><line x1="${f(collector.x1)}" x2="${f(collector.x2)}" y1="${f(collector.y)}" y2="${f(collector.y)}" stroke="${WATER_INK}" stroke-width="2.5" stroke-dasharray="${WATER_DASH}"/>`);
  for (const placed of layout.nodes) {
    const box = placed.box;
    const kind = placed.node.kind;
    const dashed = kind === 'condensate' || kind === 'power';
    if (kind === 'deaerator' || kind === 'flashTank' || kind === 'condensate' || kind === 'condenser') {
      parts.push(`<line x1="${f(box.x + 14)}" x2="${f(box.x + 14)}" y1="${f(collector.y)}" y2="${f(box.y)}" stroke="${WATER_INK}" stroke-width="2" stroke-dasharray="${WATER_DASH}"/>`);
    }
    parts.push(
      `<g class="node node-${kind}" data-id="${escapeMarkup(placed.node.id)}"><rect x="${f(box.x)}" y="${f(box.y)}" width="${f(box.width)}" height="${f(box.height)}" rx="${kind === 'flashTank' ? 10 : 4}" fill="#ffffff" stroke="${HEADER_INK}" stroke-width="${kind === 'deaerator' ? 2 : 1.3}"${dashed ? ' stroke-dasharray="4 3"' : ''}/>${textSvg(placed.label, 'node-label')}${placed.ventMark ? glyphSvg('vent', placed.ventMark.x, placed.ventMark.y, GLYPH) : ''}</g>`,
    );
  }
  parts.push('</g>');

  if (layout.feedwater) {
    // Feedwater: the deaerator's water back to the boilers, in the water style.
    const feed = layout.feedwater;
    const points = feed.path.map((point) => `${f(point.x)},${f(point.y)}`).join(' ');
    parts.push(`<g class="feedwater" data-id="feedwater"><polyline points="${points}" fill="none" stroke="${WATER_INK}" stroke-width="2.5" stroke-dasharray="${WATER_DASH}"/>`);
    for (const drop of feed.drops) {
      for (const y of drop.passes) parts.push(`<rect class="pass" x="${f(drop.x - 5)}" y="${f(y - 7)}" width="10" height="14" fill="${PAPER}"/>`);
      parts.push(`<line x1="${f(drop.x)}" x2="${f(drop.x)}" y1="${f(drop.y1)}" y2="${f(drop.y2)}" stroke="${WATER_INK}" stroke-width="2" stroke-dasharray="${WATER_DASH}"/>`);
    }
    parts.push(`${textSvg(feed.label, 'feedwater-label')}</g>`);
  }

  if (layout.titleBlock) {
    const box = layout.titleBlock.box;
    parts.push(`<g class="title-block"><rect x="${f(box.x)}" y="${f(box.y)}" width="${f(box.width)}" height="${f(box.height)}" fill="#ffffff" stroke="${HEADER_INK}" stroke-width="1.5"/>${textSvg(layout.titleBlock.label, 'title-block-label')}</g>`);
  }

  parts.push('<g class="legend">');
  for (const entry of layout.legend) {
    const y = layout.legendY;
    parts.push(`${legendSample(entry.style, entry.sampleX, y)}${textSvg(entry.label, 'legend-label')}`);
  }
  parts.push('</g>');
  parts.push('</svg>');
  return parts.join('\n');
}

function itemSvg(placed: PlacedItem): string {
  const item = placed.item;
  const vent = item.glyph === 'vent';
  const ink = vent ? VENT_INK : STEAM_INK;
  // An idle unit (off, or no flow) is drawn greyed, so the running plant stands out.
  const pieces: string[] = [`<g class="unit unit-${item.glyph}${item.idle ? ' idle' : ''}" data-id="${escapeMarkup(item.id)}"${item.idle ? ' opacity="0.35"' : ''}>`];
  // Gaps where the line passes a header it does not join.
  for (const pass of placed.passes) {
    const width = Math.max(...placed.segments.map((segment) => segment.width)) + 5;
    pieces.push(`<rect class="pass" x="${f(placed.x - width / 2)}" y="${f(pass.y - 7)}" width="${f(width)}" height="14" fill="${PAPER}"/>`);
  }
  for (const segment of placed.segments) {
    if (Math.abs(segment.y2 - segment.y1) < 0.5) continue;
    const dash = vent ? ` stroke-dasharray="${VENT_DASH}" stroke-linecap="round"` : '';
    pieces.push(`<line x1="${f(segment.x)}" x2="${f(segment.x)}" y1="${f(segment.y1)}" y2="${f(segment.y2)}" stroke="${ink}" stroke-width="${f(vent ? Math.max(3, segment.width) : segment.width)}"${dash}/>`);
    if (!vent && segment.y2 > segment.y1 + 10) pieces.push(arrowHead(placed.x, segment.y2, segment.width, ink));
  }
  for (const join of placed.joins) pieces.push(`<circle cx="${f(placed.x)}" cy="${f(join.y)}" r="3" fill="${HEADER_INK}"/>`);
  pieces.push(glyphSvg(item.glyph, placed.x, placed.glyphY, GLYPH));
  pieces.push(textSvg(placed.label, vent ? 'vent-label' : 'unit-label'));
  pieces.push('</g>');
  return pieces.join('');
}

/** A filled chevron whose tip touches (x, tipY), pointing down the flow. */
function arrowHead(x: number, tipY: number, lineWidth: number, ink: string): string {
  const half = Math.max(4, lineWidth / 2 + 3);
  const length = half * 1.4;
  return `<path d="M${f(x - half)} ${f(tipY - length)} L${f(x)} ${f(tipY)} L${f(x + half)} ${f(tipY - length)} Z" fill="${ink}"/>`;
}

function textSvg(label: PlacedLabel, className: string): string {
  const lineStep = label.fontSize * 1.3;
  const spans = label.lines.map((line, index) => {
    const alarm = label.alarmLines.includes(index);
    const weight = (label.boldFirst && index === 0) || alarm ? ' font-weight="bold"' : '';
    const fill = alarm ? ` fill="${VENT_INK}"` : '';
    return `<tspan x="${f(label.x)}" dy="${index === 0 ? 0 : f(lineStep)}"${weight}${fill}>${escapeMarkup(line)}</tspan>`;
  });
  return `<text class="${className}" x="${f(label.x)}" y="${f(label.baseline)}" font-size="${label.fontSize}" fill="#1f2328">${spans.join('')}</text>`;
}

function legendSample(style: LegendStyle, x: number, y: number): string {
  const end = x + 34;
  if (style === 'steam') return `<line x1="${f(x)}" x2="${f(end)}" y1="${f(y)}" y2="${f(y)}" stroke="${STEAM_INK}" stroke-width="5"/>`;
  if (style === 'water') return `<line x1="${f(x)}" x2="${f(end)}" y1="${f(y)}" y2="${f(y)}" stroke="${WATER_INK}" stroke-width="2.5" stroke-dasharray="${WATER_DASH}"/>`;
  if (style === 'vent') return `<line x1="${f(x)}" x2="${f(end)}" y1="${f(y)}" y2="${f(y)}" stroke="${VENT_INK}" stroke-width="3" stroke-dasharray="${VENT_DASH}" stroke-linecap="round"/>`;
  return `<line x1="${f(x)}" x2="${f(end)}" y1="${f(y)}" y2="${f(y)}" stroke="${HEADER_INK}" stroke-width="4"/><rect x="${f(x + 12)}" y="${f(y - 7)}" width="10" height="14" fill="${PAPER}"/><line x1="${f(x + 17)}" x2="${f(x + 17)}" y1="${f(y - 9)}" y2="${f(y + 9)}" stroke="${STEAM_INK}" stroke-width="2.5"/>`;
}
