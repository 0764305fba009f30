/**
 * Test harness page script (bundled only by tests/taskpane/harness/webpack.config.js
 * into dist/harness/, never into the add-in): the same pane shell and tools
 * as in Excel, bound to the headless-engine workbook, so browser tests click
 * through the tools and read back what the formulas evaluate to.
 *
 * URL parameters: `officeBackground=#rrggbb` stands in for
 * Office.context.officeTheme.bodyBackgroundColor (theme test); without it the
 * page follows prefers-color-scheme.
 *
 * The page exposes `window.driftcellHarness` (see HarnessApi) for tests.
 */
import { createEnginePort, type EnginePort } from '../enginePort';
import type { BlockContents, CellBlock, CellInput, ChartPlan, HighlightPlan, StylePlan } from '../port';
import { mountTools } from '../shell/start';
import { applyTheme } from '../shell/theme';
import { PANE_TOOLS } from '../shell/toolList';

/** What a test can do with the page's workbook. */
export interface HarnessApi {
  readonly port: EnginePort;
  select(block: CellBlock): void;
  write(block: CellBlock, cells: CellInput[][]): Promise<void>;
  read(block: CellBlock): Promise<BlockContents>;
  charts(): readonly ChartPlan[];
  highlights(): readonly HighlightPlan[];
  styles(): readonly StylePlan[];
  /** Shows a tool's tab, by id ('sweep', 'certificate', 'reference'). */
  show(id: string): void;
}

function start(): void {
  const params = new URLSearchParams(window.location.search);
  applyTheme(document, params.get('officeBackground'));
  const port = createEnginePort({ Sheet1: [] });
  const status = document.getElementById('status');
  if (status !== null) status.textContent = 'Test harness: the tools write into a headless engine workbook (Sheet1), not Excel.';
  const shell = mountTools(document, port, PANE_TOOLS);
  if (shell === null) throw new Error('harness page lacks #tools or #messages');
  const api: HarnessApi = {
    port,
    select: (block) => port.select(block),
    write: (block, cells) => port.write(block, cells),
    read: (block) => port.read(block),
    charts: () => port.charts,
    highlights: () => port.highlights,
    styles: () => port.styles,
    show: (id) => shell.select(id),
  };
  (window as unknown as { driftcellHarness: HarnessApi }).driftcellHarness = api;
  document.documentElement.setAttribute('data-harness-ready', 'true');
}

start();
