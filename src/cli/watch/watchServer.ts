// `steamwright watch`: the report of a case served on this machine only,
// solved again whenever the case file, its readings or (with the year) its
// profile changes, the page told to reload by server-sent events. A bare
// Node HTTP server: two paths, nothing else.
import { createHash } from 'node:crypto';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { dirname, join, resolve } from 'node:path';
import { watch, type FSWatcher } from 'chokidar';
import { formatIssue, loadCase } from '../../model/index.js';
import { escapeMarkup } from '../../report/escape.js';
import { CliError } from '../errors.js';
import { reconcileFilesOrFail } from '../reconcileRun.js';
import { reportHtml, solveForReport, type ReportRequest, type ReportSections } from '../reportSolve.js';
import { runYearWithProgress, yearInputOrFail } from '../yearRun.js';

/** Where the server listens: the loopback interface, never another. */
export const WATCH_HOST = '127.0.0.1';

export interface WatchSettings {
  casePath: string;
  request: ReportRequest;
  /** 0 (the default): an ephemeral port chosen by the system */
  port?: number;
  /** one line per event (solved, case error), for the terminal */
  log?: (line: string) => void;
  /** quiet time after a change before solving, ms; editors write in bursts */
  settleMs?: number;
  /** a readings CSV: the meters reconciled in their own section, redrawn when the file changes */
  readingsPath?: string;
  /** the year of the case's profile in its own section, solved again when the case or the profile changes */
  year?: boolean;
}

interface Problem {
  title: string;
  lines: string[];
}

/**
 * Reloads the page when the server's version differs from the one the page
 * was built at. Static text, so the page's policy can allow it by its hash.
 */
const WATCH_SCRIPT = `(() => {
  const built = document.querySelector('meta[name="steamwright-version"]').content;
  const events = new EventSource('/events');
  events.onmessage = (event) => {
    if (event.data !== built) {
      events.close();
      location.reload();
    }
  };
})();`;
const WATCH_SCRIPT_HASH = `sha256-${createHash('sha256').update(WATCH_SCRIPT, 'utf8').digest('base64')}`;

const WATCH_STYLE = `
#watch-status { font: 14px/1.4 system-ui, sans-serif; padding: 8px 12px; margin: 0 0 12px; border-left: 6px solid #2e6b30; background: #eef5ee; }
#watch-status.failed { border-left-color: #a11; background: #fbeaea; }
#watch-status pre { margin: 6px 0 0; white-space: pre-wrap; font: 13px/1.35 ui-monospace, monospace; }
body.watch-stale > *:not(#watch-status) { filter: grayscale(1); opacity: 0.45; }
`;

export class WatchServer {
  private html: string | null = null;
  private problem: Problem | null = null;
  private version = 0;
  private readonly clients = new Set<ServerResponse>();
  private readonly server: Server;
  private watcher: FSWatcher | null = null;
  private running: Promise<void> | null = null;
  private pending = false;
  private timer: NodeJS.Timeout | null = null;
  private port = 0;
  private readonly casePath: string;
  /** the files whose change redraws the page: the case, the readings, the profile the case names (with the year) */
  private watched = new Set<string>();

  constructor(private readonly settings: WatchSettings) {
    this.casePath = resolve(settings.casePath);
    this.watched.add(this.casePath);
    if (settings.readingsPath !== undefined) this.watched.add(resolve(settings.readingsPath));
    this.server = createServer((request, response) => this.handle(request, response));
  }

  /** Solves once, listens, and starts watching; resolves to the page's address. */
  async start(): Promise<string> {
    await this.rebuild();
    await new Promise<void>((done, fail) => {
      this.server.once('error', fail);
      this.server.listen(this.settings.port ?? 0, WATCH_HOST, () => done());
    });
    this.port = (this.server.address() as AddressInfo).port;
    // chokidar follows an editor's save-by-rename, which a plain fs.watch on the file loses.
    this.watcher = watch([...this.watched], { ignoreInitial: true });
    this.watcher.on('all', () => this.changed());
    // Until chokidar has set up its watches a save is not seen: on a busy
    // machine that took long enough for a save right after start to be lost.
    const watcher = this.watcher;
    await new Promise<void>((done) => watcher.once('ready', () => done()));
    return `http://${WATCH_HOST}:${this.port}/`;
  }

  async stop(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    await this.watcher?.close();
    for (const client of this.clients) client.end();
    this.clients.clear();
    await new Promise<void>((done) => this.server.close(() => done()));
    await this.running;
  }

  /** The version the page shows; it grows by one with each rebuild. */
  get currentVersion(): number {
    return this.version;
  }

