/**
 * Samples in each material for the high-field tests (not a test file).
 */
import { resolveMaterial } from '../../../src/physics/materials';
import type { Sample } from '../../../src/physics/sample';
import { materialSample } from '../transportSamples';

/** A uniformly doped sample of one dopant in a material given by code. */
export function sampleIn(materialCode: string, dopant: string, density: number, temperature = 300, counterDensity = 0): Sample {
  return materialSample(resolveMaterial(materialCode), dopant, density, temperature, counterDensity);
}

/** One n-type and one p-type sample per material, at 300 K. */
export const SAMPLES_300K: readonly [string, Sample][] = [
  ['Si:P 1e16', sampleIn('Si', 'P', 1e16)],
  ['Si:B 1e17', sampleIn('Si', 'B', 1e17)],
  ['Ge:As 1e16', sampleIn('Ge', 'As', 1e16)],
  ['Ge:Ga 1e15', sampleIn('Ge', 'Ga', 1e15)],
  ['GaAs:Si 1e16', sampleIn('GaAs', 'Si', 1e16)],
  ['GaAs:Zn 1e17', sampleIn('GaAs', 'Zn', 1e17)],
  ['4H-SiC:N 1e16', sampleIn('4H-SiC', 'N', 1e16)],
];
