/**
 * The Sweep builder's README picture: resistivity of phosphorus-doped silicon
 * over doping at four temperatures, inserted at B2 of the harness workbook.
 * Used by `npm run screenshots` (tests/taskpane/screenshots/readme.screenshots.ts).
 */
import type { Page } from 'playwright-core';
import { cells, selectBlock } from '../support/harness';

export async function prepare(page: Page): Promise<void> {
  await page.getByLabel('dopant').selectOption('phosphorus');
  await page.getByLabel('Sweep temperature').check();
  await selectBlock(page, cells({ row: 1, column: 1 }));
  await page.getByRole('button', { name: 'Insert table and chart' }).click();
  await page.waitForFunction(() => /Inserted/.test(document.getElementById('messages')?.textContent ?? ''));
}
