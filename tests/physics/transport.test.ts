import { RESISTIVITY_MODEL_CODES, conductivity, currentDensity, resistivity, resolveResistivityModel } from '../../src/physics/transport';
import { MOBILITY_MODEL_CODES, fitMobility, freeCarrierMobility } from '../../src/physics/mobility';
import { solveEquilibrium } from '../../src/physics/equilibrium';
import { intrinsicDensity } from '../../src/physics/bands';
import { sampleDopants } from '../../src/physics/sample';
import { ELEMENTARY_CHARGE } from '../../src/physics/constants';
import { f723Resistivity } from '../../src/physics/astmF723';
import { PhysicsDomainError } from '../../src/physics/errors';
import { logSpaced, siliconSample } from './transportSamples';

describe('resistivity model codes', () => {
  it('are f723-anchored (the default), the mobility models, then astm-f723, parsed case-insensitively', () => {
    expect(RESISTIVITY_MODEL_CODES).toEqual(['f723-anchored', ...MOBILITY_MODEL_CODES, 'astm-f723']);
    expect(resolveResistivityModel('ASTM-F723')).toBe('astm-f723');
    expect(resolveResistivityModel(undefined)).toBe('f723-anchored');
    expect(() => resolveResistivityModel('irvin')).toThrow(/Allowed: f723-anchored, masetti, arora, caughey-thomas, klaassen, astm-f723/);
  });
});

describe('conductivity', () => {
  // Definition of drift conductivity (common practice, no source), with n, p
  // from the equilibrium solver and μ from `mobility`: must hold bit for bit.
  it('is exactly q(n·μn + p·μp) with n, p from solveEquilibrium and μ from mobility', () => {
    const cases = [
      siliconSample('B', 1e16),
      siliconSample('P', 3e18, 77),
      siliconSample('As', 1e14, 600),
      siliconSample('Ga', 1e17, 250, 2e16),
      siliconSample('donor', 1e15, 400, 4e15),
    ];
    for (const sample of cases) {
      for (const model of MOBILITY_MODEL_CODES) {
        const eq = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
        const expected =
          ELEMENTARY_CHARGE *
          (eq.electrons * freeCarrierMobility(model, 'electron', sample) + eq.holes * freeCarrierMobility(model, 'hole', sample));
        expect(conductivity(sample, model)).toBe(expected);
        expect(resistivity(sample, model)).toBe(1 / expected);
      }
    }
  });

  it('reproduces the fit at 300 K: σ = q·N·μ_fit up to the minority-carrier term (the full-ionization correction, docs/physics.md)', () => {
    for (const dopant of ['B', 'P', 'As']) {
      for (const n of logSpaced(13, 20, 2)) {
        const sample = siliconSample(dopant, n);
        const majority = dopant === 'B' ? 'hole' : 'electron';
        const fitted = ELEMENTARY_CHARGE * n * fitMobility('masetti', majority, sample);
        // Minority carriers add (ni/N)²·(1 + μmin/μmaj) ≤ 4·(ni/N)² relative (the electron/hole
        // mobility ratio is about 3); 1e-9 covers the solver.
        const ni = intrinsicDensity(sample.material, 300);
        expect(Math.abs(conductivity(sample, 'masetti') / fitted - 1)).toBeLessThan(4.5 * (ni / n) ** 2 + 1e-9);
      }
    }
  });

  it('treats compensated samples at 300 K as N_net carriers with the fit at N_D + N_A (common practice, no source)', () => {
    const sample = siliconSample('P', 1e17, 300, 4e16);
    const expected = ELEMENTARY_CHARGE * 6e16 * fitMobility('masetti', 'electron', sample);
    expect(conductivity(sample, 'masetti') / expected).toBeCloseTo(1, 9);
  });

  it('uses the ASTM F723 conversion for model astm-f723', () => {
    const sample = siliconSample('P', 1e16, 296);
    expect(resistivity(sample, 'astm-f723')).toBe(f723Resistivity('P', 1e16));
    expect(conductivity(sample, 'astm-f723')).toBe(1 / f723Resistivity('P', 1e16));
  });

  it('refuses astm-f723 for other dopants, counter-doping and other temperatures, saying what is allowed', () => {
    expect(() => resistivity(siliconSample('Sb', 1e16), 'astm-f723')).toThrow(/boron, phosphorus and arsenic only/);
    expect(() => resistivity(siliconSample('As', 1e16), 'astm-f723')).toThrow(/1\.00e\+19/);
    expect(() => resistivity(siliconSample('B', 1e16, 300, 1e14), 'astm-f723')).toThrow(/uncompensated/);
    expect(() => resistivity(siliconSample('B', 1e16, 350), 'astm-f723')).toThrow(/290–305 K/);
    expect(() => conductivity(siliconSample('B', 1e16, 350), 'astm-f723')).toThrow(PhysicsDomainError);
  });
});

