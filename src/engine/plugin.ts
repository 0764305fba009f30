/**
 * The catalog as a HyperFormula function plugin: every `DRIFT.NAME` of the
 * catalog, with the catalog's argument order. The plugin only converts values;
 * broadcasting, argument checks and error messages all come from the
 * catalog's evaluate(), so a formula gives the same result here as in Excel.
 *
 * HyperFormula fixes the size of a formula's spill when it reads the formula,
 * before any value is known. The size is predicted the way the catalog
 * broadcasts: as many rows as the tallest argument and as many columns as the
 * widest, where an argument's shape comes from the formula text (a range, an
 * inline array {1,2,3}, array arithmetic such as A2:A9*1e15, or a nested call,
 * DRIFT or built-in, whose own size is predicted the same way).
 *
 * A row function (DRIFT.MODELCODES) is the exception: its length follows its
 * arguments' values. When they are literals in the formula text (text,
 * numbers, TRUE/FALSE, blanks, left out) the prediction computes the row from
 * them, so it is exact, also nested inside another DRIFT function's argument.
 * HyperFormula fixes the size once, when it reads the formula, and keeps it
 * when a referenced cell changes (a larger result would not fit, a smaller
 * one would leave blank cells in its area), so a cell reference or computed
 * argument makes the call an error that says to type the arguments instead.
 */
import { ArraySize, CellError, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula } from 'hyperformula';
import type { FunctionArgument, ImplementedFunctions } from 'hyperformula';
import type { InterpreterState } from 'hyperformula/typings/interpreter/InterpreterState';
import type { InterpreterValue } from 'hyperformula/typings/interpreter/InterpreterValue';
import type { Ast, ProcedureAst } from 'hyperformula/typings/parser';
import { CATALOG } from '../catalog';
import type { ArgumentInput, CellInput } from '../catalog/values';
import { evaluate } from '../catalog/broadcast';
import { qualifiedName } from '../catalog/naming';
import type { FunctionSpec } from '../catalog/types';
import { toArgumentInput, toInterpreterValue } from './convert';

/** Name of the plugin method every DRIFT function is evaluated by. */
const EVALUATE_METHOD = 'evaluateDriftFunction';
/** Name of the plugin method that predicts every DRIFT function's result size. */
const SIZE_METHOD = 'predictDriftResultSize';

const SPEC_BY_QUALIFIED_NAME = new Map(CATALOG.map((spec) => [qualifiedName(spec), spec]));

function specFor(procedureName: string): FunctionSpec {
  const spec = SPEC_BY_QUALIFIED_NAME.get(procedureName.toUpperCase());
  // HyperFormula only calls the plugin for names it registered, so a miss is a wiring fault.
  if (spec === undefined) throw new Error(`${procedureName} is not a catalog function`);
  return spec;
}

function argumentMetadata(spec: FunctionSpec): FunctionArgument[] {
  // ANY: the plugin receives ranges whole and broadcasts through the catalog, never through HyperFormula.
  return spec.parameters.map((parameter) => ({ argumentType: FunctionArgumentType.ANY, optionalArg: parameter.optional }));
}

function implementedFunctions(): ImplementedFunctions {
  const functions: ImplementedFunctions = {};
  for (const spec of CATALOG) {
    functions[qualifiedName(spec)] = {
      method: EVALUATE_METHOD,
      sizeOfResultArrayMethod: SIZE_METHOD,
      parameters: argumentMetadata(spec),
      // Arguments are evaluated as arrays (A2:A9*1e15 stays a column), as in Excel's dynamic arrays.
      enableArrayArithmeticForArguments: true,
      vectorizationForbidden: true,
    };
  }
  return functions;
}

/** The same state with array arithmetic on, as the arguments are evaluated. */
function arrayState(state: InterpreterState): InterpreterState {
  return { formulaAddress: state.formulaAddress, arraysFlag: true, formulaVertex: state.formulaVertex };
}

/** The catalog's functions as one HyperFormula plugin class. */
export class DriftFunctionPlugin extends FunctionPlugin {
  static override implementedFunctions: ImplementedFunctions = implementedFunctions();

  /** Evaluates any DRIFT function: arguments to catalog inputs, catalog evaluate(), result back. */
  evaluateDriftFunction(ast: ProcedureAst, state: InterpreterState): InterpreterValue {
    const spec = specFor(ast.procedureName);
    if (spec.kind === 'row' && ast.args.length <= spec.parameters.length && literalArguments(ast.args) === undefined) {
      // The row's length could not be known when the formula was read (see the module note).
      return new CellError(ErrorType.VALUE, rowNeedsLiteralsMessage(spec));
    }
    const argumentState = arrayState(state);
    const args = ast.args.map((argument) => toArgumentInput(this.evaluateAst(argument, argumentState)));
    const grid = evaluate(spec, args);
    const rows = grid.length;
    const columns = grid[0].length;
    // A single value always fits the predicted area (at least 1×1); only larger results are checked.
    const predicted = rows === 1 && columns === 1 ? ArraySize.scalar() : this.predictDriftResultSize(ast, state);
    if (rows > predicted.height || columns > predicted.width) {
      // The spill area was fixed when the formula was read; a larger result cannot be shown in it.
      return new CellError(
        ErrorType.VALUE,
        `${qualifiedName(spec)} gives ${rows}×${columns} values, but its arguments' shapes could only be ` +
          `foreseen as ${predicted.height}×${predicted.width} (an argument's size depends on computed values); ` +
          `pass ranges or inline arrays of the wanted size instead`,
      );
    }
    return toInterpreterValue(grid);
  }

