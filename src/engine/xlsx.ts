/**
 * Workbooks in and out of the engine: read every sheet of an .xlsx (values,
 * formulas, cross-sheet references, workbook names) into one engine,
 * recalculate, and write every formula back with its cached result.
 *
 * A formula whose result spills is written as Excel writes a dynamic-array
 * formula: an array formula on its anchor cell with `ref` over exactly the
 * result's range, the cached values in every cell of that range, and the
 * dynamic-array mark (see dynamicArrays.ts). The cells a spill covered when
 * the file was read hold its old results, not user data, and are cleared
 * before recalculating. A legacy array formula (no dynamic-array mark,
 * arrayKinds.ts) keeps its whole declared range, which is its own: the cells
 * of it the file holds that its new result does not reach get what Excel
 * gives them (legacyArrayFill), so nothing in the range is deleted. A spill that would cover a user's cell is not
 * written over it: the anchor shows #SPILL! and the user's cell keeps its value.
 * DRIFT calls are written in the form Excel stores for add-in functions,
 * whatever form the file had (formulaText.ts).
 */
import { readFile, stat } from 'node:fs/promises';
import ExcelJS from 'exceljs';
import { CellError, CellType, DetailedCellError, ErrorType } from 'hyperformula';
import type { CellValue, HyperFormula, RawCellContent, SimpleCellAddress, SimpleCellRange } from 'hyperformula';
import { areaName, cellName, columnName } from './a1';
import { ResultTooLarge, createEngine } from './engine';
import { markDynamicArrays } from './dynamicArrays';
import { dynamicArrayAnchors, type DynamicAnchors } from './arrayKinds';
import { lastColumnValidationsAsRanges } from './lastColumnValidations';
import { ForeignPackageRefused, preparePackage, type PreparedPackage } from './foreignPackages';
import { unevaluableReason } from './unevaluable';
import { fileErrorText } from './errorTypes';
import { storedFormula } from './formulaText';
import { MAX_PACKAGE_BYTES, PackageRejected, checkPackage } from './packageCheck';
import { engineContent, fileValue, type FileValue, type StoredFormula } from './workbookCells';

/** A file that cannot be read as a workbook; the message is one line for the user. */
export class WorkbookReadError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'WorkbookReadError';
  }
}

/** A cell (or spill element) that shows an error after recalculation. */
export interface CellProblem {
  readonly sheet: string;
  /** A1-style address. */
  readonly address: string;
  /** As the engine shows it, e.g. `#VALUE!`. */
  readonly code: string;
  readonly message: string;
}

/** An array formula as written: its anchor and the range it fills. */
export interface ArrayFormulaPlacement {
  readonly sheet: string;
  /** Anchor cell, A1 style. */
  readonly anchor: string;
  /** Filled range, e.g. `C8:C27` (just the anchor when the spill is blocked). */
  readonly ref: string;
  readonly rows: number;
  readonly columns: number;
}

/** A formula cell left exactly as the file had it (formula and cached value), and why. */
export interface KeptCell {
  readonly sheet: string;
  /** A1-style address. */
  readonly address: string;
  readonly reason: string;
}

/** What a recalculation did. */
export interface RecalcSummary {
  readonly sheets: readonly string[];
  readonly formulas: number;
  /** Formula cells not recalculated: they keep the formula and cached value the file had. */
  readonly kept: readonly KeptCell[];
  /** What the written copy lacks that the file had (charts, pivot tables, macros), one line each. */
  readonly notices: readonly string[];
  readonly arrays: readonly ArrayFormulaPlacement[];
  readonly problems: readonly CellProblem[];
}

/** A1 column letters of a 1-based column number. */
export function columnLetters(column: number): string {
  return columnName(column - 1);
}

/** A1 address of a 1-based row and column. */
export function cellAddress(row: number, column: number): string {
  return cellName(row - 1, column - 1);
}

