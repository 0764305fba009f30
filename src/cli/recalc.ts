/**
 * `driftcell recalc in.xlsx -o out.xlsx [--values]`: recalculates a workbook
 * and writes a copy with every formula's result cached, or with `--values` its
 * values form (results as plain values, formulas listed on their own sheet).
 */
import { closeSync, existsSync, openSync, readSync, statSync } from 'node:fs';
import type ExcelJS from 'exceljs';
import type { ResultError } from '../engine/engine';
import {
  WorkbookReadError,
  readWorkbookFile,
  recalculateWorkbook,
  workbookBytes,
  type CellProblem,
  type RecalcSummary,
} from '../engine/xlsx';
import { CliFailure, EXIT_CELLS_KEPT, EXIT_OK, type Output } from './failure';
import { checkOutputAgainstInput, writeFileAtomically } from './files';
import { convertToValues, valuesWorkbookBytes, type ValuesForm } from '../engine/valuesForm';
import { formatError } from './format';
import { errorHint, reasonHint } from './hints';
import { phaseProgress } from './progress';
import { findSpillBlockers, problemKey, type SpillBlockers } from './spillBlockers';
import { escapeForTerminal } from './terminalText';

/** The first bytes of a file, enough to tell an OpenDocument package by its content. */
function fileHead(path: string): Buffer {
  const head = Buffer.alloc(96);
  const fd = openSync(path, 'r');
  try {
    return head.subarray(0, readSync(fd, head, 0, head.length, 0));
  } finally {
    closeSync(fd);
  }
}

/** How many cells with errors are listed before the rest are only counted. */
const LISTED_PROBLEMS = 20;

