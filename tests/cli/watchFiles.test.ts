// steamwright watch follows the files beside the case: the readings (--readings)
// and, with --year, the profile the case names. Saving either redraws the
// page; a bad readings file shows its located problem over the last good page.
// The server runs in this process and is asked over HTTP, as a browser would.
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { get } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, test } from 'vitest';
import { WatchServer } from '../../src/cli/watch/watchServer.js';
import { projectRoot } from '../helpers/cli.js';

/** Generous for a loaded machine; the test waits for the version, it does not time it. */
const WAIT_MS = 120_000;
let server: WatchServer | null = null;

afterEach(async () => {
  await server?.stop();
  server = null;
});

function fetchPage(url: string): Promise<string> {
  return new Promise((done, fail) => {
    get(url, (response) => {
      let body = '';
      response.setEncoding('utf8').on('data', (chunk: string) => (body += chunk));
      response.on('end', () => done(body));
    }).on('error', fail);
  });
}

async function nextVersion(watching: WatchServer, after: number): Promise<void> {
  const started = Date.now();
  while (watching.currentVersion <= after) {
    if (Date.now() - started > WAIT_MS) throw new Error(`no redraw within ${WAIT_MS} ms`);
    await new Promise((done) => setTimeout(done, 50));
  }
}

/** The reconciled figure of one meter, as the page's readings table shows it. */
function measured(page: string, tag: string): string | undefined {
  return new RegExp(`<tr data-id="${tag}"><td>${tag}</td><td class="num">([^<]*)</td>`).exec(page)?.[1];
}

describe('watch follows the readings and the profile', () => {
  test('--readings: a saved readings file redraws the meters; a bad one is located and the last page stays, greyed', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-watch-readings-'));
    const casePath = join(folder, 'creamery.yaml');
    const readingsPath = join(folder, 'readings.csv');
    copyFileSync(join(projectRoot, 'cases', 'millbrook-creamery.yaml'), casePath);
    const readings = readFileSync(join(projectRoot, 'cases', 'millbrook-creamery.readings.csv'), 'utf8');
    writeFileSync(readingsPath, readings);
    server = new WatchServer({ casePath, readingsPath, request: { solver: 'highs', workers: 1 }, settleMs: 50 });
    const url = await server.start();
    const first = await fetchPage(url);
    expect(first).toContain('<section id="reconciliation">');
    expect(measured(first, 'FT-101')).toBe('28.04 klb/h');

    let version = server.currentVersion;
    writeFileSync(readingsPath, readings.replace('FT-101,28.04,klb/h', 'FT-101,27.50,klb/h'));
    await nextVersion(server, version);
    const second = await fetchPage(url);
    expect(measured(second, 'FT-101')).toBe('27.50 klb/h');
    expect(second).not.toContain('class="watch-stale"');

    version = server.currentVersion;
    const badLine = readings.split('\n').findIndex((line) => line.startsWith('FT-103')) + 1;
    writeFileSync(readingsPath, readings.replace('FT-103,29.15,klb/h', 'FT-103,lots,klb/h'));
    await nextVersion(server, version);
    const third = await fetchPage(url);
    expect(third).toContain('class="watch-stale"');
    expect(third).toContain(`readings.csv:${badLine}: `);
    expect(measured(third, 'FT-101')).toBe('27.50 klb/h');
  });

  test('--year: saving the profile solves the year again', async () => {
    const folder = mkdtempSync(join(tmpdir(), 'steamwright-watch-year-'));
    mkdirSync(join(folder, 'profiles'));
    const mill = readFileSync(join(projectRoot, 'cases', 'kestrel-bay-board-mill.yaml'), 'utf8');
    const casePath = join(folder, 'mill.yaml');
    writeFileSync(casePath, `${mill.slice(0, mill.indexOf('# Scenarios:'))}\nprofile:\n  file: profiles/short.csv\n`);
    const rows = readFileSync(join(projectRoot, 'cases', 'profiles', 'kestrel-bay-year.csv'), 'utf8').split('\n');
    const profilePath = join(folder, 'profiles', 'short.csv');
    writeFileSync(profilePath, `${rows.slice(0, 3).join('\n')}\n`);
    server = new WatchServer({ casePath, year: true, request: { solver: 'highs', workers: 1 }, settleMs: 50 });
    const url = await server.start();
    expect(await fetchPage(url)).toMatch(/short\.csv \(2 hourly periods, 2 h\)/);
    const version = server.currentVersion;
    writeFileSync(profilePath, `${rows.slice(0, 4).join('\n')}\n`);
    await nextVersion(server, version);
    expect(await fetchPage(url)).toMatch(/short\.csv \(3 hourly periods, 3 h\)/);
  });
});
