#!/usr/bin/env node
/**
 * Entry of `npm start` (package.json: node dist/node/cli/start.js). The work
 * is in src/excel/start.ts; this file only finds the project root and reports
 * failures as one clear line.
 */
import path from 'path';
import { main } from '../excel/start';

// dist/node/cli/start.js -> the project root three folders up.
const projectRoot = path.resolve(__dirname, '..', '..', '..');

main(process.argv.slice(2), projectRoot).catch((e: unknown) => {
  console.error(`npm start: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
