import { thermalVoltage } from '../../src/physics/constants';
import { resolveDopant } from '../../src/physics/dopants';
import { PhysicsDomainError } from '../../src/physics/errors';
import { dopantIonizationEnergy, ionizationState, localizedFraction } from '../../src/physics/ionization';
import { SILICON } from '../../src/physics/materials';

const phosphorus = resolveDopant(SILICON, 'P');
const boron = resolveDopant(SILICON, 'B');

describe('dopantIonizationEnergy', () => {
  it('is ΔE0 at low density and halves at N = Nref', () => {
    const p = phosphorus.ionization;
    expect(dopantIonizationEnergy(phosphorus, 0)).toBe(p.isolatedEnergy);
    expect(dopantIonizationEnergy(phosphorus, p.referenceDensity)).toBeCloseTo(p.isolatedEnergy / 2, 15);
  });

  it('decreases monotonically with density', () => {
    let previous = Infinity;
    for (let log = 12; log <= 22; log += 0.25) {
      const energy = dopantIonizationEnergy(boron, 10 ** log);
      expect(energy).toBeLessThan(previous);
      previous = energy;
    }
  });

  it('rejects negative or non-finite densities', () => {
    expect(() => dopantIonizationEnergy(phosphorus, -1)).toThrow(PhysicsDomainError);
    expect(() => dopantIonizationEnergy(phosphorus, Number.NaN)).toThrow(/finite number >= 0/);
  });
});

describe('localizedFraction', () => {
  it('is 1 at low density, 1/2 at Nb, and → 0 at high density; parts add to 1', () => {
    const nb = phosphorus.ionization.localizationDensity;
    expect(localizedFraction(phosphorus, 0)).toEqual({ localized: 1, delocalized: 0 });
    expect(localizedFraction(phosphorus, nb).localized).toBeCloseTo(0.5, 15);
    expect(localizedFraction(phosphorus, 1e22).localized).toBeLessThan(1e-7);
    const split = localizedFraction(phosphorus, 3e18);
    expect(split.localized + split.delocalized).toBeCloseTo(1, 15);
  });
});

describe('ionizationState', () => {
  it('is fully ionised when the Fermi level is far below the donor level', () => {
    const state = ionizationState(phosphorus, 1e15, 300, -40);
    expect(state.ionized).toBeCloseTo(1, 12);
    expect(state.neutral).toBeGreaterThan(0);
    expect(state.neutral).toBeLessThan(1e-14);
  });

  it('equals 1 − b/(1 + exp(x)/g) with x = −η_band − ΔE/kT (Altermatt et al. 2006, from memory)', () => {
    const T = 150;
    const N = 2e18;
    const eta = -1.3;
    const b = localizedFraction(boron, N).localized;
    const x = -eta - dopantIonizationEnergy(boron, N) / thermalVoltage(T);
    const expected = 1 - b / (1 + Math.exp(x) / boron.degeneracy);
    const state = ionizationState(boron, N, T, eta);
    expect(state.ionized).toBeCloseTo(expected, 14);
    expect(state.ionized + state.neutral).toBeCloseTo(1, 15);
  });

  it('keeps a tiny ionised fraction accurate in deep freeze-out (no cancellation)', () => {
    const T = 10;
    const N = 1e15; // b ≈ 1
    const eta = 5; // Fermi level above the donor level by many kT
    const x = -eta - dopantIonizationEnergy(phosphorus, N) / thermalVoltage(T);
    const split = localizedFraction(phosphorus, N);
    const expected = split.delocalized + (split.localized * (Math.exp(x) / 2)) / (1 + Math.exp(x) / 2);
    expect(ionizationState(phosphorus, N, T, eta).ionized / expected).toBeCloseTo(1, 12);
  });

  it('never ionises less than 1 − b: band-tail states are always ionised (Mott transition)', () => {
    const N = 2e19;
    const floor = localizedFraction(phosphorus, N).delocalized;
    expect(ionizationState(phosphorus, N, 20, 50).ionized).toBeCloseTo(floor, 12);
  });
});
