/**
 * Office's custom-function naming rules (Microsoft, "Custom functions naming
 * and localization": start with a letter, at least three characters, id
 * A–Z 0–9 _ . only, name letters _ . only, not a cell reference A1…XFD1048576
 * or R1C1…R1048576C16384, not an Excel 4.0 macro function), enforced on the
 * catalog and by the generator.
 */
import { CATALOG } from '../../src/catalog';
import { elementwise } from '../../src/catalog/types';
import { buildFunctionsMetadata } from '../../src/excel/metadata';
import { looksLikeCellReference, whyInvalidFunctionId } from '../../src/excel/functionNames';

describe('custom-function names', () => {
  it('every catalog name passes every rule', () => {
    for (const spec of CATALOG)
      expect({ name: spec.name, problem: whyInvalidFunctionId(spec.name) }).toEqual({ name: spec.name, problem: null });
  });

  it.each([
    ['NI', /shorter than three/],
    ['NC', /shorter than three/],
    ['_ABC', /start with a letter/],
    ['MU-N', /characters other than/],
    ['RHO2', /digit/],
    ['Resistivity', /characters other than/],
    ['ABC', /cell reference/], // column ABC, no row: not a reference
  ])('%s', (name, reason) => {
    if (name === 'ABC') expect(whyInvalidFunctionId(name)).toBeNull();
    else expect(whyInvalidFunctionId(name)).toMatch(reason);
  });

  it('recognises cell references in both styles and nothing past the sheet edge', () => {
    expect(looksLikeCellReference('A1')).toBe(true);
    expect(looksLikeCellReference('XFD1048576')).toBe(true);
    expect(looksLikeCellReference('XFE1')).toBe(false);
    expect(looksLikeCellReference('A1048577')).toBe(false);
    expect(looksLikeCellReference('R1C1')).toBe(true);
    expect(looksLikeCellReference('R1048576C16384')).toBe(true);
    expect(looksLikeCellReference('R1C16385')).toBe(false);
    expect(whyInvalidFunctionId('TCR.R2C3')).toMatch(/digit/);
  });

  it('refuses Excel 4.0 macro function names', () => {
    expect(whyInvalidFunctionId('ECHO')).toMatch(/macro/);
    expect(whyInvalidFunctionId('RUN')).toMatch(/macro/);
  });

  it('the generator refuses a catalog with a name Office would refuse', () => {
    const short = elementwise({
      name: 'NV',
      summary: 's',
      help: 'h',
      result: { unit: null, description: 'd' },
      parameters: [] as const,
      examples: [],
      models: [],
      compute: () => 1,
    });
    expect(() => buildFunctionsMetadata([short], 'https://localhost:3000')).toThrow(
      /"NV" cannot be an Excel custom function id: it is shorter than three characters/,
    );
  });
});
