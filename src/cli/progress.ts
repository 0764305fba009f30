/**
 * A progress bar for long CLI runs, drawn on one terminal line with carriage
 * returns. It is drawn only on a terminal: piped or redirected stderr gets no
 * bar, so logs and scripts see only the command's real messages.
 */

/** The part of a writable stream the bar uses (process.stderr fits). */
export interface ProgressStream {
  write(text: string): unknown;
  /** True on a terminal; the bar is drawn only then. */
  readonly isTTY?: boolean;
  /** Terminal width in characters, when known. */
  readonly columns?: number;
}

/** Progress through named phases of a run. */
export interface PhaseProgress {
  /** Shows that phase `index` (0-based) has started. */
  start(index: number): void;
  /** Clears the bar's line, leaving the terminal as it was. */
  finish(): void;
}

/** Width of the bar itself, in characters, when the terminal is wide enough. */
const BAR_WIDTH = 24;
/** Used when the stream does not report its width. */
const DEFAULT_COLUMNS = 80;

/**
 * One frame of the bar, without the leading carriage return.
 *
 * @param label - what runs, e.g. `recalc wafers.xlsx`
 * @param done - phases finished (0 … total)
 * @param total - number of phases (≥ 1)
 * @param phase - name of the phase now running
 * @param columns - terminal width; the frame never exceeds columns − 1 characters
 * @returns e.g. `recalc a.xlsx [########········] 1/3 calculating`
 * @example renderProgress('recalc a.xlsx', 1, 3, 'calculating', 80)
 */
export function renderProgress(label: string, done: number, total: number, phase: string, columns: number): string {
  const filled = Math.round((BAR_WIDTH * Math.min(Math.max(done, 0), total)) / total);
  const bar = `[${'#'.repeat(filled)}${'·'.repeat(BAR_WIDTH - filled)}]`;
  const frame = `${label} ${bar} ${done}/${total} ${phase}`;
  const room = Math.max(1, columns - 1);
  return frame.length <= room ? frame : `${frame.slice(0, room - 1)}…`;
}

const NO_PROGRESS: PhaseProgress = { start: () => undefined, finish: () => undefined };

/**
 * A phase progress bar on `stream`, or one that draws nothing when the
 * stream is not a terminal.
 *
 * @param stream - usually process.stderr
 * @param label - shown before the bar
 * @param phases - phase names, in order
 * @example const progress = phaseProgress(process.stderr, 'recalc a.xlsx', ['reading', 'calculating', 'writing'])
 */
export function phaseProgress(stream: ProgressStream, label: string, phases: readonly string[]): PhaseProgress {
  if (stream.isTTY !== true || phases.length === 0) return NO_PROGRESS;
  let shown = 0;
  const columns = () => stream.columns ?? DEFAULT_COLUMNS;
  return {
    start(index: number) {
      const frame = renderProgress(label, index, phases.length, phases[Math.min(index, phases.length - 1)] ?? '', columns());
      // Pads over a longer previous frame so no characters of it remain.
      stream.write(`\r${frame.padEnd(shown)}`);
      shown = frame.length;
    },
    finish() {
      if (shown > 0) stream.write(`\r${' '.repeat(shown)}\r`);
      shown = 0;
    },
  };
}
