/**
 * Mobility models by code, the drift mobility used by transport, and the
 * (generalized) Einstein diffusivity.
 *
 * Codes (case-insensitive; the first is the default):
 * - 'masetti': Masetti et al. (1983), dopant-specific, at 300 K; away from
 *   300 K multiplied by Arora's temperature ratio μ_Arora(N,T)/μ_Arora(N,300 K)
 *   (Arora et al. 1982, fitted 250–500 K; extrapolated outside).
 * - 'arora': Arora et al. (1982) with its own temperature dependence.
 * - 'caughey-thomas': Caughey & Thomas (1967) at 300 K, carried to other
 *   temperatures by the same Arora ratio as 'masetti' (the 1967 fit has none).
 * - 'klaassen': Klaassen (1992), one model for majority and minority carriers
 *   with its own temperature dependence; takes N_D, N_A and n, p separately
 *   (klaassen.ts).
 *
 * The other fits take the total impurity density N = N_D + N_A of the sample
 * (common practice for compensated material, no source). With them minority
 * carriers use the same fit for their carrier type at that total density.
 *
 * Masetti species: electrons use the named dopant's own row when it is a donor
 * (dopant.mobilitySpecies, 'As' or 'P'), otherwise the P row; holes always use
 * the B row (Masetti gives no other hole row).
 *
 * Materials: the models above have silicon parameters only. Ge, GaAs and
 * 4H-SiC have their own fits (materialFits.ts: 'hilsum', 'sotoodeh',
 * 'roschke-schwierz'), each the default of its material; a blank code means
 * the sample material's default, and a code without parameters for the
 * material is refused with a message naming the models it supports. The
 * material fits describe free-carrier mobility and are used unchanged (no
 * full-ionization correction; see materialFits.ts).
 */
import type { Carrier, Sample } from '../sample';
import { sampleDopants, totalImpurityDensity } from '../sample';
import { solveEquilibrium } from '../equilibrium';
import { einsteinDegeneracyFactor } from '../bands/einsteinRelation';
import { thermalVoltage } from '../constants';
import { PhysicsDomainError } from '../errors';
import { MASETTI_TABLE, masettiMobility, type MasettiSpecies } from './masetti';
import { aroraMobility, aroraTemperatureRatio } from './arora';
import { caugheyThomasMobility } from './caugheyThomas';
import { klaassenSampleMobility } from './klaassen';
import { fullIonizationCorrection, netMajorityCarrier } from './fullIonizationCorrection';
import { MATERIAL_MOBILITY_FIT_CODES, materialFitMobility, materialMobilityFit, mobilityFitsFor } from './materialFits';
import { MATERIALS, SILICON, type Material } from '../materials';

/** Silicon's mobility model codes (silicon parameters only; see mobilityModelCodes); the first is silicon's default. */
export const MOBILITY_MODEL_CODES = ['masetti', 'arora', 'caughey-thomas', 'klaassen'] as const;

/** A mobility model code. */
export type MobilityModelCode = (typeof MOBILITY_MODEL_CODES)[number];

/** Silicon's default mobility model (other materials: defaultMobilityModel). */
export const DEFAULT_MOBILITY_MODEL: MobilityModelCode = MOBILITY_MODEL_CODES[0];

/** Every mobility model code of every material: silicon's (MOBILITY_MODEL_CODES), then the material fits. */
export const ALL_MOBILITY_MODEL_CODES: readonly string[] = [...MOBILITY_MODEL_CODES, ...MATERIAL_MOBILITY_FIT_CODES];

/**
 * Mobility model codes with parameters for a material; the first is its default.
 *
 * @param material - host material
 * @returns silicon: MOBILITY_MODEL_CODES; other hosts: their own fits
 * @example mobilityModelCodes(GALLIUM_ARSENIDE) // ['sotoodeh']
 */
export function mobilityModelCodes(material: Material): readonly string[] {
  const own = mobilityFitsFor(material.code).map((fit) => fit.code);
  return material.code === SILICON.code ? [...MOBILITY_MODEL_CODES, ...own] : own;
}

/**
 * The default mobility model of a material: Si 'masetti', Ge 'hilsum',
 * GaAs 'sotoodeh', 4H-SiC 'roschke-schwierz'.
 *
 * @param material - host material
 * @returns its default model code
 * @example defaultMobilityModel(SILICON) // 'masetti'
 */
export function defaultMobilityModel(material: Material): string {
  return mobilityModelCodes(material)[0];
}

