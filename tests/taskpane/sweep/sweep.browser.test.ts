/**
 * The Sweep builder in Debian's Chromium on the engine-backed harness, as a
 * user drives it: with the mouse, and with the keyboard alone. The formula
 * it writes is evaluated by the engine in the page; the test compares the
 * spilled cells with the catalog evaluated here in Node for the axis values
 * read back from the same cells, and checks the chart plan's log axes.
 * Screenshots at 350 px and 500 px, light and dark, go to test-artifacts/.
 */
import type { Page } from 'playwright-core';
import { evaluate, findFunction } from '../../../src/catalog';
import { announced, cells, chartPlans, readBlock, saveScreenshot, selectBlock, startHarness, type PaneHarness } from '../support/harness';

/** Presses Tab until the element with `id` has focus; fails after `limit` presses. Returns the presses used. */
async function tabTo(page: Page, id: string, limit = 60): Promise<number> {
  for (let presses = 1; presses <= limit; presses++) {
    await page.keyboard.press('Tab');
    if ((await page.evaluate(() => document.activeElement?.id ?? '')) === id) return presses;
  }
  throw new Error(`#${id} was not reached with ${limit} presses of Tab`);
}

/** Replaces the focused text field's content by typing. */
async function typeInto(page: Page, text: string): Promise<void> {
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
}

