/**
 * P. W. Chapman, O. N. Tufte, J. D. Zook, D. Long, "Electrical properties of
 * heavily doped silicon", J. Appl. Phys. 34, 3291 (1963). Read in the
 * abstract (scilit.com record): resistivity of n- and p-type Si with 1e18 to
 * 1e20 cm⁻³ measured from 4 to 900 K shows (1) a hump or maximum in ρ(T) at
 * or slightly below the degeneracy temperature, most pronounced in the least
 * heavily doped samples and fading out as the concentration increases, and
 * (2) a positive dρ/dT below the hump, down to low temperatures. The abstract
 * gives no numbers, so these are checks of shape only (authors' names from
 * memory; the record lists the title, journal and pages).
 *
 * ρ(T) of the default resistivity model over our 20–1000 K range; the hump
 * comes out of freeze-out and its Mott-transition cut-off (Altermatt et al.
 * 2006), not from a fit to these data.
 */
import { resistivity } from '../../../src/physics/transport';
import { resistivityTemperatureCoefficient } from '../../../src/physics/temperatureCoefficient';
import { siliconSample } from '../transportSamples';

const GRID_K = Array.from({ length: 57 }, (_, i) => 20 + 5 * i); // 20–300 K

/** ρ(T)/ρ(300 K) on the grid, and where its largest value is. */
function hump(dopant: string, density: number) {
  const r300 = resistivity(siliconSample(dopant, density, 300));
  const ratios = GRID_K.map((t) => resistivity(siliconSample(dopant, density, t)) / r300);
  const peak = ratios.indexOf(Math.max(...ratios));
  return { ratios, peak, height: ratios[peak] };
}

describe('Chapman et al. (1963): ρ(T) of heavily doped Si (shape, read in the abstract)', () => {
  it.each([
    ['B', [1e18, 2e18, 5e18]],
    ['P', [1e18, 3e18]],
  ] as const)('%s: ρ(T) has an interior maximum below 300 K that fades as the doping rises', (dopant, densities) => {
    let previousHeight = Infinity;
    for (const density of densities) {
      const { peak, height } = hump(dopant, density);
      expect(peak).toBeGreaterThan(0);
      expect(peak).toBeLessThan(GRID_K.length - 1);
      expect(height).toBeGreaterThan(1);
      expect(height).toBeLessThan(previousHeight);
      previousHeight = height;
    }
  });

  it.each([
    ['B', 1e18],
    ['B', 5e18],
    ['P', 1e18],
    ['P', 3e18],
  ] as const)('%s %d cm⁻³: dρ/dT > 0 below the hump, down to 20 K', (dopant, density) => {
    const { ratios, peak } = hump(dopant, density);
    for (let i = 1; i <= peak; i++) expect(ratios[i]).toBeGreaterThan(ratios[i - 1]);
  });

  it.each(['B', 'P'])('%s at 1e19 and 1e20 cm⁻³: the hump has faded out; ρ rises with T from 20 to 600 K', (dopant) => {
    for (const density of [1e19, 1e20]) {
      for (const t of [20, 60, 150, 300, 450, 600]) {
        expect(resistivityTemperatureCoefficient(siliconSample(dopant, density, t))).toBeGreaterThan(0);
      }
    }
  });
});
