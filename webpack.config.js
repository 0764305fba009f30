/**
 * Builds the Excel add-in into dist/addin:
 * - functions.js (src/excel/functions.ts) and taskpane.js (src/taskpane/index.ts);
 * - taskpane.html, the shared-runtime page that loads Office.js, then both bundles;
 * - functions.json, help/*.html and manifest.xml, generated from the catalog
 *   and manifest/manifest.xml as compiled by tsc into dist/node (package.json
 *   "build" runs tsc before webpack), for the base URL the add-in is served
 *   from (src/excel/deployment.ts: DRIFTCELL_ADDIN_URL or --env addinUrl=…);
 * - the icons and the task pane stylesheets (taskpane.css, tools.css).
 *
 * The pane's test harness (engine-backed, HyperFormula inside) has its own
 * config, tests/taskpane/harness/webpack.config.js, and never lands in dist/addin.
 * What the two share (TypeScript rule, target, stylesheets and icons) is in
 * webpack.base.js.
 */
'use strict';
const fs = require('fs');
const path = require('path');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const { Compilation, sources } = require('webpack');
const { ROOT, baseConfig, paneStaticFiles } = require('./webpack.base');
const OUTPUT = path.join(ROOT, 'dist', 'addin');
const COMPILED = path.join(ROOT, 'dist', 'node');

/** The compiled modules the generated files come from. */
const COMPILED_MODULES = {
  catalog: path.join(COMPILED, 'catalog', 'index.js'),
  metadata: path.join(COMPILED, 'excel', 'metadata.js'),
  helpPage: path.join(COMPILED, 'catalog', 'docs', 'helpPage.js'),
  origin: path.join(COMPILED, 'excel', 'origin.js'),
  deployment: path.join(COMPILED, 'excel', 'deployment.js'),
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
    deployment: require(COMPILED_MODULES.deployment),
  };
}

/** Emits functions.json, the help pages and manifest.xml for the add-in's base URL. */
class CatalogFilesPlugin {
  constructor(baseUrl) {
    this.baseUrl = baseUrl;
  }

  apply(compiler) {
    compiler.hooks.thisCompilation.tap('CatalogFilesPlugin', (compilation) => {
      compilation.hooks.processAssets.tap({ name: 'CatalogFilesPlugin', stage: Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL }, () => {
        const { catalog, metadata, helpPage, deployment } = requireCompiled();
        const functionsJson = metadata.buildFunctionsMetadata(catalog.CATALOG, this.baseUrl);
        const manifest = deployment.deployedManifest(fs.readFileSync(path.join(ROOT, 'manifest', 'manifest.xml'), 'utf8'), this.baseUrl);
        compilation.emitAsset('manifest.xml', new sources.RawSource(manifest));
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
  const { deployment } = requireCompiled();
  // Where dist/addin will be served: --env addinUrl=… or DRIFTCELL_ADDIN_URL, else https://localhost:3000.
  const baseUrl = deployment.addinBaseUrl((env && env[deployment.ADDIN_URL_ENV_KEY]) || process.env[deployment.ADDIN_URL_VARIABLE]);
  return {
    ...baseConfig({ mode: production ? 'production' : 'development', sourceMap: !production }),
    entry: {
      // functions.js stays complete on its own (the manifest's Script); the pane reuses its modules
      // (catalog, physics) instead of carrying a second copy with second caches into the shared runtime.
      functions: './src/excel/functions.ts',
      taskpane: { import: './src/taskpane/index.ts', dependOn: 'functions' },
    },
    output: {
      path: OUTPUT,
      // Stable names: the manifest points at functions.js.
      filename: '[name].js',
      clean: true,
      // Always write, so file times show when the build last ran (the tests compare them with src/).
      compareBeforeEmit: false,
    },
    // No source maps in the production add-in: it is what users' Excel loads, and maps would publish
    // the whole source tree next to it. Development builds keep them for debugging.
    devtool: production ? false : 'source-map',
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
      new CopyWebpackPlugin({ patterns: paneStaticFiles() }),
      new CatalogFilesPlugin(baseUrl),
    ],
  };
};
