/** Finding the browser for the browser tests: the variable first, then the platform's usual places, never a download. */
import { mkdtempSync, rmSync, writeFileSync } from 'fs';
import os from 'os';
import path from 'path';
import { CHROMIUM_ARGS, CHROMIUM_VARIABLE, ChromiumNotFound, findChromium, systemChromiumLocations } from './chromium';

const only =
  (...files: string[]) =>
  (file: string) =>
    files.includes(file);

describe('findChromium', () => {
  it('takes DRIFTCELL_CHROMIUM over every system location', () => {
    const found = findChromium({
      env: { [CHROMIUM_VARIABLE]: '/opt/my/chrome' },
      platform: 'linux',
      isFile: only('/opt/my/chrome', '/usr/bin/chromium'),
    });
    expect(found).toBe('/opt/my/chrome');
  });

  it('checks the variable against the real file system by default', () => {
    const folder = mkdtempSync(path.join(os.tmpdir(), 'driftcell-chromium-finder-'));
    try {
      const file = path.join(folder, 'chrome');
      writeFileSync(file, '');
      expect(findChromium({ env: { [CHROMIUM_VARIABLE]: file } })).toBe(file);
      // A folder is not an executable.
      expect(() => findChromium({ env: { [CHROMIUM_VARIABLE]: folder } })).toThrow(
        `${CHROMIUM_VARIABLE} is set to ${folder}, which is not a file`,
      );
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });

  it('refuses a variable naming a missing file instead of falling back to another browser', () => {
    const search = { env: { [CHROMIUM_VARIABLE]: '/opt/missing/chrome' }, platform: 'linux' as const, isFile: only('/usr/bin/chromium') };
    expect(() => findChromium(search)).toThrow(ChromiumNotFound);
    expect(() => findChromium(search)).toThrow('DRIFTCELL_CHROMIUM is set to /opt/missing/chrome, which is not a file');
  });

  it('refuses a relative path in the variable', () => {
    expect(() => findChromium({ env: { [CHROMIUM_VARIABLE]: 'chromium' }, platform: 'linux', isFile: () => true })).toThrow(
      'DRIFTCELL_CHROMIUM must be an absolute path to the Chromium or Chrome executable; it is "chromium"',
    );
  });

  it("an empty variable counts as unset (a shell's `DRIFTCELL_CHROMIUM= npm test`)", () => {
    expect(findChromium({ env: { [CHROMIUM_VARIABLE]: '' }, platform: 'linux', isFile: only('/usr/bin/chromium') })).toBe(
      '/usr/bin/chromium',
    );
  });

  it("tries Debian's /usr/bin/chromium first on Linux, then the other usual names", () => {
    expect(systemChromiumLocations('linux')[0]).toBe('/usr/bin/chromium');
    expect(findChromium({ env: {}, platform: 'linux', isFile: only('/usr/bin/google-chrome', '/usr/bin/chromium-browser') })).toBe(
      '/usr/bin/chromium-browser',
    );
  });

  it('finds Chromium or Chrome in /Applications or ~/Applications on macOS', () => {
    const chrome = '/Applications/Google Chrome.app/Contents/MacOS/Google Chrome';
    expect(findChromium({ env: {}, platform: 'darwin', homeDir: '/Users/ana', isFile: only(chrome) })).toBe(chrome);
    const own = '/Users/ana/Applications/Chromium.app/Contents/MacOS/Chromium';
    expect(findChromium({ env: {}, platform: 'darwin', homeDir: '/Users/ana', isFile: only(own) })).toBe(own);
  });

  it('finds chrome.exe under the Windows program folders named by the environment', () => {
    const env = { PROGRAMFILES: 'D:\\Apps', 'PROGRAMFILES(X86)': 'D:\\Apps86', LOCALAPPDATA: 'C:\\Users\\ana\\AppData\\Local' };
    const perUser = 'C:\\Users\\ana\\AppData\\Local\\Google\\Chrome\\Application\\chrome.exe';
    expect(findChromium({ env, platform: 'win32', isFile: only(perUser) })).toBe(perUser);
    expect(systemChromiumLocations('win32', env)).toContain('D:\\Apps\\Google\\Chrome\\Application\\chrome.exe');
    expect(
      findChromium({
        env: { [CHROMIUM_VARIABLE]: 'D:\\Portable\\chrome.exe' },
        platform: 'win32',
        isFile: only('D:\\Portable\\chrome.exe'),
      }),
    ).toBe('D:\\Portable\\chrome.exe');
  });

  it('without any browser, lists every place tried and how to name one', () => {
    let error: unknown;
    try {
      findChromium({ env: {}, platform: 'linux', isFile: () => false });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ChromiumNotFound);
    const message = (error as Error).message;
    expect(message).toContain('DRIFTCELL_CHROMIUM (not set)');
    for (const file of systemChromiumLocations('linux')) expect(message).toContain(file);
    expect(message).toContain('set DRIFTCELL_CHROMIUM to its executable');
    expect(message).toContain('never download a browser');
  });

  it('launch flags stay those of the closed test network', () => {
    expect(CHROMIUM_ARGS).toEqual([
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
    ]);
  });
});
