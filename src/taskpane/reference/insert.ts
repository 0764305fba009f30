/**
 * Lays a catalog function out at the active cell: one labelled row per
 * argument (label "name (unit)" | value cell), then the formula, which
 * references those value cells so the user edits arguments in place. Values
 * are prefilled from the entry's first example made of plain values; the
 * rest stay blank (an optional argument left blank takes its default).
 */
import { evaluate } from '../../catalog/broadcast';
import { readCall } from '../../catalog/literalCall';
import { qualifiedName } from '../../catalog/naming';
import type { FunctionSpec, ParameterSpec } from '../../catalog/types';
import { blockAddress, cellName, sheetAddress, type CellBlock, type CellInput, type WorkbookPort } from '../port';
import { applySheetPlan, type SheetPlan } from '../sheetPlan';
import { callText } from './callText';

/** One argument of an example: a plain value, a row of values (inline array), or something else (a reference, a call). */
export type ExampleArgument =
  | { readonly kind: 'blank' }
  | { readonly kind: 'value'; readonly value: CellInput }
  | { readonly kind: 'array'; readonly values: readonly CellInput[] }
  | { readonly kind: 'other'; readonly text: string };

/**
 * The arguments of an example formula `=DRIFT.NAME(a, b, …)`.
 *
 * @param formula - as in the catalog, e.g. '=DRIFT.DOPING(10,"B")'
 * @param spec - the entry the example belongs to
 * @returns one entry per written argument (an inline array's rows joined into one row), or null when the
 *   formula is not a plain call of that entry
 * @example exampleArguments('=DRIFT.DOPING(10,"B")', DOPING) // [{ kind: 'value', value: 10 }, { kind: 'value', value: 'B' }]
 */
export function exampleArguments(formula: string, spec: FunctionSpec): ExampleArgument[] | null {
  const call = readCall(formula);
  if (call === null || call.name.toUpperCase() !== qualifiedName(spec).toUpperCase()) return null;
  return call.arguments.map((argument): ExampleArgument =>
    argument.kind === 'array'
      ? {
          kind: 'array',
          values: argument.rows.flat(),
        }
      : argument,
  );
}

/** What goes into one argument's value cells: one value, or a row of values for a reducing argument. */
type Prefill = readonly CellInput[];

function usable(argument: ExampleArgument | undefined, parameter: ParameterSpec): Prefill | null {
  if (argument === undefined || argument.kind === 'blank') return [null];
  if (argument.kind === 'value') return [argument.value];
  // A reducing argument takes a whole range: its inline array is laid out along the row.
  if (argument.kind === 'array' && parameter.reduce !== undefined) return argument.values;
  return null;
}

/**
 * Values to prefill, one row per parameter: from the first example whose
 * every argument is usable as cell values; failing that, the usable arguments
 * of the first example, blanks elsewhere.
 *
 * @param spec - catalog entry
 * @example prefillValues(DOPING) // [[10], ['B'], [null], [null], [null], [null]]
 */
export function prefillValues(spec: FunctionSpec): Prefill[] {
  const parsed = spec.examples
    .map((example) => exampleArguments(example.formula, spec))
    .filter((args): args is ExampleArgument[] => args !== null);
  const complete = parsed.find((args) => spec.parameters.every((parameter, index) => usable(args[index], parameter) !== null));
  const chosen = complete ?? parsed[0] ?? [];
  return spec.parameters.map((parameter, index) => usable(chosen[index], parameter) ?? [null]);
}

/**
 * Rows × columns a call of the entry with one value per argument shows; for a
 * row entry (DRIFT.MODELCODES), whose length follows its arguments' values,
 * the row its prefilled values give.
 */
export function resultSize(spec: FunctionSpec): { rows: number; columns: number } {
  if (spec.kind === 'tuple') return { rows: 1, columns: spec.columns.length };
  if (spec.kind === 'row') {
    const row = evaluate(
      spec,
      prefillValues(spec).map((cells) => cells[0]),
    );
    return { rows: 1, columns: Math.max(1, row[0]?.length ?? 1) };
  }
  if (spec.kind === 'table') {
    const table = spec.table();
    return { rows: Math.max(1, table.length), columns: Math.max(1, table[0]?.length ?? 1) };
  }
  return { rows: 1, columns: 1 };
}

