/**
 * The mobility model registry: one entry per model with its code, quantity,
 * materials, parameter table, citation, validity, notes, equation, tests and
 * compute. Everything else about mobility models is derived from
 * MOBILITY_MODEL_REGISTRY: the code lists, defaults and the one dispatch
 * (mobility/index.ts), the resistivity model lists (transport.ts), the
 * DRIFT.MODELS rows and help-page citations (models.ts), the catalog's model
 * argument and cited codes (src/catalog/common.ts, citedModels.ts), and
 * README's code and model tables (src/catalog/docs/readme.ts).
 *
 * Order is meaning: a material's models are the entries that list it, in
 * this order, and the first is its default (silicon: masetti). The entry
 * marked `minorityCarrierDefault` is what a blank code chooses for the
 * minority carriers of its materials (silicon: klaassen).
 *
 * The 300 K silicon fits (masetti, caughey-thomas) are carried to other
 * temperatures by Arora's ratio μ_Arora(N,T)/μ_Arora(N,300 K); every fit but
 * klaassen takes the total impurity density N = N_D + N_A of the sample
 * (common practice for compensated material, no source).
 */
import type { Carrier, Sample } from '../sample';
import { totalImpurityDensity } from '../sample';
import { MASETTI_SOURCE, MASETTI_TABLE, masettiMobility, type MasettiSpecies } from './masetti';
import { ARORA_FITTED_TEMPERATURES, ARORA_SOURCE, ARORA_TABLE, aroraMobility, aroraTemperatureRatio } from './arora';
import { CAUGHEY_THOMAS_SOURCE, CAUGHEY_THOMAS_TABLE, caugheyThomasMobility } from './caugheyThomas';
import {
  KLAASSEN_CARRIER_TABLE,
  KLAASSEN_CLUSTERING_TABLE,
  KLAASSEN_ELECTRON_HOLE_F,
  KLAASSEN_MINORITY_G,
  KLAASSEN_SCREENING,
  KLAASSEN_SOURCE,
  klaassenSampleMobility,
} from './klaassen';
import { MATERIAL_MOBILITY_FITS, materialFitMobility } from './materialFits';
import { SILICON } from '../materials/silicon';
import type { MaterialMobilityFit, MobilityModel } from './types';

/** What every mobility model computes (DRIFT.MODELS); other hosts' fits add their material. */
const MOBILITY_QUANTITY = 'mobility and resistivity';

export type { MobilityFitBasis, MobilityModel } from './types';

/** How transport turns a fit made against total dopant density into a free-carrier mobility (DRIFT.MODELS notes). */
const DRIFT_MOBILITY_NOTE =
  'Transport uses the drift mobility: the fit times N_net / n_eq(300 K) for the net-majority ' +
  'carrier (the fits assumed full ionization; relaxed smoothly to 1 when the 300 K sample is intrinsic), ' +
  'the fit unchanged for the other carrier; total impurity density N_D + N_A for compensated samples.';

/** How the 300 K silicon fits are carried to other temperatures. */
const TEMPERATURE_BY_ARORA =
  `Away from 300 K multiplied by the Arora (1982) ratio μ(N,T)/μ(N,300 K) (fitted ` +
  `${ARORA_FITTED_TEMPERATURES.min}–${ARORA_FITTED_TEMPERATURES.max} K, extrapolated outside).`;

/**
 * A 300 K silicon fit at the sample's temperature: the fit at the sample's total impurity
 * density times Arora's temperature ratio (TEMPERATURE_BY_ARORA says so in the notes).
 */
function carriedByArora(
  fitAt300K: (carrier: Carrier, density: number, sample: Sample) => number,
): (carrier: Carrier, sample: Sample) => number {
  return (carrier, sample) => {
    const density = totalImpurityDensity(sample);
    return fitAt300K(carrier, density, sample) * aroraTemperatureRatio(carrier, density, sample.temperature);
  };
}

