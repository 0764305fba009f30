/**
 * Mobility models by code, the drift mobility used by transport, and the
 * Einstein diffusivity.
 *
 * Codes (case-insensitive; the first is the default):
 * - 'masetti': Masetti et al. (1983), dopant-specific, at 300 K; away from
 *   300 K multiplied by Arora's temperature ratio μ_Arora(N,T)/μ_Arora(N,300 K)
 *   (Arora et al. 1982, fitted 250–500 K; extrapolated outside).
 * - 'arora': Arora et al. (1982) with its own temperature dependence.
 * - 'caughey-thomas': Caughey & Thomas (1967) at 300 K, carried to other
 *   temperatures by the same Arora ratio as 'masetti' (the 1967 fit has none).
 *
 * All fits take the total impurity density N = N_D + N_A of the sample
 * (common practice for compensated material, no source). Minority carriers use
 * the same fit for their carrier type at that total density (Klaassen's
 * minority-carrier model is not implemented yet).
 *
 * Masetti species: electrons use the named dopant's own row when it is a donor
 * (dopant.mobilitySpecies, 'As' or 'P'), otherwise the P row; holes always use
 * the B row (Masetti gives no other hole row).
 */
import type { Carrier, Sample } from '../sample';
import { totalImpurityDensity } from '../sample';
import { thermalVoltage } from '../constants';
import { PhysicsDomainError } from '../errors';
import { MASETTI_TABLE, masettiMobility, type MasettiSpecies } from './masetti';
import { aroraMobility, aroraTemperatureRatio } from './arora';
import { caugheyThomasMobility } from './caugheyThomas';
import { fullIonizationCorrection, netMajorityCarrier } from './fullIonizationCorrection';

/** Mobility model codes; the first is the default. */
export const MOBILITY_MODEL_CODES = ['masetti', 'arora', 'caughey-thomas'] as const;

/** A mobility model code. */
export type MobilityModelCode = (typeof MOBILITY_MODEL_CODES)[number];

/** The default mobility model. */
export const DEFAULT_MOBILITY_MODEL: MobilityModelCode = MOBILITY_MODEL_CODES[0];

/**
 * Parses a mobility model code, case-insensitively.
 *
 * @param code - e.g. 'Masetti'; undefined or '' selects the default
 * @returns the model code
 * @throws PhysicsDomainError listing the allowed codes
 * @example resolveMobilityModel('ARORA') // 'arora'
 */
export function resolveMobilityModel(code?: string): MobilityModelCode {
  if (code === undefined || code.trim() === '') return DEFAULT_MOBILITY_MODEL;
  const normalized = code.trim().toLowerCase();
  const found = MOBILITY_MODEL_CODES.find((m) => m === normalized);
  if (found !== undefined) return found;
  const hint =
    normalized === 'astm-f723'
      ? ` 'astm-f723' converts resistivity and dopant density directly and has no mobility;`
      : '';
  throw new PhysicsDomainError(
    `unknown mobility model '${code}'.${hint} Allowed: ${MOBILITY_MODEL_CODES.join(', ')}.`,
  );
}

/** Masetti row for a carrier in a sample (see the module comment). */
function masettiSpecies(carrier: Carrier, sample: Sample): MasettiSpecies {
  if (carrier === 'hole') return 'B';
  const own = sample.dopant.mobilitySpecies;
  return sample.dopant.kind === 'donor' && (own === 'As' || own === 'P') ? own : 'P';
}

/** Fitted mobility for an already-parsed model code. */
function fitted(model: MobilityModelCode, carrier: Carrier, sample: Sample): number {
  const density = totalImpurityDensity(sample);
  const temperature = sample.temperature;
  switch (model) {
    case 'masetti': {
      const row = MASETTI_TABLE[masettiSpecies(carrier, sample)].parameters;
      return masettiMobility(row, density) * aroraTemperatureRatio(carrier, density, temperature);
    }
    case 'arora':
      return aroraMobility(carrier, density, temperature);
    case 'caughey-thomas':
      return caugheyThomasMobility(carrier, density) * aroraTemperatureRatio(carrier, density, temperature);
  }
}

/** Guards every value leaving this module: a mobility must be finite and positive. */
function checked(value: number, what: string, carrier: Carrier, sample: Sample): number {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new PhysicsDomainError(
      `${what} of ${carrier}s is not defined for ${sample.dopant.symbol} at ${sample.density} cm⁻³ ` +
        `(counter-doping ${sample.counterDensity} cm⁻³) and ${sample.temperature} K (got ${value}).`,
    );
  }
  return value;
}

/**
 * The published fit value: conductivity mobility vs total impurity density
 * N = density + counterDensity, at the sample's temperature (for 'masetti' and
 * 'caughey-thomas' via Arora's temperature ratio, see the module comment).
 * It assumes full ionization; use `mobility` for transport.
 *
 * @param model - mobility model code (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns μ_fit in cm²/(V·s)
 * @example fitMobility('masetti', 'electron', phosphorus1e16At300K) // ≈ 1184
 */
export function fitMobility(model: string, carrier: Carrier, sample: Sample): number {
  const code = resolveMobilityModel(model);
  return checked(fitted(code, carrier, sample), 'the fitted mobility', carrier, sample);
}

/** Drift mobilities of both carriers, sharing one 300 K reference solve. */
export interface DriftMobilities {
  readonly electron: number;
  readonly hole: number;
}

/**
 * Drift mobilities of electrons and holes in a sample: the fit for each
 * carrier, with the net-majority carrier's fit multiplied by
 * fullIonizationCorrection (≈ N_net / n_eq at 300 K). This is the single place
 * both `mobility` and `conductivity` take their mobilities from, so
 * σ = q(nμn + pμp) holds exactly with μ from `mobility`.
 *
 * @param model - mobility model code (case-insensitive)
 * @param sample - the sample
 * @returns { electron, hole } in cm²/(V·s)
 * @example driftMobilities('masetti', phosphorus1e18At300K) // { electron: ≈ 343 (277 × 1.24), hole: ≈ 160 }
 */
export function driftMobilities(model: string, sample: Sample): DriftMobilities {
  const code = resolveMobilityModel(model);
  const majority = netMajorityCarrier(sample);
  const correction = majority === undefined ? 1 : fullIonizationCorrection(sample);
  const drift = (carrier: Carrier): number => {
    const fit = fitted(code, carrier, sample);
    return checked(carrier === majority ? fit * correction : fit, 'the drift mobility', carrier, sample);
  };
  return { electron: drift('electron'), hole: drift('hole') };
}

/**
 * Drift mobility of free carriers, used everywhere in transport: the fit
 * times ≈ N_net / n_eq(300 K) for the net-majority carrier, the fit unchanged
 * for the other (see fullIonizationCorrection for why).
 *
 * @param model - mobility model code (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns μ in cm²/(V·s)
 * @example mobility('masetti', 'hole', boron1e18At300K) // ≈ 210 (fit 160 × 1.31)
 */
export function mobility(model: string, carrier: Carrier, sample: Sample): number {
  return driftMobilities(model, sample)[carrier];
}

/**
 * Diffusivity from the Einstein relation D = μ·kT/q (non-degenerate
 * statistics), with μ the drift mobility of `mobility`.
 *
 * @param model - mobility model code (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns D in cm²/s
 * @example diffusivity('masetti', 'electron', phosphorus1e16At300K) // ≈ 30.7
 */
export function diffusivity(model: string, carrier: Carrier, sample: Sample): number {
  return mobility(model, carrier, sample) * thermalVoltage(sample.temperature);
}
