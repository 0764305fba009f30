/**
 * Where a model lives in the repository: the file with its equation, the file
 * with its fitted values (the same file where that is so) and the test files
 * that check it, the reference test against the published source first where
 * one exists. For readers of the code only; DRIFT.MODELS(), help pages and
 * README do not show it. tests/physics/modelLocations.test.ts checks the paths.
 */
export interface ModelLocation {
  /** Source file holding the equation (repository path, under src/physics). */
  readonly equation: string;
  /** Source file holding the fitted parameter values (repository path, under src/physics). */
  readonly parameterTable: string;
  /** Test files that check the model (repository paths), the reference test first where there is one. */
  readonly tests: readonly string[];
}

/**
 * The three location fields of an entry that has them, and nothing else, for
 * a registry row built from a parameter table.
 *
 * @param entry - a table entry with equation, parameterTable and tests
 * @returns a new object with just those three fields
 * @example locationOf(SILICON.bandgap).equation // → 'src/physics/bands/bandgap.ts'
 */
export function locationOf(entry: ModelLocation): ModelLocation {
  return { equation: entry.equation, parameterTable: entry.parameterTable, tests: entry.tests };
}

/** The description of one model, as the registry, DRIFT.MODELS() and help pages show it, and where it lives. */
export interface ModelInfo extends ModelLocation {
  /** Code as users type it (lower case; look-up is case-insensitive). */
  readonly code: string;
  /** What the model computes. */
  readonly quantity: string;
  /** Descriptive name. */
  readonly name: string;
  /** Full citation ("from memory" where values were recalled). */
  readonly citation: string;
  /** Range the source validated. */
  readonly validity: string;
  /** How the core uses it beyond the source (extensions, assumptions). */
  readonly notes?: string;
}
