/** The doping window is the inverse model at each end of the resistivity window. */
import { dopingForResistivity } from '../../../src/physics/inverse';
import { dopingWindow } from '../../../src/physics/measurement/dopingWindow';
import { resolveDopant } from '../../../src/physics/dopants';
import { SILICON } from '../../../src/physics/materials';

const boron = { material: SILICON, temperature: 300, dopant: resolveDopant(SILICON, 'B'), counterDensity: 0 };

describe('dopingWindow', () => {
  it('returns [N(ρmax), N(ρmin)], low to high', () => {
    const [low, high] = dopingWindow(8, 12, boron);
    expect(low).toBe(dopingForResistivity(12, boron).density);
    expect(high).toBe(dopingForResistivity(8, boron).density);
    expect(low).toBeLessThan(high);
  });

  it('accepts a window of zero width and refuses an inverted one', () => {
    const [a, b] = dopingWindow(5, 5, boron);
    expect(a).toBe(b);
    expect(() => dopingWindow(12, 8, boron)).toThrow(/resistivity_min 12 Ω·cm is above resistivity_max 8/);
  });
});
