/**
 * Resistivity, its inverse and the resistivity model list in Ge, GaAs and
 * 4H-SiC; ASTM F723 stays a silicon-only conversion.
 */
import {
  ALL_RESISTIVITY_MODEL_CODES,
  RESISTIVITY_MODEL_CODES,
  conductivity,
  resistivity,
  resistivityModelCodes,
  resolveResistivityModel,
} from '../../../src/physics/transport';
import { dopingForResistivity } from '../../../src/physics/inverse';
import { GALLIUM_ARSENIDE, GERMANIUM, SILICON, SILICON_CARBIDE_4H } from '../../../src/physics/materials';
import { resolveDopant } from '../../../src/physics/dopants';
import { ELEMENTARY_CHARGE } from '../../../src/physics/constants';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { mobility } from '../../../src/physics/mobility';
import { materialSample } from '../transportSamples';

const sample = materialSample;

describe('resistivity model codes per material', () => {
  it('lists astm-f723 for silicon only', () => {
    expect(resistivityModelCodes(SILICON)).toEqual([...RESISTIVITY_MODEL_CODES]);
    expect(resistivityModelCodes(GERMANIUM)).toEqual(['hilsum']);
    expect(resistivityModelCodes(GALLIUM_ARSENIDE)).toEqual(['sotoodeh']);
    expect(resistivityModelCodes(SILICON_CARBIDE_4H)).toEqual(['roschke-schwierz']);
    expect(ALL_RESISTIVITY_MODEL_CODES.slice(0, RESISTIVITY_MODEL_CODES.length)).toEqual([...RESISTIVITY_MODEL_CODES]);
  });

  it('defaults to the material’s mobility fit and refuses astm-f723 outside silicon, naming what is supported', () => {
    expect(resolveResistivityModel('', GALLIUM_ARSENIDE)).toBe('sotoodeh');
    expect(resolveResistivityModel(undefined)).toBe('f723-anchored');
    expect(() => resistivity(sample(GALLIUM_ARSENIDE, 'Zn', 1e17), 'astm-f723')).toThrow(
      /resistivity model 'astm-f723' has parameters for silicon only; gallium arsenide supports: sotoodeh/,
    );
    expect(() =>
      dopingForResistivity(
        1,
        { material: GERMANIUM, temperature: 300, dopant: resolveDopant(GERMANIUM, 'B'), counterDensity: 0 },
        'ASTM-F723',
      ),
    ).toThrow(/silicon only; germanium supports: hilsum/);
    expect(() => conductivity(sample(SILICON_CARBIDE_4H, 'N', 1e17), 'masetti')).toThrow(/4H silicon carbide supports: roschke-schwierz/);
  });
});

describe('resistivity in the new hosts', () => {
  it('is 1/q(nμn + pμp) with the solver’s carriers and the fits’ mobilities', () => {
    for (const [material, symbol] of [
      [GERMANIUM, 'Sb'],
      [GALLIUM_ARSENIDE, 'Be'],
      [SILICON_CARBIDE_4H, 'Al'],
    ] as const) {
      const s = sample(material, symbol, 1e17, 350);
      const eq = solveEquilibrium(material, 350, [{ dopant: s.dopant, density: 1e17 }]);
      const sigma = ELEMENTARY_CHARGE * (eq.electrons * mobility('', 'electron', s) + eq.holes * mobility('', 'hole', s));
      expect(resistivity(s)).toBeCloseTo(1 / sigma, 12);
    }
  });

  it('falls with doping at 300 K from 1e13 to 1e20 cm⁻³ for every dopant', () => {
    for (const material of [GERMANIUM, GALLIUM_ARSENIDE, SILICON_CARBIDE_4H]) {
      for (const dopant of material.dopants) {
        let previous = Infinity;
        for (let e = 13; e <= 20; e += 0.5) {
          const rho = resistivity(sample(material, dopant.symbol, Math.pow(10, e)));
          expect(rho).toBeLessThan(previous);
          previous = rho;
        }
      }
    }
  });

  it('shows intrinsic conduction in Ge at 600 K (ni ≈ 1e17 cm⁻³ exceeds 1e15 doping) and freeze-out in 4H-SiC:Al at 100 K', () => {
    const ge = sample(GERMANIUM, 'P', 1e15, 600);
    expect(resistivity(ge)).toBeLessThan(resistivity(sample(GERMANIUM, 'P', 1e15, 300)) / 5);
    const cold = resistivity(sample(SILICON_CARBIDE_4H, 'Al', 1e17, 100));
    expect(cold).toBeGreaterThan(100 * resistivity(sample(SILICON_CARBIDE_4H, 'Al', 1e17, 300)));
  });

  it('inverts: DOPING of RESISTIVITY returns the doping, in every new host', () => {
    for (const [material, symbol] of [
      [GERMANIUM, 'In'],
      [GALLIUM_ARSENIDE, 'Si'],
      [SILICON_CARBIDE_4H, 'N'],
      [SILICON_CARBIDE_4H, 'B'],
    ] as const) {
      const rho = resistivity(sample(material, symbol, 3e16));
      const found = dopingForResistivity(rho, {
        material,
        temperature: 300,
        dopant: resolveDopant(material, symbol),
        counterDensity: 0,
      }).density;
      expect(found / 3e16).toBeCloseTo(1, 6);
    }
  });
});
