/**
 * The shape of bench/results.json: every figure with its unit, every
 * compared pair as a ratio named `…_ratio` (ours ÷ the other, so below 1
 * means ours is faster), and for each target its bound and whether it is met.
 */

/** A measured value with its unit. */
export interface Figure {
  readonly value: number;
  readonly unit: string;
}

/** A bound a ratio or a figure must stay under. */
export interface Target {
  /** What is bounded: the name of a ratio or figure of the same section. */
  readonly of: string;
  /** Upper bound, in the unit of what is bounded (ratios are unitless). */
  readonly max: number;
  /** The target as the issue words it. */
  readonly text: string;
  readonly met: boolean;
}

/** One row of the printed and README table. */
export interface TableRow {
  readonly benchmark: string;
  readonly ours: string;
  readonly other: string;
  readonly ratio: string;
  readonly target: string;
  readonly met: string;
}

/** A section of results.json: figures, ratios and targets of one benchmark. */
export interface Section {
  readonly title: string;
  readonly description: string;
  readonly figures: Record<string, Figure | number | string | boolean | readonly unknown[] | Record<string, unknown>>;
  readonly targets: readonly Target[];
  readonly rows: readonly TableRow[];
}

/** Builds a target entry, checking the value against the bound. */
export function target(of: string, value: number, max: number, text: string): Target {
  return { of, max, text, met: value <= max };
}

/** A figure with its unit, rounded to 4 significant digits for reading. */
export function figure(value: number, unit: string): Figure {
  return { value: Number(value.toPrecision(4)), unit };
}

/** A ratio rounded to 3 significant digits. */
export function ratio(ours: number, other: number): number {
  return Number((ours / other).toPrecision(3));
}

/** Short human form of a figure for the table. */
export function show(value: number, unit: string): string {
  const digits = Math.abs(value) >= 100 ? value.toFixed(0) : value.toPrecision(3);
  return `${digits} ${unit}`;
}

/** Renders rows as a Markdown table. */
export function markdownTable(rows: readonly TableRow[]): string {
  const header = '| Benchmark | Ours | Compared with | Ratio (ours ÷ other) | Target | Met |\n| --- | --- | --- | --- | --- | --- |';
  const body = rows.map((r) => `| ${r.benchmark} | ${r.ours} | ${r.other} | ${r.ratio} | ${r.target} | ${r.met} |`);
  return [header, ...body].join('\n');
}

/** Renders rows as a fixed-width text table for the terminal. */
export function textTable(rows: readonly TableRow[]): string {
  const columns: (keyof TableRow)[] = ['benchmark', 'ours', 'other', 'ratio', 'target', 'met'];
  const headings: TableRow = { benchmark: 'Benchmark', ours: 'Ours', other: 'Compared with', ratio: 'Ratio', target: 'Target', met: 'Met' };
  const all = [headings, ...rows];
  const widths = columns.map((c) => Math.max(...all.map((r) => r[c].length)));
  const line = (r: TableRow) =>
    columns
      .map((c, i) => r[c].padEnd(widths[i]))
      .join('  ')
      .trimEnd();
  return [line(headings), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

/** "yes"/"no" for a met flag, "—" when there is no target. */
export function metText(t: Target | undefined): string {
  if (t === undefined) return '—';
  return t.met ? 'yes' : 'no';
}
