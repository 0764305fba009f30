/**
 * `npm start` (development tooling, outside the runtime folders: compiled by
 * dev/tsconfig.json into dist/dev, never into dist/node or dist/addin): build
 * the add-in if needed, then
 * - on Windows and macOS (where Excel desktop exists) sideload
 *   manifest/manifest.xml into Excel through office-addin-debugging, which
 *   runs this same program with --serve-only as its dev server. That tool is
 *   not a dependency of the project: it pulls in a native keychain module
 *   that needs a compiler and libsecret to install, which install, demo,
 *   calc, recalc and the tests never need. npx fetches the pinned version
 *   below on the first `npm start` on such a machine;
 * - elsewhere (Linux) serve dist/addin on https://localhost:3000 and print how
 *   to sideload the manifest into Excel on the web.
 */
import { spawn, spawnSync } from 'child_process';
import { existsSync } from 'fs';
import path from 'path';
import { loadDevCertificate, type DevCertificate } from './devCerts';
import { startStaticServer, type RunningServer } from './devServer';
import { ADDIN_ORIGIN, ADDIN_PORT } from '../src/excel/origin';

/** The compiled `npm start` entry (dev/npmStart.ts through dev/tsconfig.json), relative to the project root. */
export const START_ENTRY = path.join('dist', 'dev', 'dev', 'npmStart.js');

export interface ProjectPaths {
  readonly root: string;
  readonly addinDir: string;
  readonly manifest: string;
}

/** Paths relative to the project root (the folder holding package.json). */
export function projectPaths(root: string): ProjectPaths {
  return { root, addinDir: path.join(root, 'dist', 'addin'), manifest: path.join(root, 'manifest', 'manifest.xml') };
}

/** Whether Excel desktop (and so sideloading by office-addin-debugging) can exist on this platform. */
export function hasExcelDesktop(platform: NodeJS.Platform): boolean {
  return platform === 'win32' || platform === 'darwin';
}

/** Files whose absence means the add-in has not been built. */
export function missingBuildOutputs(paths: ProjectPaths): string[] {
  return ['functions.json', 'functions.js', 'taskpane.html', path.join('help', 'index.html')]
    .map((file) => path.join(paths.addinDir, file))
    .filter((file) => !existsSync(file));
}

function npmCommand(): string {
  return process.platform === 'win32' ? 'npm.cmd' : 'npm';
}

function ensureBuilt(paths: ProjectPaths): void {
  const missing = missingBuildOutputs(paths);
  if (missing.length === 0) return;
  console.log(`Building the add-in (missing: ${missing.map((f) => path.relative(paths.root, f)).join(', ')}) …`);
  const result = spawnSync(npmCommand(), ['run', 'build'], { cwd: paths.root, stdio: 'inherit', shell: process.platform === 'win32' });
  if (result.status !== 0) throw new Error('npm run build failed; fix the errors above and run npm start again');
}

/** How to sideload into Excel on the web, as printed on Linux. */
export function sideloadInstructions(paths: ProjectPaths, cert: DevCertificate): string {
  const trust =
    cert.caPath !== undefined
      ? `Your browser must trust the certificate. Either import the CA ${cert.caPath} into the browser's ` +
        `certificate store (as an authority for websites), or run \`npx office-addin-dev-certs install\` ` +
        '(needs sudo; adds it to the system store), or open the page above once and accept the warning.'
      : `The certificate ${cert.certPath} is self-signed: open the page above once and accept the warning, ` +
        "or import it into the browser's certificate store.";
  return [
    '',
    `Driftcell add-in served at ${ADDIN_ORIGIN}/ (from ${path.relative(paths.root, paths.addinDir)}).`,
    `Check it in this machine's browser: ${ADDIN_ORIGIN}/taskpane.html and ${ADDIN_ORIGIN}/help/index.html`,
    trust,
    '',
    'Excel desktop does not run on this system. To use the functions in Excel on the web:',
    '  1. Open a workbook in Excel on the web, in a browser on this machine.',
    '  2. Choose Insert > Add-ins > Upload My Add-in (on some tenants: Home > Add-ins > More Add-ins > Upload My Add-in).',
    `  3. Upload ${paths.manifest}`,
    '  4. Type =DRIFT. in a cell: the functions are listed with their help links.',
    '',
    'Press Ctrl+C to stop the server.',
  ].join('\n');
}

