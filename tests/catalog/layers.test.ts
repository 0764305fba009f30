/**
 * DRIFT.LAYERSHEETRES, DRIFT.IMPLANTSHEETRES and DRIFT.JUNCTIONDEPTH as a user
 * meets them: defaults, consistency between the three, agreement with the
 * core, and the messages bad input gets.
 */
import { evaluate, findFunction, type ArgumentInput } from '../../src/catalog';
import { SILICON, diffusedLayerSheetResistance, implantedLayerSheetResistance, resolveDopant } from '../../src/physics';
import { message, value } from './support/call';

describe('DRIFT.LAYERSHEETRES', () => {
  it('computes what the core computes, gaussian and 300 K by default, profile codes case-insensitive', () => {
    const core = diffusedLayerSheetResistance({
      profile: 'gaussian',
      surfaceConcentration: 1e19,
      junctionDepthUm: 2,
      background: 1e15,
      dopant: resolveDopant(SILICON, 'B'),
      temperature: 300,
    });
    expect(value('LAYERSHEETRES', 1e19, 2, 1e15, 'B')).toBe(core);
    expect(value('LAYERSHEETRES', 1e19, 2, 1e15, 'B', null, null)).toBe(core);
    expect(value('LAYERSHEETRES', 1e19, 2, 1e15, 'B', 'GAUSSIAN', 300)).toBe(core);
    expect(value('LAYERSHEETRES', 1e19, 2, 1e15, 'B', 'Erfc')).not.toBe(core);
  });

  it('takes the xj that DRIFT.JUNCTIONDEPTH gives, for both profiles', () => {
    for (const profile of ['gaussian', 'erfc']) {
      const xj = value('JUNCTIONDEPTH', 1e20, 0.2, 1e16, profile);
      expect(value('LAYERSHEETRES', 1e20, xj, 1e16, 'phosphorus', profile)).toBeGreaterThan(0);
    }
    expect(value('JUNCTIONDEPTH', 1e19, 0.5, 1e15)).toBeCloseTo(0.5 * Math.sqrt(Math.log(1e4)), 12);
  });

  it('broadcasts a temperature row', () => {
    const grid = evaluate(findFunction('LAYERSHEETRES')!, [1e19, 2, 1e15, 'B', null, [[250, 300, 350, 400]]]);
    expect(grid[0]).toHaveLength(4);
    expect(grid[0][1]).toBe(value('LAYERSHEETRES', 1e19, 2, 1e15, 'B'));
  });
});

describe('DRIFT.IMPLANTSHEETRES', () => {
  it('computes what the core computes at 300 K by default', () => {
    const core = implantedLayerSheetResistance({
      dose: 1e14,
      rangeUm: 0.1,
      straggleUm: 0.04,
      background: 1e15,
      dopant: resolveDopant(SILICON, 'B'),
      temperature: 300,
    });
    expect(value('IMPLANTSHEETRES', 1e14, 0.1, 0.04, 1e15, 'B')).toBe(core);
    expect(value('IMPLANTSHEETRES', 1e14, 0.1, 0.04, 1e15, 'B', 300)).toBe(core);
  });
});

describe('messages for bad layer input', () => {
  it.each([
    [['LAYERSHEETRES', 1e15, 1, 1e15, 'B'], '#VALUE! surface concentration 1.000e+15 cm⁻³ must exceed the background 1.000e+15 cm⁻³'],
    [['LAYERSHEETRES', 1e19, 0, 1e15, 'B'], '#VALUE! junction_depth_um must be ≥ 0.0001 µm and ≤ 10000 µm; got 0'],
    [['LAYERSHEETRES', 1e19, 1, 0, 'B'], '#VALUE! background must be ≥ 1 cm⁻³'],
    [['LAYERSHEETRES', 1e19, 1, 1e15, 'B', 'linear'], '#VALUE! profile "linear" is not known; allowed: gaussian, erfc'],
    [['LAYERSHEETRES', 1e19, 1, 1e15, null], '#VALUE! dopant is required'],
    [['IMPLANTSHEETRES', 1e9, 0.1, 0.1, 1e15, 'B'], "#VALUE! the implant's peak density"],
    [['IMPLANTSHEETRES', 1e13, -1, 0.1, 1e15, 'B'], '#VALUE! range_um must be ≥ 0 µm and ≤ 10000 µm; got -1'],
    [['IMPLANTSHEETRES', 1e13, 0.1, 0, 1e15, 'B'], '#VALUE! straggle_um must be ≥ 0.0001 µm and ≤ 10000 µm; got 0'],
    [['IMPLANTSHEETRES', 0, 0.1, 0.1, 1e15, 'B'], '#VALUE! dose_cm2 must be > 0 cm⁻²; got 0'],
    [['JUNCTIONDEPTH', 1e15, 1, 1e16], '#VALUE! surface concentration'],
    [['JUNCTIONDEPTH', 1e19, -1, 1e16], '#VALUE! characteristic_length_um must be ≥ 0.0001 µm and ≤ 10000 µm; got -1'],
  ] as const)('%j', (call, expected) => {
    const [name, ...args] = call;
    expect(message(name, ...(args as ArgumentInput[]))).toContain(expected);
  });
});
