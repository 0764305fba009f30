/**
 * Resistor layout: R = Rs·(L/W + Ne) and the quadratic TCR form
 * R(T) = R(T0)·(1 + α·ΔT + β·ΔT²) (both common practice, no source).
 */
import { resistorAtTemperature, resistorLength } from '../../src/physics/resistorDesign';

const at300 = { linearPpmPerK: 0, quadraticPpmPerK2: 0, referenceTemperature: 300 };

describe('resistorLength', () => {
  it('gives L = W·(R/Rs − Ne)', () => {
    expect(resistorLength(10000, 100, 5)).toBeCloseTo(500, 12);
    expect(resistorLength(10000, 100, 5, 1.3)).toBeCloseTo(493.5, 12);
  });

  it.each([
    [1e3, 50, 2, 0],
    [47e3, 1000, 1.2, 1.3],
    [2.2e6, 5000, 0.8, 0.65],
  ])('round-trips through resistorAtTemperature at T0 (R = %s Ω, Rs = %s, W = %s, Ne = %s)', (target, rs, width, ends) => {
    const lengthUm = resistorLength(target, rs, width, ends);
    expect(resistorAtTemperature(rs, lengthUm, width, 300, at300, ends) / target).toBeCloseTo(1, 12);
  });

  it('refuses a target the ends alone reach', () => {
    expect(() => resistorLength(100, 100, 5, 1.3)).toThrow(/must exceed Rs·end_squares/);
    expect(() => resistorLength(130, 100, 5, 1.3)).toThrow(/130 Ω/);
    expect(() => resistorLength(100, 100, 5, -1)).toThrow(/end_squares -1/);
  });
});

describe('resistorAtTemperature', () => {
  it('applies the linear and quadratic coefficients about T0', () => {
    const coefficients = { linearPpmPerK: 1500, quadraticPpmPerK2: 2, referenceTemperature: 300 };
    const r0 = 100 * (100 + 1.3);
    expect(resistorAtTemperature(100, 500, 5, 400, coefficients, 1.3)).toBeCloseTo(r0 * (1 + 0.15 + 0.02), 9);
    expect(resistorAtTemperature(100, 500, 5, 200, coefficients, 1.3)).toBeCloseTo(r0 * (1 - 0.15 + 0.02), 9);
    expect(resistorAtTemperature(100, 500, 5, 300, coefficients, 1.3)).toBeCloseTo(r0, 9);
  });

  it('refuses a TCR polynomial that is not positive', () => {
    const steep = { linearPpmPerK: 5000, quadraticPpmPerK2: 0, referenceTemperature: 300 };
    expect(() => resistorAtTemperature(100, 10, 1, 50, steep)).toThrow(/TCR polynomial .* must be > 0/);
  });
});
