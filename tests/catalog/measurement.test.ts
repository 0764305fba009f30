/**
 * The measurement-analysis and resistor-design entries as a user meets them:
 * identities with other catalog functions, defaults, errors.
 */
import { evaluate, findFunction, type ArgumentInput, type CellOutput } from '../../src/catalog';
import { message, value } from './support/call';

function grid(name: string, ...args: ArgumentInput[]): CellOutput[][] {
  const spec = findFunction(name);
  if (!spec) throw new Error(`no ${name}`);
  return evaluate(spec, args);
}

describe('DRIFT.DOPINGRANGE', () => {
  it('is [DRIFT.DOPING(ρmax), DRIFT.DOPING(ρmin)] with the default model', () => {
    for (const [lo, hi, dopant, t] of [
      [8, 12, 'B', null],
      [1, 3, 'phosphorus', 350],
      [0.005, 0.02, 'Sb', null],
    ] as const) {
      expect(grid('DOPINGRANGE', lo, hi, dopant, t)).toEqual([[value('DOPING', hi, dopant, t), value('DOPING', lo, dopant, t)]]);
    }
  });

  it('refuses an inverted window and says which way round it goes', () => {
    expect(message('DOPINGRANGE', 12, 8, 'B')).toMatch(/resistivity_min 12 Ω·cm is above resistivity_max 8/);
  });
});

describe('DRIFT.RESISTORLENGTH and DRIFT.RESISTORTEMP', () => {
  it('round-trip at the reference temperature (common practice, no source)', () => {
    const lengthUm = value('RESISTORLENGTH', 22000, 250, 3, 1.3);
    expect(value('RESISTORTEMP', 250, lengthUm, 3, 300, 1200, null, null, 1.3) / 22000).toBeCloseTo(1, 12);
    expect(value('RESISTORTEMP', 250, lengthUm, 3, 350, 1200, 350, 4, 1.3) / 22000).toBeCloseTo(1, 12);
  });

  it('agree with DRIFT.RESISTOR when there are no end squares and no TCR', () => {
    expect(value('RESISTORTEMP', 1000, 100, 10, 300, 0)).toBeCloseTo(value('RESISTOR', 1, 100, 10, 10), 9);
  });

  it('refuse a target below the end squares', () => {
    expect(message('RESISTORLENGTH', 100, 100, 5, 1.3)).toMatch(/must exceed Rs·end_squares/);
  });
});

describe('DRIFT.FOURPOINT and DRIFT.FOURPOINTRS', () => {
  it('agree in the thin-layer limit: ρ = Rs·t, and FOURPOINTRS = 4.532·V/I (Smits 1958)', () => {
    expect(value('FOURPOINT', 0.01, 1e-3, 1000, 2) / (value('FOURPOINTRS', 0.01, 1e-3) * 2e-4)).toBeCloseTo(1, 12);
    expect(value('FOURPOINTRS', 1, 1)).toBeCloseTo(4.5324, 4);
  });

  it('reject a diameter without spacing (FOURPOINTRS) or without thickness (FOURPOINT)', () => {
    expect(message('FOURPOINTRS', 1, 1, null, 5e4)).toMatch(/give spacing_um together with diameter_um/);
    expect(message('FOURPOINT', 1, 1, 1000, null, 5e4)).toMatch(/needs the slice thickness/);
  });

  it('broadcast a row of diameters', () => {
    const row = grid('FOURPOINTRS', 0.0221, 0.001, 1000, [[10000, 20000, 100000]])[0] as number[];
    expect(row).toHaveLength(3);
    expect(row[0]).toBeLessThan(row[1]);
    expect(row[1]).toBeLessThan(row[2]);
  });
});

describe('DRIFT.VANDERPAUW, DRIFT.HALLDENSITY, DRIFT.HALLMOBILITY', () => {
  it('VANDERPAUW gives π·R/ln 2 for equal resistances (van der Pauw 1958)', () => {
    expect(value('VANDERPAUW', 10, 10)).toBeCloseTo((10 * Math.PI) / Math.LN2, 12);
  });

  it('HALLDENSITY is negative for a negative Hall coefficient (electrons) and positive otherwise', () => {
    expect(value('HALLDENSITY', -624.15)).toBeLessThan(0);
    expect(value('HALLDENSITY', 624.15)).toBeGreaterThan(0);
    expect(value('HALLDENSITY', -624.15, 1.2) / value('HALLDENSITY', -624.15)).toBeCloseTo(1.2, 14);
    expect(message('HALLDENSITY', 0)).toMatch(/other than 0/);
  });

  it('HALLMOBILITY divides by the Hall factor', () => {
    expect(value('HALLMOBILITY', -624.15, 0.5) / value('HALLMOBILITY', -624.15, 0.5, 1.15)).toBeCloseTo(1.15, 14);
  });
});

describe('DRIFT.RADIALVARIATION', () => {
  it('uses (mean edge − centre)/centre × 100 and takes edge_values whole', () => {
    expect(
      value('RADIALVARIATION', 10, [
        [10.5, 10.3],
        [10.4, 10.6],
      ]),
    ).toBeCloseTo(4.5, 12);
    expect(grid('RADIALVARIATION', [[10], [9]], [[10.5, 10.3, 10.4, 10.6]]).map((r) => r.length)).toEqual([1, 1]);
  });

  it('names a bad edge reading', () => {
    expect(message('RADIALVARIATION', 10, [[10, 'x']])).toMatch(/edge_values must be a number; got "x"/);
  });
});
