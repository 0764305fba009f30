/**
 * The high-field models in the registry behind DRIFT.MODELS and the help
 * pages: present once, cited, with validity, and matching the tables.
 */
import { MODEL_REGISTRY, modelInfo } from '../../../src/physics/models';
import { HIGH_FIELD_MODELS, HIGH_FIELD_TABLES, carrierHighFieldTable, missingSaturationVelocity } from '../../../src/physics/highField';
import { findFunction } from '../../../src/catalog';
import { CAUGHEY_THOMAS_FIELD_EXPONENTS, CAUGHEY_THOMAS_FIELD_SOURCE } from '../../../src/physics/highField/caugheyThomasField';
import { KHAN_COOPER_SOURCE } from '../../../src/physics/highField/siliconCarbide';
import { parameterText } from '../../../src/physics/parameterText';

describe('high-field registry entries', () => {
  it('are in MODEL_REGISTRY exactly once, each with citation and validity', () => {
    const codes = MODEL_REGISTRY.map((entry) => entry.code);
    for (const entry of HIGH_FIELD_MODELS) {
      expect(codes.filter((code) => code === entry.code)).toHaveLength(1);
      expect(entry.citation).toMatch(/\(\d{4}\)/);
      expect(entry.citation).toMatch(/from memory/);
      expect(entry.validity.length).toBeGreaterThan(10);
    }
  });

  it('cover every table’s model code', () => {
    for (const entry of HIGH_FIELD_TABLES) {
      for (const carrier of ['electron', 'hole'] as const) {
        if (missingSaturationVelocity(entry.material, carrier) !== undefined) continue;
        expect(modelInfo(carrierHighFieldTable(entry.material, carrier).modelCode).code).toBeDefined();
      }
    }
  });

  it('state the limits users must know: no GaAs velocity peak, 4H-SiC at 300 K without holes', () => {
    expect(modelInfo('caughey-thomas-field').notes).toMatch(/negative differential mobility/);
    expect(modelInfo('quay-2000').notes).toMatch(/transferred-electron/);
    expect(modelInfo('khan-cooper-2000').validity).toMatch(/300 K only/);
    expect(modelInfo('khan-cooper-2000').notes).toMatch(/No hole value/);
  });

  it('are cited on the help pages of VELOCITY, VSAT and CURRENTDENSITY', () => {
    for (const name of ['VELOCITY', 'VSAT', 'CURRENTDENSITY']) {
      const spec = findFunction(name)!;
      for (const code of ['canali-1975', 'quay-2000', 'khan-cooper-2000']) expect(spec.models).toContain(code);
      for (const code of spec.models) expect(() => modelInfo(code)).not.toThrow();
    }
  });
});

describe('high-field citations quote the tables', () => {
  it('gives the Caughey–Thomas exponents and the Khan & Cooper velocity the core computes with', () => {
    const { electron, hole } = CAUGHEY_THOMAS_FIELD_EXPONENTS;
    expect(CAUGHEY_THOMAS_FIELD_SOURCE.citation).toContain(`β = ${electron} for electrons, ${hole} for holes`);
    const table = carrierHighFieldTable('4H-SiC', 'electron');
    if (table.saturationVelocity.form !== 'single-temperature') throw new Error('Khan & Cooper give one temperature');
    expect(KHAN_COOPER_SOURCE.citation).toContain(`v_sat = ${parameterText(table.saturationVelocity.value)} cm/s`);
  });
});
