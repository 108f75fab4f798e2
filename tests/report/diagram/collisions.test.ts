import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LABEL_GAP, overlappingPairs, resolveCollisions } from '../../../src/report/index.js';

describe('resolveCollisions', () => {
  it('leaves labels that are already clear where they are', () => {
    const labels = [
      { box: { x: 0, y: 0, width: 50, height: 12 }, fixed: false },
      { box: { x: 0, y: 20, width: 50, height: 12 }, fixed: false },
    ];
    expect(resolveCollisions(labels).shifts).toEqual([0, 0]);
  });

  it('moves a later label below an earlier one it overlaps, and never moves a fixed one', () => {
    const labels = [
      { box: { x: 0, y: 0, width: 50, height: 12 }, fixed: false },
      { box: { x: 10, y: 5, width: 50, height: 12 }, fixed: true },
    ];
    const { boxes, shifts } = resolveCollisions(labels);
    expect(shifts[1]).toBe(0);
    expect(boxes[0].y).toBeGreaterThanOrEqual(5 + 12 + LABEL_GAP);
  });

  it('leaves no overlaps among up to 60 random labels', () => {
    const box = fc.record({ x: fc.integer({ min: 0, max: 300 }), y: fc.integer({ min: 0, max: 300 }), width: fc.integer({ min: 5, max: 120 }), height: fc.integer({ min: 5, max: 40 }) });
    fc.assert(
      fc.property(fc.array(box, { maxLength: 60 }), (boxes) => {
        const resolved = resolveCollisions(boxes.map((candidate) => ({ box: candidate, fixed: false })), 2, 100_000);
        expect(overlappingPairs(resolved.boxes, LABEL_GAP)).toEqual([]);
        resolved.boxes.forEach((moved, index) => {
          expect(moved.x).toBe(boxes[index].x);
          expect(moved.y).toBeGreaterThanOrEqual(boxes[index].y);
        });
      }),
      { numRuns: 200 },
    );
  });
});
