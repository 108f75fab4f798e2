// A generated diagram model of 5 headers and 40 units, for layout tests:
// sources on three headers, turbines and letdowns spanning one to four
// bands, users with names of many lengths, and vents.
import type { DiagramItem, DiagramModel } from '../../../src/report/index.js';

/** A small deterministic generator (Park-Miller), so the plant is the same every run. */
function generator(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 48271) % 2147483647;
    return state / 2147483647;
  };
}

const WORDS = ['digester', 'evaporator', 'dryer', 'reboiler', 'tracing', 'coil', 'kettle', 'press', 'heater', 'stripper', 'column', 'bay', 'line'];

export function generatedDiagram(seed = 7): DiagramModel {
  const random = generator(seed);
  const flow = (): number => 0.2 + random() * 12;
  const word = (): string => WORDS[Math.floor(random() * WORDS.length)];
  const headers = [0, 1, 2, 3, 4].map((index) => ({
    id: `h${index}`,
    lines: [`h${index} · header ${index}`, `${(60 - index * 13).toFixed(1)} barg · ${400 - index * 50} degC`, `flow ${(90 - index * 10).toFixed(1)} t/h · steam value ${(40 - index * 5).toFixed(2)} EUR/t`],
    throughput_kg_s: 25 - index * 3,
  }));
  const items: DiagramItem[] = [];
  const add = (item: Omit<DiagramItem, 'exitFlows_kg_s' | 'alarm'> & Partial<DiagramItem>): void => {
    items.push({ exitFlows_kg_s: [], alarm: false, ...item });
  };
  for (let index = 0; index < 5; index++) {
    const mass = flow();
    add({ id: `boiler_${index + 1}`, glyph: index === 4 ? 'heatRecovery' : 'boiler', placement: { kind: 'feeds', header: index < 4 ? 0 : 1 }, flow_kg_s: mass, lines: [`boiler_${index + 1}`, `${(mass * 3.6).toFixed(1)} t/h`, `fuel ${(mass * 2.9).toFixed(2)} MW`] });
  }
  add({ id: 'import_1', glyph: 'import', placement: { kind: 'feeds', header: 2 }, flow_kg_s: 2, lines: ['import_1', '7.20 t/h'] });
  const crossings: [number, number[]][] = [[0, [1]], [0, [1, 3]], [0, [4]], [1, [2]], [1, [2, 3, 4]], [2, [3]], [3, [4]], [0, [2]], [2, [4]]];
  crossings.forEach(([from, to], index) => {
    const exits = to.map(() => flow());
    const total = exits.reduce((sum, value) => sum + value, 0);
    add({
      id: index % 3 === 2 ? `prv_${index}` : `turbine_${index}`,
      glyph: index % 3 === 2 ? 'letdown' : 'turbine',
      placement: { kind: 'crosses', from, to },
      flow_kg_s: total,
      exitFlows_kg_s: exits,
      lines: [index % 3 === 2 ? `prv_${index}` : `turbine_${index}`, `${(total * 3.6).toFixed(1)} t/h in · ${(total * 180).toFixed(0)} kW`, ...to.map((target, exit) => `→ h${target} ${(exits[exit] * 3.6).toFixed(1)} t/h`)],
    });
  });
  let user = 0;
  while (items.length < 38) {
    const header = user % 5;
    const mass = flow();
    const id = `${word()}_${word()}_${user + 1}`;
    add({ id, glyph: 'user', placement: { kind: 'hangs', header }, flow_kg_s: mass, lines: [id, `${(mass * 3.6).toFixed(1)} t/h · ${(mass * 2100).toFixed(0)} kW`, `condensate back ${(mass * 2.5).toFixed(2)} t/h`] });
    user++;
  }
  add({ id: 'h3.vent', glyph: 'vent', placement: { kind: 'hangs', header: 3 }, flow_kg_s: 0.4, lines: ['VENT', '1.44 t/h to air'], alarm: true });
  add({ id: 'h4.vent', glyph: 'vent', placement: { kind: 'hangs', header: 4 }, flow_kg_s: 1.1, lines: ['VENT', '3.96 t/h to air'], alarm: true });
  return {
    title: 'Generated plant: 5 headers, 40 units',
    titleBlock: ['Generated plant', 'plant as written', 'objective: minimum cost · 1,234.56 EUR per hour', 'drawn 2026-01-01 · steamwright 0.0.0 · case 0123abcd'],
    feedwater: { flow_kg_s: 30, to: items.filter((item) => item.glyph === 'boiler').map((item) => item.id), label: 'feedwater from the deaerator 108 t/h' },
    headers,
    items,
    bottom: [
      { id: 'condensate', kind: 'condensate', lines: ['condensate return', 'back 60.0 t/h', 'to drain 12.0 t/h'], alarmLines: [] },
      { id: 'deaerator', kind: 'deaerator', lines: ['deaerator', 'feedwater 120 t/h', 'makeup 40.0 t/h', 'steam 8.00 t/h', 'VENT 0.500 t/h'], alarmLines: [4] },
      { id: 'flash_1', kind: 'flashTank', lines: ['flash_1', 'in 20.0 t/h', 'vapour → h3 1.20 t/h', 'liquid → deaerator 18.8 t/h'], alarmLines: [] },
      { id: 'grid', kind: 'power', lines: ['power', 'made 12000 kW', 'bought 0.00 kW', 'sold 2000 kW'], alarmLines: [] },
    ],
    maxFlow_kg_s: 25,
  };
}
