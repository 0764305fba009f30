/**
 * Mobility models by code, the drift mobility used by transport, and the
 * (generalized) Einstein diffusivity.
 *
 * The models, their materials, defaults and equations are the entries of
 * registry.ts (MOBILITY_MODEL_REGISTRY); this module derives the code lists
 * and defaults from them and dispatches to each entry's compute (the one
 * dispatch for every material). Codes are
 * case-insensitive; a blank code means the sample material's default, except
 * for minority carriers in a material with a model marked for them
 * (defaultMobilityModelFor: silicon's klaassen, the one silicon model with
 * minority-carrier physics; the other silicon fits are majority-carrier fits
 * at the total impurity density N_D + N_A). A code without parameters for the
 * material is refused with a message naming the models it supports.
 *
 * Published vs free-carrier mobility: `mobility` returns each model as
 * published; `freeCarrierMobility` (and driftMobilities, which conductivity
 * uses) multiplies the majority-carrier value of the fits made against the
 * total dopant density (the silicon fits, `fittedTo: 'dopant-density'`) by
 * fullIonizationCorrection, so σ = q(nμn + pμp) with the solver's
 * incompletely ionized n, p reproduces the fits' 300 K resistivity. Fits made
 * against free-carrier mobilities (Ge, GaAs, 4H-SiC; materialFits.ts) are used
 * unchanged.
 */
import type { Carrier, Sample } from '../sample';
import { sampleDopants } from '../sample';
import { solveEquilibrium } from '../equilibrium';
import { einsteinDegeneracyFactor } from '../bands/einsteinRelation';
import { thermalVoltage } from '../constants';
import { PhysicsDomainError } from '../errors';
import { fullIonizationCorrection, netMajorityCarrier } from './fullIonizationCorrection';
import { MOBILITY_MODEL_REGISTRY, mobilityModelEntry, mobilityModelsOf, type MobilityModel } from './registry';
import { MATERIALS, SILICON, type Material } from '../materials';

export { MOBILITY_MODEL_REGISTRY, mobilityModelEntry, mobilityModelsOf, type MobilityModel, type MobilityFitBasis } from './registry';

/** Silicon's mobility model codes (silicon parameters only; see mobilityModelCodes); the first is silicon's default. */
export const MOBILITY_MODEL_CODES: readonly string[] = mobilityModelsOf(SILICON.code).map((model) => model.code);

/** A mobility model code. */
export type MobilityModelCode = string;

/** Silicon's default mobility model (other materials: defaultMobilityModel). */
export const DEFAULT_MOBILITY_MODEL: MobilityModelCode = MOBILITY_MODEL_CODES[0];

/** Every mobility model code of every material, in registry order: silicon's (MOBILITY_MODEL_CODES), then the material fits. */
export const ALL_MOBILITY_MODEL_CODES: readonly string[] = MOBILITY_MODEL_REGISTRY.map((model) => model.code);

/**
 * Mobility model codes with parameters for a material; the first is its default.
 *
 * @param material - host material
 * @returns the codes of its registry entries: silicon MOBILITY_MODEL_CODES; other hosts their own fits
 * @example mobilityModelCodes(GALLIUM_ARSENIDE) // → ['sotoodeh']
 */
export function mobilityModelCodes(material: Material): readonly string[] {
  return mobilityModelsOf(material.code).map((model) => model.code);
}

/**
 * The default mobility model of a material: the first registry entry that
 * lists the material.
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
  const hint = normalized === 'astm-f723' ? ` 'astm-f723' converts resistivity and dopant density directly and has no mobility;` : '';
  throw new PhysicsDomainError(`unknown mobility model '${code}'.${hint} Allowed: ${allowed.join(', ')}.`);
}

/** The registry entry of an already-parsed model code (resolveMobilityModel returns only registered codes). */
function entryOf(code: string): MobilityModel {
  const entry = mobilityModelEntry(code);
  if (entry === undefined) throw new Error(`mobility model '${code}' was parsed but has no registry entry`);
  return entry;
}

/** Fitted mobility for an already-parsed model code: the entry's compute. */
function fitted(model: string, carrier: Carrier, sample: Sample): number {
  return entryOf(model).compute(carrier, sample);
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

/**
 * The model a blank code chooses for minority carriers of a material: its
 * registry entry marked `minorityCarrierDefault` (silicon 'klaassen'), else
 * its default (the other materials have a single fit).
 *
 * @param material - host material
 * @returns a model code of that material
 * @example defaultMinorityMobilityModel(SILICON) // → 'klaassen'
 */
export function defaultMinorityMobilityModel(material: Material): string {
  const minority = mobilityModelsOf(material.code).find((model) => model.minorityCarrierDefault === true);
  return minority !== undefined ? minority.code : defaultMobilityModel(material);
}

/** Silicon's model with minority-carrier physics, which a blank code chooses for minority carriers. */
export const SILICON_MINORITY_MOBILITY_MODEL: MobilityModelCode = defaultMinorityMobilityModel(SILICON);

/** A named code parsed for the material, or the carrier's blank-code choice. */
function modelFor(model: string | undefined, carrier: Carrier, sample: Sample): string {
  if (model === undefined || model.trim() === '') return defaultMobilityModelFor(carrier, sample);
  return resolveMobilityModel(model, sample.material);
}

/**
 * The factor that turns the published mobility of a carrier into its
 * free-carrier drift mobility: fullIonizationCorrection (≈ N_net / n_eq at
 * 300 K) for the net-majority carrier under a fit made against the total
 * dopant density (the silicon models), 1 for minority carriers and for fits
 * made against free-carrier data (the material fits, materialFits.ts).
 */
function freeCarrierFactor(code: string, carrier: Carrier, sample: Sample): number {
  if (entryOf(code).fittedTo === 'free-carriers') return 1;
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
