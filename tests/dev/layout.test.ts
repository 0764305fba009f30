/**
 * Development tooling (`npm start`, its HTTPS server and certificates) lives
 * in dev/, compiled by dev/tsconfig.json into dist/dev. It sits on top of the
 * runtime like a front end: dev/ may import src/, never the other way, so
 * neither the library (package.json `files`: dist/node) nor the add-in
 * (dist/addin, bundled from src/) can carry it.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { START_ENTRY } from '../../dev/start';

const ROOT = path.resolve(__dirname, '..', '..');
const manifest = JSON.parse(readFileSync(path.join(ROOT, 'package.json'), 'utf8'));
const tsconfig = (name: string) => JSON.parse(readFileSync(path.join(ROOT, name), 'utf8'));

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return sourceFiles(full);
    return entry.name.endsWith('.ts') ? [full] : [];
  });
}

describe('development tooling stays out of the runtime', () => {
  it('no file under src/ imports dev/ or the development-certificate package', () => {
    const offenders = sourceFiles(path.join(ROOT, 'src')).filter((file) => {
      const text = readFileSync(file, 'utf8');
      const specifiers = [...text.matchAll(/(?:from\s+|import\s*\(\s*|require\s*\(\s*)['"]([^'"]+)['"]/g)].map((m) => m[1]);
      return specifiers.some(
        (s) =>
          s === 'office-addin-dev-certs' ||
          (s.startsWith('.') && path.resolve(path.dirname(file), s).startsWith(path.join(ROOT, 'dev') + path.sep)),
      );
    });
    expect(offenders.map((f) => path.relative(ROOT, f))).toEqual([]);
  });

  it('the library build compiles src/ only, and the package ships only that build', () => {
    expect(tsconfig('tsconfig.json').include).toEqual(['src/**/*.ts']);
    expect(tsconfig('tsconfig.json').compilerOptions.outDir).toBe('dist/node');
    expect(manifest.files).not.toContain('dev');
    expect(manifest.files.filter((entry: string) => entry.startsWith('dist/'))).toEqual(['dist/node']);
  });

  it('npm start compiles dev/ into dist/dev and runs the entry the sideloading tool is given', () => {
    expect(tsconfig('dev/tsconfig.json').compilerOptions.outDir).toBe('../dist/dev');
    expect(manifest.scripts.start).toBe(`tsc -p dev/tsconfig.json && node ${START_ENTRY.split(path.sep).join('/')}`);
  });
});
