import { SILICON, diffusedLayerSheetResistance, resolveDopant } from '../../physics';
import { dopant, temperature } from '../common';
import { elementwise } from '../types';
import { background, layerLength, profile, surfaceConcentration } from './layerParameters';
import { prose } from '../../text/prose';

export const LAYERSHEETRES = elementwise({
  name: 'LAYERSHEETRES',
  summary: 'Sheet resistance of a diffused layer (Gaussian or erfc profile) from Ns, xj and background, in Ω/sq.',
  help: prose`Returns Rs = 1/∫σ(x)dx of a diffused silicon layer, integrating the local conductivity σ(x) =
    q[n(x)μn(x) + p(x)μp(x)] from the surface down to the metallurgical junction, the way Irvin (1962) built
    his curves. The profile is N(x) = Ns·exp(−(x/L)²) (gaussian, the default: the drive-in from a fixed dose
    that ends most resistor, base and well diffusions) or N(x) = Ns·erfc(x/L) (erfc: a predeposition at fixed
    surface concentration), with L chosen so that N(xj) equals the background. At each depth the carriers and
    mobilities are those of uniform silicon holding the named dopant at N(x) over the opposite-type background
    (incomplete ionization, compensation, the default mobility model), so the temperature argument shows
    freeze-out and lattice scattering. Only the region above the junction conducts: the junction isolates the
    layer from the substrate.

    Cautions: the profiles are ideal as-diffused shapes (real high-concentration phosphorus and arsenic
    diffusions are not Gaussian or erfc); depletion at the junction is ignored, which matters only for very
    thin or lightly doped layers; carrier densities use Fermi–Dirac statistics but no band-gap narrowing
    (DRIFT.NIEFF reports it separately), so above about 1e19 cm⁻³ the carrier densities and Rs are
    approximate, and surface concentrations above solid solubility (about 1e20–5e20 cm⁻³) are not physical. At
    high temperature, when the intrinsic density approaches the background, the junction no longer isolates
    the layer; the result then describes only the region above the junction. The integral is accurate to
    better than 0.1 %; the model, not the arithmetic, limits the result. DRIFT.JUNCTIONDEPTH turns a diffusion
    length into the xj this function takes.`,
  result: { unit: 'Ω/sq', description: 'Sheet resistance Rs of the layer' },
  parameters: [
    surfaceConcentration,
    layerLength('junction_depth_um', 'Metallurgical junction depth xj'),
    background,
    dopant,
    profile,
    temperature,
  ] as const,
  examples: [
    { formula: '=DRIFT.LAYERSHEETRES(1e19,2,1e15,"B")', note: 'a 2 µm Gaussian boron layer in 1e15 cm⁻³ n-type silicon: about 120 Ω/sq' },
    {
      formula: '=DRIFT.LAYERSHEETRES(1e20,1,1e16,"phosphorus","erfc")',
      note: 'a 1 µm phosphorus predeposition in 1e16 cm⁻³ p-type silicon',
    },
    { formula: '=DRIFT.LAYERSHEETRES(1e19,2,1e15,"B",,{250,300,350,400})', note: 'the same boron layer from 250 K to 400 K' },
  ],
  models: ['irvin-layers', 'gaussian', 'erfc', 'masetti'],
  compute: (ns, xjUm, nb, dopantCode, profileCode, temperatureK) =>
    diffusedLayerSheetResistance({
      profile: profileCode,
      surfaceConcentration: ns,
      junctionDepthUm: xjUm,
      background: nb,
      dopant: resolveDopant(SILICON, dopantCode),
      temperature: temperatureK,
      material: SILICON,
    }),
});
