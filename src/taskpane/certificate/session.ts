/**
 * The certificate check's steps against a workbook, without any DOM: read the
 * selected table and guess its mapping and units, then plan and write the
 * check. The pane's controls (view.ts) call these; unit tests call them with
 * an in-memory port.
 */
import { sheetAddress, type CellBlock, type WorkbookPort } from '../port';
import { applySheetPlan, PaneRefusal } from '../sheetPlan';
import { guessMapping } from './headers';
import { planCertificateCheck, type CertificatePlan, type CertificateSettings, type CertificateTable } from './plan';
import { RESISTIVITY_ROLES, type ColumnRole } from './roles';
import { readResistivityUnit, readThicknessUnit, RESISTIVITY_UNITS } from './units';
import { requireTableRows } from './validate';

/** What the pane proposes after reading a table. */
export interface CertificateGuess {
  readonly headers: readonly string[];
  readonly mapping: readonly ColumnRole[];
  /** Resistivity unit code, or null when the headers disagree or name an unsupported unit. */
  readonly resistivityUnit: string | null;
  /** Thickness unit code, or null when the header names none (or an unsupported one). */
  readonly thicknessUnit: string | null;
  /** What the user should know about the guess. */
  readonly notes: readonly string[];
}

function headerText(value: unknown): string {
  return value === null || value === undefined || typeof value === 'object' ? '' : String(value).trim();
}

/**
 * Unit codes suggested by a mapping's headers, with notes.
 *
 * @param headers - header row
 * @param mapping - one role per column
 * @example guessUnits(['Rho min (ohm-cm)', 'Thk (mm)'], ['rho-min', 'thickness']).thicknessUnit // 'mm'
 */
export function guessUnits(headers: readonly string[], mapping: readonly ColumnRole[]): Omit<CertificateGuess, 'headers' | 'mapping'> {
  const notes: string[] = [];
  const resistivityReadings = mapping.flatMap((role, index) =>
    RESISTIVITY_ROLES.has(role) ? [{ header: headers[index], reading: readResistivityUnit(headers[index]) }] : [],
  );
  let resistivityUnit: string | null = RESISTIVITY_UNITS[0].code;
  const unsupported = resistivityReadings.find((entry) => entry.reading.kind === 'unsupported');
  const named = new Set(resistivityReadings.flatMap((entry) => (entry.reading.kind === 'unit' ? [entry.reading.unit.code] : [])));
  if (unsupported !== undefined) {
    resistivityUnit = null;
    notes.push(
      `'${unsupported.header}' gives resistivity in a unit the check does not convert; only ` +
        `${RESISTIVITY_UNITS.map((unit) => unit.label).join(' and ')} are known. Convert the column or ` +
        `choose the unit if the header is misleading.`,
    );
  } else if (named.size > 1) {
    resistivityUnit = null;
    notes.push(
      'The resistivity headers name different units; all resistivity columns must be in one unit. ' +
        'Choose it, or convert the columns first.',
    );
  } else if (named.size === 1) {
    resistivityUnit = [...named][0];
  } else if (resistivityReadings.length > 0) {
    notes.push('No resistivity unit in the headers: Ω·cm assumed, the usual unit of wafer certificates.');
  }
  let thicknessUnit: string | null = null;
  const thicknessIndex = mapping.indexOf('thickness');
  if (thicknessIndex >= 0) {
    const reading = readThicknessUnit(headers[thicknessIndex]);
    if (reading.kind === 'unit') thicknessUnit = reading.unit.code;
    else if (reading.kind === 'unsupported')
      notes.push(
        `The thickness header '${headers[thicknessIndex]}' ` +
          `gives the unit '${reading.text}', which the check does not convert (µm, mm, mil). Choose the unit ` +
          `or set the column to 'not used'.`,
      );
    else notes.push(`The thickness header '${headers[thicknessIndex]}' names no unit: choose µm, mm or mil.`);
  }
  return { resistivityUnit, thicknessUnit, notes };
}

/**
 * Largest table the check reads. A certificate lists tens to hundreds of
 * wafers; a whole-column selection (a million rows) is refused rather than
 * read and filled with a million formulas.
 */
export const MAX_TABLE = { rows: 5000, columns: 60 } as const;

/**
 * Reads the selected block as a certificate table and guesses its mapping.
 *
 * @param port - workbook
 * @returns the table and the guess
 * @throws PaneRefusal when the selection cannot be a table (one row, no headers)
 */
export async function readCertificateTable(port: WorkbookPort): Promise<{ table: CertificateTable; guess: CertificateGuess }> {
  const block = await port.selection();
  requireTableRows(block);
  if (block.rowCount > MAX_TABLE.rows || block.columnCount > MAX_TABLE.columns) {
    throw new PaneRefusal(
      `The selection ${sheetAddress(block)} is ${block.rowCount} rows × ${block.columnCount} columns; select just the certificate table ` +
        `(at most ${MAX_TABLE.rows} rows and ${MAX_TABLE.columns} columns), not whole columns or rows.`,
    );
  }
  const selected = await port.read(block);
  const headers = (selected.values[0] ?? []).map(headerText);
  if (headers.every((header) => header === '')) {
    throw new PaneRefusal(`The first row of ${sheetAddress(block)} is empty; select the table starting with its header row.`);
  }
  // Empty rows at the end of a generous selection are not wafers: leave them out.
  const filled = (row: readonly unknown[] | undefined): boolean => (row ?? []).some((value) => value !== null && value !== '');
  let rowCount = block.rowCount;
  while (rowCount > 1 && !filled(selected.values[rowCount - 1])) rowCount -= 1;
  if (rowCount < 2) throw new PaneRefusal(`The selection ${sheetAddress(block)} has a header row but no wafer rows below it.`);
  const table: CertificateTable = {
    block: { ...block, rowCount },
    contents: { values: selected.values.slice(0, rowCount), formulas: selected.formulas.slice(0, rowCount) },
  };
  const columns = headers.map((_, column) => table.contents.values.slice(1).map((row) => row[column] ?? null));
  const mapping = guessMapping(headers, columns);
  const units = guessUnits(headers, mapping);
  const notes =
    rowCount < block.rowCount
      ? [`The empty rows at the end of the selection (${block.rowCount - rowCount}) are left out.`, ...units.notes]
      : units.notes;
  return { table, guess: { headers, mapping, ...units, notes } };
}

/**
 * Re-reads the table (it may have changed since it was read), plans the check and writes it.
 *
 * @param port - workbook
 * @param block - the table's block as read by readCertificateTable
 * @param settings - the user's choices
 * @returns the plan that was written
 * @throws PaneRefusal when the settings are incomplete or the target cells are not empty
 */
export async function addCertificateCheck(port: WorkbookPort, block: CellBlock, settings: CertificateSettings): Promise<CertificatePlan> {
  const contents = await port.read(block);
  const plan = planCertificateCheck({ block, contents }, settings);
  await applySheetPlan(port, plan);
  return plan;
}
