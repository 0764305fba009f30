/**
 * Builds the pane's test harness into dist/harness/ (never into dist/addin):
 * harness.js (src/taskpane/harness/entry.ts: the pane shell and tools on the
 * headless engine, HyperFormula included), harness.html, the stylesheets and
 * icons. Run by tests/taskpane/support/harness.ts when the build is stale.
 */
'use strict';
const path = require('path');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const HtmlWebpackPlugin = require('html-webpack-plugin');

const ROOT = path.resolve(__dirname, '..', '..', '..');

module.exports = (env, argv) => ({
  mode: argv.mode === 'production' ? 'production' : 'development',
  context: ROOT,
  entry: { harness: './src/taskpane/harness/entry.ts' },
  output: { path: path.join(ROOT, 'dist', 'harness'), filename: '[name].js', clean: true },
  target: ['web', 'es2017'],
  // No eval-based source maps: the page's policy allows no eval.
  devtool: 'source-map',
  resolve: { extensions: ['.ts', '.js'] },
  module: {
    rules: [
      {
        test: /\.ts$/,
        exclude: /node_modules/,
        loader: 'ts-loader',
        options: { configFile: path.join(ROOT, 'tsconfig.json'), transpileOnly: true, compilerOptions: { target: 'ES2017', module: 'ES2020', sourceMap: true } },
      },
    ],
  },
  performance: { hints: false },
  plugins: [
    new HtmlWebpackPlugin({ filename: 'harness.html', template: './src/taskpane/harness/harness.html', inject: 'body', scriptLoading: 'blocking', minify: false }),
    new CopyWebpackPlugin({
      patterns: [
        { from: 'assets/*.png', to: 'assets/[name][ext]' },
        { from: 'src/taskpane/taskpane.css', to: 'taskpane.css' },
        { from: 'src/taskpane/tools.css', to: 'tools.css' },
      ],
    }),
  ],
});
