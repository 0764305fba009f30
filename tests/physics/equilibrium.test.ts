import {
  bandEdges,
  BOLTZMANN_STATISTICS,
  FERMI_DIRAC_STATISTICS,
  INTRINSIC_MODEL_CODES,
  intrinsicDensity,
  type BandEdges,
  type CarrierStatistics,
} from '../../src/physics/bands';
import { fermiDiracHalf, fermiDiracOverBoltzmann } from '../../src/physics/bands/fermiDirac';
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
function charge(
  T: number,
  dopants: DopantDensity[],
  eta: number,
  model?: string,
  statistics: CarrierStatistics = FERMI_DIRAC_STATISTICS,
): number {
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
  const carriers = statistics.holeDensity(edges, eta) - statistics.electronDensity(edges, eta);
  return exact + carriers + small;
}

/**
 * n·p/ni² under Fermi–Dirac statistics: (F½(ηc)/e^ηc)·(F½(ηv)/e^ηv), the
 * product of each band's density over its Boltzmann value (follows from
 * n = Nc·F½(ηc), p = Nv·F½(ηv) and ni² = Nc·Nv·e^{ηc+ηv}; common practice,
 * no source). It is 1 to rounding only where both carriers are deeply
 * non-degenerate (ηc, ηv ≲ −38); at 1e16 cm⁻³ majority carriers at 300 K it is
 * already 1 − 1.2e-4.
 */
function fermiDiracProductFactor(edges: BandEdges, eta: number): number {
  return Math.exp(logFermiDiracProductFactor(edges, eta));
}

