/**
 * The equations of Klaassen's unified mobility model for silicon (D. B. M.
 * Klaassen, Solid-State Electron. 35, 953 and 961 (1992), papers I and II;
 * equations from memory). The fitted values are in parameters.ts; the
 * constants that belong to an equation's form are written here as the paper
 * writes them. One model for majority and minority carriers, donors and
 * acceptors, electron–hole scattering, screening and temperature. For carrier
 * i (e or h, j the other one):
 *
 *   1/μ_i = 1/μ_i,L + 1/μ_i,DAeh                                  (Matthiessen)
 *   μ_i,L = μ_i,max·(300/T)^θ_i                                    (lattice)
 *   μ_i,DAeh = μ_i,N·(N_i,sc/N_i,sc,eff)·(N_i,ref/N_i,sc)^α_i
 *            + μ_i,c·((n + p)/N_i,sc,eff)                          (impurities, carriers)
 *   μ_i,N = μ_i,max²/(μ_i,max − μ_i,min)·(T/300)^(3α_i − 3/2)
 *   μ_i,c = μ_i,max·μ_i,min/(μ_i,max − μ_i,min)·(300/T)^(1/2)
 *
 *   N_e,sc = N_D* + N_A* + p,   N_e,sc,eff = N_D* + G(P_e)·N_A* + p/F(P_e)
 *   N_h,sc = N_A* + N_D* + n,   N_h,sc,eff = N_A* + G(P_h)·N_D* + n/F(P_h)
 *
 * The impurities of the carrier's own sign of attraction (donors for electrons)
 * count fully; the repulsive ones (acceptors for electrons) count with G ≤ 1,
 * the "minority-carrier" effect; the other carrier type scatters with 1/F.
 *
 * Ultra-high doping (clustering): N_X* = N_X·Z_X, Z_X = 1 + 1/(c_X + (N_X,ref/N_X)²).
 *
 * Screening parameter, a mix of the Conwell–Weisskopf and Brooks–Herring ones:
 *   P_i = [f_CW/P_CW,i + f_BH/P_BH,i]⁻¹
 *   P_CW,i = 3.97e13·[1/(Z³·N_i,sc)·(T/300)³]^(2/3)
 *   P_BH,i = 1.36e20/(n + p)·(m_i/m0)·(T/300)²
 *
 *   F(P) = (r1·P^r6 + r2 + r3·m_i/m_j)/(P^r6 + r4 + r5·m_i/m_j)
 *   G(P) = 1 − s1/[s2 + P·(m0/m_i·T/300)^s4]^s3 + s5/[P·(m_i/m0·300/T)^s7]^s6
 *
 * At 300 K, for a majority carrier in uncompensated material (n = N_D, p → 0)
 * this reduces exactly to μ_min + (μ_max − μ_min)/(1 + (N/N_ref)^α), the
 * Caughey–Thomas form with Masetti's parameters (Klaassen took μmax, μmin,
 * N_ref and α from Masetti et al. 1983, from memory): 1/μ_L + 1/μ_DAeh with
 * x = (N_ref/N)^α gives (1 + x)/(μmax·x + μmin).
 *
 * Choices of ours (documented, not from the paper):
 * - Z in P_CW. The paper's Z is the clustering factor of the scatterer; with
 *   donors, acceptors and carriers mixed we use the density-weighted mean
 *   Z = N_i,sc/(N_D + N_A + carrier), i.e. Z_D for donor-doped n-type, Z_A for
 *   acceptor-doped p-type, and a smooth blend under compensation.
 * - G at small P. G(P) has a single minimum at some P_min (dG/dP = 0) and
 *   then rises without bound as P → 0 (the s5 term), which the fit was never
 *   meant to do: repulsive impurities cannot scatter more than attractive ones
 *   (G ≤ 1). We evaluate G at max(P, P_min), so G is constant below P_min;
 *   G and dG/dP are continuous there (from memory, the intended handling).
 *   Below about 55–75 K G(P_min) itself turns negative; G is then held at 0.
 *
 * How a sample's dopants and carriers become N_D, N_A, n and p is in
 * sample.ts. Behaviour that follows from the equations (tested in
 * klaassen.test.ts): at 300 K majority mobility is within 0.01 % (P) and 5 %
 * (B, near 1e18) of Masetti up to 1e19; minority carriers are a few % slower
 * than majority ones at 1e15–1e17 (electron–hole scattering) and much faster
 * at 1e19–1e20 (about 1.8× and 2.7× for electrons); at heavy doping μ follows
 * μ_c, i.e. about T^(−1/2); at 50–77 K the majority mobility rises again
 * across the Mott transition, where the released carriers start screening
 * dopants that are counted as scatterers whether ionized or not
 * (full-ionization inputs).
 */
