/**
 * Temperature coefficient of resistivity (1/ρ)dρ/dT = d ln ρ/dT
 * (definition, common practice, no source): the numerical derivative against
 * closed forms, against the analytic derivative of the model where one exists,
 * smoothness over fine sweeps, the stencil's respect for the temperature
 * bounds, and the signs of the physical regimes.
 */
import { resistivityTemperatureCoefficient, temperatureDerivative } from '../../src/physics/temperatureCoefficient';
import { resistivity } from '../../src/physics/transport';
import { ARORA_REFERENCE_TEMPERATURE, ARORA_TABLE, aroraMobility } from '../../src/physics/mobility/arora';
import { resolveIntrinsicModel, intrinsicDensity } from '../../src/physics/bands/intrinsicDensity';
import { SILICON } from '../../src/physics/materials';
import { PhysicsDomainError } from '../../src/physics/errors';
import type { Carrier } from '../../src/physics/sample';
import { siliconSample } from './transportSamples';

const CATALOG_BOUNDS = { min: 20, max: 1000 };

describe('temperatureDerivative on closed forms', () => {
  const cases: [string, (t: number) => number, (t: number) => number][] = [
    ['a·ln T (power law)', (t) => -2.33 * Math.log(t), (t) => -2.33 / t],
    ['θ/T (activation)', (t) => 6726 / t, (t) => -6726 / (t * t)],
    ['ln(1 + e^(θ/T)) (a switch-over)', (t) => Math.log1p(Math.exp(300 / t)), (t) => -300 / (t * t) / (1 + Math.exp(-300 / t))],
  ];
  // Error bounds of the module comment for h = T/100: central ≤ 2.5e-9 of |g'| for
  // θ/T (a few times that for the sharper switch-over), one-sided ≤ 24·(1/200)⁴
  // = 1.5e-8 (used within 1 % of the ends).
  it.each(cases)('%s: within 1e-8 inside and 2e-8 at both ends of 20–1000 K', (_, g, exact) => {
    for (const t of [21, 77, 300, 555.5, 990]) {
      expect(Math.abs(temperatureDerivative(g, t, CATALOG_BOUNDS) / exact(t) - 1)).toBeLessThan(1e-8);
    }
    for (const t of [20, 20.1, 999, 1000]) {
      expect(Math.abs(temperatureDerivative(g, t, CATALOG_BOUNDS) / exact(t) - 1)).toBeLessThan(2e-8);
    }
  });

  it('never evaluates outside the bounds, also at the ends', () => {
    for (const t of [20, 20.05, 500, 995, 1000]) {
      const seen: number[] = [];
      temperatureDerivative((x) => (seen.push(x), Math.log(x)), t, CATALOG_BOUNDS);
      expect(Math.min(...seen)).toBeGreaterThanOrEqual(20);
      expect(Math.max(...seen)).toBeLessThanOrEqual(1000);
    }
  });

  it('gives the same value one-sided and central where both fit (no jump at the switch)', () => {
    const g = (t: number) => Math.log(resistivity(siliconSample('P', 1e15, t)));
    const oneSided = temperatureDerivative(g, 20.1, CATALOG_BOUNDS);
    const central = temperatureDerivative(g, 20.1, { min: 1, max: 1000 });
    expect(Math.abs(oneSided / central - 1)).toBeLessThan(1e-7);
  });

  it('refuses a temperature outside the bounds', () => {
    expect(() => temperatureDerivative(Math.log, 19, CATALOG_BOUNDS)).toThrow(PhysicsDomainError);
  });
});

/**
 * Analytic d ln ρ/dT of the model for full ionization and Boltzmann
 * statistics: n − p = N, n·p = ni², ni from the default fit
 * ni = A·(T/Tref)^m·exp(−Θ/T) (Misiakos & Tsamakis 1993), μ from the Arora
 * et al. (1982) closed form (the 'arora' model; its majority-carrier
 * correction factor does not depend on T).
 */
function analyticLogResistivitySlope(density: number, temperature: number): number {
  const fit = SILICON.intrinsicFits.find((f) => f.code === resolveIntrinsicModel(SILICON))!;
  const ni = intrinsicDensity(SILICON, temperature);
  const dNi = ni * (fit.exponent / temperature + fit.activationTemperature / (temperature * temperature));
  const root = Math.sqrt((density * density) / 4 + ni * ni);
  const n = density / 2 + root;
  const p = (ni * ni) / n;
  const dn = (ni * dNi) / root; // dn/dT = dp/dT
  const muSlope = (carrier: Carrier): [number, number] => {
    const c = ARORA_TABLE[carrier];
    const tn = temperature / ARORA_REFERENCE_TEMPERATURE;
    const minimum = c.minimum.value * tn ** c.minimum.exponent;
    const amplitude = c.amplitude.value * temperature ** c.amplitude.exponent;
    const reference = c.referenceDensity.value * tn ** c.referenceDensity.exponent;
    const alpha = c.alpha.value * tn ** c.alpha.exponent;
    const u = (density / reference) ** alpha;
    const dLogU =
      ((alpha * c.alpha.exponent) / temperature) * Math.log(density / reference) - (alpha * c.referenceDensity.exponent) / temperature;
    const mu = minimum + amplitude / (1 + u);
    const dMu =
      (minimum * c.minimum.exponent) / temperature +
      (amplitude * c.amplitude.exponent) / temperature / (1 + u) -
      (amplitude * u * dLogU) / ((1 + u) * (1 + u));
    expect(mu / aroraMobility(carrier, density, temperature)).toBeCloseTo(1, 12);
    return [mu, dMu];
  };
  const [muN, dMuN] = muSlope('electron');
  const [muP, dMuP] = muSlope('hole');
  return -(dn * muN + n * dMuN + dn * muP + p * dMuP) / (n * muN + p * muP);
}

