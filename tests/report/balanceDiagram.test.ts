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
      expect(label).toMatch(us ? / psig · [\d.]+ degF/ : / barg · [\d.]+ degC/);
      expect(label).toMatch(us ? /flow [\d.]+ klb\/h/ : /flow [\d.]+ t\/h/);
      expect(label).toMatch(new RegExp(`${solved.plant.site.currency}/${us ? 'klb' : 't'}`));
    }
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
