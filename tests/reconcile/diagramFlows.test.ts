// The reconciliation laid on the demo's solved result, as the HTML report's
// balance diagram takes it.
import { describe, expect, test } from 'vitest';
import { reconciledDiagram } from '../../src/reconcile/index.js';
import { balanceDiagram, displayFormat } from '../../src/report/index.js';
import { reconciledDemo as demo } from './helpers/reconciledDemo.js';

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

  test('a suspect meter on no one stream (a power meter) is marked on its turbine', async () => {
    const { plant, network, result, outcome } = await demo();
    // The same readings with the generator meter at 300 kW and the inlet meter put right (12.3 klb/h).
    const { fuelMeters, meterStreams, parseReadings, powerMeters, reconcilePlant } = await import('../../src/reconcile/index.js');
    const { resolveMeters } = await import('../../src/model/index.js');
    const { readFileSync } = await import('node:fs');
    const meters = resolveMeters(readFileSync('cases/millbrook-creamery.yaml', 'utf8')).meters;
    const power = powerMeters(meters, network).metered;
    const text = readFileSync('cases/millbrook-creamery.readings.csv', 'utf8').replace('JT-111,238,kW', 'JT-111,300,kW').replace('FT-111,14.14,klb/h', 'FT-111,12.30,klb/h');
    const fuel = fuelMeters(meters, network).metered;
    const kinds = new Map([...power.map(({ meter }) => [meter.tag, 'power'] as const), ...fuel.map(({ meter }) => [meter.tag, 'fuel'] as const)]);
    const parsed = parseReadings(text, new Set(meters.map((meter) => meter.tag)), undefined, kinds);
    if (!parsed.ok) throw new Error('readings do not parse');
    const biased = reconcilePlant(plant, meterStreams(meters, network).metered, parsed.readings, {}, network, { power, fuel });
    expect(biased.suspects[0]?.tag).toBe('JT-111');
    expect(outcome.suspects[0].tag).toBe('FT-111');
    const diagram = reconciledDiagram(result, biased);
    expect(diagram.suspects[0]).toMatchObject({ tag: 'JT-111', stream: 'bptg', from: 'bptg', to: 'bptg', kind: 'power' });
  });

  test('a result of another plant is refused, not silently mismatched', async () => {
    const { result, outcome } = await demo();
    const other = { ...result, streams: result.streams.slice(1) };
    expect(() => reconciledDiagram(other, outcome)).toThrow(/reconcile and solve the same plant/);
  });
});
