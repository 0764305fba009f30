/** Radial variation RV = (mean(edge) − centre)/centre × 100 % (common practice, no source). */
import { radialVariation } from '../../../src/physics/measurement/radialVariation';

describe('radialVariation', () => {
  it('is the mean edge excess over the centre, in percent of the centre', () => {
    expect(radialVariation(10, [10.5, 10.3, 10.4, 10.6])).toBeCloseTo(4.5, 12);
    expect(radialVariation(10, [9])).toBeCloseTo(-10, 12);
    expect(radialVariation(4, [4, 4, 4])).toBe(0);
  });

  it('refuses an empty list and non-positive readings', () => {
    expect(() => radialVariation(10, [])).toThrow(/at least one/);
    expect(() => radialVariation(0, [1])).toThrow(/center 0/);
    expect(() => radialVariation(1, [1, -2])).toThrow(/edge value 2 -2/);
  });
});
