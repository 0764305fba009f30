/**
 * The catalog entries as a user meets them: identities between functions
 * that must hold exactly, defaults, and the messages bad input gets.
 */
import { CATALOG, evaluate, findFunction, isFailure, type ArgumentInput, type CellOutput } from '../../src/catalog';
import { ELEMENTARY_CHARGE, MODEL_REGISTRY, thermalVoltage } from '../../src/physics';
import { message, value } from './support/call';



describe('identities between catalog functions (definitions: common practice, no source)', () => {
  const cases: [number, string, number, number][] = [
    [1e15, 'B', 300, 0],
    [1e17, 'phosphorus', 300, 2e16],
    [3e18, 'As', 250, 0],
    [1e16, 'phosphorus', 77, 0],
    [1e14, 'B', 600, 0],
  ];

  it.each(cases)('σ = q(n·μn + p·μp) for %s cm⁻³ %s at %s K (counter %s)', (doping, dopant, t, counter) => {
    const majority = value('MAJORITY', doping, dopant, t, null, counter);
    const minority = value('MINORITY', doping, dopant, t, null, counter);
    const muMajority = value('MOBILITY', doping, dopant, t, 'majority', null, null, counter);
    const muMinority = value('MOBILITY', doping, dopant, t, 'minority', null, null, counter);
    const sigma = value('CONDUCTIVITY', doping, dopant, t, null, null, counter);
    expect(sigma / (ELEMENTARY_CHARGE * (majority * muMajority + minority * muMinority))).toBeCloseTo(1, 12);
    expect(value('RESISTIVITY', doping, dopant, t, null, null, counter) * sigma).toBeCloseTo(1, 12);
  });

  // Generalized Einstein relation D = μ·(kT/q)·F½(η)/F−½(η) (Sze & Ng 2007, ch. 1; from memory): the
  // factor is ≥ 1, ≈ 1 + e^η/2^{3/2} for non-degenerate carriers and grows with degeneracy.
  it.each(cases)('D ≥ μ·kT/q (Einstein), equal within the degeneracy factor, for %s cm⁻³ %s at %s K', (doping, dopant, t, counter) => {
    const degenerate = doping >= 1e18;
    for (const carrier of ['majority', 'minority', 'electron', 'hole']) {
      const mu = value('MOBILITY', doping, dopant, t, carrier, null, null, counter);
      const ratio = value('DIFFUSIVITY', doping, dopant, t, carrier, null, null, counter) / (mu * thermalVoltage(t));
      expect(ratio).toBeGreaterThanOrEqual(1);
      expect(ratio).toBeLessThan(degenerate ? 1.2 : 1.002);
    }
  });

  it('J = σ·E with field_dependence "ohmic", its sign following the field', () => {
    const sigma = value('CONDUCTIVITY', 5e15, 'B');
    expect(value('CURRENTDENSITY', 250, 5e15, 'B', null, null, null, 'ohmic')).toBeCloseTo(250 * sigma, 9);
    expect(value('CURRENTDENSITY', -250, 5e15, 'B', null, null, null, 'ohmic')).toBeCloseTo(-250 * sigma, 9);
    expect(value('CURRENTDENSITY', 0, 5e15, 'B', null, null, null, 'ohmic')).toBe(0);
  });

  it('J (saturating, the default) → σ·E as E → 0 and stays below σ·|E|, its sign following the field', () => {
    const sigma = value('CONDUCTIVITY', 5e15, 'B');
    expect(value('CURRENTDENSITY', 1e-15, 5e15, 'B') / (1e-15 * sigma)).toBeCloseTo(1, 12);
    expect(value('CURRENTDENSITY', 250, 5e15, 'B') / (250 * sigma)).toBeLessThan(1);
    expect(value('CURRENTDENSITY', 250, 5e15, 'B') / (250 * sigma)).toBeGreaterThan(0.99);
    expect(value('CURRENTDENSITY', -250, 5e15, 'B')).toBe(-value('CURRENTDENSITY', 250, 5e15, 'B'));
    expect(value('CURRENTDENSITY', 0, 5e15, 'B')).toBe(0);
  });

  // Fermi–Dirac statistics: n·p = ni²·(F½(ηc)/e^ηc)·(F½(ηv)/e^ηv) ≤ ni², within about e^ηc/2^{3/2}
  // (≈ 2e-4 here) of the Boltzmann law n·p = ni² for this non-degenerate sample.
  it('n·p ≈ ni² (just below) from ELECTRONS and HOLES, and FERMILEVEL ≈ kT·ln(n/ni)', () => {
    for (const t of [250, 300, 450]) {
      const n = value('ELECTRONS', 2e16, 5e15, t);
      const p = value('HOLES', 2e16, 5e15, t);
      const ni = value('INTRINSIC', t);
      expect((n * p) / (ni * ni)).toBeLessThanOrEqual(1);
      expect((n * p) / (ni * ni)).toBeGreaterThan(0.999);
      expect(value('FERMILEVEL', 2e16, 5e15, t)).toBeCloseTo(thermalVoltage(t) * Math.log(n / ni), 4);
    }
  });

  it('DOPING inverts RESISTIVITY to 1e-9, with and without counter-doping', () => {
    for (const [doping, dopant, counter] of [[3e14, 'B', 0], [2e17, 'phosphorus', 5e16], [4e19, 'As', 0]] as const) {
      const rho = value('RESISTIVITY', doping, dopant, 300, null, null, counter);
      expect(value('DOPING', rho, dopant, 300, null, null, counter) / doping).toBeCloseTo(1, 9);
    }
    const rho = value('RESISTIVITY', 1e16, 'phosphorus', 300, 'astm-f723');
    expect(value('DOPING', rho, 'phosphorus', 300, 'astm-f723') / 1e16).toBeCloseTo(1, 1);
  });

  it('SHEETRES and RESISTOR agree: R = Rs·L/W', () => {
    const rs = value('SHEETRES', 2.5, 4);
    expect(value('RESISTOR', 2.5, 300, 15, 4)).toBeCloseTo((rs * 300) / 15, 9);
  });
});

