/**
 * Custom-functions entry point (bundled as functions.js): binds every catalog
 * function to Excel. Loaded outside Excel, where no CustomFunctions runtime
 * exists, it binds nothing and does not throw.
 */
import { CATALOG } from '../catalog';
import { registerCatalog, type CustomFunctionsRuntime } from './register';
import { publishStatus } from './status';

/** The runtime Excel provides as the global `CustomFunctions`, if present. */
function findRuntime(): CustomFunctionsRuntime | undefined {
  const candidate = (globalThis as { CustomFunctions?: Partial<CustomFunctionsRuntime> }).CustomFunctions;
  if (candidate === undefined || candidate === null) return undefined;
  if (typeof candidate.associate !== 'function' || typeof candidate.Error !== 'function') return undefined;
  return candidate as CustomFunctionsRuntime;
}

/**
 * Binds the catalog if a runtime is present.
 *
 * @returns the ids bound; empty outside Excel
 */
export function registerWithExcel(): string[] {
  const runtime = findRuntime();
  if (runtime === undefined) return [];
  try {
    return registerCatalog(runtime, CATALOG);
  } catch (e) {
    // A page opened in a plain browser may carry a CustomFunctions object that refuses bindings.
    console.error(`Driftcell could not bind its functions: ${e instanceof Error ? e.message : String(e)}`);
    return [];
  }
}

export const registeredIds: readonly string[] = registerWithExcel();
publishStatus(registeredIds);
