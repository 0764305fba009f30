/** The preview plot's scales and its text alternative. */
import { describePreview, makeScale } from '../../../src/taskpane/sweep/plot';
import type { Preview } from '../../../src/taskpane/sweep/preview';

describe('makeScale', () => {
  it('log scale: decades map to equal pixel steps, ticks at powers of ten', () => {
    const scale = makeScale(1e14, 1e20, 0, 600, true);
    expect(scale.toPixel(1e14)).toBeCloseTo(0, 9);
    expect(scale.toPixel(1e17)).toBeCloseTo(300, 9);
    // Seven decades: every other one, so labels do not crowd a narrow pane.
    expect(scale.ticks).toEqual([1e14, 1e16, 1e18, 1e20]);
    expect(makeScale(1e15, 1e18, 0, 300, true).ticks).toEqual([1e15, 1e16, 1e17, 1e18]);
    expect(scale.label(1e16)).toBe('1e16');
  });

  it('log scale over less than a decade: 1-2-5 ticks, then every mantissa, so two values are labelled', () => {
    // Within one mantissa step: round values as on a linear axis.
    const scale = makeScale(11, 17, 0, 100, true);
    expect(scale.ticks).toEqual([12, 14, 16]);
    expect(scale.label(12)).toBe('12');
    expect(makeScale(1.1e16, 1.7e16, 0, 100, true).label(1.2e16)).toBe('1.2e16');
    expect(makeScale(8, 60, 0, 100, true).ticks).toEqual([10, 20, 50]);
    expect(makeScale(8, 60, 0, 100, true).label(20)).toBe('2e1');
    expect(makeScale(0.003, 0.009, 0, 100, true).ticks).toEqual([0.003, 0.004, 0.005, 0.006, 0.007, 0.008, 0.009]);
  });

  it('linear scale: round ticks inside the range', () => {
    const scale = makeScale(250, 400, 0, 150, false);
    expect(scale.toPixel(325)).toBeCloseTo(75, 9);
    expect(scale.ticks).toEqual([250, 300, 350, 400]);
  });

  it('a flat range still gives a usable scale', () => {
    const scale = makeScale(5, 5, 0, 100, false);
    expect(Number.isFinite(scale.toPixel(5))).toBe(true);
  });
});

describe('describePreview', () => {
  const preview: Preview = {
    series: [
      {
        name: '300 K',
        points: [
          [1e14, 100],
          [1e16, 1],
        ],
      },
    ],
    xLabel: 'Doping (cm⁻³)',
    xLogarithmic: true,
    yLogarithmic: true,
    firstError: null,
    grid: [],
  };

  it('names the axes, their scales and the end values', () => {
    expect(describePreview(preview, 'Resistivity ρ (Ω·cm)')).toBe(
      'Resistivity ρ (Ω·cm) against Doping (cm⁻³), log x, log y: 100 at 1.00e+14 to 1 at 1.00e+16.',
    );
  });

  it('says why nothing is drawn', () => {
    expect(describePreview({ ...preview, series: [{ name: 'x', points: [] }], firstError: '#VALUE! bad' }, 'y')).toBe(
      'No values to plot: #VALUE! bad.',
    );
  });
});
