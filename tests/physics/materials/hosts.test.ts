/**
 * Ge, GaAs and 4H-SiC parameter tables: look-up, provenance, dopant codes,
 * temperature domains, ni models per material and the incomplete-ionization
 * parameters scaled by the Mott density.
 */
import { PhysicsDomainError } from '../../../src/physics/errors';
import {
  GALLIUM_ARSENIDE,
  GERMANIUM,
  MATERIALS,
  SILICON,
  SILICON_CARBIDE_4H,
  checkTemperature,
  effectiveBohrRadius,
  mottDensity,
  resolveMaterial,
  type Dopant,
  type Material,
} from '../../../src/physics/materials';
import { dopantCodes, resolveDopant } from '../../../src/physics/dopants';
import { intrinsicDensity, intrinsicModelCodes, logIntrinsicDensity, resolveIntrinsicModel } from '../../../src/physics/bands';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { dopantIonizationEnergy, localizedFraction } from '../../../src/physics/ionization';
import { TEMPERATURE_RANGE_K } from '../../../src/catalog/common';

const NEW_HOSTS: readonly Material[] = [GERMANIUM, GALLIUM_ARSENIDE, SILICON_CARBIDE_4H];

/** Ionized fraction of a single-species sample. */
function ionized(material: Material, dopant: Dopant, density: number, temperature: number): number {
  const eq = solveEquilibrium(material, temperature, [{ dopant, density }]);
  return (dopant.kind === 'donor' ? eq.ionizedDonors : eq.ionizedAcceptors) / density;
}

describe('look-up', () => {
  it.each([
    ['ge', GERMANIUM],
    [' GAAS ', GALLIUM_ARSENIDE],
    ['4h-sic', SILICON_CARBIDE_4H],
    ['4H-SiC', SILICON_CARBIDE_4H],
  ] as const)('resolves %j', (code, material) => {
    expect(resolveMaterial(code)).toBe(material);
  });
});

describe('provenance', () => {
  it.each(NEW_HOSTS.map((m) => [m.code, m]))(
    '%s: every table has a citation saying where values were recalled, and a validity',
    (_code, material) => {
      const host = material as Material;
      const tables = [host.bandgap, host.densityOfStates, ...host.dopants.map((d) => d.ionization)];
      for (const table of tables) {
        expect(table.citation).toMatch(/from memory|common practice, no source/);
        expect(table.validity.length).toBeGreaterThan(10);
      }
      for (const dopant of host.dopants) expect(dopant.ionizationEnergyCitation).toMatch(/from memory/);
      expect(host.hostPropertiesCitation).toMatch(/common practice, no source/);
      expect(host.intrinsicFits).toEqual([]);
    },
  );
});

describe('temperature domains', () => {
  it.each(MATERIALS.map((m) => [m.code, m]))('%s covers the catalog range 20–1000 K', (_code, material) => {
    const host = material as Material;
    expect(checkTemperature(host, TEMPERATURE_RANGE_K.min)).toBe(TEMPERATURE_RANGE_K.min);
    expect(checkTemperature(host, TEMPERATURE_RANGE_K.max)).toBe(TEMPERATURE_RANGE_K.max);
  });

  it('ends germanium at its melting point, 1211 K (common practice, no source), with a message naming it', () => {
    expect(checkTemperature(GERMANIUM, 1211)).toBe(1211);
    expect(() => checkTemperature(GERMANIUM, 1250)).toThrow(/germanium: 1–1211 K.*melting point of germanium/);
  });

  it('ends GaAs at 1511 K and 4H-SiC at 3100 K (common practice, no source)', () => {
    expect(() => checkTemperature(GALLIUM_ARSENIDE, 1600)).toThrow(PhysicsDomainError);
    expect(checkTemperature(SILICON_CARBIDE_4H, 3000)).toBe(3000);
  });
});

