/**
 * D. B. M. Klaassen, "A unified mobility model for device simulation —
 * I. Model equations and concentration dependence", Solid-State Electron. 35,
 * 953 (1992), and "— II. Temperature dependence of carrier mobility and
 * lifetime", Solid-State Electron. 35, 961 (1992).
 *
 * The papers could not be read here. The parameters are checked against two
 * public transcriptions (read 2026-12): Sandia's Charon device simulator,
 * github tcadsoftware/charon, src/Charon_Material_Properties.cpp,
 * setSiliconParameters(): "Philips Electron(P)", "Philips Hole", "Philips
 * Donor/Acceptor", "Klaassen s1…s7, r1…r6, Pfc, Pfb, FME, FMH"; and the Philips
 * model of github cogenda/Genius-TCAD-Open, src/material/Si/Si_mob_Philips.cc
 * (μmax, μmin, N_ref, α of the hole row, θ, clustering constants, f_CW, f_BH,
 * 3.97e13, 1.36e20, m_h/m0 and r1–r6); the P and B rows, θ, s1–s7, r1–r6,
 * f_CW, f_BH, m_h/m0 and the clustering constants also in PVeducation's
 * package (github pvedu/photovoltaic, photovoltaic/si.py, mob_klassen), which
 * like us takes the P row for electrons. Expected values of the behaviour checks
 * (minority mobilities, temperature laws) are from memory of the papers'
 * figures; where a value is read off a figure from memory the bracket is wide.
 */
import { fitMobility } from '../../../src/physics/mobility';
import {
  KLAASSEN_CARRIER_TABLE,
  KLAASSEN_CLUSTERING_TABLE,
  KLAASSEN_ELECTRON_HOLE_F,
  KLAASSEN_MINORITY_G,
  KLAASSEN_SCREENING,
  klaassenLatticeMobility,
} from '../../../src/physics/mobility/klaassen';
import { resistivity } from '../../../src/physics/transport';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { logSpaced, siliconSample } from '../transportSamples';

const klaassen = (carrier: 'electron' | 'hole', dopant: string, density: number, temperature = 300): number =>
  fitMobility('klaassen', carrier, siliconSample(dopant, density, temperature));

