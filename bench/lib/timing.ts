/**
 * Side-by-side timing: the contestants of one comparison run interleaved in
 * the same process (A, B, A, B, …) and each reports its median, so machine
 * load and JIT warm-up affect both alike. Only ratios are compared against
 * targets; absolute times are reported for information.
 */

/** Milliseconds elapsed while running `work` once. */
export function timeOnce(work: () => void): number {
  const start = process.hrtime.bigint();
  work();
  return Number(process.hrtime.bigint() - start) / 1e6;
}

/** Median of a non-empty list. */
export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle] : 0.5 * (sorted[middle - 1] + sorted[middle]);
}

/**
 * Runs each contestant `rounds` times, interleaved, after `warmup` untimed
 * rounds, and returns each one's median time in ms, in the given order.
 *
 * @param contestants - the work to time, one function per contestant
 * @param rounds - timed rounds (≥ 1)
 * @param warmup - untimed rounds first (JIT warm-up)
 * @example const [ours, raw] = sideBySide([() => ours(), () => raw()], 5, 1)
 */
export function sideBySide(contestants: readonly (() => void)[], rounds: number, warmup = 1): number[] {
  for (let w = 0; w < warmup; w++) contestants.forEach((work) => work());
  const times = contestants.map(() => [] as number[]);
  for (let r = 0; r < rounds; r++) contestants.forEach((work, i) => times[i].push(timeOnce(work)));
  return times.map(median);
}

/** Keeps a computed value observable so the JIT cannot drop the work that made it. */
export let sink = 0;
export function consume(value: number): void {
  sink += value === value ? 1 : 0;
}
