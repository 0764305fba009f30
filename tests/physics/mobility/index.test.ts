import {
  DEFAULT_MOBILITY_MODEL,
  MOBILITY_MODEL_CODES,
  defaultMinorityMobilityModel,
  defaultMobilityModelFor,
  diffusivity,
  driftMobilities,
  fitMobility,
  freeCarrierMobility,
  mobility,
  resolveMobilityModel,
} from '../../../src/physics/mobility';
import { MASETTI_TABLE, masettiMobility } from '../../../src/physics/mobility/masetti';
import { aroraMobility, aroraTemperatureRatio } from '../../../src/physics/mobility/arora';
import { caugheyThomasMobility } from '../../../src/physics/mobility/caugheyThomas';
import { fullIonizationCorrection } from '../../../src/physics/mobility/fullIonizationCorrection';
import { thermalVoltage } from '../../../src/physics/constants';
import { einsteinDegeneracyFactor } from '../../../src/physics/bands';
import { solveEquilibrium } from '../../../src/physics/equilibrium';
import { GALLIUM_ARSENIDE, GERMANIUM, SILICON, SILICON_CARBIDE_4H } from '../../../src/physics/materials';
import { sampleDopants } from '../../../src/physics/sample';
import { PhysicsDomainError } from '../../../src/physics/errors';
import { siliconSample } from '../transportSamples';

describe('mobility model codes', () => {
  it('lists masetti (default), arora, caughey-thomas, klaassen', () => {
    expect(MOBILITY_MODEL_CODES).toEqual(['masetti', 'arora', 'caughey-thomas', 'klaassen']);
    expect(DEFAULT_MOBILITY_MODEL).toBe('masetti');
  });
  it('parses codes case-insensitively; empty selects the default', () => {
    expect(resolveMobilityModel('Caughey-Thomas')).toBe('caughey-thomas');
    expect(resolveMobilityModel(' ARORA ')).toBe('arora');
    expect(resolveMobilityModel('')).toBe('masetti');
    expect(resolveMobilityModel()).toBe('masetti');
  });
  it('rejects unknown codes listing the allowed ones, and explains astm-f723', () => {
    expect(() => resolveMobilityModel('no-such-model')).toThrow(/Allowed: masetti, arora, caughey-thomas, klaassen/);
    expect(() => resolveMobilityModel('astm-f723')).toThrow(/no mobility/);
    expect(() => fitMobility('x', 'hole', siliconSample('B', 1e16))).toThrow(PhysicsDomainError);
  });
});

describe('fitMobility', () => {
  it('uses the named donor’s own Masetti row for electrons and the B row for holes', () => {
    expect(fitMobility('masetti', 'electron', siliconSample('As', 1e19))).toBe(masettiMobility(MASETTI_TABLE.As.parameters, 1e19));
    expect(fitMobility('masetti', 'electron', siliconSample('P', 1e19))).toBe(masettiMobility(MASETTI_TABLE.P.parameters, 1e19));
    expect(fitMobility('masetti', 'hole', siliconSample('P', 1e19))).toBe(masettiMobility(MASETTI_TABLE.B.parameters, 1e19));
  });
  it('uses the P row for minority electrons in p-type samples', () => {
    expect(fitMobility('masetti', 'electron', siliconSample('B', 1e18))).toBe(masettiMobility(MASETTI_TABLE.P.parameters, 1e18));
  });
  it('takes the total impurity density N_D + N_A for compensated samples', () => {
    const compensated = siliconSample('P', 1e17, 300, 5e16);
    expect(fitMobility('arora', 'electron', compensated)).toBe(aroraMobility('electron', 1.5e17, 300));
    expect(fitMobility('caughey-thomas', 'hole', compensated)).toBe(caugheyThomasMobility('hole', 1.5e17));
  });
  it('carries the 300 K fits to other temperatures by the Arora ratio', () => {
    const hot = siliconSample('B', 1e16, 400);
    expect(fitMobility('masetti', 'hole', hot)).toBeCloseTo(
      masettiMobility(MASETTI_TABLE.B.parameters, 1e16) * aroraTemperatureRatio('hole', 1e16, 400),
      10,
    );
    expect(fitMobility('caughey-thomas', 'electron', hot)).toBeCloseTo(
      caugheyThomasMobility('electron', 1e16) * aroraTemperatureRatio('electron', 1e16, 400),
      10,
    );
    expect(fitMobility('arora', 'electron', hot)).toBe(aroraMobility('electron', 1e16, 400));
  });
  it('is finite and positive for an undoped sample (no 0/0 at N = 0)', () => {
    for (const model of MOBILITY_MODEL_CODES) {
      for (const carrier of ['electron', 'hole'] as const) {
        const mu = fitMobility(model, carrier, siliconSample('P', 0));
        expect(Number.isFinite(mu) && mu > 0).toBe(true);
      }
    }
  });
});

describe('mobility (the named model as published)', () => {
  it('is the fit itself for both carriers under every named silicon model (no ionization factor)', () => {
    for (const model of MOBILITY_MODEL_CODES) {
      const sample = siliconSample('P', 1e18, 250);
      expect(mobility(model, 'electron', sample)).toBe(fitMobility(model, 'electron', sample));
      expect(mobility(model, 'hole', sample)).toBe(fitMobility(model, 'hole', sample));
    }
  });
});

