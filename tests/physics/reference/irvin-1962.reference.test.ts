/**
 * J. C. Irvin, "Resistivity of bulk silicon and of diffused layers in
 * silicon", Bell Syst. Tech. J. 41, 387 (1962): resistivity vs impurity
 * concentration at 300 K (the curves later reproduced in Sze's textbook).
 *
 * The paper was not at hand. The readings below are from memory of those
 * log-log curves; read-off tolerance ±20 % (a chart spanning eight decades,
 * recalled rather than read, plus the curve's own line width).
 */
import { resistivity } from '../../../src/physics/transport';
import { siliconSample } from '../transportSamples';
import { IRVIN_BULK_READINGS, READ_OFF_TOLERANCE } from './data/irvin1962Bulk';

describe('default resistivity at 300 K vs Irvin (1962) curves (readings from memory, ±20 %)', () => {
  it.each(IRVIN_BULK_READINGS)('at %s cm⁻³: n-type (P) ≈ %s Ω·cm, p-type (B) ≈ %s Ω·cm', (density, nType, pType) => {
    expect(Math.abs(resistivity(siliconSample('P', density)) / nType - 1)).toBeLessThan(READ_OFF_TOLERANCE);
    expect(Math.abs(resistivity(siliconSample('B', density)) / pType - 1)).toBeLessThan(READ_OFF_TOLERANCE);
  });

  it('keeps p-type about three times more resistive than n-type at light doping (Irvin 1962; hole/electron mobility ratio)', () => {
    const ratio = resistivity(siliconSample('B', 1e14)) / resistivity(siliconSample('P', 1e14));
    expect(ratio).toBeGreaterThan(2.6);
    expect(ratio).toBeLessThan(3.3);
  });
});
