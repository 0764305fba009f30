/**
 * From a model's registry entry to the catalog: every model the core registers
 * is cited by the functions that use it, so a reader who starts at an entry of
 * MODEL_REGISTRY finds its spreadsheet functions with functionsCiting.
 */
import { CATALOG, functionsCiting } from '../../src/catalog';
import { MODEL_REGISTRY } from '../../src/physics';

/** Registered for the core only, with the reason; no spreadsheet function takes them. */
const CORE_ONLY: Readonly<Record<string, string>> = {
  boltzmann: 'comparison statistics of solveEquilibrium; every function uses fermi-dirac',
};

describe('functionsCiting', () => {
  it('finds, for every registered model, the functions whose help cites it', () => {
    const uncited = MODEL_REGISTRY.filter((entry) => !(entry.code in CORE_ONLY) && functionsCiting(entry.code).length === 0);
    expect(uncited.map((entry) => entry.code)).toEqual([]);
  });

  it('names only models the core registers as core-only', () => {
    const codes = new Set(MODEL_REGISTRY.map((entry) => entry.code));
    for (const code of Object.keys(CORE_ONLY)) {
      expect(codes.has(code)).toBe(true);
      expect(functionsCiting(code)).toEqual([]);
    }
  });

  it('returns exactly the functions whose models list holds the code, any case', () => {
    const masetti = CATALOG.filter((spec) => spec.models.includes('masetti')).map((spec) => spec.name);
    expect(masetti).toContain('MOBILITY');
    expect(masetti).toContain('RESISTIVITY');
    expect(functionsCiting(' Masetti ')).toEqual(masetti);
    expect(functionsCiting('no-such-model')).toEqual([]);
  });
});
