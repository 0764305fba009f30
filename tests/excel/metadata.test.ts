/**
 * functions.json against the catalog: every function present once, argument
 * names, order and optionality exactly as the catalog has them, the options
 * chosen in src/excel/metadata.ts, and help pages present in the build.
 */
import { existsSync, readFileSync } from 'fs';
import path from 'path';
import { CATALOG } from '../../src/catalog';
import type { ParameterSpec } from '../../src/catalog/types';
import { buildFunctionsMetadata, helpUrl, parameterDescription } from '../../src/excel/metadata';
import { ADDIN_ORIGIN } from '../../src/excel/origin';
import { ADDIN_DIR, requireAddinBuild } from './support/build';

const metadata = buildFunctionsMetadata(CATALOG, ADDIN_ORIGIN);

describe('buildFunctionsMetadata', () => {
  it('lists every catalog function once, in catalog order, with id = name', () => {
    expect(metadata.functions.map((f) => f.id)).toEqual(CATALOG.map((s) => s.name));
    expect(metadata.functions.map((f) => f.name)).toEqual(CATALOG.map((s) => s.name));
    expect(new Set(metadata.functions.map((f) => f.id)).size).toBe(CATALOG.length);
  });

  it('uses ids Excel accepts (letters, digits, periods)', () => {
    for (const f of metadata.functions) expect(f.id).toMatch(/^[A-Za-z0-9.]+$/);
  });

  it('copies parameter names, order and optionality exactly from the catalog', () => {
    for (const spec of CATALOG) {
      const f = metadata.functions.find((m) => m.id === spec.name);
      const params = spec.parameters as readonly ParameterSpec[];
      expect(f?.parameters.map((p) => p.name)).toEqual(params.map((p) => p.name));
      expect(f?.parameters.map((p) => p.optional)).toEqual(params.map((p) => p.optional));
    }
  });

  it('declares every parameter and result as any/matrix so the catalog sees raw values and ranges', () => {
    for (const f of metadata.functions) {
      expect(f.result).toEqual({ type: 'any', dimensionality: 'matrix' });
      for (const p of f.parameters) {
        expect(p.type).toBe('any');
        expect(p.dimensionality).toBe('matrix');
      }
    }
  });

  it('lets upstream errors arrive as values (allowErrorForDataTypeAny)', () => {
    expect(metadata.allowErrorForDataTypeAny).toBe(true);
  });

  it('describes functions by their summary and links each to its help page', () => {
    for (const spec of CATALOG) {
      const f = metadata.functions.find((m) => m.id === spec.name);
      expect(f?.description).toBe(spec.summary);
      expect(f?.helpUrl).toBe(`https://localhost:3000/help/${spec.name.toLowerCase()}.html`);
    }
  });

  it('puts the unit and the default into each argument description', () => {
    for (const spec of CATALOG) {
      for (const p of spec.parameters as readonly ParameterSpec[]) {
        const text = parameterDescription(p);
        expect(text.startsWith(p.description.trim())).toBe(true);
        // The unit once: in the sentence, or appended when the sentence does not name it.
        if (p.unit !== null) expect(text.split(p.unit).length - 1).toBeGreaterThanOrEqual(1);
        if (p.unit !== null && p.description.includes(p.unit)) expect(text).not.toContain(`Unit: ${p.unit}.`);
        if (p.optional && p.defaultText !== undefined) expect(text).toContain(`Default: ${p.defaultText}.`);
      }
    }
  });

  it('keeps the essential of every argument tooltip within 120 characters (Excel cuts longer ones)', () => {
    for (const spec of CATALOG)
      for (const p of spec.parameters as readonly ParameterSpec[])
        expect({ fn: spec.name, p: p.name, length: p.description.length <= 120 || p.description.length }).toEqual({
          fn: spec.name,
          p: p.name,
          length: true,
        });
  });

  it('rejects a base URL that is not absolute, and duplicate names', () => {
    expect(() => buildFunctionsMetadata(CATALOG, 'localhost:3000/x')).toThrow(/absolute URL|https/);
    expect(() => buildFunctionsMetadata(CATALOG, 'not a url')).toThrow(/absolute URL/);
    expect(() => buildFunctionsMetadata([CATALOG[0], CATALOG[0]], ADDIN_ORIGIN)).toThrow(/twice/);
    expect(helpUrl('https://example.test/addin/', 'INTRINSIC')).toBe('https://example.test/addin/help/intrinsic.html');
  });
});

describe('DRIFT.MODELCODES in functions.json', () => {
  const entry = metadata.functions.find((f) => f.id === 'MODELCODES');

  it('is declared like every other function: a matrix result, so Excel spills its row, and matrix arguments', () => {
    // A matrix result is what lets a custom function return a 2-D array that spills (Office, "Custom functions metadata").
    expect(entry).toMatchObject({
      id: 'MODELCODES',
      name: 'MODELCODES',
      result: { type: 'any', dimensionality: 'matrix' },
      helpUrl: 'https://localhost:3000/help/modelcodes.html',
    });
    expect(entry?.parameters.map((p) => [p.name, p.optional, p.dimensionality])).toEqual([
      ['quantity', false, 'matrix'],
      ['material', true, 'matrix'],
      ['dopant', true, 'matrix'],
    ]);
  });

  it('tells in the tooltips which quantities there are and what a blank material and dopant mean', () => {
    const [quantity, material, dopant] = entry!.parameters.map((p) => p.description);
    expect(quantity).toMatch(/resistivity, mobility, intrinsic, bandgap-narrowing/);
    expect(material).toMatch(/blank means Si/);
    expect(dopant).toMatch(/blank means any/);
    expect(dopant).toMatch(/Default: any dopant\.$/);
  });
});

describe('the built functions.json and help pages', () => {
  beforeAll(requireAddinBuild);

  it('dist/addin/functions.json is what the catalog gives now (the build is not stale)', () => {
    const built = JSON.parse(readFileSync(path.join(ADDIN_DIR, 'functions.json'), 'utf8'));
    expect(built).toEqual(JSON.parse(JSON.stringify(metadata)));
  });

  it('has a help page at every helpUrl, and the index', () => {
    expect(existsSync(path.join(ADDIN_DIR, 'help', 'index.html'))).toBe(true);
    for (const f of metadata.functions) {
      const relative = new URL(f.helpUrl).pathname;
      const file = path.join(ADDIN_DIR, ...relative.split('/').filter(Boolean));
      expect(existsSync(file)).toBe(true);
      expect(readFileSync(file, 'utf8')).toContain(`<h1>DRIFT.${f.name}</h1>`);
    }
  });
});
