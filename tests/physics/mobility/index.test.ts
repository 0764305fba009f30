import {
  DEFAULT_MOBILITY_MODEL,
  MOBILITY_MODEL_CODES,
  diffusivity,
  driftMobilities,
  fitMobility,
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
import { SILICON } from '../../../src/physics/materials';
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

describe('mobility (drift)', () => {
  it('is the fit times N_net/n_net(300 K) for the net-majority carrier and the fit for the other', () => {
    for (const model of MOBILITY_MODEL_CODES) {
      const sample = siliconSample('P', 1e18, 250);
      expect(mobility(model, 'electron', sample)).toBe(fitMobility(model, 'electron', sample) * fullIonizationCorrection(sample));
      expect(mobility(model, 'hole', sample)).toBe(fitMobility(model, 'hole', sample));
    }
  });
  it('applies the factor to the counter-dopant’s carrier when counter-doping outweighs the named dopant', () => {
    const sample = siliconSample('P', 1e17, 300, 1e18);
    expect(mobility('masetti', 'hole', sample)).toBe(fitMobility('masetti', 'hole', sample) * fullIonizationCorrection(sample));
    expect(mobility('masetti', 'electron', sample)).toBe(fitMobility('masetti', 'electron', sample));
  });
  it('equals the shared driftMobilities used by conductivity', () => {
    const sample = siliconSample('B', 3e18, 350, 1e17);
    const both = driftMobilities('arora', sample);
    expect(mobility('arora', 'electron', sample)).toBe(both.electron);
    expect(mobility('arora', 'hole', sample)).toBe(both.hole);
  });
});

describe('diffusivity', () => {
  it('is the generalized Einstein relation D = μ·(kT/q)·F½(η)/F−½(η) with the drift mobility', () => {
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
    expect(diffusivity('masetti', 'electron', sample) / (mobility('masetti', 'electron', sample) * thermalVoltage(300))).toBeGreaterThan(1.2);
  });
  it('is about 30.7 cm²/s for electrons in 1e16 P-doped Si at 300 K (Masetti 1983: 1184 × 1.004 ionization factor × kT/q 0.02585)', () => {
    expect(diffusivity('masetti', 'electron', siliconSample('P', 1e16))).toBeGreaterThan(30.4);
    expect(diffusivity('masetti', 'electron', siliconSample('P', 1e16))).toBeLessThan(30.9);
  });
});
