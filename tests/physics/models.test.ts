import { MODEL_REGISTRY, modelInfo } from '../../src/physics/models';
import { BAND_MODELS } from '../../src/physics/bands/modelInfo';
import { MOBILITY_MODEL_CODES } from '../../src/physics/mobility';
import { RESISTIVITY_MODEL_CODES } from '../../src/physics/transport';
import { INTRINSIC_MODEL_CODES } from '../../src/physics/bands';
import { PhysicsDomainError } from '../../src/physics/errors';

describe('MODEL_REGISTRY', () => {
  it('holds every band model and every resistivity model code exactly once', () => {
    const codes = MODEL_REGISTRY.map((entry) => entry.code);
    expect(new Set(codes).size).toBe(codes.length);
    for (const code of [...BAND_MODELS.map((b) => b.code), ...RESISTIVITY_MODEL_CODES, ...INTRINSIC_MODEL_CODES]) {
      expect(codes).toContain(code);
    }
  });
  it('gives each entry a quantity, name, citation and validity', () => {
    for (const entry of MODEL_REGISTRY) {
      for (const field of [entry.code, entry.quantity, entry.name, entry.citation, entry.validity]) {
        expect(typeof field).toBe('string');
        expect(field.length).toBeGreaterThan(0);
      }
      expect(entry.code).toBe(entry.code.toLowerCase());
    }
  });
  it('says which values were recalled rather than read', () => {
    for (const code of MOBILITY_MODEL_CODES) expect(modelInfo(code).citation).toMatch(/from memory/);
    // F723's coefficients were checked against two public transcriptions (astmF723.ts), so no longer 'from memory'.
    expect(modelInfo('astm-f723').citation).toMatch(/transcriptions/);
  });
  it('documents the temperature dependence of the 300 K fits and the drift-mobility correction', () => {
    expect(modelInfo('masetti').notes).toMatch(/Arora/);
    expect(modelInfo('caughey-thomas').notes).toMatch(/Arora/);
    for (const code of MOBILITY_MODEL_CODES) expect(modelInfo(code).notes).toMatch(/n_eq\(300 K\)/);
  });
});

describe('modelInfo', () => {
  it('looks codes up case-insensitively', () => {
    expect(modelInfo(' MASETTI ').code).toBe('masetti');
    expect(modelInfo('Astm-F723').quantity).toMatch(/resistivity/);
  });
  it('rejects unknown codes listing every code', () => {
    expect(() => modelInfo('no-such-model')).toThrow(PhysicsDomainError);
    expect(() => modelInfo('no-such-model')).toThrow(/masetti.*klaassen.*astm-f723/);
  });
});
