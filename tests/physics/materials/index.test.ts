import { PhysicsDomainError } from '../../../src/physics/errors';
import { checkTemperature, MATERIAL_CODES, resolveMaterial, SILICON } from '../../../src/physics/materials';

describe('materials', () => {
  it('lists silicon first (the default), then germanium, gallium arsenide and 4H silicon carbide', () => {
    expect(MATERIAL_CODES).toEqual(['Si', 'Ge', 'GaAs', '4H-SiC']);
  });

  it('resolves codes case-insensitively and ignores surrounding blanks', () => {
    expect(resolveMaterial('Si')).toBe(SILICON);
    expect(resolveMaterial('si')).toBe(SILICON);
    expect(resolveMaterial(' SI ')).toBe(SILICON);
  });

  it('rejects unknown codes, naming the allowed ones', () => {
    expect(() => resolveMaterial('GaN')).toThrow(PhysicsDomainError);
    expect(() => resolveMaterial('GaN')).toThrow(/unknown material 'GaN'.*Si, Ge, GaAs, 4H-SiC/);
  });

  it('gives every parameter table a citation and a validity range', () => {
    const tables = [
      SILICON.bandgap,
      SILICON.densityOfStates,
      ...SILICON.intrinsicFits,
      ...SILICON.dopants.map((dopant) => dopant.ionization),
    ];
    for (const table of tables) {
      expect(table.citation.length).toBeGreaterThan(10);
      expect(table.validity.length).toBeGreaterThan(10);
    }
  });

  it('bounds temperatures to 1 K … 1687 K (the melting point of Si, common practice, no source)', () => {
    expect(checkTemperature(SILICON, 300)).toBe(300);
    expect(checkTemperature(SILICON, 1)).toBe(1);
    expect(checkTemperature(SILICON, 1687)).toBe(1687);
    expect(() => checkTemperature(SILICON, 0.5)).toThrow(/0.5 K is outside the range allowed for silicon: 1–1687 K/);
    expect(() => checkTemperature(SILICON, 2000)).toThrow(PhysicsDomainError);
    expect(() => checkTemperature(SILICON, Number.NaN)).toThrow(PhysicsDomainError);
  });

  it('has the Si atomic density 4.99e22 cm⁻³ (8 atoms per 5.431 Å cell, common practice, no source)', () => {
    expect(SILICON.atomicDensity / 4.994e22).toBeCloseTo(1, 3);
  });
});
