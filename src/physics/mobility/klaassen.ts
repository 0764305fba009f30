/**
 * Klaassen's unified mobility model for silicon: D. B. M. Klaassen, "A unified
 * mobility model for device simulation — I. Model equations and concentration
 * dependence", Solid-State Electron. 35, 953 (1992), and "— II. Temperature
 * dependence of carrier mobility and lifetime", Solid-State Electron. 35, 961
 * (1992). Equations and every coefficient below are written from memory.
 *
 * One model for majority and minority carriers, donors and acceptors,
 * electron–hole scattering, screening and temperature. For carrier i (e or h,
 * j the other one):
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
 * - Densities. Klaassen assumed full ionization when fitting (dopant
 *   densities, n = N_D in n-type at 300 K). We pass dopant densities N_D, N_A
 *   and equilibrium carriers, with the net-majority carrier's density
 *   multiplied by fullIonizationCorrection (≈ N_net/n_eq(300 K)) — the same
 *   factor freeCarrierMobility applies to that carrier's mobility. At 300 K the
 *   majority density is then N_net exactly as in Klaassen's fit, so
 *   σ = q·n·μ_drift = q·N_net·μ_Klaassen(N) reproduces the fitted resistivity as
 *   for the other silicon fits (DRIFT.MOBILITY returns μ_Klaassen itself); away from 300 K freeze-out (fewer screening
 *   carriers) and intrinsic carriers (electron–hole scattering) still enter.
 * - Dopant species. Klaassen's parameters are species-independent apart from
 *   donor vs acceptor clustering; every donor (acceptor) uses the donor
 *   (acceptor) row. (Masetti's As row is lower: at 1e19–1e20 cm⁻³ klaassen's
 *   As-doped resistivity is 6–17 % below masetti's.)
 *
 * Behaviour that follows from the equations (tested in klaassen.test.ts):
 * at 300 K majority mobility is within 0.01 % (P) and 5 % (B, near 1e18) of
 * Masetti up to 1e19; minority carriers are a few % slower than majority ones
 * at 1e15–1e17 (electron–hole scattering) and much faster at 1e19–1e20
 * (about 1.8× and 2.7× for electrons); at heavy doping μ follows μ_c, i.e.
 * about T^(−1/2); at 50–77 K the majority mobility rises again across the Mott
 * transition, where the released carriers start screening dopants that are
 * counted as scatterers whether ionized or not (full-ionization inputs).
 */
import type { Carrier, Sample } from '../sample';
import { otherCarrier, sampleDopants } from '../sample';
import { solveEquilibrium } from '../equilibrium';
import { findRoot } from '../solve';
import { memoize } from '../memo';
import type { DopantKind } from '../materials/types';
import { fullIonizationCorrection, netMajorityCarrier } from './fullIonizationCorrection';
import { MASETTI_TABLE, type MasettiParameters } from './masetti';

/** Citation and validity of Klaassen's model, for the model registry. */
export const KLAASSEN_SOURCE = {
  citation:
    'D. B. M. Klaassen, Solid-State Electron. 35, 953 (1992) (I: model equations, concentration dependence) ' +
    'and 35, 961 (1992) (II: temperature dependence). Equations and coefficients from memory, checked against ' +
    'public transcriptions (github tcadsoftware/charon src/Charon_Material_Properties.cpp; cogenda/Genius-TCAD-Open ' +
    'src/material/Si/Si_mob_Philips.cc; pvedu/photovoltaic photovoltaic/si.py); they disagree on r5 of F(P) ' +
    '(−0.8552 here, as in the simulators; −0.01552 in pvedu and another transcription that follows the paper)',
  validity:
    'Silicon. 300 K: majority electrons and holes about 1e14–1e21 cm⁻³ (P, As, B), minority carriers about ' +
    '1e17–1e20 cm⁻³; temperature: roughly 70/100–500 K (paper II, range from memory); extrapolated outside',
} as const;

/** Reference temperature of Klaassen's reduced temperature T/300 K. */
export const KLAASSEN_REFERENCE_TEMPERATURE = 300;

/** Carrier parameters (paper I, Table 1 and paper II for θ; from memory). Mobilities cm²/(V·s). */
export interface KlaassenCarrierParameters {
  readonly maximum: number; // μ_i,max, lattice mobility at 300 K
  readonly latticeExponent: number; // θ_i of μ_L = μmax·(300/T)^θ
  readonly minimum: number; // μ_i,min
  readonly referenceDensity: number; // N_i,ref, cm⁻³
  readonly alpha: number; // α_i
  readonly massRatio: number; // m_i/m0, the mass in P_BH, F and G
}

