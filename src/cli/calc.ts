/**
 * `driftcell calc '<formula>'`: evaluates one formula and prints its result.
 */
import { evaluateFormula } from '../engine/engine';
import { EXIT_OK, EXIT_RESULT_ERROR, type Output } from './failure';
import { formatResult } from './format';

/**
 * Evaluates a formula and prints the result: a value on one line, a spill as
 * tab-separated rows (the messages of error elements go to stderr).
 *
 * @param formula - e.g. `DRIFT.RESISTIVITY(1e15,"B")`, with or without `=`
 * @returns the exit status: 1 when every element of the result is an error, else 0
 */
export function runCalc(formula: string, output: Output): number {
  const formatted = formatResult(evaluateFormula(formula));
  formatted.lines.forEach(output.out);
  formatted.notes.forEach(output.err);
  return formatted.allErrors ? EXIT_RESULT_ERROR : EXIT_OK;
}
