// Label boxes for the diagram: a text-width estimate and box overlap.
// The estimate is deliberately generous (widths of DejaVu Sans, the widest
// common sans-serif fallback), so a label drawn in a narrower font only has
// more room; the browser tests measure the real boxes.

export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Advance widths in em, grouped by shape; measured from DejaVu Sans Book at 1 em and rounded up. */
const NARROW = new Set([...'iljtfrI!|.,:;\'()[]` ']);
const WIDE = new Set([...'mwMW@%→']);

/** Estimated width in px of `text` at `fontSize` px. */
export function textWidth(text: string, fontSize: number, bold = false): number {
  let ems = 0;
  for (const character of text) {
    if (NARROW.has(character)) ems += 0.36;
    else if (WIDE.has(character)) ems += 1.0;
    else if (character >= 'A' && character <= 'Z') ems += 0.76;
    else ems += 0.66;
  }
  return ems * fontSize * (bold ? 1.1 : 1);
}

/** Line height used for every label, px per px of font size. */
export const LINE_HEIGHT = 1.3;

/** The box of lines of text whose first baseline starts at (x, baseline), left-aligned. */
export function textBlockBox(lines: string[], x: number, baseline: number, fontSize: number, bold = false): Box {
  const width = Math.max(0, ...lines.map((line) => textWidth(line, fontSize, bold)));
  // The ascent of a sans-serif font is about 0.95 em above the baseline; descent 0.25 em.
  return { x, y: baseline - fontSize * 0.95, width, height: fontSize * (0.95 + 0.25) + (lines.length - 1) * fontSize * LINE_HEIGHT };
}

export function overlaps(a: Box, b: Box, gap = 0): boolean {
  return a.x < b.x + b.width + gap && b.x < a.x + a.width + gap && a.y < b.y + b.height + gap && b.y < a.y + a.height + gap;
}

/** Every pair of boxes that overlap, by index. */
export function overlappingPairs(boxes: Box[], gap = 0): [number, number][] {
  const pairs: [number, number][] = [];
  for (let first = 0; first < boxes.length; first++) {
    for (let second = first + 1; second < boxes.length; second++) {
      if (overlaps(boxes[first], boxes[second], gap)) pairs.push([first, second]);
    }
  }
  return pairs;
}
