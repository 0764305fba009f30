/**
 * Model klaassen through the catalog (DRIFT.MOBILITY, DRIFT.RESISTIVITY): the
 * minority-carrier effect a spreadsheet user asks for, the silicon-only gating
 * and the listing of the code. Model: D. B. M. Klaassen, Solid-State Electron.
 * 35, 953 (1992) (from memory).
 */
import { findFunction } from '../../src/catalog';
import { message, value } from './support/call';

describe('DRIFT.MOBILITY with model klaassen', () => {
  // Parameter order: doping, dopant, temperature_K, carrier, model, material, counter_doping.
  it('minority electrons in p+ Si (1e19 B) are faster than majority electrons in n+ Si (1e19 P)', () => {
    // Klaassen (1992) I, minority-carrier effect (from memory: minority electron mobility in p-Si at
    // 1e19–1e20 well above majority). Published model values: minority 211, majority 115.
    const minority = value('DRIFT.MOBILITY', 1e19, 'B', 300, 'minority', 'klaassen');
    const majority = value('DRIFT.MOBILITY', 1e19, 'phosphorus', 300, 'majority', 'klaassen');
    expect(minority / majority).toBeGreaterThan(1.5);
    expect(minority / majority).toBeLessThan(2);
    expect(minority).toBeCloseTo(211, -1);
    // Masetti has one curve per carrier type: its minority value is the majority fit.
    const masettiMinority = value('DRIFT.MOBILITY', 1e19, 'B', 300, 'minority', 'masetti');
    expect(minority / masettiMinority).toBeGreaterThan(1.5);
  });

  it('is accepted case-insensitively and listed in the model argument', () => {
    expect(value('MOBILITY', 1e17, 'phosphorus', 300, 'majority', 'Klaassen')).toBe(
      value('MOBILITY', 1e17, 'phosphorus', 300, 'majority', 'klaassen'),
    );
    const model = findFunction('MOBILITY')!.parameters.find((p) => p.name === 'model')!;
    expect(model.details).toContain('klaassen');
    expect(findFunction('MOBILITY')!.models).toContain('klaassen');
  });

  it('keeps 300 K resistivity close to the default (Masetti) for P: within 0.1 % at 1e14–1e19 cm⁻³', () => {
    for (const n of [1e14, 1e16, 1e18, 1e19]) {
      expect(value('RESISTIVITY', n, 'phosphorus', 300, 'klaassen') / value('RESISTIVITY', n, 'phosphorus', 300, 'masetti')).toBeCloseTo(
        1,
        3,
      );
    }
  });

  it('is silicon only: other materials get an error naming what they support', () => {
    expect(message('MOBILITY', 1e17, 'Si', 300, 'majority', 'klaassen', 'GaAs')).toMatch(/klaassen.*silicon/);
  });
});
