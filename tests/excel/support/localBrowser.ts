/**
 * Debian's Chromium, launched for tests that must see every request: a fresh
 * profile, the flags this machine's closed network needs, and a route that
 * lets through only the test's own localhost server and records (and blocks)
 * everything else. Never downloads a browser.
 */
import { existsSync, mkdtempSync, rmSync } from 'fs';
import os from 'os';
import path from 'path';
import { chromium, type BrowserContext } from 'playwright-core';

export const CHROMIUM = '/usr/bin/chromium';

export const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'];

export interface LocalBrowser {
  readonly context: BrowserContext;
  /** Every URL the pages asked for, in order. */
  readonly requested: string[];
  /** URLs refused because they were not for the server. */
  readonly blocked: string[];
  /** Empties both lists. */
  clear(): void;
  close(): Promise<void>;
}

/** Launches Chromium allowing requests to `serverUrl` only. */
export async function launchLocalBrowser(serverUrl: string): Promise<LocalBrowser> {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: install Debian's chromium (sudo apt-get install chromium); this test never downloads a browser`);
  const profile = mkdtempSync(path.join(os.tmpdir(), 'driftcell-chromium-'));
  const context = await chromium.launchPersistentContext(profile, { executablePath: CHROMIUM, headless: true, args: CHROMIUM_ARGS });
  const requested: string[] = [];
  const blocked: string[] = [];
  context.on('request', (request) => requested.push(request.url()));
  await context.route('**/*', (route) => {
    const url = route.request().url();
    if (url.startsWith(`${serverUrl}/`)) return route.continue();
    blocked.push(url);
    return route.abort();
  });
  return {
    context,
    requested,
    blocked,
    clear() {
      requested.length = 0;
      blocked.length = 0;
    },
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
