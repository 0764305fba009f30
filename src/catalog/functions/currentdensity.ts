import { FIELD_DEPENDENCE_CODES, carrierHighFieldTable, currentDensity, type FieldDependence } from '../../physics';
import { counterDoping, dopant, doping, field, material, sampleOf, temperature } from '../common';
import { codeParameter } from '../parameters';
import { elementwise } from '../types';
import { HIGH_FIELD_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

/** Lowest temperature with a Si hole saturation velocity, K (for the help text). */
const SILICON_HOLE_MIN_K = carrierHighFieldTable('Si', 'hole').evaluationRange.min;

const fieldDependence = codeParameter<FieldDependence>({
  name: 'field_dependence',
  description: 'How J depends on the field: saturating (J = q(n·vn + p·vp)) or ohmic (J = σE); blank means saturating.',
  choices: () => FIELD_DEPENDENCE_CODES,
  defaultCode: FIELD_DEPENDENCE_CODES[0],
  resolve: (code) => code as FieldDependence,
});

export const CURRENTDENSITY = elementwise({
  name: 'CURRENTDENSITY',
  summary: 'Drift current density J = q(n·vn + p·vp) with velocity saturation (or σE), in A/cm².',
  help: prose`Returns the drift current density in a uniform field. By default (field_dependence "saturating")
    J = q(n·vn(E) + p·vp(E)), with n and p as DRIFT.MAJORITY and DRIFT.MINORITY give them and vn, vp from the
    Caughey–Thomas velocity–field relation of DRIFT.VELOCITY with the material's saturation velocity. Its
    low-field mobilities are those of DRIFT.CONDUCTIVITY's blank model for both carriers (in silicon
    "f723-anchored": DRIFT.FREEMOBILITY with masetti divided by that model's factor k, so that σ agrees with
    ASTM F723 at 23 °C for B and P), so that J tends to the ohmic form σ·E at low field (with the shortfall
    DRIFT.VELOCITY describes; in 1e16 cm⁻³ n-type Si it is about half at 1e4 V/cm) and saturates at q(n·vsat,n
    + p·vsat,p). DRIFT.VELOCITY itself uses the published DRIFT.MOBILITY, so for a Si majority carrier J/(q·n)
    is up to about 1.3× DRIFT.VELOCITY at low field (near 1e18 cm⁻³).

    With field_dependence "ohmic" it returns J = σ·E = q(n·μn + p·μp)·E (Ohm's law, no saturation); that form
    is valid only while drift velocities stay well below saturation.

    The saturating form has the validity of DRIFT.VELOCITY (temperature ranges per material and the GaAs
    transferred-electron peak it does not model are described there and in the models below). 4H-SiC has no
    tabulated hole saturation velocity, and Si holes have none below ${SILICON_HOLE_MIN_K} K: such holes are
    left out only where even their ohmic current is below double-precision resolution of the electron current
    (practically any n-type sample, e.g. n-type Si at 77 K); otherwise the result is an error. Outside these
    ranges use "ohmic".`,
  result: { unit: 'A/cm²', description: 'Current density J' },
  parameters: [field, doping, dopant, temperature, material, counterDoping, fieldDependence] as const,
  examples: [
    { formula: '=DRIFT.CURRENTDENSITY(100,1e16,"phosphorus")', note: '100 V/cm across 1e16 cm⁻³ n-type Si' },
    { formula: '=DRIFT.CURRENTDENSITY(A2:A11,1e15,"B")', note: 'a column of fields, with velocity saturation' },
    { formula: '=DRIFT.CURRENTDENSITY(1e4,1e16,"phosphorus",,,,"ohmic")', note: 'J = σE, ignoring saturation' },
  ],
  models: HIGH_FIELD_MODELS,
  compute: (fieldValue, density, dopantCode, temperatureK, materialValue, counter, dependence) =>
    currentDensity(fieldValue, sampleOf(materialValue, temperatureK, dopantCode, density, counter), undefined, dependence),
});
