/**
 * The band-edge description the equilibrium solver and the carrier statistics
 * work with: everything in logarithms and in units of kT, referred to the
 * intrinsic level Ei of the selected ni model.
 *
 * Consistency by construction: Ec − Ei = kT·ln(Nc/ni) and Ei − Ev = kT·ln(Nv/ni),
 * so the gap the solver uses is the one implied by Nc, Nv and the selected ni
 * model (not Eg(T) of the gap fit), and with Boltzmann statistics n·p = ni²
 * holds for exactly that ni.
 */

import type { Material } from '../materials/types';
import { logConductionBandDensity, logValenceBandDensity } from './densityOfStates';
import { logIntrinsicDensity } from './intrinsicDensity';

export interface BandEdges {
  /** ln ni, ni in cm⁻³. */
  readonly logIntrinsicDensity: number;
  /** ln Nc, Nc in cm⁻³. */
  readonly logConductionDensity: number;
  /** ln Nv, Nv in cm⁻³. */
  readonly logValenceDensity: number;
  /** (Ec − Ei)/kT = ln(Nc/ni). */
  readonly conductionEdge: number;
  /** (Ei − Ev)/kT = ln(Nv/ni). */
  readonly valenceEdge: number;
}

/**
 * Band edges at one temperature for one ni model.
 *
 * @param material host material
 * @param temperature K, inside the material's temperature domain
 * @param intrinsicModel ni model code (default: the material's first)
 * @returns log densities and reduced edge positions relative to Ei
 * @example bandEdges(SILICON, 300).conductionEdge // ≈ 21.8 (Ec − Ei ≈ 0.564 eV)
 */
export function bandEdges(material: Material, temperature: number, intrinsicModel?: string): BandEdges {
  const logNi = logIntrinsicDensity(material, temperature, intrinsicModel);
  const logNc = logConductionBandDensity(material, temperature);
  const logNv = logValenceBandDensity(material, temperature);
  return {
    logIntrinsicDensity: logNi,
    logConductionDensity: logNc,
    logValenceDensity: logNv,
    conductionEdge: logNc - logNi,
    valenceEdge: logNv - logNi,
  };
}
