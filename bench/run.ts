/**
 * `npm run bench`: runs every benchmark of issue 6 in one process, prints the
 * table, writes bench/results.json and the README's Performance table (between
 * the generated:bench markers). Absolute times vary between machines; the
 * targets are on ratios of contestants run side by side, and on bundle size.
 *
 * Usage: node dist/bench/bench/run.js [--no-readme] [--only key,key…]
 *
 * `--only` runs just the named sections (keys as in results.json, e.g.
 * `--only recalc_million`) and merges them into the existing results.json,
 * keeping every other section as it was last measured (each section records
 * when it was measured and its table rows, so the README table is rebuilt
 * from the merged file).
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
import { runRecalcMillion } from './recalcMillion';
import { markdownTable, textTable, type Section, type TableRow, type Target } from './lib/results';

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
    ['recalc_million', () => runRecalcMillion(PROJECT_ROOT)],
  ];
  const only = onlyKeys(steps.map(([key]) => key));
  const measuredAt = new Date().toISOString();
  const sections: Record<string, Section> = {};
  for (const [key, run] of steps) {
    if (only !== undefined && !only.includes(key)) continue;
    const t0 = Date.now();
    process.stderr.write(`bench: ${key} …\n`);
    sections[key] = await run();
    process.stderr.write(`bench: ${key} done in ${((Date.now() - t0) / 1000).toFixed(1)} s\n`);
  }
  // Sections not run this time are kept as results.json last had them (only with --only).
  const previous = only === undefined ? {} : previousSections();
  const stored: Record<string, StoredSection> = {};
  for (const [key] of steps) {
    const s = sections[key];
    if (s !== undefined)
      stored[key] = { title: s.title, description: s.description, measured: measuredAt, ...s.figures, targets: s.targets, table: s.rows };
    else if (previous[key] !== undefined) stored[key] = previous[key];
  }
  const rows = Object.values(sections).flatMap((s) => s.rows);
  const targets = Object.entries(stored).flatMap(([key, s]) => s.targets.map((t) => ({ section: key, ...t })));
  const machine = `${os.cpus()[0]?.model ?? 'unknown CPU'}, ${os.cpus().length} cores, Node ${process.version}, ${os.platform()} ${os.arch()}`;
  const results = {
    generated: measuredAt,
    machine,
    note: 'Ratios are ours ÷ the other contestant (below 1: ours is faster), measured side by side in one process; absolute times vary between machines. Each section says when it was measured.',
    duration_s: { value: Number(((Date.now() - started) / 1000).toFixed(1)), unit: 's' },
    targets_met: targets.filter((t) => t.met).length,
    targets_total: targets.length,
    targets,
    sections: stored,
  };
  writeAtomically(RESULTS, `${JSON.stringify(results, null, 2)}\n`);
  console.log(textTable(rows));
  console.log(
    `\n${results.targets_met} of ${results.targets_total} targets met; ${machine}; wrote ${path.relative(PROJECT_ROOT, RESULTS)}`,
  );
  if (!process.argv.includes('--no-readme')) {
    const missing = Object.entries(stored)
      .filter(([, s]) => s.table === undefined)
      .map(([key]) => key);
    if (missing.length > 0) {
      console.log(
        `README.md not updated: results.json has no table rows for ${missing.join(', ')} (measured before sections kept them); run the whole bench once`,
      );
      return;
    }
    const allRows = Object.values(stored).flatMap((s) => s.table ?? []);
    const dates = [...new Set(Object.values(stored).map((s) => (s.measured ?? measuredAt).slice(0, 10)))].sort();
    const when = dates.length === 1 ? dates[0] : `${dates[0]} to ${dates[dates.length - 1]}`;
    const table = `${markdownTable(allRows)}\n\nMeasured by \`npm run bench\` on ${machine}, ${when}. Ratios are Driftcell ÷ the compared approach, run side by side in one process (below 1: Driftcell is faster); figures and targets in \`bench/results.json\`.`;
    const before = readFileSync(README, 'utf8');
    const after = updateReadmeText(before, { bench: table });
    if (after !== before) writeAtomically(README, after);
    console.log('README.md Performance table updated');
  }
}

/** A section as results.json holds it. */
interface StoredSection {
  readonly title: string;
  readonly description: string;
  readonly measured?: string;
  readonly targets: readonly Target[];
  readonly table?: readonly TableRow[];
  readonly [figure: string]: unknown;
}

/** The keys given with --only, checked against the known ones; undefined without --only. */
function onlyKeys(known: readonly string[]): string[] | undefined {
  const at = process.argv.indexOf('--only');
  if (at < 0) return undefined;
  const keys = (process.argv[at + 1] ?? '').split(',').filter(Boolean);
  const unknown = keys.filter((k) => !known.includes(k));
  if (keys.length === 0 || unknown.length > 0) {
    throw new Error(
      `--only takes section keys separated by commas, from: ${known.join(', ')}${unknown.length > 0 ? ` (not ${unknown.join(', ')})` : ''}`,
    );
  }
  return keys;
}

function previousSections(): Record<string, StoredSection> {
  try {
    return (JSON.parse(readFileSync(RESULTS, 'utf8')) as { sections?: Record<string, StoredSection> }).sections ?? {};
  } catch {
    return {};
  }
}

main().catch((e: unknown) => {
  console.error(`bench failed: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
  process.exit(1);
});
