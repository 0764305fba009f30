import {
  BANDGAP_NARROWING_MODEL_CODES,
  KLAASSEN_BGN,
  SLOTBOOM_1976_BGN,
  apparentBandgapNarrowing,
  effectiveIntrinsicDensity,
  intrinsicDensity,
  resolveBandgapNarrowingModel,
} from '../../../src/physics/bands';
import { thermalVoltage } from '../../../src/physics/constants';
import { PhysicsDomainError } from '../../../src/physics/errors';
import { GALLIUM_ARSENIDE, GERMANIUM, SILICON, SILICON_CARBIDE_4H } from '../../../src/physics/materials';
import { parameterText } from '../../../src/physics/parameterText';

describe('apparent bandgap narrowing', () => {
  it('offers klaassen-bgn (default) and slotboom-1976, case-insensitively, for silicon', () => {
    expect(BANDGAP_NARROWING_MODEL_CODES).toEqual(['klaassen-bgn', 'slotboom-1976']);
    expect(resolveBandgapNarrowingModel(SILICON)).toBe(KLAASSEN_BGN);
    expect(resolveBandgapNarrowingModel(SILICON, '  ')).toBe(KLAASSEN_BGN);
    expect(resolveBandgapNarrowingModel(SILICON, 'Slotboom-1976')).toBe(SLOTBOOM_1976_BGN);
    expect(() => resolveBandgapNarrowingModel(SILICON, 'del-alamo')).toThrow(/allowed models are klaassen-bgn, slotboom-1976/);
  });

  it('has parameters for silicon only and says so for Ge, GaAs and 4H-SiC', () => {
    for (const other of [GERMANIUM, GALLIUM_ARSENIDE, SILICON_CARBIDE_4H]) {
      expect(() => resolveBandgapNarrowingModel(other)).toThrow(PhysicsDomainError);
      expect(() => effectiveIntrinsicDensity(other, 300, 1e19)).toThrow(/parameters for silicon \(Si\) only/);
    }
  });

  it('falls smoothly to 0 at low density without cancellation, and increases with density', () => {
    expect(apparentBandgapNarrowing(KLAASSEN_BGN, 0)).toBe(0);
    // For N ≪ Nref, ΔEg ≈ E0·C/(2·|ln(N/Nref)|): the stable form keeps all digits.
    const low = apparentBandgapNarrowing(KLAASSEN_BGN, 1e5);
    const L = Math.log(1e5 / KLAASSEN_BGN.referenceDensity);
    expect(low / ((KLAASSEN_BGN.energy * 0.5) / (Math.sqrt(L * L + 0.5) - L))).toBeCloseTo(1, 14);
    let previous = 0;
    for (let log = 10; log <= 22; log += 0.1) {
      const value = apparentBandgapNarrowing(KLAASSEN_BGN, 10 ** log);
      expect(value).toBeGreaterThan(previous);
      previous = value;
    }
    // Continuous across N = Nref, where the two algebraic forms meet.
    const at = KLAASSEN_BGN.referenceDensity;
    expect(apparentBandgapNarrowing(KLAASSEN_BGN, at * (1 + 1e-12)) / apparentBandgapNarrowing(KLAASSEN_BGN, at * (1 - 1e-12))).toBeCloseTo(
      1,
      11,
    );
  });

  it('rejects negative or non-finite densities', () => {
    expect(() => apparentBandgapNarrowing(KLAASSEN_BGN, -1)).toThrow(/density -1 cm⁻³ is not allowed/);
    expect(() => apparentBandgapNarrowing(KLAASSEN_BGN, Number.NaN)).toThrow(PhysicsDomainError);
  });

  it('gives ni_eff = ni·exp(ΔEg/2kT) with the default ni, at any temperature in the domain', () => {
    for (const T of [50, 300, 700]) {
      const expected = intrinsicDensity(SILICON, T) * Math.exp(apparentBandgapNarrowing(KLAASSEN_BGN, 1e19) / (2 * thermalVoltage(T)));
      expect(effectiveIntrinsicDensity(SILICON, T, 1e19) / expected).toBeCloseTo(1, 12);
    }
    // ni_eff → ni for light doping: the form's slow logarithmic tail still gives
    // ΔEg = E0·C/(√(L² + C) − L) ≈ 0.24 meV at 1e14 cm⁻³ (L = ln(N/Nref) ≈ −7.17),
    // so ni_eff/ni ≈ exp(0.24 meV / 2kT) ≈ 1.0047 at 300 K; ΔEg halves as |L| doubles (1e11: ≈ 1.0024).
    const light = effectiveIntrinsicDensity(SILICON, 300, 1e14) / intrinsicDensity(SILICON, 300);
    expect(light).toBeGreaterThan(1.004);
    expect(light).toBeLessThan(1.005);
    expect(effectiveIntrinsicDensity(SILICON, 300, 1e11) / intrinsicDensity(SILICON, 300)).toBeLessThan(1.003);
    // No overflow at 50 K, 1e21 cm⁻³, where ni itself is tiny.
    expect(Number.isFinite(effectiveIntrinsicDensity(SILICON, 50, 1e21))).toBe(true);
  });
});

describe('citations', () => {
  it.each([KLAASSEN_BGN, SLOTBOOM_1976_BGN].map((model) => [model.code, model] as const))(
    '%s quotes E0, Nref and C as its own table holds them',
    (_code, model) => {
      const quoted = `E0 = ${parameterText(model.energy * 1000)} meV, Nref = ${parameterText(model.referenceDensity)} cm⁻³, C = ${parameterText(model.constant)}`;
      expect(model.citation).toContain(quoted);
    },
  );
});
