/**
 * The one memo of the physics core. Some pure functions are costly (a
 * neutrality solve, a root search, a scan of ρ(N)) and are asked the same
 * question many times in a sheet, where a column or a doping × temperature
 * grid repeats its conditions. `memoize` remembers their answers under one
 * policy (also in docs/physics.md, "Memos"):
 *
 * - Key: the arguments, every one, compared with Object.is (numbers by value,
 *   −0 apart from +0; objects, such as a material or a dopant, by identity).
 *   A memoized function must depend on its arguments only, so an answer
 *   remembered is the answer computed, bit for bit.
 * - Capacity: fixed per memo. Storing a new answer in a full memo first
 *   clears it: no recency bookkeeping on the hot path, and the memory held
 *   never exceeds the capacity (objects in keys are held until then).
 * - A call that throws stores nothing: the next call computes again and
 *   throws the same error.
 * - Answers are shared, not copied: memoize functions that return numbers or
 *   values nobody mutates (callers that hand results out copy them).
 */

/** What an argument of a memoized function may be. */
export type MemoKey = number | string | boolean | bigint | symbol | object | null | undefined;

/** A memoized function, with the number of answers it holds (for tests). */
export interface Memo<A extends readonly MemoKey[], R> {
  (...args: A): R;
  /** Answers currently remembered. */
  readonly size: number;
  /** Forgets every answer. */
  clear(): void;
}

/** Map key standing for −0, which a Map would merge with +0. */
const NEGATIVE_ZERO = Symbol('-0');
/** Map key under which a trie node keeps its answer, apart from any argument. */
const ANSWER = Symbol('answer');

type Node = Map<MemoKey, unknown>;

function keyOf(arg: MemoKey): MemoKey {
  return arg === 0 && Object.is(arg, -0) ? NEGATIVE_ZERO : arg;
}

/**
 * Remembers the answers of a pure function under the policy above. The
 * arguments form a path in a tree of Maps (the argument count first, so
 * calls with fewer arguments never meet longer ones), so a look-up costs one
 * Map.get per argument and no string formatting.
 *
 * @param capacity - answers held before the memo is cleared, an integer ≥ 1
 * @param compute - the pure function
 * @returns the memoized function
 * @throws RangeError for a capacity that is not an integer ≥ 1
 * @example memoize(16, (x: number) => x * x)(3) // → 9
 */
export function memoize<A extends readonly MemoKey[], R>(capacity: number, compute: (...args: A) => R): Memo<A, R> {
  if (!Number.isInteger(capacity) || capacity < 1) {
    throw new RangeError(`memo capacity must be an integer ≥ 1, got ${String(capacity)}`);
  }
  let root: Node = new Map();
  let size = 0;

  const memo = (...args: A): R => {
    let node: Node | undefined = root.get(args.length) as Node | undefined;
    for (let i = 0; node !== undefined && i < args.length; i++) node = node.get(keyOf(args[i])) as Node | undefined;
    if (node !== undefined && node.has(ANSWER)) return node.get(ANSWER) as R;

    const answer = compute(...args); // a throw leaves the memo as it was
    if (size >= capacity) {
      root = new Map();
      size = 0;
    }
    let level = root;
    for (let i = -1; i < args.length; i++) {
      const key = i < 0 ? args.length : keyOf(args[i]);
      let next = level.get(key) as Node | undefined;
      if (next === undefined) {
        next = new Map();
        level.set(key, next);
      }
      level = next;
    }
    if (!level.has(ANSWER)) size++; // a reentrant call may have stored this key meanwhile
    level.set(ANSWER, answer);
    return answer;
  };

  return Object.defineProperties(memo, {
    size: { get: () => size },
    clear: {
      value: (): void => {
        root = new Map();
        size = 0;
      },
    },
  }) as Memo<A, R>;
}
