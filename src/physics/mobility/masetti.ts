/**
 * Masetti, Severi and Solmi, "Modeling of carrier mobility against carrier
 * concentration in arsenic-, phosphorus-, and boron-doped silicon",
 * IEEE Trans. Electron Devices 30, 764 (1983): dopant-specific fits of the
 * 300 K conductivity mobility, electrons in As- and P-doped and holes in
 * B-doped silicon, over about eight decades of concentration (abstract).
 *
 *   μ(N) = μmin1·exp(−Pc/N) + (μmax − μmin2)/(1 + (N/Cr)^α) − μ1/(1 + (Cs/N)^β)
 *
 * Valid at 300 K for N ≈ 1e13…1e21 cm⁻³ (the fitted data range).
 */

/** Citation and validity of the Masetti fit, for the model registry. */
export const MASETTI_SOURCE = {
  citation:
    'G. Masetti, M. Severi, S. Solmi, IEEE Trans. Electron Devices 30, 764 (1983), Table I ' +
    '(As, P electrons; B holes; parameter values from memory, checked against the transcription in ' +
    "Sandia's Charon simulator, github tcadsoftware/charon, src/Charon_Material_Properties.cpp)",
  validity: '300 K fit, about 1e13–1e21 cm⁻³ (eight decades, per the abstract)',
} as const;

/** One row of Masetti et al. (1983) Table I. Mobilities cm²/(V·s), densities cm⁻³. */
export interface MasettiParameters {
  readonly minimum1: number; // μmin1
  readonly minimum2: number; // μmin2
  readonly clusterDrop: number; // μ1, the extra drop near solid solubility
  readonly maximum: number; // μmax, lattice-limited mobility
  readonly referenceDensity: number; // Cr
  readonly clusterDensity: number; // Cs
  readonly alpha: number; // α
  readonly beta: number; // β
  readonly lowDensityCutoff: number; // Pc (0 for the donors)
}

/** Species with their own row in Masetti's Table I. */
export type MasettiSpecies = 'As' | 'P' | 'B';

/**
 * Masetti et al. (1983) Table I. All values from memory; the As and P rows
 * agree with a third-party quotation of Table I that was consulted, the B row
 * was not cross-checked. Validity: 300 K, 1e13…1e21 cm⁻³.
 */
// Layout kept: each species' row of Table I on two lines (mobilities, then densities and exponents), so the
// three rows compare at a glance; Prettier would put each parameter on a line of its own.
// prettier-ignore
export const MASETTI_TABLE: Readonly<Record<MasettiSpecies, { carrier: 'electron' | 'hole'; parameters: MasettiParameters }>> = {
  As: {
    carrier: 'electron',
    parameters: {
      minimum1: 52.2, minimum2: 52.2, clusterDrop: 43.4, maximum: 1417,
      referenceDensity: 9.68e16, clusterDensity: 3.43e20, alpha: 0.68, beta: 2.0, lowDensityCutoff: 0,
    },
  },
  P: {
    carrier: 'electron',
    parameters: {
      minimum1: 68.5, minimum2: 68.5, clusterDrop: 56.1, maximum: 1414,
      referenceDensity: 9.2e16, clusterDensity: 3.41e20, alpha: 0.711, beta: 1.98, lowDensityCutoff: 0,
    },
  },
  B: {
    carrier: 'hole',
    parameters: {
      minimum1: 44.9, minimum2: 0, clusterDrop: 29.0, maximum: 470.5,
      referenceDensity: 2.23e17, clusterDensity: 6.1e20, alpha: 0.719, beta: 2.0, lowDensityCutoff: 9.23e16,
    },
  },
};

/** Temperature at which Masetti's fits were made, K. */
export const MASETTI_REFERENCE_TEMPERATURE = 300;

/**
 * Masetti et al. (1983) mobility at 300 K.
 *
 * @param parameters - a row of MASETTI_TABLE
 * @param totalDensity - total impurity density N ≥ 0, cm⁻³
 * @returns μ in cm²/(V·s)
 * @example masettiMobility(MASETTI_TABLE.P.parameters, 1e16) // ≈ 1184
 */
export function masettiMobility(parameters: MasettiParameters, totalDensity: number): number {
  const p = parameters;
  // exp(−Pc/N) → 0 as N → 0 when Pc > 0; with Pc = 0 the factor is 1 (avoids 0/0 at N = 0).
  const cutoff = p.lowDensityCutoff > 0 ? Math.exp(-p.lowDensityCutoff / totalDensity) : 1;
  const impurityTerm = (p.maximum - p.minimum2) / (1 + Math.pow(totalDensity / p.referenceDensity, p.alpha));
  const clusterTerm = p.clusterDrop / (1 + Math.pow(p.clusterDensity / totalDensity, p.beta));
  return p.minimum1 * cutoff + impurityTerm - clusterTerm;
}
