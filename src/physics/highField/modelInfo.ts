/**
 * Registry entries (DRIFT.MODELS, help pages, README) of the velocity–field
 * form and of the saturation-velocity tables, built from the citation
 * constants beside each table.
 */
import type { ModelInfo } from '../modelInfo';
import { CAUGHEY_THOMAS_FIELD_EXPONENTS, CAUGHEY_THOMAS_FIELD_SOURCE } from './caugheyThomasField';
import { CANALI_FIELD_EXPONENT_LAWS, CANALI_MODEL_CODE, CANALI_SOURCE, canaliExponentAt300K } from './canali';
import { QUAY_GALLIUM_ARSENIDE, QUAY_MODEL_CODE, QUAY_PARAMETERS, QUAY_SOURCE, SILICON_HOLE_LAW_CROSSING_K } from './quay';
import { KHAN_COOPER_MODEL_CODE, KHAN_COOPER_SATURATION_VELOCITY, KHAN_COOPER_SILICON_CARBIDE, KHAN_COOPER_SOURCE } from './siliconCarbide';
import { parameterText as t } from '../parameterText';

/** Registry code of the Caughey–Thomas velocity–field relation. */
export const CAUGHEY_THOMAS_FIELD_CODE = 'caughey-thomas-field';

const VELOCITY = 'drift velocity vs field';

/** "Si: v_sat,300 = 1.00e7 (e), 7.04e6 (h) cm/s, A = 0.26, 0.63; …" from the table itself. */
function quayParameterText(): string {
  return Object.entries(QUAY_PARAMETERS)
    .map(([material, { electron, hole }]) => {
      const saturation = `v_sat,300 = ${electron[0].toExponential(2)} (e), ${hole[0].toExponential(2)} (h) cm/s`;
      return `${material}: ${saturation}, A = ${electron[1]}, ${hole[1]}`;
    })
    .join('; ');
}
const SATURATION = 'saturation velocity';

/** "β = 2 (e), 1 (h)": the Caughey–Thomas exponents as the notes quote them, from the table. */
const CAUGHEY_THOMAS_EXPONENTS_TEXT =
  `β = ${t(CAUGHEY_THOMAS_FIELD_EXPONENTS.electron)} (e), ` + `${t(CAUGHEY_THOMAS_FIELD_EXPONENTS.hole)} (h)`;

/**
 * "2.57e-2·T^0.66 (e), 0.46·T^0.17 (h)": Canali's β(T) laws from the table.
 * Canali's v_m(T) beside it in the notes is quoted text: the core does not
 * compute with it (see canali.ts).
 */
function canaliLawText(): string {
  const { electron, hole } = CANALI_FIELD_EXPONENT_LAWS;
  return `${electron.prefactor.toExponential()}·T^${t(electron.exponent)} (e), ${t(hole.prefactor)}·T^${t(hole.exponent)} (h)`;
}

export const HIGH_FIELD_MODELS: readonly ModelInfo[] = [
  {
    code: CAUGHEY_THOMAS_FIELD_CODE,
    quantity: VELOCITY,
    name: 'Caughey–Thomas (1967) velocity–field relation',
    citation: CAUGHEY_THOMAS_FIELD_SOURCE.citation,
    validity: CAUGHEY_THOMAS_FIELD_SOURCE.validity,
    notes:
      'μ0 is the sample’s low-field drift mobility (the material’s default mobility model, as DRIFT.MOBILITY gives it), ' +
      'so v = μ0·E exactly at low field. Monotone: no velocity overshoot or negative differential mobility.',
    equation: 'src/physics/highField/caugheyThomasField.ts',
    parameterTable: 'src/physics/highField/caugheyThomasField.ts',
    tests: ['tests/physics/reference/canali-1975.reference.test.ts', 'tests/physics/highField/caugheyThomasField.test.ts'],
  },
  {
    code: CANALI_MODEL_CODE,
    quantity: 'field exponent of the velocity–field relation, Si',
    name:
      `Canali et al. (1975) β at 300 K: ${canaliExponentAt300K('electron').toFixed(3)} (e), ` +
      `${canaliExponentAt300K('hole').toFixed(3)} (h), held constant`,
    citation: CANALI_SOURCE.citation,
    validity: CANALI_SOURCE.validity,
    notes:
      `Canali’s fit β = ${canaliLawText()} belongs with its v_m = 1.53e9·T^−0.87, 1.62e8·T^−0.52 cm/s; ` +
      'that v_m is a fit parameter, not the saturation velocity (3.5e7 cm/s at 77 K against about 1.2–1.4e7 measured), ' +
      'so Si uses Quay’s v_sat(T) with Canali’s 300 K β.',
    equation: 'src/physics/highField/canali.ts',
    parameterTable: 'src/physics/highField/canali.ts',
    tests: ['tests/physics/reference/canali-1975.reference.test.ts'],
  },
  {
    code: QUAY_MODEL_CODE,
    quantity: `${SATURATION}, Si, Ge and GaAs`,
    name: 'Quay et al. (2000) v_sat(T) = v_sat,300/((1 − A) + A·T/300 K)',
    citation: QUAY_SOURCE.citation,
    validity: QUAY_SOURCE.validity,
    notes:
      `${quayParameterText()} (read in Palankovski 2000, Table 3.31). Si electrons 77–1000 K, Si holes from ` +
      `${Math.ceil(SILICON_HOLE_LAW_CROSSING_K)} K (below, Quay’s hole law would exceed the electron one); Ge, GaAs 20–1000 K. ` +
      `Si field exponent from Canali et al. (1975) at 300 K; Ge and GaAs ${CAUGHEY_THOMAS_EXPONENTS_TEXT} from ` +
      'Caughey–Thomas, not fitted to these materials. ' +
      (QUAY_GALLIUM_ARSENIDE.limitations ?? ''),
    equation: 'src/physics/highField/saturationVelocity.ts',
    parameterTable: 'src/physics/highField/quay.ts',
    tests: [
      'tests/physics/reference/quay-2000.reference.test.ts',
      'tests/physics/reference/jacoboni-1977.reference.test.ts',
      'tests/physics/highField/saturationVelocity.test.ts',
    ],
  },
  {
    code: KHAN_COOPER_MODEL_CODE,
    quantity: `${SATURATION}, 4H-SiC electrons`,
    name: `Khan & Cooper (2000) 4H-SiC electron saturated drift velocity, ${t(KHAN_COOPER_SATURATION_VELOCITY)} cm/s`,
    citation: KHAN_COOPER_SOURCE.citation,
    validity: KHAN_COOPER_SOURCE.validity,
    notes:
      `β = ${t(CAUGHEY_THOMAS_FIELD_EXPONENTS.electron)} from Caughey–Thomas, not fitted to 4H-SiC. No ` +
      `hole value is tabulated. ${KHAN_COOPER_SILICON_CARBIDE.limitations ?? ''}`,
    equation: 'src/physics/highField/saturationVelocity.ts',
    parameterTable: 'src/physics/highField/siliconCarbide.ts',
    tests: ['tests/physics/reference/khan-cooper-2000.reference.test.ts', 'tests/physics/highField/saturationVelocity.test.ts'],
  },
];
