/**
 * The Function reference in Debian's Chromium, on the engine-backed harness:
 * search, pick an entry, read its details (units, model citation and validity
 * from the registry, examples), insert it at the active cell; the inserted
 * formula is evaluated by the engine in the page and compared with the catalog
 * called directly. Once with the mouse, once with the keyboard alone;
 * screenshots at 350 and 500 px.
 */
import type { Page } from 'playwright-core';
import { evaluate, findFunction, isFailure } from '../../src/catalog';
import { MODEL_REGISTRY } from '../../src/physics/models';
import { prefillValues } from '../../src/taskpane/reference/insert';
import { value } from '../catalog/support/call';
import { announced, cells, readBlock, saveScreenshot, selectBlock, startHarness, writeBlock, type PaneHarness } from './support/harness';

async function tabTo(page: Page, id: string, limit = 60): Promise<void> {
  for (let i = 0; i < limit; i += 1) {
    if ((await page.evaluate(() => document.activeElement?.id ?? '')) === id) return;
    await page.keyboard.press('Tab');
  }
  throw new Error(`#${id} never got the focus by Tab`);
}

describe('the Function reference in Chromium', () => {
  let harness: PaneHarness;
  beforeAll(async () => {
    harness = await startHarness();
  });
  afterAll(async () => harness?.close());

  it('with the mouse: searches, shows units, citations and examples, inserts with the arguments laid out', async () => {
    const page = await harness.openPane({ width: 350 });
    const panel = page.locator('#panel-reference');
    await page.getByRole('tab', { name: 'Function reference' }).click();
    const search = panel.getByRole('searchbox', { name: 'Search functions' });
    await search.fill('sheet res');
    expect(await panel.locator('#reference-count').textContent()).toMatch(/^\d+ of \d+ functions match$/);
    await panel
      .getByRole('option', { name: /DRIFT\.SHEETRES\b/ })
      .first()
      .click();
    const sheetRes = findFunction('SHEETRES')!;
    const details = panel.locator('#reference-details');
    expect(await details.locator('h3').textContent()).toBe('DRIFT.SHEETRES');
    expect(await details.locator('.dc-signature').textContent()).toBe(
      `DRIFT.SHEETRES(${sheetRes.parameters.map((p) => `${p.name} (${p.unit})`).join(', ')}) → ${sheetRes.result.unit}`,
    );
    expect(await details.locator('.dc-examples li').first().textContent()).toContain(sheetRes.examples[0].formula);

    // A model-based entry cites its models, with validity, from the registry.
    await search.fill('DRIFT.DOPING');
    await panel
      .getByRole('option', { name: /^DRIFT\.DOPING\b/ })
      .first()
      .click();
    const doping = findFunction('DOPING')!;
    const cited = MODEL_REGISTRY.filter((entry) => doping.models.includes(entry.code));
    expect(cited.length).toBeGreaterThan(0);
    const modelItems = await details.locator('.dc-models li').allTextContents();
    expect(modelItems).toHaveLength(doping.models.length);
    cited.forEach((entry) =>
      expect(modelItems.some((item) => item.includes(entry.citation) && item.includes(`Valid: ${entry.validity}`))).toBe(true),
    );
    await saveScreenshot(page, 'reference-350-light');

    // Insert at D4: labelled argument rows, then the formula referencing them.
    await selectBlock(page, cells({ row: 3, column: 3 }));
    await panel.getByRole('button', { name: 'Insert DRIFT.DOPING at the active cell' }).click();
    await page.waitForFunction(() => /Inserted DRIFT\.DOPING/.test(document.querySelector('#messages')?.textContent ?? ''));
    const rows = doping.parameters.length + 1;
    const block = await readBlock(page, cells({ row: 3, column: 3, rowCount: rows, columnCount: 2 }));
    expect(block.values.slice(0, -1).map((row) => row[0])).toEqual(
      doping.parameters.map((p) => expect.stringContaining(p.unit === null ? p.name : `${p.name} (${p.unit})`)),
    );
    const argumentCells = doping.parameters.map((_, index) => `E${4 + index}`).join(',');
    expect(block.formulas[rows - 1][1]).toBe(`=DRIFT.DOPING(${argumentCells})`);
    const prefill = prefillValues(doping);
    const expected = value('DOPING', ...prefill.map((cellsOfRow) => cellsOfRow[0]));
    expect(block.values[rows - 1][1]).toBeCloseTo(expected, -6);
    expect((block.values[rows - 1][1] as number) / expected).toBeCloseTo(1, 12);

    // Live: editing an argument cell recomputes the formula.
    await writeBlock(page, cells({ row: 3, column: 4 }), [[20]]);
    const edited = await readBlock(page, cells({ row: 3 + rows - 1, column: 4 }));
    const rest = prefill.slice(1).map((cellsOfRow) => cellsOfRow[0]);
    expect((edited.values[0][0] as number) / value('DOPING', 20, ...rest)).toBeCloseTo(1, 12);

    // Inserting again at the same cell is refused, with the block named.
    await panel.getByRole('button', { name: 'Insert DRIFT.DOPING at the active cell' }).click();
    await page.waitForFunction(() => /Nothing was written/.test(document.querySelector('#messages')?.textContent ?? ''));
    expect(await announced(page)).toBe(
      `Nothing was written: Sheet1!D4:E${3 + rows} must be empty, but D4 holds something. Clear that block or choose another place, then try again.`,
    );
    await page.close();
  });

  it('with the keyboard alone: types a query, moves through the list with arrow keys, inserts with Enter', async () => {
    const page = await harness.openPane({ width: 500, colorScheme: 'dark' });
    await selectBlock(page, cells({ row: 0, column: 0 }));
    await page.getByRole('tab', { name: 'Sweep builder' }).focus();
    await page.keyboard.press('End');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Function reference');
    await tabTo(page, 'reference-search');
    await page.keyboard.type('doping');
    await page.keyboard.press('ArrowDown');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('reference-results');
    expect(await page.locator('#reference-results').getAttribute('aria-activedescendant')).toBe('reference-option-doping');
    await page.keyboard.press('ArrowDown');
    expect(await page.locator('#reference-results').getAttribute('aria-activedescendant')).toBe('reference-option-dopingrange');
    expect(await page.locator('#reference-option-dopingrange').getAttribute('aria-selected')).toBe('true');
    await page.keyboard.press('End');
    await page.keyboard.press('Home');
    await page.keyboard.press('ArrowDown');
    expect(await page.locator('#reference-details h3').textContent()).toBe('DRIFT.DOPINGRANGE');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => /Inserted DRIFT\.DOPINGRANGE/.test(document.querySelector('#messages')?.textContent ?? ''));

    // The tuple spills its row from the formula cell; compare with the catalog.
    const range = findFunction('DOPINGRANGE')!;
    if (range.kind !== 'tuple') throw new Error('DOPINGRANGE is a tuple entry');
    const formulaRow = range.parameters.length;
    const prefill = prefillValues(range).map((cellsOfRow) => cellsOfRow[0]);
    const expected = evaluate(range, prefill)[0];
    expect(expected.some((cell) => isFailure(cell))).toBe(false);
    const shown = await readBlock(page, cells({ row: formulaRow, column: 1, columnCount: range.columns.length }));
    shown.values[0].forEach((cell, index) => expect((cell as number) / (expected[index] as number)).toBeCloseTo(1, 12));
    await saveScreenshot(page, 'reference-500-dark');

    // Up from the first option returns to the search box.
    await page.keyboard.press('Home');
    await page.keyboard.press('ArrowUp');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('reference-search');
    await page.close();
  });

  it('narrows the list for nonsense and says so; every option and control is labelled', async () => {
    const page = await harness.openPane({ width: 500 });
    const panel = page.locator('#panel-reference');
    await page.getByRole('tab', { name: 'Function reference' }).click();
    await panel.getByRole('searchbox', { name: 'Search functions' }).fill('zebra quartz');
    expect(await panel.getByRole('option').count()).toBe(0);
    expect(await panel.locator('#reference-count').textContent()).toMatch(/^0 of \d+ functions match$/);
    expect(await panel.locator('#reference-insert').isDisabled()).toBe(true);
    expect(await panel.locator('#reference-details').textContent()).toMatch(/No function matches/);
    await panel.getByRole('searchbox', { name: 'Search functions' }).fill('');
    expect(await panel.getByRole('option').count()).toBeGreaterThan(30);
    expect(await panel.getByRole('listbox', { name: 'Matching functions' }).count()).toBe(1);
    await saveScreenshot(page, 'reference-500-light');
    const dark = await harness.openPane({ width: 350, colorScheme: 'dark' });
    await dark.getByRole('tab', { name: 'Function reference' }).click();
    const overflow = await dark.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await saveScreenshot(dark, 'reference-350-dark');
    await dark.close();
    await page.close();
  });
});