import type { Carrier } from '../../sample';
import { otherCarrier } from '../../sample';
import { findRoot } from '../../solve';
import { memoize } from '../../memo';
import type { DopantKind } from '../../materials/types';
import {
  KLAASSEN_CARRIER_TABLE,
  KLAASSEN_CLUSTERING_TABLE,
  KLAASSEN_ELECTRON_HOLE_F,
  KLAASSEN_MINORITY_G,
  KLAASSEN_SCREENING,
} from './parameters';

/** Densities Klaassen's model takes, cm⁻³ (all ≥ 0). */
export interface KlaassenDensities {
  /** N_D, total donor density (full ionization assumed, as in the fit). */
  readonly donors: number;
  /** N_A, total acceptor density. */
  readonly acceptors: number;
  /** n, free electrons. */
  readonly electrons: number;
  /** p, free holes. */
  readonly holes: number;
}

/**
 * Lattice mobility μ_i,L = μ_i,max·(300/T)^θ_i (paper II, from memory).
 *
 * @param carrier - 'electron' or 'hole'
 * @param temperature - T > 0, K
 * @returns μ_L in cm²/(V·s)
 * @example klaassenLatticeMobility('electron', 300) // → 1414
 */
export function klaassenLatticeMobility(carrier: Carrier, temperature: number): number {
  const { maximum: muMax, latticeExponent: theta } = KLAASSEN_CARRIER_TABLE[carrier];
  return muMax * Math.pow(300 / temperature, theta);
}

/**
 * Clustering factor Z = 1 + 1/(c + (N_ref/N)²): 1 at ordinary doping, rising
 * above ~1e20 cm⁻³ so that N* = Z·N scatters more (paper I, from memory).
 *
 * @param kind - 'donor' or 'acceptor'
 * @param density - dopant density N ≥ 0, cm⁻³
 * @returns Z ≥ 1 (exactly 1 at N = 0)
 * @example klaassenClusteringFactor('donor', 4e20) // ≈ 1.83
 */
export function klaassenClusteringFactor(kind: DopantKind, density: number): number {
  if (!(density > 0)) return 1;
  const { c, referenceDensity: nRef } = KLAASSEN_CLUSTERING_TABLE[kind];
  const ratio = nRef / density;
  return 1 + 1 / (c + ratio * ratio);
}

/**
 * Screening parameter P_i = [f_CW/P_CW,i + f_BH/P_BH,i]⁻¹, written with the
 * inverses 1/P_CW = [Z³·N_sc/(T/300)³]^(2/3)/3.97e13 and
 * 1/P_BH = (n + p)/(1.36e20·(m_i/m0)·(T/300)²) so that zero densities give
 * P = ∞ (no screening correction) without 0/0.
 *
 * @param carrier - the scattered carrier i
 * @param scatterers - N_i,sc, cm⁻³
 * @param chargeFactor - Z of the scatterers (≥ 1)
 * @param carriers - n + p, cm⁻³
 * @param temperature - T > 0, K
 * @returns P_i, dimensionless (may be Infinity)
 * @example klaassenScreeningParameter('electron', 2e19, 1, 1e19, 300) // ≈ 1.36
 */
export function klaassenScreeningParameter(
  carrier: Carrier,
  scatterers: number,
  chargeFactor: number,
  carriers: number,
  temperature: number,
): number {
  const { conwellWeisskopfWeight: fCW, brooksHerringWeight: fBH, conwellWeisskopfScale, brooksHerringScale } = KLAASSEN_SCREENING;
  const t = temperature / 300;
  const m = KLAASSEN_CARRIER_TABLE[carrier].massRatio;
  const Z = chargeFactor;
  const inversePCW = Math.pow((Math.pow(Z, 3) * scatterers) / Math.pow(t, 3), 2 / 3) / conwellWeisskopfScale;
  const inversePBH = carriers / (brooksHerringScale * m * Math.pow(t, 2));
  return 1 / (fCW * inversePCW + fBH * inversePBH);
}

