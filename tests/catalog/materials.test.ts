/**
 * Ge, GaAs and 4H-SiC through the catalog: the material argument, per-material
 * defaults of the model arguments, and clear errors for models or dopants a
 * material has no parameters for.
 */
import { findFunction } from '../../src/catalog';
import { allDopantCodes, MATERIAL_DEFAULT_TEXT, MOBILITY_DEFAULT_TEXT } from '../../src/catalog/common';
import { message, value } from './support/call';

describe('material argument', () => {
  it('lists every material and accepts each code case-insensitively', () => {
    const param = findFunction('RESISTIVITY')!.parameters.find((p) => p.name === 'material')!;
    expect(param.choices!()).toEqual(['Si', 'Ge', 'GaAs', '4H-SiC']);
    expect(value('INTRINSIC', 300, 'gaas')).toBe(value('INTRINSIC', 300, 'GaAs'));
    expect(value('INTRINSIC', 300, '4h-sic')).toBe(value('INTRINSIC', 300, '4H-SiC'));
  });

  it('offers every material’s dopant codes, each once', () => {
    const codes = allDopantCodes();
    for (const code of [
      'B',
      'Al',
      'Ga',
      'In',
      'phosphorus',
      'As',
      'Sb',
      'donor',
      'acceptor',
      'Zn',
      'Be',
      'C',
      'Mg',
      'Si',
      'Te',
      'Se',
      'Sn',
      'nitrogen',
    ])
      expect(codes).toContain(code);
    expect(new Set(codes).size).toBe(codes.length);
    const description = findFunction('RESISTIVITY')!.parameters.find((p) => p.name === 'dopant')!.details;
    expect(description).toContain('GaAs: Zn, Be, C, Mg, Si, Te, Se, Sn');
    expect(description).toContain('4H-SiC: Al, B, nitrogen, phosphorus');
  });

  it('shows blank model arguments as the material’s default', () => {
    const model = findFunction('MOBILITY')!.parameters.find((p) => p.name === 'model')!;
    expect(model.defaultText).toBe(MOBILITY_DEFAULT_TEXT);
    expect(findFunction('RESISTIVITY')!.parameters.find((p) => p.name === 'model')!.defaultText).toBe(MATERIAL_DEFAULT_TEXT);
    expect(model.details).toContain('GaAs: sotoodeh');
  });
});

describe('resistivity of Ge, GaAs and 4H-SiC samples', () => {
  // Order-of-magnitude anchors: ρ = 1/(q·N·μ) with the fits' mobilities (common practice, no source).
  it.each([
    ['Ge', 'Sb', 1e15, 1 / (1.602e-19 * 1e15 * (3900 / (1 + Math.sqrt(1e15 / 1e17)))), 0.05],
    ['GaAs', 'Si', 1e16, 1 / (1.602e-19 * 1e16 * 6460), 0.1],
    ['4H-SiC', 'nitrogen', 1e16, 1 / (1.602e-19 * 1e16 * 865), 0.1],
  ] as const)('%s:%s at %s cm⁻³ and 300 K is close to 1/(qNμ)', (materialCode, dopant, n, expected, tolerance) => {
    const rho = value('RESISTIVITY', n, dopant, 300, null, materialCode);
    expect(Math.abs(rho / expected - 1)).toBeLessThan(tolerance);
  });

  it('shows the deep Al acceptor of 4H-SiC: far more resistive than 1/(qNμ) at 300 K', () => {
    const rho = value('RESISTIVITY', 1e18, 'Al', 300, null, '4H-SiC');
    expect(rho).toBeGreaterThan(5 / (1.602e-19 * 1e18 * 94));
  });

  it('round-trips DOPING ∘ RESISTIVITY in GaAs and gives the default mobility for a blank model', () => {
    const rho = value('RESISTIVITY', 2e17, 'Be', 300, null, 'GaAs');
    expect(value('DOPING', rho, 'Be', 300, null, 'GaAs') / 2e17).toBeCloseTo(1, 6);
    expect(value('MOBILITY', 1e16, 'Te', 300, null, null, 'GaAs')).toBe(value('MOBILITY', 1e16, 'Te', 300, null, 'sotoodeh', 'GaAs'));
  });

  it('evaluates the other material-aware functions for each new host', () => {
    for (const [materialCode, donor] of [
      ['Ge', 'As'],
      ['GaAs', 'Se'],
      ['4H-SiC', 'phosphorus'],
    ] as const) {
      expect(value('BANDGAP', 300, materialCode)).toBeGreaterThan(0.6);
      expect(value('CONDUCTIONDOS', 300, materialCode)).toBeGreaterThan(1e17);
      expect(value('VALENCEDOS', 300, materialCode)).toBeGreaterThan(1e18);
      expect(value('MAJORITY', 1e17, donor, 300, materialCode)).toBeGreaterThan(1e16);
      expect(value('IONIZED', 1e17, donor, 300, materialCode)).toBeGreaterThan(0.3);
      expect(value('DIFFUSIVITY', 1e17, donor, 300, null, null, materialCode)).toBeGreaterThan(1);
    }
  });
});

describe('clear errors for what a material has no parameters for', () => {
  it.each([
    [
      ['MOBILITY', 1e16, 'Zn', 300, null, 'masetti', 'GaAs'],
      "#VALUE! mobility model 'masetti' has parameters for silicon only; gallium arsenide supports: sotoodeh",
    ],
    [
      ['MOBILITY', 1e16, 'B', 300, null, 'sotoodeh'],
      "#VALUE! mobility model 'sotoodeh' has parameters for gallium arsenide only; silicon supports: masetti",
    ],
    [
      ['RESISTIVITY', 1e16, 'Al', 300, 'astm-f723', '4H-SiC'],
      "#VALUE! resistivity model 'astm-f723' has parameters for silicon only; 4H silicon carbide supports: roschke-schwierz",
    ],
    [
      ['DOPING', 1, 'B', 300, 'arora', 'Ge'],
      "#VALUE! resistivity model 'arora' has parameters for silicon only; germanium supports: hilsum",
    ],
    [
      ['INTRINSIC', 300, 'Ge', 'misiakos'],
      "#VALUE! intrinsic density model 'misiakos' has parameters for silicon only; germanium supports: dos",
    ],
    [
      ['RESISTIVITY', 1e16, 'B', 300, null, 'GaAs'],
      "#VALUE! unknown dopant 'B' for gallium arsenide: allowed dopants are Zn, Be, C, Mg, Si, Te, Se, Sn, donor, acceptor",
    ],
    [['RESISTIVITY', 1e16, 'Zn', 300, null, 'Si'], "#VALUE! unknown dopant 'Zn' for silicon"],
    [['MOBILITY', 1e16, 'phosphorus', 300, null, 'drude', 'Ge'], '#VALUE! model "drude" is not known'],
  ] as const)('%j', (call, expected) => {
    const [name, ...args] = call;
    expect(message(name, ...args)).toContain(expected);
  });
});
