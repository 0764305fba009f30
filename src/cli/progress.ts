/**
 * A progress bar for long CLI runs, drawn on one terminal line with carriage
 * returns: the phases of the run, and within a phase that loops over cells
 * the count done so far (`placing results 12000/400000 formulas`). It is drawn only on a terminal: piped or redirected stderr gets no
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
  /**
   * Shows how far the running phase has come in counted units; redrawn only
   * when the whole percentage changes, so at most about 100 times a phase.
   */
  advance(done: number, total: number, unit: string): void;
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
 * @param count - how far the running phase has come, when it counts (cells, formulas); the bar
 *   then also fills by that share of the phase
 * @returns e.g. `recalc a.xlsx [########········] 1/3 calculating`
 * @example renderProgress('recalc a.xlsx', 2, 4, 'placing results', 80, { done: 500, total: 2000, unit: 'formulas' })
 *   // 'recalc a.xlsx [##############··········] 2/4 placing results 500/2000 formulas'
 */
export function renderProgress(label: string, done: number, total: number, phase: string, columns: number, count?: PhaseCount): string {
  const share = count === undefined || count.total <= 0 ? 0 : Math.min(Math.max(count.done / count.total, 0), 1);
  const finished = Math.min(Math.max(done, 0), total);
  const filled = Math.round((BAR_WIDTH * Math.min(finished + share, total)) / total);
  const bar = `[${'#'.repeat(filled)}${'·'.repeat(BAR_WIDTH - filled)}]`;
  const counted = count === undefined ? '' : ` ${count.done}/${count.total} ${count.unit}`;
  const frame = `${label} ${bar} ${done}/${total} ${phase}${counted}`;
  const room = Math.max(1, columns - 1);
  return frame.length <= room ? frame : `${frame.slice(0, room - 1)}…`;
}

/** How far a phase that loops over countable things has come. */
export interface PhaseCount {
  readonly done: number;
  readonly total: number;
  /** What is counted, plural: `formulas`, `cells`. */
  readonly unit: string;
}

const NO_PROGRESS: PhaseProgress = { start: () => undefined, advance: () => undefined, finish: () => undefined };

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
  let phase = 0;
  let percent = -1;
  const columns = () => stream.columns ?? DEFAULT_COLUMNS;
  const draw = (count?: PhaseCount) => {
    const frame = renderProgress(label, phase, phases.length, phases[Math.min(phase, phases.length - 1)] ?? '', columns(), count);
    // Pads over a longer previous frame so no characters of it remain.
    stream.write(`\r${frame.padEnd(shown)}`);
    shown = frame.length;
  };
  return {
    start(index: number) {
      phase = index;
      percent = -1;
      draw();
    },
    advance(done: number, total: number, unit: string) {
      const now = total > 0 ? Math.floor((100 * Math.min(done, total)) / total) : 100;
      if (now === percent) return;
      percent = now;
      draw({ done, total, unit });
    },
    finish() {
      if (shown > 0) stream.write(`\r${' '.repeat(shown)}\r`);
      shown = 0;
    },
  };
}