describe('arguments', () => {
  it('takes 300 K, Si, majority and the default models for blank optional arguments', () => {
    expect(value('RESISTIVITY', 1e16, 'B', null, null, null, null)).toBe(value('RESISTIVITY', 1e16, 'B', 300, 'masetti', 'Si', 0));
    expect(value('MOBILITY', 1e16, 'B')).toBe(value('MOBILITY', 1e16, 'B', 300, 'majority', 'masetti', 'Si', 0));
    expect(value('INTRINSIC', 300)).toBe(value('INTRINSIC', 300, 'si', 'MISIAKOS'));
  });

  it('reads dopant words and symbols in any case', () => {
    expect(value('MAJORITY', 1e16, 'acceptor')).toBe(value('HOLES', 0, 1e16));
    expect(value('MAJORITY', 1e16, 'phosphorus')).toBeCloseTo(value('MAJORITY', 1e16, ' Phosphorus '), 0);
    expect(value('MOBILITY', 1e18, 'as')).toBe(value('MOBILITY', 1e18, 'As'));
  });

  it('gives the full grid for a doping column against a temperature row', () => {
    const grid = evaluate(findFunction('RESISTIVITY')!, [[[1e15], [1e16], [1e17]], 'B', [[250, 300, 350, 400]]]);
    expect(grid).toHaveLength(3);
    expect(grid.every((row) => row.length === 4 && row.every((v) => typeof v === 'number'))).toBe(true);
    expect(grid[1][1]).toBe(value('RESISTIVITY', 1e16, 'B', 300));
  });
});

describe('messages for bad input name the argument, the value and what is allowed', () => {
  it.each([
    [['RESISTIVITY', -5, 'B'], '#VALUE! doping must be > 0 cm⁻³ and ≤ 1e+22 cm⁻³; got -5'],
    [['RESISTIVITY', 1e16, 'Xe'], "#VALUE! unknown dopant 'Xe' for silicon"],
    [['RESISTIVITY', 1e16, 'B', 300, 'drude'], '#VALUE! model "drude" is not known; allowed: masetti, arora, caughey-thomas, klaassen, astm-f723'],
    [['RESISTIVITY', 1e16, 'B', 300, null, 'GaN'], '#VALUE! material "GaN" is not known; allowed: Si'],
    [['INTRINSIC', 5], '#VALUE! temperature_K must be ≥ 20 K and ≤ 1000 K; got 5'],
    [['INTRINSIC', null], '#VALUE! temperature_K is required'],
    [['MOBILITY', 1e16, 'B', 300, 'sideways'], '#VALUE! carrier "sideways" is not known; allowed: majority, minority, electron, hole'],
    [['MOBILITY', 1e16, 'B', 300, null, 'astm-f723'], '#VALUE! model "astm-f723" is not known; allowed: masetti, arora, caughey-thomas'],
    [['RESISTIVITY', 1e16, 'Al', 300, 'astm-f723'], '#VALUE! '],
    [['SHEETRES', 1, 0], '#VALUE! thickness_um must be > 0 µm; got 0'],
    [['DOPING', 1e9, 'B'], '#VALUE! '],
    [['RESISTIVITY', true, 'B'], '#VALUE! doping must be a number; got TRUE'],
  ] as const)('%j', (call, expected) => {
    const [name, ...args] = call;
    expect(message(name, ...(args as ArgumentInput[]))).toContain(expected);
  });
});

describe('DRIFT.MODELS', () => {
  const table = evaluate(findFunction('MODELS')!, []);
  it('has a heading row and one row per registered model, none blank', () => {
    expect(table[0]).toEqual(['code', 'quantity', 'model', 'citation', 'validity']);
    expect(table).toHaveLength(MODEL_REGISTRY.length + 1);
    for (const row of table.slice(1)) for (const cell of row) expect(typeof cell === 'string' && cell.length > 0).toBe(true);
  });
  it('every code a function\'s model argument accepts is cited on its help page, its default first', () => {
    for (const spec of CATALOG) {
      const model = spec.parameters.find((p) => p.name === 'model');
      if (model?.choices === undefined) continue;
      for (const code of model.choices()) expect([spec.name, spec.models]).toEqual([spec.name, expect.arrayContaining([code])]);
      expect([spec.name, spec.models[0]]).toEqual([spec.name, model.choices()[0]]);
    }
  });
  it('lists every model any function cites', () => {
    const codes = new Set(table.slice(1).map((row) => row[0]));
    for (const spec of CATALOG) for (const code of spec.models) expect(codes).toContain(code);
  });
});
