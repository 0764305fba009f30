/**
 * Layer sheet resistance: the adaptive integral against an independent
 * composite Simpson rule, closed forms, Irvin's scaling, implant limits,
 * monotonicity and errors. The model (σ = q(nμn + pμp) integrated to the
 * junction) is Irvin's (Bell Syst. Tech. J. 41, 387 (1962)); the checks here
 * are of the arithmetic and of properties that follow from the definitions.
 */
import {
  diffusedLayerConductance,
  diffusedLayerSheetResistance,
  implantedLayerConductance,
  implantedLayerSheetResistance,
  LAYER_INTEGRATION,
  type DiffusedLayer,
} from '../../../src/physics/layers/sheetResistance';
import { erfc, erfcinv } from '../../../src/physics/layers/specialFunctions';
import { junctionDepth } from '../../../src/physics/layers/profiles';
import { conductivity, fitMobility, ELEMENTARY_CHARGE, CM_PER_UM, PhysicsDomainError, SILICON, resolveDopant } from '../../../src/physics';
import { siliconSample } from '../transportSamples';
import { f723Resistivity } from '../../../src/physics/astmF723';
import { F723_ANCHOR_TEMPERATURE } from '../../../src/physics/f723Anchored';

const boron = resolveDopant(SILICON, 'B');

function layer(profile: 'gaussian' | 'erfc', dopant: string, ns: number, xjUm: number, nb: number, temperature = 300): DiffusedLayer {
  return { profile, surfaceConcentration: ns, junctionDepthUm: xjUm, background: nb, dopant: resolveDopant(SILICON, dopant), temperature };
}

