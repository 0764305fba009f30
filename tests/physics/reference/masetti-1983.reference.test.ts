/**
 * G. Masetti, M. Severi, S. Solmi, "Modeling of carrier mobility against
 * carrier concentration in arsenic-, phosphorus-, and boron-doped silicon",
 * IEEE Trans. Electron Devices 30, 764 (1983).
 *
 * Table I parameters are from memory (As and P rows agree with a third-party
 * quotation of Table I); the abstract was read.
 */
import { fitMobility } from '../../../src/physics/mobility';
import { MASETTI_TABLE } from '../../../src/physics/mobility/masetti';
import { resistivity } from '../../../src/physics/transport';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { logSpaced, siliconSample } from '../transportSamples';

const electronFit = (dopant: string, n: number): number => fitMobility('masetti', 'electron', siliconSample(dopant, n));

describe('Masetti et al. (1983)', () => {
  it('abstract (read): electron mobility in As-doped Si is significantly lower than in P-doped Si above 1e19 cm⁻³', () => {
    for (const n of logSpaced(19, 21, 4)) expect(electronFit('As', n)).toBeLessThan(electronFit('P', n));
    expect(electronFit('As', 1e20) / electronFit('P', 1e20)).toBeLessThan(0.9);
    // ...while the two agree closely at light doping (Table I: nearly equal μmax, Cr).
    expect(electronFit('As', 1e15) / electronFit('P', 1e15)).toBeCloseTo(1, 1);
  });

  it('Table I (from memory): lattice-limited values μmax at light doping', () => {
    expect(electronFit('P', 1e12) / MASETTI_TABLE.P.parameters.maximum).toBeCloseTo(1, 2);
    expect(electronFit('As', 1e12) / MASETTI_TABLE.As.parameters.maximum).toBeCloseTo(1, 2);
    expect(fitMobility('masetti', 'hole', siliconSample('B', 1e12)) / MASETTI_TABLE.B.parameters.maximum).toBeCloseTo(1, 2);
    expect([MASETTI_TABLE.P.parameters.maximum, MASETTI_TABLE.As.parameters.maximum, MASETTI_TABLE.B.parameters.maximum]).toEqual([
      1414, 1417, 470.5,
    ]);
  });

  it('matches a textbook evaluation with Masetti’s parameters: 277 (P) and 284 (As) cm²/(V·s) at 1e18 cm⁻³', () => {
    // B. Van Zeghbroeck, Principles of Semiconductor Devices (ecee.colorado.edu/~bart/book), Example 2.6,
    // using the μmin, μmax, Cr, α of Masetti's Table I; density 1e18 cm⁻³ inferred from the example's
    // ρ·μ. The μ1 term omitted there is negligible at 1e18. (Its 153 for B omits Pc and μmin2 = 0, so
    // it is not comparable with the full formula.)
    expect(electronFit('P', 1e18)).toBeCloseTo(277, 0);
    expect(electronFit('As', 1e18)).toBeCloseTo(284, 0);
  });

  it('is what the default resistivity reproduces at 300 K: ρ = 1/(q·N·μ_Masetti) (THE TRAP resolution)', () => {
    for (const [dopant, carrier] of [['P', 'electron'], ['As', 'electron'], ['B', 'hole']] as const) {
      for (const n of logSpaced(14, 21, 1)) {
        const sample = siliconSample(dopant, n);
        const fromFit = 1 / (ELEMENTARY_CHARGE * n * fitMobility('masetti', carrier, sample));
        expect(resistivity(sample, 'masetti') / fromFit).toBeCloseTo(1, 6); // the physics model; the default f723-anchored scales it to F723
      }
    }
  });
});
