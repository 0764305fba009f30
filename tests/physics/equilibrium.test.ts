import { bandEdges, INTRINSIC_MODEL_CODES, intrinsicDensity } from '../../src/physics/bands';
import { thermalVoltage } from '../../src/physics/constants';
import { resolveDopant } from '../../src/physics/dopants';
import { ionizedFraction, solveEquilibrium, type DopantDensity } from '../../src/physics/equilibrium';
import { PhysicsDomainError } from '../../src/physics/errors';
import { ionizationState } from '../../src/physics/ionization';
import { SILICON } from '../../src/physics/materials';

const P = resolveDopant(SILICON, 'P');
const B = resolveDopant(SILICON, 'B');
const As = resolveDopant(SILICON, 'As');

function doped(...entries: [typeof P, number][]): DopantDensity[] {
  return entries.map(([dopant, density]) => ({ dopant, density }));
}

/**
 * Net charge p + ΣNd⁺ − n − ΣNa⁻ at a trial η, accurate to rounding: exact
 * densities of mostly ionised species are summed apart from the small parts
 * (neutral density of ionised species, ionised density of frozen-out ones).
 */
function charge(T: number, dopants: DopantDensity[], eta: number, model?: string): number {
  const edges = bandEdges(SILICON, T, model);
  let exact = 0;
  let small = 0;
  for (const { dopant, density } of dopants) {
    const sign = dopant.kind === 'donor' ? 1 : -1;
    const bandEta = dopant.kind === 'donor' ? eta - edges.conductionEdge : -eta - edges.valenceEdge;
    const { ionized, neutral } = ionizationState(dopant, density, T, bandEta);
    if (ionized > neutral) {
      exact += sign * density;
      small -= sign * density * neutral;
    } else {
      small += sign * density * ionized;
    }
  }
  const carriers = Math.exp(edges.logIntrinsicDensity - eta) - Math.exp(edges.logIntrinsicDensity + eta);
  return exact + carriers + small;
}

const TEMPERATURES = [20, 77, 300, 600, 1000];
const DENSITIES = [0, 1e10, 1e16, 1e19, 1e22];
const CASES: [string, number, DopantDensity[]][] = [];
for (const T of TEMPERATURES) {
  for (const nd of DENSITIES) {
    for (const na of DENSITIES) {
      CASES.push([`T=${T} Nd=${nd} Na=${na}`, T, doped([P, nd], [B, na])]);
    }
  }
}

