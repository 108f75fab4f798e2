// `steamwright watch` as a user runs it: the command in its own process on a
// copy of the creamery case, the page in Debian's chromium. Saving the case
// redraws the diagram; a broken save shows the located error over the last
// good balance, greyed; the fix brings it back. Only two paths are served,
// only on 127.0.0.1, only to this machine's own names for it.
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { request } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../helpers/cli.js';

const CHROMIUM = '/usr/bin/chromium';
const binary = fileURLToPath(new URL('../../dist/src/cli/main.js', import.meta.url));
/** How long a redraw may take before the test gives up; generous for a loaded machine. The time taken is printed, not asserted. */
const REDRAW_LIMIT_MS = 120_000;

let folder: string;
let caseFile: string;
let original: string;
let child: ChildProcess;
let url: string;
let context: BrowserContext;
let profile: string;
let page: Page;
const consoleErrors: string[] = [];

function get(path: string, host?: string): Promise<{ status: number; body: string }> {
  const address = new URL(url);
  return new Promise((done, fail) => {
    // The path goes out exactly as written: no client-side clean-up of "..".
    const call = request({ host: address.hostname, port: address.port, path, method: 'GET', headers: host ? { Host: host } : {} }, (response) => {
      let body = '';
      response.setEncoding('utf8').on('data', (chunk: string) => (body += chunk));
      response.on('end', () => done({ status: response.statusCode ?? 0, body }));
    });
    call.on('error', fail);
    call.end();
  });
}

/** The diagram's text as the browser shows it. */
const diagramText = (): Promise<string> => page.locator('svg').first().evaluate((svg) => svg.textContent ?? '');
const version = (): Promise<number> => page.locator('meta[name="steamwright-version"]').getAttribute('content').then(Number);

/** Saves the case and waits for the page to reload past `after`; returns the ms it took. */
async function saveAndWait(text: string, after: number): Promise<number> {
  const started = Date.now();
  writeFileSync(caseFile, text);
  // A function, not page source as text: the page's policy forbids eval. The
  // project compiles without DOM types, so the page's document is reached untyped.
  await page.waitForFunction(
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    (seen: number) => Number((globalThis as any).document.querySelector('meta[name="steamwright-version"]')?.getAttribute('content')) > seen,
    after,
    { timeout: REDRAW_LIMIT_MS, polling: 50 },
  );
  return Date.now() - started;
}

beforeAll(async () => {
  if (!existsSync(CHROMIUM)) throw new Error(`the watch test needs Debian's chromium at ${CHROMIUM}; install it with "apt-get install -y chromium" (.ci/run does this)`);
  folder = mkdtempSync(join(tmpdir(), 'steamwright-watch-'));
  caseFile = join(folder, 'creamery.yaml');
  original = readFileSync(join(projectRoot, 'cases', 'millbrook-creamery.yaml'), 'utf8');
  writeFileSync(caseFile, original);
  child = spawn(process.execPath, [binary, 'watch', caseFile, '--scenario', 'winter'], { stdio: ['ignore', 'pipe', 'pipe'] });
  url = await new Promise<string>((done, fail) => {
    let out = '';
    child.stdout!.setEncoding('utf8').on('data', (chunk: string) => {
      out += chunk;
      const found = /serving (http:\/\/\S+)/.exec(out);
      if (found) done(found[1]);
    });
    child.on('exit', (code) => fail(new Error(`watch ended with ${code} before serving`)));
  });
  profile = mkdtempSync(join(tmpdir(), 'steamwright-chromium-'));
  context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  page = await context.newPage();
  page.on('console', (message) => {
    if (message.type() === 'error') consoleErrors.push(message.text());
  });
  page.on('pageerror', (error) => consoleErrors.push(error.message));
  await page.goto(url, { waitUntil: 'load' });
}, 180_000);

afterAll(async () => {
  await context?.close();
  child?.kill('SIGINT');
  if (profile) rmSync(profile, { recursive: true, force: true });
  if (folder) rmSync(folder, { recursive: true, force: true });
});

describe('steamwright watch', () => {
  it('serves on 127.0.0.1 only the page and its events: other paths 404, other host names 403', async () => {
    expect(new URL(url).hostname).toBe('127.0.0.1');
    expect((await get('/')).status).toBe(200);
    for (const path of ['/../../etc/passwd', '/creamery.yaml', `/${encodeURIComponent(caseFile)}`, '/%2e%2e/%2e%2e/etc/passwd', '/events/../../etc/passwd', '/index.html']) {
      expect((await get(path)).status, path).toBe(404);
    }
    expect((await get('/', 'attacker.example:80')).status).toBe(403);
  });

  it('redraws the diagram when the case is saved', async () => {
    const before = await diagramText();
    expect(before).toContain('space_heating');
    const edited = original.replace('- { id: space_heating, steam: 7 klb/h }', '- { id: space_heating, steam: 11 klb/h }');
    expect(edited).not.toBe(original);
    const took = await saveAndWait(edited, await version());
    const after = await diagramText();
    expect(after).not.toBe(before);
    expect(await page.locator('#watch-status').getAttribute('class')).not.toBe('failed');
    console.log(`watch: the page redrew ${took} ms after the save`);
  });

  it('a broken save shows the located error over the last good balance, greyed; the fix restores it', async () => {
    const good = await diagramText();
    const broken = original.replace('- { id: space_heating, steam: 7 klb/h }', '- { id: space_heating, steam: lots }');
    await saveAndWait(broken, await version());
    const status = page.locator('#watch-status');
    expect(await status.getAttribute('class')).toBe('failed');
    const message = await status.textContent();
    expect(message).toMatch(/creamery\.yaml:\d+:\d+/);
    expect(message).toMatch(/space_heating|steam/);
    expect(await page.locator('body').getAttribute('class')).toBe('watch-stale');
    expect(await diagramText()).toBe(good);
    await saveAndWait(original, await version());
    expect(await page.locator('#watch-status').getAttribute('class')).toBeNull();
    expect(await page.locator('body').getAttribute('class')).toBeNull();
    expect(consoleErrors).toEqual([]);
  });
});
