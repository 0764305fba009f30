/**
 * The adaptive Gauss–Kronrod integrator: exactness of the rules, closed
 * forms, adaptivity, bounded work and honest failure.
 */
import { integrate } from '../../../src/physics/layers/integrate';
import { PhysicsDomainError } from '../../../src/physics/errors';
import { conductivity, sheetResistance, CM_PER_UM } from '../../../src/physics';
import { siliconSample } from '../transportSamples';

const ONE_PIECE = { relativeTolerance: 10, maxPieces: 1 };

describe('the 7/15-point rules (Kronrod 1965; QUADPACK QK15, Piessens et al. 1983)', () => {
  it('integrate x^k exactly on one piece up to degree 22 (K15), the G7 estimate vanishing up to degree 13', () => {
    for (let k = 0; k <= 22; k++) {
      const result = integrate((x) => x ** k, [0, 1], ONE_PIECE);
      expect(result.pieces).toBe(1);
      expect(result.evaluations).toBe(15);
      expect(Math.abs(result.value * (k + 1) - 1)).toBeLessThan(1e-14);
      if (k <= 13) expect(result.errorEstimate).toBeLessThan(1e-15);
      else expect(result.errorEstimate).toBeGreaterThan(1e-12);
    }
  });

  it('have weights summing to the interval length', () => {
    expect(integrate(() => 1, [-1, 1], ONE_PIECE).value).toBeCloseTo(2, 15);
  });
});

describe('adaptive integration', () => {
  it('reproduces ρ/t for a uniform layer: ∫σ dx over t gives Rs = ρ/t exactly (closed form, common practice)', () => {
    const sample = siliconSample('P', 3e17);
    const sigma = conductivity(sample);
    const thicknessUm = 2.5;
    const result = integrate(() => sigma, [0, thicknessUm]);
    expect(1 / (result.value * CM_PER_UM) / sheetResistance(1 / sigma, thicknessUm)).toBeCloseTo(1, 14);
  });

  it('matches closed forms: ∫sin = 2 on [0, π], ∫e^(−x²) on [0, 3] = (√π/2)·erf(3)', () => {
    expect(integrate(Math.sin, [0, Math.PI]).value).toBeCloseTo(2, 14);
    const erf3 = 0.9999779095030014; // erf(3), recalled; mpmath 1.3: 0.99997790950300141456
    expect(integrate((x) => Math.exp(-x * x), [0, 3]).value / ((Math.sqrt(Math.PI) / 2) * erf3)).toBeCloseTo(1, 13);
  });

  it('adapts to a sharp peak: ∫dx/(x² + ε²) on [−1, 1] = (2/ε)·atan(1/ε) to 1e-9 relative', () => {
    const epsilon = 1e-3;
    const result = integrate((x) => 1 / (x * x + epsilon * epsilon), [-1, 1], { relativeTolerance: 1e-10 });
    expect(Math.abs(result.value / ((2 / epsilon) * Math.atan(1 / epsilon)) - 1)).toBeLessThan(1e-9);
    expect(result.pieces).toBeGreaterThan(2);
    expect(result.errorEstimate).toBeLessThan(1e-10 * result.value);
  });

  it('sums pieces given by breakpoints and never evaluates at them', () => {
    const visited: number[] = [];
    const result = integrate((x) => (visited.push(x), Math.abs(x - 0.3)), [0, 0.3, 1]);
    expect(result.value).toBeCloseTo((0.3 * 0.3 + 0.7 * 0.7) / 2, 14);
    expect(visited).not.toContain(0.3);
    expect(visited).not.toContain(0);
  });

  it('stops within its piece budget and says so when the tolerance cannot be met (a jump)', () => {
    let calls = 0;
    const step = (x: number) => (calls++, x < Math.SQRT1_2 ? 0 : 1);
    expect(() => integrate(step, [0, 1], { relativeTolerance: 1e-15, maxPieces: 12 })).toThrow(/not met within 12 pieces/);
    expect(calls).toBeLessThanOrEqual(15 * (1 + 2 * 11));
  });

  it('rejects bad breakpoints, tolerances, budgets and non-finite integrands', () => {
    expect(() => integrate(Math.sin, [1, 0])).toThrow(/increase strictly/);
    expect(() => integrate(Math.sin, [0])).toThrow(/two finite breakpoints/);
    expect(() => integrate(Math.sin, [0, Infinity])).toThrow(PhysicsDomainError);
    expect(() => integrate(Math.sin, [0, 1], { relativeTolerance: 0, absoluteTolerance: 0 })).toThrow(/tolerances/);
    expect(() => integrate(Math.sin, [0, 1, 2], { maxPieces: 1 })).toThrow(/maxPieces/);
    expect(() => integrate(() => NaN, [0, 1])).toThrow(/not finite/);
  });
});
