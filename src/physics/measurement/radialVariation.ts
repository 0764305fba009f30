/**
 * Radial resistivity variation of a wafer from a centre reading and readings
 * near the edge (common practice, no source):
 *
 *   RV = (mean(ρ_edge) − ρ_centre) / ρ_centre × 100 %,
 *
 * signed: positive when the edge is more resistive than the centre. ASTM F81 /
 * SEMI MF81 specify where the readings are taken and state their own
 * computation; that text was not consulted, so this is not claimed to be
 * the standard's formula.
 */
import { PhysicsDomainError } from '../errors';

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(`${name} ${value} is not allowed: it must be a finite number greater than 0`);
  }
}

/**
 * Radial variation in percent of the centre value.
 *
 * @param centre - the centre reading (any positive quantity, e.g. Ω·cm)
 * @param edgeValues - one or more edge readings in the same unit
 * @returns (mean(edge) − centre)/centre × 100, in %
 * @example radialVariation(10, [10.5, 10.3, 10.4, 10.6]) // ≈ 4.5 %
 */
export function radialVariation(centre: number, edgeValues: readonly number[]): number {
  checkPositive('center', centre);
  if (edgeValues.length === 0) {
    throw new PhysicsDomainError('edge_values holds no values: give at least one edge reading');
  }
  edgeValues.forEach((value, index) => checkPositive(`edge value ${index + 1}`, value));
  const mean = edgeValues.reduce((sum, value) => sum + value, 0) / edgeValues.length;
  return ((mean - centre) / centre) * 100;
}
