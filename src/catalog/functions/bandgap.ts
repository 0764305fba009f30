import { bandgap as bandgapModel } from '../../physics';
import { material, requiredTemperature } from '../common';
import { elementwise } from '../types';
import { BANDGAP_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

export const BANDGAP = elementwise({
  name: 'BANDGAP',
  summary: 'Band gap Eg of the semiconductor at a temperature, in eV.',
  help: prose`Returns the fundamental (indirect, for Si) band gap at the given lattice temperature from the
    published temperature fit listed below. The gap shrinks as the lattice warms; the fit is valid over the
    range in the model table.`,
  result: { unit: 'eV', description: 'Band gap Eg' },
  parameters: [requiredTemperature, material] as const,
  examples: [
    { formula: '=DRIFT.BANDGAP(300)', note: 'silicon at 300 K, about 1.12 eV' },
    { formula: '=DRIFT.BANDGAP(A2:A20)', note: 'a column of temperatures gives a column of gaps' },
  ],
  models: BANDGAP_MODELS,
  compute: (temperatureK, materialValue) => bandgapModel(materialValue, temperatureK),
});
