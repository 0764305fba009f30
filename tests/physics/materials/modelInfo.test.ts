/**
 * The model registry covers every parameter set of Ge, GaAs and 4H-SiC with a
 * citation and a validity range, and each code once.
 */
import { MODEL_REGISTRY, modelInfo } from '../../../src/physics/models';
import { GALLIUM_ARSENIDE, GERMANIUM, SILICON_CARBIDE_4H } from '../../../src/physics/materials';
import { ionizationModelCode } from '../../../src/physics/materials/modelInfo';
import { MATERIAL_MOBILITY_FITS } from '../../../src/physics/mobility/materialFits';

describe('MODEL_REGISTRY entries of the new materials', () => {
  it('has band gap, densities of states, ionization and mobility entries for each host', () => {
    for (const host of [GERMANIUM, GALLIUM_ARSENIDE, SILICON_CARBIDE_4H]) {
      for (const code of [host.bandgap.code, host.densityOfStates.code, ionizationModelCode(host)]) {
        const info = modelInfo(code);
        expect(info.quantity).toContain(host.code);
        expect(info.citation).toMatch(/from memory/);
        expect(info.validity.length).toBeGreaterThan(10);
      }
    }
    for (const fit of MATERIAL_MOBILITY_FITS) {
      const info = modelInfo(fit.code);
      expect(info.citation).toBe(fit.citation);
      expect(info.notes).toMatch(/no full-ionization correction/);
    }
  });

  it('states the ionization assumption and each dopant’s Mott density', () => {
    const info = modelInfo('altermatt-mott-gaas');
    expect(info.citation).toMatch(/assumption/);
    expect(info.notes).toMatch(/Si donor 5\.80 meV \(N_M ≈ 2\.\de\+16 cm⁻³\)/);
  });

  it('has every code once', () => {
    const codes = MODEL_REGISTRY.map((entry) => entry.code);
    expect(new Set(codes).size).toBe(codes.length);
  });
});
