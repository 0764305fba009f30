import { bandEdges, BOLTZMANN_STATISTICS, levelOccupancy } from '../../../src/physics/bands';
import { SILICON } from '../../../src/physics/materials';

describe('carrier statistics (Boltzmann)', () => {
  const edges = bandEdges(SILICON, 300);

  it('gives n = p = ni at η = 0 and n·p = ni² for any η', () => {
    const ni = Math.exp(edges.logIntrinsicDensity);
    expect(BOLTZMANN_STATISTICS.electronDensity(edges, 0)).toBe(ni);
    expect(BOLTZMANN_STATISTICS.holeDensity(edges, 0)).toBe(ni);
    for (const eta of [-30, -3.3, 0.7, 25]) {
      const np = BOLTZMANN_STATISTICS.electronDensity(edges, eta) * BOLTZMANN_STATISTICS.holeDensity(edges, eta);
      expect(np / (ni * ni)).toBeCloseTo(1, 13);
    }
  });

  it('equals Nc·exp((Ef − Ec)/kT) (common practice, no source)', () => {
    const eta = 10;
    const expected = Math.exp(edges.logConductionDensity + (eta - edges.conductionEdge));
    expect(BOLTZMANN_STATISTICS.electronDensity(edges, eta) / expected).toBeCloseTo(1, 12);
  });
});

describe('levelOccupancy', () => {
  it('is 1/(1 + exp(x)/g) (common practice, no source)', () => {
    expect(levelOccupancy(0, 2).occupied).toBeCloseTo(2 / 3, 15);
    expect(levelOccupancy(Math.log(4), 4).occupied).toBeCloseTo(0.5, 15);
    for (const x of [-5, -0.1, 0.3, 8]) {
      const { occupied, empty } = levelOccupancy(x, 2);
      expect(occupied).toBeCloseTo(1 / (1 + Math.exp(x) / 2), 14);
      expect(occupied + empty).toBeCloseTo(1, 15);
    }
  });

  it('keeps tiny probabilities accurate instead of rounding them to 0 or 1', () => {
    expect(levelOccupancy(100, 2).occupied / (2 * Math.exp(-100))).toBeCloseTo(1, 12);
    expect(levelOccupancy(-100, 2).empty / (Math.exp(-100) / 2)).toBeCloseTo(1, 12);
  });

  it('survives infinite arguments without NaN', () => {
    expect(levelOccupancy(Infinity, 2)).toEqual({ occupied: 0, empty: 1 });
    expect(levelOccupancy(-Infinity, 2)).toEqual({ occupied: 1, empty: 0 });
    expect(levelOccupancy(5000, 4).occupied).toBe(0);
  });
});
