import { SILICON, implantedLayerSheetResistance, resolveDopant } from '../../physics';
import { dopant, temperature } from '../common';
import { requiredNumber } from '../parameters';
import { elementwise } from '../types';
import { background, layerLength } from './layerParameters';
import { prose } from '../../text/prose';

const dose = requiredNumber({
  name: 'dose_cm2',
  unit: 'cm⁻²',
  description: 'Implanted dose Φ in cm⁻², > 0.',
  min: 0,
  minExclusive: true,
});

const range = layerLength('range_um', 'Projected range Rp (depth of the peak)', 0);

const straggle = layerLength('straggle_um', 'Straggle ΔRp (standard deviation of the depth)');

export const IMPLANTSHEETRES = elementwise({
  name: 'IMPLANTSHEETRES',
  summary: 'Sheet resistance of an as-implanted Gaussian layer from dose, range and straggle, in Ω/sq.',
  help: prose`Returns Rs = 1/∫σ(x)dx of an implanted silicon layer with the Gaussian profile N(x) =
    Φ/(√(2π)ΔRp)·exp(−(x−Rp)²/(2ΔRp²)). The Gaussian is truncated at the surface: the part that would lie
    above x = 0 is lost, not reflected back, so for a shallow implant (Rp less than about 2ΔRp) the dose
    retained in the silicon is less than Φ. The layer conducts where N(x) exceeds the opposite-type
    background: from the surface down to one junction, or, when N(0) is below the background, a buried layer
    between two junctions. The local conductivity is that of uniform silicon with the named dopant at N(x)
    over the background (incomplete ionization, compensation, the default mobility model), integrated to
    better than 0.1 %.

    Assumption: as-implanted, fully activated, no damage. A real implant needs an anneal to activate it, which
    also moves the profile; amorphous-target Gaussians ignore channelling tails and the skew of light ions
    such as boron. Carrier densities use Fermi–Dirac statistics; band-gap narrowing is not applied to them
    (DRIFT.NIEFF reports it separately), so peaks above about 1e19 cm⁻³ give approximate results.`,
  result: { unit: 'Ω/sq', description: 'Sheet resistance Rs of the implanted layer' },
  parameters: [dose, range, straggle, background, dopant, temperature] as const,
  examples: [
    { formula: '=DRIFT.IMPLANTSHEETRES(1e14,0.1,0.04,1e15,"B")', note: 'a boron implant in 1e15 cm⁻³ n-type silicon, fully activated' },
    { formula: '=DRIFT.IMPLANTSHEETRES(1e12,0.5,0.1,1e15,"phosphorus")', note: 'a buried phosphorus layer: two junctions' },
    { formula: '=DRIFT.IMPLANTSHEETRES({1e12;1e13;1e14;1e15},0.1,0.04,1e15,"B")', note: 'a dose sweep' },
  ],
  models: ['irvin-layers', 'lss-gaussian-implant', 'masetti'],
  compute: (doseCm2, rangeUm, straggleUm, nb, dopantCode, temperatureK) =>
    implantedLayerSheetResistance({
      dose: doseCm2,
      rangeUm,
      straggleUm,
      background: nb,
      dopant: resolveDopant(SILICON, dopantCode),
      temperature: temperatureK,
      material: SILICON,
    }),
});
