/**
 * The inverse where ρ(N) is not monotone: every solution is found, none is
 * chosen silently, and a density window picks one.
 *
 * Where the forward model is not monotone (a property of the forward model,
 * not a reference value): at 77 K, incomplete ionization (Altermatt et al.,
 * J. Appl. Phys. 100, 113714/113715 (2006), as implemented in
 * src/physics/ionization.ts) makes moderately doped silicon more resistive
 * than lighter doping until the Mott transition, so ρ falls, rises and falls
 * again with N (freeze-out; common practice, no source). Near intrinsic, a
 * little boron trades fast electrons for slow holes and raises ρ above the
 * intrinsic value (common practice, no source). These tests check the solver
 * against the forward model it inverts: round trips and a brute-force scan.
 */
import {
  AmbiguousDopingError,
  GRID_STEP_DECADES,
  dopingForResistivity,
  dopingSolutions,
  resistivityTurningPoints,
} from '../../src/physics/inverse';
import { resistivity } from '../../src/physics/transport';
import { PhysicsDomainError } from '../../src/physics/errors';
import { logSpaced, siliconSample, siliconSampleWithoutDensity } from './transportSamples';

/**
 * Each solution must give the target back through the forward model to 1e-6
 * (the requirement; the solver's own tolerance is 1e-13 in ln N).
 */
const RESISTIVITY_ROUND_TRIP = 1e-6;

/**
 * The physics model, which RESISTIVITY and DOPING share exactly. (The default
 * 'f723-anchored' anchors each direction to its own F723 equation, so its
 * round trip closes only to the standard's self-consistency; its ambiguity is
 * tested in tests/catalog/dopingWindow.test.ts.)
 */
const MODEL = 'masetti';

function densities(rho: number, dopant: string, temperature: number): number[] {
  return dopingSolutions(rho, siliconSampleWithoutDensity(dopant, temperature), MODEL).map((s) => s.density);
}

function threeDigits(n: number): string {
  return n.toExponential(2).replace('e+', 'e');
}

describe('all solutions at 77 K (freeze-out)', () => {
  it.each(['P', 'B'])('finds three densities for the resistivity of 1e17 cm⁻³ %s, each giving it back', (dopant) => {
    const target = resistivity(siliconSample(dopant, 1e17, 77), MODEL);
    const found = densities(target, dopant, 77);
    expect(found).toHaveLength(3);
    expect(found[0]).toBeLessThan(found[1]);
    expect(found[1]).toBeLessThan(found[2]);
    expect(found.some((n) => Math.abs(n / 1e17 - 1) < 1e-9)).toBe(true);
    for (const n of found)
      expect(Math.abs(resistivity(siliconSample(dopant, n, 77), MODEL) / target - 1)).toBeLessThan(RESISTIVITY_ROUND_TRIP);
  });

  it.each(['P', 'B'])('every target across the non-monotone stretch has three solutions that round-trip (%s)', (dopant) => {
    for (const n of logSpaced(15.5, 17, 4)) {
      const target = resistivity(siliconSample(dopant, n, 77), MODEL);
      const found = densities(target, dopant, 77);
      expect(found).toHaveLength(3);
      expect(found.some((m) => Math.abs(m / n - 1) < 1e-9)).toBe(true);
      for (const m of found)
        expect(Math.abs(resistivity(siliconSample(dopant, m, 77), MODEL) / target - 1)).toBeLessThan(RESISTIVITY_ROUND_TRIP);
    }
  });

  it('refuses to choose: the issue’s case is an error listing the three solutions and the window’s names', () => {
    const target = resistivity(siliconSample('P', 1e17, 77), MODEL);
    const found = densities(target, 'P', 77);
    const call = () =>
      dopingForResistivity(target, siliconSampleWithoutDensity('P', 77), MODEL, {}, { min: 'doping_min', max: 'doping_max' });
    expect(call).toThrow(AmbiguousDopingError);
    expect(call).toThrow(PhysicsDomainError);
    let message = '';
    try {
      call();
    } catch (error) {
      message = (error as Error).message;
      expect((error as AmbiguousDopingError).solutions).toEqual(found);
    }
    expect(message).toMatch(/^3 densities of P give resistivity 0\.4002 Ω·cm in Si at 77 K/);
    expect(message).toContain(`${threeDigits(found[0])}, ${threeDigits(found[1])} and ${threeDigits(found[2])} cm⁻³`);
    expect(message).toContain('doping_min and/or doping_max');
  });
});

