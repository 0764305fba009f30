/**
 * DRIFT.VELOCITY, DRIFT.VSAT, DRIFT.CURRENTDENSITY's saturating form and
 * DRIFT.TCR as a user meets them: identities with the other functions,
 * defaults, and the messages bad input gets. Published values are checked
 * in tests/physics/reference (canali-1975, quay-2000, khan-cooper-2000,
 * jacoboni-1977); identities here are definitions (common practice, no source).
 */
import { ELEMENTARY_CHARGE, SILICON, resolveDopant, type Carrier } from '../../src/physics';
import { velocityAtMobility } from '../../src/physics/highField/driftVelocity';
import { findFunction } from '../../src/catalog';
import { message, value } from './support/call';

describe('DRIFT.VELOCITY', () => {
  it('is MOBILITY·E at vanishing field for every carrier role, and tends to VSAT at high field', () => {
    for (const role of ['majority', 'minority', 'electron', 'hole']) {
      const mu = value('MOBILITY', 1e16, 'phosphorus', 300, role);
      expect(value('VELOCITY', 1e-15, 1e16, 'phosphorus', 300, role)).toBe(mu * 1e-15);
    }
    expect(value('VELOCITY', 1e8, 1e16, 'phosphorus') / value('VSAT')).toBeCloseTo(1, 2);
    expect(value('VELOCITY', -1e8, 1e16, 'B') / -value('VSAT', 300, 'hole')).toBeCloseTo(1, 2);
  });

  it('falls short of μE at 100 V/cm for electrons in 1e16 cm⁻³ Si by the percentage its help quotes (documentation check)', () => {
    const shortfall = 1 - value('VELOCITY', 100, 1e16, 'phosphorus') / (100 * value('MOBILITY', 1e16, 'phosphorus', 300, 'electron'));
    expect(findFunction('VELOCITY')!.help).toContain(`${(100 * shortfall).toFixed(1)} % at 100 V/cm`);
  });

  it('defaults to the majority carrier at 300 K in Si', () => {
    expect(value('VELOCITY', 1e4, 1e16, 'B')).toBe(value('VELOCITY', 1e4, 1e16, 'B', 300, 'hole', 'Si'));
    expect(value('VELOCITY', 1e4, 1e16, 'phosphorus')).toBe(value('VELOCITY', 1e4, 1e16, 'phosphorus', 300, 'electron'));
  });

  it('works for Ge, GaAs and 4H-SiC electrons, and refuses 4H-SiC holes', () => {
    expect(value('VELOCITY', 1e-15, 1e16, 'As', 300, 'electron', 'Ge')).toBe(
      value('MOBILITY', 1e16, 'As', 300, 'electron', null, 'Ge') * 1e-15,
    );
    expect(value('VELOCITY', 1e8, 1e16, 'Si', 300, 'electron', 'GaAs') / value('VSAT', 300, 'electron', 'GaAs')).toBeCloseTo(1, 2);
    expect(value('VELOCITY', 1e8, 1e16, 'nitrogen', 300, 'electron', '4H-SiC') / 2.2e7).toBeCloseTo(1, 2);
    expect(message('VELOCITY', 1e4, 1e16, 'nitrogen', 300, 'minority', '4H-SiC')).toMatch(
      /no published hole saturation velocity for 4H-SiC/,
    );
  });

  it('names the temperature range where no saturation velocity is tabulated', () => {
    expect(message('VELOCITY', 1e4, 1e16, 'phosphorus', 50)).toMatch(/77–1000 K/);
    expect(message('VELOCITY', 1e4, 1e16, 'nitrogen', 400, null, '4H-SiC')).toMatch(/only 300 K/);
    expect(message('VELOCITY', 'fast', 1e16, 'phosphorus')).toMatch(/field_V_per_cm must be a number/);
  });
});