  private changed(): void {
    if (this.timer) clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.refresh();
    }, this.settings.settleMs ?? 120);
  }

  /** One rebuild at a time; a change during one asks for one more after it. */
  private refresh(): Promise<void> {
    if (this.running) {
      this.pending = true;
      return this.running;
    }
    this.running = (async () => {
      do {
        this.pending = false;
        await this.rebuild();
      } while (this.pending);
      this.running = null;
    })();
    return this.running;
  }

  private async rebuild(): Promise<void> {
    const started = Date.now();
    const path = this.settings.casePath;
    const loaded = await loadCase(path);
    if (!loaded.ok) {
      const errors = loaded.issues.filter((issue) => issue.severity === 'error');
      this.problem = { title: `${path}: ${errors.length} error${errors.length === 1 ? '' : 's'}; the last good balance is shown greyed`, lines: loaded.issues.map((issue) => formatIssue(issue, path)) };
    } else {
      if (this.settings.year && loaded.plant.profile) this.follow(resolve(join(dirname(path), loaded.plant.profile.file)));
      const located: string[] = [];
      try {
        const sections: ReportSections = {};
        if (this.settings.readingsPath !== undefined) {
          const { outcome } = await reconcileFilesOrFail(path, this.settings.readingsPath, loaded.plant, { level: 0.05 }, (line) => located.push(line));
          sections.reconciled = { outcome, readingsFile: this.settings.readingsPath };
        }
        if (this.settings.year) {
          const { input } = await yearInputOrFail(path, loaded.plant, { objective: this.settings.request.objective, backend: this.settings.request.solver }, (line) => located.push(line));
          const run = await runYearWithProgress(input, { workers: this.settings.request.workers, quiet: true, keepRecords: true });
          sections.year = { result: run.result!, records: run.records ?? [] };
        }
        this.html = reportHtml(await solveForReport(path, loaded, this.settings.request), sections);
        this.problem = null;
      } catch (error) {
        if (!(error instanceof CliError)) throw error;
        this.problem = { title: `${path}: could not be solved; the last good balance is shown greyed`, lines: [...located, ...error.message.split('\n')] };
      }
    }
    this.version += 1;
    const seconds = ((Date.now() - started) / 1000).toFixed(1);
    this.settings.log?.(this.problem ? `${this.problem.title}\n${this.problem.lines.join('\n')}` : `solved ${path} in ${seconds} s; page version ${this.version}`);
    for (const client of this.clients) client.write(`data: ${this.version}\n\n`);
  }

  /** Watch one more file (a profile the case now names); the old ones stay watched, which costs nothing but a redraw. */
  private follow(file: string): void {
    if (this.watched.has(file)) return;
    this.watched.add(file);
    this.watcher?.add(file);
  }

  private handle(request: IncomingMessage, response: ServerResponse): void {
    // Only this machine's own names for the server: a page elsewhere that
    // points a name of its own at 127.0.0.1 gets nothing.
    const host = request.headers.host ?? '';
    if (host !== `${WATCH_HOST}:${this.port}` && host !== `localhost:${this.port}`) return plain(response, 403, 'forbidden');
    if (request.method !== 'GET' && request.method !== 'HEAD') return plain(response, 405, 'method not allowed');
    const path = (request.url ?? '/').split('?')[0];
    if (path === '/') {
      const page = this.page();
      response.writeHead(200, { 'Content-Type': 'text/html; charset=utf-8', 'Cache-Control': 'no-store', 'X-Content-Type-Options': 'nosniff' });
      response.end(request.method === 'HEAD' ? undefined : page);
      return;
    }
    if (path === '/events') {
      response.writeHead(200, { 'Content-Type': 'text/event-stream', 'Cache-Control': 'no-store', Connection: 'keep-alive' });
      response.write(`data: ${this.version}\n\n`);
      this.clients.add(response);
      request.on('close', () => this.clients.delete(response));
      return;
    }
    plain(response, 404, 'not found');
  }

  /** The report with a status line on top, or the problem alone before any balance was good. */
  private page(): string {
    const status = this.problem
      ? `<div id="watch-status" class="failed"><strong>${escapeMarkup(this.problem.title)}</strong><pre>${escapeMarkup(this.problem.lines.join('\n'))}</pre></div>`
      : `<div id="watch-status">Watching ${escapeMarkup([this.settings.casePath, ...(this.settings.readingsPath !== undefined ? [this.settings.readingsPath] : [])].join(' and '))}${this.settings.year ? ' and the profile the case names' : ''}: the page redraws when a file is saved.</div>`;
    const head = [`<meta name="steamwright-version" content="${this.version}">`, `<style>${WATCH_STYLE}</style>`].join('\n');
    const script = `<script>${WATCH_SCRIPT}</script>`;
    return (this.html ? withWatchPolicy(this.html) : emptyReport())
      .replace('</head>', `${head}\n</head>`)
      .replace('<body>', `<body${this.problem ? ' class="watch-stale"' : ''}>\n${status}`)
      .replace('</body>', `${script}\n</body>`);
  }
}

/** The report's own policy, which also lets the watch script run and reach /events on this server. */
function withWatchPolicy(html: string): string {
  const found = /<meta http-equiv="Content-Security-Policy" content="([^"]*)">/.exec(html);
  if (!found) throw new Error('the report has no Content-Security-Policy; the watch page extends it and will not serve a page without one');
  const policy = found[1].replace("script-src '", `script-src '${WATCH_SCRIPT_HASH}' '`);
  return html.replace(found[0], `<meta http-equiv="Content-Security-Policy" content="${policy}; connect-src 'self'">`);
}

function emptyReport(): string {
  return [
    '<!doctype html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; script-src '${WATCH_SCRIPT_HASH}'; connect-src 'self'">`,
    '<title>steamwright watch</title>',
    '</head>',
    '<body>',
    '<p>No balance yet: the case has not solved since the watch began.</p>',
    '</body>',
    '</html>',
  ].join('\n');
}

function plain(response: ServerResponse, status: number, text: string): void {
  response.writeHead(status, { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-store' });
  response.end(`${text}\n`);
}
