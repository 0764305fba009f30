/**
 * Silicon's default resistivity model 'f723-anchored' against ASTM F723.
 *
 * The F723 equations below are an independent transcription (not our
 * astmF723.ts), read in mirkov/material-properties,
 * doped-silicon-resistivity/doped-silicon-resistivity.lisp ("ASTM F723 (1)…(6)")
 * and, for B and P, identically in a Swift file "Conversion.swift" (SiHelper,
 * I. Kutovoy 2016), both found through the code corpus. Ranges: F723-99 §1.2
 * (read in public excerpts: inforstreet.com/standards/ASTM-F723-99 and the
 * Spanish summary at kpt-bj.org).
 *
 * Tolerance 1 %: the issue's requirement. The model is built to reproduce the
 * equations to rounding, so the test also shows the margin; F723's own
 * self-consistency (3 % B, 4.5 % P, §1.2) is the accuracy it claims.
 */
import {
  SILICON,
  resolveDopant,
  resistivity,
  dopingForResistivity,
  resistivityTemperatureCoefficient as temperatureCoefficient,
} from '../../src/physics';
import type { Sample } from '../../src/physics/sample';

const T23 = 296.15; // 23 °C, F723 §1.1

// F723 transcription (sources in the module doc).
function ratio(n: number[], d: number[], x: number): number {
  return (n[0] + n[1] * x + n[2] * x ** 2 + n[3] * x ** 3) / (1 + d[0] * x + d[1] * x ** 2 + d[2] * x ** 3);
}
const F723 = {
  B: {
    rho: (N: number) => 1.305e16 / N + 1.133e17 / (N * (1 + (2.58e-19 * N) ** -0.737)),
    density: (r: number) => 1.33e16 / r + 1.082e17 / (r * (1 + (54.56 * r) ** 1.105)),
    densityRange: [1e12, 1e21],
    rhoRange: [1e-4, 1e4],
  },
  P: {
    rho: (N: number) =>
      (6.242e18 / N) * 10 ** ratio([-3.0769, 2.2108, -0.62272, 0.057501], [-0.68157, 0.19833, -0.018376], Math.log10(N) - 16),
    density: (r: number) => (6.242e18 / r) * 10 ** ratio([-3.1083, -3.2626, -1.2196, -0.13923], [1.0265, 0.38755, 0.041833], Math.log10(r)),
    densityRange: [1e12, 5e20],
    rhoRange: [2e-4, 4e3],
  },
} as const;

function sampleOf(symbol: string, density: number, temperature = T23, counterDensity = 0): Sample {
  return { material: SILICON, temperature, dopant: resolveDopant(SILICON, symbol), density, counterDensity };
}

function logSweep(min: number, max: number, perDecade: number): number[] {
  const out: number[] = [];
  const steps = Math.round(Math.log10(max / min) * perDecade);
  for (let i = 0; i <= steps; i++) out.push(min * 10 ** ((Math.log10(max / min) * i) / steps));
  return out;
}

describe.each(['B', 'P'] as const)('default model vs ASTM F723 at 23 °C, %s', (symbol) => {
  const std = F723[symbol];

  test('RESISTIVITY within 1 % of F723 ρ(N) over the whole density range', () => {
    let worst = 0;
    for (const N of logSweep(std.densityRange[0], std.densityRange[1], 8)) {
      worst = Math.max(worst, Math.abs(resistivity(sampleOf(symbol, N)) / std.rho(N) - 1));
    }
    expect(worst).toBeLessThan(0.01);
  });

  test('DOPING within 1 % of F723 N(ρ) over the whole resistivity range (the certificate direction)', () => {
    let worst = 0;
    for (const rho of logSweep(std.rhoRange[0], std.rhoRange[1], 6)) {
      const density = dopingForResistivity(rho, sampleOf(symbol, 0)).density;
      worst = Math.max(worst, Math.abs(density / std.density(rho) - 1));
    }
    expect(worst).toBeLessThan(0.01);
  });

  test("the issue's certificate values now follow F723", () => {
    for (const rho of [3.5e-4, 1e-3, 0.01, 1, 10]) {
      if (rho < std.rhoRange[0]) continue;
      expect(dopingForResistivity(rho, sampleOf(symbol, 0)).density / std.density(rho)).toBeCloseTo(1, 2);
    }
  });
});

