// A horizontal bar chart as inline SVG: one bar per item, its value written
// beside it, a zero line when values have both signs.
import { escapeMarkup } from './escape.js';
import { textWidth } from './diagram/index.js';

export interface Bar {
  label: string;
  value: number;
  /** the value as shown, with its unit */
  text: string;
}

const FONT = 12;
const BAR = 18;
const GAP = 8;
const PLOT = 320;

export function barChartSvg(id: string, title: string, given: Bar[]): string {
  // A value within round-off of zero is drawn as zero: a -1e-12 must not put
  // its text on the negative side, over its label.
  const largest = Math.max(0, ...given.map((bar) => Math.abs(bar.value)));
  const bars = given.map((bar) => (Math.abs(bar.value) <= 1e-9 * largest ? { ...bar, value: 0 } : bar));
  const labelWidth = Math.max(60, ...bars.map((bar) => textWidth(bar.label, FONT))) + 10;
  const textRoom = Math.max(60, ...bars.map((bar) => textWidth(bar.text, FONT))) + 10;
  const low = Math.min(0, ...bars.map((bar) => bar.value));
  const high = Math.max(0, ...bars.map((bar) => bar.value));
  const span = high - low || 1;
  // Negative values write their text left of their bar: room for it before the plot.
  const plotLeft = labelWidth + (low < 0 ? textRoom : 0);
  const scale = (value: number): number => plotLeft + ((value - low) / span) * PLOT;
  const top = 30;
  const width = plotLeft + PLOT + textRoom + 10;
  const height = top + bars.length * (BAR + GAP) + 10;
  const f = (value: number): string => (Math.round(value * 10) / 10).toString();
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart" id="${escapeMarkup(id)}" width="${f(width)}" height="${f(height)}" viewBox="0 0 ${f(width)} ${f(height)}" role="img" aria-label="${escapeMarkup(title)}" font-family="'DejaVu Sans', Verdana, sans-serif" font-size="${FONT}">`,
    `<text x="0" y="16" font-weight="bold" font-size="13">${escapeMarkup(title)}</text>`,
  ];
  bars.forEach((bar, index) => {
    const y = top + index * (BAR + GAP);
    const start = scale(Math.min(0, bar.value));
    const end = scale(Math.max(0, bar.value));
    const valueX = bar.value < 0 ? start - 6 : end + 6;
    parts.push(
      `<text x="${f(labelWidth - 8)}" y="${f(y + BAR * 0.72)}" text-anchor="end">${escapeMarkup(bar.label)}</text>`,
      `<rect x="${f(start)}" y="${f(y)}" width="${f(Math.max(1, end - start))}" height="${BAR}" fill="${bar.value < 0 ? '#ffffff' : '#7d98ab'}" stroke="#23303b" stroke-width="1"/>`,
      `<text x="${f(valueX)}" y="${f(y + BAR * 0.72)}"${bar.value < 0 ? ' text-anchor="end"' : ''}>${escapeMarkup(bar.text)}</text>`,
    );
  });
  parts.push(`<line x1="${f(scale(0))}" x2="${f(scale(0))}" y1="${top - 4}" y2="${f(height - 6)}" stroke="#23303b" stroke-width="1.2"/>`, '</svg>');
  return parts.join('\n');
}
