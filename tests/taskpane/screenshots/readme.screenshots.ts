/**
 * `npm run screenshots`: regenerates README's pictures of the pane,
 * docs/images/<tool id>.png, one per tool, at a 500 px pane width in the
 * light theme, from the engine-backed harness in Debian's Chromium.
 *
 * Each tool is shown in a state worth seeing: a tool folder may export
 * `prepare(page)` from tests/taskpane/<tool id>/screenshot.ts (run after the
 * tab is shown); without one the tool is pictured as it opens.
 *
 * Not part of `npm test` (its name does not end in .test.ts).
 */
import { existsSync } from 'fs';
import path from 'path';
import type { Page } from 'playwright-core';
import { PANE_TOOLS } from '../../../src/taskpane/shell/toolList';
import { PROJECT_ROOT } from '../../excel/support/build';
import { saveScreenshot, startHarness, type PaneHarness } from '../support/harness';

const IMAGES = path.join(PROJECT_ROOT, 'docs', 'images');

/** A tool's own preparation, if its folder has one. */
function preparation(id: string): ((page: Page) => Promise<void>) | null {
  const file = path.join(__dirname, '..', id, 'screenshot.ts');
  if (!existsSync(file)) return null;
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- optional per-tool module
  const module = require(file) as { prepare?: (page: Page) => Promise<void> };
  return module.prepare ?? null;
}

describe('README images of the pane', () => {
  let harness: PaneHarness;
  beforeAll(async () => {
    harness = await startHarness();
  });
  afterAll(async () => harness?.close());

  it.each(PANE_TOOLS.map((tool) => [tool.id, tool.label] as const))('docs/images/%s.png (%s)', async (id, label) => {
    const page = await harness.openPane({ width: 500, height: 1000, colorScheme: 'light' });
    await page.getByRole('tab', { name: label }).click();
    await (preparation(id) ?? (async () => undefined))(page);
    const file = await saveScreenshot(page, id, path.join(IMAGES, `${id}.png`));
    expect(existsSync(file)).toBe(true);
    await page.close();
  });
});
