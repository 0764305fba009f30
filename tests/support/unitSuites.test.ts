/** The fast unit run's selection (tests/support/unitSuites.js, used by jest.unit.config.js). */
import path from 'node:path';

interface Suite {
  readonly file: string;
  readonly relative: string;
  readonly excludedBecause: string | undefined;
}
// eslint-disable-next-line @typescript-eslint/no-require-imports -- unitSuites.js is the CommonJS module jest.unit.config.js loads
const { classifySuites, needsBeyondUnit } = require('./unitSuites') as {
  classifySuites(): Suite[];
  needsBeyondUnit(file: string, text?: string): string | undefined;
};
// eslint-disable-next-line @typescript-eslint/no-require-imports -- the jest config is CommonJS
const config = require('../../jest.unit.config.js') as { testPathIgnorePatterns: string[] };

const ROOT = path.resolve(__dirname, '..', '..');
const suite = (relative: string) => path.join(ROOT, relative);

describe('npm run test:unit', () => {
  const suites = classifySuites();
  const excluded = (relative: string) => suites.find((s) => s.relative === relative)?.excludedBecause;

  it('leaves out every browser suite and every interop suite', () => {
    const browserOrInterop = suites.filter((s) => s.relative.endsWith('.browser.test.ts') || s.relative.startsWith('tests/interop/'));
    expect(browserOrInterop.length).toBeGreaterThan(0);
    for (const s of browserOrInterop) expect(s.excludedBecause).toBeDefined();
  });

  it('leaves out suites that need dist/addin, dist/node or the compiled CLI', () => {
    expect(excluded('tests/excel/metadata.test.ts')).toBe('uses a helper that needs the build or a browser');
    expect(excluded('tests/cli/cli.test.ts')).toBe('uses a helper that needs the build or a browser');
    expect(excluded('tests/hardening/sheetBounds.test.ts')).toBe('reads a build output by path');
    expect(excluded('tests/library/library.test.ts')).toBe('tagged @needs-build');
  });

  it('keeps suites that need only ts-jest, including ones that merely mention a build in comments', () => {
    for (const relative of [
      'tests/physics/solve.test.ts',
      'tests/engine/plugin.test.ts',
      'tests/dev/devServer.test.ts',
      'tests/support/chromium.test.ts',
    ]) {
      expect([relative, excluded(relative)]).toEqual([relative, undefined]);
    }
    const commentOnly =
      "/** Checks what dist/addin holds (requireAddinBuild elsewhere). */\n// join('dist', 'node')\nit('adds', () => expect(1 + 1).toBe(2));\n";
    expect(needsBeyondUnit(suite('tests/physics/example.test.ts'), commentOnly)).toBeUndefined();
    expect(needsBeyondUnit(suite('tests/physics/example.test.ts'), "const cli = join(ROOT, 'dist', 'node', 'cli', 'main.js');")).toBe(
      'reads a build output by path',
    );
    expect(needsBeyondUnit(suite('tests/physics/example.test.ts'), "const SOFFICE = '/usr/bin/soffice';")).toBe(
      'runs LibreOffice or Python',
    );
  });

  it('the jest config ignores exactly the excluded suites, and most suites run', () => {
    const ignored = suites.filter((s) => config.testPathIgnorePatterns.some((p) => new RegExp(p).test(s.file)));
    expect(ignored.map((s) => s.relative)).toEqual(suites.filter((s) => s.excludedBecause !== undefined).map((s) => s.relative));
    expect(suites.filter((s) => s.excludedBecause === undefined).length).toBeGreaterThan(suites.length / 2);
  });
});
