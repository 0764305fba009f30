/**
 * The Certificate check in Debian's Chromium, on the engine-backed harness:
 * a user selects the fictional test certificate (tests/taskpane/certificate/fixture.ts),
 * reads it, corrects nothing or one column, types the needed doping window and
 * adds the check; the formulas written into the workbook are evaluated by the
 * engine in the page and compared with the catalog called directly here.
 * Once with the mouse, once with the keyboard alone; screenshots at 350 and
 * 500 px, light and dark. The model-spread option is checked against
 * DRIFT.DOPING called once per resistivity model (certificate/dopingOverModels.ts).
 */
import type { Locator, Page } from 'playwright-core';
import { value } from '../catalog/support/call';
import { dopingOverModels } from './certificate/dopingOverModels';
import { CERTIFICATE_HEADERS, CERTIFICATE_ROWS, CERTIFICATE_TABLE, CHECK_HEADERS } from './certificate/fixture';
import {
  announced,
  cells,
  highlightPlans,
  readBlock,
  saveScreenshot,
  selectBlock,
  startHarness,
  stylePlans,
  writeBlock,
  type PaneHarness,
} from './support/harness';
import type { CellInput, CellShown } from '../../src/taskpane/port';

const TOP = 1; // the table sits at B2
const LEFT = 1;
const TABLE = cells({ row: TOP, column: LEFT, rowCount: CERTIFICATE_TABLE.length, columnCount: CERTIFICATE_HEADERS.length });
const FIRST_NEW = LEFT + CERTIFICATE_HEADERS.length;
const NEEDED = { min: 1e15, max: 2e15 };
const PANE_TEMPERATURE = 296.15;

/** The dopant code the check derives from a certificate type with the conductivity-type switch on. */
function codeOf(type: CellInput): string {
  return type === 'P' ? 'acceptor' : type === 'N' ? 'donor' : String(type);
}

/** What the check must show for a fixture row, from the catalog called directly. */
function expectedRow(row: readonly CellInput[], needed = NEEDED, readingColumns = [5, 6, 7, 8], code = codeOf(row[2])) {
  const [rhoMin, rhoMax, thickness] = [row[3], row[4], row[9]] as number[];
  const readings = readingColumns.map((index) => row[index] as number);
  // The pane starts at 23 °C, the temperature certificates state resistivity at (view.ts).
  const atMax = value('DOPING', rhoMax, code, PANE_TEMPERATURE);
  const atMin = value('DOPING', rhoMin, code, PANE_TEMPERATURE);
  const inside = atMax >= needed.min && atMin <= needed.max;
  const readingsInside = Math.min(...readings) >= rhoMin && Math.max(...readings) <= rhoMax;
  const mean = readings.reduce((sum, v) => sum + v, 0) / readings.length;
  return {
    code,
    atMax,
    atMin,
    window: inside ? 'yes' : 'no',
    readings: readingsInside ? 'yes' : 'no',
    sheetRes: value('SHEETRES', mean, thickness),
    verdict: inside && readingsInside ? 'PASS' : 'FAIL',
  };
}

function ratio(shown: CellShown, expected: number): number {
  if (typeof shown !== 'number') throw new Error(`expected a number, the cell shows ${JSON.stringify(shown)}`);
  return shown / expected;
}

async function openWithTable(
  harness: PaneHarness,
  width: number,
  colorScheme: 'light' | 'dark' = 'light',
): Promise<{ page: Page; panel: Locator }> {
  const page = await harness.openPane({ width, colorScheme });
  await writeBlock(
    page,
    TABLE,
    CERTIFICATE_TABLE.map((row) => [...row]),
  );
  await selectBlock(page, TABLE);
  return { page, panel: page.locator('#panel-certificate') };
}

/** Presses Tab until the element with this id has focus (keyboard-only runs), at most `limit` times. */
async function tabTo(page: Page, id: string, limit = 60): Promise<void> {
  for (let i = 0; i < limit; i += 1) {
    if ((await page.evaluate(() => document.activeElement?.id ?? '')) === id) return;
    await page.keyboard.press('Tab');
  }
  throw new Error(`#${id} never got the focus by Tab`);
}

