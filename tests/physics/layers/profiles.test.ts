/**
 * Diffusion and implant profiles and their junctions (profile forms: Fick's
 * law solutions and the LSS Gaussian, common practice, no source).
 */
import {
  characteristicLength,
  diffusedDensity,
  implantDensity,
  implantPeakDensity,
  implantSpan,
  junctionDepth,
  resolveProfile,
  PROFILE_CODES,
} from '../../../src/physics/layers/profiles';
import { erfcinv } from '../../../src/physics/layers/specialFunctions';
import { integrate } from '../../../src/physics/layers/integrate';
import { CM_PER_UM } from '../../../src/physics';

describe('junction depth of diffused layers', () => {
  it('follows xj = L·sqrt(ln(Ns/NB)) (Gaussian) and xj = L·erfcinv(NB/Ns) (erfc)', () => {
    expect(junctionDepth('gaussian', 1e19, 0.5, 1e15)).toBeCloseTo(0.5 * Math.sqrt(Math.log(1e4)), 14);
    expect(junctionDepth('erfc', 1e20, 0.2, 1e16)).toBeCloseTo(0.2 * erfcinv(1e-4), 14);
  });

  it.each(PROFILE_CODES.map((p) => [p]))('puts N(xj) = background and inverts characteristicLength (%s)', (profile) => {
    for (const [ns, nb, lengthUm] of [
      [1e19, 1e15, 0.5],
      [3e20, 1e17, 0.05],
      [2e16, 1e16, 3],
    ] as const) {
      const xj = junctionDepth(profile, ns, lengthUm, nb);
      expect(diffusedDensity({ profile, surfaceConcentration: ns, characteristicLength: lengthUm }, xj) / nb).toBeCloseTo(1, 11);
      expect(characteristicLength(profile, ns, xj, nb) / lengthUm).toBeCloseTo(1, 13);
    }
  });

  it('puts the erfc junction shallower than the Gaussian one for the same L at Ns/NB = 1e4', () => {
    expect(junctionDepth('erfc', 1e19, 1, 1e15)).toBeLessThan(junctionDepth('gaussian', 1e19, 1, 1e15));
    // At Ns/NB = 1e4: erfcinv(1e-4) ≈ 2.75 < sqrt(ln 1e4) ≈ 3.03 — the erfc falls faster at first.
  });

  it('rejects Ns ≤ NB, NB ≤ 0 and L ≤ 0 with messages saying what is allowed', () => {
    expect(() => junctionDepth('gaussian', 1e15, 1, 1e15)).toThrow(/must exceed the background/);
    expect(() => junctionDepth('erfc', 1e15, 1, 0)).toThrow(/background must be/);
    expect(() => junctionDepth('erfc', 1e18, 0, 1e15)).toThrow(/characteristic length must be/);
    expect(() => characteristicLength('gaussian', 1e18, -1, 1e15)).toThrow(/junction depth must be/);
  });

  it('parses profile codes case-insensitively, gaussian by default', () => {
    expect(resolveProfile()).toBe('gaussian');
    expect(resolveProfile(' ERFC ')).toBe('erfc');
    expect(() => resolveProfile('linear')).toThrow(/Allowed: gaussian, erfc/);
  });
});

describe('as-implanted Gaussian', () => {
  it('holds the whole dose when Rp is many ΔRp deep: ∫N dx = Φ', () => {
    const implant = { dose: 2e13, range: 1, straggle: 0.08 };
    const peak = implantPeakDensity(implant.dose, implant.straggle * CM_PER_UM);
    const retained = integrate((x) => implantDensity(implant, peak, x), [0, 1, 2]).value * CM_PER_UM;
    expect(retained / implant.dose).toBeCloseTo(1, 10);
  });

  it('places junctions at Rp ± ΔRp·sqrt(2 ln(Npeak/NB)), clipped at the surface', () => {
    const implant = { dose: 1e12, range: 0.5, straggle: 0.1 };
    const peak = implantPeakDensity(implant.dose, implant.straggle * CM_PER_UM);
    const buried = implantSpan(implant, peak, 1e15);
    expect(buried.buried).toBe(true);
    expect(implantDensity(implant, peak, buried.top) / 1e15).toBeCloseTo(1, 10);
    expect(implantDensity(implant, peak, buried.bottom) / 1e15).toBeCloseTo(1, 10);
    const shallow = implantSpan({ dose: 1e14, range: 0.1, straggle: 0.04 }, implantPeakDensity(1e14, 0.04 * CM_PER_UM), 1e15);
    expect(shallow).toMatchObject({ top: 0, buried: false });
  });

  it('refuses a peak at or below the background', () => {
    expect(() => implantSpan({ dose: 1e9, range: 0.1, straggle: 0.1 }, implantPeakDensity(1e9, 1e-5), 1e15)).toThrow(
      /does not exceed the background/,
    );
  });
});
