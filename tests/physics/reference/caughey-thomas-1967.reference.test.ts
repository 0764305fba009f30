/**
 * D. M. Caughey, R. E. Thomas, "Carrier mobilities in silicon empirically
 * related to doping and field", Proc. IEEE 55, 2192 (1967): low-field part
 * μ = μmin + (μmax − μmin)/(1 + (N/Nref)^α). Parameters from memory (not
 * cross-checked): electrons 65/1330 cm²/(V·s), 8.5e16 cm⁻³, 0.72; holes
 * 47.7/495, 6.3e16, 0.76.
 */
import { fitMobility } from '../../../src/physics/mobility';
import { CAUGHEY_THOMAS_TABLE, caugheyThomasMobility } from '../../../src/physics/mobility/caugheyThomas';
import { f723Resistivity } from '../../../src/physics/astmF723';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { logSpaced, siliconSample } from '../transportSamples';

const thurberMobility = (species: 'B' | 'P', n: number): number => 1 / (ELEMENTARY_CHARGE * n * f723Resistivity(species, n));

describe('Caughey & Thomas (1967)', () => {
  it('limits: μmax for pure silicon, μmin at heavy doping (the paper’s parameters, from memory)', () => {
    expect(caugheyThomasMobility('electron', 0)).toBe(1330);
    expect(caugheyThomasMobility('hole', 0)).toBe(495);
    expect(CAUGHEY_THOMAS_TABLE.electron.minimum).toBe(65);
    expect(CAUGHEY_THOMAS_TABLE.hole.minimum).toBe(47.7);
  });

  it('electrons: within 12 % of the later Thurber (1981) P data (via ASTM F723) from 1e13 to 1e20 cm⁻³', () => {
    for (const n of logSpaced(13, 20, 8)) {
      expect(Math.abs(caugheyThomasMobility('electron', n) / thurberMobility('P', n) - 1)).toBeLessThan(0.12);
    }
  });

  it('holes: within 7 % of Thurber (1981) B data below 1e15 cm⁻³, but up to 34 % low from 1e16 to 1e19', () => {
    // Observed here, not a published statement: with the parameters as
    // recalled the 1967 hole curve lies well below the 1981 boron data at
    // moderate doping. Whether that is the 1967 data or a misremembered
    // parameter could not be checked (parameters from memory).
    for (const n of logSpaced(13, 15, 8)) {
      expect(Math.abs(caugheyThomasMobility('hole', n) / thurberMobility('B', n) - 1)).toBeLessThan(0.07);
    }
    for (const n of logSpaced(16, 19, 8)) {
      const ratio = caugheyThomasMobility('hole', n) / thurberMobility('B', n);
      expect(ratio).toBeGreaterThan(0.66);
      expect(ratio).toBeLessThan(1);
    }
  });

  it('is used at 300 K as published (no temperature factor there)', () => {
    expect(fitMobility('caughey-thomas', 'hole', siliconSample('B', 1e17))).toBe(caugheyThomasMobility('hole', 1e17));
  });
});
