/**
 * Mobility of Ge, GaAs and 4H-SiC: per-material defaults, refusal of models
 * without parameters for the material, the temperature-scaled Caughey–Thomas
 * form, and physical behaviour over 1e12–1e21 cm⁻³ and 50–700 K.
 */
import {
  ALL_MOBILITY_MODEL_CODES,
  MOBILITY_MODEL_CODES,
  defaultMobilityModel,
  fitMobility,
  freeCarrierMobility,
  mobility,
  mobilityModelCodes,
  resolveMobilityModel,
} from '../../../src/physics/mobility';
import { MATERIAL_MOBILITY_FITS, materialFitMobility } from '../../../src/physics/mobility/materialFits';
import { GALLIUM_ARSENIDE_SOTOODEH_FIT } from '../../../src/physics/mobility/galliumArsenideSotoodeh';
import { fullIonizationCorrection } from '../../../src/physics/mobility/fullIonizationCorrection';
import { GALLIUM_ARSENIDE, GERMANIUM, MATERIALS, SILICON, SILICON_CARBIDE_4H, type Material } from '../../../src/physics/materials';
import { PhysicsDomainError } from '../../../src/physics/errors';
import type { Carrier } from '../../../src/physics/sample';
import { materialSample } from '../transportSamples';

const sample = materialSample;

const NEW_HOSTS: readonly Material[] = [GERMANIUM, GALLIUM_ARSENIDE, SILICON_CARBIDE_4H];

describe('model codes per material', () => {
  it('keeps silicon’s list and default unchanged, and gives each other host its own fit as default', () => {
    expect(mobilityModelCodes(SILICON)).toEqual([...MOBILITY_MODEL_CODES]);
    expect(MATERIALS.map(defaultMobilityModel)).toEqual(['masetti', 'hilsum', 'sotoodeh', 'roschke-schwierz']);
    expect(ALL_MOBILITY_MODEL_CODES).toEqual([...MOBILITY_MODEL_CODES, 'hilsum', 'sotoodeh', 'roschke-schwierz']);
  });

  it('reads a blank code as the material’s default', () => {
    expect(resolveMobilityModel('', GALLIUM_ARSENIDE)).toBe('sotoodeh');
    expect(resolveMobilityModel(undefined, SILICON_CARBIDE_4H)).toBe('roschke-schwierz');
    expect(resolveMobilityModel(' HILSUM ', GERMANIUM)).toBe('hilsum');
    const s = sample(GALLIUM_ARSENIDE, 'Si', 1e17);
    expect(mobility('', 'electron', s)).toBe(mobility('sotoodeh', 'electron', s));
  });

  it.each([
    ['masetti', GALLIUM_ARSENIDE, /mobility model 'masetti' has parameters for silicon only; gallium arsenide supports: sotoodeh/],
    ['Arora', GERMANIUM, /'arora' has parameters for silicon only; germanium supports: hilsum/],
    ['caughey-thomas', SILICON_CARBIDE_4H, /4H silicon carbide supports: roschke-schwierz/],
    ['sotoodeh', SILICON, /'sotoodeh' has parameters for gallium arsenide only; silicon supports: masetti, arora, caughey-thomas/],
    ['hilsum', GALLIUM_ARSENIDE, /germanium only/],
  ] as const)('refuses %s for %s, naming what the material supports', (code, material, message) => {
    expect(() => resolveMobilityModel(code, material)).toThrow(PhysicsDomainError);
    expect(() => resolveMobilityModel(code, material)).toThrow(message);
  });

  it('refuses through the transport entry points as well', () => {
    expect(() => mobility('masetti', 'hole', sample(GALLIUM_ARSENIDE, 'Zn', 1e17))).toThrow(/silicon only/);
    expect(() => fitMobility('arora', 'electron', sample(GERMANIUM, 'P', 1e17))).toThrow(/germanium supports: hilsum/);
  });
});

