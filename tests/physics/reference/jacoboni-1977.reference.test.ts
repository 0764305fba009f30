/**
 * C. Jacoboni, C. Canali, G. Ottaviani, A. Alberigi Quaranta, "A review of
 * some charge transport properties of silicon", Solid-State Electron. 20, 77
 * (1977): electron saturated drift velocity in Si ≈ 1.0e7 cm/s at 300 K
 * (from memory), reached near 1e5 V/cm.
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
});
