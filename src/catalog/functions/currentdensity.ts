import { FIELD_DEPENDENCE_CODES, currentDensity, type FieldDependence } from '../../physics';
import { counterDoping, dopant, doping, material, sampleOf, temperature } from '../common';
import { codeParameter, requiredNumber } from '../parameters';
import { elementwise } from '../types';

const field = requiredNumber({
  name: 'field_V_per_cm',
  unit: 'V/cm',
  description: 'Electric field in V/cm; its sign sets the direction of the current.',
});

const fieldDependence = codeParameter<FieldDependence>({
  name: 'field_dependence',
  description: 'How J depends on the field: saturating (velocity saturation, J = q(n·vn + p·vp)) or ohmic (J = σE); blank means saturating.',
  choices: () => FIELD_DEPENDENCE_CODES,
  defaultCode: FIELD_DEPENDENCE_CODES[0],
  resolve: (code) => code as FieldDependence,
});

export const CURRENTDENSITY = elementwise({
  name: 'CURRENTDENSITY',
  summary: 'Drift current density J = q(n·vn + p·vp) with velocity saturation (or σE), in A/cm².',
  help: `Returns the drift current density in a uniform field. By default (field_dependence "saturating") J = q(n·vn(E) + p·vp(E)), with n and p as DRIFT.ELECTRONS and DRIFT.HOLES give them and vn, vp exactly as DRIFT.VELOCITY returns them (Caughey–Thomas velocity–field relation with the material's saturation velocity). As E → 0 this equals σ·E with σ from DRIFT.CONDUCTIVITY; the relative shortfall is about (μ0·E/v_sat)^β/β, e.g. 4e-5 at 1 V/cm and 0.6 % at 100 V/cm in 1e16 cm⁻³ n-type Si, half at 1e4 V/cm.

With field_dependence "ohmic" it returns J = σ·E = q(n·μn + p·μp)·E (Ohm's law, no saturation), as before this option existed; that form is valid only while drift velocities stay well below saturation.

The saturating form has the validity of DRIFT.VELOCITY: Si 77–1000 K (Canali et al. 1975, measured up to 430 K), Ge and GaAs 20–1000 K (Quay et al. 2000; GaAs electrons' transferred-electron velocity peak is not modelled), 4H-SiC at 300 K only. 4H-SiC has no tabulated hole saturation velocity: holes are left out only where even their ohmic current is below double-precision resolution of the electron current (practically any n-type sample); otherwise the result is an error. Outside these ranges use "ohmic".`,
  result: { unit: 'A/cm²', description: 'Current density J' },
  parameters: [field, doping, dopant, temperature, material, counterDoping, fieldDependence] as const,
  examples: [
    { formula: '=DRIFT.CURRENTDENSITY(100,1e16,"P")', note: '100 V/cm across 1e16 cm⁻³ n-type Si' },
    { formula: '=DRIFT.CURRENTDENSITY(A2:A11,1e15,"B")', note: 'a column of fields, with velocity saturation' },
    { formula: '=DRIFT.CURRENTDENSITY(1e4,1e16,"P",,,,"ohmic")', note: 'J = σE, ignoring saturation' },
  ],
  models: ['masetti', 'caughey-thomas-field', 'canali-1975', 'quay-2000', 'khan-cooper-2000'],
  compute: (fieldValue, density, dopantCode, temperatureK, materialValue, counter, dependence) =>
    currentDensity(fieldValue, sampleOf(materialValue, temperatureK, dopantCode, density, counter), undefined, dependence),
});
