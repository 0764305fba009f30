/**
 * J. C. Irvin, "Resistivity of bulk silicon and of diffused layers in
 * silicon", Bell Syst. Tech. J. 41, 387 (1962): average conductivity
 * σ̄ = 1/(Rs·xj) of Gaussian and erfc layers vs surface concentration, for
 * several backgrounds, computed by integrating q·μ(N)·N_net from the surface to
 * the junction with his bulk curve.
 *
 * The paper was not at hand, and its layer charts are not recalled point by
 * point. So, instead of inventing chart readings, this test rebuilds Irvin's
 * calculation: his bulk resistivity curve (the readings from memory of
 * irvin-1962.reference.test.ts, ±20 %) gives μ(N) = 1/(q·N·ρ(N)); his layer
 * conductivity is σ(x) = q·μ(N(x) + NB)·(N(x) − NB) (full ionization, mobility
 * at the total impurity density, from memory of the paper's method); σ̄ comes
 * from a composite Simpson rule here. Our σ̄ (today's mobility and
 * incomplete-ionization models) must agree within ±20 %, the tolerance of the
 * recalled bulk curve; at 300 K the core reproduces the mobility fits, so the
 * remaining difference is between Masetti's fit and Irvin's curve.
 *
 * The trade quotes the same number as ρs·xj = Rs·xj = 1/σ̄ (Ω·µm when xj is in µm).
 */
import { diffusedLayerSheetResistance } from '../../../src/physics/layers/sheetResistance';
import { erfc, erfcinv } from '../../../src/physics/layers/specialFunctions';
import { ELEMENTARY_CHARGE, CM_PER_UM, SILICON, resolveDopant } from '../../../src/physics';
import { IRVIN_BULK_READINGS, READ_OFF_TOLERANCE } from './data/irvin1962Bulk';

/** Irvin's mobility at total density N from his bulk curve, log-log interpolated, constant outside the table. */
function irvinMobility(type: 'n' | 'p', density: number): number {
  const column = type === 'n' ? 1 : 2;
  const mu = (row: readonly number[]) => 1 / (ELEMENTARY_CHARGE * row[0] * row[column]);
  const logN = Math.log10(Math.min(Math.max(density, IRVIN_BULK_READINGS[0][0]), IRVIN_BULK_READINGS[IRVIN_BULK_READINGS.length - 1][0]));
  const i = Math.min(Math.floor(logN - 14), IRVIN_BULK_READINGS.length - 2);
  const [lo, hi] = [IRVIN_BULK_READINGS[i], IRVIN_BULK_READINGS[i + 1]];
  const t = logN - Math.log10(lo[0]);
  return 10 ** (Math.log10(mu(lo)) * (1 - t) + Math.log10(mu(hi)) * t);
}

/** Irvin's σ̄ in S/cm (xj cancels: the profile scales with it). */
function irvinAverageConductivity(profile: 'gaussian' | 'erfc', type: 'n' | 'p', ns: number, nb: number): number {
  const xj = 1;
  const shape = profile === 'gaussian' ? (u: number) => Math.exp(-u * u) : erfc;
  const lengthUm = xj / (profile === 'gaussian' ? Math.sqrt(Math.log(ns / nb)) : erfcinv(nb / ns));
  const sigma = (x: number) => {
    const n = ns * shape(x / lengthUm);
    return ELEMENTARY_CHARGE * irvinMobility(type, n + nb) * Math.max(n - nb, 0);
  };
  const steps = 2000;
  const h = xj / steps;
  let sum = sigma(0) + sigma(xj);
  for (let k = 1; k < steps; k++) sum += (k % 2 === 1 ? 4 : 2) * sigma(k * h);
  return (sum * h) / 3 / xj;
}

function ourAverageConductivity(profile: 'gaussian' | 'erfc', dopant: string, ns: number, nb: number): number {
  const xjUm = 1;
  const rs = diffusedLayerSheetResistance({
    profile,
    surfaceConcentration: ns,
    junctionDepthUm: xjUm,
    background: nb,
    dopant: resolveDopant(SILICON, dopant),
    temperature: 300,
  });
  return 1 / (rs * xjUm * CM_PER_UM);
}

const CASES: ReadonlyArray<['gaussian' | 'erfc', 'P' | 'B', number, number]> = [];
for (const profile of ['gaussian', 'erfc'] as const) {
  for (const dopant of ['P', 'B'] as const) {
    for (const [ns, nb] of [
      [1e17, 1e15],
      [1e18, 1e15],
      [1e19, 1e15],
      [1e20, 1e15],
      [1e19, 1e17],
      [1e20, 1e18],
    ] as const) {
      (CASES as Array<['gaussian' | 'erfc', 'P' | 'B', number, number]>).push([profile, dopant, ns, nb]);
    }
  }
}

describe("average conductivity of diffused layers vs Irvin's method with his bulk curve (from memory, ±20 %)", () => {
  it.each(CASES)('%s %s layer, Ns = %s cm⁻³ over NB = %s cm⁻³', (profile, dopant, ns, nb) => {
    const expected = irvinAverageConductivity(profile, dopant === 'P' ? 'n' : 'p', ns, nb);
    expect(Math.abs(ourAverageConductivity(profile, dopant, ns, nb) / expected - 1)).toBeLessThan(READ_OFF_TOLERANCE);
  });
});
