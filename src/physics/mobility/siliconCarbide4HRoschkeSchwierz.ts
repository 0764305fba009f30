/**
 * Low-field mobility of 4H silicon carbide (perpendicular to the c axis).
 *
 * Electrons: M. Roschke, F. Schwierz, "Electron mobility models for 4H, 6H,
 * and 3C SiC", IEEE Trans. Electron Devices 48, 1442 (2001): a Caughey–Thomas
 * form whose μmax and μmin follow power laws of T/300 K. Recalled 4H values:
 * μmax = 950, μmin = 40 cm²/(V·s), Nref = 2e17 cm⁻³, α = 0.76, μmax ∝ Tn^−2.4,
 * μmin ∝ Tn^−0.5. Uncertainty: these are from memory and we are not sure of
 * them; another set often quoted for 4H-SiC electrons at 300 K (μmax 947,
 * μmin 0, Nref 1.94e17, α 0.61; Schaffer et al. below) gives the same curve
 * within 10 % from 1e15 to 1e19 cm⁻³ (checked in the reference tests), so the
 * 300 K curve is better known than any single coefficient. Nref and α are
 * taken as temperature-independent (we do not recall a law for them).
 *
 * Holes: Roschke & Schwierz treat electrons only (as we recall the title).
 * The 300 K hole parameters are those commonly quoted for 4H-SiC from
 * W. J. Schaffer, G. H. Negley, K. G. Irvine, J. W. Palmour, Mater. Res. Soc.
 * Symp. Proc. 339, 595 (1994): μmax = 124, μmin = 15.9 cm²/(V·s),
 * Nref = 1.76e19 cm⁻³, α = 0.34 (from memory, attribution uncertain). For the
 * temperature dependence the whole curve follows the lattice law Tn^−2.15
 * quoted for 4H-SiC holes by Levinshtein et al. (2001) (from memory,
 * uncertain); scaling μmin with it too is our assumption, which keeps μmax > μmin
 * at every temperature.
 */
import type { FitParameters, MaterialMobilityFit, ScaledCaugheyThomasParameters } from './fitTypes';
import { parameterText as t } from '../parameterText';

/** Roschke & Schwierz (2001) electrons, Schaffer et al. (1994) holes at 300 K with Levinshtein's lattice law (module comment). */
const PARAMETERS: FitParameters = {
  electron: {
    minimum: { value: 40, exponent: -0.5 },
    maximum: { value: 950, exponent: -2.4 },
    referenceDensity: { value: 2e17, exponent: 0 },
    alpha: { value: 0.76, exponent: 0 },
  },
  hole: {
    minimum: { value: 15.9, exponent: -2.15 },
    maximum: { value: 124, exponent: -2.15 },
    referenceDensity: { value: 1.76e19, exponent: 0 },
    alpha: { value: 0.34, exponent: 0 },
  },
};

/** μmax, μmin, Nref and α of one carrier at 300 K, as the citation lists them. */
function curveValues(p: ScaledCaugheyThomasParameters): string {
  return `μmax ${t(p.maximum.value)}, μmin ${t(p.minimum.value)}, Nref ${t(p.referenceDensity.value)}, α ${t(p.alpha.value)}`;
}

const { electron: E, hole: H } = PARAMETERS;

export const SILICON_CARBIDE_4H_ROSCHKE_SCHWIERZ_FIT: MaterialMobilityFit = {
  code: 'roschke-schwierz',
  name: 'Roschke & Schwierz (2001) electron mobility of 4H-SiC, with Schaffer et al. (1994) holes',
  materialCode: '4H-SiC',
  parameters: PARAMETERS,
  parameterTable: 'src/physics/mobility/siliconCarbide4HRoschkeSchwierz.ts',
  tests: ['tests/physics/reference/roschke-schwierz-2001.reference.test.ts', 'tests/physics/mobility/materialFits.test.ts'],
  citation:
    `electrons: M. Roschke, F. Schwierz, IEEE Trans. Electron Devices 48, 1442 (2001), 4H-SiC (${curveValues(E)}, ` +
    `exponents ${t(E.maximum.exponent)} and ${t(E.minimum.exponent)}; from memory, uncertain); holes: W. J. Schaffer et al., ` +
    `Mater. Res. Soc. Symp. Proc. 339, 595 (1994) (${curveValues(H)}; from memory, ` +
    `attribution uncertain), T^${t(H.maximum.exponent)} after Levinshtein et al., Properties of Advanced Semiconductor Materials, ` +
    'Wiley 2001 (from memory)',
  validity:
    'electrons: about 1e15–1e20 cm⁻³, roughly 200–600 K (from memory); holes: 300 K fit, about 1e15–1e20 cm⁻³; ' +
    'extrapolated outside; transport perpendicular to the c axis',
  notes:
    'Default for 4H-SiC. Not dopant-specific. The hole temperature law scales the whole 300 K curve ' +
    '(assumption). The fits describe free-carrier (Hall) mobility (used unchanged, no full-ionization ' +
    'correction). Above about 1600 K (outside the validity) the electron μmax falls below μmin.',
};
