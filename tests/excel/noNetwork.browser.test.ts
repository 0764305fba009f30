/**
 * No request leaves localhost from the add-in's pages: the built task pane
 * (dist/addin/taskpane.html) and help pages, served from a localhost server
 * and opened in Debian's Chromium through playwright-core. Every request is
 * recorded; any that is not for the server is blocked. The task pane's one
 * outside request must be Office.js from Microsoft's CDN
 * (appsforoffice.microsoft.com), the documented way to load it; help pages
 * make none. Each page's Content-Security-Policy is checked, and shown to be
 * enforced: a fetch to another origin is refused before it becomes a request.
 *
 * Needs `npm run build` first (npm test runs it). Never downloads a browser.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { startServer, staticRequestHandler, type RunningServer } from '../../dev/devServer';
import { ADDIN_DIR, requireAddinBuild } from './support/build';
import { launchLocalBrowser, type LocalBrowser } from './support/localBrowser';

const OFFICE_JS = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';

/** A policy's directives: name → sources. */
function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0] !== '')
      .map(([name, ...sources]) => [name, sources]),
  );
}

describe('the add-in pages in Chromium make no request outside localhost', () => {
  let server: RunningServer;
  let context: BrowserContext;
  let browser: LocalBrowser;
  let requested: string[];
  let blocked: string[];

  beforeAll(async () => {
    requireAddinBuild();
    server = await startServer(staticRequestHandler(ADDIN_DIR), { port: 0, host: '127.0.0.1' });
    browser = await launchLocalBrowser(server.url);
    context = browser.context;
    requested = browser.requested;
    blocked = browser.blocked;
  });

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  async function open(file: string): Promise<Page> {
    browser.clear();
    const page = await context.newPage();
    await page.goto(`${server.url}/${file}`, { waitUntil: 'load', timeout: 30000 });
    await page.waitForLoadState('networkidle', { timeout: 30000 });
    return page;
  }

  /** Tries a fetch to another origin from the page; CSP must refuse it before it is sent. */
  async function fetchElsewhere(page: Page): Promise<string> {
    return page.evaluate(async () => {
      try {
        await fetch('https://example.invalid/driftcell-probe');
        return 'sent';
      } catch {
        return 'refused';
      }
    });
  }

  it('task pane: the only outside request is Office.js from appsforoffice.microsoft.com', async () => {
    const page = await open('taskpane.html');
    expect(blocked).toEqual([OFFICE_JS]);
    expect(new URL(blocked[0]).hostname).toBe('appsforoffice.microsoft.com');
    expect(requested.filter((u) => !u.startsWith(`${server.url}/`))).toEqual([OFFICE_JS]);
    expect(requested).toEqual(
      expect.arrayContaining([
        `${server.url}/taskpane.html`,
        `${server.url}/functions.js`,
        `${server.url}/taskpane.js`,
        `${server.url}/taskpane.css`,
      ]),
    );
    // Office.js was blocked, so the pane says it is not in Excel: the page still works on its own.
    expect(await page.locator('#status').textContent()).toMatch(/Office\.js is not available/);
    await page.close();
  });

  it('task pane: its policy allows only its own origin and Office.js, and is enforced', async () => {
    const page = await open('taskpane.html');
    const policy = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
    const rules = directives(policy ?? '');
    expect(rules.get('default-src')).toEqual(["'self'"]);
    expect(rules.get('script-src')).toEqual(["'self'", 'https://appsforoffice.microsoft.com']);
    expect(rules.get('connect-src')).toEqual(["'self'"]);
    expect(rules.get('object-src')).toEqual(["'none'"]);
    // No inline script anywhere in the policy.
    expect(policy).not.toMatch(/unsafe-inline|unsafe-eval|\*/);
    const before = requested.length;
    expect(await fetchElsewhere(page)).toBe('refused');
    expect(requested.slice(before).some((u) => u.includes('example.invalid'))).toBe(false);
    expect(blocked.some((u) => u.includes('example.invalid'))).toBe(false);
    await page.close();
  });

  it.each(['help/index.html', 'help/resistivity.html'])('%s: no outside request, no script, a policy that loads nothing', async (file) => {
    const page = await open(file);
    expect(blocked).toEqual([]);
    expect(requested).toEqual([`${server.url}/${file}`]);
    expect(await page.locator('script').count()).toBe(0);
    const policy = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
    const rules = directives(policy ?? '');
    // Stricter than default-src 'self': the pages need nothing but their own inline stylesheet.
    expect(rules.get('default-src')).toEqual(["'none'"]);
    expect(rules.get('style-src')).toEqual(["'unsafe-inline'"]);
    expect(rules.has('script-src')).toBe(false);
    expect(await fetchElsewhere(page)).toBe('refused');
    expect(blocked).toEqual([]);
    await page.close();
  });
});
