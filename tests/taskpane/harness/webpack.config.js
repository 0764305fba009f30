/**
 * Builds the pane's test harness into dist/harness/ (never into dist/addin):
 * harness.js (src/taskpane/harness/entry.ts: the pane shell and tools on the
 * headless engine, HyperFormula included), harness.html (the pane page without
 * Office.js), the stylesheets and
 * icons. Run by tests/taskpane/support/harness.ts when the build is stale.
 * Shares the TypeScript rule, target, stylesheets and icons with the add-in's
 * build through webpack.base.js.
 */
'use strict';
const fs = require('fs');
const path = require('path');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const { ROOT, baseConfig, paneStaticFiles } = require('../../../webpack.base');

/** Office.js as the pane page loads it, and its CDN in the page's policy. */
const OFFICE_SCRIPT = /<!--[^>]*Office\.js[^>]*-->\s*<script src="https:\/\/appsforoffice\.microsoft\.com[^"]*"><\/script>\s*/;
const OFFICE_ORIGIN = / https:\/\/appsforoffice\.microsoft\.com/;

/**
 * The harness page is the pane page itself (src/taskpane/taskpane.html) without
 * Office.js, so the two cannot drift apart; the engine-backed entry mounts the
 * tools into the same elements. Fails the build if the page no longer loads
 * Office.js the expected way, rather than serving a page that would.
 */
function harnessPage() {
  const pane = fs.readFileSync(path.join(ROOT, 'src', 'taskpane', 'taskpane.html'), 'utf8');
  if (!OFFICE_SCRIPT.test(pane) || !OFFICE_ORIGIN.test(pane)) {
    throw new Error('tests/taskpane/harness: taskpane.html no longer loads Office.js as expected; update harnessPage()');
  }
  return pane
    .replace(OFFICE_SCRIPT, '<!-- Test harness: no Office.js; the pane runs on the headless engine workbook. -->\n')
    .replace(OFFICE_ORIGIN, '')
    .replace('<title>Driftcell</title>', '<title>Driftcell pane (test harness)</title>');
}

module.exports = (env, argv) => ({
  ...baseConfig({ mode: argv.mode === 'production' ? 'production' : 'development', sourceMap: true }),
  entry: { harness: './src/taskpane/harness/entry.ts' },
  output: { path: path.join(ROOT, 'dist', 'harness'), filename: '[name].js', clean: true },
  // No eval-based source maps: the page's policy allows no eval.
  devtool: 'source-map',
  performance: { hints: false },
  plugins: [
    new HtmlWebpackPlugin({
      filename: 'harness.html',
      templateContent: harnessPage(),
      inject: 'body',
      scriptLoading: 'blocking',
      minify: false,
    }),
    new CopyWebpackPlugin({ patterns: paneStaticFiles() }),
  ],
});
