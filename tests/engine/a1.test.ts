import { areaName, cellName, columnName } from '../../src/engine/a1';
import { cellAddress, columnLetters } from '../../src/engine/xlsx';
import { blockAddress } from '../../src/taskpane/port';

describe('A1 names', () => {
  it('names columns A…Z, AA… up to Excel’s last column XFD', () => {
    expect([0, 25, 26, 27, 701, 702, 16383].map(columnName)).toEqual(['A', 'Z', 'AA', 'AB', 'ZZ', 'AAA', 'XFD']);
    expect(() => columnName(-1)).toThrow(RangeError);
  });

  it('names cells and areas from 0-based coordinates, one cell without a colon', () => {
    expect(cellName(0, 27)).toBe('AB1');
    expect(areaName(1, 1, 8, 3)).toBe('B2:D9');
    expect(areaName(4, 2, 4, 2)).toBe('C5');
  });

  it('is the one naming behind the pane’s blocks and the workbook recalculation’s 1-based addresses', () => {
    expect(blockAddress({ sheet: 'Sheet1', row: 1, column: 1, rowCount: 8, columnCount: 3 })).toBe('B2:D9');
    expect(columnLetters(28)).toBe('AB');
    expect(cellAddress(1, 28)).toBe('AB1');
  });
});