/**
 * Masetti row for a carrier in a sample: electrons use the named dopant's own
 * row when it is a donor (dopant.mobilitySpecies, 'As' or 'P'), otherwise the
 * P row; holes always use the B row (Masetti gives no other hole row).
 */
function masettiSpecies(carrier: Carrier, sample: Sample): MasettiSpecies {
  if (carrier === 'hole') return 'B';
  const own = sample.dopant.mobilitySpecies;
  return sample.dopant.kind === 'donor' && (own === 'As' || own === 'P') ? own : 'P';
}

const MASETTI: MobilityModel<typeof MASETTI_TABLE> = {
  code: 'masetti',
  quantity: MOBILITY_QUANTITY,
  name: 'Masetti et al. (1983) dopant-specific mobility (default)',
  materials: [SILICON.code],
  fittedTo: 'dopant-density',
  parameters: MASETTI_TABLE,
  citation: MASETTI_SOURCE.citation,
  validity: MASETTI_SOURCE.validity,
  notes: `${TEMPERATURE_BY_ARORA} Electrons: As or P row (other dopants: P row); holes: B row. ${DRIFT_MOBILITY_NOTE}`,
  equation: 'src/physics/mobility/masetti.ts',
  parameterTable: 'src/physics/mobility/masetti.ts',
  tests: ['tests/physics/reference/masetti-1983.reference.test.ts', 'tests/physics/mobility/masetti.test.ts'],
  compute: carriedByArora((carrier, density, sample) =>
    masettiMobility(MASETTI_TABLE[masettiSpecies(carrier, sample)].parameters, density),
  ),
};

const ARORA: MobilityModel<typeof ARORA_TABLE> = {
  code: 'arora',
  quantity: MOBILITY_QUANTITY,
  name: 'Arora, Hauser, Roulston (1982) mobility vs density and temperature',
  materials: [SILICON.code],
  fittedTo: 'dopant-density',
  parameters: ARORA_TABLE,
  citation: ARORA_SOURCE.citation,
  validity: ARORA_SOURCE.validity,
  notes: DRIFT_MOBILITY_NOTE,
  equation: 'src/physics/mobility/arora.ts',
  parameterTable: 'src/physics/mobility/arora.ts',
  tests: ['tests/physics/reference/arora-1982.reference.test.ts', 'tests/physics/mobility/arora.test.ts'],
  compute: (carrier, sample) => aroraMobility(carrier, totalImpurityDensity(sample), sample.temperature),
};

const CAUGHEY_THOMAS: MobilityModel<typeof CAUGHEY_THOMAS_TABLE> = {
  code: 'caughey-thomas',
  quantity: MOBILITY_QUANTITY,
  name: 'Caughey–Thomas (1967) low-field mobility',
  materials: [SILICON.code],
  fittedTo: 'dopant-density',
  parameters: CAUGHEY_THOMAS_TABLE,
  citation: CAUGHEY_THOMAS_SOURCE.citation,
  validity: CAUGHEY_THOMAS_SOURCE.validity,
  notes: `${TEMPERATURE_BY_ARORA} ${DRIFT_MOBILITY_NOTE}`,
  equation: 'src/physics/mobility/caugheyThomas.ts',
  parameterTable: 'src/physics/mobility/caugheyThomas.ts',
  tests: ['tests/physics/reference/caughey-thomas-1967.reference.test.ts', 'tests/physics/mobility/caugheyThomas.test.ts'],
  compute: carriedByArora((carrier, density) => caugheyThomasMobility(carrier, density)),
};

/** Klaassen's fitted parameter tables, as klaassen/parameters.ts exports them. */
const KLAASSEN_PARAMETERS = {
  carriers: KLAASSEN_CARRIER_TABLE,
  clustering: KLAASSEN_CLUSTERING_TABLE,
  screening: KLAASSEN_SCREENING,
  electronHoleF: KLAASSEN_ELECTRON_HOLE_F,
  minorityG: KLAASSEN_MINORITY_G,
} as const;