describe('resistivityTemperatureCoefficient against the analytic derivative', () => {
  it('intrinsic regime (Si:P 1e10 cm⁻³, 550–700 K, arora): within 1e-4', () => {
    // Residual model differences, not derivative error: the dopants' neutral
    // share (< 1e-3 of 1e10 cm⁻³) and, if Fermi–Dirac statistics are used,
    // their ~1e-5 correction to n at ni/Nc ≈ 1e-4.
    for (const t of [550, 620, 700]) {
      const tcr = resistivityTemperatureCoefficient(siliconSample('P', 1e10, t), 'arora', CATALOG_BOUNDS);
      expect(Math.abs(tcr / analyticLogResistivitySlope(1e10, t) - 1)).toBeLessThan(1e-4);
      expect(tcr).toBeLessThan(0);
    }
  });

  it('full ionization with power-law mobility (Si:P 1e12 cm⁻³, 250–400 K, arora): within 1e-5', () => {
    // The neutral share of P at 1e12 cm⁻³ is ~4e-7 at 300 K; its T derivative
    // moves d ln n/dT by ~1e-8 /K against a slope of ~7e-3 /K.
    for (const t of [250, 300, 400]) {
      const tcr = resistivityTemperatureCoefficient(siliconSample('P', 1e12, t), 'arora', CATALOG_BOUNDS);
      expect(Math.abs(tcr / analyticLogResistivitySlope(1e12, t) - 1)).toBeLessThan(1e-5);
    }
  });
});

describe('resistivityTemperatureCoefficient over fine sweeps', () => {
  /** Largest |third difference| over a sweep, relative to the largest |value|. */
  function thirdDifference(dopant: string, density: number, from: number, to: number, step: number): number {
    const values: number[] = [];
    for (let i = 0; from + i * step <= to + 1e-9; i++) {
      const t = Math.min(to, from + i * step);
      values.push(resistivityTemperatureCoefficient(siliconSample(dopant, density, t), undefined, CATALOG_BOUNDS));
    }
    const scale = Math.max(...values.map(Math.abs));
    let worst = 0;
    for (let i = 0; i + 3 < values.length; i++) {
      worst = Math.max(worst, Math.abs(values[i + 3] - 3 * values[i + 2] + 3 * values[i + 1] - values[i]) / scale);
    }
    return worst;
  }
  // A TCR varying on the scale of T has third differences ≈ 6·(step/T)³ ≈ 3e-8
  // at 0.5 K steps near 300 K; a plain central difference with a 1e-6 K step
  // (solver noise amplified) gives ≈ 3e-6 there: the bound 3e-7 tells them apart.
  it.each([
    ['P', 1e15, 250, 350, 0.5],
    ['B', 1e15, 20, 22, 0.02], // across the switch to the one-sided stencil at 20.2 K
    ['P', 1e14, 990, 1000, 0.1], // across the switch near 1000 K
    ['As', 1e18, 280, 320, 0.25],
  ] as const)('%s %s cm⁻³, %s–%s K in %s K steps: third differences < 3e-7 of the values', (dopant, density, from, to, step) => {
    expect(thirdDifference(dopant, density, from, to, step)).toBeLessThan(3e-7);
  });
});

describe('resistivityTemperatureCoefficient: physical regimes', () => {
  it('is positive for lightly doped Si at 300 K, about +0.7 %/K at 1e15 cm⁻³', () => {
    // Lattice scattering: ρ rises with T, roughly +0.7 %/K for 1e15 cm⁻³
    // (handbook-level fact, from memory). The model gives ≈ +0.73 %/K (P) and
    // +0.67 %/K (B): Arora's lattice term μ ∝ T^−2.33 (e), T^−2.23 (h)
    // would give 0.78 %/K and 0.74 %/K alone; ionized-impurity scattering
    // lowers it slightly. Bound 0.5–0.9 %/K.
    for (const dopant of ['P', 'B']) {
      const tcr = resistivityTemperatureCoefficient(siliconSample(dopant, 1e15, 300));
      expect(tcr).toBeGreaterThan(5e-3);
      expect(tcr).toBeLessThan(9e-3);
    }
  });

  it('is negative in freeze-out (1e15 cm⁻³ at 20–50 K): ionization rises with T', () => {
    for (const t of [20, 30, 50]) {
      expect(resistivityTemperatureCoefficient(siliconSample('P', 1e15, t), undefined, CATALOG_BOUNDS)).toBeLessThan(0);
    }
  });

  it('is negative in the intrinsic regime (1e14 cm⁻³ above 500 K): ni grows', () => {
    for (const t of [500, 700, 1000]) {
      expect(resistivityTemperatureCoefficient(siliconSample('P', 1e14, t), undefined, CATALOG_BOUNDS)).toBeLessThan(0);
    }
  });

  it('refuses astm-f723, which has no temperature dependence', () => {
    expect(() => resistivityTemperatureCoefficient(siliconSample('B', 1e15), 'astm-f723')).toThrow(/no temperature dependence/);
  });
});
