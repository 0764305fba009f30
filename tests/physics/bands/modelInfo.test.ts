import { BAND_MODELS, INTRINSIC_MODEL_CODES } from '../../../src/physics/bands';

describe('BAND_MODELS', () => {
  it('describes every ni model and the gap, DOS, statistics and ionization models', () => {
    const codes = BAND_MODELS.map((model) => model.code);
    for (const code of [...INTRINSIC_MODEL_CODES, 'thurmond', 'green-1990', 'boltzmann', 'altermatt-2006']) {
      expect(codes).toContain(code);
    }
    expect(new Set(codes).size).toBe(codes.length);
  });

  it('uses lower-case codes and gives each a quantity, name, citation and validity', () => {
    for (const model of BAND_MODELS) {
      expect(model.code).toBe(model.code.toLowerCase());
      for (const field of [model.quantity, model.name, model.citation, model.validity]) {
        expect(field.trim().length).toBeGreaterThan(3);
      }
    }
  });

  it('marks recalled parameter values as such', () => {
    const misiakos = BAND_MODELS.find((model) => model.code === 'misiakos')!;
    expect(misiakos.citation).toMatch(/from memory/);
    expect(misiakos.notes).toMatch(/Default/);
  });
});
