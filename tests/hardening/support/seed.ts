/**
 * One fixed seed for the property tests, so CI is repeatable; set
 * DRIFTCELL_FUZZ_SEED to explore other inputs (fast-check prints the seed and
 * counterexample of any failure, which can then be pinned as a unit test).
 */
import fc from 'fast-check';

export const FUZZ_SEED = Number(process.env.DRIFTCELL_FUZZ_SEED ?? 20261201);

fc.configureGlobal({ seed: FUZZ_SEED });
