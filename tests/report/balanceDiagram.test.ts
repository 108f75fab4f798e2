import { beforeAll, describe, expect, it } from 'vitest';
import { balanceDiagram, balanceDiagramLayout, LABEL_GAP, overlappingPairs, plantDisplayFormat } from '../../src/report/index.js';
import { DEMO_CASES, HOSTILE_HEADER, HOSTILE_NAME, hostileCaseText, solveDemo, solveText, type Solved } from './helpers/solvedCases.js';

/** Every unit id of the case, from the plant itself rather than from the result. */
function caseIds(solved: Solved): string[] {
  const plant = solved.plant;
  return [
    ...plant.headers,
    ...plant.boilers,
    ...plant.heatRecoveryBoilers,
    ...plant.steamImports,
    ...plant.turbines,
    ...plant.letdowns,
    ...plant.users,
    ...plant.flashTanks,
    plant.deaerator,
    ...plant.machines,
  ].map((unit) => unit.id);
}

describe.each(DEMO_CASES)('balance diagram of %s', (name) => {
  let solved: Solved;
  let svg: string;
  beforeAll(async () => {
    solved = await solveDemo(name);
    svg = balanceDiagram(solved.result, plantDisplayFormat(solved.plant));
  });

  it('shows every header and unit of the case', () => {
    for (const id of caseIds(solved)) expect(svg, id).toMatch(new RegExp(`data-id="${id}"`));
  });

  it('labels each header with pressure, temperature, flow and marginal value in the case units', () => {
    const us = solved.plant.site.unitSystem === 'us';
    for (const header of solved.result.headers) {
      const label = svg.match(new RegExp(`data-id="${header.id}">.*?</text>`))?.[0] ?? '';
      // A drawing writes degrees with the sign.
      expect(label).toMatch(us ? / psig · [\d.]+ °F/ : / barg · [\d.]+ °C/);
      expect(label).not.toMatch(/deg[CF]/);
      expect(label).toMatch(us ? /flow [\d.]+ klb\/h/ : /flow [\d.]+ t\/h/);
      expect(label).toMatch(new RegExp(`${solved.plant.site.currency}/${us ? 'klb' : 't'}`));
    }
  });

  it('draws each unit once: a flash tank feeding a header is not drawn again on the water side', () => {
    for (const id of caseIds(solved)) expect(svg.match(new RegExp(`data-id="${id}"`, 'g'))?.length ?? 0, id).toBe(1);
  });

  it('greys every idle unit, and only those', () => {
    const idle = new Set([...svg.matchAll(/class="unit [^"]* idle" data-id="([^"]+)"/g)].map((match) => match[1]));
    for (const unit of solved.result.units) {
      const values = unit.values;
      const off = values.running === false || ['steam_kg_s', 'throttle_kg_s'].some((key) => typeof values[key] === 'number' && (values[key] as number) <= 1e-7);
      if (['boiler', 'turbine', 'letdown', 'user'].includes(unit.kind) && svg.includes(`data-id="${unit.id}"`)) expect(idle.has(unit.id), unit.id).toBe(off);
    }
  });

  it('draws the feedwater from the deaerator to every boiler that runs, and a condenser for each condensing turbine', () => {
    const running = solved.result.units.filter((unit) => (unit.kind === 'boiler' || unit.kind === 'heatRecoveryBoiler') && Number(unit.values.steam_kg_s ?? unit.values.unfired_steam_kg_s ?? 0) + Number(unit.values.fired_steam_kg_s ?? 0) > 1e-7);
    const layout = balanceDiagramLayout(solved.result, plantDisplayFormat(solved.plant));
    expect(layout.feedwater?.drops.length).toBe(running.length);
    const condensing = solved.plant.turbines.filter((turbine) => turbine.stages.some((stage) => stage.exhaust.kind === 'condenser'));
    expect(svg.includes('data-id="condenser"')).toBe(condensing.length > 0);
  });

  it('carries a title block when asked: plant, scenario, objective and cost, date, version and case hash', () => {
    const block = balanceDiagram(solved.result, plantDisplayFormat(solved.plant), { scenario: 'scenario x: test', date: '2026-12-03', version: '9.9.9', caseHash: 'abcd1234' });
    const text = block.match(/<g class="title-block">.*?<\/g>/s)?.[0] ?? '';
    for (const part of [solved.result.plant.replace(/&/g, '&amp;'), 'scenario x: test', 'objective: minimum cost', 'per hour', 'drawn 2026-12-03', 'steamwright 9.9.9', 'case abcd1234']) expect(text, part).toContain(part);
    expect(svg).not.toContain('title-block');
  });

  it('lays out without overlapping labels', () => {
    const layout = balanceDiagramLayout(solved.result, plantDisplayFormat(solved.plant));
    expect(overlappingPairs(layout.labels.map((label) => label.box), LABEL_GAP)).toEqual([]);
    expect(layout.moved).toBe(0);
  });

  it('marks the deaerator vent in the vent style', () => {
    expect(svg).toMatch(/<tspan[^>]*font-weight="bold" fill="#a4301c">VENT [\d.]+ (t|klb)\/h<\/tspan>/);
  });
});

describe('balance diagram of a case whose texts hold markup', () => {
  it('escapes the plant and header names: no tag from the case survives', async () => {
    const solved = await solveText(hostileCaseText(), 'hostile.yaml');
    expect(solved.result.plant).toBe(HOSTILE_NAME);
    const svg = balanceDiagram(solved.result, plantDisplayFormat(solved.plant));
    expect(svg).not.toContain('<script');
    expect(svg).not.toContain('<img');
    expect(svg).toContain('Mill &lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;Sons&#39; &quot;Ltd&quot;');
    expect(svg).toContain('&lt;img src=x onerror=alert(1)&gt; &amp; &quot;high&quot;');
    expect(HOSTILE_HEADER).toContain('<img');
  });
});
