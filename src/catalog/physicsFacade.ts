/**
 * The physics the pane and the other front ends use directly, re-exported by
 * the catalog: front ends reach src/physics only through src/catalog (the
 * layer rule in eslint.config.mjs), so what they need beyond the catalog's
 * functions is named here, once, rather than imported from the core.
 *
 * @example
 * import { resolveMaterial } from '../../catalog/physicsFacade';
 * resolveMaterial('si').code // → 'Si'
 */
export {
  // Typed dopant and material codes (the certificate's type column).
  readDopant,
  resolveMaterial,
  typedDopantCodes,
  // The temperature ASTM F723 anchors its conversion to (certificate options).
  F723_ANCHOR_TEMPERATURE,
  // The model registry and the core's domain error (the function reference).
  PhysicsDomainError,
  modelInfo,
  type ModelInfo,
} from '../physics';
