/**
 * What the two webpack builds share: the add-in (webpack.config.js, into
 * dist/addin) and the pane's test harness (tests/taskpane/harness/webpack.config.js,
 * into dist/harness). Both bundle the same TypeScript sources for the same
 * Office web views, and carry the same stylesheets and icons, so the harness
 * page cannot drift from what Excel loads.
 */
'use strict';
const path = require('path');

const ROOT = __dirname;

/**
 * TypeScript through ts-loader with the project's tsconfig.json.
 *
 * @param {{ sourceMap: boolean }} options - whether to emit source maps
 */
function typescriptRule({ sourceMap }) {
  return {
    test: /\.ts$/,
    exclude: /node_modules/,
    loader: 'ts-loader',
    options: {
      configFile: path.join(ROOT, 'tsconfig.json'),
      // tsc type-checks the whole project before webpack runs.
      transpileOnly: true,
      // ES2017 for older Office web views; ES modules so webpack can drop unused code.
      compilerOptions: { target: 'ES2017', module: 'ES2020', sourceMap },
    },
  };
}

/** CopyWebpackPlugin patterns for the icons and the pane's stylesheets (shell, and the tools' own); a fresh list each call. */
function paneStaticFiles() {
  return [
    { from: 'assets/*.png', to: 'assets/[name][ext]' },
    { from: 'src/taskpane/taskpane.css', to: 'taskpane.css' },
    // The tools' own stylesheet (certificate check, function reference).
    { from: 'src/taskpane/tools.css', to: 'tools.css' },
  ];
}

/**
 * The settings both builds start from; each adds entries, output, plugins and its own choices.
 *
 * @param {{ mode: 'production' | 'development', sourceMap: boolean }} options
 */
function baseConfig({ mode, sourceMap }) {
  return {
    mode,
    context: ROOT,
    target: ['web', 'es2017'],
    resolve: { extensions: ['.ts', '.js'] },
    module: { rules: [typescriptRule({ sourceMap })] },
  };
}

module.exports = { ROOT, baseConfig, typescriptRule, paneStaticFiles };
