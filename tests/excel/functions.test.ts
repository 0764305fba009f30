/**
 * The custom-functions entry (src/excel/functions.ts) with CustomFunctions
 * mocked as Excel's runtime provides it, and without it, as in a plain page.
 */
import { CATALOG } from '../../src/catalog';
import { buildFunctionsMetadata } from '../../src/excel/metadata';
import { ADDIN_ORIGIN } from '../../src/excel/origin';
import { readStatus } from '../../src/excel/status';

type Entry = typeof import('../../src/excel/functions');

function loadEntry(): Entry {
  let entry: Entry | undefined;
  jest.isolateModules(() => {
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- jest.isolateModules needs a synchronous load
    entry = require('../../src/excel/functions') as Entry;
  });
  return entry as Entry;
}

const globals = globalThis as { CustomFunctions?: unknown };

afterEach(() => {
  delete globals.CustomFunctions;
});

describe('functions.ts entry', () => {
  it('associates every id in functions.json with a function, once each', () => {
    const associate = jest.fn();
    globals.CustomFunctions = { associate, Error: class {}, ErrorCode: { invalidValue: '#VALUE!' } };
    const entry = loadEntry();
    const ids = buildFunctionsMetadata(CATALOG, ADDIN_ORIGIN).functions.map((f) => f.id);
    expect(associate).toHaveBeenCalledTimes(ids.length);
    expect(associate.mock.calls.map((c) => c[0])).toEqual(ids);
    for (const call of associate.mock.calls) expect(typeof call[1]).toBe('function');
    expect(entry.registeredIds).toEqual(ids);
    expect(readStatus()?.boundIds).toEqual(ids);
  });

  it('loads without error outside Excel and binds nothing', () => {
    const entry = loadEntry();
    expect(entry.registeredIds).toEqual([]);
    expect(readStatus()?.boundIds).toEqual([]);
  });

  it('binds with only associate present, as office.js leaves CustomFunctions before the runtime script loads', () => {
    const associate = jest.fn();
    globals.CustomFunctions = { associate };
    const entry = loadEntry();
    expect(entry.registeredIds).toEqual(CATALOG.map((s) => s.name));
    expect(entry.currentErrors()).toBeUndefined();
    // The runtime script adds Error later; the bound functions find it then.
    class LateError {
      constructor(
        readonly code: string,
        readonly message?: string,
      ) {}
    }
    (globals.CustomFunctions as Record<string, unknown>).Error = LateError;
    const mobility = associate.mock.calls.find((c) => c[0] === 'MOBILITY')?.[1] as (...a: unknown[]) => unknown[][];
    expect(mobility([[-5]], [['phosphorus']], null, null, null, null, null, {})[0][0]).toBeInstanceOf(LateError);
  });

  it('ignores a CustomFunctions object that is not a runtime', () => {
    globals.CustomFunctions = { associate: 'no' };
    expect(loadEntry().registeredIds).toEqual([]);
  });

  it('survives a runtime that refuses bindings, saying why on the console', () => {
    const error = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    globals.CustomFunctions = {
      associate: () => {
        throw new Error('no custom functions runtime here');
      },
      Error: class {},
    };
    expect(loadEntry().registeredIds).toEqual([]);
    expect(error).toHaveBeenCalledWith(expect.stringContaining('no custom functions runtime here'));
    error.mockRestore();
  });
});