describe('named models keep returning what they are named after', () => {
  test('masetti is the physics alone (differs from F723 by ~11 % at 1e18 B, issue 12 §3)', () => {
    const s = sampleOf('B', 1e18);
    expect(Math.abs(resistivity(s, 'masetti') / F723.B.rho(1e18) - 1)).toBeGreaterThan(0.05);
  });
  test('astm-f723 is the standard', () => {
    expect(resistivity(sampleOf('P', 3e20, 296), 'astm-f723') / F723.P.rho(3e20)).toBeCloseTo(1, 10);
  });
});

describe('temperature and compensation come from the physics', () => {
  test('ρ(T)/ρ(23 °C) is that of masetti', () => {
    for (const [symbol, N] of [
      ['B', 1e15],
      ['P', 1e18],
      ['B', 1e20],
    ] as const) {
      for (const T of [200, 300, 400]) {
        const anchored = resistivity(sampleOf(symbol, N, T)) / resistivity(sampleOf(symbol, N));
        const physics = resistivity(sampleOf(symbol, N, T), 'masetti') / resistivity(sampleOf(symbol, N), 'masetti');
        expect(anchored / physics).toBeCloseTo(1, 10);
      }
    }
  });
  test('TCR equals the physics model’s (the factor has no temperature dependence)', () => {
    const s = sampleOf('P', 1e16, 300);
    expect(temperatureCoefficient(s) / temperatureCoefficient(s, 'masetti')).toBeCloseTo(1, 6);
  });
  test('counter-doping scales as in the physics model', () => {
    const N = 1e17;
    const anchored = resistivity(sampleOf('B', N, 300, 3e16)) / resistivity(sampleOf('B', N, 300));
    const physics = resistivity(sampleOf('B', N, 300, 3e16), 'masetti') / resistivity(sampleOf('B', N, 300), 'masetti');
    expect(anchored / physics).toBeCloseTo(1, 10);
  });
  test('other dopants: the physics model unchanged', () => {
    for (const symbol of ['As', 'Sb', 'Ga']) {
      const s = sampleOf(symbol, 1e17, 300);
      expect(resistivity(s) / resistivity(s, 'masetti')).toBeCloseTo(1, 12);
    }
  });
});

/**
 * Smoothness: the step-to-step change of ln ρ in a dense sweep varies
 * smoothly. A jump or a kink at a range edge shows as a second difference far
 * larger than its neighbours'. Threshold: 20× the median |second difference|
 * plus an absolute floor, common practice, no source (a kink of slope change
 * 0.01 per decade at 40 points per decade gives 0.01/40 = 2.5e-4, which the
 * floor of 5e-5 catches).
 */
function maxOutlier(values: number[]): number {
  const first = values.slice(1).map((v, i) => v - values[i]);
  const second = first.slice(1).map((v, i) => Math.abs(v - first[i]));
  const sorted = [...second].sort((a, b) => a - b);
  const median = sorted[Math.floor(sorted.length / 2)];
  return Math.max(...second.map((d) => d / (20 * median + 5e-5)));
}

describe('smooth sweeps across the edges of the standard’s ranges', () => {
  test.each([
    ['B', 'forward'],
    ['P', 'forward'],
  ])('%s: doping sweep 1e10–1e22 cm⁻³ at 23 °C and 350 K', (symbol) => {
    for (const T of [T23, 350]) {
      const ln = logSweep(1e10, 1e22, 40).map((N) => Math.log(resistivity(sampleOf(symbol, N, T))));
      expect(maxOutlier(ln)).toBeLessThan(1);
    }
  });
  test.each(['B', 'P'])('%s: DOPING sweep across the resistivity range ends', (symbol) => {
    const ln = logSweep(3e-5, 3e4, 30).map((rho) => Math.log(dopingForResistivity(rho, sampleOf(symbol, 0)).density));
    expect(maxOutlier(ln)).toBeLessThan(1);
  });
  test('temperature sweep 250–450 K passes 290 and 305 K (the astm-f723 window) without a step', () => {
    for (const [symbol, N] of [
      ['B', 1e16],
      ['P', 4e20],
    ] as const) {
      const temps: number[] = [];
      for (let T = 250; T <= 450; T += 1) temps.push(T);
      const ln = temps.map((T) => Math.log(resistivity(sampleOf(symbol, N, T))));
      expect(maxOutlier(ln)).toBeLessThan(1);
    }
  });
});