describe('a density window picks one solution', () => {
  const sample = siliconSampleWithoutDensity('P', 77);
  const target = resistivity(siliconSample('P', 1e17, 77), MODEL);
  const found = dopingSolutions(target, sample, MODEL);
  const n = found.map((s) => s.density);
  const between = (a: number, b: number) => Math.sqrt(a * b);

  it('a window around each solution returns exactly that solution', () => {
    expect(dopingForResistivity(target, sample, MODEL, { max: between(n[0], n[1]) })).toEqual(found[0]);
    expect(dopingForResistivity(target, sample, MODEL, { min: between(n[0], n[1]), max: between(n[1], n[2]) })).toEqual(found[1]);
    expect(dopingForResistivity(target, sample, MODEL, { min: between(n[1], n[2]) })).toEqual(found[2]);
    expect(dopingForResistivity(target, sample, MODEL, { min: 1e16, max: 3e17 }).density).toBeCloseTo(1e17, -5);
  });

  it('a window holding two solutions is still ambiguous and lists those two', () => {
    const call = () => dopingForResistivity(target, sample, MODEL, { min: 1e16, max: 1e19 });
    expect(call).toThrow(AmbiguousDopingError);
    expect(call).toThrow(`2 densities of P with window.min 1.00e16 and window.max 1.00e19 cm⁻³ give`);
    expect(call).toThrow(`${threeDigits(n[1])} and ${threeDigits(n[2])} cm⁻³`);
  });

  it('a window holding none says so and lists every solution', () => {
    const call = () => dopingForResistivity(target, sample, MODEL, { min: 1e19 });
    expect(call).toThrow(/^no density of P with window\.min 1\.00e19 cm⁻³ gives resistivity 0\.4002 Ω·cm in Si at 77 K/);
    expect(call).toThrow(`densities that do are ${threeDigits(n[0])}, ${threeDigits(n[1])} and ${threeDigits(n[2])} cm⁻³`);
    expect(() => dopingForResistivity(1, siliconSampleWithoutDensity('B'), MODEL, { max: 1e15 })).toThrow(/density that does is 1\.5\de16/);
  });

  it('refuses a window given high end first, or with a negative end', () => {
    expect(() => dopingForResistivity(target, sample, MODEL, { min: 1e18, max: 1e16 })).toThrow(
      /window\.min 1\.00e18 cm⁻³ is above window\.max 1\.00e16/,
    );
    expect(() => dopingForResistivity(target, sample, MODEL, { min: -1 })).toThrow(/must be a finite density ≥ 0/);
  });

  it('applies to the ASTM F723 reverse equation too (one solution, which must lie in the window)', () => {
    const f723 = siliconSampleWithoutDensity('B', 296);
    const unique = dopingForResistivity(1, f723, 'astm-f723');
    expect(dopingForResistivity(1, f723, 'astm-f723', { min: unique.density / 2, max: unique.density * 2 })).toEqual(unique);
    expect(() => dopingForResistivity(1, f723, 'astm-f723', { min: unique.density * 2 })).toThrow(/no density of B/);
  });
});

describe('unique solutions stay unique', () => {
  it.each(['B', 'P', 'As', 'Sb'])('300 K, 1e12–1e21 cm⁻³: one solution, the density itself (%s)', (dopant) => {
    for (const n of logSpaced(12, 21, 2)) {
      const target = resistivity(siliconSample(dopant, n, 300), MODEL);
      const found = densities(target, dopant, 300);
      expect(found).toHaveLength(1);
      expect(Math.abs(found[0] / n - 1)).toBeLessThan(1e-9);
      expect(dopingForResistivity(target, siliconSampleWithoutDensity(dopant, 300), MODEL).density).toBe(found[0]);
    }
  });
});

