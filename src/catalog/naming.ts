/** The namespace every DRIFT function lives under, and names qualified by it. */
import type { FunctionSpec } from './types';

export const NAMESPACE = 'DRIFT';

/**
 * The name a catalog entry has in formulas.
 *
 * @example qualifiedName(RESISTIVITY) // 'DRIFT.RESISTIVITY'
 */
export function qualifiedName(spec: Pick<FunctionSpec, 'name'>): string {
  return `${NAMESPACE}.${spec.name}`;
}
