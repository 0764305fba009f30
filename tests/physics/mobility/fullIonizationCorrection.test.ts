import {
  FIT_REFERENCE_TEMPERATURE,
  fullIonizationCorrection,
  netMajorityCarrier,
} from '../../../src/physics/mobility/fullIonizationCorrection';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { sampleDopants } from '../../../src/physics/sample';
import { logSpaced, siliconSample } from '../transportSamples';

// The full-ionization correction of the fitted mobilities (docs/physics.md, "Ionization and the fitted mobilities"):
// μ = μ_fit · N_net / n_eq(300 K).
describe('netMajorityCarrier', () => {
  it('is the carrier of whichever doping outweighs the other', () => {
    expect(netMajorityCarrier(siliconSample('P', 1e16))).toBe('electron');
    expect(netMajorityCarrier(siliconSample('P', 1e16, 300, 3e16))).toBe('hole');
    expect(netMajorityCarrier(siliconSample('B', 1e16, 300, 1e15))).toBe('hole');
    expect(netMajorityCarrier(siliconSample('B', 1e16, 300, 1e16))).toBeUndefined();
    expect(netMajorityCarrier(siliconSample('B', 0))).toBeUndefined();
  });
});

describe('fullIonizationCorrection', () => {
  it('is N_net / n_eq(300 K) for extrinsic samples, to O(ni²/N²), whatever the sample temperature', () => {
    for (const [dopant, n, counter] of [
      ['P', 1e18, 0],
      ['B', 1e13, 0],
      ['As', 1e20, 0],
      ['B', 2e17, 5e16],
      ['P', 1e17, 3e17],
    ] as const) {
      const sample = siliconSample(dopant, n, 77, counter);
      const eq = solveEquilibrium(sample.material, FIT_REFERENCE_TEMPERATURE, sampleDopants(sample));
      const majority = Math.max(eq.electrons, eq.holes);
      const minority = Math.min(eq.electrons, eq.holes);
      const literal = Math.abs(n - counter) / majority;
      expect(Math.abs(fullIonizationCorrection(sample) / literal - 1)).toBeLessThan(3 * (minority / majority) + 1e-12);
      expect(fullIonizationCorrection({ ...sample, temperature: 500 })).toBe(fullIonizationCorrection(sample));
    }
  });

  it('exceeds 1 where the 300 K equilibrium leaves dopants un-ionized (near the Mott transition)', () => {
    expect(fullIonizationCorrection(siliconSample('P', 1e18))).toBeGreaterThan(1.05);
    expect(fullIonizationCorrection(siliconSample('B', 1e18))).toBeGreaterThan(1.05);
  });

  it('goes to 1 for samples intrinsic at 300 K, where the literal N_net/n_eq would collapse', () => {
    expect(fullIonizationCorrection(siliconSample('P', 1e12))).toBeCloseTo(1, 4);
    expect(fullIonizationCorrection(siliconSample('B', 1e8))).toBeCloseTo(1, 6);
  });

  it('is exactly 1 for undoped and exactly compensated samples', () => {
    expect(fullIonizationCorrection(siliconSample('P', 0))).toBe(1);
    expect(fullIonizationCorrection(siliconSample('P', 1e17, 300, 1e17))).toBe(1);
  });

  it('is continuous, positive and bounded across compensation down to exact balance', () => {
    // Under strong compensation the Fermi level stays near the donor level, so
    // the factor tends to a limit above 1; only when the 300 K reference turns
    // intrinsic (N_net ≲ ni) does it relax to 1.
    for (const total of [1e15, 1e17, 1e19]) {
      let previous = fullIonizationCorrection(siliconSample('P', total, 300, 0));
      for (const ratio of logSpaced(-16, 0, 8).reverse()) {
        const factor = fullIonizationCorrection(siliconSample('P', total, 300, total * (1 - ratio)));
        expect(factor).toBeGreaterThan(0.5);
        expect(factor).toBeLessThan(1.5);
        expect(Math.abs(factor - previous)).toBeLessThan(0.05);
        previous = factor;
      }
    }
  });
});
