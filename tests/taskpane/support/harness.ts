/**
 * Browser-test support for the task pane: builds the test harness
 * (dist/harness, engine-backed) when it is older than the sources, serves it
 * from localhost, opens it in Debian's Chromium (tests/excel/support/localBrowser.ts:
 * requests outside the server are blocked and recorded) at a given pane width
 * and colour scheme, and reads the engine workbook back from the page.
 *
 * @example
 *   const harness = await startHarness();
 *   const page = await harness.openPane({ width: 350, colorScheme: 'dark' });
 *   await page.getByLabel('Quantity').selectOption('RESISTIVITY');
 *   const cells = await readBlock(page, { sheet: 'Sheet1', row: 0, column: 0, rowCount: 5, columnCount: 2 });
 *   await saveScreenshot(page, 'sweep-350-dark');
 *   await harness.close();
 */
import { execFileSync } from 'child_process';
import { existsSync, mkdirSync, readdirSync, statSync } from 'fs';
import path from 'path';
import type { Page } from 'playwright-core';
import { startServer, staticRequestHandler, type RunningServer } from '../../../dev/devServer';
import type { BlockContents, CellBlock, CellInput, ChartPlan, HighlightPlan, StylePlan } from '../../../src/taskpane/port';
import { PROJECT_ROOT } from '../../excel/support/build';
import { launchLocalBrowser, type LocalBrowser } from '../../excel/support/localBrowser';

export const HARNESS_DIR = path.join(PROJECT_ROOT, 'dist', 'harness');
export const HARNESS_CONFIG = path.join(PROJECT_ROOT, 'tests', 'taskpane', 'harness', 'webpack.config.js');
/** Where screenshots go (ignored by git). */
export const SCREENSHOT_DIR = path.join(PROJECT_ROOT, 'test-artifacts', 'screenshots');

/** Source folders whose changes make the harness stale. */
const SOURCES = [path.join(PROJECT_ROOT, 'src'), path.join(PROJECT_ROOT, 'tests', 'taskpane', 'harness')];

function newest(folder: string): number {
  let time = 0;
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) time = Math.max(time, newest(full));
    else if (/\.(ts|js|html|css)$/.test(entry.name)) time = Math.max(time, statSync(full).mtimeMs);
  }
  return time;
}

/** Builds dist/harness with webpack (development mode, a few seconds) unless it is newer than every source. */
export function ensureHarnessBuilt(): void {
  const bundle = path.join(HARNESS_DIR, 'harness.js');
  const built = existsSync(bundle) && existsSync(path.join(HARNESS_DIR, 'harness.html')) ? statSync(bundle).mtimeMs : 0;
  if (built > Math.max(...SOURCES.map(newest))) return;
  execFileSync(process.execPath, [require.resolve('webpack-cli/bin/cli.js'), '--config', HARNESS_CONFIG, '--mode', 'development'], {
    cwd: PROJECT_ROOT,
    stdio: 'pipe',
  });
}

/** How to open the pane. */
export interface PaneOptions {
  /** Viewport width in CSS pixels (the pane's width); default 350. */
  readonly width?: number;
  /** Viewport height; default 900. */
  readonly height?: number;
  /** prefers-color-scheme; default 'light'. */
  readonly colorScheme?: 'light' | 'dark';
  /** Stand-in for Office.context.officeTheme.bodyBackgroundColor ('#rrggbb'). */
  readonly officeBackground?: string;
}

/** A running harness: server plus browser. */
export interface PaneHarness {
  readonly server: RunningServer;
  readonly browser: LocalBrowser;
  /** Opens the harness page and waits until the pane is mounted. */
  openPane(options?: PaneOptions): Promise<Page>;
  close(): Promise<void>;
}

