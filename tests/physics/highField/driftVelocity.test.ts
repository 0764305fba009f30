/**
 * Drift velocity of a sample: the Caughey–Thomas form (Caughey & Thomas,
 * Proc. IEEE 55, 2192, 1967) with the sample's own drift mobility, so it must
 * agree with `mobility` at low field exactly and with `saturationVelocity` at
 * high field (definitions, common practice, no source).
 */
import { driftVelocity, saturationVelocity } from '../../../src/physics/highField';
import { mobility } from '../../../src/physics/mobility';
import { SAMPLES_300K, sampleIn } from './samples';

describe('driftVelocity', () => {
  it.each(SAMPLES_300K)(
    '%s: is exactly μ·E at 1e-15 V/cm (there (μE/v_sat)^β is below double precision), μ from mobility with the default model',
    (_, sample) => {
      const carriers = sample.material.code === '4H-SiC' ? (['electron'] as const) : (['electron', 'hole'] as const);
      for (const carrier of carriers) {
        expect(driftVelocity(1e-15, carrier, sample)).toBe(mobility('', carrier, sample) * 1e-15);
        expect(driftVelocity(-1e-15, carrier, sample)).toBe(-mobility('', carrier, sample) * 1e-15);
      }
    },
  );

  it.each(SAMPLES_300K)('%s: approaches v_sat at 1e8 V/cm', (_, sample) => {
    const v = driftVelocity(1e8, 'electron', sample);
    expect(v / saturationVelocity(sample.material.code, 'electron', 300)).toBeGreaterThan(0.99);
    expect(v / saturationVelocity(sample.material.code, 'electron', 300)).toBeLessThanOrEqual(1);
  });

  it('is lower in heavily doped Si at moderate field (lower μ0) but saturates at the same v_sat', () => {
    const light = sampleIn('Si', 'P', 1e15);
    const heavy = sampleIn('Si', 'P', 1e19);
    expect(driftVelocity(1e3, 'electron', heavy)).toBeLessThan(driftVelocity(1e3, 'electron', light) / 2);
    expect(driftVelocity(1e8, 'electron', heavy) / driftVelocity(1e8, 'electron', light)).toBeCloseTo(1, 2);
  });

  it('takes a mobility model for μ0', () => {
    const sample = sampleIn('Si', 'B', 1e17);
    expect(driftVelocity(1e-15, 'hole', sample, 'arora')).toBe(mobility('arora', 'hole', sample) * 1e-15);
  });

  it('refuses 4H-SiC holes and temperatures without a saturation velocity', () => {
    expect(() => driftVelocity(1e3, 'hole', sampleIn('4H-SiC', 'Al', 1e16))).toThrow(/no published hole saturation velocity/);
    expect(() => driftVelocity(1e3, 'electron', sampleIn('4H-SiC', 'N', 1e16, 400))).toThrow(/only 300 K/);
    expect(() => driftVelocity(1e3, 'electron', sampleIn('Si', 'P', 1e16, 50))).toThrow(/77–1000 K/);
  });
});
