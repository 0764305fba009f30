import { currentDensity } from '../../physics';
import { counterDoping, dopant, doping, material, sampleOf, temperature } from '../common';
import { requiredNumber } from '../parameters';
import { elementwise } from '../types';

const field = requiredNumber({
  name: 'field_V_per_cm',
  unit: 'V/cm',
  description: 'Electric field in V/cm; its sign sets the direction of the current.',
});

export const CURRENTDENSITY = elementwise({
  name: 'CURRENTDENSITY',
  summary: 'Drift current density J = σE at low field, in A/cm².',
  help: `Returns the drift current density J = σ·E = q(n·μn + p·μp)·E, with σ exactly as DRIFT.CONDUCTIVITY returns it with the default mobility model. This is the low-field (ohmic) form: valid while the carriers' drift velocity stays well below saturation (in Si, fields up to roughly 1e3 V/cm).`,
  result: { unit: 'A/cm²', description: 'Current density J' },
  parameters: [field, doping, dopant, temperature, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.CURRENTDENSITY(100,1e16,"P")', note: '100 V/cm across 1e16 cm⁻³ n-type Si' },
    { formula: '=DRIFT.CURRENTDENSITY(A2:A11,1e15,"B")', note: 'a column of fields' },
  ],
  models: ['masetti'],
  compute: (fieldValue, density, dopantCode, temperatureK, materialValue, counter) =>
    currentDensity(fieldValue, sampleOf(materialValue, temperatureK, dopantCode, density, counter)),
});
