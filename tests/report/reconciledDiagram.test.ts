// The balance drawn with reconciled flows (report --readings). The drawing
// must put each estimate on its own stream: checked by the mass balance of
// every header, recomputed here from the drawn streams alone, which closes
// only if every flow sits where the reconciliation put it.
import { describe, expect, test } from 'vitest';
import { plantDisplayFormat } from '../../src/report/index.js';
import { reconciledDiagram } from '../../src/report/reconciledDiagram.js';
import { reconciledDemo } from '../reconcile/helpers/reconciledDemo.js';

describe('the diagram of reconciled flows', () => {
  test('each observable stream carries its estimate, and every header balances on the drawn flows', async () => {
    const { plant, result, outcome } = await reconciledDemo();
    const { svg, drawing } = reconciledDiagram(result, outcome, plantDisplayFormat(plant), null);
    const estimates = new Map(outcome.streams.map((stream) => [stream.id, stream]));
    drawing.result.streams.forEach((stream, at) => {
      const reconciled = estimates.get(outcome.streams[at].id)!;
      if (reconciled.observable) expect(stream.mass_kg_s).toBeCloseTo(reconciled.value!, 12);
      else expect(stream.mass_kg_s).toBe(result.streams[at].mass_kg_s);
    });
    // Every header: what enters equals what leaves, on the drawn streams (the bounded fit keeps every balance).
    for (const header of drawing.result.headers) {
      const into = drawing.result.streams.filter((stream) => stream.to === header.id);
      const out = drawing.result.streams.filter((stream) => stream.from === header.id);
      const sum = (streams: typeof into): number => streams.reduce((total, stream) => total + stream.mass_kg_s, 0);
      expect(header.inflow_kg_s).toBeCloseTo(sum(into), 12);
      expect(Math.abs(sum(into) - sum(out)), header.id).toBeLessThan(1e-6);
    }
    // The suspect meter is noted, in the warning style, under the unit on its stream.
    expect(outcome.suspects.length).toBeGreaterThan(0);
    const tag = outcome.suspects[0].tag;
    const meter = outcome.meters.find((entry) => entry.tag === tag)!;
    const [owner] = [...drawing.marks.entries()].find(([, notes]) => notes.includes(`suspect meter ${tag}`))!;
    expect(meter.stream.split('->')[1].split(':')[0] === owner || meter.stream.startsWith(`${owner}->`)).toBe(true);
    expect(svg).toContain(`suspect meter ${tag}`);
  });
});