interface Box {
  readonly top: number;
  readonly left: number;
  readonly bottom: number;
  readonly right: number;
}

function columnNumber(letters: string): number {
  return [...letters.toUpperCase()].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0);
}

/** A1 form of an engine range: `C8:C27`, or `C8` for one cell, as Excel writes it. */
function rangeAddress(range: SimpleCellRange): string {
  return areaName(range.start.row, range.start.col, range.end.row, range.end.col);
}

/** 1-based bounds of an A1 range such as `C1:D5` or `$C$1`. */
function parseRange(ref: string): Box | undefined {
  const match = /^\$?([A-Za-z]{1,3})\$?(\d+)(?::\$?([A-Za-z]{1,3})\$?(\d+))?$/.exec(ref.trim());
  if (!match) return undefined;
  const left = columnNumber(match[1]);
  const top = Number(match[2]);
  const right = match[3] ? columnNumber(match[3]) : left;
  const bottom = match[4] ? Number(match[4]) : top;
  return { top: Math.min(top, bottom), left: Math.min(left, right), bottom: Math.max(top, bottom), right: Math.max(left, right) };
}

/**
 * Reads an .xlsx workbook from bytes, after checking the package's structure
 * and size (packageCheck.ts: limits on file size, expanded size and cells).
 *
 * @throws WorkbookReadError when the bytes are not an .xlsx package or exceed a limit
 */
export async function loadWorkbook(bytes: Buffer): Promise<ExcelJS.Workbook> {
  try {
    checkPackage(bytes);
  } catch (e) {
    if (e instanceof PackageRejected) {
      throw new WorkbookReadError(
        e.reason === 'limit' ? `too large to recalculate (${e.message})` : `not an .xlsx workbook (${e.message})`,
      );
    }
    throw e;
  }
  const workbook = new ExcelJS.Workbook();
  let prepared: PreparedPackage;
  try {
    prepared = await preparePackage(bytes);
  } catch (e) {
    if (e instanceof ForeignPackageRefused) throw new WorkbookReadError(`cannot be recalculated: ${e.message}`);
    const detail = e instanceof Error ? e.message.split('\n')[0] : String(e);
    const reason = /central directory|zip/i.test(detail) ? 'it is not a zip package' : detail;
    throw new WorkbookReadError(`not an .xlsx workbook (${reason})`);
  }
  const notices = [...prepared.notices];
  try {
    await quietly(() => workbook.xlsx.load(prepared.bytes as unknown as ExcelJS.Buffer), notices);
  } catch (e) {
    const detail = e instanceof Error ? e.message.split('\n')[0] : String(e);
    // The zip reader's own wording ends in a link to its manual; say plainly what it means instead.
    const reason = /central directory|zip/i.test(detail) ? 'it is not a zip package' : detail;
    throw new WorkbookReadError(`not an .xlsx workbook (${reason})`);
  }
  if (workbook.worksheets.length === 0) throw new WorkbookReadError('not an .xlsx workbook (it has no worksheets)');
  giveTablesAStyle(workbook);
  NOTICES.set(workbook, notices);
  DYNAMIC_ANCHORS.set(workbook, await dynamicArrayAnchors(prepared.bytes));
  return workbook;
}

/** What reading a workbook found the copy will lack (charts, pivot tables, macros), one line each. */
const NOTICES = new WeakMap<ExcelJS.Workbook, string[]>();
/** The dynamic-array anchors of a workbook as read; array formulas not listed are legacy ones. */
const DYNAMIC_ANCHORS = new WeakMap<ExcelJS.Workbook, DynamicAnchors>();

/**
 * The notices for a workbook read by loadWorkbook.
 *
 * @example workbookNotices(workbook) // ['sheet "Data": 1 chart not carried into the copy']
 */
export function workbookNotices(workbook: ExcelJS.Workbook): readonly string[] {
  return NOTICES.get(workbook) ?? [];
}