describe('DRIFT.VSAT', () => {
  it('defaults to electrons in Si at 300 K', () => {
    expect(value('VSAT')).toBe(value('VSAT', 300, 'electron', 'Si'));
    expect(value('VSAT', null, 'HOLE')).toBe(value('VSAT', 300, 'hole'));
  });

  it('refuses majority and minority (no dopant) and unknown carriers, listing electron and hole', () => {
    expect(message('VSAT', 300, 'majority')).toMatch(/needs a dopant.*allowed: electron, hole/);
    expect(message('VSAT', 300, 'Minority')).toMatch(/allowed: electron, hole/);
    expect(message('VSAT', 300, 'ion')).toMatch(/allowed: electron, hole/);
  });

  it('gives Si electrons 1.2–1.4e7 cm/s at 77 K and refuses Si holes below 102 K, saying why (issue 12)', () => {
    expect(value('VSAT', 77, 'electron')).toBeGreaterThan(1.2e7);
    expect(value('VSAT', 77, 'electron')).toBeLessThan(1.4e7);
    expect(message('VSAT', 77, 'hole')).toMatch(/102–1000 K.*exceeds the electron law/);
    expect(value('VSAT', 102, 'electron')).toBeGreaterThanOrEqual(value('VSAT', 102, 'hole'));
    expect(value('VSAT', 1000, 'electron')).toBeGreaterThan(value('VSAT', 1000, 'hole'));
  });

  it('refuses 4H-SiC holes with the stated message', () => {
    expect(message('VSAT', 300, 'hole', '4H-SiC')).toMatch(/no published hole saturation velocity for 4H-SiC in this release/);
  });
});

describe('DRIFT.CURRENTDENSITY (high-field form)', () => {
  // VELOCITY's law v = μ0E/(1 + (μ0|E|/v_sat)^β)^(1/β) evaluated at μ0 = FREEMOBILITY(masetti)/k, k the
  // default f723-anchored model's factor σ_masetti/σ_default (CURRENTDENSITY's help), so that J → σE at low field.
  const anchorFactor = (doping: number, dopant: string, temperature = 300): number =>
    value('CONDUCTIVITY', doping, dopant, temperature, 'masetti') / value('CONDUCTIVITY', doping, dopant, temperature);
  const freeVelocity = (field: number, doping: number, dopant: string, temperature: number, role: 'majority' | 'minority'): number => {
    const model = 'masetti';
    const sample = { material: SILICON, temperature, dopant: resolveDopant(SILICON, dopant), density: doping, counterDensity: 0 };
    const majority: Carrier = sample.dopant.kind === 'donor' ? 'electron' : 'hole';
    const carrier: Carrier = role === 'majority' ? majority : majority === 'electron' ? 'hole' : 'electron';
    return velocityAtMobility(
      field,
      carrier,
      sample,
      value('FREEMOBILITY', doping, dopant, temperature, role, model) / anchorFactor(doping, dopant, temperature),
    );
  };

  it('is q(n·vn + p·vp) with n, p from MAJORITY/MINORITY and v from VELOCITY’s law at FREEMOBILITY', () => {
    for (const [field, doping, dopant] of [
      [3e3, 1e16, 'phosphorus'],
      [-2e4, 1e17, 'B'],
      [5e5, 1e15, 'As'],
      [1e4, 1e18, 'B'],
    ] as const) {
      const nMajority = value('MAJORITY', doping, dopant);
      const nMinority = value('MINORITY', doping, dopant);
      const expected =
        ELEMENTARY_CHARGE *
        (nMajority * freeVelocity(field, doping, dopant, 300, 'majority') +
          nMinority * freeVelocity(field, doping, dopant, 300, 'minority'));
      expect(value('CURRENTDENSITY', field, doping, dopant) / expected).toBeCloseTo(1, 12);
    }
  });

  it('saturates at q·n·VSAT while VELOCITY, at the published mobility, differs from J/(q·n) only below saturation', () => {
    const [doping, dopant] = [1e18, 'B'];
    const p = value('MAJORITY', doping, dopant);
    // Far above the knee both tend to v_sat: J/(q·p·VSAT) → 1 within the (μ0E/v_sat)^−β tail (< 1 % at 1e7 V/cm).
    expect(value('CURRENTDENSITY', 1e7, doping, dopant) / (ELEMENTARY_CHARGE * p * value('VSAT', 300, 'hole'))).toBeCloseTo(1, 2);
    // At low field J/(q·p·E) is FREEMOBILITY/k (FREEMOBILITY 1.31× Masetti near 1e18, see its help), VELOCITY/E is MOBILITY.
    const field = 1e-6;
    expect(
      value('CURRENTDENSITY', field, doping, dopant) /
        (ELEMENTARY_CHARGE * p * field) /
        (value('FREEMOBILITY', doping, dopant, 300, 'majority', 'masetti') / anchorFactor(doping, dopant)),
    ).toBeCloseTo(1, 6);
    expect(
      value('VELOCITY', field, doping, dopant, 300, 'majority') / field / value('MOBILITY', doping, dopant, 300, 'majority', 'masetti'),
    ).toBeCloseTo(1, 6);
  });

  it('gives J/(σE) → 1 as E → 0 and about 1 − 4e-5 at 1 V/cm in 1e16 cm⁻³ n-type Si', () => {
    const sigma = value('CONDUCTIVITY', 1e16, 'phosphorus'); // the default model, as CURRENTDENSITY's
    expect(value('CURRENTDENSITY', 1e-15, 1e16, 'phosphorus') / (sigma * 1e-15)).toBeCloseTo(1, 13);
    // Shortfall ≈ (μE/v_sat)^β/β with Canali's β ≈ 1.109 (Canali et al. 1975, from memory): 3.7e-5.
    const shortfall = 1 - value('CURRENTDENSITY', 1, 1e16, 'phosphorus') / sigma;
    expect(shortfall).toBeGreaterThan(2e-5);
    expect(shortfall).toBeLessThan(6e-5);
  });

  it('is about half of σE at 1e4 V/cm in 1e16 cm⁻³ n-type Si, as its help says (documentation check)', () => {
    const ratio = value('CURRENTDENSITY', 1e4, 1e16, 'phosphorus') / (1e4 * value('CONDUCTIVITY', 1e16, 'phosphorus'));
    expect(ratio).toBeGreaterThan(0.4);
    expect(ratio).toBeLessThan(0.6);
  });

  it('keeps its argument positions; field_dependence "ohmic" gives σE and other codes are refused', () => {
    expect(value('CURRENTDENSITY', 1e4, 1e16, 'phosphorus', 350, 'Si', 1e15, 'OHMIC')).toBeCloseTo(
      1e4 * value('CONDUCTIVITY', 1e16, 'phosphorus', 350, null, null, 1e15),
      8,
    );
    expect(message('CURRENTDENSITY', 1e4, 1e16, 'phosphorus', 300, null, null, 'linear')).toMatch(/allowed: saturating, ohmic/);
  });

  it('works at 77 K in n-type Si, where the refused hole term cannot matter, and refuses p-type Si there', () => {
    const n77 = value('CURRENTDENSITY', 3e4, 1e16, 'phosphorus', 77);
    expect(
      n77 / (ELEMENTARY_CHARGE * value('MAJORITY', 1e16, 'phosphorus', 77) * freeVelocity(3e4, 1e16, 'phosphorus', 77, 'majority')),
    ).toBeCloseTo(1, 12);
    expect(message('CURRENTDENSITY', 3e4, 1e16, 'B', 77)).toMatch(/102–1000 K.*ohmic/);
  });

  it('points to the ohmic form where the saturating form has no data', () => {
    expect(message('CURRENTDENSITY', 1e3, 1e16, 'phosphorus', 40)).toMatch(/77–1000 K.*ohmic/);
    expect(message('CURRENTDENSITY', 1e3, 1e16, 'Al', 300, '4H-SiC')).toMatch(/no published hole saturation velocity.*ohmic/);
    expect(value('CURRENTDENSITY', 1e3, 1e16, 'phosphorus', 40, null, null, 'ohmic')).toBeGreaterThan(0);
  });
});

