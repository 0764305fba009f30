/**
 * Saturated drift current J = q(n·vn + p·vp) (definition, common practice, no
 * source) with Caughey–Thomas velocities (Caughey & Thomas, Proc. IEEE 55,
 * 2192, 1967): consistent with driftVelocity and the equilibrium densities,
 * and equal to σE as E → 0.
 */
import { driftVelocity, saturatedCurrentDensity, fieldExponent, saturationVelocity } from '../../../src/physics/highField';
import { conductivity, currentDensity } from '../../../src/physics/transport';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { sampleDopants } from '../../../src/physics/sample';
import { defaultMobilityModel, freeCarrierMobility } from '../../../src/physics/mobility';
import { velocityAtMobility } from '../../../src/physics/highField/driftVelocity';
import type { Carrier, Sample } from '../../../src/physics/sample';

/** The velocity law at the free-carrier mobility of the material's default model (what J uses, so that J → σE). */
const freeVelocity = (field: number, carrier: Carrier, sample: Sample): number =>
  velocityAtMobility(field, carrier, sample, freeCarrierMobility(defaultMobilityModel(sample.material), carrier, sample));
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { SAMPLES_300K, sampleIn } from './samples';

describe('saturatedCurrentDensity', () => {
  const silicon = SAMPLES_300K.filter(([, s]) => s.material.code !== '4H-SiC');

  it.each(silicon)('%s: is q(n·vn + p·vp) with vn, vp the velocity law at the free-carrier mobility', (_, sample) => {
    const eq = solveEquilibrium(sample.material, sample.temperature, sampleDopants(sample));
    for (const field of [30, 3e3, -2e4, 1e6]) {
      const expected =
        ELEMENTARY_CHARGE * (eq.electrons * freeVelocity(field, 'electron', sample) + eq.holes * freeVelocity(field, 'hole', sample));
      expect(saturatedCurrentDensity(field, sample) / expected).toBeCloseTo(1, 14);
    }
  });

  it.each(SAMPLES_300K)('%s: J/(σE) → 1 as E → 0, and 0 at E = 0', (_, sample) => {
    const sigma = conductivity(sample, sample.material.code === 'Si' ? 'masetti' : undefined); // the saturating form's default low-field mobility
    expect(saturatedCurrentDensity(1e-15, sample) / (sigma * 1e-15)).toBeCloseTo(1, 14);
    expect(saturatedCurrentDensity(0, sample)).toBe(0);
  });

  it('at 1 V/cm in Si:P 1e16 falls short of σE by the expected tiny amount Σ share·(μE/v_sat)^β/β', () => {
    const sample = sampleIn('Si', 'P', 1e16);
    const eq = solveEquilibrium(sample.material, 300, sampleDopants(sample));
    const sigma = conductivity(sample, sample.material.code === 'Si' ? 'masetti' : undefined); // the saturating form's default low-field mobility
    let expected = 0;
    for (const [carrier, density] of [
      ['electron', eq.electrons],
      ['hole', eq.holes],
    ] as const) {
      const mu = freeCarrierMobility('masetti', carrier, sample);
      const share = (ELEMENTARY_CHARGE * density * mu) / sigma;
      const beta = fieldExponent('Si', carrier, 300);
      expected += (share * Math.pow(mu / saturationVelocity('Si', carrier, 300), beta)) / beta;
    }
    const shortfall = 1 - saturatedCurrentDensity(1, sample) / sigma;
    expect(expected).toBeGreaterThan(1e-5); // Canali's β ≈ 1.1 makes the knee soft (Canali et al. 1975)
    expect(expected).toBeLessThan(1e-4);
    expect(shortfall / expected).toBeCloseTo(1, 3);
  });

  it('saturates: J at 1e6 V/cm is q·n·v_sat for n-type Si within 1 %', () => {
    const sample = sampleIn('Si', 'P', 1e16);
    const eq = solveEquilibrium(sample.material, 300, sampleDopants(sample));
    expect(
      saturatedCurrentDensity(1e6, sample) / (ELEMENTARY_CHARGE * eq.electrons * saturationVelocity('Si', 'electron', 300)),
    ).toBeCloseTo(1, 2);
  });

  it('leaves 4H-SiC holes out only where they cannot change J, and says so otherwise', () => {
    const nType = sampleIn('4H-SiC', 'N', 1e16);
    const eq = solveEquilibrium(nType.material, 300, sampleDopants(nType));
    expect(saturatedCurrentDensity(1e4, nType)).toBe(ELEMENTARY_CHARGE * (eq.electrons * driftVelocity(1e4, 'electron', nType)));
    expect(() => saturatedCurrentDensity(1e4, sampleIn('4H-SiC', 'Al', 1e16))).toThrow(
      /no published hole saturation velocity for 4H-SiC.*ohmic form J = σE/,
    );
  });

  it('names the ohmic form where the temperature has no saturation velocity', () => {
    expect(() => saturatedCurrentDensity(1e3, sampleIn('Si', 'P', 1e16, 40))).toThrow(/77–1000 K.*ohmic form J = σE/);
  });
});

describe('currentDensity (transport)', () => {
  it('is saturating by default and σE when asked for ohmic', () => {
    const sample = sampleIn('Si', 'P', 1e16);
    // The default model f723-anchored: masetti's free-carrier mobilities divided by k = σ_masetti/σ_default.
    const k = conductivity(sample, 'masetti') / conductivity(sample);
    expect(currentDensity(1e4, sample) / saturatedCurrentDensity(1e4, sample, 'masetti', 1 / k)).toBeCloseTo(1, 12);
    expect(currentDensity(1e4, sample, 'arora', 'ohmic')).toBe(conductivity(sample, 'arora') * 1e4);
    expect(currentDensity(1e4, sample, 'arora')).toBe(saturatedCurrentDensity(1e4, sample, 'arora'));
  });

  it('refuses astm-f723 for the saturating form, which needs mobilities', () => {
    const sample = sampleIn('Si', 'P', 1e16);
    expect(() => currentDensity(100, sample, 'astm-f723')).toThrow(/no carrier mobilities.*ohmic/);
    expect(currentDensity(100, sample, 'astm-f723', 'ohmic')).toBeCloseTo(100 * conductivity(sample, 'astm-f723'), 10);
  });
});
