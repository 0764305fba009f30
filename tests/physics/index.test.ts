import * as physics from '../../src/physics';
import type { Carrier, CarrierRole, Dopant, DopantDensity, DopantKind, Equilibrium, Material, ModelInfo, Sample } from '../../src/physics';

// src/physics/index.ts is the core's public API: the catalog reaches the physics through it only, so it must
// export every function, table and type the catalog uses, the sample helpers sampleDopants and carrierFor included.
describe('src/physics/index.ts', () => {
  it('exports every function and table the catalog uses', () => {
    const functions = [
      'thermalVoltage',
      'findRoot',
      'resolveMaterial',
      'bandgap',
      'conductionBandDensity',
      'valenceBandDensity',
      'intrinsicDensity',
      'dopantCodes',
      'resolveDopant',
      'genericDopant',
      'solveEquilibrium',
      'ionizedFraction',
      'sampleDopants',
      'carrierFor',
      'fitMobility',
      'mobility',
      'diffusivity',
      'conductivity',
      'resistivity',
      'currentDensity',
      'dopingForResistivity',
      'f723Resistivity',
      'f723Density',
      'modelInfo',
      'sheetResistance',
      'resistorValue',
      'PhysicsDomainError',
    ] as const;
    for (const name of functions) expect(typeof physics[name]).toBe('function');
    for (const name of ['ELEMENTARY_CHARGE', 'BOLTZMANN', 'PLANCK', 'ELECTRON_MASS'] as const) {
      expect(typeof physics[name]).toBe('number');
    }
    for (const name of [
      'MATERIAL_CODES',
      'INTRINSIC_MODEL_CODES',
      'MOBILITY_MODEL_CODES',
      'RESISTIVITY_MODEL_CODES',
      'MODEL_REGISTRY',
    ] as const) {
      expect(Array.isArray(physics[name])).toBe(true);
    }
    expect(physics.SILICON.code).toBe('Si');
  });

  it('exports the public types (checked by the compiler)', () => {
    const material: Material = physics.SILICON;
    const dopant: Dopant = physics.resolveDopant(material, 'B');
    const kind: DopantKind = dopant.kind;
    const sample: Sample = { material, temperature: 300, dopant, density: 1e16, counterDensity: 0 };
    const dopants: DopantDensity[] = physics.sampleDopants(sample);
    const eq: Equilibrium = physics.solveEquilibrium(material, 300, dopants);
    const role: CarrierRole = 'majority';
    const carrier: Carrier = physics.carrierFor(dopant, role);
    const info: ModelInfo = physics.modelInfo('masetti');
    expect([kind, carrier, info.code, eq.holes > eq.electrons]).toEqual(['acceptor', 'hole', 'masetti', true]);
  });
});