describe('Klaassen (1992) I: concentration dependence at 300 K', () => {
  // Expected values typed from the transcriptions named above, not from our tables. They print the
  // paper's numbers to 3–5 significant figures, so agreement is exact (toBe / 1e-12).
  it('Table 1 carrier parameters: electrons the P row 1414, 68.5, 9.2e16, 0.711; holes 470.5, 44.9, 2.23e17, 0.719 (Charon "Philips Electron(P)", "Philips Hole"; pvedu; hole row also Genius)', () => {
    const e = KLAASSEN_CARRIER_TABLE.electron;
    expect([e.maximum, e.minimum, e.referenceDensity, e.alpha]).toEqual([1414, 68.5, 9.2e16, 0.711]);
    const h = KLAASSEN_CARRIER_TABLE.hole;
    expect([h.maximum, h.minimum, h.referenceDensity, h.alpha]).toEqual([470.5, 44.9, 2.23e17, 0.719]);
  });

  it('lattice exponents θ 2.285 (e), 2.247 (h) and masses m_e/m0 = 1, m_h/m0 = 1.258 (Charon "gamma", "FME", "FMH"; Genius TETN/TETP, mh_over_m0)', () => {
    expect([KLAASSEN_CARRIER_TABLE.electron.latticeExponent, KLAASSEN_CARRIER_TABLE.hole.latticeExponent]).toEqual([2.285, 2.247]);
    expect([KLAASSEN_CARRIER_TABLE.electron.massRatio, KLAASSEN_CARRIER_TABLE.hole.massRatio]).toEqual([1, 1.258]);
  });

  it('clustering: donors c = 0.21, N_ref = 4e20; acceptors c = 0.5, N_ref = 7.2e20 cm⁻³ (Charon "Philips Donor/Acceptor"; Genius CRFD/NRFD, CRFA/NRFA)', () => {
    expect(KLAASSEN_CLUSTERING_TABLE.donor).toEqual({ c: 0.21, referenceDensity: 4.0e20 });
    expect(KLAASSEN_CLUSTERING_TABLE.acceptor).toEqual({ c: 0.5, referenceDensity: 7.2e20 });
  });

  it('screening: f_CW = 2.459, f_BH = 3.828, P_CW scale 3.97e13, P_BH scale 1.36e20 (Charon "Pfc", "Pfb"; Genius NSC_REF, CAR_REF)', () => {
    expect(KLAASSEN_SCREENING.conwellWeisskopfWeight).toBe(2.459);
    expect(KLAASSEN_SCREENING.brooksHerringWeight).toBe(3.828);
    expect(KLAASSEN_SCREENING.conwellWeisskopfScale).toBe(3.97e13);
    expect(KLAASSEN_SCREENING.brooksHerringScale).toBe(1.36e20);
  });

  it('G(P) coefficients s1–s7 (Charon "Klaassen s1…s7"; Genius prints the same set in a comment)', () => {
    expect(KLAASSEN_MINORITY_G).toEqual({ s1: 0.89233, s2: 0.41372, s3: 0.19778, s4: 0.28227, s5: 0.005978, s6: 1.80618, s7: 0.72169 });
  });

  it('F(P) coefficients r1, r2, r3, r4, r6 (Charon "Klaassen r1…r6"; Genius F(P); pvedu mob_klassen)', () => {
    const { r1, r2, r3, r4, r6 } = KLAASSEN_ELECTRON_HOLE_F;
    expect({ r1, r2, r3, r4, r6 }).toEqual({ r1: 0.7643, r2: 2.2999, r3: 6.5502, r4: 2.367, r6: 0.6478 });
  });

  // r5: the transcriptions disagree. Charon and Genius (device simulators) print −0.8552, our value.
  // PVeducation's mob_klassen prints −0.01552, and a Python module by T. Ried (2022, class Klaassen, seen in
  // the code search without its repository name) prints −0.01552 with the note "r5(Sentaurus) = −0.8552,
  // r5(Klaassen) = −0.01552": the paper's Table 2 value is then −0.01552 and −0.8552 a simulator's refit.
  // Kept as a failing expectation until the paper settles it (a value change is a physics change). With −0.01552
  // the 300 K minority mobilities fall by about 13 % (holes in n-Si, 1e19) to 21 % (holes, 1e20) and
  // 11–17 % (electrons in p-Si, 1e19–1e20).
  it.failing(
    'KNOWN DISAGREEMENT (expected to fail): r5 = −0.01552, the paper’s value as two transcriptions that follow the paper print it',
    () => {
      expect(KLAASSEN_ELECTRON_HOLE_F.r5).toBe(-0.01552);
    },
  );

  it('majority mobility at 1e18 cm⁻³: 277 (electrons, P) and 153 (holes, B) cm²/(V·s)', () => {
    // Klaassen I (from memory): for majority carriers at 300 K the model reduces to the
    // Caughey–Thomas form μmin + (μmax − μmin)/(1 + (N/Nref)^α) with those parameters.
    // B. Van Zeghbroeck, Principles of Semiconductor Devices, Example 2.6, evaluates exactly that
    // form with Masetti's Table I values: 277 (P) and 153 (B) at 1e18 cm⁻³ (as quoted in
    // masetti-1983.reference.test.ts; not re-read here).
    expect(klaassen('electron', 'P', 1e18)).toBeCloseTo(277, 0);
    expect(klaassen('hole', 'B', 1e18)).toBeCloseTo(153, 0);
  });

  it('the 300 K resistivity with model klaassen is 1/(q·N·μ_Klaassen): the fit assumed full ionization', () => {
    for (const [dopant, carrier] of [
      ['P', 'electron'],
      ['B', 'hole'],
    ] as const) {
      for (const n of logSpaced(14, 20, 1)) {
        const sample = siliconSample(dopant, n);
        const fromFit = 1 / (ELEMENTARY_CHARGE * n * klaassen(carrier, dopant, n));
        expect(resistivity(sample, 'klaassen') / fromFit).toBeCloseTo(1, 6);
      }
    }
  });

  it('minority electrons in p-type Si (figure of paper I, from memory): roughly 150–350 cm²/(V·s) at 1e19–1e20, about twice majority', () => {
    // From memory the minority-electron data Klaassen fitted (Swirhun et al., Dziewior & Silber and
    // others) lie near 200–300 cm²/(V·s) at 1e19 cm⁻³ and somewhat lower at 1e20, well above the
    // majority curve (≈ 115 and 74). Model: 211 and 200.
    expect(klaassen('electron', 'B', 1e19)).toBeGreaterThan(150);
    expect(klaassen('electron', 'B', 1e19)).toBeLessThan(350);
    expect(klaassen('electron', 'B', 1e20)).toBeGreaterThan(120);
    expect(klaassen('electron', 'B', 1e20)).toBeLessThan(320);
    for (const n of [1e19, 1e20]) expect(klaassen('electron', 'B', n) / klaassen('electron', 'P', n)).toBeGreaterThan(1.5);
  });

  it('minority holes in n-type Si (figure of paper I, from memory): roughly 90–220 cm²/(V·s) at 1e19–1e20, above majority', () => {
    // From memory: minority-hole data (del Alamo, Swanson; Wang et al.; Swirhun et al.) scatter around
    // 100–200 cm²/(V·s) there; majority holes are ≈ 71 and 49. Model: 145 and 159.
    for (const n of [1e19, 1e20]) {
      expect(klaassen('hole', 'P', n)).toBeGreaterThan(90);
      expect(klaassen('hole', 'P', n)).toBeLessThan(220);
      expect(klaassen('hole', 'P', n)).toBeGreaterThan(1.5 * klaassen('hole', 'B', n));
    }
  });
});

describe('Klaassen (1992) II: temperature dependence', () => {
  it('lattice mobility ∝ T^−2.285 (electrons) and T^−2.247 (holes), seen in undoped Si over 100–400 K (θ as read in Charon and Genius)', () => {
    for (const [carrier, theta] of [
      ['electron', 2.285],
      ['hole', 2.247],
    ] as const) {
      const ratio = klaassen(carrier, 'P', 0, 200) / klaassen(carrier, 'P', 0, 400);
      expect(ratio / 2 ** theta).toBeCloseTo(1, 2); // residual ≤ 5e-4: electron–hole scattering of ni at 400 K
      expect(klaassen(carrier, 'P', 0, 100) / klaassenLatticeMobility(carrier, 100)).toBeCloseTo(1, 4);
    }
  });

  it('heavily doped majority mobility changes far less with temperature than the lattice mobility (from memory)', () => {
    // Lattice: μ_L(200)/μ_L(500) = 2.5^2.285 ≈ 8.1. At 1e19–1e20 cm⁻³ the impurity terms dominate
    // (μ_N ∝ T^(3α − 1.5), μ_c ∝ T^−0.5): model ratios 1.2 (1e19) and 1.5 (1e20) for electrons.
    for (const n of [1e19, 1e20]) {
      const ratio = klaassen('electron', 'P', n, 200) / klaassen('electron', 'P', n, 500);
      expect(ratio).toBeGreaterThan(1);
      expect(ratio).toBeLessThan(2);
    }
  });
});
