/**
 * Silicon field exponent: C. Canali, G. Majni, R. Minder, G. Ottaviani,
 * "Electron and hole drift velocity measurements in silicon and their
 * empirical relation to electric field and temperature", IEEE Trans.
 * Electron Devices 22, 1045 (1975). Time-of-flight drift velocities from 3e2
 * to 6e4 V/cm at temperatures up to 430 K, mean square deviation of the fit
 * below 3.8 % (abstract, read in its scilit.com record), fitted with the
 * Caughey–Thomas form and the temperature laws (constants from memory)
 *
 *   v_m = A·T^a,   β = B·T^b   (T in kelvin).
 *
 * Only β at 300 K is used (1.109 for electrons, 1.213 for holes): v_m of this
 * fit is not the saturation velocity away from room temperature (at 77 K the
 * law gives 3.5e7 cm/s, about 2.8 times the measured high-field velocity),
 * and β(T) only reproduces the data together with that v_m. The saturation
 * velocity comes from Quay et al. (2000) instead (siliconSaturation.ts), and β
 * is held at its 300 K value (our assumption; see the registry notes).
 */
import type { VelocitySource } from './types';

/** Registry code of the Canali et al. (1975) silicon field exponents. */
export const CANALI_MODEL_CODE = 'canali-1975';

/** Citation and validity of the Canali et al. (1975) fit, for the model registry. */
export const CANALI_SOURCE: VelocitySource = {
  citation:
    'C. Canali, G. Majni, R. Minder, G. Ottaviani, IEEE Trans. Electron Devices 22, 1045 (1975) ' +
    '(range and 3.8 % fit deviation read in the abstract; temperature-law constants from memory)',
  validity:
    'high-purity Si, 3e2–6e4 V/cm, measured up to 430 K; only β at 300 K is used, held constant at other temperatures ' +
    '(our assumption: the fit’s β(T) only reproduces the data together with its own v_m(T), which is not the saturation velocity)',
};

/** Canali et al. (1975) temperature law of the field exponent, β = B·T^b (from memory). */
export const CANALI_FIELD_EXPONENT_LAWS = {
  electron: { prefactor: 2.57e-2, exponent: 0.66 },
  hole: { prefactor: 0.46, exponent: 0.17 },
} as const;

/** The temperature at which the Canali β is taken, K. */
export const CANALI_EXPONENT_TEMPERATURE = 300;

/**
 * Canali's β at 300 K for a carrier: 1.109 (electrons), 1.213 (holes).
 *
 * @param carrier - 'electron' or 'hole'
 * @returns β, dimensionless
 * @example canaliExponentAt300K('electron') // ≈ 1.109
 */
export function canaliExponentAt300K(carrier: 'electron' | 'hole'): number {
  const { prefactor, exponent } = CANALI_FIELD_EXPONENT_LAWS[carrier];
  return prefactor * Math.pow(CANALI_EXPONENT_TEMPERATURE, exponent);
}
