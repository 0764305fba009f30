/**
 * `npm run test:unit`: the jest suites that need nothing but ts-jest — no
 * build (dist/node, dist/addin, dist/harness), no browser, no LibreOffice or
 * Python. The selection comes from the suites themselves
 * (tests/support/unitSuites.js); `npm run test:unit -- --listTests` shows it.
 * `npm test` (and CI's .ci/run) still builds everything and runs every suite.
 */
'use strict';
const { jest: base } = require('./package.json');
const { unitIgnorePatterns } = require('./tests/support/unitSuites');

module.exports = {
  ...base,
  rootDir: __dirname,
  testPathIgnorePatterns: ['/node_modules/', ...unitIgnorePatterns()],
};