/** Builds if needed, serves dist/harness on 127.0.0.1 (random port) and launches Chromium. */
export async function startHarness(): Promise<PaneHarness> {
  ensureHarnessBuilt();
  const server = await startServer(staticRequestHandler(HARNESS_DIR), { port: 0, host: '127.0.0.1' });
  const browser = await launchLocalBrowser(server.url);
  return {
    server,
    browser,
    async openPane(options: PaneOptions = {}) {
      const page = await browser.context.newPage();
      await page.setViewportSize({ width: options.width ?? 350, height: options.height ?? 900 });
      await page.emulateMedia({ colorScheme: options.colorScheme ?? 'light', reducedMotion: 'reduce' });
      const query = options.officeBackground === undefined ? '' : `?officeBackground=${encodeURIComponent(options.officeBackground)}`;
      const errors: string[] = [];
      page.on('pageerror', (error) => errors.push(error.message));
      await page.goto(`${server.url}/harness.html${query}`, { waitUntil: 'load', timeout: 30000 });
      try {
        await page.waitForSelector('html[data-harness-ready="true"]', { timeout: 30000 });
      } catch (error) {
        throw new Error(`the harness did not start${errors.length > 0 ? `: ${errors.join('; ')}` : ''}`);
      }
      return page;
    },
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/** A block on the harness workbook (default sheet 'Sheet1'). */
export function cells(address: { row: number; column: number; rowCount?: number; columnCount?: number; sheet?: string }): CellBlock {
  return {
    sheet: address.sheet ?? 'Sheet1',
    row: address.row,
    column: address.column,
    rowCount: address.rowCount ?? 1,
    columnCount: address.columnCount ?? 1,
  };
}

type Api = {
  select(block: CellBlock): void;
  write(block: CellBlock, cells: CellInput[][]): Promise<void>;
  read(block: CellBlock): Promise<BlockContents>;
  charts(): ChartPlan[];
  highlights(): HighlightPlan[];
  styles(): StylePlan[];
  show(id: string): void;
};
const api = 'driftcellHarness';

/** Sets the selection the tools see. */
export function selectBlock(page: Page, block: CellBlock): Promise<void> {
  return page.evaluate(({ b, name }) => (window as unknown as Record<string, Api>)[name].select(b), { b: block, name: api });
}

/** Writes cells into the engine workbook (e.g. a supplier table before a test). */
export function writeBlock(page: Page, block: CellBlock, values: CellInput[][]): Promise<void> {
  return page.evaluate(({ b, v, name }) => (window as unknown as Record<string, Api>)[name].write(b, v), {
    b: block,
    v: values,
    name: api,
  });
}

/** Values (errors as { error }) and formulas of a block, as the engine computed them in the page. */
export function readBlock(page: Page, block: CellBlock): Promise<BlockContents> {
  return page.evaluate(({ b, name }) => (window as unknown as Record<string, Api>)[name].read(b), { b: block, name: api });
}

/** Chart plans the tools issued. */
export function chartPlans(page: Page): Promise<ChartPlan[]> {
  return page.evaluate((name) => JSON.parse(JSON.stringify((window as unknown as Record<string, Api>)[name].charts())), api);
}

/** Highlight (conditional format) plans the tools issued. */
export function highlightPlans(page: Page): Promise<HighlightPlan[]> {
  return page.evaluate((name) => JSON.parse(JSON.stringify((window as unknown as Record<string, Api>)[name].highlights())), api);
}

/** Style plans the tools issued. */
export function stylePlans(page: Page): Promise<StylePlan[]> {
  return page.evaluate((name) => JSON.parse(JSON.stringify((window as unknown as Record<string, Api>)[name].styles())), api);
}

/** Shows a tool's tab by id without clicking (tests that are not about the tabs). */
export function showTool(page: Page, id: string): Promise<void> {
  return page.evaluate(({ tool, name }) => (window as unknown as Record<string, Api>)[name].show(tool), { tool: id, name: api });
}

/** The live region's text (what announce() last said). */
export async function announced(page: Page): Promise<string> {
  return ((await page.locator('#messages').textContent()) ?? '').trim();
}

/** Saves a full-page screenshot to test-artifacts/screenshots/<name>.png and returns the path. */
export async function saveScreenshot(page: Page, name: string, file?: string): Promise<string> {
  const target = file ?? path.join(SCREENSHOT_DIR, `${name}.png`);
  mkdirSync(path.dirname(target), { recursive: true });
  await page.screenshot({ path: target, fullPage: true });
  return target;
}
