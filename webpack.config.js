/**
 * Builds the Excel add-in into dist/addin:
 * - functions.js (src/excel/functions.ts) and taskpane.js (src/taskpane/index.ts);
 * - taskpane.html, the shared-runtime page that loads Office.js, then both bundles;
 * - functions.json and help/*.html, generated from the catalog as compiled by
 *   tsc into dist/node (package.json "build" runs tsc before webpack);
 * - the icons and the task pane stylesheets (taskpane.css, tools.css).
 *
 * The pane's test harness (engine-backed, HyperFormula inside) has its own
 * config, tests/taskpane/harness/webpack.config.js, and never lands in dist/addin.
 */
'use strict';
const fs = require('fs');
const path = require('path');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const { Compilation, sources } = require('webpack');

const ROOT = __dirname;
const OUTPUT = path.join(ROOT, 'dist', 'addin');
const COMPILED = path.join(ROOT, 'dist', 'node');

/** The compiled modules the generated files come from. */
const COMPILED_MODULES = {
  catalog: path.join(COMPILED, 'catalog', 'index.js'),
  metadata: path.join(COMPILED, 'excel', 'metadata.js'),
  helpPage: path.join(COMPILED, 'catalog', 'docs', 'helpPage.js'),
  origin: path.join(COMPILED, 'excel', 'origin.js'),
};

function requireCompiled() {
  const missing = Object.values(COMPILED_MODULES).filter((file) => !fs.existsSync(file));
  if (missing.length > 0) {
    throw new Error(
      `webpack needs the tsc-compiled catalog, but ${missing.map((f) => path.relative(ROOT, f)).join(', ')} ` +
        'is missing. Run `npx tsc -p tsconfig.json` first (`npm run build` runs tsc and then webpack).',
    );
  }
  // Fresh copies, so a watching build picks up a new tsc output.
  for (const file of Object.keys(require.cache)) if (file.startsWith(COMPILED)) delete require.cache[file];
  return {
    catalog: require(COMPILED_MODULES.catalog),
    metadata: require(COMPILED_MODULES.metadata),
    helpPage: require(COMPILED_MODULES.helpPage),
    origin: require(COMPILED_MODULES.origin),
  };
}

/** Emits functions.json and the help pages from the compiled catalog. */
class CatalogFilesPlugin {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('CatalogFilesPlugin', (compilation) => {
      compilation.hooks.processAssets.tap({ name: 'CatalogFilesPlugin', stage: Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL }, () => {
        const { catalog, metadata, helpPage, origin } = requireCompiled();
        const functionsJson = metadata.buildFunctionsMetadata(catalog.CATALOG, origin.ADDIN_ORIGIN);
        compilation.emitAsset('functions.json', new sources.RawSource(`${JSON.stringify(functionsJson, null, 2)}\n`));
        for (const [file, html] of helpPage.renderHelpSite(catalog.CATALOG)) {
          compilation.emitAsset(`help/${file}`, new sources.RawSource(html));
        }
      });
    });
  }
}

module.exports = (env, argv) => {
  const production = argv.mode !== 'development';
  // Fail at once, with the message above, rather than after bundling.
  requireCompiled();
  return {
    mode: production ? 'production' : 'development',
    context: ROOT,
    entry: {
      functions: './src/excel/functions.ts',
      taskpane: './src/taskpane/index.ts',
    },
    output: {
      path: OUTPUT,
      // Stable names: the manifest points at functions.js.
      filename: '[name].js',
      clean: true,
      // Always write, so file times show when the build last ran (the tests compare them with src/).
      compareBeforeEmit: false,
    },
    target: ['web', 'es2017'],
    devtool: 'source-map',
    resolve: { extensions: ['.ts', '.js'] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          loader: 'ts-loader',
          options: {
            configFile: path.join(ROOT, 'tsconfig.json'),
            // tsc type-checks the whole project before webpack runs.
            transpileOnly: true,
            // ES2017 for older Office web views; ES modules so webpack can drop unused code.
            compilerOptions: { target: 'ES2017', module: 'ES2020', sourceMap: true },
          },
        },
      ],
    },
    // JavaScript only: the HTML and CSS stay as written (readable, and exactly what the tests check).
    optimization: { minimize: production, minimizeOptions: { html: false, css: false } },
    performance: { hints: production ? 'warning' : false },
    plugins: [
      new HtmlWebpackPlugin({
        filename: 'taskpane.html',
        template: './src/taskpane/taskpane.html',
        // functions.js first: it binds the functions before the pane script runs.
        chunks: ['functions', 'taskpane'],
        chunksSortMode: 'manual',
        inject: 'body',
        scriptLoading: 'blocking',
        minify: false,
      }),
      new CopyWebpackPlugin({
        patterns: [
          { from: 'assets/*.png', to: 'assets/[name][ext]' },
          { from: 'src/taskpane/taskpane.css', to: 'taskpane.css' },
          // The tools' own stylesheet (certificate check, function reference).
          { from: 'src/taskpane/tools.css', to: 'tools.css' },
        ],
      }),
      new CatalogFilesPlugin(),
    ],
  };
};
