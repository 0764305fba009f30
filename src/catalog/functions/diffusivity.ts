import { carrierFor, diffusivity } from '../../physics';
import { carrier, counterDoping, dopant, doping, material, mobilityModel, sampleOf, temperature } from '../common';
import { elementwise } from '../types';
import { EQUILIBRIUM_MODELS, MOBILITY_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const DIFFUSIVITY = elementwise({
  name: 'DIFFUSIVITY',
  summary: 'Carrier diffusion coefficient from the (generalized) Einstein relation D = μ·kT/q·F½/F−½, in cm²/s.',
  help: prose`Returns the diffusion coefficient of electrons or holes from the generalized Einstein relation D
    = μ·(kT/q)·F½(η)/F−½(η), with μ exactly as DRIFT.MOBILITY returns it for the same arguments (the named
    model as published; a blank model chooses klaassen for Si minority carriers, masetti for majority
    carriers, see DRIFT.MOBILITY) and η the carrier's reduced Fermi level from the same equilibrium as
    DRIFT.ELECTRONS and DRIFT.HOLES (Fermi–Dirac statistics, parabolic bands). For non-degenerate carriers the
    factor F½/F−½ is 1 and D = μ·kT/q; for degenerate majority carriers (above about 1e19 cm⁻³ at 300 K) D is
    larger than μ·kT/q. Bandgap narrowing and band tails are not included.`,
  result: { unit: 'cm²/s', description: 'Diffusion coefficient' },
  parameters: [doping, dopant, temperature, carrier, mobilityModel, material, counterDoping] as const,
  examples: [
    { formula: '=DRIFT.DIFFUSIVITY(1e17,"B",300,"minority")', note: 'minority electrons in a p-type base' },
    { formula: '=DRIFT.DIFFUSIVITY(1e15,"phosphorus")', note: 'electrons in lightly doped n-type Si' },
  ],
  models: [...MOBILITY_MODELS, ...EQUILIBRIUM_MODELS],
  compute: (density, dopantCode, temperatureK, role, model, materialValue, counter) => {
    const sample = sampleOf(materialValue, temperatureK, dopantCode, density, counter);
    return diffusivity(model, carrierFor(sample.dopant, role), sample);
  },
});
