import { junctionDepth } from '../../physics';
import { elementwise } from '../types';
import { background, layerLength, profile, surfaceConcentration } from './layerParameters';
import { prose } from '../../text/prose';

export const JUNCTIONDEPTH = elementwise({
  name: 'JUNCTIONDEPTH',
  summary: 'Metallurgical junction depth xj of a Gaussian or erfc diffusion, in µm.',
  help: prose`Returns the depth at which a diffused profile falls to the opposite-type background: xj =
    L·sqrt(ln(Ns/NB)) for a Gaussian, xj = L·erfcinv(NB/Ns) for an erfc profile, with L the characteristic
    length (2·sqrt(D·t) for a diffusion coefficient D and time t). Feed the result to DRIFT.LAYERSHEETRES,
    which uses the same profiles. Ideal as-diffused profiles only; real high-concentration diffusions have
    other shapes.`,
  result: { unit: 'µm', description: 'Junction depth xj' },
  parameters: [
    surfaceConcentration,
    layerLength('characteristic_length_um', 'Characteristic length L of the profile, 2·sqrt(D·t),'),
    background,
    profile,
  ] as const,
  examples: [
    { formula: '=DRIFT.JUNCTIONDEPTH(1e19,0.5,1e15)', note: 'Gaussian, L = 0.5 µm: about 1.52 µm' },
    { formula: '=DRIFT.JUNCTIONDEPTH(1e20,0.2,1e16,"erfc")', note: 'erfc, L = 0.2 µm: about 0.55 µm' },
    {
      formula: '=DRIFT.LAYERSHEETRES(1e19,DRIFT.JUNCTIONDEPTH(1e19,0.5,1e15),1e15,"B")',
      note: 'sheet resistance of that Gaussian boron layer',
    },
  ],
  models: ['gaussian', 'erfc'],
  compute: (ns, lengthUm, nb, profileCode) => junctionDepth(profileCode, ns, lengthUm, nb),
});
