/** Theme choice from the Office theme's background colour (WCAG 2.x relative luminance). */
import { relativeLuminance, themeForBackground } from '../../src/taskpane/shell/theme';

describe('theme', () => {
  it('computes WCAG relative luminance: black 0, white 1, mid grey #777777 about 0.184 (WCAG 2.1, definition of relative luminance)', () => {
    expect(relativeLuminance('#000000')).toBe(0);
    expect(relativeLuminance('#ffffff')).toBeCloseTo(1, 12);
    expect(relativeLuminance('#777777')).toBeCloseTo(0.1845, 3);
    expect(() => relativeLuminance('white')).toThrow(/not a #rrggbb colour/);
  });

  it('picks dark for dark Office backgrounds and light for light ones', () => {
    expect(themeForBackground('#262626')).toBe('dark');
    expect(themeForBackground('#1f1f1f')).toBe('dark');
    expect(themeForBackground('#ffffff')).toBe('light');
    expect(themeForBackground('#e6e6e6')).toBe('light');
  });
});
