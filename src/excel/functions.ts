/**
 * Custom-functions entry point (bundled as functions.js): binds every catalog
 * function to Excel. Office.js defines `CustomFunctions.associate` before this
 * bundle runs; that is all binding needs (see register.ts for why Error is
 * looked up later). Loaded outside Excel, where no CustomFunctions object
 * exists, it binds nothing and does not throw.
 */
import { CATALOG } from '../catalog';
import { registerCatalog, type CustomFunctionsBinder, type CustomFunctionsErrors } from './register';
import { publishStatus } from './status';

type CustomFunctionsGlobal = Partial<CustomFunctionsBinder & CustomFunctionsErrors>;

function customFunctionsGlobal(): CustomFunctionsGlobal | undefined {
  const candidate = (globalThis as { CustomFunctions?: CustomFunctionsGlobal | null }).CustomFunctions;
  return candidate === undefined || candidate === null ? undefined : candidate;
}

/** CustomFunctions as office.js defines it, if it can bind. */
function findBinder(): CustomFunctionsBinder | undefined {
  const candidate = customFunctionsGlobal();
  return candidate !== undefined && typeof candidate.associate === 'function' ? (candidate as CustomFunctionsBinder) : undefined;
}

/** CustomFunctions.Error and ErrorCode as they are now (read on each call: the runtime defines them after load). */
export function currentErrors(): CustomFunctionsErrors | undefined {
  const candidate = customFunctionsGlobal();
  return candidate !== undefined && typeof candidate.Error === 'function' ? (candidate as CustomFunctionsErrors) : undefined;
}

/**
 * Binds the catalog if office.js has defined CustomFunctions.associate.
 *
 * @returns the ids bound; empty outside Excel
 */
export function registerWithExcel(): string[] {
  const binder = findBinder();
  if (binder === undefined) return [];
  try {
    return registerCatalog(binder, CATALOG, currentErrors);
  } catch (e) {
    // A page opened in a plain browser may carry a CustomFunctions object that refuses bindings.
    console.error(`Driftcell could not bind its functions: ${e instanceof Error ? e.message : String(e)}`);
    return [];
  }
}

export const registeredIds: readonly string[] = registerWithExcel();
publishStatus(registeredIds);
