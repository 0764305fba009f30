/**
 * `npm run bench`: runs every benchmark of issue 6 in one process, prints the
 * table, writes bench/results.json and the README's Performance table (between
 * the generated:bench markers). Absolute times vary between machines; the
 * targets are on ratios of contestants run side by side, and on bundle size.
 *
 * Usage: node dist/bench/bench/run.js [--no-readme]
 */
import { readFileSync, renameSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { updateReadmeText } from '../src/catalog/docs/readme';
import { runCatalogCalls } from './catalogCalls';
import { runEngineMobility } from './engineMobility';
import { runSpill } from './spill';
import { runInverse } from './inverse';
import { runRecalcWorkbook } from './recalcWorkbook';
import { runBundle } from './bundle';
import { markdownTable, textTable, type Section } from './lib/results';

/** dist/bench/bench/run.js → the project root. */
const PROJECT_ROOT = path.resolve(__dirname, '..', '..', '..');
const RESULTS = path.join(PROJECT_ROOT, 'bench', 'results.json');
const README = path.join(PROJECT_ROOT, 'README.md');

function writeAtomically(file: string, text: string): void {
  const temporary = `${file}.tmp-${process.pid}`;
  writeFileSync(temporary, text);
  renameSync(temporary, file);
}

async function main(): Promise<void> {
  const started = Date.now();
  const steps: [string, () => Section | Promise<Section>][] = [
    ['catalog_functions', runCatalogCalls],
    ['engine_mobility', () => runEngineMobility()],
    ['spill', () => runSpill()],
    ['solvers', () => runInverse()],
    ['recalc_workbook', () => runRecalcWorkbook(PROJECT_ROOT)],
    ['bundle', () => runBundle(PROJECT_ROOT)],
  ];
  const sections: Record<string, Section> = {};
  for (const [key, run] of steps) {
    const t0 = Date.now();
    process.stderr.write(`bench: ${key} …\n`);
    sections[key] = await run();
    process.stderr.write(`bench: ${key} done in ${((Date.now() - t0) / 1000).toFixed(1)} s\n`);
  }
  const rows = Object.values(sections).flatMap((s) => s.rows);
  const targets = Object.entries(sections).flatMap(([key, s]) => s.targets.map((t) => ({ section: key, ...t })));
  const machine = `${os.cpus()[0]?.model ?? 'unknown CPU'}, ${os.cpus().length} cores, Node ${process.version}, ${os.platform()} ${os.arch()}`;
  const results = {
    generated: new Date().toISOString(),
    machine,
    note: 'Ratios are ours ÷ the other contestant (below 1: ours is faster), measured side by side in one process; absolute times vary between machines.',
    duration_s: { value: Number(((Date.now() - started) / 1000).toFixed(1)), unit: 's' },
    targets_met: targets.filter((t) => t.met).length,
    targets_total: targets.length,
    targets,
    sections: Object.fromEntries(Object.entries(sections).map(([key, s]) => [key, { title: s.title, description: s.description, ...s.figures, targets: s.targets }])),
  };
  writeAtomically(RESULTS, `${JSON.stringify(results, null, 2)}\n`);
  console.log(textTable(rows));
  console.log(`\n${results.targets_met} of ${results.targets_total} targets met; ${machine}; wrote ${path.relative(PROJECT_ROOT, RESULTS)}`);
  if (!process.argv.includes('--no-readme')) {
    const table = `${markdownTable(rows)}\n\nMeasured by \`npm run bench\` on ${machine}, ${results.generated.slice(0, 10)}. Ratios are Driftcell ÷ the compared approach, run side by side in one process (below 1: Driftcell is faster); figures and targets in \`bench/results.json\`.`;
    const before = readFileSync(README, 'utf8');
    const after = updateReadmeText(before, { bench: table });
    if (after !== before) writeAtomically(README, after);
    console.log('README.md Performance table updated');
  }
}

main().catch((e: unknown) => {
  console.error(`bench failed: ${e instanceof Error ? e.stack ?? e.message : String(e)}`);
  process.exit(1);
});
