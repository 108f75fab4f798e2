import { describe, expect, it } from 'vitest';
import { overlappingPairs, overlaps, textBlockBox, textWidth } from '../../../src/report/index.js';

describe('textWidth', () => {
  it('is zero for empty text and grows with every character', () => {
    expect(textWidth('', 11)).toBe(0);
    expect(textWidth('ab', 11)).toBeGreaterThan(textWidth('a', 11));
  });

  it('counts narrow letters narrower than wide ones, and bold wider than regular', () => {
    expect(textWidth('iiii', 11)).toBeLessThan(textWidth('mmmm', 11));
    expect(textWidth('header', 11, true)).toBeGreaterThan(textWidth('header', 11));
  });

  it('scales with the font size', () => {
    expect(textWidth('42.0 barg', 22)).toBeCloseTo(2 * textWidth('42.0 barg', 11), 10);
  });

  // DejaVu Sans Book advance widths (units per em 2048): digits 1303, "a" 1255,
  // "m" 1995, "i" 569 (from memory of the font's hmtx table); the estimate must
  // not fall below them, so a drawn label never outgrows its box.
  it('is not below the DejaVu Sans widths of digits and common letters', () => {
    expect(textWidth('0123456789', 1)).toBeGreaterThanOrEqual((10 * 1303) / 2048);
    expect(textWidth('a', 1)).toBeGreaterThanOrEqual(1255 / 2048);
    expect(textWidth('m', 1)).toBeGreaterThanOrEqual(1995 / 2048);
    expect(textWidth('i', 1)).toBeGreaterThanOrEqual(569 / 2048);
  });
});

describe('textBlockBox', () => {
  it('spans from the ascent of the first line to the descent of the last', () => {
    const one = textBlockBox(['abc'], 10, 100, 10);
    const three = textBlockBox(['abc', 'abcdef', 'a'], 10, 100, 10);
    expect(one.y).toBeCloseTo(90.5, 10);
    expect(three.height - one.height).toBeCloseTo(2 * 13, 10);
    expect(three.width).toBeCloseTo(textWidth('abcdef', 10), 10);
  });
});

describe('overlaps', () => {
  const box = { x: 0, y: 0, width: 10, height: 10 };
  it('is true for boxes that share area and false for boxes that only touch', () => {
    expect(overlaps(box, { x: 5, y: 5, width: 10, height: 10 })).toBe(true);
    expect(overlaps(box, { x: 10, y: 0, width: 10, height: 10 })).toBe(false);
    expect(overlaps(box, { x: 0, y: 11, width: 10, height: 10 })).toBe(false);
  });

  it('with a gap, boxes closer than the gap count as overlapping', () => {
    expect(overlaps(box, { x: 11, y: 0, width: 10, height: 10 }, 2)).toBe(true);
    expect(overlaps(box, { x: 13, y: 0, width: 10, height: 10 }, 2)).toBe(false);
  });

  it('overlappingPairs lists each overlapping pair once', () => {
    expect(overlappingPairs([box, { x: 5, y: 5, width: 10, height: 10 }, { x: 50, y: 50, width: 1, height: 1 }, { x: 2, y: 2, width: 1, height: 1 }])).toEqual([
      [0, 1],
      [0, 3],
    ]);
  });
});
