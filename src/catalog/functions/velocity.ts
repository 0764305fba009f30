import { carrierFor, driftVelocity } from '../../physics';
import { carrier, dopant, doping, field, material, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { HIGH_FIELD_MODELS } from '../citedModels';

export const VELOCITY = elementwise({
  name: 'VELOCITY',
  summary: 'Drift velocity of electrons or holes in an electric field, with velocity saturation, in cm/s.',
  help: `Returns the drift velocity v(E) = μ0·E / (1 + (μ0·|E|/v_sat)^β)^(1/β) (Caughey & Thomas 1967), with μ0 the low-field drift mobility exactly as DRIFT.MOBILITY returns it with the material's default model, and v_sat, β the material's tabulated values (see DRIFT.VSAT). The result has the sign of the field (the carriers' charge is not applied: electrons actually move against E).

At low field v → μ0·E: the relative shortfall is about (μ0·E/v_sat)^β/β, e.g. 4e-5 at 1 V/cm and 0.6 % at 100 V/cm for electrons in 1e16 cm⁻³ n-type Si. At high field v → v_sat.

Si: Canali et al. (1975) v_sat(T) and β(T), measured 3e2–6e4 V/cm up to 430 K; evaluated 77–1000 K (extrapolated above 430 K). Ge, GaAs: saturation velocity of Quay et al. (2000), 20–1000 K, with β = 2 (electrons) or 1 (holes) from Caughey–Thomas, not fitted to these materials. GaAs electrons show negative differential mobility (transferred-electron effect, a velocity peak near 2e7 cm/s at 3–4 kV/cm): this monotone curve does not model the peak and underestimates the electron velocity between about 1e3 and 1e4 V/cm, by up to about three times. 4H-SiC: electrons only (Khan & Cooper 2000, 2.2e7 cm/s), at 300 K only; holes give an error. Above a few 1e5 V/cm impact ionization sets in (not modelled).`,
  result: { unit: 'cm/s', description: 'Drift velocity' },
  parameters: [field, doping, dopant, temperature, carrier, material] as const,
  examples: [
    { formula: '=DRIFT.VELOCITY(1e4,1e16,"P")', note: 'electrons in 1e16 cm⁻³ n-type Si at 10 kV/cm' },
    { formula: '=DRIFT.VELOCITY(A2:A40,1e15,"B",,"hole")', note: 'a velocity–field curve of holes' },
    { formula: '=DRIFT.VELOCITY(5e3,1e16,"Si",300,"electron","GaAs")', note: 'electrons in Si-doped GaAs (no transferred-electron peak)' },
  ],
  models: HIGH_FIELD_MODELS,
  compute: (fieldValue, density, dopantCode, temperatureK, role, materialValue) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, 0);
    return driftVelocity(fieldValue, carrierFor(sample.dopant, role), sample);
  },
});