/** Runs exceljs with its console warnings turned into notices instead of reaching the terminal. */
async function quietly<T>(run: () => Promise<T>, notices: string[]): Promise<T> {
  const { warn, log } = console;
  const capture = (...parts: unknown[]) => notices.push(`reading the workbook: ${parts.map(String).join(' ')}`);
  console.warn = capture;
  console.log = capture;
  try {
    return await run();
  } finally {
    console.warn = warn;
    console.log = log;
  }
}

/**
 * A table without <tableStyleInfo> (LibreOffice writes them so) reads as
 * style null, on which exceljs's writer fails; give it the plain style the
 * missing element means (no stripes, no emphasised columns).
 */
function giveTablesAStyle(workbook: ExcelJS.Workbook): void {
  for (const worksheet of workbook.worksheets) {
    for (const table of Object.values((worksheet as unknown as { tables: Record<string, { table?: { style?: unknown } }> }).tables ?? {})) {
      if (table.table !== undefined && (table.table.style === null || table.table.style === undefined)) {
        table.table.style = { theme: null, showFirstColumn: false, showLastColumn: false, showRowStripes: false, showColumnStripes: false };
      }
    }
  }
}

/**
 * Reads an .xlsx workbook from a file.
 *
 * @throws WorkbookReadError when the file is missing, unreadable or not an .xlsx package
 */
export async function readWorkbookFile(path: string): Promise<ExcelJS.Workbook> {
  let bytes: Buffer;
  try {
    // Refused before reading: the file would be held in memory whole.
    const { size } = await stat(path);
    if (size > MAX_PACKAGE_BYTES) {
      throw new WorkbookReadError(
        `${path}: too large to recalculate (it is ${(size / 2 ** 20).toFixed(1)} ` +
          `MB, more than the ${MAX_PACKAGE_BYTES / 2 ** 20} MB Driftcell reads)`,
      );
    }
    bytes = await readFile(path);
  } catch (e) {
    if (e instanceof WorkbookReadError) throw e;
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new WorkbookReadError(`${path}: no such file`);
    if (code === 'EISDIR') throw new WorkbookReadError(`${path} is a folder, not a workbook`);
    throw new WorkbookReadError(`${path} cannot be read (${code ?? String(e)})`);
  }
  try {
    return await loadWorkbook(bytes);
  } catch (e) {
    if (e instanceof WorkbookReadError) throw new WorkbookReadError(`${path}: ${e.message}`);
    throw e;
  }
}

/** A formula cell as read, with what is needed to write it back. */
interface FormulaCell {
  readonly row: number;
  readonly column: number;
  readonly cell: ExcelJS.Cell;
  /** Formula text as stored in the file (no `=`), kept as it was. */
  readonly stored: string;
  readonly wasArray: boolean;
  /** The declared range of a legacy (not dynamic) array formula over more than one cell, which stays its own. */
  legacyBox?: Box;
}

interface SheetInput {
  readonly name: string;
  readonly worksheet: ExcelJS.Worksheet;
  readonly content: RawCellContent[][];
  readonly formulas: FormulaCell[];
  /** Cells that held an earlier spill's results. */
  readonly oldSpillCells: ExcelJS.Cell[];
  /** The cells of each legacy array formula's range other than its anchor (a subset of oldSpillCells). */
  readonly spillCellsOf: ReadonlyMap<FormulaCell, readonly ExcelJS.Cell[]>;
}

