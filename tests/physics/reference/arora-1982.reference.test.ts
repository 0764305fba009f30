/**
 * N. D. Arora, J. R. Hauser, D. J. Roulston, "Electron and hole mobilities in
 * silicon as a function of concentration and temperature", IEEE Trans.
 * Electron Devices 29, 292 (1982).
 *
 * Parameters as read in Sandia's Charon device simulator (github
 * tcadsoftware/charon, src/Charon_Material_Properties.cpp,
 * setSiliconParameters(), "Arora Electron/Hole mumax, mumin, nref, nref_exp,
 * exp1…exp4"), which writes the amplitude at 300 K (1252, 407 cm²/(V·s))
 * where we keep the paper's A·T^b; they agree with our memory of the paper.
 * The abstract was read (scilit.com record): "… mobility as a function of
 * concentration up to ~1e20 cm⁻³ in an extended and continuous temperature
 * range (250–500 K) within ±13 percent of the reported experimental values."
 */
import { fitMobility } from '../../../src/physics/mobility';
import { ARORA_FITTED_TEMPERATURES, ARORA_TABLE, aroraMobility } from '../../../src/physics/mobility/arora';
import { f723Resistivity } from '../../../src/physics/astmF723';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { logSpaced, siliconSample } from '../transportSamples';

describe('Arora et al. (1982)', () => {
  it('abstract: within ±13 % of measured mobility at 300 K up to 1e20 cm⁻³ (measured here: Thurber 1981 data via ASTM F723)', () => {
    for (const [species, carrier] of [
      ['B', 'hole'],
      ['P', 'electron'],
    ] as const) {
      for (const n of logSpaced(13, 20, 8)) {
        const measured = 1 / (ELEMENTARY_CHARGE * n * f723Resistivity(species, n));
        expect(Math.abs(aroraMobility(carrier, n, 300) / measured - 1)).toBeLessThan(0.13);
      }
    }
  });

  it('parameters as read in Charon: μmin 88 / 54.3, μmax(300 K) 1252 / 407, N_ref 1.26e17 / 2.35e17, α 0.88, exponents −0.57, −2.33 / −2.23, 2.4, −0.146', () => {
    // Charon prints μmax at 300 K to 4 figures; A·300^b reproduces it within that rounding (±0.05 %).
    const read = { electron: [88, 1252, 1.26e17, -2.33], hole: [54.3, 407, 2.35e17, -2.23] } as const;
    for (const carrier of ['electron', 'hole'] as const) {
      const p = ARORA_TABLE[carrier];
      const [mumin, mumax300, nref, latticeExponent] = read[carrier];
      expect(p.minimum.value).toBe(mumin);
      expect(Math.abs((p.amplitude.value * Math.pow(300, p.amplitude.exponent)) / mumax300 - 1)).toBeLessThan(5e-4);
      expect(p.referenceDensity.value).toBe(nref);
      expect(p.amplitude.exponent).toBe(latticeExponent);
      expect([p.minimum.exponent, p.referenceDensity.exponent, p.alpha.value, p.alpha.exponent]).toEqual([-0.57, 2.4, 0.88, -0.146]);
    }
  });

  it('abstract: the fitted temperature range is 250–500 K', () => {
    expect(ARORA_FITTED_TEMPERATURES).toEqual({ min: 250, max: 500 });
  });

  it('lattice scattering dominates light doping: μ falls about as T^−2.3 (electrons) and T^−2.2 (holes) (exponents read in Charon)', () => {
    // The μ0·T^b term carries exponents −2.33 and −2.23 (read in Charon, above); the
    // Tn^−0.57 μmin term softens the slope slightly between 250 and 500 K.
    for (const [carrier, lattice] of [
      ['electron', -2.33],
      ['hole', -2.23],
    ] as const) {
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
