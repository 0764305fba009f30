import {
  F723_SPECIES,
  F723_TEMPERATURE_RANGE,
  F723_VALIDITY,
  f723Density,
  f723Resistivity,
  f723SpeciesFor,
} from '../../src/physics/astmF723';
import { PhysicsDomainError } from '../../src/physics/errors';

// Behaviour of the conversion functions themselves (domain checks, shape).
// Values against the standard are in reference/astm-f723.reference.test.ts.

const decades = (from: number, to: number, perDecade: number): number[] => {
  const out: number[] = [];
  for (let e = from; e <= to + 1e-9; e += 1 / perDecade) out.push(10 ** e);
  return out;
};

describe('f723Resistivity', () => {
  it.each(F723_SPECIES)('decreases strictly with density over the standard range (%s)', (species) => {
    const { min, max } = F723_VALIDITY[species].density;
    const densities = decades(Math.log10(min), Math.log10(max), 10);
    const rho = densities.map((n) => f723Resistivity(species, n));
    rho.forEach((value) => expect(Number.isFinite(value) && value > 0).toBe(true));
    for (let i = 1; i < rho.length; i++) expect(rho[i]).toBeLessThan(rho[i - 1]);
  });

  it('rejects densities outside the range the standard states, naming the range', () => {
    expect(() => f723Resistivity('B', 1e11)).toThrow(PhysicsDomainError);
    // Stated ranges widened to the image of the stated resistivity range (1e-4 Ω·cm B ↔ 1.21e21 cm⁻³).
    expect(() => f723Resistivity('B', 1e11)).toThrow(/1\.00e\+12…1\.21e\+21/);
    expect(() => f723Resistivity('P', 1e21)).toThrow(/5\.52e\+20/);
  });

  it.each(F723_SPECIES)('accepts every density its own reverse equation returns, and vice versa (%s)', (species) => {
    const { density, resistivity } = F723_VALIDITY[species];
    for (const rho of [resistivity.min, resistivity.max]) expect(f723Resistivity(species, f723Density(species, rho))).toBeGreaterThan(0);
    for (const n of [density.min, density.max]) expect(f723Density(species, f723Resistivity(species, n))).toBeGreaterThan(0);
  });

  it('rejects species other than B, P and As (F723-99 §1.1 gives arsenic its own conversion, 1e19–6e20 cm⁻³)', () => {
    expect(() => f723Resistivity('Sb' as 'B', 1e16)).toThrow(/boron, phosphorus and arsenic only/);
    expect(() => f723Resistivity('As', 1e18)).toThrow(/1\.00e\+19…6\.00e\+20/);
  });
});

describe('f723Density', () => {
  it.each(F723_SPECIES)('decreases strictly with resistivity over the standard range (%s)', (species) => {
    const { min, max } = F723_VALIDITY[species].resistivity;
    const rhos = decades(Math.log10(min), Math.log10(max), 10);
    const n = rhos.map((r) => f723Density(species, r));
    n.forEach((value) => expect(Number.isFinite(value) && value > 0).toBe(true));
    for (let i = 1; i < n.length; i++) expect(n[i]).toBeLessThan(n[i - 1]);
  });

  it('rejects resistivities outside the range the standard states', () => {
    expect(() => f723Density('P', 1e4)).toThrow(PhysicsDomainError);
    expect(() => f723Density('B', 5e-5)).toThrow(/resistivity/);
  });
});

describe('f723SpeciesFor', () => {
  it('accepts B and P, uncompensated, at 290–305 K', () => {
    expect(f723SpeciesFor('B', 0, 300)).toBe('B');
    expect(f723SpeciesFor('P', 0, F723_TEMPERATURE_RANGE.min)).toBe('P');
    expect(f723SpeciesFor('P', 0, F723_TEMPERATURE_RANGE.max)).toBe('P');
  });
  it('rejects other dopants, listing B, P and As', () => {
    expect(() => f723SpeciesFor('Sb', 0, 300)).toThrow(/Allowed: B, P, As/);
    expect(() => f723SpeciesFor('donor', 0, 300)).toThrow(PhysicsDomainError);
  });
  it('rejects counter-doping and says what to use instead', () => {
    expect(() => f723SpeciesFor('B', 1e14, 300)).toThrow(/uncompensated.*counter-doping 0/);
  });
  it('rejects temperatures outside 290–305 K, stating the allowed range', () => {
    expect(() => f723SpeciesFor('B', 0, 289.9)).toThrow(/290–305 K/);
    expect(() => f723SpeciesFor('P', 0, 77)).toThrow(/23 °C/);
  });
});
