// The reports opened in a real browser (Debian's chromium driven by
// playwright-core): no console errors, no network requests, every header and
// unit in the diagram, and no two text labels overlapping as the browser
// measures them. Screenshots go to tests/output/ for people to look at.
import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { htmlReport, layoutDiagram, renderDiagramSvg } from '../../src/report/index.js';
import { projectRoot } from '../helpers/cli.js';
import { generatedDiagram } from './helpers/generatedDiagram.js';
import { DEMO_CASES, HOSTILE_NAME, hostileCaseText, scenarioSections, solveDemo, solveText, type Solved } from './helpers/solvedCases.js';

export const CHROMIUM = '/usr/bin/chromium';
const OUTPUT = join(projectRoot, 'tests', 'output');

interface PageRun {
  page: Page;
  consoleErrors: string[];
  requests: string[];
  dialogs: string[];
}

let context: BrowserContext;
let profile: string;

async function open(file: string): Promise<PageRun> {
  const page = await context.newPage();
  const run: PageRun = { page, consoleErrors: [], requests: [], dialogs: [] };
  page.on('console', (message) => {
    if (message.type() === 'error') run.consoleErrors.push(message.text());
  });
  page.on('pageerror', (error) => run.consoleErrors.push(error.message));
  page.on('request', (request) => run.requests.push(request.url()));
  page.on('dialog', (dialog) => {
    run.dialogs.push(dialog.message());
    void dialog.dismiss();
  });
  await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
  return run;
}

/**
 * Pairs of texts within one SVG whose boxes, as the browser measures them
 * (getBBox), overlap by more than half a pixel. The function runs in the page,
 * so it is written as page source: the project compiles without DOM types.
 */
const OVERLAPPING_TEXTS = `(selector) => {
  const found = [];
  for (const svg of document.querySelectorAll(selector)) {
    const texts = [...svg.querySelectorAll('text')];
    const boxes = texts.map((text) => text.getBBox());
    for (let first = 0; first < boxes.length; first++) {
      for (let second = first + 1; second < boxes.length; second++) {
        const a = boxes[first];
        const b = boxes[second];
        const tolerance = 0.5;
        if (a.x + tolerance < b.x + b.width && b.x + tolerance < a.x + a.width && a.y + tolerance < b.y + b.height && b.y + tolerance < a.y + a.height) {
          found.push('"' + texts[first].textContent + '" / "' + texts[second].textContent + '"');
        }
      }
    }
  }
  return found;
}`;

function overlappingTexts(page: Page, selector: string): Promise<string[]> {
  return page.evaluate(`(${OVERLAPPING_TEXTS})(${JSON.stringify(selector)})`) as Promise<string[]>;
}

function caseIds(solved: Solved): string[] {
  const plant = solved.plant;
  return [...plant.headers, ...plant.boilers, ...plant.heatRecoveryBoilers, ...plant.steamImports, ...plant.turbines, ...plant.letdowns, ...plant.users, ...plant.flashTanks, plant.deaerator, ...plant.machines].map((unit) => unit.id);
}

beforeAll(async () => {
  if (!existsSync(CHROMIUM)) {
    throw new Error(`the browser tests need Debian's chromium at ${CHROMIUM}; install it with "apt-get install -y chromium" (.ci/run does this)`);
  }
  mkdirSync(OUTPUT, { recursive: true });
  profile = mkdtempSync(join(tmpdir(), 'steamwright-chromium-'));
  context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1400, height: 900 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
});

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

