/**
 * The Excel-facing functions, run against a stand-in runtime: results equal
 * the catalog's evaluate() on the same arguments, failures become runtime
 * Error objects with the mapped code, and results are always matrices.
 */
import { CATALOG, evaluate, findFunction } from '../../src/catalog';
import { tableFunction } from '../../src/catalog/types';
import { isFailure, type CellOutput } from '../../src/catalog/values';
import { makeExcelFunction, registerCatalog, toExcelError, type CustomFunctionsErrors } from '../../src/excel/register';

class FakeError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

function fakeErrors(withEnum = true): CustomFunctionsErrors {
  return {
    Error: FakeError as unknown as CustomFunctionsErrors['Error'],
    ErrorCode: withEnum
      ? {
          invalidValue: '#VALUE!',
          notAvailable: '#N/A',
          divisionByZero: '#DIV/0!',
          invalidNumber: '#NUM!',
          nullReference: '#NULL!',
          invalidName: '#NAME?',
          invalidReference: '#REF!',
        }
      : undefined,
  };
}

function spec(name: string) {
  const found = findFunction(name);
  if (found === undefined) throw new Error(`catalog lacks ${name}`);
  return found;
}

/** Excel's matrix back in catalog terms, for comparing with evaluate(). */
function asCatalog(matrix: unknown[][]): unknown[][] {
  return matrix.map((row) => row.map((v) => (v instanceof FakeError ? { code: v.code, message: v.message } : v)));
}
function expectedFrom(grid: CellOutput[][]): unknown[][] {
  return grid.map((row) =>
    row.map((v) => (isFailure(v) ? { code: v.code, message: v.code === '#VALUE!' || v.code === '#N/A' ? v.message : undefined } : v)),
  );
}

