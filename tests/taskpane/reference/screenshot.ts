/**
 * The Function reference's state for README's picture (`npm run screenshots`):
 * a search for "doping" with DRIFT.DOPING chosen, so the picture shows the
 * list, the signature with units, the cited models with validity, and examples.
 */
import type { Page } from 'playwright-core';

export async function prepare(page: Page): Promise<void> {
  const panel = page.locator('#panel-reference');
  await panel.getByRole('searchbox', { name: 'Search functions' }).fill('doping');
  await panel
    .getByRole('option', { name: /^DRIFT\.DOPING\b/ })
    .first()
    .click();
}
