/**
 * C. Jacoboni, C. Canali, G. Ottaviani, A. Alberigi Quaranta, "A review of
 * some charge transport properties of silicon", Solid-State Electron. 20, 77
 * (1977): electron saturated drift velocity in Si ≈ 1.0e7 cm/s at 300 K
 * (from memory), reached near 1e5 V/cm; at 77 K the measured electron
 * velocity at 3e4 V/cm and above is about 1.2–1.4e7 cm/s (from memory; the
 * figure issue 12 quotes from this review and Canali et al. 1975).
 */
import { driftVelocity, saturationVelocity } from '../../../src/physics/highField';
import { siliconSample } from '../transportSamples';

describe('Jacoboni et al. (1977) silicon electron saturation velocity', () => {
  it('v_sat(300 K) ≈ 1.0e7 cm/s within 10 % (from memory)', () => {
    expect(Math.abs(saturationVelocity('Si', 'electron', 300) / 1.0e7 - 1)).toBeLessThan(0.1);
  });

  it('electron drift velocity at 1e5 V/cm in lightly doped Si ≈ 1.0e7 cm/s within 10 % (from memory)', () => {
    expect(Math.abs(driftVelocity(1e5, 'electron', siliconSample('P', 1e14)) / 1.0e7 - 1)).toBeLessThan(0.1);
  });

  it('electron drift velocity at 3e4 and 5e4 V/cm, 77 K, lightly doped Si: 1.2–1.4e7 cm/s (from memory)', () => {
    const sample = siliconSample('P', 1e14, 77);
    for (const field of [3e4, 5e4]) {
      const v = driftVelocity(field, 'electron', sample);
      expect(v).toBeGreaterThan(1.2e7);
      expect(v).toBeLessThan(1.4e7);
    }
  });
});
