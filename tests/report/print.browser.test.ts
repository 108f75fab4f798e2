// The report printed by Debian's chromium: each balance diagram on its own
// A3 landscape page, the rest on A4 portrait, and every diagram label at
// least 7 pt on the A3 sheet, measured in the browser.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { htmlReport } from '../../src/report/index.js';
import { DEMO_CASES, scenarioSections, solveDemo } from './helpers/solvedCases.js';

const CHROMIUM = '/usr/bin/chromium';
/** ISO 216 sheets in PostScript points (1/72 inch): A3 is 297 x 420 mm, A4 210 x 297 mm. */
const A3_LANDSCAPE = { width: 1190.55, height: 841.89 };
const A4_PORTRAIT = { width: 595.28, height: 841.89 };
/** The A3 sheet less the 8 mm margins of the print style, in CSS px (96 to the inch). */
const A3_PRINTABLE_PX = { width: ((420 - 16) / 25.4) * 96, height: ((297 - 16) / 25.4) * 96 };
const PT_PER_PX = 0.75;

let context: BrowserContext;
let folder: string;

/** Page sizes of a PDF, in points, from each page's MediaBox. */
function pageSizes(pdf: Buffer): { width: number; height: number }[] {
  const text = pdf.toString('latin1');
  return [...text.matchAll(/\/MediaBox\s*\[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/g)].map((match) => ({ width: Number(match[1]), height: Number(match[2]) }));
}

const same = (a: { width: number; height: number }, b: { width: number; height: number }): boolean => Math.abs(a.width - b.width) < 1 && Math.abs(a.height - b.height) < 1;

beforeAll(async () => {
  folder = mkdtempSync(join(tmpdir(), 'steamwright-print-'));
  context = await chromium.launchPersistentContext(join(folder, 'profile'), {
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
});

afterAll(async () => {
  await context?.close();
  if (folder) rmSync(folder, { recursive: true, force: true });
});

describe.each(DEMO_CASES)('the printed report of %s', (name) => {
  let file: string;
  let scenarioCount: number;

  beforeAll(async () => {
    const solved = await solveDemo(name);
    const scenarios = await scenarioSections(name);
    scenarioCount = scenarios.length;
    file = join(folder, `${name}.html`);
    writeFileSync(file, htmlReport(solved.plant, solved.result, { scenarios, titleBlock: { date: '2026-12-03', version: 'test', caseHash: '00000000' } }));
  });

  it('prints each diagram on an A3 landscape page and everything else on A4 portrait', async () => {
    const page = await context.newPage();
    await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
    const sizes = pageSizes(await page.pdf({ preferCSSPageSize: true, printBackground: true }));
    await page.close();
    expect(sizes.length).toBeGreaterThan(1);
    expect(same(sizes[0], A3_LANDSCAPE), `first page ${JSON.stringify(sizes[0])}`).toBe(true);
    const a3 = sizes.filter((size) => same(size, A3_LANDSCAPE)).length;
    const a4 = sizes.filter((size) => same(size, A4_PORTRAIT)).length;
    // One wall page for the plant as written and one for each scenario.
    expect(a3).toBe(1 + scenarioCount);
    expect(a3 + a4).toBe(sizes.length);
    console.log(`${name}: ${sizes.length} printed pages, ${a3} of them A3`);
  });

  it('every diagram label is at least 7 pt on the A3 sheet', async () => {
    const page = await context.newPage();
    await page.setViewportSize({ width: Math.floor(A3_PRINTABLE_PX.width), height: Math.floor(A3_PRINTABLE_PX.height) });
    await page.emulateMedia({ media: 'print' });
    await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
    // Page source as text (the project compiles without DOM types): the
    // rendered size of each text, its font size times the SVG's scale on the
    // page, and the rendered height of its box.
    const sizes = (await page.evaluate(`[...document.querySelectorAll('.diagram-wrap svg text')].map((text) => {
      const scale = text.getScreenCTM().a;
      const box = text.getBoundingClientRect();
      return { text: text.textContent, px: Number(text.getAttribute('font-size')) * scale, lines: text.querySelectorAll('tspan').length, boxPx: box.height };
    })`)) as { text: string; px: number; lines: number; boxPx: number }[];
    await page.close();
    expect(sizes.length).toBeGreaterThan(20);
    const smallest = sizes.reduce((least, size) => (size.px < least.px ? size : least));
    expect(smallest.px * PT_PER_PX, `smallest label: ${smallest.text}`).toBeGreaterThanOrEqual(7);
    // The boxes as drawn agree: a line of text at least 7 pt tall.
    for (const size of sizes) expect((size.boxPx / size.lines) * PT_PER_PX, size.text).toBeGreaterThanOrEqual(7);
    console.log(`${name}: smallest diagram label ${(smallest.px * PT_PER_PX).toFixed(2)} pt at A3`);
  });
});
