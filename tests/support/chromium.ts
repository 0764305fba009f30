/**
 * Where the browser tests (and `npm run bench`) find Chromium: the one place
 * that knows. First the DRIFTCELL_CHROMIUM environment variable, then the
 * usual system locations of Chromium and Google Chrome for this platform
 * (Debian's /usr/bin/chromium first on Linux). A browser is never downloaded:
 * with none found, the error lists every place tried and how to name one.
 */
import { statSync } from 'fs';
import os from 'os';
import path from 'path';

/** The environment variable naming the Chromium (or Chrome) executable to use. */
export const CHROMIUM_VARIABLE = 'DRIFTCELL_CHROMIUM';

/** Launch flags every test browser gets: this machine's closed network, no sandbox inside containers. */
export const CHROMIUM_ARGS: string[] = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

/** What the finder looks at; each part can be replaced in tests. */
export interface ChromiumSearch {
  readonly env?: NodeJS.ProcessEnv;
  readonly platform?: NodeJS.Platform;
  readonly homeDir?: string;
  /** Whether a path is an existing file; default: statSync. */
  readonly isFile?: (file: string) => boolean;
}

function isFile(file: string): boolean {
  try {
    return statSync(file).isFile();
  } catch {
    return false;
  }
}

/**
 * The usual locations of Chromium and Google Chrome on a platform, in the order they are tried.
 *
 * @param platform - process.platform
 * @param env - environment (Windows program folders come from it)
 * @param homeDir - the user's home folder (per-user installs on macOS)
 */
export function systemChromiumLocations(
  platform: NodeJS.Platform,
  env: NodeJS.ProcessEnv = process.env,
  homeDir: string = os.homedir(),
): string[] {
  if (platform === 'darwin') {
    const apps = ['Chromium.app/Contents/MacOS/Chromium', 'Google Chrome.app/Contents/MacOS/Google Chrome'];
    return [
      ...apps.map((app) => path.posix.join('/Applications', app)),
      ...apps.map((app) => path.posix.join(homeDir, 'Applications', app)),
    ];
  }
  if (platform === 'win32') {
    const folders = [
      env.PROGRAMFILES ?? 'C:\\Program Files',
      env['PROGRAMFILES(X86)'] ?? 'C:\\Program Files (x86)',
      env.LOCALAPPDATA,
    ].filter((folder): folder is string => folder !== undefined && folder !== '');
    const installs = ['Chromium\\Application\\chrome.exe', 'Google\\Chrome\\Application\\chrome.exe'];
    return installs.flatMap((install) => folders.map((folder) => path.win32.join(folder, install)));
  }
  return [
    '/usr/bin/chromium',
    '/usr/bin/chromium-browser',
    '/usr/bin/google-chrome',
    '/usr/bin/google-chrome-stable',
    '/snap/bin/chromium',
  ];
}

/** No usable browser; the message says what was tried and what to do. */
export class ChromiumNotFound extends Error {
  override readonly name = 'ChromiumNotFound';
}

/**
 * The Chromium executable for the browser tests.
 *
 * @param search - environment, platform and file check (defaults: this process)
 * @returns an absolute path to an existing file
 * @throws ChromiumNotFound when DRIFTCELL_CHROMIUM names no file, or it is unset and no system location holds one
 * @example findChromium() // '/usr/bin/chromium' on Debian with the chromium package
 */
export function findChromium(search: ChromiumSearch = {}): string {
  const env = search.env ?? process.env;
  const platform = search.platform ?? process.platform;
  const exists = search.isFile ?? isFile;
  const named = env[CHROMIUM_VARIABLE];
  if (named !== undefined && named !== '') {
    // Set on purpose: never fall back silently to another browser.
    const absolute = platform === 'win32' ? path.win32.isAbsolute(named) : path.posix.isAbsolute(named);
    if (!absolute)
      throw new ChromiumNotFound(`${CHROMIUM_VARIABLE} must be an absolute path to the Chromium or Chrome executable; it is "${named}"`);
    if (!exists(named))
      throw new ChromiumNotFound(
        `${CHROMIUM_VARIABLE} is set to ${named}, which is not a file; set it to the Chromium or Chrome executable, or unset it to use a system location`,
      );
    return named;
  }
  const tried = systemChromiumLocations(platform, env, search.homeDir ?? os.homedir());
  const found = tried.find((file) => exists(file));
  if (found !== undefined) return found;
  throw new ChromiumNotFound(
    [
      `no Chromium found for the browser tests. Tried ${CHROMIUM_VARIABLE} (not set), then:`,
      ...tried.map((file) => `  ${file}`),
      `Install Chromium or Google Chrome (Debian: sudo apt-get install chromium), or set ${CHROMIUM_VARIABLE} to its executable,`,
      `e.g. ${CHROMIUM_VARIABLE}="${platform === 'darwin' ? '/Applications/Google Chrome.app/Contents/MacOS/Google Chrome' : platform === 'win32' ? 'C:\\Program Files\\Google\\Chrome\\Application\\chrome.exe' : '/opt/chromium/chrome'}".`,
      'The tests never download a browser.',
    ].join('\n'),
  );
}
