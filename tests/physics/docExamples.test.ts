/**
 * Every `@example` in the doc blocks under src/physics and src/library runs
 * against the real module and returns what it states (convention: DEVELOPERS.md,
 * "Adding a function", step 1, and tests/physics/support/docExamples.ts).
 *
 * An example is documentation, not a reference check: its stated value is what
 * the function returns, or a published value where the example cites one,
 * checked only to the digits it prints. Reference checks with their sources
 * live in tests/physics/reference/.
 *
 * Each example is compiled by TypeScript with the exports of its own module,
 * the physics barrel (src/physics/index.ts) and the named fixtures of
 * tests/physics/support/docExampleFixtures.ts in scope (library examples see
 * the library only, `import … from 'driftcell'` meaning src/library), so a
 * wrong name, argument order or type fails by file and line, then run, and
 * each stated result is compared with what its line returned.
 */
import * as fs from 'fs';
import * as path from 'path';
import * as ts from 'typescript';
import { extractDocExamples, mismatches, type DocExample } from './support/docExamples';

const ROOT = path.resolve(__dirname, '../..');
const SCANNED_FOLDERS = ['src/physics', 'src/library'];
const PHYSICS_BARREL = 'src/physics/index.ts';
const FIXTURES = 'tests/physics/support/docExampleFixtures.ts';
const LIBRARY_FOLDER = 'src/library/';
const LIBRARY_PACKAGE = 'driftcell';

/**
 * Files or folders (ending in /) whose examples are listed but not run, each
 * with the reason. Empty: every example runs; an entry here needs a reason a
 * reviewer accepts.
 */
const KNOWN_EXCEPTIONS: readonly { readonly path: string; readonly reason: string }[] = [];

function exceptionFor(file: string): string | undefined {
  return KNOWN_EXCEPTIONS.find((e) => (e.path.endsWith('/') ? file.startsWith(e.path) : file === e.path))?.reason;
}

function sourceFiles(folder: string): string[] {
  return fs.readdirSync(path.join(ROOT, folder), { withFileTypes: true }).flatMap((entry) => {
    const relative = `${folder}/${entry.name}`;
    if (entry.isDirectory()) return sourceFiles(relative);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.d.ts') ? [relative] : [];
  });
}

const EXAMPLES: DocExample[] = SCANNED_FOLDERS.flatMap(sourceFiles)
  .sort()
  .flatMap((file) => extractDocExamples(fs.readFileSync(path.join(ROOT, file), 'utf8'), file));

/** The module path an import in generated code uses: absolute, without extension. */
function modulePath(file: string): string {
  return path.join(ROOT, file).replace(/\.ts$/, '');
}

function valueExports(file: string): string[] {
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- the module path is computed per example file
  return Object.keys(require(modulePath(file))).filter((name) => !name.startsWith('__'));
}

/** Which names an example sees, and from which file: its own module first, then the barrel, then the fixtures. */
function scopeOf(example: DocExample): { file: string; names: string[] }[] {
  const sources = example.file.startsWith(LIBRARY_FOLDER) ? [example.file] : [example.file, PHYSICS_BARREL, FIXTURES];
  const ownImports = new Set(
    example.lines.flatMap(
      (l) =>
        /^import\s*\{([^}]*)\}/
          .exec(l.code)?.[1]
          .split(',')
          .map((n) => n.trim()) ?? [],
    ),
  );
  const taken = new Set<string>();
  return [...new Set(sources)].map((file) => {
    const names = valueExports(file).filter((name) => !taken.has(name) && !ownImports.has(name));
    names.forEach((name) => taken.add(name));
    return { file, names };
  });
}

interface GeneratedExample {
  readonly example: DocExample;
  readonly fileName: string;
  readonly text: string;
  /** Source line of each generated line (0-based index). */
  readonly sourceLines: readonly number[];
}

function generate(example: DocExample, index: number): GeneratedExample {
  const out: string[] = [];
  const sourceLines: number[] = [];
  const emit = (text: string, line: number): void => {
    out.push(text);
    sourceLines.push(line);
  };
  for (const { file, names } of scopeOf(example)) {
    if (names.length > 0) emit(`import { ${names.join(', ')} } from ${JSON.stringify(modulePath(file))};`, example.line);
  }
  emit('export const __results: unknown[] = [];', example.line);
  let resultIndex = 0;
  for (const line of example.lines) {
    const code = line.code.replace(
      new RegExp(`from\\s+['"]${LIBRARY_PACKAGE}['"]`),
      `from ${JSON.stringify(modulePath('src/library/index.ts'))}`,
    );
    emit(line.expected !== undefined ? `__results[${resultIndex++}] = (${code.replace(/;\s*$/, '')});` : code, line.line);
  }
  return { example, fileName: path.join(ROOT, 'tests/physics', `__docExample${index}.ts`), text: out.join('\n'), sourceLines };
}

