import { bandEdges, bandgap, INTRINSIC_MODEL_CODES, intrinsicDensity } from '../../../src/physics/bands';
import { thermalVoltage } from '../../../src/physics/constants';
import { SILICON } from '../../../src/physics/materials';

describe('bandEdges', () => {
  it.each(INTRINSIC_MODEL_CODES.map((code) => [code]))('places Ec and Ev at kT·ln(Nc/ni) and kT·ln(Nv/ni) from Ei (%s)', (code) => {
    const edges = bandEdges(SILICON, 300, code);
    expect(edges.conductionEdge).toBeCloseTo(edges.logConductionDensity - edges.logIntrinsicDensity, 12);
    expect(edges.valenceEdge).toBeCloseTo(edges.logValenceDensity - edges.logIntrinsicDensity, 12);
    expect(Math.exp(edges.logIntrinsicDensity)).toBe(intrinsicDensity(SILICON, 300, code));
  });

  it("with 'dos' the implied gap is exactly Eg(T)", () => {
    for (const T of [20, 300, 1000]) {
      const edges = bandEdges(SILICON, T, 'dos');
      expect((edges.conductionEdge + edges.valenceEdge) * thermalVoltage(T)).toBeCloseTo(bandgap(SILICON, T), 12);
    }
  });

  it('with the default model the implied gap stays within 0.015 eV of Thurmond from 1 K to 1687 K', () => {
    for (let T = 1; T <= 1687; T += 2) {
      const edges = bandEdges(SILICON, T);
      const implied = (edges.conductionEdge + edges.valenceEdge) * thermalVoltage(T);
      expect(Math.abs(implied - bandgap(SILICON, T))).toBeLessThan(0.015);
    }
  });

  it('puts Ei slightly above midgap at 300 K, by (kT/2)·ln(Nv/Nc), as Nv > Nc (common practice, no source)', () => {
    const edges = bandEdges(SILICON, 300);
    const kT = thermalVoltage(300);
    const offset = ((edges.valenceEdge - edges.conductionEdge) * kT) / 2; // Ei above midgap, eV
    expect(offset).toBeCloseTo((kT / 2) * Math.log(3.1e19 / 2.86e19), 10);
  });
});
