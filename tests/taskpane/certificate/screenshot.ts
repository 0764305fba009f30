/**
 * The Certificate check's state for README's picture (`npm run screenshots`):
 * the fictional test certificate read, the needed window typed and the check
 * added, so the picture shows the mapping and the result message.
 */
import type { Page } from 'playwright-core';
import { cells, selectBlock, writeBlock } from '../support/harness';
import { CERTIFICATE_TABLE } from './fixture';

export async function prepare(page: Page): Promise<void> {
  const table = cells({ row: 1, column: 1, rowCount: CERTIFICATE_TABLE.length, columnCount: CERTIFICATE_TABLE[0].length });
  await writeBlock(
    page,
    table,
    CERTIFICATE_TABLE.map((row) => [...row]),
  );
  await selectBlock(page, table);
  const panel = page.locator('#panel-certificate');
  await panel.getByRole('button', { name: 'Read selected table' }).click();
  await panel.locator('#certificate-mapping:not([hidden])').waitFor();
  await panel.getByLabel('Min', { exact: true }).fill('1e15');
  await panel.getByLabel('Max', { exact: true }).fill('2e15');
  await panel.getByRole('button', { name: 'Add check columns' }).click();
  await page.waitForFunction(() => /new columns/.test(document.querySelector('#messages')?.textContent ?? ''));
}