/** m_i/m_j, the mass ratio of the scattered carrier to the other type. */
function massRatioToOther(carrier: Carrier): number {
  return KLAASSEN_CARRIER_TABLE[carrier].massRatio / KLAASSEN_CARRIER_TABLE[otherCarrier(carrier)].massRatio;
}

/**
 * Electron–hole scattering factor F(P): the other carrier type scatters like
 * an impurity density (other carrier)/F (paper I, from memory).
 *
 * @param carrier - the scattered carrier i
 * @param screening - P_i ≥ 0 (Infinity allowed: F → r1)
 * @returns F > 0, dimensionless
 * @example klaassenElectronHoleFactor('electron', 1.36) // ≈ 2.9
 */
export function klaassenElectronHoleFactor(carrier: Carrier, screening: number): number {
  const { r1, r2, r3, r4, r5, r6 } = KLAASSEN_ELECTRON_HOLE_F;
  if (screening === Infinity) return r1;
  const Pr6 = Math.pow(screening, r6);
  const mij = massRatioToOther(carrier);
  return (r1 * Pr6 + r2 + r3 * mij) / (Pr6 + r4 + r5 * mij);
}

/** G(P) as fitted, without the lower bound on P. */
function unboundedG(carrier: Carrier, P: number, temperature: number): number {
  const { s1, s2, s3, s5, s6 } = KLAASSEN_MINORITY_G;
  const { a, b } = gScales(carrier, temperature);
  return 1 - s1 / Math.pow(s2 + a * P, s3) + s5 / Math.pow(b * P, s6);
}

/** The scale factors a = (m0/m_i·T/300)^s4 and b = (m_i/m0·300/T)^s7 of G. */
function gScales(carrier: Carrier, temperature: number): { a: number; b: number } {
  const { s4, s7 } = KLAASSEN_MINORITY_G;
  const m = KLAASSEN_CARRIER_TABLE[carrier].massRatio;
  const t = temperature / 300;
  return { a: Math.pow(t / m, s4), b: Math.pow(m / t, s7) };
}

/** Bracket for ln P_min: P from e^−40 to e^40 covers every temperature the solvers accept. */
const LOG_P_MIN_BRACKET = { lo: -40, hi: 40 } as const;

/**
 * P at which G(P) has its minimum, dG/dP = 0. With u = P,
 * u^(s6+1)·dG/du = s1·s3·a·(s2 + a·u)^(−s3−1)·u^(s6+1) − s5·s6·b^(−s6),
 * whose first term increases strictly with u (s6 > s3), so the root is unique;
 * found in ln u. A root search per carrier and temperature, remembered
 * (memo.ts, the core's one memo policy).
 */
const gMinimumScreening = memoize(2048, (carrier: Carrier, temperature: number): number => {
  const { s1, s2, s3, s5, s6 } = KLAASSEN_MINORITY_G;
  const { a, b } = gScales(carrier, temperature);
  const scaledSlope = (logP: number): number => {
    const u = Math.exp(logP);
    return s1 * s3 * a * Math.exp((-s3 - 1) * Math.log(s2 + a * u) + (s6 + 1) * logP) - s5 * s6 * Math.pow(b, -s6);
  };
  const logMinimum = findRoot(scaledSlope, LOG_P_MIN_BRACKET.lo, LOG_P_MIN_BRACKET.hi, { xTolerance: 1e-12 }).root;
  return Math.exp(logMinimum);
});

/**
 * The lower bound P_min on the screening parameter in G (see the module comment).
 *
 * @param carrier - the scattered carrier i
 * @param temperature - T > 0, K
 * @returns P_min > 0
 * @example klaassenGMinimumScreening('electron', 300) // ≈ 0.32
 */
export function klaassenGMinimumScreening(carrier: Carrier, temperature: number): number {
  return gMinimumScreening(carrier, temperature);
}