describe('freeCarrierMobility (mobility per free carrier)', () => {
  it('is the fit times N_net/n_net(300 K) for the net-majority carrier and the fit for the other', () => {
    for (const model of MOBILITY_MODEL_CODES) {
      const sample = siliconSample('P', 1e18, 250);
      expect(freeCarrierMobility(model, 'electron', sample)).toBe(
        fitMobility(model, 'electron', sample) * fullIonizationCorrection(sample),
      );
      expect(freeCarrierMobility(model, 'hole', sample)).toBe(fitMobility(model, 'hole', sample));
    }
  });
  it('applies the factor to the counter-dopant’s carrier when counter-doping outweighs the named dopant', () => {
    const sample = siliconSample('P', 1e17, 300, 1e18);
    expect(freeCarrierMobility('masetti', 'hole', sample)).toBe(fitMobility('masetti', 'hole', sample) * fullIonizationCorrection(sample));
    expect(freeCarrierMobility('masetti', 'electron', sample)).toBe(fitMobility('masetti', 'electron', sample));
  });
  it('equals the shared driftMobilities used by conductivity', () => {
    const sample = siliconSample('B', 3e18, 350, 1e17);
    const both = driftMobilities('arora', sample);
    expect(freeCarrierMobility('arora', 'electron', sample)).toBe(both.electron);
    expect(freeCarrierMobility('arora', 'hole', sample)).toBe(both.hole);
  });
});

describe('blank model: chosen per carrier', () => {
  it('is klaassen for silicon minority carriers and masetti for majority carriers', () => {
    const pType = siliconSample('B', 1e19);
    expect(defaultMobilityModelFor('electron', pType)).toBe('klaassen');
    expect(defaultMobilityModelFor('hole', pType)).toBe('masetti');
    expect(mobility('', 'electron', pType)).toBe(mobility('klaassen', 'electron', pType));
    expect(mobility('', 'hole', pType)).toBe(mobility('masetti', 'hole', pType));
    expect(freeCarrierMobility('', 'electron', pType)).toBe(freeCarrierMobility('klaassen', 'electron', pType));
    expect(freeCarrierMobility('', 'hole', pType)).toBe(freeCarrierMobility('masetti', 'hole', pType));
  });
  it('follows the net doping: in P-doped Si counter-doped with more acceptors the electrons are the minority', () => {
    const typeChanged = siliconSample('P', 1e17, 300, 1e18);
    expect(defaultMobilityModelFor('electron', typeChanged)).toBe('klaassen');
    expect(defaultMobilityModelFor('hole', typeChanged)).toBe('masetti');
  });
  it('has no minority carrier in exactly compensated material: the default for both', () => {
    const compensated = siliconSample('P', 1e17, 300, 1e17);
    expect(defaultMobilityModelFor('electron', compensated)).toBe('masetti');
    expect(defaultMobilityModelFor('hole', compensated)).toBe('masetti');
  });
  it('keeps each other material’s own fit for both carriers', () => {
    for (const [material, code] of [
      [GERMANIUM, 'hilsum'],
      [GALLIUM_ARSENIDE, 'sotoodeh'],
      [SILICON_CARBIDE_4H, 'roschke-schwierz'],
    ] as const) {
      expect(defaultMinorityMobilityModel(material)).toBe(code);
    }
    expect(defaultMinorityMobilityModel(SILICON)).toBe('klaassen');
  });
  it('uses the carrier’s choice in diffusivity too', () => {
    const pType = siliconSample('B', 1e18);
    expect(diffusivity('', 'electron', pType)).toBe(diffusivity('klaassen', 'electron', pType));
  });
});

describe('diffusivity', () => {
  it('is the generalized Einstein relation D = μ·(kT/q)·F½(η)/F−½(η) with the published mobility', () => {
    for (const t of [77, 300, 600]) {
      const sample = siliconSample('As', 1e17, t);
      const state = solveEquilibrium(SILICON, t, sampleDopants(sample));
      const factor = einsteinDegeneracyFactor(SILICON, t, 'electron', state.fermiLevel);
      expect(diffusivity('masetti', 'electron', sample)).toBe(mobility('masetti', 'electron', sample) * thermalVoltage(t) * factor);
      // 1e17 cm⁻³ is non-degenerate: the factor is 1 + e^η/2^{3/2} + … ≈ 1 to under 1 %.
      expect(factor).toBeGreaterThanOrEqual(1);
      expect(factor).toBeLessThan(1.01);
    }
  });
  it('grows above μ·kT/q in degenerate n+ silicon (5e19 cm⁻³ As at 300 K)', () => {
    const sample = siliconSample('As', 5e19, 300);
    expect(diffusivity('masetti', 'electron', sample) / (mobility('masetti', 'electron', sample) * thermalVoltage(300))).toBeGreaterThan(
      1.2,
    );
  });
  it('is about 30.6 cm²/s for electrons in 1e16 P-doped Si at 300 K (Masetti et al. 1983 eq. 1: 1184 × kT/q 0.02585)', () => {
    expect(diffusivity('masetti', 'electron', siliconSample('P', 1e16))).toBeGreaterThan(30.4);
    expect(diffusivity('masetti', 'electron', siliconSample('P', 1e16))).toBeLessThan(30.9);
  });
});
