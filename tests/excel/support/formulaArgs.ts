/**
 * Reads a catalog example formula such as `=DRIFT.INTRINSIC(300,,"sproul-green")` or
 * `=DRIFT.MINORITY(1e15,"B",{300,400,500})` into its arguments, when every
 * argument is a literal (number, text, TRUE/FALSE, array constant or left
 * out). Formulas with cell references or nested calls give null: they need a
 * worksheet, which these tests do not have. The parser is the catalog's own
 * (src/catalog/literalCall.ts), shared with the task pane's function reference.
 */
import { parseLiteralCall, type LiteralCall } from '../../../src/catalog/literalCall';

export { parseLiteralCall, type LiteralCall };

/**
 * The arguments as Excel passes them to a custom function whose parameters are
 * all `matrix`: each given value as a 2-D array, each left-out argument
 * (typed empty or not typed at all) as null, and an invocation object last.
 */
export function excelShapedArgs(call: LiteralCall, parameterCount: number): unknown[] {
  const shaped: unknown[] = [];
  for (let i = 0; i < parameterCount; i++) {
    const a = call.args[i];
    shaped.push(a === undefined ? null : Array.isArray(a) ? a : [[a]]);
  }
  shaped.push({ functionName: call.name });
  return shaped;
}
