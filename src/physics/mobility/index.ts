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
 * carriers use the same fit for their carrier type at that total density;
 * a blank code therefore chooses 'klaassen' for silicon minority carriers
 * (defaultMobilityModelFor).
 *
 * Published vs free-carrier mobility: `mobility` returns each model as
 * published; `freeCarrierMobility` (and driftMobilities, which conductivity
 * uses) multiplies the silicon fits' majority-carrier value by
 * fullIonizationCorrection, so σ = q(nμn + pμp) with the solver's
 * incompletely ionized n, p reproduces the fits' 300 K resistivity.
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
 * material fits describe free-carrier mobility, so their free-carrier
 * mobility is the published value (no full-ionization correction; see
 * materialFits.ts).
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
 * @example mobilityModelCodes(GALLIUM_ARSENIDE) // → ['sotoodeh']
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
 * @example defaultMobilityModel(SILICON) // → 'masetti'
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
 * @example resolveMobilityModel('ARORA') // → 'arora'
 * @example resolveMobilityModel('', GALLIUM_ARSENIDE) // → 'sotoodeh'
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
 * It assumes full ionization (freeCarrierMobility is the per-free-carrier form).
 * Equal to `mobility` for a named model; a blank code here is the material's
 * default for both carriers (no per-carrier choice).
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

/**
 * The model a blank code chooses for one carrier of a sample. A carrier that
 * is the sample's minority carrier (the type opposite to netMajorityCarrier,
 * so a counter-doped sample that changed type counts by its net doping) gets
 * the material's model with minority-carrier physics: 'klaassen' in silicon,
 * whose repulsive-impurity and electron–hole terms fit measured minority
 * mobilities (the other silicon fits are majority-carrier fits). Germanium,
 * GaAs and 4H-SiC have one fit each, used for both roles. Majority carriers,
 * and both carriers of an exactly compensated sample (no minority type), get
 * the material's default (defaultMobilityModel).
 *
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns the model code a blank model means for this carrier
 * @example defaultMobilityModelFor('electron', boron1e19At300K) // → 'klaassen'
 * @example defaultMobilityModelFor('hole', boron1e19At300K) // → 'masetti'
 */
export function defaultMobilityModelFor(carrier: Carrier, sample: Sample): string {
  const majority = netMajorityCarrier(sample);
  const isMinority = majority !== undefined && carrier !== majority;
  return isMinority ? defaultMinorityMobilityModel(sample.material) : defaultMobilityModel(sample.material);
}

/** Silicon's model with minority-carrier physics, which a blank code chooses for minority carriers. */
export const SILICON_MINORITY_MOBILITY_MODEL: MobilityModelCode = 'klaassen';

/**
 * The model a blank code chooses for minority carriers of a material:
 * silicon 'klaassen'; the other materials their single fit (their default).
 *
 * @param material - host material
 * @returns a model code of that material
 * @example defaultMinorityMobilityModel(SILICON) // → 'klaassen'
 */
export function defaultMinorityMobilityModel(material: Material): string {
  return material.code === SILICON.code ? SILICON_MINORITY_MOBILITY_MODEL : defaultMobilityModel(material);
}

/** A named code parsed for the material, or the carrier's blank-code choice. */
function modelFor(model: string | undefined, carrier: Carrier, sample: Sample): string {
  if (model === undefined || model.trim() === '') return defaultMobilityModelFor(carrier, sample);
  return resolveMobilityModel(model, sample.material);
}

/**
 * The factor that turns the published mobility of a carrier into its
 * free-carrier drift mobility: fullIonizationCorrection (≈ N_net / n_eq at
 * 300 K) for the net-majority carrier under a silicon model, 1 for minority
 * carriers and for the material fits (fitted to free-carrier data already,
 * materialFits.ts).
 */
function freeCarrierFactor(code: string, carrier: Carrier, sample: Sample): number {
  if (materialMobilityFit(code) !== undefined) return 1;
  return carrier === netMajorityCarrier(sample) ? fullIonizationCorrection(sample) : 1;
}

