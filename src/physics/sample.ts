/**
 * A uniformly doped sample as the transport functions see it: one named dopant
 * plus optional counter-doping by the generic dopant of the opposite type.
 */
import type { Material } from './materials';
import { genericDopant, type Dopant } from './dopants';
import type { DopantDensity } from './equilibrium';
import { PhysicsDomainError } from './errors';

/** A single-dopant sample with optional counter-doping of the opposite generic type. */
export interface Sample {
  /** Host material. */
  material: Material;
  /** Temperature, K. */
  temperature: number;
  /** The named dopant. */
  dopant: Dopant;
  /** Total (chemical) density of the named dopant, cm⁻³, ≥ 0. */
  density: number;
  /** Density of the generic opposite-type dopant, cm⁻³, ≥ 0 (0 = none). */
  counterDensity: number;
}

/** A carrier type. */
export type Carrier = 'electron' | 'hole';

/** A carrier as users name it: by role relative to the named dopant, or by type. */
export type CarrierRole = 'majority' | 'minority' | 'electron' | 'hole';

/** Roles in the order they are listed in messages. */
export const CARRIER_ROLES: readonly CarrierRole[] = ['majority', 'minority', 'electron', 'hole'];

/**
 * The dopants of a sample as the equilibrium solver takes them: the named
 * dopant and, when counterDensity > 0, the generic dopant of the opposite kind
 * (genericDopant of the material).
 *
 * @param sample - the sample
 * @returns one or two dopant densities, cm⁻³
 * @example
 * const compensated = { ...boron1e16At300K, counterDensity: 1e15 };
 * sampleDopants(compensated).map((d) => d.dopant.symbol) // → ['B', 'donor'] (boron and the generic donor)
 */
export function sampleDopants(sample: Sample): DopantDensity[] {
  const dopants: DopantDensity[] = [{ dopant: sample.dopant, density: sample.density }];
  if (sample.counterDensity > 0) {
    const oppositeKind = sample.dopant.kind === 'donor' ? 'acceptor' : 'donor';
    dopants.push({ dopant: genericDopant(sample.material, oppositeKind), density: sample.counterDensity });
  }
  return dopants;
}

/** The carrier type a dopant supplies: electrons for donors, holes for acceptors. */
export function suppliedCarrier(dopant: Dopant): Carrier {
  return dopant.kind === 'donor' ? 'electron' : 'hole';
}

/** The other carrier type. */
export function otherCarrier(carrier: Carrier): Carrier {
  return carrier === 'electron' ? 'hole' : 'electron';
}

/**
 * Carrier type for a role. 'majority' is the carrier type the named dopant
 * supplies (electrons for donors, holes for acceptors), even when
 * counter-doping outweighs it; 'minority' is the other type.
 *
 * @param dopant - the sample's named dopant
 * @param role - 'majority' | 'minority' | 'electron' | 'hole'
 * @returns 'electron' or 'hole'
 * @example carrierFor(boron, 'majority') // → 'hole'
 */
export function carrierFor(dopant: Dopant, role: CarrierRole): Carrier {
  switch (role) {
    case 'majority':
      return suppliedCarrier(dopant);
    case 'minority':
      return otherCarrier(suppliedCarrier(dopant));
    case 'electron':
    case 'hole':
      return role;
  }
  throw new PhysicsDomainError(`unknown carrier '${String(role)}'. Allowed: ${CARRIER_ROLES.join(', ')}.`);
}

/**
 * Parses a carrier role code, case-insensitively.
 *
 * @param code - e.g. 'Majority', 'hole'
 * @returns the role
 * @throws PhysicsDomainError listing the allowed roles
 * @example resolveCarrierRole('MINORITY') // → 'minority'
 */
export function resolveCarrierRole(code: string): CarrierRole {
  const normalized = code.trim().toLowerCase();
  const role = CARRIER_ROLES.find((r) => r === normalized);
  if (role === undefined) {
    throw new PhysicsDomainError(`unknown carrier '${code}'. Allowed: ${CARRIER_ROLES.join(', ')}.`);
  }
  return role;
}

/** Total impurity density N_D + N_A of the sample, cm⁻³: what the mobility fits take. */
export function totalImpurityDensity(sample: Sample): number {
  return sample.density + sample.counterDensity;
}