describe('dopant codes', () => {
  it('lists the brief’s dopants for each material, plus the generic donor and acceptor', () => {
    expect(dopantCodes(GERMANIUM)).toEqual(['B', 'Ga', 'In', 'P', 'As', 'Sb', 'donor', 'acceptor']);
    expect(dopantCodes(GALLIUM_ARSENIDE)).toEqual(['Zn', 'Be', 'C', 'Mg', 'Si', 'Te', 'Se', 'Sn', 'donor', 'acceptor']);
    expect(dopantCodes(SILICON_CARBIDE_4H)).toEqual(['Al', 'B', 'N', 'P', 'donor', 'acceptor']);
  });

  it('has no two codes in a material that collide case-insensitively', () => {
    for (const material of MATERIALS) {
      const codes = dopantCodes(material).map((code) => code.toLowerCase());
      expect(new Set(codes).size).toBe(codes.length);
    }
  });

  it('reads 4H-SiC codes in any case: N and n are nitrogen, the generic donor is "donor"', () => {
    expect(resolveDopant(SILICON_CARBIDE_4H, 'N').name).toBe('nitrogen');
    expect(resolveDopant(SILICON_CARBIDE_4H, 'n').name).toBe('nitrogen');
    expect(resolveDopant(SILICON_CARBIDE_4H, 'donor').name).toBe('generic donor');
    expect(resolveDopant(SILICON_CARBIDE_4H, 'p').name).toBe('phosphorus');
    expect(resolveDopant(SILICON_CARBIDE_4H, 'Acceptor').kind).toBe('acceptor');
    expect(resolveDopant(SILICON_CARBIDE_4H, 'al').name).toBe('aluminium');
  });

  it('makes Si a donor and C an acceptor in GaAs (site assumptions in galliumArsenideDopants.ts)', () => {
    expect(resolveDopant(GALLIUM_ARSENIDE, 'si').kind).toBe('donor');
    expect(resolveDopant(GALLIUM_ARSENIDE, 'SI').name).toBe('silicon');
    expect(resolveDopant(GALLIUM_ARSENIDE, 'c').kind).toBe('acceptor');
    expect(resolveDopant(GALLIUM_ARSENIDE, 'zinc').symbol).toBe('Zn');
  });

  it('refuses a dopant of another material, naming the allowed ones', () => {
    expect(() => resolveDopant(GALLIUM_ARSENIDE, 'B')).toThrow(
      /unknown dopant 'B' for gallium arsenide: allowed dopants are Zn, Be, C, Mg, Si, Te, Se, Sn, donor, acceptor/,
    );
    expect(() => resolveDopant(GERMANIUM, 'Al')).toThrow(PhysicsDomainError);
  });

  it('takes ionization energies from Sze & Ng 2007 ch. 1 for Ge and GaAs (from memory)', () => {
    const energy = (m: Material, s: string) => resolveDopant(m, s).ionizationEnergy;
    for (const s of ['P', 'As', 'Sb', 'B', 'Ga', 'In']) expect(energy(GERMANIUM, s)).toBeGreaterThanOrEqual(0.0096);
    for (const s of ['P', 'As', 'Sb', 'B', 'Ga', 'In']) expect(energy(GERMANIUM, s)).toBeLessThanOrEqual(0.0127);
    for (const s of ['Si', 'Te', 'Se', 'Sn']) expect(energy(GALLIUM_ARSENIDE, s)).toBeCloseTo(0.006, 3);
    expect([
      energy(GALLIUM_ARSENIDE, 'Zn'),
      energy(GALLIUM_ARSENIDE, 'Be'),
      energy(GALLIUM_ARSENIDE, 'C'),
      energy(GALLIUM_ARSENIDE, 'Mg'),
    ]).toEqual([0.031, 0.028, 0.026, 0.028]);
    // 4H-SiC, Levinshtein et al. 2001 (from memory): Al ≈ 0.2 eV, B ≈ 0.3 eV; N, P effective levels.
    expect(energy(SILICON_CARBIDE_4H, 'Al')).toBe(0.2);
    expect(energy(SILICON_CARBIDE_4H, 'B')).toBe(0.3);
  });
});

