// The reconciliation laid on the demo's solved result, as the HTML report's
// balance diagram takes it.
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { loadCase, resolveMeters } from '../../src/model/index.js';
import { plantResult, solvePlant, streamNetwork } from '../../src/plant/index.js';
import { meterStreams, parseReadings, reconcilePlant, reconciledDiagram } from '../../src/reconcile/index.js';
import { balanceDiagram, displayFormat } from '../../src/report/index.js';

const DEMO = 'cases/millbrook-creamery.yaml';
const READINGS = 'cases/millbrook-creamery.readings.csv';

async function demo() {
  const loaded = await loadCase(DEMO);
  if (!loaded.ok) throw new Error('demo does not load');
  const solved = await solvePlant(loaded.plant);
  if (!solved.ok) throw new Error('demo does not solve');
  const network = streamNetwork(loaded.plant);
  const { metered } = meterStreams(resolveMeters(readFileSync(DEMO, 'utf8')).meters, network);
  const parsed = parseReadings(readFileSync(READINGS, 'utf8'), new Set(metered.map(({ meter }) => meter.tag)));
  if (!parsed.ok) throw new Error('demo readings do not parse');
  const outcome = reconcilePlant(loaded.plant, metered, parsed.readings, {}, network);
  return { plant: loaded.plant, network, result: plantResult(solved), outcome };
}

describe('reconciledDiagram', () => {
  test('the demo: every solved stream carries its reconciled flow, and the suspect sits on the turbine inlet', async () => {
    const { network, result, outcome } = await demo();
    const diagram = reconciledDiagram(result, outcome);
    expect(diagram.streams).toHaveLength(result.streams.length);
    expect(new Set(diagram.streams.map((stream) => stream.id)).size).toBe(diagram.streams.length);
    diagram.streams.forEach((stream, index) => {
      expect(stream.from, stream.id).toBe(result.streams[index].from);
      expect(stream.kind, stream.id).toBe(result.streams[index].kind);
      const own = outcome.streams.find((entry) => entry.id === stream.id)!;
      expect(stream.reconciled, stream.id).toBe(own.observable ? own.value : null);
      expect(stream.meter, stream.id).toBe(own.meter);
    });
    expect(diagram.suspects).toEqual([
      expect.objectContaining({ tag: 'FT-111', rank: 1, stream: 'hp->bptg:steam', from: 'hp', to: 'bptg', kind: 'steam' }),
    ]);
    // The copy for the diagram: reconciled flows where observable, solved elsewhere, the rest untouched.
    diagram.result.streams.forEach((stream, index) => expect(stream.mass_kg_s).toBe(diagram.streams[index].reconciled ?? result.streams[index].mass_kg_s));
    expect(diagram.result.headers).toBe(result.headers);
    // Independent check: the reconciled flows close every balance of the
    // network wherever all of a node's streams are observable.
    for (const node of network.nodes) {
      const touching = diagram.streams.filter((_, index) => network.streams[index].from === node || network.streams[index].to === node);
      if (touching.some((stream) => stream.reconciled === null)) continue;
      let sum = 0;
      diagram.streams.forEach((stream, index) => {
        if (network.streams[index].to === node) sum += stream.reconciled!;
        if (network.streams[index].from === node) sum -= stream.reconciled!;
      });
      expect(Math.abs(sum), node).toBeLessThan(1e-9);
    }
    // The report's diagram draws the copy, with the suspect's turbine in it.
    const { plant } = await demo();
    const svg = balanceDiagram(diagram.result, displayFormat(plant.site.unitSystem, plant.site.currency, plant.site.atmosphericPressure));
    expect(svg).toMatch(/^<svg/);
  });

  test('a result of another plant is refused, not silently mismatched', async () => {
    const { result, outcome } = await demo();
    const other = { ...result, streams: result.streams.slice(1) };
    expect(() => reconciledDiagram(other, outcome)).toThrow(/reconcile and solve the same plant/);
  });
});
