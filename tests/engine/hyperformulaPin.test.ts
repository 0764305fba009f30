/**
 * The engine reaches into HyperFormula beyond its public index: types from
 * `hyperformula/typings/...` (interpreter values and state, parser AST, the
 * array-size predictor) and, in src/engine/engine.ts, the internal array-size
 * predictor it wraps. None of that is covered by HyperFormula's semantic
 * versioning, so the dependency is pinned to one exact version, and this file
 * fails, saying what moved, when an upgrade changes anything relied on.
 *
 * Upgrading: install the new exact version (`npm install hyperformula@X.Y.Z
 * --save-exact`), run this file and tests/engine, adapt src/engine where a
 * check fails.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { HyperFormula } from 'hyperformula';
import ts from 'typescript';

const ROOT = path.resolve(__dirname, '..', '..');
const SRC = path.join(ROOT, 'src');

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return sourceFiles(full);
    return entry.name.endsWith('.ts') ? [full] : [];
  });
}

interface DeepImport {
  readonly file: string;
  readonly module: string;
  readonly names: readonly string[];
}

/** Every `import … from 'hyperformula/…'` under src/, with the names it takes. */
function deepImports(): DeepImport[] {
  const found: DeepImport[] = [];
  for (const file of sourceFiles(SRC)) {
    const source = ts.createSourceFile(file, readFileSync(file, 'utf8'), ts.ScriptTarget.ES2020, true);
    for (const statement of source.statements) {
      if (!ts.isImportDeclaration(statement) || !ts.isStringLiteral(statement.moduleSpecifier)) continue;
      const module = statement.moduleSpecifier.text;
      if (!module.startsWith('hyperformula/')) continue;
      const bindings = statement.importClause?.namedBindings;
      const names =
        bindings !== undefined && ts.isNamedImports(bindings) ? bindings.elements.map((e) => (e.propertyName ?? e.name).text) : [];
      found.push({ file: path.relative(ROOT, file), module, names });
    }
  }
  return found;
}

/** The names a module's declarations export, as TypeScript resolves them from the installed package. */
function exportedNames(modules: readonly string[]): Map<string, string[] | undefined> {
  const probe = path.join(ROOT, 'tests', 'engine', '__hyperformula_probe__.ts');
  const text = modules.map((m, i) => `import * as m${i} from '${m}';\nexport { m${i} };\n`).join('');
  const options: ts.CompilerOptions = {
    module: ts.ModuleKind.CommonJS,
    moduleResolution: ts.ModuleResolutionKind.Node10,
    target: ts.ScriptTarget.ES2020,
    strict: true,
    skipLibCheck: true,
    noEmit: true,
    types: [],
  };
  const host = ts.createCompilerHost(options);
  const readFile = host.readFile.bind(host);
  host.readFile = (name) => (path.resolve(name) === probe ? text : readFile(name));
  const fileExists = host.fileExists.bind(host);
  host.fileExists = (name) => path.resolve(name) === probe || fileExists(name);
  const program = ts.createProgram([probe], options, host);
  const checker = program.getTypeChecker();
  const result = new Map<string, string[] | undefined>();
  modules.forEach((module) => {
    const resolved = ts.resolveModuleName(module, probe, options, host).resolvedModule;
    const declaration = resolved === undefined ? undefined : program.getSourceFile(resolved.resolvedFileName);
    const symbol = declaration === undefined ? undefined : checker.getSymbolAtLocation(declaration);
    result.set(module, symbol === undefined ? undefined : checker.getExportsOfModule(symbol).map((s) => s.name));
  });
  return result;
}

describe('HyperFormula is pinned because src/engine relies on its internals', () => {
  const manifest = JSON.parse(readFileSync(path.join(ROOT, 'package.json'), 'utf8'));
  const lock = JSON.parse(readFileSync(path.join(ROOT, 'package-lock.json'), 'utf8'));
  const installed = JSON.parse(readFileSync(path.join(ROOT, 'node_modules', 'hyperformula', 'package.json'), 'utf8')).version as string;

  it('package.json names one exact version, and the lock file and node_modules hold that version', () => {
    const wanted = manifest.dependencies.hyperformula as string;
    expect(wanted).toMatch(/^\d+\.\d+\.\d+$/);
    expect(lock.packages[''].dependencies.hyperformula).toBe(wanted);
    expect(lock.packages['node_modules/hyperformula'].version).toBe(wanted);
    expect(installed).toBe(wanted);
  });

  it('every deep import under src/ resolves and still exports each name taken from it', () => {
    const imports = deepImports();
    // The engine does use internals today; an empty list would mean this scan no longer sees them.
    expect(imports.length).toBeGreaterThan(0);
    const exports = exportedNames([...new Set(imports.map((i) => i.module))]);
    const problems: string[] = [];
    for (const { file, module, names } of imports) {
      const available = exports.get(module);
      if (available === undefined) {
        problems.push(`${file}: '${module}' no longer resolves in hyperformula ${installed}`);
        continue;
      }
      for (const name of names)
        if (!available.includes(name)) problems.push(`${file}: '${module}' no longer exports ${name} (hyperformula ${installed})`);
    }
    expect(problems).toEqual([]);
  });

  it("engine.ts's internal hooks exist: the array-size predictor behind _crudOperations and extractTemporaryFormula", () => {
    const engine = HyperFormula.buildEmpty({ licenseKey: 'gpl-v3' });
    try {
      const internals = engine as unknown as {
        _crudOperations?: { operations?: { arraySizePredictor?: { checkArraySize?: unknown } } };
        extractTemporaryFormula?: unknown;
      };
      const predictor = internals._crudOperations?.operations?.arraySizePredictor;
      expect(typeof predictor?.checkArraySize).toBe('function');
      // The wrapper in limitResultSizes replaces the method on the class's prototype.
      expect(Object.prototype.hasOwnProperty.call(Object.getPrototypeOf(predictor), 'checkArraySize')).toBe(true);
      expect(typeof internals.extractTemporaryFormula).toBe('function');
    } finally {
      engine.destroy();
    }
  });
});
