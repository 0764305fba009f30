/**
 * `npm run docs`: rewrites README.md's generated sections from the catalog.
 * Only the text between the generated markers changes; the file is replaced
 * atomically so a failure never leaves half a README.
 */
import { readFileSync, renameSync, writeFileSync } from 'fs';
import { join } from 'path';
import { CATALOG } from '..';
import { readmeSections, updateReadmeText } from './readme';

const readmePath = join(__dirname, '..', '..', '..', '..', 'README.md');
const before = readFileSync(readmePath, 'utf8');
const after = updateReadmeText(before, readmeSections(CATALOG));
if (after === before) {
  console.log('README.md is up to date');
} else {
  const temporary = `${readmePath}.tmp-${process.pid}`;
  writeFileSync(temporary, after);
  renameSync(temporary, readmePath);
  console.log('README.md generated sections rewritten');
}
