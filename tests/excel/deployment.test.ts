/**
 * The deployment setting: one base URL for every add-in URL, written into the
 * built manifest and functions.json (src/excel/deployment.ts, webpack.config.js).
 */
import { spawnSync } from 'child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'fs';
import os from 'os';
import path from 'path';
import { ADDIN_URL_VARIABLE, addinBaseUrl, deployedManifest } from '../../src/excel/deployment';
import { ADDIN_ORIGIN } from '../../src/excel/origin';
import { ADDIN_DIR, PROJECT_ROOT, requireAddinBuild } from './support/build';

const SOURCE_MANIFEST = readFileSync(path.join(PROJECT_ROOT, 'manifest', 'manifest.xml'), 'utf8');
const urlsIn = (text: string): string[] => text.match(/https:\/\/[^"'<\s]+/g) ?? [];

describe('addinBaseUrl', () => {
  it('defaults to the development origin', () => {
    expect(addinBaseUrl(undefined)).toBe(ADDIN_ORIGIN);
    expect(addinBaseUrl('  ')).toBe(ADDIN_ORIGIN);
  });

  it('takes an https host or folder and drops a trailing slash', () => {
    expect(addinBaseUrl('https://tools.example.org')).toBe('https://tools.example.org');
    expect(addinBaseUrl('https://tools.example.org/driftcell/')).toBe('https://tools.example.org/driftcell');
  });

  it.each([
    ['tools.example.org', /absolute URL/],
    ['http://tools.example.org', /must use https/],
    ['https://tools.example.org/?v=2', /without query/],
    ['https://user:pw@tools.example.org/', /credentials/],
  ])('refuses %s', (value, message) => {
    expect(() => addinBaseUrl(value)).toThrow(message);
    expect(() => addinBaseUrl(value)).toThrow(new RegExp(ADDIN_URL_VARIABLE));
  });
});

describe('deployedManifest', () => {
  it('moves every development URL under the base URL and changes nothing else', () => {
    const deployed = deployedManifest(SOURCE_MANIFEST, 'https://tools.example.org/driftcell');
    const urls = urlsIn(deployed);
    expect(urls.length).toBeGreaterThan(5);
    for (const url of urls) expect(url.startsWith('https://tools.example.org/driftcell/')).toBe(true);
    expect(deployed.replace(/https:\/\/tools\.example\.org\/driftcell\//g, `${ADDIN_ORIGIN}/`)).toBe(SOURCE_MANIFEST);
  });

  it('refuses a source manifest with a URL outside the development origin', () => {
    expect(() => deployedManifest('<x DefaultValue="https://elsewhere.example/icon.png"/>', 'https://a.example')).toThrow(/outside/);
  });
});

describe('the build with and without the setting', () => {
  it('without it: dist/addin names only localhost', () => {
    requireAddinBuild();
    const manifest = readFileSync(path.join(ADDIN_DIR, 'manifest.xml'), 'utf8');
    expect(manifest).toBe(SOURCE_MANIFEST);
    const functionsJson = readFileSync(path.join(ADDIN_DIR, 'functions.json'), 'utf8');
    for (const url of urlsIn(functionsJson)) expect(url.startsWith(`${ADDIN_ORIGIN}/`)).toBe(true);
  });

  it('ships no source maps in dist/addin', () => {
    requireAddinBuild();
    expect(readdirSync(ADDIN_DIR).filter((f) => f.endsWith('.map'))).toEqual([]);
    for (const bundle of ['functions.js', 'taskpane.js'])
      expect(readFileSync(path.join(ADDIN_DIR, bundle), 'utf8')).not.toContain('sourceMappingURL');
  });

  it('with it: the manifest and functions.json name only that address', () => {
    requireAddinBuild(); // dist/node must be current: webpack generates from it
    const out = mkdtempSync(path.join(os.tmpdir(), 'driftcell-deploy-'));
    try {
      const base = 'https://tools.example.org/driftcell';
      const run = spawnSync(
        process.execPath,
        [require.resolve('webpack-cli/bin/cli.js'), '--mode', 'production', '--env', `addinUrl=${base}`, '--output-path', out],
        {
          cwd: PROJECT_ROOT,
          encoding: 'utf8',
          timeout: 300000,
        },
      );
      expect({ status: run.status, stderr: run.stderr.slice(0, 2000) }).toEqual({ status: 0, stderr: expect.any(String) });
      const manifestUrls = urlsIn(readFileSync(path.join(out, 'manifest.xml'), 'utf8'));
      const functionUrls = urlsIn(readFileSync(path.join(out, 'functions.json'), 'utf8'));
      expect(functionUrls.length).toBeGreaterThan(30);
      for (const url of [...manifestUrls, ...functionUrls]) expect(url.startsWith(`${base}/`)).toBe(true);
      expect(readFileSync(path.join(out, 'manifest.xml'), 'utf8')).not.toContain('localhost');
    } finally {
      rmSync(out, { recursive: true, force: true });
    }
  });
});
