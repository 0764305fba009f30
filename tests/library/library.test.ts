/**
 * The library entry point used the way a user uses it: a temporary project
 * with the package installed as `npm install <path>` does for a folder (a
 * symbolic link node_modules/driftcell → this checkout), resolved by Node
 * through package.json's "exports" map. README's example block is run there
 * and its printed lines compared with the comments beside them; a TypeScript
 * file importing 'driftcell' must compile against the shipped .d.ts (and a
 * wrongly typed call must not). Needs the tsc build (dist/node), which
 * `npm test` runs first (@needs-build: `npm run test:unit` leaves it out).
 *
 * The numbers are the catalog's own (its physics is tested in tests/physics);
 * here they only show that the entry point passes options through.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, mkdirSync, readFileSync, rmSync, symlinkSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { findFunction, evaluate } from '../../src/catalog';

const ROOT = path.resolve(__dirname, '../..');
const TSC = path.join(ROOT, 'node_modules', 'typescript', 'bin', 'tsc');
const pkg = JSON.parse(readFileSync(path.join(ROOT, 'package.json'), 'utf8'));

/** README's example block for the library, marked by its comment. */
function readmeExample(): string {
  const readme = readFileSync(path.join(ROOT, 'README.md'), 'utf8');
  const match = /<!-- example: library[^>]*-->\s*```js\n([\s\S]*?)```/.exec(readme);
  if (match === null) throw new Error('README has no library example block');
  return match[1];
}

