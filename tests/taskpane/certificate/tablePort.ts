/**
 * The certificate table on an in-memory sheet, as the certificate tests start
 * from it: the fixture table at B2, selected, with the pane's own guess of its
 * column roles; and a reader for the numbers the engine then shows.
 */
import { readCertificateTable } from '../../../src/taskpane/certificate/session';
import type { ColumnRole } from '../../../src/taskpane/certificate/roles';
import type { ResultElement } from '../../../src/engine/engine';
import { MemoryPort, valueAt } from '../support/memoryPort';
import { CERTIFICATE_TABLE } from './fixture';

/** The table's top-left cell, B2 (0-based row and column). */
export const TOP = 1;
export const LEFT = 1;
/** The first column right of the fixture table, where the check's columns start (column L). */
export const FIRST_NEW = LEFT + CERTIFICATE_TABLE[0].length;

/** A port holding `table` at B2, the table selected, and the role of each column as the pane guesses it. */
export async function portWithTable(table = CERTIFICATE_TABLE): Promise<{ port: MemoryPort; mapping: readonly ColumnRole[] }> {
  const port = new MemoryPort();
  port.put(TOP, LEFT, table);
  port.select(TOP, LEFT, table.length, table[0].length);
  const { guess } = await readCertificateTable(port);
  return { port, mapping: guess.mapping };
}

/** The number the engine shows in a cell; anything else fails the test with what was shown. */
export function numberAt(values: Map<string, ResultElement[][]>, row: number, column: number): number {
  const shown = valueAt(values, row, column);
  if (typeof shown !== 'number') throw new Error(`cell (${row}, ${column}) shows ${JSON.stringify(shown)}`);
  return shown;
}
