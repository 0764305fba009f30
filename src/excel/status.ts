/**
 * What the functions bundle tells the task pane. In the shared runtime both
 * bundles run in one page, so the functions bundle records which ids it bound
 * on the page's global object and the task pane reads that record.
 */

/** Global property holding the record; namespaced to avoid clashes. */
export const STATUS_KEY = '__driftcellFunctions';

export interface FunctionsStatus {
  /** Ids bound with CustomFunctions.associate, in catalog order. */
  readonly boundIds: readonly string[];
}

/** Records the bound ids (called by the functions bundle). */
export function publishStatus(boundIds: readonly string[], target: object = globalThis): void {
  Object.defineProperty(target, STATUS_KEY, { value: Object.freeze({ boundIds: [...boundIds] }), configurable: true });
}

/** Reads the record, or undefined if the functions bundle has not run. */
export function readStatus(source: object = globalThis): FunctionsStatus | undefined {
  const value = (source as Record<string, unknown>)[STATUS_KEY] as FunctionsStatus | undefined;
  return value && Array.isArray(value.boundIds) ? value : undefined;
}