describe('ni models per material', () => {
  it('offers only dos for hosts without a published ni fit, and makes it their default', () => {
    for (const host of NEW_HOSTS) {
      expect(intrinsicModelCodes(host)).toEqual(['dos']);
      expect(resolveIntrinsicModel(host, '')).toBe('dos');
      expect(intrinsicDensity(host, 300)).toBe(intrinsicDensity(host, 300, 'dos'));
    }
  });

  it('refuses silicon’s fits for other hosts, naming the host and what it supports', () => {
    expect(() => intrinsicDensity(GERMANIUM, 300, 'misiakos')).toThrow(
      /intrinsic density model 'misiakos' has parameters for silicon only; germanium supports: dos/,
    );
    expect(() => intrinsicDensity(SILICON_CARBIDE_4H, 300, 'Sproul-Green')).toThrow(PhysicsDomainError);
    expect(() => intrinsicDensity(GALLIUM_ARSENIDE, 300, 'xyz')).toThrow(/unknown intrinsic density model 'xyz'/);
  });

  it('grows strictly with temperature from 20 K to 1000 K in every host', () => {
    for (const host of NEW_HOSTS) {
      // In logarithms: ni of 4H-SiC underflows a double below about 25 K, ln ni does not.
      let previous = -Infinity;
      for (let t = 20; t <= 1000; t += 10) {
        const logNi = logIntrinsicDensity(host, t);
        expect(logNi).toBeGreaterThan(previous);
        previous = logNi;
      }
    }
  });
});

describe('hydrogenic Mott density (ionizationScaling.ts)', () => {
  it('gives the effective-mass orbit for a hydrogenic level: GaAs donors (m* = 0.067, εr = 12.9; from memory)', () => {
    // a_B = εr·(m0/m*)·0.529 Å = 102 Å; from the measured 5.8 meV: a0·Ry/(εr·ΔE0) = 96 Å.
    const effectiveMass = 0.067;
    const fromMass = 12.9 * (1 / effectiveMass) * 0.5292e-8;
    expect(effectiveBohrRadius(0.0058, 12.9) / fromMass).toBeGreaterThan(0.9);
    expect(effectiveBohrRadius(0.0058, 12.9) / fromMass).toBeLessThan(1.1);
  });

  it('puts the GaAs donor transition near 2e16 cm⁻³ and Ge:P near 3e17 cm⁻³ (orders of magnitude reported, from memory)', () => {
    const gaasDonor = mottDensity(0.0058, 12.9);
    expect(gaasDonor).toBeGreaterThan(1e16);
    expect(gaasDonor).toBeLessThan(3e16);
    const geP = resolveDopant(GERMANIUM, 'P').ionization.localizationDensity;
    expect(geP).toBeGreaterThan(1e17);
    expect(geP).toBeLessThan(5e17);
  });

  it('scales the Si:P template densities by (εr·ΔE0 / εr,Si·ΔE0,Si)³ and keeps its exponents (the stated assumption)', () => {
    const siliconP = resolveDopant(SILICON, 'P').ionization;
    const geP = resolveDopant(GERMANIUM, 'P').ionization;
    const ratio = Math.pow((GERMANIUM.relativePermittivity * 0.012) / (SILICON.relativePermittivity * siliconP.isolatedEnergy), 3);
    expect(geP.referenceDensity / (siliconP.referenceDensity * ratio)).toBeCloseTo(1, 12);
    expect(geP.localizationDensity / (siliconP.localizationDensity * ratio)).toBeCloseTo(1, 12);
    expect([geP.screeningExponent, geP.localizationExponent]).toEqual([siliconP.screeningExponent, siliconP.localizationExponent]);
    expect(geP.citation).toMatch(/assumption/);
  });
});

