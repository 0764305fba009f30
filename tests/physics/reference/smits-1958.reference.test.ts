/**
 * F. M. Smits, "Measurement of sheet resistivities with the four-point probe",
 * Bell Syst. Tech. J. 37, 711 (1958). Expected values are from memory of the
 * paper's tables (not read from the document here), hence the tolerances.
 */
import { THIN_LAYER_FACTOR, circularSliceFactor, thicknessFactor } from '../../../src/physics/measurement/fourPoint';

describe('Smits (1958) four-point-probe factors', () => {
  it('thin-layer factor π/ln 2 = 4.5324 (Smits 1958, infinite sheet; from memory)', () => {
    expect(THIN_LAYER_FACTOR).toBeCloseTo(4.5324, 4);
  });

  // Smits 1958, table of C for a circular slice, probe at the centre (from memory).
  it.each([
    [3, 2.2662],
    [4, 2.9289],
    [5, 3.3625],
    [7.5, 3.9273],
    [10, 4.1716],
    [15, 4.3646],
    [20, 4.4364],
    [40, 4.5076],
  ])('circular slice d/s = %s: C = %s (from memory, ±0.001)', (ratio, expected) => {
    expect(Math.abs(circularSliceFactor(ratio) - expected)).toBeLessThan(1e-3);
  });

  // Smits 1958, table of the thickness factor F(w/s) for thin slices on an insulating base (from memory).
  it.each([
    [0.4, 0.9995],
    [0.5, 0.9974],
    [0.625, 0.9898],
    [1, 0.9214],
    [1.25, 0.849],
    [1.4286, 0.7938],
    [1.6667, 0.7225],
    [2, 0.6336],
  ])('thickness factor w/s = %s: F = %s (from memory, ±0.0002)', (ratio, expected) => {
    expect(Math.abs(thicknessFactor(ratio) - expected)).toBeLessThan(2e-4);
  });
});
