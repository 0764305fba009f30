/**
 * Parameters shared by the layer functions (LAYERSHEETRES, IMPLANTSHEETRES,
 * JUNCTIONDEPTH): the profile code, the surface concentration and the
 * background that defines the junction.
 */
import { DEFAULT_PROFILE, PROFILE_CODES, type ProfileCode } from '../../physics';
import { MAX_DENSITY } from '../common';
import { codeParameter, requiredNumber } from '../parameters';
import { prose } from '../../text/prose';

export const profile = codeParameter<ProfileCode>({
  name: 'profile',
  description: prose`Diffusion profile: gaussian (limited-source drive-in) or erfc (constant-source
    predeposition); blank means ${DEFAULT_PROFILE}.`,
  choices: () => PROFILE_CODES,
  defaultCode: DEFAULT_PROFILE,
  resolve: (code) => code as ProfileCode,
});

export const surfaceConcentration = requiredNumber({
  name: 'surface_conc',
  unit: 'cm⁻³',
  description: `Dopant density at the surface Ns in cm⁻³, > background and ≤ ${MAX_DENSITY}.`,
  min: 0,
  minExclusive: true,
  max: MAX_DENSITY,
});

/** Lowest background accepted, cm⁻³: far below the purest silicon made, and keeps Ns/NB finite. */
export const MIN_BACKGROUND = 1;

export const background = requiredNumber({
  name: 'background',
  unit: 'cm⁻³',
  description: `Uniform background doping of the opposite type (the substrate or well) in cm⁻³, ${MIN_BACKGROUND} to ${MAX_DENSITY}.`,
  min: MIN_BACKGROUND,
  max: MAX_DENSITY,
});

/**
 * Layer dimensions accepted, µm: from 1e-4 µm (0.1 nm, under one atomic
 * layer) to 1e4 µm (1 cm, thicker than any wafer). Outside, no layer exists
 * and the profile arithmetic would underflow or overflow.
 */
export const LAYER_LENGTH_UM = { min: 1e-4, max: 1e4 } as const;

/** A layer depth or length in µm within LAYER_LENGTH_UM. */
export function layerLength(name: string, what: string, min: number = LAYER_LENGTH_UM.min) {
  return requiredNumber({
    name,
    unit: 'µm',
    description: `${what} in µm, ${min} to ${LAYER_LENGTH_UM.max}.`,
    min,
    max: LAYER_LENGTH_UM.max,
  });
}
