/**
 * ESLint flat config. Beyond typescript-eslint's recommended rules it encodes
 * the architecture: src/physics (pure) <- src/catalog <- front ends
 * (src/excel, src/engine, src/cli, src/taskpane, src/library). Imports only
 * point down, front ends reach physics only through the catalog, and the
 * catalog reaches physics only through its barrel, src/physics/index.ts.
 * `npm run lint` runs it; DEVELOPERS.md ("Lint and layers") explains the rules.
 * Layout is Prettier's (.prettierrc.json): eslint-config-prettier, last, turns
 * off every rule that would judge formatting, so the two never disagree.
 */
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import { importX, createNodeResolver } from 'eslint-plugin-import-x';
import prettierCompatible from 'eslint-config-prettier/flat';

/** The Node globals the CommonJS scripts and configs use (no `globals` package needed for so few). */
const NODE_GLOBALS = {
  require: 'readonly',
  module: 'writable',
  exports: 'writable',
  __dirname: 'readonly',
  __filename: 'readonly',
  process: 'readonly',
  console: 'readonly',
  Buffer: 'readonly',
};

const FRONT_ENDS = ['./src/excel', './src/engine', './src/cli', './src/taskpane', './src/library'];

/** One no-restricted-paths zone per (target, forbidden source) pair, each with the layer rule it breaks. */
const layerZones = [
  {
    target: './src/physics',
    from: ['./src/catalog', ...FRONT_ENDS],
    message: 'src/physics is the pure core: it imports nothing from the catalog or a front end.',
  },
  {
    target: './src/catalog',
    from: FRONT_ENDS,
    message: 'src/catalog sits below every front end: it must not import one.',
  },
  ...FRONT_ENDS.map((frontEnd) => ({
    target: frontEnd,
    from: './src/physics',
    message: 'Front ends reach physics only through src/catalog: import it from the catalog (add a re-export there if needed).',
  })),
  {
    target: './src/catalog',
    from: './src/physics',
    except: ['./index.ts'],
    message: 'The catalog imports physics only through its barrel, src/physics/index.ts: export what you need from there.',
  },
  {
    target: './src/text',
    from: ['./src/physics', './src/catalog', ...FRONT_ENDS],
    message: 'src/text (prose and other text helpers) is a leaf every layer may import: it imports nothing from them.',
  },
  {
    target: './src',
    from: ['./dev', './tests', './bench'],
    message: 'src/ never imports development tooling, tests or benchmarks.',
  },
];

export default tseslint.config(
  {
    ignores: ['dist/**', 'node_modules/**', 'coverage/**', 'test-artifacts/**', 'docs/**', 'assets/**/*.png'],
  },
  {
    // A disable comment that suppresses nothing is an error, so none linger.
    linterOptions: { reportUnusedDisableDirectives: 'error' },
  },
  js.configs.recommended,
  {
    // Error's `cause` option is ES2022; tsconfig.json's lib is ES2020, so the
    // messages carry the caught error's text instead.
    rules: { 'preserve-caught-error': 'off' },
  },
  {
    files: ['**/*.ts'],
    extends: [tseslint.configs.recommended],
    languageOptions: {
      parserOptions: {
        // Type-aware rules (floating promises); each file is checked with the
        // tsconfig.json nearest to it: the root one for src/, dev/, bench/ and
        // tests/ have their own.
        projectService: true,
        tsconfigRootDir: import.meta.dirname,
      },
    },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': 'error',
      '@typescript-eslint/await-thenable': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    files: ['**/*.ts', '**/*.js', '**/*.mjs'],
    plugins: { 'import-x': importX },
    settings: {
      // Resolve extensionless relative imports to .ts files, and parse the
      // imported TypeScript files too (no-cycle follows them).
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.d.ts', '.js', '.json'] })],
      'import-x/extensions': ['.ts', '.js', '.mjs'],
      'import-x/external-module-folders': ['node_modules', 'node_modules/@types'],
      'import-x/parsers': { '@typescript-eslint/parser': ['.ts'] },
    },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-restricted-paths': ['error', { zones: layerZones }],
    },
  },
  {
    // Node scripts and configs written in CommonJS.
    files: ['**/*.js'],
    languageOptions: { sourceType: 'commonjs', globals: NODE_GLOBALS },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    files: ['**/*.mjs'],
    languageOptions: { sourceType: 'module', globals: NODE_GLOBALS },
  },
  // Last, so no formatting rule enabled above survives.
  prettierCompatible,
);
