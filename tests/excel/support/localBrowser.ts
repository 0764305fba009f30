/**
 * Chromium (tests/support/chromium.ts finds it: DRIFTCELL_CHROMIUM, then the
 * system locations, Debian's /usr/bin/chromium first), launched for tests that must see every request: a fresh
 * profile, the flags this machine's closed network needs, and a route that
 * lets through only the test's own localhost server and records (and blocks)
 * everything else. Never downloads a browser.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from 'fs';
import os from 'os';
import path from 'path';
import { chromium, type BrowserContext } from 'playwright-core';
import { CHROMIUM_ARGS, findChromium } from '../../support/chromium';

export { CHROMIUM_ARGS, findChromium };

/** Debian's Chromium, the first system location tried on Linux; the browser launched is findChromium()'s. */
export const CHROMIUM = '/usr/bin/chromium';

export interface LocalBrowser {
  readonly context: BrowserContext;
  /** Every URL the pages asked for, in order. */
  readonly requested: string[];
  /** URLs refused because they were not for the server. */
  readonly blocked: string[];
  /** Outside URLs answered from a local copy (see LocalCopy); never sent. */
  readonly servedLocally: string[];
  /** Empties both lists. */
  clear(): void;
  close(): Promise<void>;
}

/**
 * Outside files the test answers from a folder on this machine instead of the
 * network: a request whose URL starts with `urlPrefix` gets the file of the
 * same relative path under `folder` (Office.js from its npm package, for
 * example). A path that is not in the folder is blocked like any other.
 */
export interface LocalCopy {
  readonly urlPrefix: string;
  readonly folder: string;
}

const CONTENT_TYPES: Readonly<Record<string, string>> = {
  '.js': 'text/javascript; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.html': 'text/html; charset=utf-8',
};

function localFile(url: string, copies: readonly LocalCopy[]): string | undefined {
  for (const copy of copies) {
    if (!url.startsWith(copy.urlPrefix)) continue;
    const relative = decodeURIComponent(new URL(url).pathname.slice(new URL(copy.urlPrefix).pathname.length));
    const file = path.resolve(copy.folder, relative);
    if (!file.startsWith(path.resolve(copy.folder) + path.sep)) return undefined;
    return existsSync(file) && statSync(file).isFile() ? file : undefined;
  }
  return undefined;
}

/** Launches Chromium allowing requests to `serverUrl` only (and answering `localCopies` from disk). */
export async function launchLocalBrowser(serverUrl: string, localCopies: readonly LocalCopy[] = []): Promise<LocalBrowser> {
  const executablePath = findChromium();
  const profile = mkdtempSync(path.join(os.tmpdir(), 'driftcell-chromium-'));
  const context = await chromium.launchPersistentContext(profile, { executablePath, headless: true, args: CHROMIUM_ARGS });
  const requested: string[] = [];
  const blocked: string[] = [];
  const servedLocally: string[] = [];
  context.on('request', (request) => requested.push(request.url()));
  await context.route('**/*', (route) => {
    const url = route.request().url();
    if (url.startsWith(`${serverUrl}/`)) return route.continue();
    const file = localFile(url, localCopies);
    if (file !== undefined) {
      servedLocally.push(url);
      return route.fulfill({
        status: 200,
        contentType: CONTENT_TYPES[path.extname(file)] ?? 'application/octet-stream',
        body: readFileSync(file),
      });
    }
    blocked.push(url);
    return route.abort();
  });
  return {
    context,
    requested,
    blocked,
    servedLocally,
    clear() {
      requested.length = 0;
      blocked.length = 0;
      servedLocally.length = 0;
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