describe('solveEquilibrium', () => {
  it('gives the intrinsic solution for zero doping: n = p = ni, Ef = Ei', () => {
    for (const T of TEMPERATURES) {
      for (const model of INTRINSIC_MODEL_CODES) {
        const eq = solveEquilibrium(SILICON, T, [], model);
        const ni = intrinsicDensity(SILICON, T, model);
        expect(eq.electrons / ni).toBeCloseTo(1, 12);
        expect(eq.holes / ni).toBeCloseTo(1, 12);
        expect(Math.abs(eq.fermiLevel)).toBeLessThan(1e-12);
        expect(eq.ionizedDonors).toBe(0);
        expect(eq.ionizedAcceptors).toBe(0);
      }
    }
  });

  it.each(CASES)('converges to 1e-12 in n and p with n·p = ni²: %s', (_label, T, dopants) => {
    const eq = solveEquilibrium(SILICON, T, dopants);
    const kT = thermalVoltage(T);
    const eta = eq.fermiLevel / kT;
    for (const value of [eq.electrons, eq.holes, eq.ionizedDonors, eq.ionizedAcceptors, eq.fermiLevel]) {
      expect(Number.isFinite(value)).toBe(true);
    }
    expect(eq.iterations).toBeLessThan(100);
    // n, p ∝ exp(±η): bracketing the root within ±1e-12 in η means 1e-12 relative in n and p.
    const delta = 1e-12 + 2 * Number.EPSILON * Math.abs(eta);
    expect(charge(T, dopants, eta - delta)).toBeGreaterThanOrEqual(0);
    expect(charge(T, dopants, eta + delta)).toBeLessThanOrEqual(0);
    const ni = intrinsicDensity(SILICON, T);
    expect((eq.electrons * eq.holes) / (ni * ni)).toBeCloseTo(1, 12);
  });

  it.each(INTRINSIC_MODEL_CODES.map((m) => [m]))('keeps n·p = ni² exactly for the selected model (%s)', (model) => {
    for (const T of [77, 300, 600]) {
      const eq = solveEquilibrium(SILICON, T, doped([P, 1e15], [B, 3e14]), model);
      const ni = intrinsicDensity(SILICON, T, model);
      expect((eq.electrons * eq.holes) / (ni * ni)).toBeCloseTo(1, 13);
    }
  });

  it('satisfies charge neutrality p + Nd⁺ = n + Na⁻', () => {
    for (const [, T, dopants] of CASES) {
      const eq = solveEquilibrium(SILICON, T, dopants);
      const scale = eq.electrons + eq.holes + eq.ionizedDonors + eq.ionizedAcceptors;
      const residual = eq.holes + eq.ionizedDonors - eq.electrons - eq.ionizedAcceptors;
      expect(Math.abs(residual) / scale).toBeLessThan(1e-12);
    }
  });

  it('matches the closed form for one donor: n² + n(n1 − N(1−b)) − N·n1 = 0, n1 = (Nc/g)·exp(−ΔE/kT)', () => {
    // Follows from neutrality n = Nd⁺ with p negligible and Boltzmann carriers (common practice, no source).
    for (const [T, N] of [
      [77, 1e16],
      [77, 1e18],
      [150, 1e17],
      [300, 1e16],
      [300, 2e18],
      [300, 1e19],
    ]) {
      const edges = bandEdges(SILICON, T);
      const kT = thermalVoltage(T);
      const { isolatedEnergy, referenceDensity, screeningExponent, localizationDensity, localizationExponent } =
        P.ionization;
      const deltaE = isolatedEnergy / (1 + Math.pow(N / referenceDensity, screeningExponent));
      const b = 1 / (1 + Math.pow(N / localizationDensity, localizationExponent));
      const n1 = (Math.exp(edges.logConductionDensity) / P.degeneracy) * Math.exp(-deltaE / kT);
      const B1 = n1 - N * (1 - b);
      const expected = (2 * N * n1) / (B1 + Math.sqrt(B1 * B1 + 4 * N * n1));
      const eq = solveEquilibrium(SILICON, T, doped([P, N]));
      expect(eq.electrons / expected).toBeCloseTo(1, 10);
    }
  });

  it('freezes out at 77 K and stays nearly fully ionised at 300 K (P 1e16)', () => {
    const cold = solveEquilibrium(SILICON, 77, doped([P, 1e16]));
    const warm = solveEquilibrium(SILICON, 300, doped([P, 1e16]));
    expect(cold.electrons).toBeLessThan(0.6e16);
    expect(cold.electrons).toBeGreaterThan(0.2e16);
    expect(warm.electrons / 1e16).toBeGreaterThan(0.99);
  });

  it('turns intrinsic at 600 K: 1e14 P gives n ≈ ni(600 K)', () => {
    const eq = solveEquilibrium(SILICON, 600, doped([P, 1e14]));
    const ni = intrinsicDensity(SILICON, 600);
    expect(eq.electrons / ni).toBeGreaterThan(1);
    expect(eq.electrons / ni).toBeLessThan(1.03);
    // n − p = ionised donors ≈ N once ni ≫ N (common practice, no source)
    expect((eq.electrons - eq.holes) / 1e14).toBeCloseTo(1, 3);
  });

  it('handles compensation: Nd = Na gives n ≈ p ≈ ni at 300 K; Nd − Na sets n otherwise', () => {
    const balanced = solveEquilibrium(SILICON, 300, doped([P, 1e17], [B, 1e17]));
    const ni = intrinsicDensity(SILICON, 300);
    expect(balanced.electrons / ni).toBeGreaterThan(0.5);
    expect(balanced.electrons / ni).toBeLessThan(2);
    const partly = solveEquilibrium(SILICON, 300, doped([P, 1e16], [B, 1e15]));
    expect(partly.electrons / 9e15).toBeGreaterThan(0.98);
    expect(partly.electrons / 9e15).toBeLessThan(1.0);
  });

  it('adds several species of one kind', () => {
    const both = solveEquilibrium(SILICON, 300, doped([P, 5e15], [As, 5e15]));
    const total = solveEquilibrium(SILICON, 300, doped([P, 1e16]));
    expect(both.electrons / total.electrons).toBeCloseTo(1, 2);
  });

  it('gives more electrons for more donors at any temperature (monotone)', () => {
    for (const T of [20, 77, 300, 1000]) {
      let previous = 0;
      for (let log = 10; log <= 22; log += 0.5) {
        const n = solveEquilibrium(SILICON, T, doped([P, 10 ** log])).electrons;
        expect(n).toBeGreaterThan(previous);
        previous = n;
      }
    }
  });

  it('reports Ef − Ei = kT·ln(n/ni) (Boltzmann; common practice, no source)', () => {
    const eq = solveEquilibrium(SILICON, 300, doped([P, 1e16]));
    const kT = thermalVoltage(300);
    expect(eq.fermiLevel).toBeCloseTo(kT * Math.log(eq.electrons / intrinsicDensity(SILICON, 300)), 12);
    const p = solveEquilibrium(SILICON, 300, doped([B, 1e16]));
    expect(p.fermiLevel).toBeLessThan(0);
  });

  it('rejects bad densities, temperatures and models with clear messages', () => {
    expect(() => solveEquilibrium(SILICON, 300, doped([P, -1]))).toThrow(/phosphorus density -1/);
    expect(() => solveEquilibrium(SILICON, 300, doped([P, Number.NaN]))).toThrow(PhysicsDomainError);
    expect(() => solveEquilibrium(SILICON, 300, doped([P, 4e22], [B, 4e22]))).toThrow(/exceeds the atomic density/);
    expect(() => solveEquilibrium(SILICON, 0.1, [])).toThrow(/outside the range allowed/);
    expect(() => solveEquilibrium(SILICON, 300, [], 'nope')).toThrow(/unknown intrinsic density model/);
  });

  it('works over the whole material domain, 1 K to 1687 K, without NaN', () => {
    for (const T of [1, 5, 10, 1687]) {
      const eq = solveEquilibrium(SILICON, T, doped([P, 1e16], [B, 1e15]));
      expect(Number.isFinite(eq.fermiLevel)).toBe(true);
      expect(Number.isNaN(eq.electrons)).toBe(false);
      expect(Number.isNaN(eq.holes)).toBe(false);
    }
  });
});

describe('ionizedFraction', () => {
  it('agrees with the ionised densities of solveEquilibrium', () => {
    for (const T of [77, 300]) {
      const dopants = doped([P, 3e17], [B, 1e16]);
      const eq = solveEquilibrium(SILICON, T, dopants);
      expect(ionizedFraction(SILICON, T, P, 3e17, eq.fermiLevel) * 3e17).toBeCloseTo(eq.ionizedDonors, -2);
      expect((ionizedFraction(SILICON, T, B, 1e16, eq.fermiLevel) * 1e16) / eq.ionizedAcceptors).toBeCloseTo(1, 12);
    }
  });

  it('passes the intrinsic model through', () => {
    const eq = solveEquilibrium(SILICON, 300, doped([P, 1e18]), 'dos');
    expect(ionizedFraction(SILICON, 300, P, 1e18, eq.fermiLevel, 'dos') * 1e18).toBeCloseTo(eq.ionizedDonors, -4);
  });

  it('rejects a non-finite Fermi level', () => {
    expect(() => ionizedFraction(SILICON, 300, P, 1e16, Number.NaN)).toThrow(/Fermi level/);
  });
});
