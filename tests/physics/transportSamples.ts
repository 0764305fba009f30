/**
 * Sample construction shared by the transport tests (not a test file).
 */
import { SILICON, type Material } from '../../src/physics/materials';
import { resolveDopant } from '../../src/physics/dopants';
import type { Sample } from '../../src/physics/sample';

/** A sample of one dopant in any material, optionally counter-doped. */
export function materialSample(material: Material, dopant: string, density: number, temperature = 300, counterDensity = 0): Sample {
  return { material, temperature, dopant: resolveDopant(material, dopant), density, counterDensity };
}

/** A silicon sample of one dopant, optionally counter-doped. */
export function siliconSample(dopant: string, density: number, temperature = 300, counterDensity = 0): Sample {
  return materialSample(SILICON, dopant, density, temperature, counterDensity);
}

/** The same sample without its density, as dopingForResistivity takes it. */
export function siliconSampleWithoutDensity(dopant: string, temperature = 300, counterDensity = 0): Omit<Sample, 'density'> {
  return { material: SILICON, temperature, dopant: resolveDopant(SILICON, dopant), counterDensity };
}

/** Densities 10^from … 10^to in steps of 1/perDecade decade. */
export function logSpaced(from: number, to: number, perDecade: number): number[] {
  const out: number[] = [];
  const count = Math.round((to - from) * perDecade);
  for (let i = 0; i <= count; i++) out.push(10 ** (from + i / perDecade));
  return out;
}
