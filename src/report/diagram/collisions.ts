// The safety net behind the layout: labels that would still overlap are
// moved down, one at a time in priority order, until each is clear of every
// label placed before it.
import { overlaps, type Box } from './textBox.js';

export interface Movable {
  box: Box;
  /** fixed labels never move; the others move down */
  fixed: boolean;
}

export interface Resolution {
  boxes: Box[];
  /** how far each label was moved down, px */
  shifts: number[];
}

/** Clear gap kept between two labels, px. */
export const LABEL_GAP = 2;

export function resolveCollisions(labels: Movable[], step = 2, maxShift = 400): Resolution {
  const placed: Box[] = labels.filter((label) => label.fixed).map((label) => label.box);
  const boxes: Box[] = labels.map((label) => label.box);
  const shifts = labels.map(() => 0);
  labels.forEach((label, index) => {
    if (label.fixed) return;
    let shift = 0;
    let candidate = label.box;
    while (placed.some((other) => overlaps(candidate, other, LABEL_GAP)) && shift < maxShift) {
      shift += step;
      candidate = { ...label.box, y: label.box.y + shift };
    }
    boxes[index] = candidate;
    shifts[index] = shift;
    placed.push(candidate);
  });
  return { boxes, shifts };
}
