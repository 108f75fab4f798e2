import { describe, expect, it } from 'vitest';
import { assignColumns, bandsOf, layoutDiagram, overlappingPairs, strokeFor, LABEL_GAP } from '../../../src/report/index.js';
import { generatedDiagram } from '../helpers/generatedDiagram.js';

describe('layoutDiagram on a generated 5-header, 40-unit plant', () => {
  const model = generatedDiagram();
  const layout = layoutDiagram(model);

  it('the generated plant has 5 headers and 40 units', () => {
    expect(model.headers).toHaveLength(5);
    expect(model.items).toHaveLength(40);
  });

  it('places every unit once, inside the drawing', () => {
    expect(layout.items.map((placed) => placed.item.id).sort()).toEqual(model.items.map((item) => item.id).sort());
    for (const placed of layout.items) {
      for (const box of [placed.label.box]) {
        expect(box.x, placed.item.id).toBeGreaterThanOrEqual(0);
        expect(box.y, placed.item.id).toBeGreaterThanOrEqual(0);
        expect(box.x + box.width, placed.item.id).toBeLessThanOrEqual(layout.width);
        expect(box.y + box.height, placed.item.id).toBeLessThanOrEqual(layout.height);
      }
    }
  });

  it('no two label boxes overlap, and none had to be moved by the safety net', () => {
    expect(overlappingPairs(layout.labels.map((label) => label.box), LABEL_GAP).map(([a, b]) => `${layout.labels[a].owner} / ${layout.labels[b].owner}`)).toEqual([]);
    expect(layout.moved).toBe(0);
  });

  it('no label crosses another item line or glyph', () => {
    for (const placed of layout.items) {
      for (const other of layout.items) {
        if (other === placed) continue;
        for (const segment of other.segments) {
          const box = placed.label.box;
          const crosses = segment.x + segment.width / 2 > box.x && segment.x - segment.width / 2 < box.x + box.width && Math.max(segment.y1, segment.y2) > box.y && Math.min(segment.y1, segment.y2) < box.y + box.height;
          expect(crosses, `${placed.item.id} label crosses the line of ${other.item.id}`).toBe(false);
        }
      }
    }
  });

  it('headers are ordered top to bottom as given (highest pressure first)', () => {
    const ys = layout.headers.map((header) => header.y);
    expect([...ys].sort((a, b) => a - b)).toEqual(ys);
  });

  it('each item sits in its own bands: feeders above, hanging items below, crossings between their headers', () => {
    const headerY = layout.headers.map((header) => header.y);
    for (const placed of layout.items) {
      const placement = placed.item.placement;
      if (placement.kind === 'feeds') expect(placed.glyphY).toBeLessThan(headerY[placement.header]);
      if (placement.kind === 'feeds' && placement.header > 0) expect(placed.glyphY).toBeGreaterThan(headerY[placement.header - 1]);
      if (placement.kind === 'hangs') expect(placed.glyphY).toBeGreaterThan(headerY[placement.header]);
      if (placement.kind === 'crosses') {
        expect(placed.glyphY).toBeGreaterThan(headerY[placement.from]);
        const lowest = Math.max(...placed.segments.map((segment) => segment.y2));
        expect(lowest).toBeCloseTo(headerY[Math.max(...placement.to)], 6);
      }
    }
  });

  it('two items share a column only when their bands do not meet', () => {
    const columns = assignColumns(model.items);
    for (let first = 0; first < model.items.length; first++) {
      for (let second = first + 1; second < model.items.length; second++) {
        if (columns[first] !== columns[second]) continue;
        const [startA, endA] = bandsOf(model.items[first]);
        const [startB, endB] = bandsOf(model.items[second]);
        expect(endA < startB || endB < startA, `${model.items[first].id} and ${model.items[second].id}`).toBe(true);
      }
    }
  });

  it('stays within a landscape page of reasonable size', () => {
    expect(layout.width).toBeLessThan(3000);
    expect(layout.height).toBeLessThan(1400);
  });

  it('is deterministic: the same model gives the same layout', () => {
    expect(JSON.stringify(layoutDiagram(generatedDiagram()))).toBe(JSON.stringify(layout));
  });

  it('line widths grow with flow, so the big flows stand out', () => {
    expect(strokeFor(0, 25)).toBeCloseTo(1.25, 10);
    expect(strokeFor(25, 25)).toBeCloseTo(9.75, 10);
    expect(strokeFor(6.25, 25)).toBeCloseTo(1.25 + 8.5 * 0.5, 10);
    const widths = layout.items.map((placed) => [placed.item.flow_kg_s, placed.segments[0].width] as const).sort((a, b) => a[0] - b[0]);
    for (let index = 1; index < widths.length; index++) expect(widths[index][1]).toBeGreaterThanOrEqual(widths[index - 1][1]);
  });
});