/** ln of fermiDiracProductFactor, for degenerate cases where the factor itself underflows. */
function logFermiDiracProductFactor(edges: BandEdges, eta: number): number {
  const logRatio = (x: number): number => (x <= 0 ? Math.log(fermiDiracOverBoltzmann(0.5, x)) : Math.log(fermiDiracHalf(x)) - x);
  return logRatio(eta - edges.conductionEdge) + logRatio(-eta - edges.valenceEdge);
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
  it('gives the intrinsic solution for zero doping with Boltzmann statistics: n = p = ni, Ef = Ei', () => {
    for (const T of TEMPERATURES) {
      for (const model of INTRINSIC_MODEL_CODES) {
        const eq = solveEquilibrium(SILICON, T, [], model, BOLTZMANN_STATISTICS);
        const ni = intrinsicDensity(SILICON, T, model);
        expect(eq.electrons / ni).toBeCloseTo(1, 12);
        expect(eq.holes / ni).toBeCloseTo(1, 12);
        expect(Math.abs(eq.fermiLevel)).toBeLessThan(1e-12);
        expect(eq.ionizedDonors).toBe(0);
        expect(eq.ionizedAcceptors).toBe(0);
      }
    }
  });

  it('gives n = p just below ni for zero doping with Fermi–Dirac statistics (the default)', () => {
    // The band edges place ni as the Boltzmann parameter (bandEdges.ts), so the Fermi–Dirac intrinsic
    // density is ni·(F½(ηc)/e^ηc) at ηc = −(Ec − Ei)/kT: 1 − 1.2e-10 at 300 K, 1 − 2e-3 at 1000 K.
    for (const T of TEMPERATURES) {
      for (const model of INTRINSIC_MODEL_CODES) {
        const eq = solveEquilibrium(SILICON, T, [], model);
        const ni = intrinsicDensity(SILICON, T, model);
        const edges = bandEdges(SILICON, T, model);
        const eta = eq.fermiLevel / thermalVoltage(T);
        expect(eq.electrons / eq.holes).toBeCloseTo(1, 12);
        expect((eq.electrons * eq.holes) / (ni * ni) / fermiDiracProductFactor(edges, eta)).toBeCloseTo(1, 12);
        expect(eq.electrons / ni).toBeLessThanOrEqual(1);
        expect(eq.electrons / ni).toBeGreaterThan(T <= 300 ? 1 - 1e-9 : 0.99);
        expect(eq.ionizedDonors).toBe(0);
        expect(eq.ionizedAcceptors).toBe(0);
      }
    }
  });

  // With Fermi–Dirac statistics (the default since issue 3) n·p = ni² holds only for
  // non-degenerate carriers; the exact relation is n·p = ni²·(F½(ηc)/e^ηc)·(F½(ηv)/e^ηv),
  // checked here to the same 1e-12. The Boltzmann solve keeps the old n·p = ni² check.
  it.each(CASES)('converges to 1e-12 in n and p with n·p = ni²·(FD factors): %s', (_label, T, dopants) => {
    const eq = solveEquilibrium(SILICON, T, dopants);
    const kT = thermalVoltage(T);
    const eta = eq.fermiLevel / kT;
    for (const value of [eq.electrons, eq.holes, eq.ionizedDonors, eq.ionizedAcceptors, eq.fermiLevel]) {
      expect(Number.isFinite(value)).toBe(true);
    }
    expect(eq.iterations).toBeLessThan(100);
    // n, p grow at most like exp(±η): bracketing the root within ±1e-12 in η means 1e-12 relative in n and p.
    const delta = 1e-12 + 2 * Number.EPSILON * Math.abs(eta);
    expect(charge(T, dopants, eta - delta)).toBeGreaterThanOrEqual(0);
    expect(charge(T, dopants, eta + delta)).toBeLessThanOrEqual(0);
    // In logarithms: at 20 K and 1e22 cm⁻³ the factor (e^{−1000}) and ni² underflow.
    const edges = bandEdges(SILICON, T);
    const expectedLogProduct = 2 * edges.logIntrinsicDensity + logFermiDiracProductFactor(edges, eta);
    if (eq.electrons > 0 && eq.holes > 0) {
      expect(Math.log(eq.electrons) + Math.log(eq.holes) - expectedLogProduct).toBeCloseTo(0, 12);
    } else {
      // A degenerate majority at 20 K leaves a minority density ni²/(N·e^η) of about e^{−1000}: it underflows.
      expect(expectedLogProduct).toBeLessThan(Math.log(Number.MIN_VALUE) + Math.log(Math.max(eq.electrons, eq.holes)));
    }
  });

  it.each(CASES)('converges to 1e-12 with n·p = ni² under Boltzmann statistics: %s', (_label, T, dopants) => {
    const eq = solveEquilibrium(SILICON, T, dopants, undefined, BOLTZMANN_STATISTICS);
    const eta = eq.fermiLevel / thermalVoltage(T);
    expect(eq.iterations).toBeLessThan(100);
    const delta = 1e-12 + 2 * Number.EPSILON * Math.abs(eta);
    expect(charge(T, dopants, eta - delta, undefined, BOLTZMANN_STATISTICS)).toBeGreaterThanOrEqual(0);
    expect(charge(T, dopants, eta + delta, undefined, BOLTZMANN_STATISTICS)).toBeLessThanOrEqual(0);
    const ni = intrinsicDensity(SILICON, T);
    expect((eq.electrons * eq.holes) / (ni * ni)).toBeCloseTo(1, 12);
  });

  it.each(INTRINSIC_MODEL_CODES.map((m) => [m]))('keeps n·p = ni² exactly for the selected model (%s)', (model) => {
    for (const T of [77, 300, 600]) {
      const boltzmann = solveEquilibrium(SILICON, T, doped([P, 1e15], [B, 3e14]), model, BOLTZMANN_STATISTICS);
      const ni = intrinsicDensity(SILICON, T, model);
      expect((boltzmann.electrons * boltzmann.holes) / (ni * ni)).toBeCloseTo(1, 13);
      // Fermi–Dirac: 7e14 cm⁻³ majority electrons are non-degenerate, so n·p is ni² to about 1e-4
      // (F½(ηc)/e^ηc ≈ 1 − e^ηc/2^{3/2}, ηc ≈ −8.6 at 77 K), and exactly ni² times the FD factors.
      const fd = solveEquilibrium(SILICON, T, doped([P, 1e15], [B, 3e14]), model);
      const factor = fermiDiracProductFactor(bandEdges(SILICON, T, model), fd.fermiLevel / thermalVoltage(T));
      expect((fd.electrons * fd.holes) / (ni * ni)).toBeCloseTo(1, 3);
      expect((fd.electrons * fd.holes) / (ni * ni) / factor).toBeCloseTo(1, 13);
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
    // Follows from neutrality n = Nd⁺ with p negligible and Boltzmann carriers (common practice, no source);
    // so it is checked on the Boltzmann solve (Fermi–Dirac is the default since issue 3).
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
      const { isolatedEnergy, referenceDensity, screeningExponent, localizationDensity, localizationExponent } = P.ionization;
      const deltaE = isolatedEnergy / (1 + Math.pow(N / referenceDensity, screeningExponent));
      const b = 1 / (1 + Math.pow(N / localizationDensity, localizationExponent));
      const n1 = (Math.exp(edges.logConductionDensity) / P.degeneracy) * Math.exp(-deltaE / kT);
      const B1 = n1 - N * (1 - b);
      const expected = (2 * N * n1) / (B1 + Math.sqrt(B1 * B1 + 4 * N * n1));
      const eq = solveEquilibrium(SILICON, T, doped([P, N]), undefined, BOLTZMANN_STATISTICS);
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
    const eq = solveEquilibrium(SILICON, 300, doped([P, 1e16]), undefined, BOLTZMANN_STATISTICS);
    const kT = thermalVoltage(300);
    expect(eq.fermiLevel).toBeCloseTo(kT * Math.log(eq.electrons / intrinsicDensity(SILICON, 300)), 12);
    // Fermi–Dirac (default): Ef − Ei = kT·ln(n/ni) − kT·ln(F½(ηc)/e^ηc), 1.2e-4·kT above the Boltzmann form here.
    const fd = solveEquilibrium(SILICON, 300, doped([P, 1e16]));
    const ratio = fermiDiracOverBoltzmann(0.5, fd.fermiLevel / kT - bandEdges(SILICON, 300).conductionEdge);
    expect(fd.fermiLevel).toBeCloseTo(kT * Math.log(fd.electrons / intrinsicDensity(SILICON, 300) / ratio), 12);
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
