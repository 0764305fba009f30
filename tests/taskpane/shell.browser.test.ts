/**
 * The pane shell in Debian's Chromium (engine-backed harness): one tab per
 * tool, keyboard navigation between tabs, a labelled control for every
 * input, light and dark themes that differ and keep readable contrast, and
 * no request beyond the page's own server.
 */
import type { Page } from 'playwright-core';
import { relativeLuminance } from '../../src/taskpane/shell/theme';
import { saveScreenshot, startHarness, type PaneHarness } from './support/harness';

/** WCAG 2.x contrast ratio of two '#rrggbb' colours. */
function contrast(a: string, b: string): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** Computed colour 'rgb(r, g, b)' as '#rrggbb'. */
function hex(rgb: string): string {
  const parts = rgb.match(/\d+/g)!.slice(0, 3).map(Number);
  return `#${parts.map((p) => p.toString(16).padStart(2, '0')).join('')}`;
}

async function bodyColours(page: Page): Promise<{ fg: string; bg: string }> {
  const { color, background } = await page.evaluate(() => {
    const style = getComputedStyle(document.body);
    return { color: style.color, background: style.backgroundColor };
  });
  return { fg: hex(color), bg: hex(background) };
}

describe('the pane shell in Chromium', () => {
  let harness: PaneHarness;
  beforeAll(async () => {
    harness = await startHarness();
  });
  afterAll(async () => harness?.close());

  it('shows one tab per tool, the first selected, and moves between tabs with the arrow keys', async () => {
    const page = await harness.openPane();
    const tabs = page.getByRole('tab');
    expect(await tabs.allTextContents()).toEqual(['Sweep builder', 'Certificate check', 'Function reference']);
    expect(await page.getByRole('tab', { name: 'Sweep builder' }).getAttribute('aria-selected')).toBe('true');
    await page.getByRole('tab', { name: 'Sweep builder' }).focus();
    await page.keyboard.press('ArrowRight');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Certificate check');
    expect(await page.locator('#panel-certificate').isVisible()).toBe(true);
    expect(await page.locator('#panel-sweep').isVisible()).toBe(false);
    await page.keyboard.press('ArrowLeft');
    await page.keyboard.press('ArrowLeft');
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Function reference');
    await page.keyboard.press('Home');
    expect(await page.getByRole('tab', { name: 'Sweep builder' }).getAttribute('aria-selected')).toBe('true');
    // Only the selected tab is in the Tab order; Tab moves into its panel.
    expect(await page.locator('[role=tab][tabindex="0"]').count()).toBe(1);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.closest('[role=tabpanel]')?.id)).toBe('panel-sweep');
    await page.close();
  });

  it('labels every control of every tool', async () => {
    const page = await harness.openPane();
    const unlabelled = await page.evaluate(() =>
      Array.from(document.querySelectorAll('input, select, textarea, button'))
        .filter((el) => {
          const control = el as HTMLInputElement;
          if (el.tagName === 'BUTTON') return (el.textContent ?? '').trim() === '' && !el.getAttribute('aria-label');
          return (control.labels?.length ?? 0) === 0 && !el.getAttribute('aria-label') && !el.getAttribute('aria-labelledby');
        })
        .map((el) => el.id || el.outerHTML.slice(0, 80)),
    );
    expect(unlabelled).toEqual([]);
    expect(await page.locator('#messages[aria-live="polite"]').count()).toBe(1);
    await page.close();
  });

  it.each([
    ['prefers-color-scheme', { colorScheme: 'light' as const }, { colorScheme: 'dark' as const }],
    [
      'the Office theme',
      { officeBackground: '#ffffff', colorScheme: 'dark' as const },
      { officeBackground: '#262626', colorScheme: 'light' as const },
    ],
  ])('light and dark differ and both keep text readable (%s)', async (_source, light, dark) => {
    const lightPage = await harness.openPane(light);
    const darkPage = await harness.openPane(dark);
    const a = await bodyColours(lightPage);
    const b = await bodyColours(darkPage);
    expect(a.bg).not.toBe(b.bg);
    expect(relativeLuminance(a.bg)).toBeGreaterThan(relativeLuminance(b.bg));
    // WCAG 2.x AA for body text: contrast ratio at least 4.5.
    expect(contrast(a.fg, a.bg)).toBeGreaterThanOrEqual(4.5);
    expect(contrast(b.fg, b.bg)).toBeGreaterThanOrEqual(4.5);
    await lightPage.close();
    await darkPage.close();
  });

  it('requests nothing outside its own server', async () => {
    harness.browser.clear();
    const page = await harness.openPane({ width: 500 });
    await page.waitForLoadState('networkidle');
    expect(harness.browser.blocked).toEqual([]);
    expect(harness.browser.requested.every((u) => u.startsWith(`${harness.server.url}/`))).toBe(true);
    await saveScreenshot(page, 'shell-500-light');
    await page.close();
  });
});