/** TypeScript's complaints about each generated example, as "file:line: message". */
function typeProblems(generated: readonly GeneratedExample[]): Map<GeneratedExample, string[]> {
  const config = ts.readConfigFile(path.join(ROOT, 'tsconfig.json'), ts.sys.readFile);
  const parsed = ts.parseJsonConfigFileContent(config.config, ts.sys, ROOT);
  const options: ts.CompilerOptions = {
    ...parsed.options,
    noEmit: true,
    declaration: false,
    sourceMap: false,
    rootDir: undefined,
    outDir: undefined,
  };
  const byName = new Map(generated.map((g) => [g.fileName, g]));
  const host = ts.createCompilerHost(options);
  const getSourceFile = host.getSourceFile.bind(host);
  host.getSourceFile = (name, language, ...rest) => {
    const g = byName.get(path.resolve(name));
    return g ? ts.createSourceFile(name, g.text, language) : getSourceFile(name, language, ...rest);
  };
  const fileExists = host.fileExists.bind(host);
  host.fileExists = (name) => byName.has(path.resolve(name)) || fileExists(name);
  const readFile = host.readFile.bind(host);
  host.readFile = (name) => byName.get(path.resolve(name))?.text ?? readFile(name);
  const program = ts.createProgram([...byName.keys()], options, host);
  return new Map(
    generated.map((g) => {
      const sourceFile = program.getSourceFile(g.fileName)!;
      const diagnostics = [...program.getSyntacticDiagnostics(sourceFile), ...program.getSemanticDiagnostics(sourceFile)];
      return [
        g,
        diagnostics.map((d) => {
          const line = d.start === undefined ? g.example.line : g.sourceLines[sourceFile.getLineAndCharacterOfPosition(d.start).line];
          return `${g.example.file}:${line}: ${ts.flattenDiagnosticMessageText(d.messageText, '\n')}`;
        }),
      ];
    }),
  );
}

/** Runs a generated example; the value of each line that states a result, in order. */
function run(g: GeneratedExample): unknown[] {
  const js = ts.transpileModule(g.text, {
    compilerOptions: { module: ts.ModuleKind.CommonJS, target: ts.ScriptTarget.ES2020, esModuleInterop: true },
  }).outputText;
  const moduleExports: { __results?: unknown[] } = {};
  new Function('require', 'exports', js)(require, moduleExports);
  return moduleExports.__results ?? [];
}

const runnable = EXAMPLES.filter((e) => exceptionFor(e.file) === undefined);
const generated = runnable.map(generate);
let problemsByExample: Map<GeneratedExample, string[]> | undefined;
function typeProblemsOf(g: GeneratedExample): string[] {
  problemsByExample ??= typeProblems(generated);
  return problemsByExample.get(g) ?? [];
}

function title(example: DocExample): string {
  const first = example.lines.find((l) => l.code !== '')?.code ?? '';
  return `${example.file}:${example.line} ${first.length > 90 ? `${first.slice(0, 89)}…` : first}`;
}

describe('doc-block examples', () => {
  it('finds the examples of the physics core and the library', () => {
    // A broken scan would make every other check vacuous.
    expect(EXAMPLES.filter((e) => e.file.startsWith('src/physics/')).length).toBeGreaterThan(100);
    expect(EXAMPLES.filter((e) => e.file.startsWith(LIBRARY_FOLDER)).length).toBeGreaterThan(5);
  });

  it('gives fixtures names no module exports, so a fixture never hides the real API', () => {
    const fixtureNames = valueExports(FIXTURES);
    const apiNames = new Set(sourceFiles('src/physics').flatMap(valueExports));
    expect(fixtureNames.filter((name) => apiNames.has(name))).toEqual([]);
  });

  describe.each(generated.map((g) => [title(g.example), g] as const))('%s', (_title, g) => {
    it('states a result it can read, compiles and returns it', () => {
      const { example } = g;
      const unreadable = example.lines.filter((l) => l.claimProblem).map((l) => `${example.file}:${l.line}: ${l.claimProblem}`);
      expect(unreadable).toEqual([]);
      const stated = example.lines.filter((l) => l.expected !== undefined);
      expect(
        stated.length > 0
          ? []
          : [`${example.file}:${example.line}: the example states no result (end a line with // → value or // ≈ value)`],
      ).toEqual([]);
      expect(typeProblemsOf(g)).toEqual([]);
      let results: unknown[];
      try {
        results = run(g);
      } catch (error) {
        throw new Error(`${example.file}:${example.line}: the example threw: ${(error as Error).message}`);
      }
      const wrong = stated.flatMap((l, i) => mismatches(results[i], l.expected!).map((m) => `${example.file}:${l.line}: ${l.code}: ${m}`));
      expect(wrong).toEqual([]);
    });
  });

  const skipped = EXAMPLES.filter((e) => exceptionFor(e.file) !== undefined);
  if (skipped.length > 0) {
    describe.each(skipped.map((e) => [title(e), exceptionFor(e.file)!] as const))('%s', (_title, reason) => {
      it.skip(`not run: ${reason}`, () => undefined);
    });
  }
});
