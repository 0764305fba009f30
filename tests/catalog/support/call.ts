/** Calls a catalog function on single values, as tests of user-facing behaviour need. */
import { evaluate, findFunction, isFailure, type ArgumentInput, type CellOutput } from '../../../src/catalog';

/** The number a function gives, or a thrown error saying what it gave instead. */
export function value(name: string, ...args: ArgumentInput[]): number {
  const spec = findFunction(name);
  if (!spec) throw new Error(`no ${name}`);
  const result = evaluate(spec, args)[0][0];
  if (typeof result !== 'number') throw new Error(`${name} gave ${JSON.stringify(result)}`);
  return result;
}

/** "CODE message" of the error a function gives, or a thrown error if it gave a value. */
export function message(name: string, ...args: ArgumentInput[]): string {
  const result: CellOutput = evaluate(findFunction(name)!, args)[0][0];
  if (!isFailure(result)) throw new Error(`${name} gave ${JSON.stringify(result)}, not an error`);
  return `${result.code} ${result.message}`;
}
