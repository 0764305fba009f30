/** Paths of the built add-in, and a clear failure when it is missing or older than the sources. */
import { existsSync, readdirSync, statSync } from 'fs';
import path from 'path';

export const PROJECT_ROOT = path.resolve(__dirname, '..', '..', '..');
export const ADDIN_DIR = path.join(PROJECT_ROOT, 'dist', 'addin');

function newestSourceTime(folder: string): number {
  let newest = 0;
  for (const entry of readdirSync(folder, { withFileTypes: true })) {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestSourceTime(full));
    else if (entry.name.endsWith('.ts')) newest = Math.max(newest, statSync(full).mtimeMs);
  }
  return newest;
}

/** Throws, naming the command to run, unless the add-in build exists and is newer than every source file. */
export function requireAddinBuild(): void {
  const needed = ['functions.json', 'functions.js', 'taskpane.html', path.join('help', 'index.html')];
  const missing = needed.filter((file) => !existsSync(path.join(ADDIN_DIR, file)));
  if (missing.length > 0) {
    throw new Error(
      `the add-in is not built (dist/addin lacks ${missing.join(', ')}). Run \`npm run build\` first; \`npm test\` does it before jest.`,
    );
  }
  const built = statSync(path.join(ADDIN_DIR, 'functions.js')).mtimeMs;
  if (newestSourceTime(path.join(PROJECT_ROOT, 'src')) > built) {
    throw new Error('dist/addin is older than a file under src/: run `npm run build` again; `npm test` does it before jest.');
  }
}
