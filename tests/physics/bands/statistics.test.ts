import {
  bandEdges,
  BOLTZMANN_STATISTICS,
  DEFAULT_CARRIER_STATISTICS,
  FERMI_DIRAC_STATISTICS,
  fermiDiracHalf,
  levelOccupancy,
} from '../../../src/physics/bands';
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

describe('carrier statistics (Fermi–Dirac, the default)', () => {
  const edges = bandEdges(SILICON, 300);

  it('is the solver default', () => {
    expect(DEFAULT_CARRIER_STATISTICS).toBe(FERMI_DIRAC_STATISTICS);
    expect(FERMI_DIRAC_STATISTICS.code).toBe('fermi-dirac');
  });

  it('equals Boltzmann to rounding when non-degenerate (η ≪ 0), bit for bit below ηc ≈ −39', () => {
    for (const eta of [-30, -15, 0, 15]) {
      // ηc = η − 21.8 ≤ −6.8 here; exact equality where ηc < −39.
      const ratio = FERMI_DIRAC_STATISTICS.electronDensity(edges, eta) / BOLTZMANN_STATISTICS.electronDensity(edges, eta);
      const etaC = eta - edges.conductionEdge;
      const z = Math.exp(etaC); // series F½/e^x = 1 − z/2^{3/2} + z²/3^{3/2} − … (fermiDirac.ts)
      expect(ratio).toBeCloseTo(1 - z / 2 ** 1.5 + (z * z) / 3 ** 1.5, 9);
    }
    expect(FERMI_DIRAC_STATISTICS.holeDensity(edges, 20)).toBe(BOLTZMANN_STATISTICS.holeDensity(edges, 20));
    expect(FERMI_DIRAC_STATISTICS.electronDensity(edges, -20)).toBe(BOLTZMANN_STATISTICS.electronDensity(edges, -20));
  });

  it('is n = Nc·F½(ηc) and p = Nv·F½(ηv), below Boltzmann when degenerate (Sze & Ng 2007, ch. 1, from memory)', () => {
    for (const etaC of [-1, 0, 2, 10, 200]) {
      const eta = etaC + edges.conductionEdge;
      const n = FERMI_DIRAC_STATISTICS.electronDensity(edges, eta);
      expect(n / (Math.exp(edges.logConductionDensity) * fermiDiracHalf(etaC))).toBeCloseTo(1, 12);
      expect(n).toBeLessThan(BOLTZMANN_STATISTICS.electronDensity(edges, eta));
    }
    const etaV = 3;
    const p = FERMI_DIRAC_STATISTICS.holeDensity(edges, -etaV - edges.valenceEdge);
    expect(p / (Math.exp(edges.logValenceDensity) * fermiDiracHalf(etaV))).toBeCloseTo(1, 12);
  });

  it('meets the bracket contract N·e^x/(1 + e^x) ≤ density ≤ N·e^x (equilibrium.ts)', () => {
    for (let etaC = -50; etaC <= 60; etaC += 0.7) {
      const n = FERMI_DIRAC_STATISTICS.electronDensity(edges, etaC + edges.conductionEdge);
      const nc = Math.exp(edges.logConductionDensity);
      expect(n).toBeLessThanOrEqual(nc * Math.exp(etaC) * (1 + 1e-14));
      expect(n).toBeGreaterThanOrEqual(((nc * Math.exp(etaC)) / (1 + Math.exp(etaC))) * (1 - 1e-14));
    }
  });

  it('does not overflow for strongly degenerate carriers (ηc = 1000, 20 K at 1e22 cm⁻³)', () => {
    const cold = bandEdges(SILICON, 20);
    const n = FERMI_DIRAC_STATISTICS.electronDensity(cold, 1000 + cold.conductionEdge);
    expect(Number.isFinite(n)).toBe(true);
    expect(n / (Math.exp(cold.logConductionDensity) * (4 / (3 * Math.sqrt(Math.PI))) * 1000 ** 1.5)).toBeCloseTo(1, 5);
  });
});
