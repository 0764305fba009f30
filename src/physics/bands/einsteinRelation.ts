/**
 * The degeneracy factor of the generalized Einstein relation,
 *
 *   D = μ·(kT/q)·F½(η)/F−½(η),
 *
 * η the carrier's reduced Fermi level relative to its band edge
 * (η = (Ef − Ec)/kT for electrons, (Ev − Ef)/kT for holes), for parabolic
 * bands and Fermi–Dirac statistics. It follows from D = (μ/q)·n/(dn/dEf) with
 * n = Nc·F½(η) and dF½/dη = F−½ (e.g. S. M. Sze & K. K. Ng, Physics of
 * Semiconductor Devices, 3rd ed., Wiley 2007, ch. 1; from memory). The factor
 * is 1 in the Boltzmann limit (≈ 1 + e^η/2^{3/2} for η ≪ 0 from the first two
 * series terms, exactly 1 to rounding for η ≲ −38) and grows like (2/3)·η for η ≫ 0.
 */

import { thermalVoltage } from '../constants';
import type { Material } from '../materials/types';
import { bandEdges } from './bandEdges';
import { fermiDiracHalf, fermiDiracMinusHalf, fermiDiracOverBoltzmann } from './fermiDirac';

/**
 * F½(η)/F−½(η) for one reduced band Fermi level, exact to rounding at both
 * ends (ratio of the Boltzmann-scaled forms for η ≤ 0, so it is exactly 1 deep in the non-degenerate regime).
 *
 * @param bandFermiLevel η, dimensionless
 * @returns the factor, ≥ 1
 * @example einsteinDegeneracyRatio(0) // ≈ 1.2649
 */
export function einsteinDegeneracyRatio(bandFermiLevel: number): number {
  if (bandFermiLevel <= 0) {
    return fermiDiracOverBoltzmann(0.5, bandFermiLevel) / fermiDiracOverBoltzmann(-0.5, bandFermiLevel);
  }
  return fermiDiracHalf(bandFermiLevel) / fermiDiracMinusHalf(bandFermiLevel);
}

/**
 * The degeneracy factor F½(η)/F−½(η) of a carrier for a given equilibrium Fermi level.
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @param carrier 'electron' or 'hole'
 * @param fermiLevel Ef − Ei in eV, as solveEquilibrium reports it
 * @param intrinsicModel ni model code used for that Fermi level (default: the material's first)
 * @returns dimensionless factor ≥ 1 multiplying μ·kT/q
 * @example einsteinDegeneracyFactor(SILICON, 300, 'electron', 0.35) // ≈ 1 (non-degenerate n-type)
 */
export function einsteinDegeneracyFactor(
  material: Material,
  temperature: number,
  carrier: 'electron' | 'hole',
  fermiLevel: number,
  intrinsicModel?: string,
): number {
  const edges = bandEdges(material, temperature, intrinsicModel);
  const eta = fermiLevel / thermalVoltage(temperature);
  const bandFermiLevel = carrier === 'electron' ? eta - edges.conductionEdge : -eta - edges.valenceEdge;
  return einsteinDegeneracyRatio(bandFermiLevel);
}