/**
 * A parameter's label in the sheet: name with unit, and for an optional one what blank means.
 *
 * @example argumentLabel(temperature) // 'temperature_K (K), optional: blank = 300'
 */
export function argumentLabel(parameter: ParameterSpec): string {
  const named = parameter.unit === null ? parameter.name : `${parameter.name} (${parameter.unit})`;
  if (!parameter.optional) return named;
  return parameter.defaultText === undefined ? `${named}, optional` : `${named}, optional: blank = ${parameter.defaultText}`;
}

/** The insertion plan plus what the pane tells the user. */
export interface InsertPlan extends SheetPlan {
  /** The formula cell. */
  readonly formulaCell: CellBlock;
  readonly formula: string;
  /** Required arguments left blank, which the user must fill in. */
  readonly missing: readonly string[];
  readonly summary: string;
}

/**
 * Plans the argument block and formula at a cell.
 *
 * @param spec - catalog entry
 * @param at - top-left cell of the block (the active cell)
 * @returns cells to write, with the formula cell and its spill area required empty
 * @example planInsert(SHEETRES, { sheet: 'Sheet1', row: 0, column: 0, rowCount: 1, columnCount: 1 }).formula // '=DRIFT.SHEETRES(B1,B2)'
 */
export function planInsert(spec: FunctionSpec, at: CellBlock): InsertPlan {
  const prefill = prefillValues(spec);
  const { rows: resultRows, columns: resultColumns } = resultSize(spec);
  const valueWidth = Math.max(1, resultColumns, ...prefill.map((values) => values.length));
  const width = 1 + valueWidth;
  const argumentRows = spec.parameters.length;
  const references = spec.parameters.map((parameter, index) => {
    const row = at.row + index;
    const first = cellName(row, at.column + 1);
    const cells = prefill[index].length;
    return parameter.reduce !== undefined && cells > 1 ? `${first}:${cellName(row, at.column + cells)}` : first;
  });
  const formula = `=${callText(spec, Object.fromEntries(spec.parameters.map((parameter, index) => [parameter.name, references[index]])))}`;
  const pad = (cells: readonly CellInput[]): CellInput[] => [...cells, ...Array<CellInput>(width - cells.length).fill(null)];
  const cells: CellInput[][] = [
    ...spec.parameters.map((parameter, index) => pad([argumentLabel(parameter), ...prefill[index]])),
    pad([spec.result.unit === null ? qualifiedName(spec) : `${qualifiedName(spec)} (${spec.result.unit})`, formula]),
  ];
  const block: CellBlock = { sheet: at.sheet, row: at.row, column: at.column, rowCount: argumentRows + 1, columnCount: width };
  const formulaCell: CellBlock = { sheet: at.sheet, row: at.row + argumentRows, column: at.column + 1, rowCount: 1, columnCount: 1 };
  const spill: CellBlock = { ...formulaCell, rowCount: resultRows, columnCount: resultColumns };
  const missing = spec.parameters
    .filter((parameter, index) => !parameter.optional && prefill[index].every((value) => value === null))
    .map((parameter) => parameter.name);
  return {
    writes: [{ block, cells }],
    alsoEmpty: resultRows > 1 || resultColumns > 1 ? [spill] : [],
    styles: [{ block: { ...formulaCell, column: at.column }, bold: true }],
    highlights: [],
    formulaCell,
    formula,
    missing,
    summary:
      `Inserted ${qualifiedName(spec)} in ${sheetAddress(formulaCell)}` +
      (argumentRows > 0 ? ` with its arguments in ${blockAddress({ ...block, rowCount: argumentRows })}; edit them there.` : '.') +
      (missing.length > 0 ? ` Fill in ${missing.join(', ')}.` : ''),
  };
}

/**
 * Inserts a function at the active cell, refusing to write over anything.
 *
 * @param port - workbook
 * @param spec - catalog entry
 * @returns the plan that was written
 * @throws PaneRefusal naming the block when a target cell is not empty
 */
export async function insertFunction(port: WorkbookPort, spec: FunctionSpec): Promise<InsertPlan> {
  const selection = await port.selection();
  const plan = planInsert(spec, { ...selection, rowCount: 1, columnCount: 1 });
  await applySheetPlan(port, plan);
  return plan;
}
