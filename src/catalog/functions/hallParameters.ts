import { optionalNumber, requiredNumber } from '../parameters';

/** Parameters shared by DRIFT.HALLDENSITY and DRIFT.HALLMOBILITY. */
export const hallCoefficient = requiredNumber({
  name: 'hall_coefficient_cm3_per_C',
  unit: 'cm³/C',
  description: 'Hall coefficient R_H in cm³/C, not 0: negative for electrons (n-type), positive for holes (p-type).',
});

export const hallFactor = optionalNumber({
  name: 'hall_factor',
  unit: null,
  description: 'Hall scattering factor r_H, > 0; blank means 1 (about 1.1–1.2 is usual for lattice scattering).',
  defaultValue: 1,
  min: 0,
  minExclusive: true,
});