function readSheet(worksheet: ExcelJS.Worksheet, isDynamic: (address: string) => boolean): SheetInput {
  const content: RawCellContent[][] = [];
  const formulas: FormulaCell[] = [];
  const oldSpills: { formula: FormulaCell; anchorRow: number; anchorColumn: number; box: Box }[] = [];
  worksheet.eachRow({ includeEmpty: false }, (row) => {
    row.eachCell({ includeEmpty: false }, (cell) => {
      const r = Number(cell.row);
      const c = Number(cell.col);
      const value = engineContent(cell);
      if (value === null) return;
      (content[r - 1] ??= [])[c - 1] = value;
      if (cell.type === ExcelJS.ValueType.Formula) {
        const stored = cell.value as StoredFormula;
        const wasArray = stored.shareType === 'array';
        const formula: FormulaCell = { row: r, column: c, cell, stored: cell.formula, wasArray };
        formulas.push(formula);
        const box = wasArray && stored.ref ? parseRange(stored.ref) : undefined;
        if (box) {
          oldSpills.push({ formula, anchorRow: r, anchorColumn: c, box });
          const anchoredAtCorner = box.top === r && box.left === c;
          if (anchoredAtCorner && (box.bottom > r || box.right > c) && !isDynamic(cellAddress(r, c))) formula.legacyBox = box;
        }
      }
    });
  });
  const oldSpillCells: ExcelJS.Cell[] = [];
  const spillCellsOf = new Map<FormulaCell, ExcelJS.Cell[]>();
  for (const { formula, anchorRow, anchorColumn, box } of oldSpills) {
    const own: ExcelJS.Cell[] = [];
    spillCellsOf.set(formula, own);
    for (let r = box.top; r <= box.bottom; r++) {
      for (let c = box.left; c <= box.right; c++) {
        if (r === anchorRow && c === anchorColumn) continue;
        const cell = worksheet.findCell(r, c);
        // Merged cells are skipped: writing one in exceljs writes its merge's first cell.
        if (cell === undefined || cell.type === ExcelJS.ValueType.Formula || cell.type === ExcelJS.ValueType.Merge) continue;
        if (content[r - 1]) content[r - 1][c - 1] = null;
        oldSpillCells.push(cell);
        own.push(cell);
      }
    }
  }
  // The engine wants every row present, even an empty one.
  for (let r = 0; r < content.length; r++) content[r] ??= [];
  return { name: worksheet.name, worksheet, content, formulas, oldSpillCells, spillCellsOf };
}

/** Workbook-level defined names that refer to one range, as engine expressions. */
function workbookNames(workbook: ExcelJS.Workbook): { name: string; expression: string }[] {
  const model = workbook.definedNames.model as { name: string; ranges: string[]; localSheetId?: number }[];
  return model
    .filter((entry) => entry.ranges.length === 1 && entry.localSheetId === undefined && !entry.name.startsWith('_xlnm.'))
    .map((entry) => ({ name: entry.name, expression: `=${entry.ranges[0]}` }));
}

function addNames(engine: HyperFormula, names: { name: string; expression: string }[]): void {
  engine.batch(() => {
    for (const { name, expression } of names) {
      if (engine.isItPossibleToAddNamedExpression(name, expression)) engine.addNamedExpression(name, expression);
    }
  });
}

/**
 * The range an array formula fills, read from the engine's array bookkeeping
 * (HyperFormula has no public call for it; arrayMapping is typed but internal,
 * so this is the one place that relies on it).
 */
function arrayRange(engine: HyperFormula, address: SimpleCellAddress): SimpleCellRange {
  const vertex = engine.arrayMapping.getArrayByCorner(address);
  if (vertex === undefined) return { start: address, end: address };
  const range = vertex.getRange();
  return { start: range.start, end: range.end };
}

/** The error a spill gets where Excel would refuse to spill (into merged cells). */
function mergedCellsSpillError(): DetailedCellError {
  return new DetailedCellError(new CellError(ErrorType.SPILL, 'the spill range contains merged cells'), fileErrorText(ErrorType.SPILL));
}

/**
 * Recalculates a workbook in place: every formula gets its result cached,
 * spilled results fill their ranges, old spill results are cleared.
 *
 * @param workbook - as read by {@link loadWorkbook}; changed in place
 * @param options.onPlaced - called after each formula's result is placed in its cells, with the
 *   count placed and the total (the engine calculates in one call before; this is the loop that can count)
 * @returns sheets, formula count, where arrays were placed, and every cell that shows an error
 * @example const summary = recalculateWorkbook(await readWorkbookFile('in.xlsx'))
 */
