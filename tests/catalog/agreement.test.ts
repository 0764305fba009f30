/**
 * Everything generated from the catalog agrees with it: Excel's
 * functions.json, the engine's registration, the help pages and README's
 * tables. A fact kept in two places would show up here as a failure.
 */
import { existsSync, readFileSync } from 'fs';
import path from 'path';
import { HyperFormula } from 'hyperformula';
import { CATALOG } from '../../src/catalog';
import { helpFileName } from '../../src/catalog/docs/helpPage';
import { readmeSections, updateReadmeText } from '../../src/catalog/docs/readme';
import { qualifiedName } from '../../src/catalog/docs/signature';
import { registerDriftFunctions } from '../../src/engine/plugin';
import { ADDIN_DIR, PROJECT_ROOT, requireAddinBuild } from '../excel/support/build';

describe('README.md', () => {
  it('carries the generated function, code and model tables unchanged (run `npm run docs` after a catalog change)', () => {
    const readme = readFileSync(path.join(PROJECT_ROOT, 'README.md'), 'utf8');
    expect(updateReadmeText(readme, readmeSections(CATALOG))).toBe(readme);
  });

  it('lists every catalog function by its qualified name', () => {
    const readme = readFileSync(path.join(PROJECT_ROOT, 'README.md'), 'utf8');
    for (const spec of CATALOG) expect(readme).toContain(`\`${qualifiedName(spec)}(`);
  });
});

describe('the headless engine', () => {
  it('registers exactly the catalog functions', () => {
    registerDriftFunctions();
    const registered = HyperFormula.getRegisteredFunctionNames('enGB').filter((name) => name.startsWith('DRIFT.'));
    expect([...registered].sort()).toEqual(CATALOG.map(qualifiedName).sort());
  });
});

describe('the built add-in', () => {
  beforeAll(requireAddinBuild);

  it('declares exactly the catalog functions, with the same parameters in the same order', () => {
    const metadata = JSON.parse(readFileSync(path.join(ADDIN_DIR, 'functions.json'), 'utf8')) as {
      functions: { id: string; name: string; parameters: { name: string; optional?: boolean }[] }[];
    };
    expect(metadata.functions.map((f) => f.id)).toEqual(CATALOG.map((spec) => spec.name));
    for (const spec of CATALOG) {
      const declared = metadata.functions.find((f) => f.id === spec.name)!;
      expect(declared.parameters.map((p) => [p.name, Boolean(p.optional)])).toEqual(spec.parameters.map((p) => [p.name, p.optional]));
    }
  });

  it('has a help page for every function', () => {
    for (const spec of CATALOG) {
      const page = path.join(ADDIN_DIR, 'help', helpFileName(spec.name));
      expect(existsSync(page)).toBe(true);
      expect(readFileSync(page, 'utf8')).toContain(qualifiedName(spec));
    }
  });
});
