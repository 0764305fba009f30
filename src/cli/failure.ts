/**
 * Exit statuses of the `driftcell` command and the error a command throws to
 * stop with a one-line message (no stack trace).
 */

export const EXIT_OK = 0;
/** `calc`: the formula's whole result is an error. */
export const EXIT_RESULT_ERROR = 1;
/** `recalc`: the copy was written, but some formula cells were kept unrecalculated (listed on stderr). */
export const EXIT_CELLS_KEPT = 1;
/** The command could not do its job: bad usage, unreadable input, refused overwrite. */
export const EXIT_CANNOT_RUN = 2;

/** Stops a command; main prints `driftcell: <message>` on stderr and exits with `exitCode`. */
export class CliFailure extends Error {
  constructor(
    message: string,
    readonly exitCode: number = EXIT_CANNOT_RUN,
  ) {
    super(message);
    this.name = 'CliFailure';
  }
}

/** Where a command writes; tests pass their own. */
export interface Output {
  readonly out: (line: string) => void;
  readonly err: (line: string) => void;
}

export const PROCESS_OUTPUT: Output = {
  out: (line) => process.stdout.write(`${line}\n`),
  err: (line) => process.stderr.write(`${line}\n`),
};
