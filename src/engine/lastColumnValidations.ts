/**
 * A workaround for exceljs 4.4's writer, which fails on data validation that
 * reaches Excel's last column XFD ("16385 is out of bounds"): when it squeezes
 * per-cell validations into rectangles it looks one column past the last.
 * Before writing, the validations of column XFD are given as ranges, one per
 * run of rows with the same rule, which the writer emits as they are; cells
 * to their left then stop growing at XFD. The rules and cells are unchanged.
 */
import type ExcelJS from 'exceljs';

/** Excel's last column, XFD. */
const LAST_COLUMN = 'XFD';

/**
 * Rewrites every sheet's XFD validations into range form, in place.
 *
 * @example lastColumnValidationsAsRanges(workbook); await workbook.xlsx.writeBuffer()
 */
export function lastColumnValidationsAsRanges(workbook: ExcelJS.Workbook): void {
  for (const worksheet of workbook.worksheets) {
    const model = (worksheet as unknown as { dataValidations?: { model: Record<string, unknown> } }).dataValidations?.model;
    if (model === undefined) continue;
    const rows: { row: number; rule: unknown }[] = [];
    for (const [address, rule] of Object.entries(model)) {
      const match = /^XFD(\d+)$/.exec(address);
      if (match === null || rule === undefined) continue;
      rows.push({ row: Number(match[1]), rule });
      delete model[address];
    }
    rows.sort((a, b) => a.row - b.row);
    for (let i = 0; i < rows.length;) {
      let j = i;
      const sameRule = (k: number) => JSON.stringify(rows[k].rule) === JSON.stringify(rows[i].rule);
      while (j + 1 < rows.length && rows[j + 1].row === rows[j].row + 1 && sameRule(j + 1)) j++;
      model[`${LAST_COLUMN}${rows[i].row}:${LAST_COLUMN}${rows[j].row}`] = rows[i].rule;
      i = j + 1;
    }
  }
}
