import { phaseProgress, renderProgress, type ProgressStream } from '../../src/cli/progress';

/** A stand-in for process.stderr that records what is written. */
function fakeStream(isTTY: boolean, columns?: number): ProgressStream & { written: string[] } {
  const written: string[] = [];
  return { isTTY, columns, written, write: (text: string) => written.push(text) };
}

describe('renderProgress', () => {
  it('fills the bar in proportion to the finished phases', () => {
    expect(renderProgress('recalc a.xlsx', 0, 3, 'reading', 80)).toBe(`recalc a.xlsx [${'·'.repeat(24)}] 0/3 reading`);
    expect(renderProgress('recalc a.xlsx', 1, 3, 'calculating', 80)).toBe(`recalc a.xlsx [${'#'.repeat(8)}${'·'.repeat(16)}] 1/3 calculating`);
    expect(renderProgress('recalc a.xlsx', 3, 3, 'writing', 80)).toBe(`recalc a.xlsx [${'#'.repeat(24)}] 3/3 writing`);
  });

  it('never writes past the last column of a narrow terminal', () => {
    const frame = renderProgress('recalc a-very-long-workbook-name.xlsx', 1, 3, 'calculating', 30);
    expect(frame).toHaveLength(29);
    expect(frame.endsWith('…')).toBe(true);
  });
});

describe('phaseProgress', () => {
  it('draws each phase over the previous one and clears the line at the end', () => {
    const stream = fakeStream(true, 80);
    const progress = phaseProgress(stream, 'recalc w.xlsx', ['reading', 'calculating', 'writing']);
    progress.start(0);
    progress.start(1);
    progress.start(2);
    progress.finish();
    const first = renderProgress('recalc w.xlsx', 0, 3, 'reading', 80);
    const second = renderProgress('recalc w.xlsx', 1, 3, 'calculating', 80);
    const third = renderProgress('recalc w.xlsx', 2, 3, 'writing', 80);
    expect(stream.written).toEqual([`\r${first}`, `\r${second}`, `\r${third.padEnd(second.length)}`, `\r${' '.repeat(third.length)}\r`]);
  });

  it('writes nothing when the stream is not a terminal (piped or redirected)', () => {
    const stream = fakeStream(false);
    const progress = phaseProgress(stream, 'recalc w.xlsx', ['reading', 'calculating', 'writing']);
    progress.start(0);
    progress.finish();
    expect(stream.written).toEqual([]);
  });
});
