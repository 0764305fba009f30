/**
 * DRIFT.DOPING and DRIFT.DOPINGRANGE where one resistivity belongs to several
 * densities (silicon at 77 K: freeze-out; see tests/physics/inverseAmbiguity
 * for the physics side): an error listing them, and the optional doping_min /
 * doping_max arguments, as a user types them and through the engine.
 */
import { evaluate, findFunction, type ArgumentInput, type CellOutput } from '../../src/catalog';
import { dopingSolutions } from '../../src/physics/inverse';
import { createEngine } from '../../src/engine/engine';
import { siliconSampleWithoutDensity } from '../physics/transportSamples';
import { message, value } from './support/call';

function grid(name: string, ...args: ArgumentInput[]): CellOutput[][] {
  return evaluate(findFunction(name)!, args);
}

const rho = value('RESISTIVITY', 1e17, 'phosphorus', 77);
const solutions = dopingSolutions(rho, siliconSampleWithoutDensity('P', 77)).map((s) => s.density);
const threeDigits = (n: number) => n.toExponential(2).replace('e+', 'e');

describe('DRIFT.DOPING with several solutions', () => {
  it('the issue’s case is an error that says so, lists all three and names the arguments to narrow it', () => {
    expect(solutions).toHaveLength(3);
    const text = message('DOPING', rho, 'phosphorus', 77);
    expect(text.startsWith(`#VALUE! 3 densities of P give resistivity ${rho.toPrecision(4)} Ω·cm in Si at 77 K`)).toBe(true);
    expect(text).toContain(`${solutions.map(threeDigits).slice(0, 2).join(', ')} and ${threeDigits(solutions[2])} cm⁻³`);
    expect(text).toContain('Give doping_min and/or doping_max (cm⁻³)');
  });

  it('doping_min / doping_max (arguments 7 and 8) pick each solution; blank (or a doping_min of 0) is no bound', () => {
    expect(value('DOPING', rho, 'phosphorus', 77, null, null, null, null, 1e15)).toBe(solutions[0]);
    expect(value('DOPING', rho, 'phosphorus', 77, null, null, null, 1e16, 3e17)).toBe(solutions[1]);
    expect(value('DOPING', rho, 'phosphorus', 77, null, null, null, 3e17)).toBe(solutions[2]);
    expect(value('DOPING', rho, 'phosphorus', 77, null, null, null, 0, 1e15)).toBe(solutions[0]);
    expect(value('DOPING', rho, 'phosphorus', 77, null, null, null, '', 1e15)).toBe(solutions[0]);
  });

  it('a window with none or several solutions is an error listing them', () => {
    expect(message('DOPING', rho, 'phosphorus', 77, null, null, null, 1e19)).toMatch(
      /^#VALUE! no density of P with doping_min 1\.00e19 cm⁻³ gives resistivity .* the densities that do are .* and .* cm⁻³\. Move or widen doping_min\/doping_max/,
    );
    expect(message('DOPING', rho, 'phosphorus', 77, null, null, null, 1e16, 1e19)).toMatch(
      /^#VALUE! 2 densities of P with doping_min 1\.00e16 and doping_max 1\.00e19 cm⁻³ give/,
    );
    expect(message('DOPING', rho, 'phosphorus', 77, null, null, null, 1e18, 1e16)).toMatch(
      /doping_min 1\.00e18 cm⁻³ is above doping_max 1\.00e16/,
    );
    expect(message('DOPING', rho, 'phosphorus', 77, null, null, null, -1)).toMatch(/doping_min must be ≥ 0 cm⁻³/);
    expect(message('DOPING', rho, 'phosphorus', 77, null, null, null, null, -1)).toMatch(/doping_max must be > 0 cm⁻³/);
  });

  it('where the solution is unique, nothing changes and the window only checks it', () => {
    const unique = value('DOPING', 10, 'B');
    expect(value('DOPING', 10, 'B', null, null, null, null, 1e14, 1e16)).toBe(unique);
    expect(message('DOPING', 10, 'B', null, null, null, null, 1e16)).toMatch(
      /no density of B with doping_min 1\.00e16 .* density that does is/,
    );
  });
});

describe('DRIFT.DOPINGRANGE with several solutions', () => {
  it('is an error listing them, and doping_min / doping_max (arguments 6 and 7, after the model) choose for both ends', () => {
    // 1e17 and 1.1e17 cm⁻³ lie on the stretch where ρ rises with doping at 77 K.
    const rhoMax = value('RESISTIVITY', 1.1e17, 'phosphorus', 77);
    expect(message('DOPINGRANGE', rho, rhoMax, 'phosphorus', 77)).toMatch(
      /^#VALUE! 3 densities of P give resistivity .* doping_min and\/or doping_max/,
    );
    expect(grid('DOPINGRANGE', rho, rhoMax, 'phosphorus', 77, null, 1e16, 3e17)).toEqual([
      [
        value('DOPING', rhoMax, 'phosphorus', 77, null, null, null, 1e16, 3e17),
        value('DOPING', rho, 'phosphorus', 77, null, null, null, 1e16, 3e17),
      ],
    ]);
  });
});

describe('through the engine', () => {
  it('an ambiguous DRIFT.DOPING shows the error with its message; the bounds give a number', () => {
    const engine = createEngine({
      S: [
        [
          rho,
          '=DRIFT.DOPING(A1,"phosphorus",77)',
          '=DRIFT.DOPING(A1,"phosphorus",77,,,,1e16,3e17)',
          '=DRIFT.DOPING(A1,"phosphorus",77,,,,,1e15)',
        ],
      ],
    });
    try {
      const error = engine.getCellValue({ sheet: 0, row: 0, col: 1 }) as { message?: string };
      expect(error.message).toMatch(/^3 densities of P give resistivity/);
      expect(engine.getCellValue({ sheet: 0, row: 0, col: 2 })).toBe(solutions[1]);
      expect(engine.getCellValue({ sheet: 0, row: 0, col: 3 })).toBe(solutions[0]);
    } finally {
      engine.destroy();
    }
  });
});