describe('DRIFT.TCR', () => {
  it('is positive for lightly doped Si at 300 K (about +7000 ppm/K at 1e15 cm⁻³; handbook-level, from memory)', () => {
    expect(value('TCR', 1e15, 'phosphorus')).toBeGreaterThan(5000);
    expect(value('TCR', 1e15, 'phosphorus')).toBeLessThan(9000);
  });

  it('is negative in freeze-out and in the intrinsic regime, and defined at both ends of 20–1000 K', () => {
    expect(value('TCR', 1e15, 'phosphorus', 20)).toBeLessThan(0);
    expect(value('TCR', 1e14, 'B', 600)).toBeLessThan(0);
    expect(value('TCR', 1e14, 'phosphorus', 1000)).toBeLessThan(0);
  });

  it('agrees with a wide central difference of DRIFT.RESISTIVITY to its truncation error', () => {
    // Over ±0.5 K the central difference of ln ρ is accurate to ~1e-6 relative at 300 K.
    const up = value('RESISTIVITY', 1e16, 'B', 300.5);
    const down = value('RESISTIVITY', 1e16, 'B', 299.5);
    expect(value('TCR', 1e16, 'B') / (1e6 * Math.log(up / down))).toBeCloseTo(1, 5);
  });

  it('refuses astm-f723 and temperatures outside 20–1000 K', () => {
    expect(message('TCR', 1e15, 'B', 300, 'astm-f723')).toMatch(/no temperature dependence/);
    expect(message('TCR', 1e15, 'B', 1200)).toMatch(/temperature_K must be/);
  });
});