export function recalculateWorkbook(
  workbook: ExcelJS.Workbook,
  options: { onPlaced?: (placed: number, total: number) => void } = {},
): RecalcSummary {
  const dynamic = DYNAMIC_ANCHORS.get(workbook);
  // A workbook not read by loadWorkbook: nothing says which arrays are legacy, so all count as spills.
  const inputs = workbook.worksheets.map((worksheet) =>
    readSheet(worksheet, dynamic === undefined ? () => true : (address) => dynamic.get(worksheet.name)?.has(address) ?? false),
  );
  const { engine, kept } = buildWorkbookEngine(inputs, workbookNames(workbook));
  const keptCells = new Set([...kept.values()].map((k) => k.formula.cell));
  // A kept legacy array formula keeps the cached values of its whole range.
  const keptSpillCells = new Set(inputs.flatMap((input) => [...kept.keys()].flatMap((f) => input.spillCellsOf.get(f) ?? [])));
  try {
    const arrays: ArrayFormulaPlacement[] = [];
    const problems: CellProblem[] = [];
    const note = (sheet: string, row: number, column: number, value: CellValue) => {
      if (value instanceof DetailedCellError) {
        problems.push({ sheet, address: cellAddress(row, column), code: value.value, message: value.message ?? '' });
      }
    };

    for (const input of inputs) input.oldSpillCells.forEach((cell) => keptSpillCells.has(cell) || (cell.value = null));
    const total = inputs.reduce((n, input) => n + input.formulas.length, 0);
    let placed = 0;

    for (const input of inputs) {
      const sheetId = engine.getSheetId(input.name);
      if (sheetId === undefined) throw new Error(`sheet "${input.name}" did not reach the engine`);
      for (const formula of input.formulas) {
        options.onPlaced?.(++placed, total);
        if (keptCells.has(formula.cell)) continue;
        const address = { sheet: sheetId, row: formula.row - 1, col: formula.column - 1 };
        const isArray = engine.getCellType(address) === CellType.ARRAYFORMULA;
        if (!isArray && !formula.wasArray) {
          const value = engine.getCellValue(address);
          formula.cell.value = formulaValue(formula.stored, value);
          note(input.name, formula.row, formula.column, value);
          continue;
        }
        let range = isArray ? arrayRange(engine, address) : { start: address, end: address };
        let values = engine.getRangeValues(range);
        // The result proper; beyond it, in a legacy array's range, only the cells the file had are
        // written, so memory follows the content rather than the declared range.
        let resultRows = values.length;
        let resultColumns = values[0].length;
        const legacy = formula.legacyBox === undefined ? undefined : legacyArrayRange(input, formula, formula.legacyBox, range);
        const ownCells = new Set(legacy === undefined ? [] : (input.spillCellsOf.get(formula) ?? []));
        if (legacy !== undefined) {
          values = legacyArrayFill(values, legacy.end.row - legacy.start.row + 1, legacy.end.col - legacy.start.col + 1);
          range = legacy;
        }
        if (coversMergedCells(input.worksheet, range)) {
          // Excel does not spill into merged cells; the engine does not know about merges.
          range = { start: address, end: address };
          values = [[mergedCellsSpillError()]];
          resultRows = 1;
          resultColumns = 1;
        }
        const rows = values.length;
        const columns = values[0].length;
        const ref = rangeAddress(range);
        formula.cell.value = {
          ...formulaValue(formula.stored, values[0][0]),
          shareType: 'array',
          ref,
        } as ExcelJS.CellFormulaValue;
        for (let r = 0; r < rows; r++) {
          for (let c = 0; c < columns; c++) {
            const row = range.start.row + r + 1;
            const column = range.start.col + c + 1;
            if ((r >= resultRows || c >= resultColumns) && !ownCells.has(input.worksheet.findCell(row, column) as ExcelJS.Cell)) continue;
            if (r > 0 || c > 0) input.worksheet.getCell(row, column).value = fileValue(values[r][c]) as ExcelJS.CellValue;
            note(input.name, row, column, values[r][c]);
          }
        }
        arrays.push({ sheet: input.name, anchor: cellAddress(formula.row, formula.column), ref, rows, columns });
      }
    }
    return {
      sheets: inputs.map((input) => input.name),
      formulas: inputs.reduce((n, input) => n + input.formulas.length, 0),
      notices: workbookNotices(workbook),
      kept: [...kept.values()].map(({ sheet, formula, reason }) => ({ sheet, address: cellAddress(formula.row, formula.column), reason })),
      arrays,
      problems,
    };
  } finally {
    engine.destroy();
  }
}

