/**
 * Apparent bandgap narrowing (BGN) of heavily doped silicon and the effective
 * intrinsic density ni_eff = ni·exp(ΔEg/2kT).
 *
 * "Apparent" BGN is what electrical measurements (the minority-carrier
 * product n0·p0 of bipolar transistors and solar cells) give when they are
 * analysed with Boltzmann statistics: n0·p0 = ni_eff². It lumps the true gap
 * shrinkage and the degeneracy of the majority carriers into one number, so it
 * belongs with Boltzmann statistics and the measured ni, not with a
 * Fermi–Dirac solve (that would count degeneracy twice). The equilibrium
 * solver therefore does NOT use it: it solves with Fermi–Dirac statistics on
 * the undoped band edges; BGN is reported on its own (DRIFT.NIEFF), and the
 * minority density in heavily doped material is about ni_eff²/majority.
 *
 * Both models have the form of Slotboom & de Graaff,
 *
 *   ΔEg = E0·[ln(N/Nref) + sqrt(ln²(N/Nref) + C)],
 *
 * N the dopant density (donor or acceptor alike: the 1992 fit is unified for
 * n- and p-type). ΔEg → 0 smoothly for N ≪ Nref and grows like 2·E0·ln(N/Nref)
 * for N ≫ Nref. ΔEg is taken as independent of temperature, as both papers
 * give it; using it away from room temperature is an assumption.
 */

import { thermalVoltage } from '../constants';
import { PhysicsDomainError } from '../errors';
import { SILICON } from '../materials/silicon';
import type { Material } from '../materials/types';
import { logIntrinsicDensity } from './intrinsicDensity';
import { checkDopantDensity } from '../ionization';
import type { ModelLocation } from '../modelInfo';
import { parameterText as t } from '../parameterText';

/** One apparent-BGN parameter set, with its source and where it lives. */
export interface ApparentBandgapNarrowingModel extends ModelLocation {
  /** Code as users type it (lower case). */
  readonly code: string;
  readonly name: string;
  /** Material code the parameters belong to. */
  readonly materialCode: string;
  /** E0, eV. */
  readonly energy: number;
  /** Nref, cm⁻³. */
  readonly referenceDensity: number;
  /** C, dimensionless. */
  readonly constant: number;
  readonly citation: string;
  readonly validity: string;
  readonly notes: string;
}

/** The three fitted values of a BGN parameter set. */
type BandgapNarrowingParameters = Pick<ApparentBandgapNarrowingModel, 'energy' | 'referenceDensity' | 'constant'>;

/**
 * A parameter set's values as its citation quotes them, written from the set.
 *
 * @param parameters - E0 (eV), Nref (cm⁻³), C
 * @returns e.g. 'E0 = 6.92 meV, Nref = 1.3e17 cm⁻³, C = 0.5'
 */
function bandgapNarrowingText(parameters: BandgapNarrowingParameters): string {
  return `E0 = ${t(parameters.energy * 1000)} meV, Nref = ${t(parameters.referenceDensity)} cm⁻³, C = ${t(parameters.constant)}`;
}

/** Klaassen, Slotboom & de Graaff (1992) values (from memory). */
const KLAASSEN_BGN_PARAMETERS = { energy: 6.92e-3, referenceDensity: 1.3e17, constant: 0.5 } as const;

/** Slotboom & de Graaff (1976) values (from memory). */
const SLOTBOOM_1976_PARAMETERS = { energy: 9e-3, referenceDensity: 1e17, constant: 0.5 } as const;

/**
 * Klaassen, Slotboom & de Graaff (1992): the 1976 form refitted to n- and
 * p-type data together, re-evaluated with the newer ni (about 1e10 cm⁻³ at
 * 300 K instead of the 1.45e10 used before; from memory). Default.
 */
export const KLAASSEN_BGN: ApparentBandgapNarrowingModel = {
  code: 'klaassen-bgn',
  name: 'Klaassen, Slotboom & de Graaff (1992) unified apparent bandgap narrowing (default)',
  materialCode: 'Si',
  ...KLAASSEN_BGN_PARAMETERS,
  citation:
    'D. B. M. Klaassen, J. W. Slotboom, H. C. de Graaff, "Unified apparent bandgap narrowing in n- and p-type ' +
    `silicon", Solid-State Electron. 35, 125 (1992); ${bandgapNarrowingText(KLAASSEN_BGN_PARAMETERS)} (from memory)`,
  validity:
    'silicon, n- and p-type, dopant density about 1e17–1e20 cm⁻³ near 300 K; meant for use with ni = 9.65e9–1e10 cm⁻³ ' +
    'at 300 K and Boltzmann statistics (n0·p0 = ni_eff²)',
  notes:
    'Apparent BGN (includes majority-carrier degeneracy); reported by DRIFT.NIEFF only, not used in the ' +
    'Fermi–Dirac equilibrium solve. Taken as temperature-independent (assumption away from 300 K).',
  equation: 'src/physics/bands/bandgapNarrowing.ts',
  parameterTable: 'src/physics/bands/bandgapNarrowing.ts',
  tests: ['tests/physics/bands/bandgapNarrowing.test.ts'],
};