describe('near-intrinsic p-type maximum (450 K)', () => {
  it('light boron above intrinsic ρ has two solutions, the near-intrinsic and the extrinsic one', () => {
    const target = resistivity(siliconSample('B', 1e12, 450), MODEL);
    const found = densities(target, 'B', 450);
    expect(found).toHaveLength(2);
    expect(Math.abs(found[0] / 1e12 - 1)).toBeLessThan(1e-6);
    expect(found[1]).toBeGreaterThan(1e13);
    expect(() => dopingForResistivity(target, siliconSampleWithoutDensity('B', 450), MODEL)).toThrow(AmbiguousDopingError);
    expect(dopingForResistivity(target, siliconSampleWithoutDensity('B', 450), MODEL, { min: 1e13 }).density).toBe(found[1]);
  });

  it('finds both solutions just under a maximum that falls between grid points, printed with enough digits to differ', () => {
    let highest = 0;
    let atHighest = 0;
    for (const n of logSpaced(13, 14.5, 600)) {
      const rho = resistivity(siliconSample('B', n, 450), MODEL);
      if (rho > highest) [highest, atHighest] = [rho, n];
    }
    const target = highest * (1 - 1e-7);
    const found = densities(target, 'B', 450);
    expect(found).toHaveLength(2);
    for (const n of found) {
      expect(n).toBeGreaterThan(atHighest / 1.1);
      expect(n).toBeLessThan(atHighest * 1.1);
      expect(Math.abs(resistivity(siliconSample('B', n, 450), MODEL) / target - 1)).toBeLessThan(RESISTIVITY_ROUND_TRIP);
    }
    let message = '';
    try {
      dopingForResistivity(target, siliconSampleWithoutDensity('B', 450), MODEL);
    } catch (error) {
      message = (error as Error).message;
    }
    const listed = message.match(/: (\S+) and (\S+) cm⁻³/);
    expect(listed).not.toBeNull();
    expect(listed![1]).not.toBe(listed![2]);
  });
});

describe('the scan grid is fine enough (against a brute-force scan of the forward model)', () => {
  /** Local extrema of ln ρ over 10^13–10^20 cm⁻³ on a 0.002-decade grid. */
  function bruteForceFold(dopant: string, temperature: number): { min: number; max: number; height: number } | undefined {
    const xs = logSpaced(13, 20, 500);
    const ys = xs.map((n) => Math.log(resistivity(siliconSample(dopant, n, temperature), MODEL)));
    const extrema: number[] = [];
    for (let i = 1; i + 1 < ys.length; i++) if ((ys[i] - ys[i - 1]) * (ys[i + 1] - ys[i]) < 0) extrema.push(i);
    if (extrema.length !== 2) return undefined;
    const [a, b] = extrema;
    return { min: xs[a], max: xs[b], height: ys[b] - ys[a] };
  }

  it.each(['P', 'B', 'As', 'Sb', 'Ga'])(
    'every freeze-out fold wider than two grid steps is found, down to where it appears (%s)',
    (dopant) => {
      let folds = 0;
      for (const temperature of [50, 77, 100, 105, 110, 120, 125, 130]) {
        const fold = bruteForceFold(dopant, temperature);
        if (fold === undefined) continue;
        const separation = Math.log10(fold.max / fold.min);
        // The bound the module comment relies on: height ≲ 0.25·s³ (s in decades).
        expect(fold.height).toBeLessThan(0.3 * separation ** 3);
        if (separation <= 2 * GRID_STEP_DECADES) continue;
        folds++;
        // The scan's turning points are the brute-force extrema (to the brute-force grid's 0.002 decade).
        const turns = resistivityTurningPoints(siliconSampleWithoutDensity(dopant, temperature), MODEL);
        expect(turns.map((t) => t.kind)).toEqual(['minimum', 'maximum']);
        expect(Math.abs(Math.log10(turns[0].netDensity / fold.min))).toBeLessThan(0.002);
        expect(Math.abs(Math.log10(turns[1].netDensity / fold.max))).toBeLessThan(0.002);
        const target = Math.exp(Math.log(resistivity(siliconSample(dopant, fold.min, temperature), MODEL)) + fold.height / 2);
        const found = densities(target, dopant, temperature);
        expect(found).toHaveLength(3);
        expect(found[1]).toBeGreaterThan(fold.min);
        expect(found[1]).toBeLessThan(fold.max);
      }
      expect(folds).toBeGreaterThanOrEqual(4);
    },
  );
});