describe('temperature behaviour (from the same equations, no special cases)', () => {
  // Freeze-out of shallow dopants at 77 K (common practice, no source): the
  // resistivity is several times what full ionization would give.
  it('shows freeze-out at 77 K in the resistivity', () => {
    for (const dopant of ['B', 'P']) {
      const sample = siliconSample(dopant, 1e16, 77);
      const majority = dopant === 'B' ? 'hole' : 'electron';
      const fullyIonized = 1 / (ELEMENTARY_CHARGE * 1e16 * fitMobility('masetti', majority, sample));
      expect(resistivity(sample)).toBeGreaterThan(2 * fullyIonized);
    }
    // Deeper into freeze-out the resistivity rises steeply as temperature falls.
    expect(resistivity(siliconSample('P', 1e16, 40))).toBeGreaterThan(10 * resistivity(siliconSample('P', 1e16, 77)));
  });

  // Intrinsic conduction when ni ≫ N (common practice, no source).
  it('becomes intrinsic at 600 K for light doping: n ≈ p and ρ independent of dopant type', () => {
    const boron = siliconSample('B', 1e13, 600);
    const phosphorus = siliconSample('P', 1e13, 600);
    const eq = solveEquilibrium(boron.material, 600, sampleDopants(boron));
    expect(eq.electrons / eq.holes).toBeGreaterThan(0.99);
    // The physics alone: 'f723-anchored' keeps its density-only factor (about ±1 % at 1e13) here too.
    expect(resistivity(boron, 'masetti') / resistivity(phosphorus, 'masetti')).toBeCloseTo(1, 2);
    expect(resistivity(boron)).toBeLessThan(resistivity(siliconSample('B', 1e13, 300)) / 100);
  });
});

describe('currentDensity', () => {
  it('is σ·E in the ohmic form, with sign following the field', () => {
    const sample = siliconSample('P', 1e16);
    expect(currentDensity(100, sample, undefined, 'ohmic')).toBe(conductivity(sample) * 100);
    expect(currentDensity(-5, sample, 'arora', 'ohmic')).toBe(conductivity(sample, 'arora') * -5);
    expect(currentDensity(0, sample, undefined, 'ohmic')).toBe(0);
  });

  it('saturates by default (tests/physics/highField/currentDensity.test.ts), equal to σ·E as E → 0', () => {
    const sample = siliconSample('P', 1e16);
    // The saturating default is the default resistivity model's (f723-anchored: masetti's mobilities over k).
    expect(currentDensity(1e-15, sample) / (conductivity(sample) * 1e-15)).toBeCloseTo(1, 14);
    expect(currentDensity(1e4, sample)).toBeLessThan(conductivity(sample) * 1e4 * 0.6);
    expect(currentDensity(1e-15, sample, 'masetti') / (conductivity(sample, 'masetti') * 1e-15)).toBeCloseTo(1, 14);
    expect(currentDensity(0, sample)).toBe(0);
  });
});