/** Slotboom & de Graaff (1976), the original parameters of the form. */
export const SLOTBOOM_1976_BGN: ApparentBandgapNarrowingModel = {
  code: 'slotboom-1976',
  name: 'Slotboom & de Graaff (1976) apparent bandgap narrowing',
  materialCode: 'Si',
  ...SLOTBOOM_1976_PARAMETERS,
  citation:
    'J. W. Slotboom, H. C. de Graaff, "Measurements of bandgap narrowing in Si bipolar transistors", ' +
    `Solid-State Electron. 19, 857 (1976); ${bandgapNarrowingText(SLOTBOOM_1976_PARAMETERS)} (from memory)`,
  validity:
    'silicon, dopant density about 1e17–1e20 cm⁻³, measured on transistor bases near room temperature; ' +
    'evaluated with the older ni ≈ 1.45e10 cm⁻³ at 300 K (from memory), so with today’s ni it overstates ΔEg; ' +
    'superseded by klaassen-bgn',
  notes:
    'Commonly applied to both doping types (common practice, no source). Apparent BGN; reported by DRIFT.NIEFF only, ' +
    'not used in the equilibrium solve; taken as temperature-independent (assumption away from 300 K).',
  equation: 'src/physics/bands/bandgapNarrowing.ts',
  parameterTable: 'src/physics/bands/bandgapNarrowing.ts',
  tests: ['tests/physics/bands/bandgapNarrowing.test.ts'],
};

/** Every BGN model; the first is the default. */
export const BANDGAP_NARROWING_MODELS: readonly ApparentBandgapNarrowingModel[] = [KLAASSEN_BGN, SLOTBOOM_1976_BGN];

/** BGN model codes; the first ('klaassen-bgn') is the default. */
export const BANDGAP_NARROWING_MODEL_CODES: readonly string[] = BANDGAP_NARROWING_MODELS.map((model) => model.code);

/**
 * Finds a BGN model for a material: case-insensitive, blank or undefined means the default.
 *
 * @param material host material (only silicon has BGN parameters)
 * @param code model code such as 'Klaassen-BGN', or undefined
 * @returns the parameter set
 * @throws PhysicsDomainError for a material without BGN parameters (naming silicon) or an unknown code
 * @example resolveBandgapNarrowingModel(SILICON, 'slotboom-1976').energy // → 0.009
 */
export function resolveBandgapNarrowingModel(material: Material, code?: string): ApparentBandgapNarrowingModel {
  const own = BANDGAP_NARROWING_MODELS.filter((model) => model.materialCode === material.code);
  if (own.length === 0) {
    throw new PhysicsDomainError(
      `bandgap narrowing models have parameters for ${SILICON.name} (${SILICON.code}) only; ` +
        `${material.name} (${material.code}) is not supported`,
    );
  }
  if (code === undefined || String(code).trim() === '') return own[0];
  const wanted = String(code).trim().toLowerCase();
  const found = own.find((model) => model.code === wanted);
  if (found === undefined) {
    throw new PhysicsDomainError(
      `unknown bandgap narrowing model '${code}' for ${material.name}: allowed models are ${own.map((m) => m.code).join(', ')}`,
    );
  }
  return found;
}

/**
 * Apparent bandgap narrowing ΔEg = E0·[ln(N/Nref) + sqrt(ln²(N/Nref) + C)].
 * For N < Nref the bracket is written as C/(sqrt(L² + C) − L), L = ln(N/Nref),
 * which avoids the cancellation of the two terms.
 *
 * @param model parameter set (resolveBandgapNarrowingModel)
 * @param density dopant density N, cm⁻³, ≥ 0 (0 gives 0)
 * @returns ΔEg in eV, ≥ 0
 * @throws PhysicsDomainError for a negative or non-finite density
 * @example apparentBandgapNarrowing(KLAASSEN_BGN, 1e19) // ≈ 0.0605 eV
 */
export function apparentBandgapNarrowing(model: ApparentBandgapNarrowingModel, density: number): number {
  checkDopantDensity(density);
  if (density === 0) return 0;
  const L = Math.log(density / model.referenceDensity);
  const root = Math.sqrt(L * L + model.constant);
  const bracket = L >= 0 ? L + root : model.constant / (root - L);
  return model.energy * bracket;
}

/**
 * Effective intrinsic density ni_eff = ni·exp(ΔEg/(2kT)), with ni the
 * material's default ni model (as every density function uses) and ΔEg the
 * apparent BGN at the dopant density.
 *
 * @param material host material (silicon only)
 * @param temperature K, inside the material's temperature domain
 * @param density dopant density, cm⁻³, ≥ 0
 * @param model BGN model code (blank: 'klaassen-bgn')
 * @returns ni_eff in cm⁻³
 * @throws PhysicsDomainError for another material, an unknown model, bad density or temperature
 * @example effectiveIntrinsicDensity(SILICON, 300, 1e19) // ≈ 3.1e10
 */
export function effectiveIntrinsicDensity(material: Material, temperature: number, density: number, model?: string): number {
  const parameters = resolveBandgapNarrowingModel(material, model);
  const narrowing = apparentBandgapNarrowing(parameters, density);
  return Math.exp(logIntrinsicDensity(material, temperature) + narrowing / (2 * thermalVoltage(temperature)));
}