describe('incomplete ionization in the new hosts, 1e12–1e21 cm⁻³ and 50–700 K', () => {
  const densities = Array.from({ length: 9 * 8 + 1 }, (_, i) => Math.pow(10, 12 + i / 8));
  const temperatures = [50, 77, 100, 150, 200, 300, 400, 500, 700];

  it.each(NEW_HOSTS.flatMap((host) => host.dopants.map((d) => [host.code, d.symbol, host, d])))(
    '%s:%s freezes out at low temperature, is smooth in N, and is fully ionized above the Mott density',
    (_code, _symbol, material, dopant) => {
      const host = material as Material;
      const species = dopant as Dopant;
      for (const t of temperatures) {
        let previous: number | undefined;
        for (const n of densities) {
          const fraction = ionized(host, species, n, t);
          expect(fraction).toBeGreaterThan(0);
          expect(fraction).toBeLessThanOrEqual(1 + 1e-12);
          // Steps of 1/8 decade: a kink or a jump would show as a large change between neighbours.
          if (previous !== undefined) expect(Math.abs(fraction - previous)).toBeLessThan(0.2);
          previous = fraction;
        }
      }
      // Freeze-out: at 1e16 cm⁻³ colder means fewer ionized dopants.
      expect(ionized(host, species, 1e16, 50)).toBeLessThan(ionized(host, species, 1e16, 300));
      // Above the Mott density (10·Nb, where b < 1 %): ionized at any temperature.
      const aboveMott = Math.min(10 * species.ionization.localizationDensity, host.atomicDensity / 2);
      expect(localizedFraction(species, aboveMott).localized).toBeLessThan(0.01);
      expect(ionized(host, species, aboveMott, 50)).toBeGreaterThan(0.99);
      // The level approaches the band as N grows.
      expect(dopantIonizationEnergy(species, 1e20)).toBeLessThan(dopantIonizationEnergy(species, 1e12));
    },
  );

  it('leaves 4H-SiC:Al mostly neutral at 300 K (deep acceptor), GaAs donors fully ionized', () => {
    const al = resolveDopant(SILICON_CARBIDE_4H, 'Al');
    expect(ionized(SILICON_CARBIDE_4H, al, 1e18, 300)).toBeLessThan(0.2);
    // GaAs has a small Nc (4.7e17 cm⁻³), so even 6 meV donors are a few per cent neutral below the Mott density.
    expect(ionized(GALLIUM_ARSENIDE, resolveDopant(GALLIUM_ARSENIDE, 'Si'), 1e16, 300)).toBeGreaterThan(0.95);
    expect(ionized(GALLIUM_ARSENIDE, resolveDopant(GALLIUM_ARSENIDE, 'Si'), 1e17, 300)).toBeGreaterThan(0.99);
  });

  it('4H-SiC N and P: one effective level gives the two-site ionized fraction at 300 K within 7 % (1e15–1e18 cm⁻³)', () => {
    // Two equally populated sites with the h / k levels named in siliconCarbide4HDopants.ts (from memory).
    const sites: Record<'N' | 'P', [number, number]> = { N: [0.055, 0.105], P: [0.052, 0.092] };
    for (const symbol of ['N', 'P'] as const) {
      const effective = resolveDopant(SILICON_CARBIDE_4H, symbol);
      const [hexagonal, cubic] = sites[symbol].map((energy) => ({
        ...effective,
        ionizationEnergy: energy,
        ionization: { ...effective.ionization, isolatedEnergy: energy },
      }));
      for (const n of [1e15, 1e16, 1e17, 1e18]) {
        const twoLevel =
          solveEquilibrium(SILICON_CARBIDE_4H, 300, [
            { dopant: hexagonal, density: n / 2 },
            { dopant: cubic, density: n / 2 },
          ]).ionizedDonors / n;
        expect(Math.abs(ionized(SILICON_CARBIDE_4H, effective, n, 300) / twoLevel - 1)).toBeLessThan(0.07);
      }
    }
  });
});