/**
 * Names of the materials that have parameters for a model code, for messages.
 *
 * @param code - canonical model code
 * @returns e.g. 'silicon' for 'masetti'
 */
export function materialsWithMobilityModel(code: string): string {
  return MATERIALS.filter((material) => mobilityModelCodes(material).includes(code))
    .map((material) => material.name)
    .join(', ');
}

/**
 * Parses a mobility model code, case-insensitively, for a material.
 *
 * @param code - e.g. 'Masetti'; undefined or '' selects the material's default
 * @param material - host material (default silicon)
 * @returns the model code
 * @throws PhysicsDomainError listing the codes the material supports, for an
 *   unknown code or one without parameters for the material
 * @example resolveMobilityModel('ARORA') // 'arora'
 * @example resolveMobilityModel('', GALLIUM_ARSENIDE) // 'sotoodeh'
 */
export function resolveMobilityModel(code?: string, material: Material = SILICON): string {
  if (code === undefined || code.trim() === '') return defaultMobilityModel(material);
  const normalized = code.trim().toLowerCase();
  const allowed = mobilityModelCodes(material);
  const found = allowed.find((m) => m === normalized);
  if (found !== undefined) return found;
  if (ALL_MOBILITY_MODEL_CODES.includes(normalized)) {
    throw new PhysicsDomainError(
      `mobility model '${normalized}' has parameters for ${materialsWithMobilityModel(normalized)} only; ` +
        `${material.name} supports: ${allowed.join(', ')}.`,
    );
  }
  const hint =
    normalized === 'astm-f723'
      ? ` 'astm-f723' converts resistivity and dopant density directly and has no mobility;`
      : '';
  throw new PhysicsDomainError(
    `unknown mobility model '${code}'.${hint} Allowed: ${allowed.join(', ')}.`,
  );
}

/** Masetti row for a carrier in a sample (see the module comment). */
function masettiSpecies(carrier: Carrier, sample: Sample): MasettiSpecies {
  if (carrier === 'hole') return 'B';
  const own = sample.dopant.mobilitySpecies;
  return sample.dopant.kind === 'donor' && (own === 'As' || own === 'P') ? own : 'P';
}

/** Fitted mobility for an already-parsed model code. */
function fitted(model: string, carrier: Carrier, sample: Sample): number {
  const density = totalImpurityDensity(sample);
  const temperature = sample.temperature;
  const materialFit = materialMobilityFit(model);
  if (materialFit !== undefined) return materialFitMobility(materialFit, carrier, density, temperature);
  switch (model as MobilityModelCode) {
    case 'masetti': {
      const row = MASETTI_TABLE[masettiSpecies(carrier, sample)].parameters;
      return masettiMobility(row, density) * aroraTemperatureRatio(carrier, density, temperature);
    }
    case 'arora':
      return aroraMobility(carrier, density, temperature);
    case 'caughey-thomas':
      return caugheyThomasMobility(carrier, density) * aroraTemperatureRatio(carrier, density, temperature);
    case 'klaassen':
      return klaassenSampleMobility(carrier, sample);
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
  const code = resolveMobilityModel(model, sample.material);
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
  const code = resolveMobilityModel(model, sample.material);
  const majority = netMajorityCarrier(sample);
  // Material fits describe free carriers already (materialFits.ts): no correction.
  const corrected = majority !== undefined && materialMobilityFit(code) === undefined;
  const correction = corrected ? fullIonizationCorrection(sample) : 1;
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
 * Diffusivity from the generalized Einstein relation
 * D = μ·(kT/q)·F½(η)/F−½(η), η the carrier's reduced Fermi level relative to
 * its band edge in the sample's equilibrium (Fermi–Dirac statistics, parabolic
 * bands; bands/einsteinRelation.ts), with μ the drift mobility of `mobility`.
 * It is μ·kT/q for non-degenerate carriers (factor 1 + e^η/2^{3/2}) and larger
 * in degenerate material (about 2.1 for electrons in 1e20 cm⁻³ P-doped Si at 300 K).
 *
 * @param model - mobility model code (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns D in cm²/s
 * @example diffusivity('masetti', 'electron', phosphorus1e16At300K) // ≈ 30.7
 */
export function diffusivity(model: string, carrier: Carrier, sample: Sample): number {
  const drift = mobility(model, carrier, sample);
  const state = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const degeneracy = einsteinDegeneracyFactor(sample.material, sample.temperature, carrier, state.fermiLevel);
  return drift * thermalVoltage(sample.temperature) * degeneracy;
}
