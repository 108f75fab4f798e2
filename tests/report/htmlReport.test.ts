import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { htmlReport } from '../../src/report/index.js';
import { hostileCaseText, solveDemo, solveText, type Solved } from './helpers/solvedCases.js';

describe('htmlReport of the board-mill demo', () => {
  let solved: Solved;
  let html: string;
  beforeAll(async () => {
    solved = await solveDemo('kestrel-bay-board-mill');
    html = htmlReport(solved.plant, solved.result);
  });

  it('is one HTML document with the diagram, tables, charts, audit, assumptions and cautions', () => {
    expect(html.startsWith('<!doctype html>')).toBe(true);
    for (const section of ['diagram', 'tables', 'charts', 'audit', 'assumptions', 'safety']) expect(html).toContain(`<section id="${section}">`);
    for (const table of ['headers', 'marginal-values', 'sources', 'turbines', 'letdowns', 'vents', 'users', 'totals', 'audit']) expect(html).toContain(`data-table="${table}"`);
    expect(html).toContain('class="balance-diagram"');
    expect(html).toContain('id="chart-cost"');
    expect(html).toContain('id="chart-value"');
    expect(html).toContain('IAPWS-IF97');
    expect(html).toMatch(/relief capacity/);
  });

  it('lists every default the loader applied as an assumption', () => {
    expect(solved.plant.defaults.length).toBeGreaterThan(0);
    for (const applied of solved.plant.defaults) expect(html).toContain(`<td>${applied.path}</td>`);
  });

  it('refers to nothing outside itself: no src or href but in-page anchors, and a policy that blocks fetching', () => {
    expect(html).not.toMatch(/\ssrc=/);
    for (const [, target] of html.matchAll(/href="([^"]*)"/g)) expect(target.startsWith('#')).toBe(true);
    expect(html).toContain(`default-src 'none'`);
    expect(html).not.toMatch(/@import|url\(/);
  });

  it('allows only its own script, by hash: no unsafe-inline for scripts (CSP Level 2 hash-source)', () => {
    const policy = /script-src '([^']+)'/.exec(html)?.[1];
    const scripts = [...html.matchAll(/<script>([\s\S]*?)<\/script>/g)].map((match) => match[1]);
    expect(scripts).toHaveLength(1);
    expect(policy).toBe(`sha256-${createHash('sha256').update(scripts[0], 'utf8').digest('base64')}`);
    expect(html).not.toMatch(/script-src[^;]*unsafe-inline/);
  });

  it('writes the vent row in the vent style and figures in the case units', () => {
    expect(html).toMatch(/<tr data-id="vent from deaerator" class="vent">/);
    expect(html).toMatch(/42\.0 barg/);
    expect(html).toMatch(/EUR\/t/);
  });
});

describe('htmlReport of a case whose texts hold markup', () => {
  it('escapes name, description and header names everywhere', async () => {
    const solved = await solveText(hostileCaseText(), 'hostile.yaml');
    const html = htmlReport(solved.plant, solved.result);
    // The only script element is the report's own.
    expect(html.match(/<script/g)).toHaveLength(1);
    expect(html).not.toContain('<img');
    expect(html).not.toContain('<b>bold</b>');
    expect(html).toContain('&lt;b&gt;bold&lt;/b&gt; &amp; &lt;script&gt;document.title=&quot;owned&quot;&lt;/script&gt;');
    expect(html).toContain('<title>Mill &lt;script&gt;');
  });
});
