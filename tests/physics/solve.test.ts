import { PhysicsDomainError } from '../../src/physics/errors';
import { findRoot } from '../../src/physics/solve';

describe('findRoot', () => {
  it('finds sqrt(2) to machine precision', () => {
    const { root, iterations } = findRoot((x) => x * x - 2, 0, 2);
    expect(Math.abs(root - Math.SQRT2)).toBeLessThanOrEqual(4 * Number.EPSILON);
    expect(iterations).toBeGreaterThan(0);
    expect(iterations).toBeLessThan(20);
  });

  it('accepts the bracket in either order', () => {
    expect(findRoot((x) => x - 1, 3, -1).root).toBeCloseTo(1, 14);
  });

  it('returns an end of the bracket that is already a root, with 0 iterations', () => {
    expect(findRoot((x) => x, 0, 1)).toEqual({ root: 0, iterations: 0 });
    expect(findRoot((x) => x - 1, 0, 1)).toEqual({ root: 1, iterations: 0 });
  });

  it('honours an absolute tolerance', () => {
    const { root } = findRoot((x) => Math.cos(x), 0, 3, { xTolerance: 1e-6 });
    expect(Math.abs(root - Math.PI / 2)).toBeLessThan(1e-6);
  });

  it('converges on functions that defeat interpolation (steep step, flat tails)', () => {
    // exp-like step: interpolation is useless far from the root; forced bisection keeps progress.
    const f = (x: number) => Math.tanh(1e6 * (x - 0.123456789));
    const { root, iterations } = findRoot(f, -1000, 1000, { xTolerance: 0 });
    expect(Math.abs(root - 0.123456789)).toBeLessThan(1e-12);
    expect(iterations).toBeLessThan(4 * 60);
  });

  it('converges on a root of high multiplicity', () => {
    const { root } = findRoot((x) => Math.pow(x - 1, 7), 0, 3, { xTolerance: 1e-14 });
    expect(Math.abs(root - 1)).toBeLessThan(1e-2); // x^7 is flat: |f| < 1e-14 for |x-1| < 1e-2
  });

  it('handles a discontinuous sign change (terminates at the jump)', () => {
    const { root } = findRoot((x) => (x < Math.E ? -1 : 1), 0, 10, { xTolerance: 0 });
    expect(Math.abs(root - Math.E)).toBeLessThan(1e-14);
  });

  it('throws PhysicsDomainError when the bracket does not bracket', () => {
    expect(() => findRoot((x) => x * x + 1, -1, 1)).toThrow(PhysicsDomainError);
    expect(() => findRoot((x) => x * x + 1, -1, 1)).toThrow(/does not bracket/);
  });

  it('throws on non-finite ends, NaN values or bad options', () => {
    expect(() => findRoot((x) => x, -Infinity, 1)).toThrow(/finite ends/);
    expect(() => findRoot(() => Number.NaN, 0, 1)).toThrow(/NaN/);
    expect(() => findRoot((x) => (x > 0.5 ? Number.NaN : -1), 0, 0.4999)).toThrow(PhysicsDomainError);
    expect(() => findRoot((x) => x, -1, 1, { xTolerance: -1 })).toThrow(/xTolerance/);
    expect(() => findRoot((x) => x, -1, 1, { maxIterations: 0 })).toThrow(/maxIterations/);
  });

  it('reports non-convergence when the iteration cap is too small', () => {
    expect(() => findRoot((x) => Math.exp(x) - 2, -50, 50, { xTolerance: 0, maxIterations: 3 })).toThrow(/no convergence/);
  });
});
