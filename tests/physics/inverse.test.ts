import { NET_DENSITY_SEARCH, dopingForResistivity } from '../../src/physics/inverse';
import { resistivity } from '../../src/physics/transport';
import { f723Density } from '../../src/physics/astmF723';
import { PhysicsDomainError } from '../../src/physics/errors';
import { logSpaced, siliconSample, siliconSampleWithoutDensity } from './transportSamples';

const ROUND_TRIP = 1e-9;

/** N → ρ(N) → N' for one dopant, counter-doping rule and temperature; returns the worst |N'/N − 1|. */
// Exact round trips are a property of the physics models; 'f723-anchored' (the default) follows F723's two
// directions and round-trips only to the standard's own inconsistency (tests/physics/f723Anchored.test.ts).
function worstRoundTrip(
  dopant: string,
  densities: number[],
  counterFor: (n: number) => number,
  temperature = 300,
  model = 'masetti',
): number {
  let worst = 0;
  for (const n of densities) {
    const counter = counterFor(n);
    const target = resistivity(siliconSample(dopant, n, temperature, counter), model);
    const { density } = dopingForResistivity(target, siliconSampleWithoutDensity(dopant, temperature, counter), model);
    worst = Math.max(worst, Math.abs(density / n - 1));
  }
  return worst;
}

describe('dopingForResistivity round trips at 300 K (1e12–1e21 cm⁻³)', () => {
  const densities = logSpaced(12, 21, 2);

  it.each(['B', 'P', 'As', 'Sb', 'Ga', 'donor', 'acceptor'])('closes to 1e-9 without counter-doping (%s)', (dopant) => {
    expect(worstRoundTrip(dopant, densities, () => 0)).toBeLessThan(ROUND_TRIP);
  });

  it.each(['B', 'P', 'As'])('closes to 1e-9 with fixed counter-doping 1e11 cm⁻³ (%s)', (dopant) => {
    expect(worstRoundTrip(dopant, densities, () => 1e11)).toBeLessThan(ROUND_TRIP);
  });

  it.each(['B', 'P'])('closes to 1e-9 with counter-doping of a third of the density (%s)', (dopant) => {
    expect(worstRoundTrip(dopant, densities, (n) => n / 3)).toBeLessThan(ROUND_TRIP);
  });

  it.each(['arora', 'caughey-thomas'])('closes to 1e-9 with the %s model', (model) => {
    expect(worstRoundTrip('B', logSpaced(12, 21, 1), () => 0, 300, model)).toBeLessThan(ROUND_TRIP);
    expect(worstRoundTrip('P', logSpaced(12, 21, 1), (n) => n / 10, 300, model)).toBeLessThan(ROUND_TRIP);
  });
});

describe('dopingForResistivity at other temperatures', () => {
  it('closes to 1e-9 at 450 K above the intrinsic density and at 200 K', () => {
    expect(worstRoundTrip('B', logSpaced(14.5, 21, 2), () => 0, 450)).toBeLessThan(ROUND_TRIP);
    expect(worstRoundTrip('P', logSpaced(12, 21, 2), () => 1e11, 200)).toBeLessThan(ROUND_TRIP);
  });

  it('closes to 1e-9 at 77 K where the solution is unique (light doping above the freeze-out maximum ρ, heavy doping below the minimum)', () => {
    expect(worstRoundTrip('P', logSpaced(12, 14.5, 2), () => 0, 77)).toBeLessThan(ROUND_TRIP);
    expect(worstRoundTrip('P', logSpaced(19, 21, 2), () => 0, 77)).toBeLessThan(ROUND_TRIP);
  });

  // Where ρ(N) is not monotone the inverse refuses to choose:
  // tests/physics/inverseAmbiguity.test.ts.
});

describe('dopingForResistivity errors', () => {
  it('states the reachable range for targets beyond it', () => {
    const sample = siliconSampleWithoutDensity('B');
    expect(() => dopingForResistivity(1e7, sample)).toThrow(PhysicsDomainError);
    expect(() => dopingForResistivity(1e7, sample)).toThrow(/reachable range is about .* to .* Ω·cm/);
    expect(() => dopingForResistivity(1e-6, siliconSampleWithoutDensity('P'))).toThrow(/cannot be reached/);
  });
  it('rejects non-positive targets and counter-doping that leaves no room', () => {
    expect(() => dopingForResistivity(0, siliconSampleWithoutDensity('B'))).toThrow(/greater than 0/);
    expect(() => dopingForResistivity(1, siliconSampleWithoutDensity('B', 300, NET_DENSITY_SEARCH.maxTotal))).toThrow(/no room/);
  });
});

describe('dopingForResistivity with astm-f723', () => {
  it('uses the standard’s reverse equation directly', () => {
    const result = dopingForResistivity(1, siliconSampleWithoutDensity('B', 296), 'astm-f723');
    expect(result).toEqual({ density: f723Density('B', 1), iterations: 0 });
  });
  it('refuses counter-doping, other dopants and temperatures as the forward conversion does', () => {
    expect(() => dopingForResistivity(1, siliconSampleWithoutDensity('B', 300, 1e13), 'astm-f723')).toThrow(/uncompensated/);
    expect(() => dopingForResistivity(1, siliconSampleWithoutDensity('Sb'), 'astm-f723')).toThrow(/Allowed: B, P/);
    expect(() => dopingForResistivity(1, siliconSampleWithoutDensity('P', 400), 'astm-f723')).toThrow(/290–305 K/);
  });
});