describe('the package as a library', () => {
  let project: string;
  beforeAll(() => {
    if (!existsSync(path.join(ROOT, pkg.exports['.'].default))) throw new Error('dist/node is not built: run npx tsc -p tsconfig.json');
    project = mkdtempSync(path.join(tmpdir(), 'driftcell-user-'));
    writeFileSync(path.join(project, 'package.json'), JSON.stringify({ name: 'user-project', private: true }));
    mkdirSync(path.join(project, 'node_modules'));
    symlinkSync(ROOT, path.join(project, 'node_modules', 'driftcell'), 'dir');
  });
  afterAll(() => rmSync(project, { recursive: true, force: true }));

  it('package.json points main, types and exports at the built entry, and stays unpublishable', () => {
    expect(pkg.private).toBe(true);
    expect(pkg.main).toBe('dist/node/library/index.js');
    expect(pkg.types).toBe('dist/node/library/index.d.ts');
    expect(pkg.exports['.']).toEqual({ types: './dist/node/library/index.d.ts', default: './dist/node/library/index.js' });
    expect(existsSync(path.join(ROOT, pkg.types))).toBe(true);
  });

  it('README’s example prints what its comments say, run from a project that installed the package', () => {
    const example = readmeExample();
    const output = execFileSync(process.execPath, ['-e', example], { cwd: project, encoding: 'utf8' }).trim().split('\n');
    const expected = [...example.matchAll(/\/\/ (\S.*)$/gm)].map((m) => m[1]).filter((line) => /^[#\d]/.test(line));
    expect(output).toEqual(expected);
  });

  it('resolves only through "exports": deep paths are not part of the API', () => {
    const deep = spawnSync(process.execPath, ['-e', "require('driftcell/dist/node/physics')"], { cwd: project, encoding: 'utf8' });
    expect(deep.status).not.toBe(0);
    expect(deep.stderr).toMatch(/ERR_PACKAGE_PATH_NOT_EXPORTED/);
  });

  it('returns the catalog’s numbers and throws DriftcellError where a cell would show an error', () => {
    const script = `
      const d = require('driftcell');
      const out = {
        rho: d.resistivity({ doping: 1e16, dopant: 'phosphorus', temperature: 350, model: 'arora' }),
        mobility: d.mobility({ doping: 1e16, dopant: 'B', carrier: 'electron' }),
        at: d.resistivityAtTemperature({ resistivity: 5, dopant: 'phosphorus', measuredTemperature: 296.15, targetTemperature: 350 }),
      };
      for (const bad of [() => d.doping({ resistivity: -1, dopant: 'B' }), () => d.resistivity({ doping: 1e15, dopant: 'B', temperature: '300' }),
                         () => d.doping({ resistivity: 0.4, dopant: 'phosphorus', temperature: 77 })]) {
        try { bad(); out.bad = 'no error'; } catch (e) { (out.errors ??= []).push([e instanceof d.DriftcellError, e.name, e.code, e.functionName, e.message]); }
      }
      console.log(JSON.stringify(out));`;
    const out = JSON.parse(execFileSync(process.execPath, ['-e', script], { cwd: project, encoding: 'utf8' }));
    const cell = (name: string, ...args: (number | string | null)[]) => evaluate(findFunction(name)!, args)[0][0];
    expect(out.rho).toBe(cell('RESISTIVITY', 1e16, 'phosphorus', 350, 'arora'));
    expect(out.mobility).toBe(cell('MOBILITY', 1e16, 'B', null, 'electron'));
    expect(out.at).toBe(cell('RESISTIVITYAT', 5, 'phosphorus', 296.15, 350));
    expect(out.bad).toBeUndefined();
    const [negative, typed, ambiguous] = out.errors;
    const cellError = cell('DOPING', -1, 'B') as { code: string };
    expect(negative.slice(0, 4)).toEqual([true, 'DriftcellError', cellError.code, 'DOPING']);
    expect(negative[4]).toMatch(/^doping: resistivity/);
    expect(typed).toEqual([true, 'DriftcellError', '#VALUE!', 'RESISTIVITY', 'option temperature must be a number (K); got string "300".']);
    // The catalog's argument names become the options the user typed.
    expect(ambiguous[4]).toMatch(/^doping: 3 densities of P .* Give dopingMin and\/or dopingMax/);
  });

  it('the .d.ts types compile for a TypeScript user, and a wrongly typed option does not', () => {
    const config = {
      compilerOptions: { strict: true, noEmit: true, module: 'node16', moduleResolution: 'node16', target: 'ES2020', types: [] },
    };
    writeFileSync(path.join(project, 'tsconfig.json'), JSON.stringify({ ...config, files: ['good.ts'] }));
    writeFileSync(
      path.join(project, 'good.ts'),
      `import { resistivity, doping, resistivityAtTemperature, DriftcellError, type SampleOptions } from 'driftcell';
       const sample: SampleOptions = { dopant: 'B', temperature: 296.15 };
       const rho: number = resistivity({ doping: 1e15, ...sample });
       const n: number = doping({ resistivity: rho, ...sample, dopingMin: 1e14 });
       const at: number = resistivityAtTemperature({ resistivity: 10.2, dopant: 'B', measuredTemperature: 298.15 });
       const e: DriftcellError = new DriftcellError('m', 'RESISTIVITY', '#VALUE!');
       export const all: [number, number, number, string] = [rho, n, at, e.code];\n`,
    );
    const good = spawnSync(process.execPath, [TSC, '-p', 'tsconfig.json'], { cwd: project, encoding: 'utf8' });
    expect(good.stdout + good.stderr).toBe('');
    expect(good.status).toBe(0);

    writeFileSync(path.join(project, 'tsconfig.json'), JSON.stringify({ ...config, files: ['bad.ts'] }));
    writeFileSync(
      path.join(project, 'bad.ts'),
      `import { resistivity } from 'driftcell';\nexport const x: number = resistivity({ doping: '1e15', dopant: 'B' });\n`,
    );
    const bad = spawnSync(process.execPath, [TSC, '-p', 'tsconfig.json'], { cwd: project, encoding: 'utf8' });
    expect(bad.status).not.toBe(0);
    expect(bad.stdout).toMatch(/bad\.ts.*Type 'string' is not assignable to type 'number'/);
  });
});
