/**
 * Low-field mobility of germanium: Hilsum's empirical relation between
 * mobility and impurity density,
 *
 *   μ(N) = μL / (1 + (N / 1e17 cm⁻³)^(1/2))
 *
 * (C. Hilsum, "Simple empirical relationship between mobility and carrier
 * concentration", Electron. Lett. 10, 259 (1974); from memory), a
 * Caughey–Thomas form with μmin = 0, Nref = 1e17 cm⁻³ and α = 1/2, with
 * germanium's lattice mobilities:
 * - at 300 K, μL = 3900 (electrons) and 1900 cm²/(V·s) (holes): S. M. Sze,
 *   K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007,
 *   Appendix, properties of Ge (from memory);
 * - versus temperature, μL ∝ T^−1.66 (electrons) and T^−2.33 (holes):
 *   F. J. Morin, J. P. Maita, Phys. Rev. 94, 1525 (1954), who give
 *   μn = 4.9e7·T^−1.66 and μp = 1.05e9·T^−2.33 cm²/(V·s) (from memory; at
 *   300 K these are 3790 and 1770, within 3 % and 7 % of Sze & Ng's values).
 *
 * The combination (Hilsum's doping law with Sze & Ng's and Morin & Maita's
 * lattice mobilities) is ours; each part is published.
 */
import type { FitParameters, MaterialMobilityFit } from './fitTypes';
import { exponentText, parameterText as t } from '../parameterText';

/** Hilsum's doping law with germanium's lattice mobilities (sources in the module comment). */
const PARAMETERS: FitParameters = {
  electron: {
    minimum: { value: 0, exponent: 0 },
    maximum: { value: 3900, exponent: -1.66 },
    referenceDensity: { value: 1e17, exponent: 0 },
    alpha: { value: 0.5, exponent: 0 },
  },
  hole: {
    minimum: { value: 0, exponent: 0 },
    maximum: { value: 1900, exponent: -2.33 },
    referenceDensity: { value: 1e17, exponent: 0 },
    alpha: { value: 0.5, exponent: 0 },
  },
};

const { electron: E, hole: H } = PARAMETERS;

export const GERMANIUM_HILSUM_FIT: MaterialMobilityFit = {
  code: 'hilsum',
  name: 'Hilsum (1974) mobility relation with germanium lattice mobilities',
  materialCode: 'Ge',
  parameters: PARAMETERS,
  parameterTable: 'src/physics/mobility/germaniumHilsum.ts',
  tests: ['tests/physics/reference/sze-ng-2007-ge-gaas.reference.test.ts', 'tests/physics/mobility/materialFits.test.ts'],
  citation:
    `C. Hilsum, Electron. Lett. 10, 259 (1974) (μ = μL/(1 + (N/${t(E.referenceDensity.value)})^${exponentText(E.alpha.value)})); ` +
    `μL(300 K) = ${t(E.maximum.value)} / ${t(H.maximum.value)} cm²/(V·s): ` +
    'S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley 2007, Appendix; ' +
    `μL ∝ T^${t(E.maximum.exponent)} / T^${t(H.maximum.exponent)}: ` +
    'F. J. Morin, J. P. Maita, Phys. Rev. 94, 1525 (1954) (all from memory)',
  validity:
    'doping law: 300 K, about 1e14–1e19 cm⁻³ (a rule of thumb, tens of per cent); lattice laws: about ' +
    '100–300 K (from memory); extrapolated outside',
  notes:
    'Default for Ge. Not dopant-specific. The impurity term has no temperature law (Hilsum gives none), so ' +
    'at low temperature the mobility of doped Ge is overestimated. The fit describes free-carrier mobility ' +
    '(used unchanged, no full-ionization correction).',
};
