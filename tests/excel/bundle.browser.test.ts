/**
 * The production functions bundle (dist/addin/functions.js) in Debian's
 * Chromium, driven by playwright-core, with a stand-in CustomFunctions
 * runtime injected before the bundle loads. Checks that every id in
 * functions.json is bound, that each function returns in the browser what
 * the catalog's evaluate() returns in Node for the same arguments (every
 * literal catalog example, Excel-shaped), that failures arrive as mapped
 * Error values with their messages, and that no request leaves localhost.
 *
 * Needs `npm run build` first (npm test runs it). Never downloads a browser.
 */
import { readFileSync } from 'fs';
import path from 'path';
import type { BrowserContext, Page } from 'playwright-core';
import { CATALOG, evaluate } from '../../src/catalog';
import type { FunctionSpec } from '../../src/catalog/types';
import { isFailure, type ArgumentInput, type CellOutput } from '../../src/catalog/values';
import { startServer, staticRequestHandler, type RunningServer } from '../../src/excel/devServer';
import { ADDIN_DIR, requireAddinBuild } from './support/build';
import { launchLocalBrowser, type LocalBrowser } from './support/localBrowser';
import { excelShapedArgs, parseLiteralCall, type LiteralCall } from './support/formulaArgs';

const HOST_PAGE = '/__test__/host.html';
/** A page that loads only the functions bundle: no Office.js, no task pane. */
const HOST_HTML = '<!doctype html><html lang="en"><head><meta charset="utf-8"><title>functions host</title></head><body><script src="/functions.js"></script></body></html>';
const RELATIVE_TOLERANCE = 1e-12;

/** A result element as it comes back from the page. */
type PageElement = number | string | { error: string; message: string | null };