describe('the Certificate check in Chromium', () => {
  let harness: PaneHarness;
  beforeAll(async () => {
    harness = await startHarness();
  });
  afterAll(async () => harness?.close());

  it('with the mouse: reads the table, guesses every column, adds live formulas that evaluate to the catalog’s numbers', async () => {
    const { page, panel } = await openWithTable(harness, 350);
    await page.getByRole('tab', { name: 'Certificate check' }).click();
    await panel.getByRole('button', { name: 'Read selected table' }).click();
    await panel.locator('#certificate-mapping:not([hidden])').waitFor();
    expect(await announced(page)).toBe(
      `Read ${CERTIFICATE_ROWS.length} wafer rows; 10 of 10 columns recognised. Check the mapping, then add the check.`,
    );
    // One labelled choice per column, with the guessed meaning.
    expect(await panel.getByLabel('Meaning of column E (Rho min (ohm-cm))').inputValue()).toBe('rho-min');
    expect(await panel.getByLabel('Meaning of column K (Thickness (um))').inputValue()).toBe('thickness');
    expect(await panel.getByLabel('Thickness unit').inputValue()).toBe('um');
    expect(await panel.getByLabel(/Type column gives conductivity type/).isChecked()).toBe(true);

    await panel.getByLabel('Min', { exact: true }).fill('1e15');
    await panel.getByLabel('Max', { exact: true }).fill('2e15');
    await panel.getByRole('button', { name: 'Add check columns' }).click();
    await page.waitForFunction(() => /new columns/.test(document.querySelector('#messages')?.textContent ?? ''));
    expect(await announced(page)).toMatch(
      /^Checks 4 wafer rows: 8 new columns in Sheet1!L2:S6, parameters in U2:V6 \(change them there to re-check\)\.$/,
    );

    const written = await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 8 }));
    expect(written.values[0]).toEqual(CHECK_HEADERS);
    CERTIFICATE_ROWS.forEach((row, index) => {
      const shown = written.values[index + 1];
      const expected = expectedRow(row);
      // Every cell of the check is a formula, none a pasted number.
      expect(written.formulas[index + 1].every((formula) => formula !== null && formula.startsWith('='))).toBe(true);
      expect(shown[0]).toBe(expected.code);
      expect(ratio(shown[1], expected.atMax)).toBeCloseTo(1, 12);
      expect(ratio(shown[2], expected.atMin)).toBeCloseTo(1, 12);
      expect(shown[3]).toBe(expected.window);
      expect(shown[4]).toBe(expected.readings);
      expect(ratio(shown[5], expected.sheetRes)).toBeCloseTo(1, 12);
      const [centre, e1, e2, e3] = [row[5], row[6], row[7], row[8]] as number[];
      expect(shown[6]).toBeCloseTo(value('RADIALVARIATION', centre, [[e1, e2, e3]]), 10);
      expect(shown[7]).toBe(expected.verdict);
    });
    expect(new Set(CERTIFICATE_ROWS.map((row) => expectedRow(row).verdict))).toEqual(new Set(['PASS', 'FAIL']));
    const highlights = await highlightPlans(page);
    expect(highlights.map((h) => h.text)).toEqual(['PASS', 'FAIL']);
    expect(highlights[0].block).toEqual(cells({ row: TOP + 1, column: FIRST_NEW + 7, rowCount: CERTIFICATE_ROWS.length }));
    await saveScreenshot(page, 'certificate-350-light');

    // Live: a new needed window in the parameter cell re-checks every row.
    const parameters = await readBlock(page, cells({ row: TOP, column: FIRST_NEW + 9, rowCount: 3, columnCount: 2 }));
    expect(parameters.values).toEqual([
      ['Certificate check parameters', null],
      ['Needed doping min (cm⁻³)', 1e15],
      ['Needed doping max (cm⁻³)', 2e15],
    ]);
    await writeBlock(page, cells({ row: TOP + 1, column: FIRST_NEW + 10 }), [[1.2e15]]);
    const verdicts = await readBlock(page, cells({ row: TOP + 1, column: FIRST_NEW + 7, rowCount: CERTIFICATE_ROWS.length }));
    expect(verdicts.values.map((cellsOfRow) => cellsOfRow[0])).toEqual(
      CERTIFICATE_ROWS.map((row) => expectedRow(row, { min: 1.2e15, max: 2e15 }).verdict),
    );

    // A second Add would write over the check: refused, nothing changes.
    const before = await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 12 }));
    await panel.getByRole('button', { name: 'Add check columns' }).click();
    await page.waitForFunction(() => /Nothing was written/.test(document.querySelector('#messages')?.textContent ?? ''));
    expect(await announced(page)).toBe(
      'Nothing was written: Sheet1!L2:S6 must be empty, but L2 holds something. Clear that block or choose another place, then try again.',
    );
    expect(await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 12 }))).toEqual(
      before,
    );
    await page.close();
  });

  it('with the keyboard alone: reads, corrects a column, switches P to phosphorus, adds the check', async () => {
    const { page } = await openWithTable(harness, 500, 'dark');
    await page.getByRole('tab', { name: 'Sweep builder' }).focus();
    await page.keyboard.press('ArrowRight');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Certificate check');
    await tabTo(page, 'certificate-read');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => document.activeElement?.id === 'certificate-role-0');
    // Column J (Rho edge 3) is set to 'not used' from the keyboard: type-ahead on the focused select.
    await tabTo(page, 'certificate-role-8');
    await page.keyboard.type('n');
    expect(await page.evaluate(() => (document.activeElement as HTMLSelectElement).value)).toBe('ignore');
    await tabTo(page, 'certificate-type-means-conductivity');
    await page.keyboard.press('Space');
    expect(await page.locator('#certificate-type-means-conductivity').isChecked()).toBe(false);
    await tabTo(page, 'certificate-needed-min');
    await page.keyboard.type('1e15');
    await page.keyboard.press('Tab');
    await page.keyboard.type('2e15');
    await tabTo(page, 'certificate-add');
    await page.keyboard.press('Enter');
    await page.waitForFunction(() => /new columns/.test(document.querySelector('#messages')?.textContent ?? ''));

    const written = await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 8 }));
    CERTIFICATE_ROWS.forEach((row, index) => {
      const shown = written.values[index + 1];
      // Switch off: a lone P is phosphorus and N nitrogen, which silicon has no parameters for (an error in that row).
      const code = row[2] === 'P' ? 'phosphorus' : row[2] === 'N' ? 'nitrogen' : String(row[2]);
      expect(shown[0]).toBe(code);
      if (code === 'nitrogen') expect(typeof shown[1]).not.toBe('number');
      else expect(ratio(shown[1], value('DOPING', row[4] as number, code, PANE_TEMPERATURE))).toBeCloseTo(1, 12);
      // Without edge 3, the radial variation averages edges 1 and 2 only.
      expect(shown[6]).toBeCloseTo(value('RADIALVARIATION', row[5] as number, [[row[6] as number, row[7] as number]]), 10);
    });
    expect(written.formulas[1][6]).toMatch(/^=DRIFT\.RADIALVARIATION\(G3,H3:I3\)$/);
    await saveScreenshot(page, 'certificate-500-dark');
    await page.close();
  });

  it('says clearly what is wrong: no table read, a one-row selection, a missing window', async () => {
    const { page, panel } = await openWithTable(harness, 500);
    await page.getByRole('tab', { name: 'Certificate check' }).click();
    await panel.getByRole('button', { name: 'Add check columns' }).click();
    await page.waitForFunction(() => (document.querySelector('#messages')?.textContent ?? '') !== '');
    expect(await announced(page)).toMatch(/press “Read selected table” first/);
    await selectBlock(page, cells({ row: TOP, column: LEFT, columnCount: 3 }));
    await panel.getByRole('button', { name: 'Read selected table' }).click();
    await page.waitForFunction(() => /only one row/.test(document.querySelector('#messages')?.textContent ?? ''));
    await selectBlock(page, TABLE);
    await panel.getByRole('button', { name: 'Read selected table' }).click();
    await page.waitForFunction(() => /wafer rows/.test(document.querySelector('#messages')?.textContent ?? ''));
    await panel.getByRole('button', { name: 'Add check columns' }).click();
    await page.waitForFunction(() => /Type the needed doping window/.test(document.querySelector('#messages')?.textContent ?? ''));
    await panel.getByLabel('Min', { exact: true }).fill('1,5e15');
    await panel.getByLabel('Max', { exact: true }).fill('2e15');
    await panel.getByRole('button', { name: 'Add check columns' }).click();
    await page.waitForFunction(() => /is not a number/.test(document.querySelector('#messages')?.textContent ?? ''));
    expect(await page.locator('#messages').getAttribute('class')).toMatch(/tone-error/);
    // Nothing was written right of the table.
    const right = await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 12 }));
    expect(right.values.flat().every((shown) => shown === null)).toBe(true);
    await saveScreenshot(page, 'certificate-500-light');
    await page.close();
  });

  it.each([
    [350, 'light'],
    [500, 'dark'],
  ] as const)(
    'readings measured at 25 °C (%i px, %s): the unit must be chosen, then readings are corrected to 23 °C before the check',
    async (width, scheme) => {
      const { page, panel } = await openWithTable(harness, width, scheme);
      await page.getByRole('tab', { name: 'Certificate check' }).click();
      await panel.getByRole('button', { name: 'Read selected table' }).click();
      await panel.locator('#certificate-mapping:not([hidden])').waitFor();
      await panel.getByLabel('Min', { exact: true }).fill('1e15');
      await panel.getByLabel('Max', { exact: true }).fill('2e15');
      await panel.locator('summary', { hasText: 'More settings' }).click();
      await panel.getByLabel('Readings measured at', { exact: true }).fill('25');
      // The number alone never decides between °C and K.
      await panel.getByRole('button', { name: 'Add check columns' }).click();
      await page.waitForFunction(() =>
        /Choose the unit of 'Readings measured at'/.test(document.querySelector('#messages')?.textContent ?? ''),
      );
      expect(await announced(page)).toBe("Choose the unit of 'Readings measured at' (°C or K): 25 could be either.");
      await panel.getByLabel('Unit of readings measured at').selectOption('C');
      await panel.getByRole('button', { name: 'Add check columns' }).click();
      await page.waitForFunction(() => /new columns/.test(document.querySelector('#messages')?.textContent ?? ''));
      expect(await announced(page)).toMatch(
        /^Checks 4 wafer rows: 12 new columns in Sheet1!L2:W6, parameters in Y2:Z7 \(change them there to re-check\)\.$/,
      );
      const written = await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 12 }));
      expect(written.values[0][4]).toBe('Rho centre at certificate temperature (Ω·cm)');
      const parameters = await readBlock(page, cells({ row: TOP + 3, column: FIRST_NEW + 13, rowCount: 2, columnCount: 2 }));
      expect(parameters.values).toEqual([
        ['Temperature (K)', PANE_TEMPERATURE],
        ['Readings measured at (K)', 298.15],
      ]);
      CERTIFICATE_ROWS.forEach((row, index) => {
        const shown = written.values[index + 1];
        const code = codeOf(row[2]);
        const corrected = [5, 6, 7, 8].map((k) => value('RESISTIVITYAT', row[k] as number, code, 298.15, PANE_TEMPERATURE));
        corrected.forEach((expected, k) => expect(ratio(shown[4 + k], expected)).toBeCloseTo(1, 12));
        const inside = Math.min(...corrected) >= (row[3] as number) && Math.max(...corrected) <= (row[4] as number);
        expect(shown[8]).toBe(inside ? 'yes' : 'no');
      });
      await saveScreenshot(page, `certificate-measured-at-${width}-${scheme}`);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await page.close();
    },
  );

  it.each([
    [350, 'light', 'mouse'],
    [500, 'dark', 'mouse'],
    [500, 'light', 'keyboard'],
    [350, 'dark', 'keyboard'],
  ] as const)(
    'model spread (%i px, %s, %s): DOPINGSPREAD at ρmax and ρmin beside the doping window, equal to DOPING under each model, verdicts unchanged',
    async (width, scheme, input) => {
      const { page, panel } = await openWithTable(harness, width, scheme);
      const spreadSwitch = panel.getByLabel(/^Show the model spread/);
      expect(await spreadSwitch.isChecked()).toBe(false);
      // The pane says what the spread is before the user turns it on, tied to the box for screen readers.
      expect(await spreadSwitch.getAttribute('aria-describedby')).toBe('certificate-model-spread-hint');
      expect(await panel.locator('#certificate-model-spread-hint').textContent()).toMatch(
        /^The spread is how far the published resistivity fits disagree for the certificate’s ρ, not a measurement uncertainty[:.]/,
      );
      if (input === 'mouse') {
        await page.getByRole('tab', { name: 'Certificate check' }).click();
        await panel.getByRole('button', { name: 'Read selected table' }).click();
        await panel.locator('#certificate-mapping:not([hidden])').waitFor();
        await panel.getByLabel('Min', { exact: true }).fill('1e15');
        await panel.getByLabel('Max', { exact: true }).fill('2e15');
        await spreadSwitch.check();
        await panel.getByRole('button', { name: 'Add check columns' }).click();
      } else {
        await page.getByRole('tab', { name: 'Sweep builder' }).focus();
        await page.keyboard.press('ArrowRight');
        await tabTo(page, 'certificate-read');
        await page.keyboard.press('Enter');
        await page.waitForFunction(() => document.activeElement?.id === 'certificate-role-0');
        // Switch off: P becomes phosphorus (F723 applies to it) and N nitrogen, which silicon has no parameters for.
        await tabTo(page, 'certificate-type-means-conductivity');
        await page.keyboard.press('Space');
        await tabTo(page, 'certificate-needed-min');
        await page.keyboard.type('1e15');
        await page.keyboard.press('Tab');
        await page.keyboard.type('2e15');
        await tabTo(page, 'certificate-model-spread');
        await page.keyboard.press('Space');
        expect(await spreadSwitch.isChecked()).toBe(true);
        await tabTo(page, 'certificate-add');
        await page.keyboard.press('Enter');
      }
      await page.waitForFunction(() => /new columns/.test(document.querySelector('#messages')?.textContent ?? ''));
      // Parameters: title, needed min and max, temperature (AB5), material (AB6); the nitrogen row is warned about.
      expect(await announced(page)).toBe(
        `Checks 4 wafer rows: 14 new columns in Sheet1!L2:Y6, parameters in AA2:AB6 (change them there to re-check).${input === 'keyboard' ? ' 1 warning(s) below.' : ''}`,
      );

      const written = await readBlock(page, cells({ row: TOP, column: FIRST_NEW, rowCount: CERTIFICATE_TABLE.length, columnCount: 14 }));
      const spreadHeaders = ['ρmax', 'ρmin'].flatMap((end) => [
        `Doping at ${end} over models: lowest (cm⁻³)`,
        `Doping at ${end} over models: highest (cm⁻³)`,
        `Doping at ${end} over models: relative spread (highest/lowest − 1)`,
      ]);
      const dopantHeader = input === 'mouse' ? CHECK_HEADERS[0] : 'Dopant code (P/N read as elements)';
      expect(written.values[0]).toEqual([dopantHeader, ...CHECK_HEADERS.slice(1, 4), ...spreadHeaders, ...CHECK_HEADERS.slice(4)]);
      const verdicts: CellShown[] = [];
      CERTIFICATE_ROWS.forEach((row, index) => {
        const shown = written.values[index + 1];
        const formulas = written.formulas[index + 1];
        const sheetRow = TOP + 2 + index;
        const code = input === 'mouse' ? codeOf(row[2]) : row[2] === 'P' ? 'phosphorus' : row[2] === 'N' ? 'nitrogen' : String(row[2]);
        expect(shown[0]).toBe(code);
        // One live formula per end, with the doping columns' ρ, dopant, temperature and material; the two cells right of it are its spill.
        expect([formulas[4], formulas[7]]).toEqual([
          `=DRIFT.DOPINGSPREAD(F${sheetRow},L${sheetRow},$AB$5,$AB$6)`,
          `=DRIFT.DOPINGSPREAD(E${sheetRow},L${sheetRow},$AB$5,$AB$6)`,
        ]);
        expect([formulas[5], formulas[6], formulas[8], formulas[9]]).toEqual([null, null, null, null]);
        for (const [offset, dopingOffset, rho] of [
          [4, 1, row[4]],
          [7, 2, row[3]],
        ] as const) {
          const spilled = shown.slice(offset, offset + 3);
          if (code === 'nitrogen') {
            // As in the doping column beside it, every cell of the spill shows the error.
            expect(shown[dopingOffset]).toEqual({ error: '#VALUE!' });
            expect(spilled).toEqual([{ error: '#VALUE!' }, { error: '#VALUE!' }, { error: '#VALUE!' }]);
            continue;
          }
          // The engine in the page against DRIFT.DOPING called here once per model.
          const expected = dopingOverModels(rho as number, code, PANE_TEMPERATURE);
          expect(ratio(spilled[0], expected.lowest)).toBeCloseTo(1, 12);
          expect(ratio(spilled[1], expected.highest)).toBeCloseTo(1, 12);
          expect(spilled[2]).toBeCloseTo(expected.relative, 12);
          // The default model is one of them, so the doping column lies inside the spread.
          expect(shown[dopingOffset] as number).toBeGreaterThanOrEqual(expected.lowest * (1 - 1e-12));
          expect(shown[dopingOffset] as number).toBeLessThanOrEqual(expected.highest * (1 + 1e-12));
        }
        verdicts.push(shown[13]);
        if (code === 'nitrogen') expect(shown[13]).toEqual({ error: '#VALUE!' });
        else expect(shown[13]).toBe(expectedRow(row, NEEDED, [5, 6, 7, 8], code).verdict);
      });
      // Pass/fail is the check's own: PASS and FAIL as without the spread (mouse: the fixture gives both).
      if (input === 'mouse') expect(new Set(verdicts)).toEqual(new Set(['PASS', 'FAIL']));
      const highlights = await highlightPlans(page);
      expect(highlights.map((h) => h.block)).toEqual(
        [0, 1].map(() => cells({ row: TOP + 1, column: FIRST_NEW + 13, rowCount: CERTIFICATE_ROWS.length })),
      );
      const formats = await stylePlans(page);
      const formatOf = (offset: number) =>
        formats.find((style) => style.block.column === FIRST_NEW + offset && style.numberFormat !== undefined)?.numberFormat;
      expect([4, 5, 6, 7, 8, 9].map(formatOf)).toEqual(['0.00E+00', '0.00E+00', '0.0%', '0.00E+00', '0.00E+00', '0.0%']);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await saveScreenshot(page, `certificate-model-spread-${width}-${scheme}-${input}`);
      await page.close();
    },
  );

  it('at 350 px dark, nothing overflows the pane sideways', async () => {
    const { page, panel } = await openWithTable(harness, 350, 'dark');
    await page.getByRole('tab', { name: 'Certificate check' }).click();
    await panel.getByRole('button', { name: 'Read selected table' }).click();
    await panel.locator('#certificate-mapping:not([hidden])').waitFor();
    await panel.locator('summary', { hasText: 'More settings' }).click();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await saveScreenshot(page, 'certificate-350-dark');
    await page.close();
  });
});
