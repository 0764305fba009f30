/**
 * C. Canali, G. Majni, R. Minder, G. Ottaviani, "Electron and hole drift
 * velocity measurements in silicon and their empirical relation to electric
 * field and temperature", IEEE Trans. Electron Devices 22, 1045 (1975).
 * Read in the abstract (scilit.com record): time-of-flight data 3e2–6e4 V/cm,
 * temperatures up to 430 K, fit mean square deviation below 3.8 %.
 * Temperature laws v_m = 1.53e9·T^−0.87 (e), 1.62e8·T^−0.52 (h) cm/s;
 * β = 2.57e-2·T^0.66 (e), 0.46·T^0.17 (h); E_c = 1.01·T^1.55 (e),
 * 1.24·T^1.68 (h) V/cm: recalled, then read in two public transcriptions that
 * agree digit for digit — ATLAS (github rolandjansky/athena,
 * InnerDetector/InDetConditions/SiPropertiesSvc/src/SiliconProperties.cxx,
 * elecV_sat_0 … holeBeta_exp) and its copy in Mu2e (github Mu2e/Offline,
 * ExtinctionMonitorFNAL/Digitization/src/SiliconProperties.cc). The 300 K
 * values β = 1.109 (e), 1.213 (h) also as read in Garfield (github
 * star-bnl/star-sw, Source/MediumSilicon.cc, eBetaCanali, hBetaCanali).
 */
import { caugheyThomasVelocity, driftVelocity, fieldExponent } from '../../../src/physics/highField';
import { siliconSample } from '../transportSamples';

/** Canali's fit as read in the ATLAS and Mu2e transcriptions: v_m, E_c and β at T, both carriers. */
function canali(carrier: 'electron' | 'hole', t: number) {
  return carrier === 'electron'
    ? { vm: 1.53e9 * t ** -0.87, ec: 1.01 * t ** 1.55, beta: 2.57e-2 * t ** 0.66 }
    : { vm: 1.62e8 * t ** -0.52, ec: 1.24 * t ** 1.68, beta: 0.46 * t ** 0.17 };
}

describe('Canali et al. (1975) silicon field exponent and velocity–field data', () => {
  it('β = Canali’s 300 K values 1.109 (electrons), 1.213 (holes) at every temperature (read in Garfield; the printed 4 figures: ±0.05 %)', () => {
    for (const t of [120, 300, 430, 800]) {
      expect(fieldExponent('Si', 'electron', t) / 1.109).toBeCloseTo(1, 3);
      expect(fieldExponent('Si', 'hole', t) / 1.213).toBeCloseTo(1, 3);
    }
  });

  // Known disagreement, kept as a failing expectation so that it is not hidden
  // and flags when it is resolved. Canali's fit is within 3.8 % of the measured
  // velocities (abstract, read). Ours, at 300–430 K and 3e2–6e4 V/cm in
  // 1e13 cm⁻³ Si, differs from that fit by −7.9…+4.9 % (electrons: Masetti's
  // lattice mobility 1414 vs Canali's v_m/E_c ≈ 1530 cm²/(V·s) at low field,
  // Quay's v_sat 1.00e7 vs Canali's v_m 1.07e7 cm/s at high field) and by
  // −15.1…+9.7 % (holes: Quay's v_sat,300 = 7.04e6 cm/s against Canali's
  // 8.37e6; at 6e4 V/cm we give 6.1e6 where the fit gives 7.05e6).
  it.failing(
    'KNOWN DISAGREEMENT (expected to fail): our velocity in lightly doped Si is within Canali’s 3.8 % of their fit over 3e2–6e4 V/cm at 300–430 K',
    () => {
      for (const t of [300, 370, 430]) {
        for (const [carrier, dopant] of [
          ['electron', 'P'],
          ['hole', 'B'],
        ] as const) {
          const sample = siliconSample(dopant, 1e13, t);
          const { vm, ec, beta } = canali(carrier, t);
          for (const field of [3e2, 1e3, 3e3, 1e4, 3e4, 6e4]) {
            expect(Math.abs(driftVelocity(field, carrier, sample) / caugheyThomasVelocity(field, vm / ec, vm, beta) - 1)).toBeLessThan(
              0.038,
            );
          }
        }
      }
    },
  );

  it('the deviations DRIFT.VELOCITY’s help quotes (electrons −8…+5 %, holes −15…+10 %) are what the code gives (documentation check, not a reference check)', () => {
    const range = { electron: [Infinity, -Infinity], hole: [Infinity, -Infinity] };
    for (const t of [300, 370, 430]) {
      for (const [carrier, dopant] of [
        ['electron', 'P'],
        ['hole', 'B'],
      ] as const) {
        const sample = siliconSample(dopant, 1e13, t);
        const { vm, ec, beta } = canali(carrier, t);
        for (const field of [3e2, 1e3, 3e3, 1e4, 3e4, 6e4]) {
          const d = 100 * (driftVelocity(field, carrier, sample) / caugheyThomasVelocity(field, vm / ec, vm, beta) - 1);
          range[carrier] = [Math.min(range[carrier][0], d), Math.max(range[carrier][1], d)];
        }
      }
    }
    expect(range.electron.map(Math.round)).toEqual([-8, 5]);
    expect(range.hole.map(Math.round)).toEqual([-15, 10]);
  });
});