/**
 * Klaassen's carrier parameters. μmax, μmin, N_ref and α are Masetti et al.'s
 * P (electrons) and B (holes) values, as Klaassen took them (from memory);
 * θ from paper II (from memory); m_e/m0 = 1, m_h/m0 = 1.258 (from memory,
 * least certain). Validity: see KLAASSEN_SOURCE.
 */
export const KLAASSEN_CARRIER_TABLE: Readonly<Record<Carrier, KlaassenCarrierParameters>> = {
  electron: { ...fromMasetti(MASETTI_TABLE.P.parameters), latticeExponent: 2.285, massRatio: 1 },
  hole: { ...fromMasetti(MASETTI_TABLE.B.parameters), latticeExponent: 2.247, massRatio: 1.258 },
};

/** The four parameters Klaassen shares with a Masetti row (read from it, so the two tables cannot disagree). */
function fromMasetti(row: MasettiParameters): Pick<KlaassenCarrierParameters, 'maximum' | 'minimum' | 'referenceDensity' | 'alpha'> {
  return { maximum: row.maximum, minimum: row.minimum1, referenceDensity: row.referenceDensity, alpha: row.alpha };
}

/** Exponents of the temperature laws of μ_N and μ_c (paper II, from memory): μ_N ∝ T^(3α − 3/2), μ_c ∝ T^(−1/2). */
export const KLAASSEN_TEMPERATURE_LAWS = {
  impurityAlphaFactor: 3, // the 3 of 3α − 3/2
  impurityOffset: 1.5, // the 3/2 of 3α − 3/2
  carrierTermExponent: 0.5, // μ_c ∝ (300/T)^0.5
} as const;

/** Clustering constants of Z = 1 + 1/(c + (N_ref/N)²) (paper I, from memory). */
export interface KlaassenClusteringParameters {
  readonly c: number; // c_X, dimensionless
  readonly referenceDensity: number; // N_X,ref, cm⁻³
}

/** Donor and acceptor clustering (paper I, from memory; matters above ~1e20 cm⁻³). */
export const KLAASSEN_CLUSTERING_TABLE: Readonly<Record<DopantKind, KlaassenClusteringParameters>> = {
  donor: { c: 0.21, referenceDensity: 4.0e20 },
  acceptor: { c: 0.5, referenceDensity: 7.2e20 },
};

/** Screening parameter P = [f_CW/P_CW + f_BH/P_BH]⁻¹ (paper I, from memory). */
export const KLAASSEN_SCREENING = {
  conwellWeisskopfWeight: 2.459, // f_CW
  brooksHerringWeight: 3.828, // f_BH
  conwellWeisskopfScale: 3.97e13, // P_CW = scale·[1/(Z³·N_sc)·(T/300)³]^(2/3), N_sc in cm⁻³
  conwellWeisskopfExponent: 2 / 3, // the 2/3
  conwellWeisskopfChargePower: 3, // the Z³
  conwellWeisskopfTemperaturePower: 3, // the (T/300)³
  brooksHerringScale: 1.36e20, // P_BH = scale/(n + p)·(m/m0)·(T/300)², cm⁻³
  brooksHerringTemperaturePower: 2, // the (T/300)²
} as const;

/** Electron–hole scattering F(P) = (r1·P^r6 + r2 + r3·m_i/m_j)/(P^r6 + r4 + r5·m_i/m_j) (paper I, from memory). */
export const KLAASSEN_ELECTRON_HOLE_F = {
  r1: 0.7643,
  r2: 2.2999,
  r3: 6.5502,
  r4: 2.367,
  r5: -0.8552,
  r6: 0.6478,
} as const;

/** Minority-carrier (repulsive-impurity) factor G(P) (paper I, from memory). */
export const KLAASSEN_MINORITY_G = {
  s1: 0.89233,
  s2: 0.41372,
  s3: 0.19778,
  s4: 0.28227,
  s5: 0.005978,
  s6: 1.80618,
  s7: 0.72169,
} as const;

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
 * @example klaassenLatticeMobility('electron', 300) // 1414
 */