/** The cached value a formula cell had in the file, as engine content (its dependents calculate from it). */
function cachedContent(cell: ExcelJS.Cell): RawCellContent {
  const result = (cell.value as ExcelJS.CellFormulaValue).result;
  if (result === undefined || result === null) return null;
  if (typeof result === 'number' || typeof result === 'boolean') return result;
  if (typeof result === 'string') return `'${result}`;
  if (result instanceof Date) return null;
  if (typeof result === 'object' && 'error' in result) return result.error;
  return null;
}

/**
 * Builds the engine over every sheet, with the workbook's names. Two kinds of
 * formula are not evaluated: one the engine cannot take without exhausting
 * the call stack (a sum of thousands of terms, deep nesting; still within
 * Excel's own limits), and one whose engine value is the engine's own
 * shortcoming (unevaluable.ts: INDIRECT, LET, table references …). The engine
 * gets the cached value instead and the cell is kept as the file had it, so
 * its dependents and the rest of the workbook still recalculate. A result
 * beyond MAX_RESULT_CELLS refuses the workbook, naming the cell.
 */
function buildWorkbookEngine(
  inputs: readonly SheetInput[],
  names: { name: string; expression: string }[],
): { engine: HyperFormula; kept: Map<FormulaCell, { sheet: string; formula: FormulaCell; reason: string }> } {
  const kept = new Map<FormulaCell, { sheet: string; formula: FormulaCell; reason: string }>();
  const sheets = () => Object.fromEntries(inputs.map((input) => [input.name, input.content]));
  const keep = (input: SheetInput, formula: FormulaCell, reason: string) => {
    input.content[formula.row - 1][formula.column - 1] = cachedContent(formula.cell);
    for (const cell of input.spillCellsOf.get(formula) ?? []) {
      (input.content[Number(cell.row) - 1] ??= [])[Number(cell.col) - 1] = engineContent(cell);
    }
    kept.set(formula, { sheet: input.name, formula, reason });
  };
  let overflowRounds = 0;
  // Each round keeps the cells that arise as the engine's shortcomings; their dependents then
  // calculate from the cached values. A kept cell fed by another kept cell shows up a round later.
  for (let round = 0; ; round++) {
    let engine: HyperFormula;
    try {
      engine = createEngine(sheets());
      if (names.length > 0) addNames(engine, names);
    } catch (e) {
      if (e instanceof ResultTooLarge) {
        const sheet = inputs[e.address.sheet]?.name ?? '?';
        throw new WorkbookReadError(`too large to recalculate (sheet "${sheet}": ${e.message})`);
      }
      if (!(e instanceof RangeError) || overflowRounds >= STACK_RESERVES.length) throw e;
      const reserve = STACK_RESERVES[overflowRounds++];
      const before = kept.size;
      keepOverflowingFormulas(inputs, keep, reserve);
      if (kept.size === before) throw e;
      continue;
    }
    const before = kept.size;
    for (const [sheet, input] of inputs.entries()) {
      for (const formula of input.formulas) {
        if (kept.has(formula)) continue;
        const text = input.content[formula.row - 1]?.[formula.column - 1];
        if (typeof text !== 'string' || !text.startsWith('=')) continue;
        const value = engine.getCellValue({ sheet, row: formula.row - 1, col: formula.column - 1 });
        const reason = unevaluableReason(engine, value, text);
        if (reason !== undefined && !cachedIsSameError(formula.cell, value)) keep(input, formula, reason);
      }
    }
    if (kept.size === before || round >= MAX_KEEP_ROUNDS) return { engine, kept };
    engine.destroy();
  }
}

