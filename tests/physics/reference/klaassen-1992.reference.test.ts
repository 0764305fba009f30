/**
 * D. B. M. Klaassen, "A unified mobility model for device simulation —
 * I. Model equations and concentration dependence", Solid-State Electron. 35,
 * 953 (1992), and "— II. Temperature dependence of carrier mobility and
 * lifetime", Solid-State Electron. 35, 961 (1992).
 *
 * The papers could not be read here: the equations, the parameters and every
 * expected value below are from memory. Where a value is read off a figure
 * from memory the bracket is deliberately wide.
 */
import { fitMobility } from '../../../src/physics/mobility';
import { KLAASSEN_CARRIER_TABLE, klaassenLatticeMobility } from '../../../src/physics/mobility/klaassen';
import { MASETTI_TABLE } from '../../../src/physics/mobility/masetti';
import { resistivity } from '../../../src/physics/transport';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { logSpaced, siliconSample } from '../transportSamples';

const klaassen = (carrier: 'electron' | 'hole', dopant: string, density: number, temperature = 300): number =>
  fitMobility('klaassen', carrier, siliconSample(dopant, density, temperature));

describe('Klaassen (1992) I: concentration dependence at 300 K', () => {
  it('takes μmax, μmin, N_ref and α from Masetti et al. (1983): P row for electrons, B row for holes (from memory)', () => {
    const electron = KLAASSEN_CARRIER_TABLE.electron;
    const p = MASETTI_TABLE.P.parameters;
    expect([electron.maximum, electron.minimum, electron.referenceDensity, electron.alpha]).toEqual([
      p.maximum, p.minimum1, p.referenceDensity, p.alpha,
    ]);
    const hole = KLAASSEN_CARRIER_TABLE.hole;
    const b = MASETTI_TABLE.B.parameters;
    expect([hole.maximum, hole.minimum, hole.referenceDensity, hole.alpha]).toEqual([b.maximum, b.minimum1, b.referenceDensity, b.alpha]);
  });

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
    for (const [dopant, carrier] of [['P', 'electron'], ['B', 'hole']] as const) {
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
  it('lattice mobility ∝ T^−2.285 (electrons) and T^−2.247 (holes), seen in undoped Si over 100–400 K (from memory)', () => {
    for (const [carrier, theta] of [['electron', 2.285], ['hole', 2.247]] as const) {
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