export function klaassenLatticeMobility(carrier: Carrier, temperature: number): number {
  const p = KLAASSEN_CARRIER_TABLE[carrier];
  return p.maximum * Math.pow(KLAASSEN_REFERENCE_TEMPERATURE / temperature, p.latticeExponent);
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
  const { c, referenceDensity } = KLAASSEN_CLUSTERING_TABLE[kind];
  const ratio = referenceDensity / density;
  return 1 + 1 / (c + ratio * ratio);
}

/**
 * Screening parameter P_i = [f_CW/P_CW,i + f_BH/P_BH,i]⁻¹, written with the
 * inverses 1/P_CW ∝ (Z³N_sc)^(2/3) and 1/P_BH ∝ (n + p) so that zero
 * densities give P = ∞ (no screening correction) without 0/0.
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
  const s = KLAASSEN_SCREENING;
  const reduced = temperature / KLAASSEN_REFERENCE_TEMPERATURE;
  const mass = KLAASSEN_CARRIER_TABLE[carrier].massRatio;
  const inverseCW =
    Math.pow(
      (Math.pow(chargeFactor, s.conwellWeisskopfChargePower) * scatterers) /
        Math.pow(reduced, s.conwellWeisskopfTemperaturePower),
      s.conwellWeisskopfExponent,
    ) / s.conwellWeisskopfScale;
  const inverseBH = carriers / (s.brooksHerringScale * mass * Math.pow(reduced, s.brooksHerringTemperaturePower));
  return 1 / (s.conwellWeisskopfWeight * inverseCW + s.brooksHerringWeight * inverseBH);
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
  const f = KLAASSEN_ELECTRON_HOLE_F;
  if (screening === Infinity) return f.r1;
  const power = Math.pow(screening, f.r6);
  const ratio = massRatioToOther(carrier);
  return (f.r1 * power + f.r2 + f.r3 * ratio) / (power + f.r4 + f.r5 * ratio);
}

/** G(P) as fitted, without the lower bound on P. */
function unboundedG(carrier: Carrier, screening: number, temperature: number): number {
  const g = KLAASSEN_MINORITY_G;
  const { a, b } = gScales(carrier, temperature);
  return 1 - g.s1 / Math.pow(g.s2 + a * screening, g.s3) + g.s5 / Math.pow(b * screening, g.s6);
}

