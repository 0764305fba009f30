import { hallDensity } from '../../physics';
import { elementwise } from '../types';
import { hallCoefficient, hallFactor } from './hallParameters';
import { prose } from '../../text/prose';

export const HALLDENSITY = elementwise({
  name: 'HALLDENSITY',
  summary: 'Carrier density from the Hall coefficient, signed by carrier type (negative = electrons), in cm⁻³.',
  help: prose`Returns n = r_H/(q·R_H) for a sample whose conduction is dominated by one carrier type. The sign
    is kept on purpose and follows the sign of the Hall coefficient: a *negative* result means electrons
    (n-type), a *positive* result means holes (p-type). Use ABS() for the magnitude.

    The Hall scattering factor r_H = ⟨τ²⟩/⟨τ⟩² relates the Hall density to the true density. Blank means 1,
    which returns the Hall density 1/(q·R_H) itself; values of about 1.1–1.2 are commonly used for lattice
    scattering in silicon at room temperature (from memory), and r_H tends to 1 in strong magnetic fields.

    Cautions: with both carrier types contributing (near-intrinsic or compensated material, or at high
    temperature) R_H no longer gives either density. The sign of R_H depends on the orientation of field,
    current and voltage leads; check the set-up's convention on a sample of known type.`,
  result: { unit: 'cm⁻³', description: 'Carrier density, negative for electrons and positive for holes' },
  parameters: [hallCoefficient, hallFactor] as const,
  examples: [
    { formula: '=DRIFT.HALLDENSITY(-624.15)', note: 'an n-type sample: about −1e16 cm⁻³' },
    { formula: '=DRIFT.HALLDENSITY({-624.15,62.415},1.15)', note: 'n- and p-type samples with r_H = 1.15' },
  ],
  models: ['hall-effect'],
  compute: (coefficient, factor) => hallDensity(coefficient, factor),
});