const KLAASSEN: MobilityModel<typeof KLAASSEN_PARAMETERS> = {
  code: 'klaassen',
  quantity: MOBILITY_QUANTITY,
  name: 'Klaassen (1992) unified mobility: majority and minority carriers, temperature',
  materials: [SILICON.code],
  minorityCarrierDefault: true,
  fittedTo: 'dopant-density',
  parameters: KLAASSEN_PARAMETERS,
  citation: KLAASSEN_SOURCE.citation,
  validity: KLAASSEN_SOURCE.validity,
  notes:
    'Own temperature dependence (lattice and impurity terms with their own power laws); donors and acceptors ' +
    'enter separately (minority carriers see repelling dopants weighted by G ≤ 1, the other carrier type by 1/F), ' +
    'clustering above ~1e20 cm⁻³. Dopant densities as in the fit (full ionization); n, p from the equilibrium ' +
    "with the net-majority density times N_net / n_eq(300 K), and that carrier's mobility times the same factor, " +
    'so that 300 K resistivity follows the fit; G is evaluated no lower than its minimum in P. At 300 K the ' +
    "majority mobility is the Caughey–Thomas form with Masetti's P and B parameters (within 5 % of masetti).",
  equation: 'src/physics/mobility/klaassen/equations.ts',
  parameterTable: 'src/physics/mobility/klaassen/parameters.ts',
  tests: ['tests/physics/reference/klaassen-1992.reference.test.ts', 'tests/physics/mobility/klaassen.test.ts'],
  compute: klaassenSampleMobility,
};

/** A non-silicon fit (temperature-scaled Caughey–Thomas form) as a registry entry. */
function materialFitModel(fit: MaterialMobilityFit): MobilityModel<MaterialMobilityFit['parameters']> {
  return {
    code: fit.code,
    quantity: `${MOBILITY_QUANTITY} (${fit.materialCode})`,
    name: fit.name,
    materials: [fit.materialCode],
    fittedTo: 'free-carriers',
    parameters: fit.parameters,
    citation: fit.citation,
    validity: fit.validity,
    notes: fit.notes,
    equation: 'src/physics/mobility/materialFits.ts',
    parameterTable: fit.parameterTable,
    tests: fit.tests,
    compute: (carrier, sample) => materialFitMobility(fit, carrier, totalImpurityDensity(sample), sample.temperature),
  };
}

/** Every mobility model, silicon's first (see the module comment for what the order means). */
export const MOBILITY_MODEL_REGISTRY: readonly MobilityModel[] = [
  MASETTI,
  ARORA,
  CAUGHEY_THOMAS,
  KLAASSEN,
  ...MATERIAL_MOBILITY_FITS.map(materialFitModel),
];

/** A registry that gives one code twice (case-insensitively) is refused when the module loads. */
function refuseRepeatedCodes(models: readonly MobilityModel[]): void {
  models.forEach((model, index) => {
    if (models.findIndex((other) => other.code.toLowerCase() === model.code.toLowerCase()) !== index) {
      throw new Error(`mobility model code '${model.code}' is registered twice`);
    }
  });
}
refuseRepeatedCodes(MOBILITY_MODEL_REGISTRY);

/**
 * The entries with parameters for a material, in registry order (the first is its default).
 *
 * @param materialCode - e.g. 'GaAs'
 * @returns its models
 * @example mobilityModelsOf('Si').map((m) => m.code) // → ['masetti', 'arora', 'caughey-thomas', 'klaassen']
 */
export function mobilityModelsOf(materialCode: string): readonly MobilityModel[] {
  return MOBILITY_MODEL_REGISTRY.filter((model) => model.materials.includes(materialCode));
}

/**
 * The entry of a canonical (lower-case) code.
 *
 * @param code - e.g. 'sotoodeh'
 * @returns its entry, or undefined when no mobility model has that code
 * @example mobilityModelEntry('arora')?.materials // → ['Si']
 */
export function mobilityModelEntry(code: string): MobilityModel | undefined {
  return MOBILITY_MODEL_REGISTRY.find((model) => model.code === code);
}