/** Composite Simpson's rule with n (even) intervals: the independent second method. */
function simpson(f: (x: number) => number, a: number, b: number, n: number): number {
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

/** The test's own profile, written from the formulas rather than taken from profiles.ts. */
function profileDensity(l: DiffusedLayer): (x: number) => number {
  const ratio = l.background / l.surfaceConcentration;
  if (l.profile === 'gaussian') {
    const lengthUm = l.junctionDepthUm / Math.sqrt(Math.log(1 / ratio));
    return (x) => l.surfaceConcentration * Math.exp(-((x / lengthUm) ** 2));
  }
  const lengthUm = l.junctionDepthUm / erfcinv(ratio);
  return (x) => l.surfaceConcentration * erfc(x / lengthUm);
}

function simpsonSheetResistance(l: DiffusedLayer, n: number): number {
  const density = profileDensity(l);
  const sigma = (x: number) => conductivity(siliconSample(l.dopant.symbol, Math.max(density(x), 0), l.temperature, l.background));
  return 1 / (simpson(sigma, 0, l.junctionDepthUm, n) * CM_PER_UM);
}

const CASES: DiffusedLayer[] = [
  layer('gaussian', 'B', 1e19, 2, 1e15),
  layer('erfc', 'P', 1e20, 1, 1e16),
  layer('gaussian', 'P', 1e17, 1, 1e16, 400),
  layer('erfc', 'As', 5e19, 0.3, 1e17),
  layer('erfc', 'B', 1e18, 5, 1e14, 250),
];

describe('diffused layers: accuracy of the integral', () => {
  it.each(CASES.map((c) => [c.profile, c.dopant.symbol, c.surfaceConcentration, c.junctionDepthUm, c.background, c.temperature, c]))(
    '%s %s Ns=%s xj=%s µm NB=%s %s K agrees with composite Simpson to 1e-4, and the Simpson reference has converged',
    (...args) => {
      const c = args[6] as DiffusedLayer;
      const coarse = simpsonSheetResistance(c, 400);
      const fine = simpsonSheetResistance(c, 1600);
      // Simpson's error falls as h⁴: the 1600-interval value is within |fine − coarse|/15 of the limit.
      expect(Math.abs(fine / coarse - 1) / 15).toBeLessThan(1e-5);
      const result = diffusedLayerConductance(c);
      expect(Math.abs(diffusedLayerSheetResistance(c) / fine - 1)).toBeLessThan(1e-4);
      expect(result.relativeError).toBeLessThan(LAYER_INTEGRATION.promisedRelativeAccuracy);
      expect(result.evaluations).toBeLessThanOrEqual(15 * (2 * LAYER_INTEGRATION.maxPieces - 1));
    },
  );

  it('gives Rs·xj independent of xj for fixed Ns and NB (Irvin 1962: σ̄ depends on Ns and NB only)', () => {
    for (const profile of ['gaussian', 'erfc'] as const) {
      const products = [0.2, 1, 6].map((xj) => diffusedLayerSheetResistance(layer(profile, 'B', 3e18, xj, 1e15)) * xj);
      for (const p of products) expect(p / products[0]).toBeCloseTo(1, 5);
    }
  });
});

describe('diffused layers: physical behaviour (definitions, common practice)', () => {
  it('falls with surface concentration and with junction depth', () => {
    for (const profile of ['gaussian', 'erfc'] as const) {
      const byNs = [1e16, 1e17, 1e18, 1e19, 1e20].map((ns) => diffusedLayerSheetResistance(layer(profile, 'P', ns, 1, 1e15)));
      for (let i = 1; i < byNs.length; i++) expect(byNs[i]).toBeLessThan(byNs[i - 1]);
      const byXj = [0.1, 0.5, 1, 3].map((xj) => diffusedLayerSheetResistance(layer(profile, 'B', 1e19, xj, 1e16)));
      for (let i = 1; i < byXj.length; i++) expect(byXj[i]).toBeLessThan(byXj[i - 1]);
    }
  });

  it('makes a p-type layer more resistive than the same n-type layer (hole mobility below electron mobility)', () => {
    expect(diffusedLayerSheetResistance(layer('gaussian', 'B', 1e18, 2, 1e15))).toBeGreaterThan(
      diffusedLayerSheetResistance(layer('gaussian', 'P', 1e18, 2, 1e15)),
    );
  });

  it('uses the junction depth JUNCTIONDEPTH gives: a layer built from L has N(xj) = NB', () => {
    const xj = junctionDepth('erfc', 1e20, 0.2, 1e16);
    const fromL = diffusedLayerConductance(layer('erfc', 'P', 1e20, xj, 1e16));
    expect(fromL.bottomUm).toBe(xj);
    expect(profileDensity(layer('erfc', 'P', 1e20, xj, 1e16))(xj) / 1e16).toBeCloseTo(1, 10);
  });

  it('rejects Ns ≤ background, a non-positive depth and a non-positive background', () => {
    expect(() => diffusedLayerSheetResistance(layer('gaussian', 'B', 1e15, 1, 1e15))).toThrow(/must exceed the background/);
    expect(() => diffusedLayerSheetResistance(layer('gaussian', 'B', 1e18, 0, 1e15))).toThrow(/junction depth must be/);
    expect(() => diffusedLayerSheetResistance(layer('erfc', 'B', 1e18, 1, 0))).toThrow(/background must be/);
  });
});

describe('implanted layers (as-implanted, fully activated, no damage)', () => {
  const implant = (dose: number, rangeUm: number, straggleUm: number, background: number, temperature = 300) => ({
    dose,
    rangeUm,
    straggleUm,
    background,
    dopant: boron,
    temperature,
  });

  it('for a deep, light implant approaches 1/∫q·μ(N)·N dx over the whole Gaussian (≈ 1/(q·μ·Φ))', () => {
    const dose = 1e11;
    const [rp, straggle] = [3, 0.1];
    const peak = dose / (Math.sqrt(2 * Math.PI) * straggle * CM_PER_UM);
    const density = (x: number) => peak * Math.exp(-(((x - rp) / straggle) ** 2) / 2);
    // At 23 °C the default resistivity model is ASTM F723 itself for uncompensated B (f723Anchored.ts),
    // so the layer's conductance is ∫ dx / ρ_F723(N(x)); the tolerance is the integration's.
    const fullGaussian =
      simpson(
        // Below F723's 1e12 cm⁻³ (beyond 4σ of this 4e15 cm⁻³ peak: < 1e-4 of the dose) nothing is counted.
        (x) => (density(x) >= 1e12 ? 1 / f723Resistivity('B', density(x)) : 0),
        rp - 8 * straggle,
        rp + 8 * straggle,
        1600,
      ) * CM_PER_UM;
    const rs = implantedLayerSheetResistance(implant(dose, rp, straggle, 1e8, F723_ANCHOR_TEMPERATURE));
    expect(Math.abs(rs * fullGaussian - 1)).toBeLessThan(2e-3);
    // And, with μ nearly constant below 1e16 cm⁻³, close to 1/(q·μ·Φ) at the peak's mobility.
    const muPeak = fitMobility('masetti', 'hole', siliconSample('B', peak));
    expect(Math.abs(rs * ELEMENTARY_CHARGE * muPeak * dose - 1)).toBeLessThan(0.05);
  });

  it('truncates at the surface: Rp = 0 keeps half the Gaussian, so twice the Rs of the same implant buried deep', () => {
    const atSurface = implantedLayerSheetResistance(implant(5e13, 0, 0.05, 1e15));
    const deep = implantedLayerSheetResistance(implant(5e13, 1, 0.05, 1e15));
    expect(atSurface / deep).toBeCloseTo(2, 4);
  });

  it('finds one junction for a shallow implant and two for a buried one', () => {
    const shallow = implantedLayerConductance(implant(1e14, 0.1, 0.04, 1e15));
    expect(shallow.topUm).toBe(0);
    const buried = implantedLayerConductance(implant(1e12, 0.5, 0.1, 1e15));
    expect(buried.topUm).toBeGreaterThan(0);
    expect(buried.bottomUm).toBeGreaterThan(0.5);
    expect(buried.relativeError).toBeLessThan(LAYER_INTEGRATION.promisedRelativeAccuracy);
  });

  it('falls with dose', () => {
    const values = [1e12, 1e13, 1e14, 1e15].map((dose) => implantedLayerSheetResistance(implant(dose, 0.1, 0.04, 1e15)));
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeLessThan(values[i - 1]);
  });

  it('rejects a dose too small to overcompensate, and non-physical geometry', () => {
    expect(() => implantedLayerSheetResistance(implant(1e9, 0.1, 0.1, 1e15))).toThrow(/does not exceed the background/);
    expect(() => implantedLayerSheetResistance(implant(0, 0.1, 0.1, 1e15))).toThrow(/dose must be/);
    expect(() => implantedLayerSheetResistance(implant(1e13, -0.1, 0.1, 1e15))).toThrow(/projected range must be/);
    expect(() => implantedLayerSheetResistance(implant(1e13, 0.1, 0, 1e15))).toThrow(/straggle must be/);
  });
});

describe('implants beyond the lattice', () => {
  it('refuses a peak above the atomic density with a message (property tests found dose 1e308 over straggle 5e-324)', () => {
    const boron = resolveDopant(SILICON, 'B');
    const layer = { dose: 1e308, rangeUm: 0, straggleUm: 5e-324, background: 1, dopant: boron, temperature: 300 };
    expect(() => implantedLayerSheetResistance(layer)).toThrow(/above the atomic density of silicon/);
    expect(() => implantedLayerSheetResistance({ ...layer, dose: 1e18, straggleUm: 1e-4 })).toThrow(PhysicsDomainError);
  });
});

describe('layer dimensions beyond any wafer', () => {
  it('refuses ranges, straggles and junction depths above MAX_LAYER_DEPTH_UM (property tests found a 1e16 µm range)', () => {
    const boron = resolveDopant(SILICON, 'B');
    const implant = { dose: 1e14, rangeUm: 1e16, straggleUm: 0.05, background: 1e15, dopant: boron, temperature: 300 };
    expect(() => implantedLayerSheetResistance(implant)).toThrow(/projected range must be ≤ 10000 µm/);
    expect(() => implantedLayerSheetResistance({ ...implant, rangeUm: 0.1, straggleUm: 1e16 })).toThrow(/straggle must be ≤/);
    expect(() =>
      diffusedLayerSheetResistance({
        profile: 'gaussian',
        surfaceConcentration: 1e19,
        junctionDepthUm: 1e5,
        background: 1e15,
        dopant: boron,
        temperature: 300,
      }),
    ).toThrow(/junction depth must be ≤/);
  });
});
