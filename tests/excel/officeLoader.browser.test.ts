/**
 * The add-in under Office's own loader, not a stand-in of ours: the built
 * shared-runtime page (dist/addin/taskpane.html) in Debian's Chromium, with
 * the real office.js from the @microsoft/office-js package answering the
 * page's CDN address, and office.js itself choosing and loading the host file
 * (excel-win32-16.01.js, excel-mac-16.00.js, excel-web-16.00.js) from the
 * same package, after functions.js has run. That host file is what defines
 * CustomFunctions.Error and ErrorCode and connects Office's custom-functions
 * runtime to the functions our bundle associated.
 *
 * The test plays only the host's side (support/excelHostSide.ts): the host
 * information Office reads from the page address, and for Excel desktop the
 * native bridge through which Excel sends recalculations and receives
 * results. Every invocation therefore runs through Office's own dispatcher
 * (argument conversion, the invocation object, error serialisation) and the
 * results are compared with the catalog's evaluate() in Node.
 *
 * Every request is for the localhost server or answered from the package on
 * disk; anything else is blocked and would fail the test.
 *
 * Needs `npm run build` first (npm test runs it). Never downloads a browser.
 */
import { readFileSync } from 'fs';
import path from 'path';
import type { Page } from 'playwright-core';
import { CATALOG, evaluate } from '../../src/catalog';
import type { FunctionSpec } from '../../src/catalog/types';
import { isFailure, type ArgumentInput, type CellOutput } from '../../src/catalog/values';
import { startServer, staticRequestHandler, type RunningServer } from '../../dev/devServer';
import { ADDIN_DIR, PROJECT_ROOT, requireAddinBuild } from './support/build';
import { ALLOW_ERRORS_FLAG, installExcelHostSide, sendInvocations, type InvocationResult } from './support/excelHostSide';
import { launchLocalBrowser, type LocalBrowser } from './support/localBrowser';
import { excelShapedArgs, parseLiteralCall, type LiteralCall } from './support/formulaArgs';

/** Where taskpane.html loads Office.js from. */
const OFFICE_CDN = 'https://appsforoffice.microsoft.com/lib/1/hosted/';
const OFFICE_PACKAGE = path.join(PROJECT_ROOT, 'node_modules', '@microsoft', 'office-js', 'dist');
const RELATIVE_TOLERANCE = 1e-12;

/** Host information as Office reads it from `_host_Info` (type$platform$version$locale…). */
const HOSTS = {
  windows: { info: 'Excel$Win32$16.01$en-US$$$$0', hostFile: 'excel-win32-16.01.js' },
  mac: { info: 'Excel$Mac$16.00$en-US$$$$0', hostFile: 'excel-mac-16.00.js' },
  web: { info: 'Excel$Web$16.00$en-US$$$$0', hostFile: 'excel-web-16.00.js' },
} as const;

type Element = number | string | { error: string; message: string | null };

const functionIds = (): string[] =>
  (JSON.parse(readFileSync(path.join(ADDIN_DIR, 'functions.json'), 'utf8')) as { functions: { id: string }[] }).functions.map((f) => f.id);

function literalExamples(spec: FunctionSpec): { formula: string; call: LiteralCall }[] {
  return spec.examples
    .map((e) => ({ formula: e.formula, call: parseLiteralCall(e.formula) }))
    .filter((x): x is { formula: string; call: LiteralCall } => x.call !== null && x.call.name === spec.name);
}

/** What Excel shows for the catalog's result: error texts, with the message only where Excel keeps one. */
function expectedInExcel(grid: CellOutput[][]): Element[][] {
  return grid.map((row) =>
    row.map((v) => {
      if (!isFailure(v)) return v;
      if (v.code === '#REF!' || v.code === '#NAME?') return { error: '#VALUE!', message: `${v.code}: ${v.message}` };
      return { error: v.code, message: v.code === '#VALUE!' || v.code === '#N/A' ? v.message : null };
    }),
  );
}

/** A result matrix as Office serialised it for the host (errors are CustomFunctionError.toJSON()). */
function fromOffice(value: unknown): Element[][] {
  return (value as unknown[][]).map((row) =>
    row.map((v) => {
      if (typeof v === 'number' || typeof v === 'string') return v;
      const e = v as { valueType?: string; code?: string; message?: string };
      if (e.valueType !== 'CustomFunctionError' || typeof e.code !== 'string') throw new Error(`unexpected element ${JSON.stringify(v)}`);
      return { error: e.code, message: e.message ?? null };
    }),
  );
}

