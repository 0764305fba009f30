/** The description of one model, as the registry, DRIFT.MODELS() and help pages show it. */
export interface ModelInfo {
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
