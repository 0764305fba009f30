/**
 * Runs the built `driftcell` command as a user would: `node …/cli/main.js`.
 * The project is compiled once per test file into a temporary folder laid out
 * like the package (dist/node, package.json, node_modules link), so tests
 * never write into the repository and parallel test files never share output.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, mkdtempSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const ROOT = resolve(__dirname, '..', '..', '..');

export interface BuiltCli {
  /** Path of the compiled main.js. */
  readonly main: string;
  readonly remove: () => void;
}

/** Compiles the project into a fresh temporary package folder. */
export function buildCli(): BuiltCli {
  const pkg = mkdtempSync(join(tmpdir(), 'driftcell-cli-build-'));
  execFileSync(
    process.execPath,
    [
      require.resolve('typescript/bin/tsc'),
      '-p',
      join(ROOT, 'tsconfig.json'),
      '--outDir',
      join(pkg, 'dist', 'node'),
      '--sourceMap',
      'false',
    ],
    {
      stdio: 'pipe',
    },
  );
  copyFileSync(join(ROOT, 'package.json'), join(pkg, 'package.json'));
  symlinkSync(join(ROOT, 'node_modules'), join(pkg, 'node_modules'), 'dir');
  return { main: join(pkg, 'dist', 'node', 'cli', 'main.js'), remove: () => rmSync(pkg, { recursive: true, force: true }) };
}

export interface RunResult {
  readonly status: number | null;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs the command with arguments in a working folder, with `input` on stdin (default none). */
export function run(cli: BuiltCli, args: readonly string[], cwd: string, input = ''): RunResult {
  const result = spawnSync(process.execPath, [cli.main, ...args], { cwd, encoding: 'utf8', input });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}