function expectSame(actual: Element[][], expected: Element[][], label: string): void {
  expect({ label, shape: actual.map((r) => r.length) }).toEqual({ label, shape: expected.map((r) => r.length) });
  actual.forEach((row, r) =>
    row.forEach((value, c) => {
      const want = expected[r][c];
      if (typeof want === 'number' && typeof value === 'number') {
        const close = Math.abs(value - want) <= RELATIVE_TOLERANCE * Math.max(Math.abs(want), Number.MIN_VALUE);
        expect({ label, r, c, close }).toEqual({ label, r, c, close: true });
      } else {
        expect({ label, r, c, value }).toEqual({ label, r, c, value: want });
      }
    }),
  );
}

describe("the add-in under Office's own loader (office.js from @microsoft/office-js)", () => {
  let server: RunningServer;
  let browser: LocalBrowser;

  beforeAll(async () => {
    requireAddinBuild();
    server = await startServer(staticRequestHandler(ADDIN_DIR), { port: 0, host: '127.0.0.1' });
    browser = await launchLocalBrowser(server.url, [{ urlPrefix: OFFICE_CDN, folder: OFFICE_PACKAGE }]);
    await browser.context.addInitScript(installExcelHostSide);
  });

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  /** Opens the shared-runtime page as the given host would, and waits until Office's host file has run. */
  async function openAs(host: keyof typeof HOSTS): Promise<{ page: Page; pageErrors: string[] }> {
    browser.clear();
    const page = await browser.context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (error) => pageErrors.push(error.message));
    await page.goto(`${server.url}/taskpane.html?_host_Info=${HOSTS[host].info}`, { waitUntil: 'load', timeout: 30000 });
    await page.waitForFunction(
      () => typeof (window as unknown as { CustomFunctions?: { Error?: unknown } }).CustomFunctions?.Error === 'function',
      undefined,
      { timeout: 30000 },
    );
    return { page, pageErrors };
  }

  const associatedIds = (page: Page): Promise<string[]> =>
    page.evaluate(() =>
      Object.keys((window as unknown as { CustomFunctions: { _association: { mappings: object } } }).CustomFunctions._association.mappings),
    );

  /** Sends invocations through the bridge and waits for Office to report every result. */
  async function invoke(page: Page, calls: { name: string; args: unknown[] }[]): Promise<InvocationResult[]> {
    const first = await page.evaluate(
      () => Object.keys((window as unknown as { __excelHost: { results: object } }).__excelHost.results).length,
    );
    const invocations = calls.map(
      (call, i) =>
        [first + i + 1, call.name, call.args, `Sheet1!A${i + 1}`, ALLOW_ERRORS_FLAG] as [number, string, unknown[], string, number],
    );
    await page.evaluate(sendInvocations, invocations);
    const ids = invocations.map((inv) => inv[0]);
    await page.waitForFunction(
      (wanted) =>
        wanted.every(
          (id) => (window as unknown as { __excelHost: { results: Record<number, unknown> } }).__excelHost.results[id] !== undefined,
        ),
      ids,
      { timeout: 30000 },
    );
    return page.evaluate(
      (wanted) =>
        wanted.map((id) => (window as unknown as { __excelHost: { results: Record<number, InvocationResult> } }).__excelHost.results[id]),
      ids,
    );
  }

  it('binds every functions.json id before CustomFunctions.Error exists: office.js and functions.js alone', async () => {
    browser.clear();
    const page = await browser.context.newPage();
    // No host information: office.js loads no host file, so Error is never defined on this page.
    await page.goto(`${server.url}/taskpane.html`, { waitUntil: 'load', timeout: 30000 });
    await page.waitForFunction(() => (window as unknown as { __driftcellFunctions?: unknown }).__driftcellFunctions !== undefined);
    expect(await page.evaluate(() => typeof (window as unknown as { CustomFunctions: { Error?: unknown } }).CustomFunctions.Error)).toBe(
      'undefined',
    );
    expect(await associatedIds(page)).toEqual(functionIds());
    expect(browser.servedLocally[0]).toBe(`${OFFICE_CDN}office.js`);
    for (const url of browser.servedLocally) expect(url.startsWith(OFFICE_CDN) && !/\/excel-/.test(url)).toBe(true);
    expect(browser.blocked).toEqual([]);
    await page.close();
  });

  it.each(['windows', 'mac'] as const)(
    "Excel desktop (%s): every catalog example computed through Office's runtime equals evaluate()",
    async (host) => {
      const { page, pageErrors } = await openAs(host);
      expect(await associatedIds(page)).toEqual(functionIds());
      expect(browser.servedLocally).toEqual(expect.arrayContaining([`${OFFICE_CDN}office.js`, `${OFFICE_CDN}${HOSTS[host].hostFile}`]));

      const calls: { name: string; args: unknown[]; expected: Element[][]; label: string }[] = [];
      for (const spec of CATALOG) {
        const examples = literalExamples(spec);
        expect({ name: spec.name, literalExamples: examples.length > 0 }).toEqual({ name: spec.name, literalExamples: true });
        for (const { formula, call } of examples) {
          // Excel sends every declared parameter, null where the formula leaves it out; Office appends the invocation object.
          const args = excelShapedArgs(call, spec.parameters.length).slice(0, spec.parameters.length);
          calls.push({ name: spec.name, args, expected: expectedInExcel(evaluate(spec, call.args)), label: `${host}: ${formula}` });
        }
      }
      const results = await invoke(page, calls);
      results.forEach((result, i) => {
        expect({ label: calls[i].label, succeeded: result[1] }).toEqual({ label: calls[i].label, succeeded: true });
        expectSame(fromOffice(result[2]), calls[i].expected, calls[i].label);
      });

      const state = await page.evaluate(() => (window as unknown as { __excelHost: { csp: string[] } }).__excelHost.csp);
      expect(state).toEqual([]);
      expect(pageErrors).toEqual([]);
      expect(browser.blocked).toEqual([]);
      await page.close();
    },
  );

  it('Excel desktop: errors as inputs arrive per element, outputs carry the catalog message, ranges broadcast', async () => {
    const { page } = await openAs('windows');
    const resistivity = CATALOG.find((s) => s.name === 'RESISTIVITY') as FunctionSpec;
    const sheetres = CATALOG.find((s) => s.name === 'SHEETRES') as FunctionSpec;
    const column: ArgumentInput = [[1e14], [1e15], [1e16], [1e17]];
    const row: ArgumentInput = [[250, 300, 350]];
    const [table, withErrors] = await invoke(page, [
      { name: 'RESISTIVITY', args: [column, [['B']], row, null, null, null] },
      // Excel marks an error inside a range this way when errors are allowed as inputs (Office's _transferCustomFunctionError).
      { name: 'SHEETRES', args: [[[1], [{ type: 'CustomFunctionError', code: '#DIV/0!' }]], [[10]]] },
    ]);
    expectSame(fromOffice(table[2]), expectedInExcel(evaluate(resistivity, [column, 'B', row])), 'RESISTIVITY column × row');
    const sheet = fromOffice(withErrors[2]);
    expect(sheet[0][0]).toBeCloseTo(expectedInExcel(evaluate(sheetres, [1, 10]))[0][0] as number, 9);
    expect(sheet[1][0]).toEqual({ error: '#DIV/0!', message: null });
    await page.close();
  });

  it('Excel on the web: the web host file binds the same ids and defines Error', async () => {
    const { page, pageErrors } = await openAs('web');
    expect(await associatedIds(page)).toEqual(functionIds());
    expect(browser.servedLocally).toEqual(expect.arrayContaining([`${OFFICE_CDN}${HOSTS.web.hostFile}`]));
    expect(await page.evaluate(() => (window as unknown as { __excelHost: { csp: string[] } }).__excelHost.csp)).toEqual([]);
    // The web host file then waits for Excel's frame to introduce itself (a conversation id in window.name),
    // which only Excel on the web can give; Office reports its absence, nothing of ours fails.
    for (const error of pageErrors) expect(error).toMatch(/conversationId/);
    expect(browser.blocked).toEqual([]);
    await page.close();
  });
});