/** The scale factors a = (m0/m_i·T/300)^s4 and b = (m_i/m0·300/T)^s7 of G. */
function gScales(carrier: Carrier, temperature: number): { a: number; b: number } {
  const g = KLAASSEN_MINORITY_G;
  const mass = KLAASSEN_CARRIER_TABLE[carrier].massRatio;
  const reduced = temperature / KLAASSEN_REFERENCE_TEMPERATURE;
  return { a: Math.pow(reduced / mass, g.s4), b: Math.pow(mass / reduced, g.s7) };
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
  const g = KLAASSEN_MINORITY_G;
  const { a, b } = gScales(carrier, temperature);
  const scaledSlope = (logP: number): number => {
    const u = Math.exp(logP);
    return (
      g.s1 * g.s3 * a * Math.exp((-g.s3 - 1) * Math.log(g.s2 + a * u) + (g.s6 + 1) * logP) -
      g.s5 * g.s6 * Math.pow(b, -g.s6)
    );
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
 * Lower bound on G: a repelling impurity cannot scatter less than not at all.
 * The fitted G(P_min) is ≈ 0.10 (electrons) and 0.08 (holes) at 300 K but
 * falls through zero below about 55 K (electrons) and 75 K (holes), outside
 * the fitted temperatures; there G is held at 0 (our choice, no source).
 */
const MINORITY_FACTOR_FLOOR = 0;

/**
 * Minority-carrier factor G(P): the weight of impurities that repel the
 * carrier (acceptors for electrons) relative to attracting ones (paper I,
 * from memory), evaluated at max(P, P_min).
 *
 * @param carrier - the scattered carrier i
 * @param screening - P_i ≥ 0 (Infinity allowed: G → 1)
 * @param temperature - T > 0, K
 * @returns G, dimensionless, between its minimum and 1
 * @example klaassenMinorityFactor('electron', 1.36, 300) // ≈ 0.21
 */
export function klaassenMinorityFactor(carrier: Carrier, screening: number, temperature: number): number {
  if (screening === Infinity) return 1;
  const bounded = unboundedG(carrier, Math.max(screening, klaassenGMinimumScreening(carrier, temperature)), temperature);
  return Math.max(MINORITY_FACTOR_FLOOR, bounded);
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
  const p = KLAASSEN_CARRIER_TABLE[carrier];
  const law = KLAASSEN_TEMPERATURE_LAWS;
  const reduced = temperature / KLAASSEN_REFERENCE_TEMPERATURE;
  // Attracting (own) and repelling (opposite) impurities and the other carrier type, for carrier i.
  const [attracting, repelling]: [DopantKind, DopantKind] = carrier === 'electron' ? ['donor', 'acceptor'] : ['acceptor', 'donor'];
  const attractingDensity = carrier === 'electron' ? densities.donors : densities.acceptors;
  const repellingDensity = carrier === 'electron' ? densities.acceptors : densities.donors;
  const otherCarriers = carrier === 'electron' ? densities.holes : densities.electrons;
  const carriers = densities.electrons + densities.holes;

  const attractingStar = attractingDensity * klaassenClusteringFactor(attracting, attractingDensity); // N*
  const repellingStar = repellingDensity * klaassenClusteringFactor(repelling, repellingDensity);
  const scatterers = attractingStar + repellingStar + otherCarriers; // N_i,sc
  if (!(scatterers > 0)) return Infinity;
  const chargeFactor = scatterers / (attractingDensity + repellingDensity + otherCarriers); // mean Z (module comment)

  const screening = klaassenScreeningParameter(carrier, scatterers, chargeFactor, carriers, temperature);
  const effective = // N_i,sc,eff
    attractingStar +
    klaassenMinorityFactor(carrier, screening, temperature) * repellingStar +
    otherCarriers / klaassenElectronHoleFactor(carrier, screening);
  if (!(effective > 0)) return Infinity; // only repelling impurities with G = 0 left: nothing scatters

  const impurityAmplitude = // μ_i,N
    ((p.maximum * p.maximum) / (p.maximum - p.minimum)) *
    Math.pow(reduced, law.impurityAlphaFactor * p.alpha - law.impurityOffset);
  const carrierAmplitude = // μ_i,c
    ((p.maximum * p.minimum) / (p.maximum - p.minimum)) * Math.pow(1 / reduced, law.carrierTermExponent);

  return (
    impurityAmplitude * (scatterers / effective) * Math.pow(p.referenceDensity / scatterers, p.alpha) +
    carrierAmplitude * (carriers / effective)
  );
}

/**
 * The densities Klaassen's model takes for a sample: N_D and N_A from the
 * named dopant and its counter-doping, n and p from the equilibrium at the
 * sample's temperature, the net-majority carrier's density multiplied by
 * fullIonizationCorrection (see the module comment: Klaassen fitted with full
 * ionization; this keeps ρ at 300 K on his fit).
 *
 * @param sample - the sample
 * @returns N_D, N_A, n, p in cm⁻³
 * @example klaassenSampleDensities(phosphorus1e18At300K) // { donors: 1e18, acceptors: 0, electrons: ≈ 1e18, holes: ≈ 1e2 }
 */
export function klaassenSampleDensities(sample: Sample): KlaassenDensities {
  const equilibrium = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const majority = netMajorityCarrier(sample);
  const factor = majority === undefined ? 1 : fullIonizationCorrection(sample);
  const named = sample.dopant.kind === 'donor';
  return {
    donors: named ? sample.density : sample.counterDensity,
    acceptors: named ? sample.counterDensity : sample.density,
    electrons: equilibrium.electrons * (majority === 'electron' ? factor : 1),
    holes: equilibrium.holes * (majority === 'hole' ? factor : 1),
  };
}

/**
 * Klaassen's mobility for a carrier in a sample, as published (n = N_net for
 * the majority carrier at 300 K, see klaassenSampleDensities); freeCarrierMobility
 * then treats it like the other silicon fits.
 *
 * @param carrier - 'electron' or 'hole'
 * @param sample - a silicon sample
 * @returns μ in cm²/(V·s)
 * @example klaassenSampleMobility('electron', boron1e19At300K) // ≈ 210 (minority electrons)
 */
export function klaassenSampleMobility(carrier: Carrier, sample: Sample): number {
  return klaassenMobility(carrier, klaassenSampleDensities(sample), sample.temperature);
}
