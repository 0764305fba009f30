/**
 * N. D. Arora, J. R. Hauser, D. J. Roulston, "Electron and hole mobilities in
 * silicon as a function of concentration and temperature", IEEE Trans.
 * Electron Devices 29, 292 (1982).
 *
 * Parameters from memory; the abstract was read: "… mobility as a function of
 * concentration up to ~1e20 cm⁻³ in an extended and continuous temperature
 * range (250–500 K) within ±13 percent of the reported experimental values."
 */
import { fitMobility } from '../../../src/physics/mobility';
import { ARORA_FITTED_TEMPERATURES, aroraMobility } from '../../../src/physics/mobility/arora';
import { f723Resistivity } from '../../../src/physics/astmF723';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { logSpaced, siliconSample } from '../transportSamples';

describe('Arora et al. (1982)', () => {
  it('abstract: within ±13 % of measured mobility at 300 K up to 1e20 cm⁻³ (measured here: Thurber 1981 data via ASTM F723)', () => {
    for (const [species, carrier] of [['B', 'hole'], ['P', 'electron']] as const) {
      for (const n of logSpaced(13, 20, 8)) {
        const measured = 1 / (ELEMENTARY_CHARGE * n * f723Resistivity(species, n));
        expect(Math.abs(aroraMobility(carrier, n, 300) / measured - 1)).toBeLessThan(0.13);
      }
    }
  });

  it('abstract: the fitted temperature range is 250–500 K', () => {
    expect(ARORA_FITTED_TEMPERATURES).toEqual({ min: 250, max: 500 });
  });

  it('lattice scattering dominates light doping: μ falls about as T^−2.3 (electrons) and T^−2.2 (holes) (from memory)', () => {
    // The μ0·T^b term carries exponents −2.33 and −2.23 (from memory); the
    // Tn^−0.57 μmin term softens the slope slightly between 250 and 500 K.
    for (const [carrier, lattice] of [['electron', -2.33], ['hole', -2.23]] as const) {
      const slope = Math.log(aroraMobility(carrier, 1e13, 500) / aroraMobility(carrier, 1e13, 250)) / Math.LN2;
      expect(slope).toBeLessThan(-1.9);
      expect(slope).toBeGreaterThan(lattice);
    }
  });

  it('impurity scattering flattens the temperature dependence at heavy doping (abstract; common practice)', () => {
    const ratio = (n: number): number => aroraMobility('electron', n, 450) / aroraMobility('electron', n, 300);
    expect(ratio(1e19)).toBeGreaterThan(ratio(1e14));
    expect(fitMobility('arora', 'electron', siliconSample('P', 1e19, 450))).toBe(aroraMobility('electron', 1e19, 450));
  });
});
