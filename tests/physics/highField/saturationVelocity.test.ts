/**
 * Saturation-velocity tables and their evaluation ranges. Published values
 * themselves are checked in tests/physics/reference (canali-1975, quay-2000,
 * khan-cooper-2000); here: the forms, the ranges and the refusals.
 */
import {
  HIGH_FIELD_MATERIAL_CODES,
  HIGH_FIELD_TABLES,
  carrierHighFieldTable,
  fieldExponent,
  materialHighFieldTables,
  missingSaturationVelocity,
  saturationVelocity,
  SILICON_HOLE_LAW_CROSSING_K,
} from '../../../src/physics/highField';
import { MATERIAL_CODES } from '../../../src/physics/materials';
import { PhysicsDomainError } from '../../../src/physics/errors';

describe('high-field tables', () => {
  it('cover Si, Ge, GaAs and 4H-SiC, keyed by the material codes', () => {
    expect(HIGH_FIELD_MATERIAL_CODES).toEqual(['Si', 'Ge', 'GaAs', '4H-SiC']);
    // Every material the core offers has a table (so VELOCITY never meets an unknown material).
    for (const code of MATERIAL_CODES) expect(HIGH_FIELD_MATERIAL_CODES).toContain(code);
  });

  it('give every tabulated carrier a citation, a validity and a non-empty evaluation range', () => {
    for (const entry of HIGH_FIELD_TABLES) {
      for (const carrier of ['electron', 'hole'] as const) {
        if (missingSaturationVelocity(entry.material, carrier) !== undefined) continue;
        const table = carrierHighFieldTable(entry.material, carrier);
        for (const source of [table.saturationSource, table.fieldExponentSource]) {
          expect(source.citation).toMatch(/\(\d{4}\)/);
          expect(source.validity.length).toBeGreaterThan(10);
        }
        expect(table.saturationSource.citation).toMatch(/from memory/);
        expect(table.evaluationRange.max).toBeGreaterThanOrEqual(table.evaluationRange.min);
      }
    }
  });

  it('are looked up case-insensitively and refuse unknown materials naming the available ones', () => {
    expect(materialHighFieldTables('gaas').material).toBe('GaAs');
    expect(() => materialHighFieldTables('InP')).toThrow(/available: Si, Ge, GaAs, 4H-SiC/);
  });

  it('say GaAs electrons have a velocity peak the monotone curve does not model', () => {
    expect(materialHighFieldTables('GaAs').limitations).toMatch(/negative differential mobility/);
    expect(materialHighFieldTables('GaAs').limitations).toMatch(/underestimates/);
  });
});

describe('saturationVelocity and fieldExponent', () => {
  it('decrease smoothly with temperature where a temperature law is tabulated', () => {
    for (const [material, from] of [
      ['Si', 77],
      ['Ge', 20],
      ['GaAs', 20],
    ] as const) {
      for (const carrier of ['electron', 'hole'] as const) {
        let previous = Infinity;
        const start = Math.max(from, carrierHighFieldTable(material, carrier).evaluationRange.min);
        for (let t = start; t <= 1000; t += 10) {
          const v = saturationVelocity(material, carrier, t);
          expect(v).toBeLessThan(previous);
          expect(v).toBeGreaterThan(1e6);
          previous = v;
        }
      }
    }
  });

  it('refuse Si electrons below 77 K, Si holes below 102 K and both above 1000 K, naming the range and why', () => {
    expect(() => saturationVelocity('Si', 'electron', 76)).toThrow(/77–1000 K.*not tabulated/);
    expect(() => fieldExponent('Si', 'hole', 1001)).toThrow(PhysicsDomainError);
    expect(() => saturationVelocity('Si', 'hole', 101)).toThrow(/102–1000 K.*hole law exceeds the electron law/);
    expect(() => saturationVelocity('Si', 'hole', Number.NaN)).toThrow(/102–1000 K/);
  });

  it('keep the Si electron saturation velocity at or above the hole one at every temperature both accept (issue 12)', () => {
    expect(SILICON_HOLE_LAW_CROSSING_K).toBeGreaterThan(100);
    expect(SILICON_HOLE_LAW_CROSSING_K).toBeLessThan(102);
    for (let t = 102; t <= 1000; t += 1) {
      expect(saturationVelocity('Si', 'electron', t)).toBeGreaterThanOrEqual(saturationVelocity('Si', 'hole', t));
    }
  });

  it('give 4H-SiC electrons at 300 K only and refuse 4H-SiC holes', () => {
    expect(saturationVelocity('4H-SiC', 'electron', 300)).toBeGreaterThan(0);
    expect(() => saturationVelocity('4H-SiC', 'electron', 301)).toThrow(/only 300 K/);
    expect(() => saturationVelocity('4H-SiC', 'hole', 300)).toThrow('no published hole saturation velocity for 4H-SiC in this release');
    expect(missingSaturationVelocity('4H-SiC', 'hole')).toMatch(/no published hole/);
    expect(missingSaturationVelocity('Si', 'hole')).toBeUndefined();
  });

  it('use Caughey–Thomas β = 2 (electrons), 1 (holes) where no β was fitted (Caughey & Thomas 1967, from memory)', () => {
    for (const material of ['Ge', 'GaAs']) {
      expect(fieldExponent(material, 'electron', 300)).toBe(2);
      expect(fieldExponent(material, 'hole', 450)).toBe(1);
      expect(carrierHighFieldTable(material, 'electron').fieldExponentSource.citation).toMatch(/our assumption/);
    }
    expect(fieldExponent('4H-SiC', 'electron', 300)).toBe(2);
  });
});
