/**
 * The fitted parameters of Klaassen's unified mobility model for silicon:
 * D. B. M. Klaassen, "A unified mobility model for device simulation — I.
 * Model equations and concentration dependence", Solid-State Electron. 35,
 * 953 (1992), and "— II. Temperature dependence of carrier mobility and
 * lifetime", Solid-State Electron. 35, 961 (1992). Every value is from
 * memory, checked against the public transcriptions KLAASSEN_SOURCE names.
 *
 * Only what Klaassen fitted or took from other fits is here, as data with its
 * source. The constants that belong to the form of an equation (the 3α − 3/2
 * of μ_N's temperature law, the Z³ and 2/3 of P_CW, the 300 K of T/300) stay
 * in the equations, as the paper writes them (equations.ts).
 */
import type { Carrier } from '../../sample';
import type { DopantKind } from '../../materials/types';
import { MASETTI_TABLE, type MasettiParameters } from '../masetti';
import { parameterText as t } from '../../parameterText';

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

/**
 * Screening parameter P = [f_CW/P_CW + f_BH/P_BH]⁻¹ (paper I, from memory):
 * the weights f_CW, f_BH and the scales of P_CW = 3.97e13·[1/(Z³·N_sc)·(T/300)³]^(2/3)
 * and P_BH = 1.36e20/(n + p)·(m/m0)·(T/300)², densities in cm⁻³.
 */
export const KLAASSEN_SCREENING = {
  conwellWeisskopfWeight: 2.459, // f_CW
  brooksHerringWeight: 3.828, // f_BH
  conwellWeisskopfScale: 3.97e13, // the 3.97e13 of P_CW
  brooksHerringScale: 1.36e20, // the 1.36e20 of P_BH, cm⁻³
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

/**
 * Citation and validity of Klaassen's model, for the model registry. The r5
 * this model computes with is written from KLAASSEN_ELECTRON_HOLE_F; the
 * −0.01552 beside it is a quote of the transcriptions that disagree, not a
 * value used here.
 */
export const KLAASSEN_SOURCE = {
  citation:
    'D. B. M. Klaassen, Solid-State Electron. 35, 953 (1992) (I: model equations, concentration dependence) ' +
    'and 35, 961 (1992) (II: temperature dependence). Equations and coefficients from memory, checked against ' +
    'public transcriptions (github tcadsoftware/charon src/Charon_Material_Properties.cpp; cogenda/Genius-TCAD-Open ' +
    'src/material/Si/Si_mob_Philips.cc; pvedu/photovoltaic photovoltaic/si.py); they disagree on r5 of F(P) ' +
    `(${t(KLAASSEN_ELECTRON_HOLE_F.r5)} here, as in the simulators; −0.01552 in pvedu and another transcription that follows the paper)`,
  validity:
    'Silicon. 300 K: majority electrons and holes about 1e14–1e21 cm⁻³ (P, As, B), minority carriers about ' +
    '1e17–1e20 cm⁻³; temperature: roughly 70/100–500 K (paper II, range from memory); extrapolated outside',
} as const;
