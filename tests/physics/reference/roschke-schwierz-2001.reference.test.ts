/**
 * M. Roschke, F. Schwierz, "Electron mobility models for 4H, 6H, and 3C SiC",
 * IEEE Trans. Electron Devices 48, 1442 (2001), 4H-SiC; holes after
 * W. J. Schaffer et al., Mater. Res. Soc. Symp. Proc. 339, 595 (1994).
 * All values from memory and uncertain (see siliconCarbide4HRoschkeSchwierz.ts).
 *
 * The independent check: a second recalled 300 K electron set for 4H-SiC,
 * Schaffer et al. (1994), μ = 947/(1 + (N/1.94e17)^0.61) (μmin = 0; from
 * memory), describes the same Hall data. Two fits of one data set should agree
 * within their scatter, about 10 %, where both were fitted (1e15–1e19 cm⁻³).
 */
import { SILICON_CARBIDE_4H } from '../../../src/physics/materials';
import { resolveDopant } from '../../../src/physics/dopants';
import { fitMobility, mobility } from '../../../src/physics/mobility';

function nitrogen(density: number, temperature = 300) {
  return { material: SILICON_CARBIDE_4H, temperature, dopant: resolveDopant(SILICON_CARBIDE_4H, 'N'), density, counterDensity: 0 };
}
function aluminium(density: number, temperature = 300) {
  return { material: SILICON_CARBIDE_4H, temperature, dopant: resolveDopant(SILICON_CARBIDE_4H, 'Al'), density, counterDensity: 0 };
}

const schafferElectrons = (n: number) => 947 / (1 + Math.pow(n / 1.94e17, 0.61));

describe('Roschke & Schwierz (2001), 4H-SiC electrons (from memory)', () => {
  it('μn → μmax = 950 cm²/(V·s) in lightly doped material at 300 K (within 1 % at 1e13 cm⁻³)', () => {
    expect(Math.abs(mobility('roschke-schwierz', 'electron', nitrogen(1e13)) / 950 - 1)).toBeLessThan(0.01);
  });

  it.each([1e15, 1e16, 1e17, 1e18, 1e19])('agrees with Schaffer et al. (1994) at %s cm⁻³ within 10 %', (n) => {
    expect(Math.abs(fitMobility('', 'electron', nitrogen(n)) / schafferElectrons(n) - 1)).toBeLessThan(0.1);
  });

  it('falls as T^−2.4 in lightly doped material (the μmax law, from memory)', () => {
    const ratio = fitMobility('', 'electron', nitrogen(1e12, 500)) / fitMobility('', 'electron', nitrogen(1e12, 300));
    expect(ratio).toBeCloseTo(Math.pow(500 / 300, -2.4), 2);
  });

  it('tends to μmin = 40 cm²/(V·s) at very heavy doping and 300 K (within 10 % at 1e21 cm⁻³)', () => {
    expect(Math.abs(fitMobility('', 'electron', nitrogen(1e21)) / 40 - 1)).toBeLessThan(0.1);
  });
});

describe('Schaffer et al. (1994), 4H-SiC holes at 300 K (from memory)', () => {
  it.each([
    [1e15, 15.9 + 108.1 / (1 + Math.pow(1e15 / 1.76e19, 0.34))],
    [1e18, 15.9 + 108.1 / (1 + Math.pow(1e18 / 1.76e19, 0.34))],
  ])('at %s cm⁻³: %f cm²/(V·s)', (n, expected) => {
    expect(fitMobility('', 'hole', aluminium(n)) / expected).toBeCloseTo(1, 9);
  });

  it('lies in the 100–125 cm²/(V·s) usually quoted for lightly doped p-type 4H-SiC (Levinshtein et al. 2001, from memory)', () => {
    const mu = mobility('', 'hole', aluminium(1e15));
    expect(mu).toBeGreaterThan(100);
    expect(mu).toBeLessThan(125);
  });
});