/**
 * Mobility of a carrier as the named model publishes it (DRIFT.MOBILITY):
 * the fit's conductivity mobility at the total impurity density, at the
 * sample's temperature. A blank model chooses per carrier
 * (defaultMobilityModelFor: 'klaassen' for silicon minority carriers).
 *
 * @param model - mobility model code (case-insensitive); '' for the carrier's default
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns μ in cm²/(V·s)
 * @example mobility('masetti', 'electron', arsenic1e18At300K) // ≈ 284 (Masetti et al. 1983, eq. 1)
 * @example mobility('', 'electron', boron1e19At300K) // ≈ 211 (klaassen, minority electrons)
 */
export function mobility(model: string, carrier: Carrier, sample: Sample): number {
  const code = modelFor(model, carrier, sample);
  return checked(fitted(code, carrier, sample), 'the mobility', carrier, sample);
}

/**
 * Mobility per free carrier (DRIFT.FREEMOBILITY): the published mobility of
 * `mobility` times freeCarrierFactor, so that with n, p from the equilibrium
 * solve σ = q(n·μn,free + p·μp,free) equals `conductivity` for the same named
 * model. The silicon fits were made as μ = σ/(qN) with every dopant counted
 * as ionized; per free carrier (n < N at 300 K) the same σ needs μ·N/n.
 * Equal to `mobility` for minority carriers and for the Ge, GaAs and 4H-SiC
 * fits. A blank model chooses per carrier as `mobility` does.
 *
 * @param model - mobility model code (case-insensitive); '' for the carrier's default
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns μ_free in cm²/(V·s)
 * @example freeCarrierMobility('masetti', 'hole', boron1e18At300K) // ≈ 210 (Masetti 160 × 1.31)
 */
export function freeCarrierMobility(model: string, carrier: Carrier, sample: Sample): number {
  const code = modelFor(model, carrier, sample);
  return checked(fitted(code, carrier, sample) * freeCarrierFactor(code, carrier, sample), 'the free-carrier mobility', carrier, sample);
}

/** Free-carrier drift mobilities of both carriers under one model. */
export interface DriftMobilities {
  readonly electron: number;
  readonly hole: number;
}

/**
 * Free-carrier mobilities of electrons and holes under one model, as
 * conductivity and the saturating current density use them: both carriers
 * take the same model (a blank code is the material's default for both,
 * unlike `mobility`'s per-carrier choice), each value equal to
 * freeCarrierMobility for that model.
 *
 * @param model - mobility model code (case-insensitive); '' for the material's default
 * @param sample - the sample
 * @returns { electron, hole } in cm²/(V·s)
 * @example driftMobilities('masetti', phosphorus1e18At300K) // → { electron: ≈ 343, hole: ≈ 160 } (electrons: Masetti 277 × 1.24)
 */
export function driftMobilities(model: string, sample: Sample): DriftMobilities {
  const code = resolveMobilityModel(model, sample.material);
  const drift = (carrier: Carrier): number =>
    checked(fitted(code, carrier, sample) * freeCarrierFactor(code, carrier, sample), 'the free-carrier mobility', carrier, sample);
  return { electron: drift('electron'), hole: drift('hole') };
}

/**
 * Diffusivity from the generalized Einstein relation
 * D = μ·(kT/q)·F½(η)/F−½(η), η the carrier's reduced Fermi level relative to
 * its band edge in the sample's equilibrium (Fermi–Dirac statistics, parabolic
 * bands; bands/einsteinRelation.ts), with μ the published mobility of `mobility`
 * (a blank model chooses per carrier as there).
 * It is μ·kT/q for non-degenerate carriers (factor 1 + e^η/2^{3/2}) and larger
 * in degenerate material (about 2.1 for electrons in 1e20 cm⁻³ P-doped Si at 300 K).
 *
 * @param model - mobility model code (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param sample - the sample
 * @returns D in cm²/s
 * @example diffusivity('masetti', 'electron', phosphorus1e16At300K) // ≈ 30.6
 */
export function diffusivity(model: string, carrier: Carrier, sample: Sample): number {
  const drift = mobility(model, carrier, sample);
  const state = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
  const degeneracy = einsteinDegeneracyFactor(sample.material, sample.temperature, carrier, state.fermiLevel);
  return drift * thermalVoltage(sample.temperature) * degeneracy;
}
