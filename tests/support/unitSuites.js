/**
 * Which jest suites `npm run test:unit` runs: every suite under tests/ except
 * those that need something beyond ts-jest, found from the suites themselves
 * (so a new suite is sorted without a list to keep up to date):
 * - browser suites, by name: `*.browser.test.ts` (Chromium; the pane's harness build);
 * - tests/interop/: LibreOffice and Python with openpyxl;
 * - suites that use the helpers needing a build or a browser: requireAddinBuild / ADDIN_DIR
 *   (dist/addin), buildCli (compiles and runs the CLI), startHarness / ensureHarnessBuilt /
 *   HARNESS_DIR (dist/harness), launchLocalBrowser (Chromium);
 * - suites reaching into a build by path (a `'dist'` path segment, as in
 *   join(__dirname, '..', '..', 'dist', 'node', 'cli', 'main.js')) or running
 *   LibreOffice or Python by absolute path ('/usr/bin/soffice', '/usr/bin/python3');
 * - suites whose header says `@needs-build` (for needs the scan cannot see).
 * Comments are ignored by the scan, so describing a build does not exclude a suite.
 * `npm test` still runs everything after a full build.
 */
'use strict';
const fs = require('fs');
const path = require('path');

const ROOT = path.resolve(__dirname, '..', '..');
const TESTS = path.join(ROOT, 'tests');

/** Why a suite is left out, tested in order against its code (comments removed). */
const NEEDS = [
  {
    reason: 'uses a helper that needs the build or a browser',
    pattern: /\b(requireAddinBuild|ADDIN_DIR|buildCli|startHarness|ensureHarnessBuilt|HARNESS_DIR|launchLocalBrowser)\b/,
  },
  { reason: 'reads a build output by path', pattern: /['"`]dist['"`]\s*[,)]/ },
  { reason: 'runs LibreOffice or Python', pattern: /['"`]\/usr\/bin\/(soffice|libreoffice|python3?)['"`]/ },
];
const TAG = /@needs-build\b/;

function withoutComments(text) {
  // Block comments, then whole-line // comments (a // inside a string such as a URL stays).
  return text.replace(/\/\*[\s\S]*?\*\//g, '').replace(/^\s*\/\/.*$/gm, '');
}

function suites(folder) {
  return fs.readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return suites(full);
    return entry.name.endsWith('.test.ts') ? [full] : [];
  });
}

/**
 * Why a suite needs more than ts-jest, or undefined when it needs nothing else.
 *
 * @param {string} file - absolute path of a *.test.ts file
 * @param {string} [text] - its contents (read from file when omitted)
 * @returns {string | undefined}
 */
function needsBeyondUnit(file, text = fs.readFileSync(file, 'utf8')) {
  const relative = path.relative(ROOT, file).split(path.sep).join('/');
  if (relative.endsWith('.browser.test.ts')) return 'a browser suite (*.browser.test.ts)';
  if (relative.startsWith('tests/interop/')) return 'an interop suite (tests/interop: LibreOffice, openpyxl)';
  if (TAG.test(text)) return 'tagged @needs-build';
  const code = withoutComments(text);
  const need = NEEDS.find((n) => n.pattern.test(code));
  return need === undefined ? undefined : need.reason;
}

/** Every suite under tests/, each with the reason it is left out of the unit run (undefined: it runs). */
function classifySuites() {
  return suites(TESTS)
    .sort()
    .map((file) => ({ file, relative: path.relative(ROOT, file).split(path.sep).join('/'), excludedBecause: needsBeyondUnit(file) }));
}

function escapeRegExp(text) {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** testPathIgnorePatterns that leave out every suite needing more than ts-jest. */
function unitIgnorePatterns() {
  return classifySuites()
    .filter((suite) => suite.excludedBecause !== undefined)
    .map((suite) => `^${escapeRegExp(suite.file)}$`);
}

module.exports = { classifySuites, needsBeyondUnit, unitIgnorePatterns };
