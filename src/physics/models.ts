/**
 * Registry of every model code the core knows, with what it computes, its
 * citation and validity range: the table behind DRIFT.MODELS() and the help
 * pages. Band-structure, ni, statistics and ionization entries come from
 * bands/modelInfo.ts; the transport entries are defined here from the
 * citation constants beside each parameter table.
 */
import { PhysicsDomainError } from './errors';
import { BAND_MODELS } from './bands/modelInfo';
import { MASETTI_SOURCE } from './mobility/masetti';
import { ARORA_SOURCE, ARORA_FITTED_TEMPERATURES } from './mobility/arora';
import { CAUGHEY_THOMAS_SOURCE } from './mobility/caugheyThomas';
import { KLAASSEN_SOURCE } from './mobility/klaassen';
import { F723_SOURCE } from './astmF723';
import { LAYER_MODELS } from './layers/modelInfo';
import type { ModelInfo } from './modelInfo';
import { MEASUREMENT_MODELS } from './measurement/modelInfo';
import { HIGH_FIELD_MODELS } from './highField/modelInfo';
import { MATERIAL_MODELS } from './materials/modelInfo';
import { MATERIAL_MOBILITY_FITS } from './mobility/materialFits';

export type { ModelInfo };

const MOBILITY = 'mobility and resistivity';

const DRIFT_MOBILITY_NOTE =
  'Transport uses the drift mobility: the fit times N_net / n_eq(300 K) for the net-majority ' +
  'carrier (the fits assumed full ionization; relaxed smoothly to 1 when the 300 K sample is intrinsic), ' +
  'the fit unchanged for the other carrier; total impurity density N_D + N_A for compensated samples.';

const TEMPERATURE_BY_ARORA =
  `Away from 300 K multiplied by the Arora (1982) ratio μ(N,T)/μ(N,300 K) (fitted ` +
  `${ARORA_FITTED_TEMPERATURES.min}–${ARORA_FITTED_TEMPERATURES.max} K, extrapolated outside).`;

const TRANSPORT_MODELS: readonly ModelInfo[] = [
  {
    code: 'masetti',
    quantity: MOBILITY,
    name: 'Masetti et al. (1983) dopant-specific mobility (default)',
    citation: MASETTI_SOURCE.citation,
    validity: MASETTI_SOURCE.validity,
    notes: `${TEMPERATURE_BY_ARORA} Electrons: As or P row (other dopants: P row); holes: B row. ${DRIFT_MOBILITY_NOTE}`,
  },
  {
    code: 'arora',
    quantity: MOBILITY,
    name: 'Arora, Hauser, Roulston (1982) mobility vs density and temperature',
    citation: ARORA_SOURCE.citation,
    validity: ARORA_SOURCE.validity,
    notes: DRIFT_MOBILITY_NOTE,
  },
  {
    code: 'caughey-thomas',
    quantity: MOBILITY,
    name: 'Caughey–Thomas (1967) low-field mobility',
    citation: CAUGHEY_THOMAS_SOURCE.citation,
    validity: CAUGHEY_THOMAS_SOURCE.validity,
    notes: `${TEMPERATURE_BY_ARORA} ${DRIFT_MOBILITY_NOTE}`,
  },
  {
    code: 'klaassen',
    quantity: MOBILITY,
    name: 'Klaassen (1992) unified mobility: majority and minority carriers, temperature',
    citation: KLAASSEN_SOURCE.citation,
    validity: KLAASSEN_SOURCE.validity,
    notes:
      'Own temperature dependence (lattice and impurity terms with their own power laws); donors and acceptors ' +
      'enter separately (minority carriers see repelling dopants weighted by G ≤ 1, the other carrier type by 1/F), ' +
      'clustering above ~1e20 cm⁻³. Dopant densities as in the fit (full ionization); n, p from the equilibrium ' +
      'with the net-majority density times N_net / n_eq(300 K), and that carrier\'s mobility times the same factor, ' +
      'so that 300 K resistivity follows the fit; G is evaluated no lower than its minimum in P. At 300 K the ' +
      'majority mobility is the Caughey–Thomas form with Masetti\'s P and B parameters (within 5 % of masetti).',
  },
  {
    code: 'f723-anchored',
    quantity: 'resistivity ↔ dopant density',
    name: 'Physics resistivity (silicon default mobility model) anchored to ASTM F723 at 23 °C',
    citation: F723_SOURCE.citation + '; physics as for masetti',
    validity:
      'Silicon, any dopant, temperature and counter-doping the physics model covers; equals F723 (B, P) at 296.15 K without ' +
      'counter-doping over F723\'s ranges; elsewhere F723\'s density dependence times the physics model\'s temperature and compensation dependence',
    notes:
      'ρ = ρ_phys · k(N), k = ρ_F723(N)/ρ_phys(N, 296.15 K, uncompensated), k of the dopant density only: B and P anchored, ' +
      'other dopants (As included, whose F723 range is only 1e19–6e20 cm⁻³) k = 1. RESISTIVITY uses F723\'s ρ-from-N equation, ' +
      'DOPING its N-from-ρ equation, so each direction is the standard\'s own and they disagree by its stated self-consistency ' +
      '(3 % B, 4.5 % P). Outside F723\'s ranges ln k levels off smoothly (continuous value and slope). Not a mobility model.',
  },
  {
    code: 'astm-f723',
    quantity: 'resistivity ↔ dopant density',
    name: 'ASTM F723 conversion (Thurber et al. 1981 equations)',
    citation: F723_SOURCE.citation,
    validity: F723_SOURCE.validity,
    notes: 'Closed-form conversion for resistivity and doping only; not a mobility model.',
  },
];

/** Mobility fits of Ge, GaAs and 4H-SiC (mobility/materialFits.ts), each its material's default. */
const MATERIAL_MOBILITY_MODELS: readonly ModelInfo[] = MATERIAL_MOBILITY_FITS.map((fit) => ({
  code: fit.code,
  quantity: `${MOBILITY} (${fit.materialCode})`,
  name: fit.name,
  citation: fit.citation,
  validity: fit.validity,
  notes: fit.notes,
}));

/** Every model code: ni, band gap, densities of states, statistics, ionization, mobility, ASTM F723. */
export const MODEL_REGISTRY: readonly ModelInfo[] = [
  ...BAND_MODELS,
  ...MATERIAL_MODELS,
  ...TRANSPORT_MODELS,
  ...MATERIAL_MOBILITY_MODELS,
  ...HIGH_FIELD_MODELS,
  ...LAYER_MODELS,
  ...MEASUREMENT_MODELS,
];

/**
 * Looks a model up by code, case-insensitively.
 *
 * @param code - e.g. 'Masetti'
 * @returns its registry entry
 * @throws PhysicsDomainError listing every code
 * @example modelInfo('astm-f723').quantity // → 'resistivity ↔ dopant density'
 */
export function modelInfo(code: string): ModelInfo {
  const wanted = String(code).trim().toLowerCase();
  const found = MODEL_REGISTRY.find((entry) => entry.code.toLowerCase() === wanted);
  if (found === undefined) {
    throw new PhysicsDomainError(
      `unknown model '${code}'. Allowed: ${MODEL_REGISTRY.map((entry) => entry.code).join(', ')}.`,
    );
  }
  return found;
}
