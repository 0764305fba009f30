/**
 * Converting a resistivity reading to another temperature: against the first
 * order TCR correction ρ·(1 + TCR·ΔT) (definition of the TCR, common
 * practice, no source), round trips, the ambiguity rule of the inverse, and
 * the refusal of a model without temperature dependence.
 */
import { resistivityAtTemperature, conversionModel, CERTIFICATE_TEMPERATURE } from '../../src/physics/temperatureConversion';
import { resistivityTemperatureCoefficient } from '../../src/physics/temperatureCoefficient';
import { resistivity } from '../../src/physics/transport';
import { AmbiguousDopingError } from '../../src/physics/inverse';
import { PhysicsDomainError } from '../../src/physics/errors';
import { siliconSample, siliconSampleWithoutDensity } from './transportSamples';

describe('resistivityAtTemperature', () => {
  it('defaults to 23 °C = 296.15 K (certificates, ASTM F723) and returns the reading at equal temperatures', () => {
    expect(CERTIFICATE_TEMPERATURE).toBe(296.15);
    for (const model of [undefined, 'f723-anchored', 'masetti', 'arora', 'klaassen']) {
      expect(resistivityAtTemperature(10.2, siliconSampleWithoutDensity('B', 296.15), undefined, model)).toBe(10.2);
    }
  });

  it.each([
    ['B', 1e15],
    ['P', 1e16],
    ['As', 1e18],
    ['B', 1e19],
  ])('%s %s cm⁻³: agrees with ρ·(1 + TCR·ΔT) to first order for ΔT = ±0.5 … ±4 K', (dopant, density) => {
    const measuredAt = 298.15; // 25 °C
    const sample = siliconSample(dopant, density, measuredAt);
    const reading = resistivity(sample, 'masetti');
    const tcr = resistivityTemperatureCoefficient(sample, 'masetti');
    for (const delta of [-4, -2, -0.5, 0.5, 2, 4]) {
      const converted = resistivityAtTemperature(reading, siliconSampleWithoutDensity(dopant, measuredAt), measuredAt + delta);
      const firstOrder = reading * (1 + tcr * delta);
      // The second-order remainder is (d²ρ/dT²)/ρ·ΔT²/2 ≲ (TCR² + |dTCR/dT|)·ΔT²: under 2e-4·(ΔT/K)²·… at these
      // TCRs (≤ 8e-3 /K, varying on a scale of T); 1e-4·ΔT² is that bound with room for the inverse's 1e-9.
      expect(Math.abs(converted / firstOrder - 1)).toBeLessThan(1e-4 * delta * delta);
      // Where the TCR is large, the change is visibly the TCR's (not the identity).
      if (Math.abs(tcr) > 1e-3) expect(Math.abs((converted / reading - 1) / (tcr * delta) - 1)).toBeLessThan(0.02 * Math.abs(delta));
    }
  });

  it('round trips: T1 → T2 → T1 returns the reading (to the inverse’s 1e-9), for several models', () => {
    for (const model of [undefined, 'masetti', 'arora', 'caughey-thomas', 'klaassen']) {
      for (const [dopant, reading] of [
        ['B', 10],
        ['phosphorus', 0.02],
        ['As', 0.003],
      ] as const) {
        const there = resistivityAtTemperature(reading, siliconSampleWithoutDensity(dopant, 303.15), 280, model);
        const back = resistivityAtTemperature(there, siliconSampleWithoutDensity(dopant, 280), 303.15, model);
        expect(Math.abs(back / reading - 1)).toBeLessThan(1e-9);
      }
    }
  });

  it('is the physics model for the anchored default (its temperature dependence at fixed N is the same)', () => {
    expect(conversionModel(undefined, siliconSampleWithoutDensity('B'))).toBe('masetti');
    expect(conversionModel('F723-ANCHORED', siliconSampleWithoutDensity('B'))).toBe('masetti');
    expect(conversionModel('arora', siliconSampleWithoutDensity('B'))).toBe('arora');
    const a = resistivityAtTemperature(10, siliconSampleWithoutDensity('B', 298.15));
    const b = resistivityAtTemperature(10, siliconSampleWithoutDensity('B', 298.15), undefined, 'masetti');
    expect(a).toBe(b);
  });

  it('refuses astm-f723, which has no temperature dependence', () => {
    expect(() => resistivityAtTemperature(10, siliconSampleWithoutDensity('B', 298.15), undefined, 'astm-f723')).toThrow(
      /no temperature dependence/,
    );
  });

  it('is an error listing the densities where the reading is not unique, and a window picks one', () => {
    const at77 = siliconSampleWithoutDensity('P', 77);
    let caught: unknown;
    try {
      resistivityAtTemperature(0.4, at77, 300);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(AmbiguousDopingError);
    expect((caught as AmbiguousDopingError).solutions).toHaveLength(3);
    expect((caught as Error).message).toMatch(/3 densities of P/);
    const picked = resistivityAtTemperature(0.4, at77, 300, undefined, { min: 1e16, max: 3e17 });
    const density = (caught as AmbiguousDopingError).solutions[1];
    expect(picked / resistivity(siliconSample('P', density, 300), 'masetti')).toBeCloseTo(1, 8);
  });

  it('says when a reading cannot be reached at the measurement temperature', () => {
    expect(() => resistivityAtTemperature(1e9, siliconSampleWithoutDensity('P', 300))).toThrow(PhysicsDomainError);
    expect(() => resistivityAtTemperature(1e9, siliconSampleWithoutDensity('P', 300))).toThrow(/reachable range/);
  });
});