async function desktopCertificate(): Promise<DevCertificate> {
  // For Excel desktop the CA must be in the system store; office-addin-dev-certs installs it (it may prompt).
  const tool = await import('office-addin-dev-certs');
  const options = await tool.getHttpsServerOptions();
  return {
    key: Buffer.from(options.key as Buffer),
    cert: Buffer.from(options.cert as Buffer),
    certPath: '(office-addin-dev-certs)',
    origin: 'office-addin-dev-certs',
  };
}

/**
 * Serves dist/addin on the manifest's origin until the process is stopped.
 *
 * @param paths - project paths
 * @param forDesktop - whether Excel desktop will connect (install the CA) or a browser (no install)
 */
export async function serve(paths: ProjectPaths, forDesktop: boolean): Promise<RunningServer> {
  const cert = forDesktop ? await desktopCertificate() : await loadDevCertificate();
  const server = await startStaticServer(paths.addinDir, { port: ADDIN_PORT, host: '127.0.0.1', tls: cert });
  if (!forDesktop) console.log(sideloadInstructions(paths, cert));
  else console.log(`Driftcell add-in served at ${server.url}/`);
  const stop = () => {
    void server.close().then(() => process.exit(0));
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
  return server;
}

/** The sideloading tool, pinned to the exact version this project was tried with. */
export const SIDELOAD_TOOL = 'office-addin-debugging@7.0.0';

/** The npx arguments that run the pinned sideloading tool (fetched once, then cached by npm). */
export function sideloadToolArgs(...toolArgs: string[]): string[] {
  return ['--yes', SIDELOAD_TOOL, ...toolArgs];
}

function sideloadIntoDesktop(paths: ProjectPaths): Promise<number> {
  const serveCommand = `node "${path.join(paths.root, START_ENTRY)}" --serve-only`;
  const args = sideloadToolArgs(
    'start',
    paths.manifest,
    'desktop',
    '--app',
    'excel',
    '--dev-server',
    serveCommand,
    '--dev-server-port',
    String(ADDIN_PORT),
  );
  console.log(`Sideloading ${path.relative(paths.root, paths.manifest)} into Excel desktop …`);
  return new Promise((resolve) => {
    const child = spawn(process.platform === 'win32' ? 'npx.cmd' : 'npx', args, {
      cwd: paths.root,
      stdio: 'inherit',
      shell: process.platform === 'win32',
    });
    child.on('exit', (code) => resolve(code ?? 1));
    child.on('error', (err) => {
      console.error(`could not run office-addin-debugging: ${err.message}`);
      resolve(1);
    });
  });
}

/**
 * Runs `npm start`.
 *
 * @param argv - arguments after the script name: `--serve-only` skips building and sideloading
 * @param root - project root
 */
export async function main(argv: readonly string[], root: string): Promise<void> {
  const unknown = argv.filter((a) => a !== '--serve-only');
  if (unknown.length > 0) throw new Error(`unknown argument ${unknown.join(' ')}; allowed: --serve-only`);
  const paths = projectPaths(root);
  const serveOnly = argv.includes('--serve-only');
  const desktop = hasExcelDesktop(process.platform);
  if (serveOnly) {
    const missing = missingBuildOutputs(paths);
    if (missing.length > 0) throw new Error(`the add-in is not built (missing ${missing.join(', ')}); run npm run build`);
    await serve(paths, desktop);
    return;
  }
  ensureBuilt(paths);
  if (desktop) {
    process.exitCode = await sideloadIntoDesktop(paths);
    return;
  }
  await serve(paths, false);
}