describe('makeExcelFunction', () => {
  const errors = fakeErrors();
  const runtime = () => errors;

  it('returns a 1×1 matrix for single values, equal to evaluate()', () => {
    const fn = makeExcelFunction(runtime, spec('RESISTIVITY'));
    const result = fn([[1e15]], [['B']], null, null, null, null, { address: 'A1' });
    expect(result).toEqual(evaluate(spec('RESISTIVITY'), [1e15, 'B']));
    expect(result).toHaveLength(1);
    expect(typeof result[0][0]).toBe('number');
  });

  it('broadcasts a column against a row as evaluate() does', () => {
    const fn = makeExcelFunction(runtime, spec('RESISTIVITY'));
    const result = fn([[1e15], [1e16], [1e17]], [['phosphorus']], [[250, 300, 350]], null, null, null, {});
    expect(result).toEqual(evaluate(spec('RESISTIVITY'), [[[1e15], [1e16], [1e17]], 'phosphorus', [[250, 300, 350]]]));
    expect(result.map((r) => r.length)).toEqual([3, 3, 3]);
  });

  it('turns a bad element into a runtime Error with the catalog message, leaving the others', () => {
    const fn = makeExcelFunction(runtime, spec('MOBILITY'));
    const args = [[[1e16], [-5]], [['phosphorus']], null, null, null, null, null, {}];
    const result = fn(...args);
    expect(typeof result[0][0]).toBe('number');
    expect(result[1][0]).toBeInstanceOf(FakeError);
    expect(asCatalog(result)).toEqual(expectedFrom(evaluate(spec('MOBILITY'), [[[1e16], [-5]], 'phosphorus'])));
    expect((result[1][0] as FakeError).code).toBe('#VALUE!');
    expect((result[1][0] as FakeError).message).toMatch(/doping/);
  });

  it('passes an upstream #DIV/0! through as #DIV/0! for that element only', () => {
    const fn = makeExcelFunction(runtime, spec('SHEETRES'));
    const result = fn([[1], [{ code: '#DIV/0!' }]], [[10]], {});
    expect(result[0][0]).toBeCloseTo(1000, 9); // 1 Ω·cm over 10 µm: 1000 Ω/sq (definition Rs = ρ/t; common practice, no source)
    expect(result[1][0]).toEqual(new FakeError('#DIV/0!'));
  });

  it('returns an upstream #REF! as #VALUE! with a message, since Excel cannot output #REF!', () => {
    const fn = makeExcelFunction(runtime, spec('SHEETRES'));
    const [[error]] = fn([[{ code: '#REF!' }]], [[10]], {});
    expect(error).toBeInstanceOf(FakeError);
    expect((error as FakeError).code).toBe('#VALUE!');
    expect((error as FakeError).message).toMatch(/^#REF!: resistivity holds #REF!/);
  });

  it('returns the MODELS table as a matrix of text', () => {
    const result = makeExcelFunction(runtime, spec('MODELS'))({});
    expect(result).toEqual(evaluate(spec('MODELS'), []));
    expect(result[0]).toEqual(['code', 'quantity', 'model', 'citation', 'validity']);
  });

  it('returns DRIFT.MODELCODES as one row of text, and a range argument as one Error with the catalog message', () => {
    const fn = makeExcelFunction(runtime, spec('MODELCODES'));
    const row = fn([['resistivity']], [['Si']], [['B']], {});
    expect(row).toEqual(evaluate(spec('MODELCODES'), ['resistivity', 'Si', 'B']));
    expect(row).toHaveLength(1);
    expect(row[0]).toContain('astm-f723');
    // An empty cell some Excel builds pass as 0 reads as blank here (zeroIsBlank): silicon, any dopant.
    expect(fn([['mobility']], [[0]], [[0]], {})).toEqual(evaluate(spec('MODELCODES'), ['mobility']));
    const refused = fn([['resistivity'], ['mobility']], null, null, {});
    expect(refused).toEqual([
      [
        new FakeError(
          '#VALUE!',
          'DRIFT.MODELCODES gives one row whose length depends on its arguments, so quantity must be a single value, not 2×1 values; call it once per value instead',
        ),
      ],
    ]);
  });

  it('guards a table function that throws, returning #VALUE! with the reason', () => {
    const broken = tableFunction({
      name: 'BROKEN',
      summary: '',
      help: '',
      result: { unit: null, description: '' },
      examples: [],
      models: [],
      table: () => {
        throw new RangeError('table source missing');
      },
    });
    const [[error]] = makeExcelFunction(runtime, broken)({});
    expect(error).toEqual(new FakeError('#VALUE!', 'internal error in DRIFT.BROKEN: table source missing'));
  });

  it('uses the cell texts as codes where the runtime has no ErrorCode enum', () => {
    expect(toExcelError(fakeErrors(false), { kind: 'failure', code: '#NUM!', message: 'm' })).toEqual(new FakeError('#NUM!'));
  });
});

describe('registerCatalog', () => {
  it('associates every catalog function under its name, needing only associate', () => {
    const bound = new Map<string, (...a: unknown[]) => unknown>();
    const ids = registerCatalog({ associate: (id, fn) => void bound.set(id, fn) }, CATALOG, () => undefined);
    expect(ids).toEqual(CATALOG.map((s) => s.name));
    expect([...bound.keys()]).toEqual(ids);
    for (const fn of bound.values()) expect(typeof fn).toBe('function');
  });

  it('looks the Error constructor up when a function runs, not when it is bound', () => {
    // eslint-disable-next-line prefer-const -- assigned after binding on purpose: the look-up must happen at call time
    let errors: CustomFunctionsErrors | undefined;
    const bound = new Map<string, (...a: unknown[]) => unknown>();
    registerCatalog({ associate: (id, fn) => void bound.set(id, fn) }, CATALOG, () => errors);
    errors = fakeErrors();
    const [[cell]] = (bound.get('MOBILITY') as (...a: unknown[]) => unknown[][])(
      [[-5]],
      [['phosphorus']],
      null,
      null,
      null,
      null,
      null,
      {},
    );
    expect(cell).toBeInstanceOf(FakeError);
  });

  it('throws (Excel shows #VALUE!) when a result holds an error and no Error constructor exists', () => {
    const fn = makeExcelFunction(() => undefined, spec('MOBILITY'));
    expect(fn([[1e16]], [['phosphorus']], null, null, null, null, null, {})[0][0]).toEqual(expect.any(Number));
    expect(() => fn([[-5]], [['phosphorus']], null, null, null, null, null, {})).toThrow(/CustomFunctions\.Error is not available/);
  });
});
