/**
 * Benchmark 6: size of the production functions bundle (minified by webpack,
 * gzip level 9 through zlib) and the time Chromium (tests/support/chromium.ts:
 * DRIFTCELL_CHROMIUM, then the system locations) takes to run it
 * and bind every function to a stand-in CustomFunctions runtime (the same
 * stand-in idea as tests/excel/bundle.browser.test.ts). Target: ≤ 150 kB gzipped.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import { startServer } from '../dev/devServer';
import { CHROMIUM_ARGS, findChromium } from '../tests/support/chromium';
import { median } from './lib/timing';
import { figure, show, target, type Section } from './lib/results';

export const BUNDLE_MAX_GZIP_KB = 150;
const HOST_PAGE = '/__bench__/host.html';
/** Marks the time right before and after the bundle runs; the bundle is fetched first (it is a blocking script). */
const HOST_HTML =
  '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>bench host</title></head><body>' +
  '<script src="/functions.js"></script><script>window.__benchEnd = performance.now();</script></body></html>';
const LOADS = 5;

/** Stand-in for Excel's CustomFunctions runtime; records when the first and last function is bound. */
function installFakeRuntime(): void {
  const w = window as unknown as Record<string, unknown>;
  const bound: Record<string, unknown> = {};
  w.CustomFunctions = {
    bound,
    associate(id: string, fn: unknown) {
      if (w.__benchFirstBind === undefined) w.__benchFirstBind = performance.now();
      bound[id] = fn;
      w.__benchLastBind = performance.now();
    },
    Error: class {
      constructor(
        readonly code: string,
        readonly message?: string,
      ) {}
    },
    ErrorCode: {
      invalidValue: '#VALUE!',
      notAvailable: '#N/A',
      divisionByZero: '#DIV/0!',
      invalidNumber: '#NUM!',
      nullReference: '#NULL!',
      invalidName: '#NAME?',
      invalidReference: '#REF!',
    },
  };
}

/** Runs benchmark 6. */
export async function runBundle(projectRoot: string): Promise<Section> {
  const addin = path.join(projectRoot, 'dist', 'addin');
  const bundlePath = path.join(addin, 'functions.js');
  if (!existsSync(bundlePath)) throw new Error(`${bundlePath} is missing: run npm run build first`);
  const chromiumPath = findChromium();
  const bytes = readFileSync(bundlePath);
  const gzipKB = gzipSync(bytes, { level: 9 }).length / 1000;
  const metadata = JSON.parse(readFileSync(path.join(addin, 'functions.json'), 'utf8')) as { functions: unknown[] };
  // The pane's own code: it reuses the catalog and physics modules from functions.js (webpack dependOn).
  const paneBytes = readFileSync(path.join(addin, 'taskpane.js'));
  const paneGzipKB = gzipSync(paneBytes, { level: 9 }).length / 1000;

  // The bundle is served uncached, so every load downloads and compiles it anew.
  const server = await startServer(
    (req, res) => {
      const url = req.url ?? '/';
      if (url.startsWith(HOST_PAGE)) {
        res.writeHead(200, { 'Content-Type': 'text/html; charset=utf-8', 'Cache-Control': 'no-store' });
        res.end(HOST_HTML);
      } else if (url.startsWith('/functions.js')) {
        res.writeHead(200, { 'Content-Type': 'text/javascript; charset=utf-8', 'Cache-Control': 'no-store' });
        res.end(bytes);
      } else {
        res.writeHead(404, { 'Content-Type': 'text/plain' });
        res.end('not found');
      }
    },
    { port: 0, host: '127.0.0.1' },
  );
  const profile = mkdtempSync(path.join(os.tmpdir(), 'driftcell-bench-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath,
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const runMs: number[] = [];
  const bindMs: number[] = [];
  let boundCount = 0;
  try {
    await context.route('**/*', (route) => (route.request().url().startsWith(`${server.url}/`) ? route.continue() : route.abort()));
    await context.addInitScript(installFakeRuntime);
    const page = context.pages()[0] ?? (await context.newPage());
    for (let i = 0; i <= LOADS; i++) {
      // A fresh query string each time, so the bundle is fetched and compiled anew.
      await page.goto(`${server.url}${HOST_PAGE}?load=${i}`, { waitUntil: 'load', timeout: 30000 });
      const timing = await page.evaluate(() => {
        const w = window as unknown as Record<string, number> & { CustomFunctions: { bound: object } };
        const entry = performance.getEntriesByType('resource').find((e) => e.name.endsWith('/functions.js')) as PerformanceResourceTiming;
        return {
          fetched: entry.responseEnd,
          end: w.__benchEnd,
          first: w.__benchFirstBind,
          last: w.__benchLastBind,
          bound: Object.keys(w.CustomFunctions.bound).length,
        };
      });
      boundCount = timing.bound;
      if (i === 0) continue; // the first load warms the browser up
      runMs.push(timing.end - timing.fetched);
      bindMs.push(timing.last - timing.first);
    }
  } finally {
    await context.close();
    await server.close();
    rmSync(profile, { recursive: true, force: true });
  }
  if (boundCount !== metadata.functions.length)
    throw new Error(`${boundCount} functions bound, functions.json lists ${metadata.functions.length}`);
  const t = target('bundle_gzip_kb', gzipKB, BUNDLE_MAX_GZIP_KB, '≤ 150 kB gzipped');
  const runMedian = median(runMs);
  return {
    title: 'Functions bundle',
    description: `dist/addin/functions.js as built by webpack (production, minified), gzip level 9; run and bind time in headless ${chromiumPath}, median of ${LOADS} loads after one warm-up (from the end of the download to the end of the script).`,
    figures: {
      bundle_bytes: figure(bytes.length / 1000, 'kB'),
      bundle_gzip_kb: figure(gzipKB, 'kB'),
      taskpane_bytes: figure(paneBytes.length / 1000, 'kB'),
      taskpane_gzip_kb: figure(paneGzipKB, 'kB'),
      functions_bound: boundCount,
      run_and_register_ms: figure(runMedian, 'ms'),
      bind_calls_ms: figure(median(bindMs), 'ms'),
    },
    targets: [t],
    rows: [
      {
        benchmark: `6. functions bundle, minified + gzip`,
        ours: show(gzipKB, 'kB'),
        other: `${show(bytes.length / 1000, 'kB')} minified`,
        ratio: '—',
        target: '≤ 150 kB',
        met: t.met ? 'yes' : 'no',
      },
      {
        benchmark: `6. task pane bundle (shares the core with functions.js), minified + gzip`,
        ours: show(paneGzipKB, 'kB'),
        other: `${show(paneBytes.length / 1000, 'kB')} minified`,
        ratio: '—',
        target: '—',
        met: '—',
      },
      {
        benchmark: `6. run bundle and register all ${boundCount} functions, headless Chromium`,
        ours: show(runMedian, 'ms'),
        other: '—',
        ratio: '—',
        target: '—',
        met: '—',
      },
    ],
  };
}
