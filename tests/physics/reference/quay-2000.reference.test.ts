/**
 * R. Quay, C. Moglestue, V. Palankovski, S. Selberherr, "A temperature
 * dependent model for the saturation velocity in semiconductor materials",
 * Mater. Sci. Semicond. Process. 3, 149 (2000):
 * v_sat(T) = v_sat,300/((1 − A) + A·T/300 K) (form from memory).
 * Parameters read in V. Palankovski, dissertation, TU Wien (2000), Table 3.31
 * "Parameter values for velocity saturation model", from the Quay et al.
 * paper (iue.tuwien.ac.at/phd/palankovski/node48.html), in m/s there:
 * Si 1.0e5 / 0.26 (e), 0.704e5 / 0.63 (h); Ge 0.7e5 / 0.55, 0.63e5 / 0.61;
 * GaAs 0.72e5 / 0.56, 0.9e5 / 0.41.
 */
import { saturationVelocity } from '../../../src/physics/highField';

/** [v_sat,300 in cm/s, A], as read (m/s × 100). */
const READ: Record<string, Record<'electron' | 'hole', [number, number]>> = {
  Si: { electron: [1.0e7, 0.26], hole: [0.704e7, 0.63] },
  Ge: { electron: [0.7e7, 0.55], hole: [0.63e7, 0.61] },
  GaAs: { electron: [0.72e7, 0.56], hole: [0.9e7, 0.41] },
};

function quay(material: string, carrier: 'electron' | 'hole', t: number): number {
  const [v300, a] = READ[material][carrier];
  return v300 / (1 - a + (a * t) / 300);
}

describe('Quay et al. (2000) saturation velocities (parameters read in Palankovski 2000, Table 3.31)', () => {
  it.each(['Si', 'Ge', 'GaAs'])('%s: v_sat(T) is the Quay form with the read parameters, 120–1000 K (exact up to rounding)', (material) => {
    for (const carrier of ['electron', 'hole'] as const) {
      for (const t of [120, 300, 500, 1000]) {
        expect(saturationVelocity(material, carrier, t) / quay(material, carrier, t)).toBeCloseTo(1, 12);
      }
    }
  });

  it('Si electrons at 77 K: 1.24e7 cm/s, inside the measured 1.2–1.4e7 cm/s (Jacoboni et al. 1977; Canali et al. 1975; from memory)', () => {
    const v77 = saturationVelocity('Si', 'electron', 77);
    expect(v77).toBeGreaterThan(1.2e7);
    expect(v77).toBeLessThan(1.4e7);
  });
});