  /** Predicts a DRIFT function's result size from its arguments' shapes, as the catalog broadcasts. */
  predictDriftResultSize(ast: ProcedureAst, state: InterpreterState): ArraySize {
    const spec = specFor(ast.procedureName);
    // Too many arguments: the catalog answers with one error.
    if (ast.args.length > spec.parameters.length) return ArraySize.scalar();
    if (spec.kind === 'table') {
      const table = spec.table();
      return new ArraySize(table[0]?.length ?? 1, table.length || 1);
    }
    if (spec.kind === 'row') {
      // Exact from literal arguments; otherwise evaluation gives one error (rowNeedsLiteralsMessage).
      const literal = literalArguments(ast.args);
      if (literal === undefined) return ArraySize.scalar();
      const row = evaluate(spec, literal);
      return new ArraySize(row[0].length, row.length);
    }
    const argumentState = arrayState(state);
    let width = 1;
    let height = 1;
    (ast.args as Ast[]).forEach((argument, index) => {
      // A reducing argument is consumed whole and does not shape the result.
      if (spec.parameters[index]?.reduce) return;
      const size = this.arraySizeForAst(argument, argumentState);
      width = Math.max(width, size.width);
      height = Math.max(height, size.height);
    });
    if (spec.kind === 'tuple') {
      // One row of fixed width per argument row; wider arguments get the catalog's single error.
      return width > 1 ? ArraySize.scalar() : new ArraySize(spec.columns.length, height);
    }
    return new ArraySize(width, height);
  }
}

/** One literal scalar of a formula (text, number, signed number, TRUE/FALSE, an empty argument), or undefined. */
function literalScalar(ast: Ast): CellInput | undefined {
  switch (ast.type as string) {
    case 'EMPTY':
      return null;
    case 'NUMBER':
    case 'STRING':
      return (ast as { value: number | string }).value;
    case 'MINUS_UNARY_OP':
    case 'PLUS_UNARY_OP': {
      const inner = literalScalar((ast as { value: Ast }).value);
      if (typeof inner !== 'number') return undefined;
      return (ast.type as string) === 'MINUS_UNARY_OP' ? -inner : inner;
    }
    case 'PARENTHESIS':
      return literalScalar((ast as { expression: Ast }).expression);
    case 'FUNCTION_CALL': {
      const call = ast as ProcedureAst;
      if (call.args.length !== 0) return undefined;
      if (call.procedureName.toUpperCase() === 'TRUE') return true;
      if (call.procedureName.toUpperCase() === 'FALSE') return false;
      return undefined;
    }
    default:
      return undefined;
  }
}

/**
 * A call's arguments as the catalog would receive them, when every one is a
 * literal or an inline array of literals; undefined when any is a reference,
 * a name or computed, whose value the formula text does not hold.
 */
function literalArguments(args: readonly Ast[]): ArgumentInput[] | undefined {
  const values: ArgumentInput[] = [];
  for (const argument of args) {
    if ((argument.type as string) === 'ARRAY') {
      const rows = (argument as { args: Ast[][] }).args.map((row) => row.map(literalScalar));
      if (rows.some((row) => row.some((value) => value === undefined))) return undefined;
      values.push(rows as CellInput[][]);
      continue;
    }
    const value = literalScalar(argument);
    if (value === undefined) return undefined;
    values.push(value);
  }
  return values;
}

/** What a row function says when an argument is not typed in the formula. */
function rowNeedsLiteralsMessage(spec: FunctionSpec): string {
  const example = spec.examples[0]?.formula.replace(/^=/, '');
  return (
    `${qualifiedName(spec)} needs its arguments typed into the formula in this engine (driftcell calc, recalc)` +
    `${example ? `, e.g. ${example}` : ''}: the length of its row depends on their values, and this engine fixes ` +
    "a result's size from the formula text before reading any cell, so a cell reference or a computed argument cannot be used here. " +
    'Excel also takes them from cells.'
  );
}

/** Function names in every registered language: DRIFT names are not translated. */
function translations(): Record<string, Record<string, string>> {
  const names = Object.fromEntries(CATALOG.map((spec) => [qualifiedName(spec), qualifiedName(spec)]));
  return Object.fromEntries(HyperFormula.getRegisteredLanguagesCodes().map((code) => [code, names]));
}

/**
 * Registers the catalog with HyperFormula (process-wide), once; later calls do
 * nothing. Engines built afterwards know every DRIFT function.
 *
 * @example registerDriftFunctions(); HyperFormula.buildEmpty({ licenseKey: 'gpl-v3' })
 */
export function registerDriftFunctions(): void {
  const first = qualifiedName(CATALOG[0]);
  if (HyperFormula.getFunctionPlugin(first) === DriftFunctionPlugin) return;
  HyperFormula.registerFunctionPlugin(DriftFunctionPlugin, translations());
}
