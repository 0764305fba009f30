/**
 * Low-field mobility of gallium arsenide after Sotoodeh, Khalid and
 * Rezazadeh, "Empirical low-field mobility model for III–V compounds
 * applicable in device simulation codes", J. Appl. Phys. 87, 2890 (2000):
 *
 *   μ(N, T) = μmin + (μmax·(300/T)^θ1 − μmin) / (1 + (N / (Nref·(T/300)^θ2))^λ)
 *
 * i.e. the temperature-scaled Caughey–Thomas form of materialFits.ts with
 * a = 0, b = −θ1, c = θ2, d = 0. Parameter values from memory.
 */
import type { MaterialMobilityFit } from './materialFits';

export const GALLIUM_ARSENIDE_SOTOODEH_FIT: MaterialMobilityFit = {
  code: 'sotoodeh',
  name: 'Sotoodeh, Khalid, Rezazadeh (2000) mobility of GaAs',
  materialCode: 'GaAs',
  parameters: {
    electron: {
      minimum: { value: 500, exponent: 0 },
      maximum: { value: 9400, exponent: -2.1 },
      referenceDensity: { value: 6.0e16, exponent: 3.0 },
      alpha: { value: 0.394, exponent: 0 },
    },
    hole: {
      minimum: { value: 20, exponent: 0 },
      maximum: { value: 491.5, exponent: -2.2 },
      referenceDensity: { value: 1.48e17, exponent: 3.0 },
      alpha: { value: 0.38, exponent: 0 },
    },
  },
  citation:
    'M. Sotoodeh, A. H. Khalid, A. A. Rezazadeh, J. Appl. Phys. 87, 2890 (2000), GaAs: electrons μmax 9400, ' +
    'μmin 500 cm²/(V·s), Nref 6.0e16 cm⁻³, λ 0.394, θ1 2.1, θ2 3.0; holes 491.5, 20, 1.48e17, 0.38, 2.2, 3.0 ' +
    '(values from memory)',
  validity:
    'fitted to published GaAs mobility data, about 1e14–1e19 cm⁻³ at 300 K and roughly 100–500 K (from memory); ' +
    'extrapolated outside',
  notes:
    'Default for GaAs. Not dopant-specific. Above about 1200 K (outside the validity) μmax·(300/T)^θ1 falls ' +
    'below μmin. The fit describes free-carrier mobility (used unchanged, no full-ionization correction).',
};