/** Rounds of keeping before the engine is taken as it is (kept cells fed by kept cells, nested this deep). */
const MAX_KEEP_ROUNDS = 8;

/** Whether the file's cached value is already the error the engine gives (then recalculating changes nothing). */
function cachedIsSameError(cell: ExcelJS.Cell, value: CellValue): boolean {
  const result = (cell.value as ExcelJS.CellFormulaValue).result;
  return (
    value instanceof DetailedCellError && typeof result === 'object' && result !== null && 'error' in result && result.error === value.value
  );
}

/**
 * Stack frames used up before each probe, one entry per round of keeping. How
 * deep a formula may go before the stack runs out is not fixed: it depends on
 * the frames below it (the whole build, in the engine; one formula, in the
 * probe) and on whether V8 has optimised the parser's functions yet (an
 * optimised frame is smaller). A formula near the limit can thus overflow the
 * build and pass a bare probe, so each probe runs with part of the stack
 * already used, more each round (a default Node stack holds roughly 10,000
 * small frames): what passes it has room to spare.
 */
const STACK_RESERVES = [2_000, 4_000, 6_000];

/** Runs `run` with `frames` small frames of stack used below it. */
function withStackUsed<T>(frames: number, run: () => T): T {
  return frames <= 0 ? run() : withStackUsed(frames - 1, run);
}

/**
 * Finds the formulas that overflow the engine's stack on their own (parsing
 * or evaluating them over empty sheets of the same names) and keeps them.
 */
function keepOverflowingFormulas(
  inputs: readonly SheetInput[],
  keep: (input: SheetInput, formula: FormulaCell, reason: string) => void,
  reserve: number,
): void {
  const probe = createEngine(Object.fromEntries(inputs.map((input) => [input.name, []])));
  try {
    for (const [index, input] of inputs.entries()) {
      for (const formula of input.formulas) {
        const text = input.content[formula.row - 1]?.[formula.column - 1];
        if (typeof text !== 'string' || !text.startsWith('=')) continue;
        try {
          withStackUsed(reserve, () => probe.calculateFormula(text, index));
        } catch (inner) {
          if (inner instanceof RangeError) keep(input, formula, 'the formula is too long or too deeply nested for the headless engine');
        }
      }
    }
  } finally {
    probe.destroy();
  }
}

/**
 * The range a legacy array formula's result is written over: its declared
 * range, grown to the result when that is larger (a spill, as everything is
 * written). Undefined when the spill was blocked (#SPILL!, written on the
 * anchor alone as before) or when a cell of the declared range beyond the
 * result is not the array's (a formula or a merge another writer put there):
 * then that cell is left alone and the array is written over its result only.
 */
function legacyArrayRange(input: SheetInput, formula: FormulaCell, box: Box, result: SimpleCellRange): SimpleCellRange | undefined {
  const top = formula.row - 1;
  const left = formula.column - 1;
  if (result.start.row !== top || result.start.col !== left) return undefined;
  const bottom = Math.max(result.end.row, box.bottom - 1);
  const right = Math.max(result.end.col, box.right - 1);
  if (bottom === result.end.row && right === result.end.col) return undefined;
  const own = new Set(input.spillCellsOf.get(formula) ?? []);
  for (let r = top; r <= bottom; r++) {
    for (let c = left; c <= right; c++) {
      if (r <= result.end.row && c <= result.end.col) continue;
      const cell = input.worksheet.findCell(r + 1, c + 1);
      if (cell !== undefined && !own.has(cell) && cell.type !== ExcelJS.ValueType.Null) return undefined;
    }
  }
  return { start: result.start, end: { sheet: result.start.sheet, row: bottom, col: right } };
}