/**
 * Minority-carrier factor G(P): the weight of impurities that repel the
 * carrier (acceptors for electrons) relative to attracting ones (paper I,
 * from memory), evaluated at max(P, P_min). The fitted G(P_min) is ≈ 0.10
 * (electrons) and 0.08 (holes) at 300 K but falls through zero below about
 * 55 K (electrons) and 75 K (holes), outside the fitted temperatures; there
 * G is held at 0: a repelling impurity cannot scatter less than not at all
 * (our choice, no source).
 *
 * @param carrier - the scattered carrier i
 * @param screening - P_i ≥ 0 (Infinity allowed: G → 1)
 * @param temperature - T > 0, K
 * @returns G, dimensionless, between its minimum and 1
 * @example klaassenMinorityFactor('electron', 1.36, 300) // ≈ 0.21
 */
export function klaassenMinorityFactor(carrier: Carrier, screening: number, temperature: number): number {
  if (screening === Infinity) return 1;
  return Math.max(0, unboundedG(carrier, Math.max(screening, klaassenGMinimumScreening(carrier, temperature)), temperature));
}

/**
 * Klaassen mobility of one carrier type.
 *
 * @param carrier - 'electron' or 'hole'
 * @param densities - N_D, N_A (dopants) and n, p (carriers), cm⁻³
 * @param temperature - T > 0, K
 * @returns μ in cm²/(V·s)
 * @example klaassenMobility('electron', { donors: 1e17, acceptors: 0, electrons: 1e17, holes: 1e3 }, 300) // ≈ 721
 */
export function klaassenMobility(carrier: Carrier, densities: KlaassenDensities, temperature: number): number {
  return 1 / (1 / klaassenLatticeMobility(carrier, temperature) + 1 / klaassenImpurityCarrierMobility(carrier, densities, temperature));
}

/**
 * μ_i,DAeh: scattering by donors, acceptors and the other carrier type,
 * screened. Returns Infinity when there is nothing to scatter from.
 *
 * @param carrier - 'electron' or 'hole'
 * @param densities - N_D, N_A, n, p, cm⁻³
 * @param temperature - T > 0, K
 * @returns μ_DAeh in cm²/(V·s)
 * @example klaassenImpurityCarrierMobility('hole', { donors: 0, acceptors: 1e18, electrons: 0, holes: 1e18 }, 300) // ≈ 226
 */
export function klaassenImpurityCarrierMobility(carrier: Carrier, densities: KlaassenDensities, temperature: number): number {
  const { maximum: muMax, minimum: muMin, referenceDensity: nRef, alpha } = KLAASSEN_CARRIER_TABLE[carrier];
  const t = temperature / 300;
  const { donors: nD, acceptors: nA, electrons: n, holes: p } = densities;
  // For electrons the donors attract, the acceptors repel and the holes are the other carrier; for holes the reverse.
  const [attracting, repelling]: [DopantKind, DopantKind] = carrier === 'electron' ? ['donor', 'acceptor'] : ['acceptor', 'donor'];
  const [nAttracting, nRepelling, nOther] = carrier === 'electron' ? [nD, nA, p] : [nA, nD, n];

  const nAttractingStar = nAttracting * klaassenClusteringFactor(attracting, nAttracting); // N_D* for electrons
  const nRepellingStar = nRepelling * klaassenClusteringFactor(repelling, nRepelling); // N_A* for electrons
  const nSc = nAttractingStar + nRepellingStar + nOther; // N_i,sc
  if (!(nSc > 0)) return Infinity;
  const Z = nSc / (nAttracting + nRepelling + nOther); // mean clustering factor (module comment)

  const P = klaassenScreeningParameter(carrier, nSc, Z, n + p, temperature);
  const G = klaassenMinorityFactor(carrier, P, temperature);
  const F = klaassenElectronHoleFactor(carrier, P);
  const nScEff = nAttractingStar + G * nRepellingStar + nOther / F; // N_i,sc,eff
  if (!(nScEff > 0)) return Infinity; // only repelling impurities with G = 0 left: nothing scatters

  const muN = ((muMax * muMax) / (muMax - muMin)) * Math.pow(t, 3 * alpha - 3 / 2); // μ_i,N
  const muC = ((muMax * muMin) / (muMax - muMin)) * Math.pow(1 / t, 1 / 2); // μ_i,c: (300/T)^(1/2), as 1/(T/300)
  return muN * (nSc / nScEff) * Math.pow(nRef / nSc, alpha) + muC * ((n + p) / nScEff);
}