export interface RecalcOptions {
  readonly output: string;
  readonly force: boolean;
  /** Write the values form (valuesForm.ts) instead of live formulas. */
  readonly values?: boolean;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** A sheet name as a formula writes it, escaped for the terminal (terminalText.ts). */
function quotedSheet(sheet: string): string {
  return escapeForTerminal(/^[A-Za-z0-9_]+$/.test(sheet) ? sheet : `'${sheet.replace(/'/g, "''")}'`);
}

/** A problem's message, with the cell that blocks a spill named when it is known. */
function problemError(problem: CellProblem, blockers: SpillBlockers): ResultError {
  const blocker = blockers.get(problemKey(problem.sheet, problem.address));
  const message =
    blocker === undefined
      ? problem.message
      : `the result needs cells that are filled: ${blocker} blocks ` +
        `it; clear ${blocker} (and any other filled cell in the way) so the result can spill`;
  return { kind: 'error', code: problem.code, message };
}

/**
 * Workbook file types recalc does not read, by name or (OpenDocument) by content,
 * with what to do instead.
 */
export function unreadableType(input: string, head: Buffer): string | undefined {
  const saveAs =
    'recalc reads .xlsx workbooks: open it in LibreOffice Calc or Excel, save it as .xlsx ' +
    '(File ▸ Save As, type "Excel 2007-365 (.xlsx)" or "Excel Workbook"), and recalc that file';
  // An OpenDocument package stores its media type uncompressed as the first zip entry "mimetype" (OASIS ODF 1.2, part 3, §3.3).
  const odsContent =
    head.subarray(30, 38).toString('latin1') === 'mimetype' &&
    head.subarray(38, 84).toString('latin1').startsWith('application/vnd.oasis.opendocument.spreadsheet');
  if (/\.f?ods$/i.test(input) || odsContent) return `${input} is an OpenDocument spreadsheet (.ods); ${saveAs}`;
  if (/\.xls$/i.test(input)) return `${input} is an Excel 97–2003 workbook (.xls); ${saveAs}`;
  if (/\.csv$/i.test(input)) return `${input} is a CSV text file, not a workbook; ${saveAs}`;
  return undefined;
}

/** The lines `recalc` prints about what it did. */
export function describeSummary(
  summary: RecalcSummary,
  written: string,
  values?: ValuesForm,
  blockers: SpillBlockers = new Map(),
): { lines: string[]; notes: string[] } {
  const spills = summary.arrays.filter((a) => a.rows * a.columns > 1).length;
  const counts = `${plural(summary.sheets.length, 'sheet')}, ${plural(summary.formulas, 'formula')}, ${plural(spills, 'spilled result')}`;
  const lines = [
    values === undefined
      ? `wrote ${written}: ${counts}`
      : `wrote ${written} (values form): ${counts}; every result is a plain value, the formulas are listed on sheet "${values.sheet}"`,
  ];
  const notes: string[] = summary.notices.map(escapeForTerminal);
  const hint = (text: string | undefined) => {
    if (text !== undefined) notes.push(`    hint: ${escapeForTerminal(text)}`);
  };
  if (summary.kept.length > 0) {
    notes.push(
      `${plural(summary.kept.length, 'formula cell')} kept as the file had ` +
        `${summary.kept.length === 1 ? 'it' : 'them'} (formula and cached value, not recalculated):`,
    );
    for (const kept of summary.kept.slice(0, LISTED_PROBLEMS)) {
      notes.push(`  ${quotedSheet(kept.sheet)}!${kept.address}: ${escapeForTerminal(kept.reason)}`);
      hint(reasonHint(kept.reason));
    }
    if (summary.kept.length > LISTED_PROBLEMS) notes.push(`  … and ${summary.kept.length - LISTED_PROBLEMS} more`);
  }
  if (summary.problems.length > 0) {
    notes.push(`${plural(summary.problems.length, 'cell')} ${summary.problems.length === 1 ? 'shows' : 'show'} errors:`);
    for (const problem of summary.problems.slice(0, LISTED_PROBLEMS)) {
      const error = problemError(problem, blockers);
      notes.push(`  ${quotedSheet(problem.sheet)}!${problem.address}: ${formatError(error)}`);
      hint(errorHint(error));
    }
    if (summary.problems.length > LISTED_PROBLEMS) notes.push(`  … and ${summary.problems.length - LISTED_PROBLEMS} more`);
  }
  return { lines, notes };
}

/**
 * Recalculates `input` and writes the result to `options.output`.
 *
 * @returns the exit status: 0 when every formula was recalculated, 1 when the copy was written but
 *   some formula cells were kept as the file had them (listed on stderr); failures are thrown as CliFailure
 */
export async function runRecalc(input: string, options: RecalcOptions, output: Output): Promise<number> {
  if (!existsSync(input)) throw new CliFailure(`${input}: no such file`);
  if (!statSync(input).isFile()) throw new CliFailure(`${input} is not a file`);
  const unreadable = unreadableType(input, fileHead(input));
  if (unreadable !== undefined) throw new CliFailure(unreadable);
  if (!/\.xlsx$/i.test(options.output)) {
    // An .xlsm name on a package without macros would mislead Excel and the user alike.
    throw new CliFailure(`recalc writes .xlsx workbooks (macros are not carried); give an -o name ending in .xlsx, not ${options.output}`);
  }
  const target = checkOutputAgainstInput(input, options.output, options.force);
  let summary: RecalcSummary;
  let bytes: Buffer;
  let values: ValuesForm | undefined;
  let workbook: ExcelJS.Workbook;
  let blockers: SpillBlockers;
  // A bar on stderr only when it is a terminal: long workbooks take a while. Reading, calculating
  // and writing are single calls (exceljs, HyperFormula); placing the results counts formulas.
  const progress = phaseProgress(process.stderr, `recalc ${input}`, ['reading', 'calculating', 'placing results', 'writing']);
  progress.start(0);
  try {
    workbook = await readWorkbookFile(input);
    progress.start(1);
    try {
      summary = recalculateWorkbook(workbook, {
        onPlaced: (placed, total) => {
          if (placed === 1) progress.start(2);
          progress.advance(placed, total, 'formulas');
        },
      });
    } catch (e) {
      if (e instanceof WorkbookReadError) throw new WorkbookReadError(`${input}: ${e.message}`);
      throw e;
    }
    blockers = findSpillBlockers(workbook, summary.problems);
    progress.start(3);
    if (options.values) {
      values = convertToValues(workbook);
      bytes = await valuesWorkbookBytes(workbook);
    } else {
      bytes = await workbookBytes(workbook, summary);
    }
  } catch (e) {
    if (e instanceof WorkbookReadError) throw new CliFailure(e.message);
    throw e;
  } finally {
    progress.finish();
  }
  // Checked again just before writing: the output may have appeared meanwhile.
  checkOutputAgainstInput(input, options.output, options.force);
  writeFileAtomically(target, bytes, options.force, input);
  const { lines, notes } = describeSummary(summary, options.output, values, blockers);
  lines.forEach(output.out);
  notes.forEach(output.err);
  return summary.kept.length > 0 ? EXIT_CELLS_KEPT : EXIT_OK;
}