/**
 * A legacy array formula's result laid over its declared range as Excel lays
 * it (ECMA-376 Part 1, §18.17.2 "Single- and Multi-Cell Formulas", read at
 * webapp.docx4java.org/OnlineDemo/ecma376/SpreadsheetML/file_2.html): a single
 * value fills every cell; a one-column result is cloned into the excess
 * columns, and (the same rule for rows, by symmetry: the text read was cut
 * off there) a one-row result into the excess rows. Every other excess cell
 * shows #N/A, as Excel shows it ("CSE array formulas will truncate the return
 * area if it's too small, or return #N/A's if too large", Microsoft,
 * "Dynamic array formulas vs. legacy CSE array formulas", read as reproduced
 * at slideshare.net/slideshow/new-dynamic-array-functions-excel-tutorial/250807025).
 *
 * @param values - the result, rows × columns
 * @param rows - rows of the range written (≥ the result's)
 * @param columns - columns of the range written (≥ the result's)
 * @example legacyArrayFill([[1], [2]], 3, 2) // [[1, 1], [2, 2], [#N/A, #N/A]]
 */
export function legacyArrayFill(values: readonly (readonly CellValue[])[], rows: number, columns: number): CellValue[][] {
  const resultRows = values.length;
  const resultColumns = values[0]?.length ?? 0;
  const notAvailable = new DetailedCellError(
    new CellError(ErrorType.NA, 'the legacy array formula’s range is larger than its result'),
    fileErrorText(ErrorType.NA),
  );
  return Array.from({ length: rows }, (_, r) =>
    Array.from({ length: columns }, (_, c) => {
      const sourceRow = resultRows === 1 ? 0 : r;
      const sourceColumn = resultColumns === 1 ? 0 : c;
      return sourceRow < resultRows && sourceColumn < resultColumns ? values[sourceRow][sourceColumn] : notAvailable;
    }),
  );
}

/** Whether a spill over more than one cell touches a merged cell (its anchor included). */
function coversMergedCells(worksheet: ExcelJS.Worksheet, range: SimpleCellRange): boolean {
  if (range.start.row === range.end.row && range.start.col === range.end.col) return false;
  for (let r = range.start.row; r <= range.end.row; r++) {
    for (let c = range.start.col; c <= range.end.col; c++) {
      if (worksheet.findCell(r + 1, c + 1)?.isMerged) return true;
    }
  }
  return false;
}

/**
 * A recalculated formula as written: DRIFT calls in the one form Excel stores
 * for add-in functions (`_xldudf_DRIFT_NAME`, see formulaText.ts) whatever form
 * the file had, everything else as the file had it; with its cached result.
 */
function formulaValue(stored: string, result: CellValue): ExcelJS.CellFormulaValue {
  const cached: FileValue = fileValue(result);
  const formula = storedFormula(stored);
  return cached === null ? { formula } : { formula, result: cached as ExcelJS.CellFormulaValue['result'] };
}

/**
 * Writes a recalculated workbook as .xlsx bytes, with every array formula
 * marked as a dynamic array.
 *
 * @param workbook - after {@link recalculateWorkbook}
 * @param summary - what that recalculation returned (for the array anchors)
 */
export async function workbookBytes(workbook: ExcelJS.Workbook, summary: RecalcSummary): Promise<Buffer> {
  lastColumnValidationsAsRanges(workbook);
  const written = Buffer.from(await workbook.xlsx.writeBuffer());
  const anchors = new Map<string, string[]>();
  for (const placement of summary.arrays) {
    const list = anchors.get(placement.sheet) ?? [];
    list.push(placement.anchor);
    anchors.set(placement.sheet, list);
  }
  return markDynamicArrays(written, anchors);
}
