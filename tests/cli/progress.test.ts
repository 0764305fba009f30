import { phaseProgress, renderProgress, type ProgressStream } from '../../src/cli/progress';

/** A stand-in for process.stderr that records what is written. */
function fakeStream(isTTY: boolean, columns?: number): ProgressStream & { written: string[] } {
  const written: string[] = [];
  return { isTTY, columns, written, write: (text: string) => written.push(text) };
}

describe('renderProgress', () => {
  it('fills the bar in proportion to the finished phases', () => {
    expect(renderProgress('recalc a.xlsx', 0, 3, 'reading', 80)).toBe(`recalc a.xlsx [${'·'.repeat(24)}] 0/3 reading`);
    expect(renderProgress('recalc a.xlsx', 1, 3, 'calculating', 80)).toBe(
      `recalc a.xlsx [${'#'.repeat(8)}${'·'.repeat(16)}] 1/3 calculating`,
    );
    expect(renderProgress('recalc a.xlsx', 3, 3, 'writing', 80)).toBe(`recalc a.xlsx [${'#'.repeat(24)}] 3/3 writing`);
  });

  it('counts within a phase and fills the bar by that share of it', () => {
    // 2 of 4 phases done and a quarter of the third: 2.25/4 of 24 characters is 13.5, shown as 14.
    expect(renderProgress('recalc a.xlsx', 2, 4, 'placing results', 80, { done: 500, total: 2000, unit: 'formulas' })).toBe(
      `recalc a.xlsx [${'#'.repeat(14)}${'·'.repeat(10)}] 2/4 placing results 500/2000 formulas`,
    );
    expect(renderProgress('recalc a.xlsx', 2, 4, 'placing results', 80, { done: 2000, total: 2000, unit: 'formulas' })).toBe(
      `recalc a.xlsx [${'#'.repeat(18)}${'·'.repeat(6)}] 2/4 placing results 2000/2000 formulas`,
    );
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

describe('phaseProgress counting cells', () => {
  it('redraws only when the whole percentage changes: at most 101 frames for any count', () => {
    const stream = fakeStream(true, 120);
    const progress = phaseProgress(stream, 'recalc w.xlsx', ['reading', 'calculating', 'placing results', 'writing']);
    progress.start(2);
    for (let placed = 1; placed <= 40000; placed++) progress.advance(placed, 40000, 'formulas');
    progress.finish();
    // One frame for the phase, one per percent from 0 to 100, and the clearing write.
    expect(stream.written).toHaveLength(1 + 101 + 1);
    expect(stream.written[1]).toBe(
      `\r${renderProgress('recalc w.xlsx', 2, 4, 'placing results', 120, { done: 1, total: 40000, unit: 'formulas' })}`,
    );
    expect(stream.written[101].trimEnd()).toBe(
      `\r${renderProgress('recalc w.xlsx', 2, 4, 'placing results', 120, { done: 40000, total: 40000, unit: 'formulas' })}`,
    );
  });

  it('counts from the start again in the next phase', () => {
    const stream = fakeStream(true, 120);
    const progress = phaseProgress(stream, 'x', ['a', 'b']);
    progress.start(0);
    progress.advance(5, 10, 'cells');
    progress.start(1);
    progress.advance(5, 10, 'cells');
    expect(stream.written.map((w) => w.trimEnd())).toEqual([
      `\r${renderProgress('x', 0, 2, 'a', 120)}`,
      `\r${renderProgress('x', 0, 2, 'a', 120, { done: 5, total: 10, unit: 'cells' })}`,
      `\r${renderProgress('x', 1, 2, 'b', 120)}`,
      `\r${renderProgress('x', 1, 2, 'b', 120, { done: 5, total: 10, unit: 'cells' })}`,
    ]);
  });

  it('draws no count when the stream is not a terminal', () => {
    const stream = fakeStream(false);
    const progress = phaseProgress(stream, 'x', ['a']);
    progress.start(0);
    progress.advance(1, 2, 'cells');
    progress.finish();
    expect(stream.written).toEqual([]);
  });
});
