/**
 * C. Canali, G. Majni, R. Minder, G. Ottaviani, "Electron and hole drift
 * velocity measurements in silicon and their empirical relation to electric
 * field and temperature", IEEE Trans. Electron Devices 22, 1045 (1975).
 * Temperature laws, all from memory: v_m = 1.53e9·T^−0.87 (e), 1.62e8·T^−0.52
 * (h) cm/s; β = 2.57e-2·T^0.66 (e), 0.46·T^0.17 (h); E_c = 1.01·T^1.55 (e),
 * 1.24·T^1.68 (h) V/cm. Commonly quoted 300 K values (from memory):
 * v_m = 1.07e7 and 8.37e6 cm/s, β = 1.109 and 1.213.
 */
import { caugheyThomasVelocity, driftVelocity, fieldExponent, saturationVelocity } from '../../../src/physics/highField';
import { siliconSample } from '../transportSamples';

describe('Canali et al. (1975) silicon saturation velocity and field exponent', () => {
  it('v_m(300 K) ≈ 1.07e7 cm/s (electrons), 8.37e6 cm/s (holes), within 0.5 % (from memory)', () => {
    expect(saturationVelocity('Si', 'electron', 300) / 1.07e7).toBeCloseTo(1, 2);
    expect(saturationVelocity('Si', 'hole', 300) / 8.37e6).toBeCloseTo(1, 2);
  });

  it('β(300 K) ≈ 1.109 (electrons), 1.213 (holes), within 0.1 % (from memory)', () => {
    expect(fieldExponent('Si', 'electron', 300) / 1.109).toBeCloseTo(1, 3);
    expect(fieldExponent('Si', 'hole', 300) / 1.213).toBeCloseTo(1, 3);
  });

  it('v_m ∝ T^−0.87 (e), T^−0.52 (h); β ∝ T^0.66 (e), T^0.17 (h) (from memory)', () => {
    for (const t of [77, 200, 430]) {
      const r = t / 300;
      expect(saturationVelocity('Si', 'electron', t) / saturationVelocity('Si', 'electron', 300) / r ** -0.87).toBeCloseTo(1, 12);
      expect(saturationVelocity('Si', 'hole', t) / saturationVelocity('Si', 'hole', 300) / r ** -0.52).toBeCloseTo(1, 12);
      expect(fieldExponent('Si', 'electron', t) / fieldExponent('Si', 'electron', 300) / r ** 0.66).toBeCloseTo(1, 12);
      expect(fieldExponent('Si', 'hole', t) / fieldExponent('Si', 'hole', 300) / r ** 0.17).toBeCloseTo(1, 12);
    }
  });

  it('our velocity in lightly doped Si follows Canali’s own fit (μ = v_m/E_c) within 10 % over 3e2–6e4 V/cm, 300 K', () => {
    // Canali's low-field mobility v_m/E_c (E_c = 1.01·T^1.55, 1.24·T^1.68 V/cm,
    // from memory) is ≈ 1530 (e) and ≈ 465 (h) cm²/(V·s) at 300 K; ours is the
    // Masetti lattice value (≈ 1414, 470). The difference shows at low field and
    // fades toward v_m.
    const criticalField = { electron: 1.01 * 300 ** 1.55, hole: 1.24 * 300 ** 1.68 };
    for (const [carrier, dopant] of [['electron', 'P'], ['hole', 'B']] as const) {
      const sample = siliconSample(dopant, 1e13);
      const vm = saturationVelocity('Si', carrier, 300);
      const beta = fieldExponent('Si', carrier, 300);
      for (const field of [3e2, 1e3, 3e3, 1e4, 3e4, 6e4]) {
        const canali = caugheyThomasVelocity(field, vm / criticalField[carrier], vm, beta);
        expect(Math.abs(driftVelocity(field, carrier, sample) / canali - 1)).toBeLessThan(0.1);
      }
    }
  });
});