/** Installs a stand-in for Excel's CustomFunctions runtime; runs in the page before any script. */
function installFakeRuntime(): void {
  class FakeCustomFunctionsError {
    code: string;
    message?: string;
    constructor(code: string, message?: string) {
      this.code = code;
      if (message !== undefined) this.message = message;
    }
  }
  const bound: Record<string, (...args: unknown[]) => unknown> = {};
  (window as unknown as Record<string, unknown>).CustomFunctions = {
    bound,
    associate(id: string, fn: (...args: unknown[]) => unknown) {
      bound[id] = fn;
    },
    Error: FakeCustomFunctionsError,
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

/** Calls a bound function in the page and returns its matrix in plain form. */
function callInPage(page: Page, id: string, args: unknown[]): Promise<PageElement[][]> {
  return page.evaluate(
    ({ id: name, args: callArgs }) => {
      const runtime = (window as unknown as { CustomFunctions: { bound: Record<string, (...a: unknown[]) => unknown>; Error: new (...a: never[]) => unknown } }).CustomFunctions;
      const result = runtime.bound[name](...callArgs) as unknown[][];
      return result.map((row) =>
        row.map((v) => {
          if (v instanceof runtime.Error) {
            const e = v as { code: string; message?: string };
            return { error: e.code, message: e.message ?? null };
          }
          return v as number | string;
        }),
      );
    },
    { id, args },
  );
}

/** The catalog's own result, as the browser should show it (Excel error texts; messages only where Excel shows them). */
function expectedInExcel(grid: CellOutput[][]): PageElement[][] {
  const withMessage = new Set(['#VALUE!', '#N/A']);
  return grid.map((row) =>
    row.map((v) => {
      if (!isFailure(v)) return v;
      if (v.code === '#REF!' || v.code === '#NAME?') return { error: '#VALUE!', message: `${v.code}: ${v.message}` };
      return { error: v.code, message: withMessage.has(v.code) ? v.message : null };
    }),
  );
}

function expectSameResult(actual: PageElement[][], expected: PageElement[][], label: string): void {
  expect({ label, shape: actual.map((r) => r.length) }).toEqual({ label, shape: expected.map((r) => r.length) });
  actual.forEach((row, r) =>
    row.forEach((value, c) => {
      const want = expected[r][c];
      if (typeof want === 'number' && typeof value === 'number') {
        const scale = Math.max(Math.abs(want), Number.MIN_VALUE);
        expect({ label, r, c, relativeError: Math.abs(value - want) / scale <= RELATIVE_TOLERANCE }).toEqual({ label, r, c, relativeError: true });
      } else {
        expect({ label, r, c, value }).toEqual({ label, r, c, value: want });
      }
    }),
  );
}

/** Literal examples of a function with their formulas; each function must have at least one. */
function literalExamples(spec: FunctionSpec): { formula: string; call: LiteralCall }[] {
  return spec.examples
    .map((e) => ({ formula: e.formula, call: parseLiteralCall(e.formula) }))
    .filter((x): x is { formula: string; call: LiteralCall } => x.call !== null && x.call.name === spec.name);
}

describe('the production functions bundle in Chromium', () => {
  let server: RunningServer;
  let context: BrowserContext;
  let page: Page;
  let browser: LocalBrowser;
  let requested: string[];
  let blocked: string[];
  const pageErrors: string[] = [];

  beforeAll(async () => {
    requireAddinBuild();
    const files = staticRequestHandler(ADDIN_DIR);
    server = await startServer((req, res) => {
      if (req.url === HOST_PAGE) {
        res.writeHead(200, { 'Content-Type': 'text/html; charset=utf-8' });
        res.end(HOST_HTML);
        return;
      }
      files(req, res);
    }, { port: 0, host: '127.0.0.1' });
    browser = await launchLocalBrowser(server.url);
    context = browser.context;
    requested = browser.requested;
    blocked = browser.blocked;
    await context.addInitScript(installFakeRuntime);
    page = context.pages()[0] ?? (await context.newPage());
    page.on('pageerror', (error) => pageErrors.push(error.message));
    await page.goto(`${server.url}${HOST_PAGE}`, { waitUntil: 'load', timeout: 30000 });
  });

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('loads without a page error and binds every id in functions.json', async () => {
    expect(pageErrors).toEqual([]);
    const metadata = JSON.parse(readFileSync(path.join(ADDIN_DIR, 'functions.json'), 'utf8')) as { functions: { id: string }[] };
    const ids = metadata.functions.map((f) => f.id);
    const bound = await page.evaluate(() => Object.keys((window as unknown as { CustomFunctions: { bound: object } }).CustomFunctions.bound));
    expect(bound).toEqual(ids);
    const status = await page.evaluate(() => (window as unknown as { __driftcellFunctions?: { boundIds: string[] } }).__driftcellFunctions?.boundIds);
    expect(status).toEqual(ids);
  });

  it('returns for every literal catalog example what evaluate() gives in Node', async () => {
    for (const spec of CATALOG) {
      const calls = literalExamples(spec);
      expect({ name: spec.name, literalExamples: calls.length > 0 }).toEqual({ name: spec.name, literalExamples: true });
      for (const { formula, call } of calls) {
        const actual = await callInPage(page, spec.name, excelShapedArgs(call, spec.parameters.length));
        expectSameResult(actual, expectedInExcel(evaluate(spec, call.args)), formula);
      }
    }
  });

  it('broadcasts a column of dopings against a row of temperatures', async () => {
    const args: ArgumentInput[] = [[[1e14], [1e15], [1e16], [1e17]], 'B', [[250, 300, 350]]];
    const actual = await callInPage(page, 'RESISTIVITY', [args[0], [['B']], args[2], null, null, null, {}]);
    expectSameResult(actual, expectedInExcel(evaluate(CATALOG.find((s) => s.name === 'RESISTIVITY') as FunctionSpec, args)), 'RESISTIVITY column × row');
    expect(actual.map((r) => r.length)).toEqual([3, 3, 3, 3]);
  });

  it('returns a bad argument as #VALUE! with the catalog message', async () => {
    const [[cell]] = await callInPage(page, 'MOBILITY', [[[1e16]], [['Xx']], null, null, null, null, null, {}]);
    const [[expected]] = evaluate(CATALOG.find((s) => s.name === 'MOBILITY') as FunctionSpec, [1e16, 'Xx']);
    expect(isFailure(expected)).toBe(true);
    expect(cell).toEqual({ error: '#VALUE!', message: (expected as { message: string }).message });
    expect((cell as { message: string }).message).toMatch(/dopant/);
  });

  it('gives #N/A with a message where an argument cannot fill the result', async () => {
    const actual = await callInPage(page, 'RESISTIVITY', [[[1e15], [1e16], [1e17]], [['P']], [[250], [300]], null, null, null, {}]);
    expect(typeof actual[0][0]).toBe('number');
    expect(actual[2][0]).toEqual({ error: '#N/A', message: expect.stringContaining('temperature_K has 2×1 values') });
  });

  it('passes upstream errors through per element: #DIV/0! as itself, #REF! as #VALUE! naming it', async () => {
    const actual = await callInPage(page, 'SHEETRES', [[[1], [{ code: '#DIV/0!' }], [{ type: 'Error', basicValue: '#REF!', errorType: 'Ref' }]], [[10]], {}]);
    expect(actual[0][0]).toBeCloseTo(1000, 9); // 1 Ω·cm over 10 µm is 1000 Ω/sq (Rs = ρ/t; common practice, no source)
    expect(actual[1][0]).toEqual({ error: '#DIV/0!', message: null });
    expect(actual[2][0]).toEqual({ error: '#VALUE!', message: expect.stringMatching(/^#REF!: resistivity holds #REF! from its input/) });
  });

  it('made no request outside localhost and did not load Office.js', () => {
    expect(blocked).toEqual([]);
    expect(requested.length).toBeGreaterThan(0);
    for (const url of requested) expect(url.startsWith(`${server.url}/`)).toBe(true);
    expect(requested.some((u) => u.endsWith('/functions.js'))).toBe(true);
    expect(requested.some((u) => /office\.js|appsforoffice/i.test(u))).toBe(false);
  });
});
