#!/usr/bin/env node
/**
 * Entry of `npm start` (package.json: compiles dev/ with dev/tsconfig.json,
 * then runs node dist/dev/dev/npmStart.js). The work is in dev/start.ts; this
 * file only finds the project root and reports failures as one clear line.
 */
import path from 'path';
import { main } from './start';

// dist/dev/dev/npmStart.js -> the project root three folders up.
const projectRoot = path.resolve(__dirname, '..', '..', '..');

main(process.argv.slice(2), projectRoot).catch((e: unknown) => {
  console.error(`npm start: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
