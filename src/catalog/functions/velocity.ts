import { SILICON, carrierFor, driftVelocity } from '../../physics';
import { carrier, dopant, doping, field, material, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { HIGH_FIELD_MODELS } from '../citedModels';
import { SILICON_MINORITY_MOBILITY_MODEL } from '../../physics';
import { SILICON_FIELD_EXPONENTS_TEXT, SILICON_HIGH_FIELD_RANGE_TEXT, SILICON_HOLE_VSAT_300K_TEXT } from './vsat';
import { prose } from '../../text/prose';

/** 1 − v(E)/(μ0·E) for electrons in 1e16 cm⁻³ P-doped Si at 300 K, for the help text. */
function shortfall(fieldVPerCm: number): number {
  const sample = sampleOf(SILICON, 300, 'P', 1e16, 0);
  const ohmicField = 1e-12;
  const mobilityAtZeroField = driftVelocity(ohmicField, 'electron', sample) / ohmicField;
  return 1 - driftVelocity(fieldVPerCm, 'electron', sample) / (mobilityAtZeroField * fieldVPerCm);
}

export const VELOCITY = elementwise({
  name: 'VELOCITY',
  summary: 'Drift velocity of electrons or holes in an electric field, with velocity saturation, in cm/s.',
  help: prose`Returns the drift velocity v(E) = μ0·E / (1 + (μ0·|E|/v_sat)^β)^(1/β) (Caughey & Thomas 1967),
    with μ0 the low-field mobility exactly as DRIFT.MOBILITY returns it with a blank model (the published
    value; in Si klaassen for minority carriers, masetti for majority carriers; other materials their own
    fit), and v_sat, β the material's tabulated values (see DRIFT.VSAT). The result has the sign of the field
    (the carriers' charge is not applied: electrons actually move against E).

    At low field v → μ0·E: the relative shortfall is about (μ0·E/v_sat)^β/β, e.g.
    ${shortfall(1).toPrecision(1)} at 1 V/cm and ${(100 * shortfall(100)).toFixed(1)} % at 100 V/cm for
    electrons in 1e16 cm⁻³ n-type Si. At high field v → v_sat.

    Si: saturation velocity of Quay et al. (2000) (see DRIFT.VSAT), accepted for
    ${SILICON_HIGH_FIELD_RANGE_TEXT}, with Canali et al.'s (1975) 300 K field exponents
    ${SILICON_FIELD_EXPONENTS_TEXT} held constant (our assumption). Checked against data: electrons at 3e4–5e4
    V/cm and 77 K give 1.2–1.4e7 cm/s as measured; against Canali's fit of their 300–430 K time-of-flight data
    (3e2–6e4 V/cm, itself within 3.8 % of the data) electrons are within −8…+5 %, holes −15…+10 % (holes
    lowest at 6e4 V/cm, where Quay's hole v_sat of ${SILICON_HOLE_VSAT_300K_TEXT} cm/s sits below Canali's
    8.37e6). Ge, GaAs: saturation velocity of Quay et al. (2000), 20–1000 K, with β = 2 (electrons) or 1
    (holes) from Caughey–Thomas, not fitted to these materials. GaAs electrons show negative differential
    mobility (transferred-electron effect, a velocity peak near 2e7 cm/s at 3–4 kV/cm): this monotone curve
    does not model the peak and underestimates the electron velocity between about 1e3 and 1e4 V/cm, by up to
    about three times. 4H-SiC: electrons only (Khan & Cooper 2000, 2.2e7 cm/s), at 300 K only; holes give an
    error. Above a few 1e5 V/cm impact ionization sets in (not modelled).`,
  result: { unit: 'cm/s', description: 'Drift velocity' },
  parameters: [field, doping, dopant, temperature, carrier, material] as const,
  examples: [
    { formula: '=DRIFT.VELOCITY(1e4,1e16,"phosphorus")', note: 'electrons in 1e16 cm⁻³ n-type Si at 10 kV/cm' },
    { formula: '=DRIFT.VELOCITY(A2:A40,1e15,"B",,"hole")', note: 'a velocity–field curve of holes' },
    { formula: '=DRIFT.VELOCITY(5e3,1e16,"Si",300,"electron","GaAs")', note: 'electrons in Si-doped GaAs (no transferred-electron peak)' },
  ],
  models: [...new Set([...HIGH_FIELD_MODELS, SILICON_MINORITY_MOBILITY_MODEL])],
  compute: (fieldValue, density, dopantCode, temperatureK, role, materialValue) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, 0);
    return driftVelocity(fieldValue, carrierFor(sample.dopant, role), sample);
  },
});