describe('Sweep builder in Chromium', () => {
  let harness: PaneHarness;
  beforeAll(async () => {
    harness = await startHarness();
  });
  afterAll(async () => harness?.close());

  it('mouse: resistivity over doping × °C spills a table equal to the catalog’s values, with a log-log chart plan', async () => {
    const page = await harness.openPane({ width: 500 });
    await page.getByRole('tab', { name: 'Sweep builder' }).click();
    await page.getByLabel('Quantity').selectOption('RESISTIVITY');
    await page.getByLabel('dopant').selectOption('phosphorus');
    await page.getByLabel('From (cm⁻³)').fill('1e15');
    await page.getByLabel('To (cm⁻³)').fill('1e18');
    await page.getByLabel('Points per decade').fill('4');
    await page.getByLabel('Sweep temperature').check();
    await page.getByLabel('Entered in').selectOption('°C');
    await page.locator('#sw-temperature-from').fill('-25');
    await page.locator('#sw-temperature-to').fill('125');
    await page.locator('#sw-temperature-step').fill('50');
    expect(await page.locator('#sw-formula').textContent()).toBe('=DRIFT.RESISTIVITY(A4:A16,"phosphorus",B3:E3)');
    // The live preview drew one curve per temperature and says what it shows.
    expect(await page.locator('#sw-plot svg path.curve').count()).toBe(4);
    expect(await page.locator('#sw-plot svg desc').textContent()).toMatch(/Resistivity ρ \(Ω·cm\) against Doping \(cm⁻³\), log x, log y/);
    await selectBlock(page, cells({ row: 1, column: 1 }));
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    await page.waitForFunction(() => /Inserted|Nothing written|Not inserted/.test(document.getElementById('messages')?.textContent ?? ''));
    expect(await announced(page)).toMatch(
      /^Inserted at Sheet1!B2:F17: =DRIFT\.RESISTIVITY\(B5:B17,"phosphorus",C4:F4\) in C5 spills 13 × 4 values; chart added \(log x, log y\)\.$/,
    );

    const table = await readBlock(page, cells({ row: 1, column: 1, rowCount: 16, columnCount: 5 }));
    expect(table.values[0][0]).toBe('Resistivity ρ (Ω·cm): DRIFT.RESISTIVITY, phosphorus');
    expect(table.values[1]).toEqual(['Temperature (°C) →', -25, 25, 75, 125]);
    expect(table.values[2]).toEqual(['Doping (cm⁻³) ↓ · Temperature (K) →', 248.15, 298.15, 348.15, 398.15]);
    const doping = table.values.slice(3).map((row) => row[0] as number);
    expect(doping[0]).toBe(1e15);
    expect(doping[doping.length - 1]).toBe(1e18);
    const kelvin = table.values[2].slice(1) as number[];
    // Exactly one formula: the anchor; the rest is its spill.
    expect(table.formulas.flat().filter((f) => f !== null)).toEqual(['=DRIFT.RESISTIVITY(B5:B17,"phosphorus",C4:F4)']);
    // The catalog in Node, same axis values as the cells hold (Masetti et al. 1983 mobility is the default model;
    // this checks the wiring, the physics has its own reference tests).
    const expected = evaluate(findFunction('RESISTIVITY')!, [doping.map((d) => [d]), 'phosphorus', [kelvin]]);
    const spilled = table.values.slice(3).map((row) => row.slice(1));
    spilled.forEach((row, r) => row.forEach((v, c) => expect(v as number).toBeCloseTo(expected[r][c] as number, 10)));

    const charts = await chartPlans(page);
    expect(charts).toHaveLength(1);
    expect(charts[0]).toMatchObject({ xLogarithmic: true, yLogarithmic: true, xTitle: 'Doping (cm⁻³)', yTitle: 'Resistivity ρ (Ω·cm)' });
    expect(charts[0].series.map((s) => s.name)).toEqual(['248.15 K', '298.15 K', '348.15 K', '398.15 K']);
    expect(charts[0].series[0]).toMatchObject({
      x: cells({ row: 4, column: 1, rowCount: 13 }),
      y: cells({ row: 4, column: 2, rowCount: 13 }),
    });

    // A second insert at the same place is refused, naming the block, and writes nothing.
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    await page.waitForFunction(() => /Nothing written/.test(document.getElementById('messages')?.textContent ?? ''));
    expect(await announced(page)).toMatch(
      /Nothing written: the table would fill Sheet1!B2:F17 \(16 rows × 5 columns\), but B2, B3, C3 and \d+ more are not empty/,
    );
    expect(await chartPlans(page)).toHaveLength(1);
    await page.close();
  });

  it('shows what is wrong instead of a preview, and refuses to insert', async () => {
    const page = await harness.openPane();
    await page.getByLabel('From (cm⁻³)').fill('1e19');
    await page.getByLabel('To (cm⁻³)').fill('1e16');
    expect(await page.locator('#sw-problems li').allTextContents()).toEqual(['Doping "from" (1e+19) must be below "to" (1e+16).']);
    expect(await page.locator('#sw-plot svg').count()).toBe(0);
    expect(await page.locator('[aria-invalid="true"]').evaluateAll((els) => els.map((e) => e.id))).toEqual([
      'sw-doping-from',
      'sw-doping-to',
      'sw-doping-ppd',
    ]);
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    expect(await announced(page)).toMatch(/^Not inserted\. Doping "from"/);
    await page.close();
  });

  it('switching K to °C converts the entered temperatures; the formula still receives kelvin', async () => {
    const page = await harness.openPane();
    await page.getByLabel('Sweep temperature').check();
    await page.getByLabel('Entered in').selectOption('°C');
    expect(await page.locator('#sw-temperature-from').inputValue()).toBe('-23.15');
    expect(await page.locator('#sw-temperature-to').inputValue()).toBe('126.85');
    await page.getByLabel('Sweep doping (log grid)').uncheck();
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    await page.waitForFunction(() => /Inserted/.test(document.getElementById('messages')?.textContent ?? ''));
    const table = await readBlock(page, cells({ row: 1, column: 0, rowCount: 5, columnCount: 3 }));
    expect(table.values[0]).toEqual(['Temperature (°C)', 'Temperature (K)', 'Resistivity ρ (Ω·cm)']);
    expect(table.values.slice(1).map((row) => row[1])).toEqual([250, 300, 350, 400]);
    expect(table.formulas[1][2]).toBe('=DRIFT.RESISTIVITY(1E+15,"B",B3:B6)');
    const expected = evaluate(findFunction('RESISTIVITY')!, [1e15, 'B', [[250], [300], [350], [400]]]);
    table.values.slice(1).forEach((row, r) => expect(row[2] as number).toBeCloseTo(expected[r][0] as number, 10));
    const [chart] = await chartPlans(page);
    expect(chart).toMatchObject({ xLogarithmic: false, yLogarithmic: true, xTitle: 'Temperature (K)' });
    await page.close();
  });

  it('keyboard only: sheet resistance of a 2 µm layer over doping, evaluated like the catalog', async () => {
    const page = await harness.openPane({ width: 350 });
    await tabTo(page, 'sw-quantity');
    // Type-ahead on the focused list: "Sheet" picks Sheet resistance.
    await page.keyboard.type('Sheet');
    expect(await page.locator('#sw-quantity').inputValue()).toBe('SHEETRES');
    await tabTo(page, 'sw-inner-dopant');
    await page.keyboard.type('As');
    expect(await page.locator('#sw-inner-dopant').inputValue()).toBe('As');
    await tabTo(page, 'sw-outer-thickness-um');
    await page.keyboard.type('2');
    await tabTo(page, 'sw-doping-from');
    await typeInto(page, '1e16');
    await page.keyboard.press('Tab');
    await typeInto(page, '1e19');
    await page.keyboard.press('Tab');
    await typeInto(page, '3');
    expect(await page.locator('#sw-formula').textContent()).toBe('=DRIFT.SHEETRES(DRIFT.RESISTIVITY(A3:A12,"As",300),2)');
    // Focus is visible on every control reached this way.
    const outline = await page.evaluate(() => getComputedStyle(document.activeElement as Element).outlineStyle);
    expect(outline).not.toBe('none');
    await tabTo(page, 'sw-insert');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => /Inserted/.test(document.getElementById('messages')?.textContent ?? ''));
    expect(await announced(page)).toMatch(
      /^Inserted at Sheet1!A1:B12: =DRIFT\.SHEETRES\(DRIFT\.RESISTIVITY\(A3:A12,"As",300\),2\) in B3 spills 10 × 1 values; chart added \(log x, log y\)\.$/,
    );
    const table = await readBlock(page, cells({ row: 1, column: 0, rowCount: 11, columnCount: 2 }));
    expect(table.values[0]).toEqual(['Doping (cm⁻³)', 'Sheet resistance Rs (Ω/sq)']);
    const doping = table.values.slice(1).map((row) => [row[0] as number]);
    const rho = evaluate(findFunction('RESISTIVITY')!, [doping, 'As', 300]);
    const expected = evaluate(findFunction('SHEETRES')!, [rho, 2]);
    table.values.slice(1).forEach((row, r) => expect(row[1] as number).toBeCloseTo(expected[r][0] as number, 8));
    const [chart] = await chartPlans(page);
    expect(chart).toMatchObject({ xLogarithmic: true, yLogarithmic: true });
    await page.close();
  });

  it.each([
    [350, 'light'],
    [350, 'dark'],
    [500, 'light'],
    [500, 'dark'],
  ] as const)('screenshot at %i px, %s', async (width, colorScheme) => {
    const page = await harness.openPane({ width, colorScheme });
    await page.getByLabel('Sweep temperature').check();
    await page.getByLabel('dopant').selectOption('B');
    await page.getByRole('button', { name: 'Insert table and chart' }).click();
    await page.waitForFunction(() => /Inserted/.test(document.getElementById('messages')?.textContent ?? ''));
    const file = await saveScreenshot(page, `sweep-${width}-${colorScheme}`);
    expect(file).toMatch(/sweep-\d+-(light|dark)\.png$/);
    // Nothing wider than the pane: no horizontal scrolling.
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await page.close();
  });
});