describe('the temperature-scaled Caughey–Thomas form', () => {
  it('equals μmax at N = 0 and 300 K, (μmax + μmin)/2 at N = Nref, μmin for N → ∞', () => {
    for (const fit of MATERIAL_MOBILITY_FITS) {
      for (const carrier of ['electron', 'hole'] as Carrier[]) {
        const p = fit.parameters[carrier];
        expect(materialFitMobility(fit, carrier, 0, 300)).toBeCloseTo(p.maximum.value, 9);
        expect(materialFitMobility(fit, carrier, p.referenceDensity.value, 300)).toBeCloseTo((p.maximum.value + p.minimum.value) / 2, 9);
        expect(materialFitMobility(fit, carrier, 1e40, 300)).toBeCloseTo(p.minimum.value, 0);
      }
    }
  });

  it('is Sotoodeh’s equation for GaAs: μmin + (μmax·(300/T)^θ1 − μmin)/(1 + (N/(Nref·(T/300)^θ2))^λ)', () => {
    const fit = GALLIUM_ARSENIDE_SOTOODEH_FIT;
    const [t, n] = [400, 3e17];
    const expected = 500 + (9400 * Math.pow(300 / t, 2.1) - 500) / (1 + Math.pow(n / (6.0e16 * Math.pow(t / 300, 3.0)), 0.394));
    expect(materialFitMobility(fit, 'electron', n, t)).toBeCloseTo(expected, 9);
  });
});

describe('physical behaviour, 1e12–1e21 cm⁻³ and 50–700 K', () => {
  const densities = Array.from({ length: 9 * 4 + 1 }, (_, i) => Math.pow(10, 12 + i / 4));

  it.each(MATERIAL_MOBILITY_FITS.flatMap((fit) => (['electron', 'hole'] as Carrier[]).map((c) => [fit.code, c, fit] as const)))(
    '%s, %ss: positive, falls with doping at every temperature, falls with temperature when lightly doped (200–700 K)',
    (_code, carrier, fit) => {
      for (const t of [50, 100, 200, 300, 500, 700]) {
        let previous = Infinity;
        for (const n of densities) {
          const mu = materialFitMobility(fit, carrier as Carrier, n, t);
          expect(mu).toBeGreaterThan(0);
          expect(mu).toBeLessThanOrEqual(previous);
          previous = mu;
        }
      }
      let previous = Infinity;
      for (let t = 200; t <= 700; t += 50) {
        const mu = materialFitMobility(fit, carrier as Carrier, 1e14, t);
        expect(mu).toBeLessThan(previous);
        previous = mu;
      }
    },
  );
});

describe('drift mobility: the material fits describe free carriers (no full-ionization correction)', () => {
  it('returns the fit unchanged for the majority carrier, even for the deep Al acceptor in 4H-SiC', () => {
    const al = sample(SILICON_CARBIDE_4H, 'Al', 1e18);
    expect(mobility('', 'hole', al)).toBe(fitMobility('', 'hole', al));
    const zn = sample(GALLIUM_ARSENIDE, 'Zn', 1e18, 400, 1e17);
    expect(mobility('', 'hole', zn)).toBe(fitMobility('', 'hole', zn));
    expect(mobility('', 'electron', sample(GERMANIUM, 'Sb', 1e16, 77))).toBe(
      fitMobility('', 'electron', sample(GERMANIUM, 'Sb', 1e16, 77)),
    );
  });

  it('uses the total impurity density for compensated samples', () => {
    const compensated = sample(GALLIUM_ARSENIDE, 'Te', 2e17, 300, 1e17);
    expect(fitMobility('', 'electron', compensated)).toBe(materialFitMobility(GALLIUM_ARSENIDE_SOTOODEH_FIT, 'electron', 3e17, 300));
  });

  it('still computes the silicon-style correction for every host (300 K solve): finite, ≥ 1', () => {
    for (const host of NEW_HOSTS) {
      for (const dopant of host.dopants) {
        for (const n of [1e12, 1e16, 1e18, 1e20]) {
          const factor = fullIonizationCorrection(sample(host, dopant.symbol, n));
          expect(Number.isFinite(factor)).toBe(true);
          expect(factor).toBeGreaterThanOrEqual(1 - 1e-12);
        }
      }
    }
    // 4H-SiC:Al at 1e18 cm⁻³ is about 5 % ionized at 300 K: the factor would be about 20, which is why it is not applied.
    expect(fullIonizationCorrection(sample(SILICON_CARBIDE_4H, 'Al', 1e18))).toBeGreaterThan(10);
  });

  it('leaves silicon free-carrier results as they were (Masetti with the correction); the published value is Masetti', () => {
    const b = sample(SILICON, 'B', 1e18);
    expect(freeCarrierMobility('', 'hole', b)).toBe(fitMobility('masetti', 'hole', b) * fullIonizationCorrection(b));
    expect(mobility('', 'hole', b)).toBe(fitMobility('masetti', 'hole', b));
  });
});
