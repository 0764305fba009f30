/**
 * Named objects the `@example` lines of src/physics use, for
 * tests/physics/docExamples.test.ts (not a test file). Names say what they
 * are: a silicon dopant by its element name (`boron`), a silicon sample by
 * dopant, density and temperature (`phosphorus1e16At300K`: 1e16 cm⁻³ of P at
 * 300 K, no counter-doping), a sample without its density, as the inverse
 * functions take it, by dopant and temperature (`boronAt300K`). Every name
 * here must differ from every export of src/physics (the test checks it).
 */
import { SILICON } from '../../../src/physics/materials';
import { resolveDopant, type Dopant } from '../../../src/physics/dopants';
import type { Sample } from '../../../src/physics/sample';

const dopant = (code: string): Dopant => resolveDopant(SILICON, code);
const silicon = (dopantCode: string, density: number, temperature: number, counterDensity = 0): Sample => ({
  material: SILICON,
  temperature,
  dopant: dopant(dopantCode),
  density,
  counterDensity,
});
const siliconWithoutDensity = (dopantCode: string, temperature: number): Omit<Sample, 'density'> => ({
  material: SILICON,
  temperature,
  dopant: dopant(dopantCode),
  counterDensity: 0,
});

export const boron = dopant('B');
export const phosphorus = dopant('phosphorus');
export const arsenic = dopant('As');

export const phosphorus1e15At300K = silicon('phosphorus', 1e15, 300);
export const phosphorus1e16At300K = silicon('phosphorus', 1e16, 300);
export const phosphorus1e18At300K = silicon('phosphorus', 1e18, 300);
export const phosphorus1e17At77K = silicon('phosphorus', 1e17, 77);
export const boron1e16At300K = silicon('B', 1e16, 300);
export const boron1e18At300K = silicon('B', 1e18, 300);
export const boron1e19At300K = silicon('B', 1e19, 300);
export const arsenic1e18At300K = silicon('As', 1e18, 300);
/** 1e16 cm⁻³ phosphorus counter-doped with 2e16 cm⁻³ generic acceptor: net p-type. */
export const phosphorus1e16CounterDoped2e16At300K = silicon('phosphorus', 1e16, 300, 2e16);

export const boronAt300K = siliconWithoutDensity('B', 300);
export const boronAt296K = siliconWithoutDensity('B', 296.15);
export const phosphorusAt300K = siliconWithoutDensity('phosphorus', 300);
export const phosphorusAt77K = siliconWithoutDensity('phosphorus', 77);
