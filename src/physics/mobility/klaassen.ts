/**
 * Klaassen's unified mobility model for silicon (D. B. M. Klaassen,
 * Solid-State Electron. 35, 953 and 961 (1992)), in three parts:
 * klaassen/parameters.ts (the fitted values and their citation),
 * klaassen/equations.ts (the model's equations, as the paper writes them) and
 * klaassen/sample.ts (how a sample becomes the model's N_D, N_A, n and p).
 * This module gathers them, so importers need one path.
 */
export * from './klaassen/parameters';
export * from './klaassen/equations';
export * from './klaassen/sample';