describe.each(DEMO_CASES)('the report of %s in chromium', (name) => {
  let solved: Solved & { scenarioCount: number };
  let run: PageRun;
  const file = join(OUTPUT, `${name}.report.html`);

  beforeAll(async () => {
    solved = { ...(await solveDemo(name)), scenarioCount: 0 };
    // The board mill's report carries its three scenarios side by side.
    const scenarios = await scenarioSections(name);
    solved.scenarioCount = scenarios.length;
    writeFileSync(file, htmlReport(solved.plant, solved.result, { scenarios }));
    run = await open(file);
  });

  afterAll(async () => {
    await run?.page.close();
  });

  it('opens with no console errors and asks for nothing but itself', () => {
    expect(run.consoleErrors).toEqual([]);
    expect(run.requests).toEqual([pathToFileURL(file).href]);
  });

  it('shows every header and unit of the case in the diagram', async () => {
    const ids = await run.page.$$eval('svg.balance-diagram [data-id]', (elements) => elements.map((element) => element.getAttribute('data-id')));
    for (const id of caseIds(solved)) expect(ids, id).toContain(id);
  });

  it('draws one diagram for the plant and one for each scenario', async () => {
    expect(await run.page.locator('svg.balance-diagram').count()).toBe(1 + solved.scenarioCount);
  });

  it('has no two diagram labels overlapping as drawn', async () => {
    expect(await overlappingTexts(run.page, 'svg.balance-diagram')).toEqual([]);
    expect(await run.page.locator('svg.balance-diagram text').count()).toBeGreaterThan(10);
  });

  it('has no overlapping text in its charts', async () => {
    for (const chart of ['#chart-cost', '#chart-value', ...(solved.scenarioCount > 0 ? ['#chart-annual-cost', '#chart-scenario-cost'] : [])]) expect(await overlappingTexts(run.page, chart), chart).toEqual([]);
  });

  it('finds a unit\'s table row when the unit is clicked in the diagram', async () => {
    const user = solved.plant.users[0].id;
    await run.page.locator(`svg.balance-diagram [data-id="${user}"] text`).first().click();
    await expect.poll(() => run.page.locator(`table[data-table="users"] tr[data-id="${user}"]`).first().getAttribute('class')).toBe('picked');
  });

  it('saves screenshots of the whole report and of the diagram', async () => {
    await run.page.evaluate('window.scrollTo(0, 0)');
    const whole = join(OUTPUT, `${name}.report.png`);
    const diagram = join(OUTPUT, `${name}.diagram.png`);
    await run.page.screenshot({ path: whole, fullPage: true });
    await run.page.locator('.diagram-wrap').first().screenshot({ path: diagram });
    expect(existsSync(whole) && existsSync(diagram)).toBe(true);
  });
});

describe('a report whose case texts hold markup, in chromium', () => {
  it('runs no script from the case and shows the names as plain text', async () => {
    const solved = await solveText(hostileCaseText(), 'hostile.yaml');
    const file = join(OUTPUT, 'hostile.report.html');
    writeFileSync(file, htmlReport(solved.plant, solved.result));
    const run = await open(file);
    expect(run.dialogs).toEqual([]);
    expect(run.consoleErrors).toEqual([]);
    expect(await run.page.title()).toBe(`${HOSTILE_NAME}: steam balance report`);
    expect(await run.page.locator('h1').textContent()).toBe(HOSTILE_NAME);
    expect(await run.page.locator('script').count()).toBe(1);
    expect(await run.page.locator('img').count()).toBe(0);
    await run.page.close();
  });
});

describe('the generated 5-header, 40-unit diagram in chromium', () => {
  it('has no two labels overlapping as the browser measures them, and every unit drawn', async () => {
    const model = generatedDiagram();
    const file = join(OUTPUT, 'generated-40-units.html');
    writeFileSync(file, `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>generated</title></head><body style="margin:0">${renderDiagramSvg(layoutDiagram(model), 'generated plant')}</body></html>`);
    const run = await open(file);
    expect(run.consoleErrors).toEqual([]);
    expect(await overlappingTexts(run.page, 'svg.balance-diagram')).toEqual([]);
    const ids = await run.page.$$eval('svg.balance-diagram [data-id]', (elements) => elements.map((element) => element.getAttribute('data-id')));
    for (const item of model.items) expect(ids).toContain(item.id);
    await run.page.screenshot({ path: join(OUTPUT, 'generated-40-units.png'), fullPage: true });
    await run.page.close();
  });
});
