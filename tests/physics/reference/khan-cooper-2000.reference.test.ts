/**
 * I. A. Khan, J. A. Cooper, Jr., "Measurement of high-field electron
 * transport in silicon carbide", IEEE Trans. Electron Devices 47, 269 (2000)
 * (also Mater. Sci. Forum 338–342, 761 (2000)): 4H-SiC electron saturated
 * drift velocity ≈ 2.2e7 cm/s at room temperature, field perpendicular to the
 * c axis (from memory).
 */
import { driftVelocity, saturationVelocity } from '../../../src/physics/highField';
import { resolveMaterial } from '../../../src/physics/materials';
import { resolveDopant } from '../../../src/physics/dopants';

describe('Khan & Cooper (2000) 4H-SiC electron saturation velocity', () => {
  it('v_sat(300 K) = 2.2e7 cm/s (from memory)', () => {
    expect(saturationVelocity('4H-SiC', 'electron', 300)).toBe(2.2e7);
  });

  it('electron drift velocity at 1e6 V/cm in 1e16 cm⁻³ N-doped 4H-SiC is within 1 % of 2.2e7 cm/s', () => {
    const material = resolveMaterial('4H-SiC');
    const sample = { material, temperature: 300, dopant: resolveDopant(material, 'N'), density: 1e16, counterDensity: 0 };
    expect(driftVelocity(1e6, 'electron', sample) / 2.2e7).toBeCloseTo(1, 2);
  });
});
