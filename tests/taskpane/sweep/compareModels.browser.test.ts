/**
 * The Sweep builder's "compare models" in Debian's Chromium on the
 * engine-backed harness: toggled by mouse and by keyboard, the preview draws
 * one curve per applicable model with the band between them and the default
 * heavier, the legend names each model and what it refused, and Insert writes
 * the DRIFT.MODELCODES header row above one spilled formula whose every
 * column the engine computes equal to the single-model call (catalog in Node,
 * axis values read back from the cells). Screenshots at 350 px and 500 px,
 * light and dark, go to test-artifacts/screenshots/.
 */
import { mkdirSync } from 'fs';
import path from 'path';
import type { Page } from 'playwright-core';
import { evaluate, findFunction } from '../../../src/catalog';
import { applicableModelCodes } from '../../../src/catalog/modelCodes';
import {
  announced,
  cells,
  chartPlans,
  readBlock,
  saveScreenshot,
  SCREENSHOT_DIR,
  selectBlock,
  startHarness,
  type PaneHarness,
} from '../support/harness';

/** The preview plot itself (the legend's line samples are small SVGs too). */
const PLOT = '#sw-plot svg[role="img"]';

/** Saves the preview figure alone (plot, legend, caption) beside the full-page screenshots, for a close look. */
async function savePlotScreenshot(page: Page, name: string): Promise<void> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.locator('#sw-plot').screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`) });
}

/** Waits until the live region reports the outcome of Insert. */
async function inserted(page: Page): Promise<string> {
  await page.waitForFunction(() => /Inserted|Nothing written|Not inserted/.test(document.getElementById('messages')?.textContent ?? ''));
  return announced(page);
}

/** Sets up resistivity of boron over doping with every model compared. */
async function compareBoronResistivity(page: Page): Promise<void> {
  await page.getByLabel('Quantity').selectOption('RESISTIVITY');
  await page.getByLabel('dopant').selectOption('B');
  await page.getByLabel('From (cm⁻³)').fill('1e14');
  await page.getByLabel('To (cm⁻³)').fill('1e19');
  await page.getByLabel('Points per decade').fill('4');
  await page.getByLabel('Compare models').check();
}

describe('Sweep builder: compare models, in Chromium', () => {
  let harness: PaneHarness;
  beforeAll(async () => {
    harness = await startHarness();
  });
  afterAll(async () => harness?.close());

  it('mouse: N curves, a band and the default emphasised; Insert writes codes above one formula equal to single-model calls', async () => {
    const page = await harness.openPane({ width: 500 });
    await compareBoronResistivity(page);
    const codes = applicableModelCodes('resistivity', undefined, 'B');
    expect(codes).toContain('astm-f723');
    expect(await page.locator('#sw-formula-models').textContent()).toBe(
      '=DRIFT.MODELCODES("resistivity",,"B") (header row, one code per column)',
    );
    expect(await page.locator('#sw-formula').textContent()).toBe('=DRIFT.RESISTIVITY(A3:A23,"B",300,DRIFT.MODELCODES("resistivity",,"B"))');
    // The single-model list does not apply while every model is drawn.
    expect(await page.locator('#sw-inner-model').isDisabled()).toBe(true);
    // One curve per model, one band beneath them, the default (first code) the one heavier curve.
    expect(await page.locator(PLOT + ' path.curve').count()).toBe(codes.length);
    expect(await page.locator(PLOT + ' path.band').count()).toBe(1);
    expect(await page.locator(PLOT + ' path.curve.emphasised').getAttribute('data-series')).toBe(codes[0]);
    const widths = await page
      .locator(PLOT + ' path.curve')
      .evaluateAll((paths) => paths.map((p) => [p.getAttribute('data-series'), parseFloat(getComputedStyle(p).strokeWidth)]));
    const defaultWidth = widths.find(([name]) => name === codes[0])![1] as number;
    for (const [name, width] of widths) if (name !== codes[0]) expect(width as number).toBeLessThan(defaultWidth);
    // The band is filled and drawn under the curves (earlier in the document).
    expect(
      await page
        .locator(PLOT + ' path.band')
        .evaluate(
          (band) => band.compareDocumentPosition(band.parentElement!.querySelector('path.curve')!) & Node.DOCUMENT_POSITION_FOLLOWING,
        ),
    ).toBeTruthy();
    expect(await page.locator(PLOT + ' path.band').evaluate((band) => getComputedStyle(band).fill)).not.toBe('none');
    // Legend as a list: every code, the default marked; the text alternative names the models and the band.
    expect(await page.locator('#sw-legend li .sw-legend-name').allTextContents()).toEqual([`${codes[0]} (default)`, ...codes.slice(1)]);
    const description = await page.locator(PLOT + ' desc').textContent();
    expect(description).toContain(`${codes.length} models (${codes.join(', ')})`);
    expect(description).toMatch(/shaded band from the lowest to the highest model, widest \(a factor [\d.]+\)/);
    expect(await page.locator('#sw-plot-summary').textContent()).toBe(description);
    // Help says what the band is and is not.
    expect(await page.locator('#sw-compare-models').getAttribute('aria-describedby')).toBe('sw-compare-models-hint');
    expect(await page.locator('#sw-compare-models-hint').textContent()).toMatch(/disagree with one another, not a measurement uncertainty/);
    await saveScreenshot(page, 'sweep-compare-preview-500-light');
    await savePlotScreenshot(page, 'sweep-compare-plot-500-light');

    await selectBlock(page, cells({ row: 1, column: 1 }));
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    expect(await inserted(page)).toBe(
      `Inserted at Sheet1!B2:H24: =DRIFT.RESISTIVITY(B4:B24,"B",300,DRIFT.MODELCODES("resistivity",,"B")) in C4 spills 21 × ${codes.length} values, under =DRIFT.MODELCODES("resistivity",,"B") in C3 (one model per column); chart added (log x, log y).`,
    );
    const table = await readBlock(page, cells({ row: 1, column: 1, rowCount: 23, columnCount: 1 + codes.length }));
    expect(table.values[1]).toEqual(['Doping (cm⁻³) ↓ · Model →', ...codes]);
    // Two formulas: the header's codes and the values; everything else is their spill.
    expect(table.formulas.flat().filter((f) => f !== null)).toEqual([
      '=DRIFT.MODELCODES("resistivity",,"B")',
      '=DRIFT.RESISTIVITY(B4:B24,"B",300,DRIFT.MODELCODES("resistivity",,"B"))',
    ]);
    const doping = table.values.slice(2).map((row) => [row[0] as number]);
    expect(doping[0][0]).toBe(1e14);
    expect(doping[doping.length - 1][0]).toBe(1e19);
    // Each column is the same call with that one model typed in (the wiring; the models have their own reference tests).
    // Relative 1e-12, not equality: the page's V8 and Node's may round Math.pow/exp differently in the last bit (common practice, no source).
    codes.forEach((code, j) => {
      const single = evaluate(findFunction('RESISTIVITY')!, [doping, 'B', 300, code]);
      table.values.slice(2).forEach((row, r) => {
        expect(typeof row[1 + j]).toBe('number');
        expect(Math.abs((row[1 + j] as number) / (single[r][0] as number) - 1)).toBeLessThan(1e-12);
      });
    });
    const [chart] = await chartPlans(page);
    expect(chart).toMatchObject({ xLogarithmic: true, yLogarithmic: true, xTitle: 'Doping (cm⁻³)', yTitle: 'Resistivity ρ (Ω·cm)' });
    expect(chart.series.map((s) => s.name)).toEqual(codes);
    expect(chart.series.map((s) => s.emphasised === true)).toEqual(codes.map((_, j) => j === 0));
    expect(chart.series[codes.length - 1]).toMatchObject({
      x: cells({ row: 3, column: 1, rowCount: 21 }),
      y: cells({ row: 3, column: 1 + codes.length, rowCount: 21 }),
    });
    await saveScreenshot(page, 'sweep-compare-inserted-500-light');

    // A second insert at the same place is refused and writes nothing more.
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    await page.waitForFunction(() => /Nothing written/.test(document.getElementById('messages')?.textContent ?? ''));
    expect(await announced(page)).toMatch(
      /^Nothing written: the table would fill Sheet1!B2:H24 \(23 rows × 7 columns\), but B2, B3, C3 and \d+ more are not empty/,
    );
    expect(await chartPlans(page)).toHaveLength(1);
    await page.close();
  });

  it('the dopant decides the list: gallium has no astm-f723 (ASTM F723 covers B, P and As)', async () => {
    const page = await harness.openPane();
    await compareBoronResistivity(page);
    await page.getByLabel('dopant').selectOption('Ga');
    const codes = applicableModelCodes('resistivity', undefined, 'Ga');
    expect(codes).not.toContain('astm-f723');
    expect(await page.locator(PLOT + ' path.curve').count()).toBe(codes.length);
    expect(await page.locator('#sw-legend li .sw-legend-name').allTextContents()).toEqual([`${codes[0]} (default)`, ...codes.slice(1)]);
    expect(await page.locator('#sw-formula').textContent()).toMatch(/DRIFT\.MODELCODES\("resistivity",,"Ga"\)\)$/);
    await page.close();
  });

  it('a model refusing part of the range shows gaps and its error; Insert shows the errors there and the rest computes', async () => {
    const page = await harness.openPane({ width: 500 });
    await compareBoronResistivity(page);
    await page.getByLabel('Sweep doping (log grid)').uncheck();
    await page.getByLabel('Sweep temperature').check();
    await page.locator('#sw-temperature-from').fill('270');
    await page.locator('#sw-temperature-to').fill('330');
    await page.locator('#sw-temperature-step').fill('10');
    const codes = applicableModelCodes('resistivity', undefined, 'B');
    const f723 = codes.indexOf('astm-f723');
    // ASTM F723 is a 23 °C standard; the catalog takes it from 290 to 305 K (DRIFT.MODELCODES help): 290 and 300 K compute.
    const note = page.locator('#sw-legend li').nth(f723).locator('.sw-legend-note');
    expect(await note.textContent()).toMatch(/^ gaps: refused 5 of 7 values \(#VALUE! .+\)$/);
    expect(await page.locator(PLOT + ' desc').textContent()).toMatch(/astm-f723 refused 5 of 7 values/);
    expect(await page.locator(PLOT + ' path.curve').count()).toBe(codes.length);
    expect(await page.locator(PLOT + ' path.band').count()).toBe(1);
    // Its curve is drawn only where it computed: one stretch, 290 to 300 K.
    expect(await page.locator(`${PLOT} path[data-series="astm-f723"]`).getAttribute('d')).toMatch(/^M[\d.]+,[\d.]+ L[\d.]+,[\d.]+$/);
    await saveScreenshot(page, 'sweep-compare-gaps-500-light');
    await savePlotScreenshot(page, 'sweep-compare-gaps-plot-500-light');

    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    expect(await inserted(page)).toMatch(
      /^Inserted at Sheet1!A1:G9: =DRIFT\.RESISTIVITY\(1E\+15,"B",A3:A9,DRIFT\.MODELCODES\("resistivity",,"B"\)\) in B3 spills 7 × 6 values/,
    );
    const table = await readBlock(page, cells({ row: 2, column: 0, rowCount: 7, columnCount: 1 + codes.length }));
    expect(table.values.map((row) => row[0])).toEqual([270, 280, 290, 300, 310, 320, 330]);
    expect(table.values.map((row) => typeof row[1 + f723] === 'number')).toEqual([false, false, true, true, false, false, false]);
    expect(table.values[0][1 + f723]).toEqual({ error: '#VALUE!' });
    for (const row of table.values) row.forEach((v, j) => j > 0 && j !== 1 + f723 && expect(typeof v).toBe('number'));
    await page.close();
  });

  it('with both axes swept it says to sweep one, and offers no comparison for a quantity without models', async () => {
    const page = await harness.openPane();
    await compareBoronResistivity(page);
    await page.getByLabel('Sweep temperature').check();
    expect(await page.locator('#sw-problems li').allTextContents()).toEqual([
      expect.stringMatching(/^Compare models sweeps one axis: uncheck Sweep doping or Sweep temperature/),
    ]);
    expect(await page.locator('#sw-compare-models').getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#sw-plot svg').count()).toBe(0);
    await page.getByLabel('Quantity').selectOption('MAJORITY');
    expect(await page.locator('#sw-compare').isHidden()).toBe(true);
    expect(await page.locator('#sw-problems li').count()).toBe(0);
    expect(await page.locator('#sw-formula').textContent()).not.toMatch(/MODELCODES/);
    await page.close();
  });

  it('keyboard only: Tab to Compare models, Space, Tab to Insert, Enter', async () => {
    const page = await harness.openPane({ width: 350 });
    await page.getByLabel('dopant').selectOption('phosphorus');
    await page.locator('#sw-quantity').focus();
    for (let presses = 0; (await page.evaluate(() => document.activeElement?.id)) !== 'sw-compare-models'; presses++) {
      if (presses > 40) throw new Error('Compare models was not reached with Tab');
      await page.keyboard.press('Tab');
    }
    await page.keyboard.press('Space');
    expect(await page.locator('#sw-compare-models').isChecked()).toBe(true);
    const codes = applicableModelCodes('resistivity', undefined, 'phosphorus');
    expect(await page.locator(PLOT + ' path.curve').count()).toBe(codes.length);
    for (let presses = 0; (await page.evaluate(() => document.activeElement?.id)) !== 'sw-insert'; presses++) {
      if (presses > 40) throw new Error('Insert was not reached with Tab');
      await page.keyboard.press('Tab');
    }
    await page.keyboard.press('Enter');
    expect(await inserted(page)).toMatch(/^Inserted at Sheet1!A1:G\d+: .+DRIFT\.MODELCODES\("resistivity",,"phosphorus"\)\) in B3/);
    const header = await readBlock(page, cells({ row: 1, column: 1, columnCount: codes.length }));
    expect(header.values).toEqual([codes]);
    await page.close();
  });

  it.each([
    [350, 'light'],
    [350, 'dark'],
    [500, 'light'],
    [500, 'dark'],
  ] as const)('screenshot at %i px, %s', async (width, colorScheme) => {
    const page = await harness.openPane({ width, colorScheme });
    await compareBoronResistivity(page);
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    expect(await inserted(page)).toMatch(/^Inserted/);
    const file = await saveScreenshot(page, `sweep-compare-${width}-${colorScheme}`);
    await savePlotScreenshot(page, `sweep-compare-plot-${width}-${colorScheme}`);
    expect(file).toMatch(/sweep-compare-\d+-(light|dark)\.png$/);
    // Nothing wider than the pane: no horizontal scrolling, legend included.
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    const legend = await page.locator('#sw-legend').boundingBox();
    expect(legend!.x + legend!.width).toBeLessThanOrEqual(width);
    await page.close();
  });
});
