/**
 * Light or dark pane colours. Inside Office the pane follows the Office
 * theme (its body background colour); elsewhere, and when Office does not say,
 * the stylesheet follows the browser's prefers-color-scheme.
 */

/** Relative luminance of a '#rrggbb' colour (WCAG 2.x definition), 0 (black) to 1 (white). */
export function relativeLuminance(hex: string): number {
  const match = /^#?([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex.trim());
  if (match === null) throw new RangeError(`'${hex}' is not a #rrggbb colour`);
  const linear = match.slice(1).map((part) => {
    const s = parseInt(part, 16) / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * linear[0] + 0.7152 * linear[1] + 0.0722 * linear[2];
}

/** The theme a background colour calls for: dark text on light backgrounds and the reverse. */
export function themeForBackground(hex: string): 'light' | 'dark' {
  // 0.18 is where black and white text have equal contrast on the background (WCAG contrast ratio).
  return relativeLuminance(hex) < 0.18 ? 'dark' : 'light';
}

/**
 * Sets `data-theme` on the document element from the Office theme, or removes
 * it so the stylesheet's prefers-color-scheme rule applies.
 *
 * @param doc - the pane's document
 * @param bodyBackgroundColor - Office.context.officeTheme.bodyBackgroundColor when Office gives one
 */
export function applyTheme(doc: Document, bodyBackgroundColor?: string | null): void {
  const root = doc.documentElement;
  if (typeof bodyBackgroundColor === 'string' && /^#?[0-9a-f]{6}$/i.test(bodyBackgroundColor.trim())) {
    root.setAttribute('data-theme', themeForBackground(bodyBackgroundColor));
  } else {
    root.removeAttribute('data-theme');
  }
}
