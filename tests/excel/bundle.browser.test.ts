/**
 * The production functions bundle (dist/addin/functions.js) on its own, in a
 * page without Office.js, in Debian's Chromium: it must load without a page
 * error, bind nothing (there is nothing to bind to), publish an empty status
 * for the pane, and request nothing but itself. This is the one situation
 * Office's real loader cannot show (officeLoader.browser.test.ts covers the
 * bundle under office.js); it keeps functions.js loadable alone, as the
 * manifest's Script element expects, even though the task pane shares its
 * code.
 *
 * Needs `npm run build` first (npm test runs it). Never downloads a browser.
 */
import type { Page } from 'playwright-core';
import { startServer, staticRequestHandler, type RunningServer } from '../../dev/devServer';
import { ADDIN_DIR, requireAddinBuild } from './support/build';
import { launchLocalBrowser, type LocalBrowser } from './support/localBrowser';

const HOST_PAGE = '/__test__/host.html';
/** A page that loads only the functions bundle: no Office.js, no task pane. */
const HOST_HTML =
  '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>functions alone</title></head><body><script src="/functions.js"></script></body></html>';

describe('the production functions bundle alone in Chromium', () => {
  let server: RunningServer;
  let browser: LocalBrowser;
  let page: Page;
  const pageErrors: string[] = [];

  beforeAll(async () => {
    requireAddinBuild();
    const files = staticRequestHandler(ADDIN_DIR);
    server = await startServer(
      (req, res) => {
        if (req.url === HOST_PAGE) {
          res.writeHead(200, { 'Content-Type': 'text/html; charset=utf-8' });
          res.end(HOST_HTML);
          return;
        }
        files(req, res);
      },
      { port: 0, host: '127.0.0.1' },
    );
    browser = await launchLocalBrowser(server.url);
    page = browser.context.pages()[0] ?? (await browser.context.newPage());
    page.on('pageerror', (error) => pageErrors.push(error.message));
    await page.goto(`${server.url}${HOST_PAGE}`, { waitUntil: 'load', timeout: 30000 });
  });

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('loads without a page error and binds nothing, saying so to the pane', async () => {
    expect(pageErrors).toEqual([]);
    const status = await page.evaluate(
      () => (window as unknown as { __driftcellFunctions?: { boundIds: string[] } }).__driftcellFunctions?.boundIds,
    );
    expect(status).toEqual([]);
  });

  it('requests nothing but the page and itself', () => {
    expect(browser.blocked).toEqual([]);
    expect(browser.requested).toEqual([`${server.url}${HOST_PAGE}`, `${server.url}/functions.js`]);
  });
});
