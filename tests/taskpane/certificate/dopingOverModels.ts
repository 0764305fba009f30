/**
 * What the model-spread columns must show, worked out without DRIFT.DOPINGSPREAD:
 * DRIFT.DOPING called once per silicon resistivity model, by name, and the
 * lowest and highest of those. Shared by the unit test and the browser test.
 */
import { value } from '../../catalog/support/call';

/**
 * Silicon's resistivity models, as DRIFT.DOPINGSPREAD's help lists them (src/catalog/functions/modelspread.ts):
 * f723-anchored, masetti, arora, caughey-thomas, klaassen, and astm-f723 where the standard applies.
 */
export const SILICON_MODELS = ['f723-anchored', 'masetti', 'arora', 'caughey-thomas', 'klaassen'] as const;

/**
 * Dopants for which ASTM F723 gives doping from resistivity: boron and phosphorus (its arsenic
 * equation is forward only; DEVELOPERS.md), uncompensated silicon at 23 °C. The generic acceptor
 * and donor are not among them.
 */
const F723_INVERSE_DOPANTS = new Set(['boron', 'b', 'phosphorus']);

/**
 * Lowest and highest DRIFT.DOPING over silicon's models, each model called by name.
 *
 * @param rho - resistivity, Ω·cm
 * @param code - dopant code as the check passes it
 * @param temperatureK - temperature, K (astm-f723 is only counted at 23 °C ± 0.5 K here, inside its 290–305 K)
 * @returns lowest and highest density in cm⁻³, highest/lowest − 1 and the models used
 * @example dopingOverModels(12, 'acceptor', 296.15).models // the five physics-based models, no astm-f723
 */
export function dopingOverModels(
  rho: number,
  code: string,
  temperatureK: number,
): { lowest: number; highest: number; relative: number; models: string[] } {
  if (Math.abs(temperatureK - 296.15) > 0.5) throw new Error('dopingOverModels knows the models that apply at 23 °C only');
  const models: string[] = [...SILICON_MODELS, ...(F723_INVERSE_DOPANTS.has(code.toLowerCase()) ? ['astm-f723'] : [])];
  const densities = models.map((model) => value('DOPING', rho, code, temperatureK, model));
  const lowest = Math.min(...densities);
  const highest = Math.max(...densities);
  return { lowest, highest, relative: highest / lowest - 1, models };
}
