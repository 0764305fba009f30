/**
 * The physics core's one memo (src/physics/memo.ts): key = every argument by
 * Object.is, fixed capacity, cleared when full, a throwing call stores
 * nothing. Plain software behaviour, no physics source.
 */
import { readdirSync, readFileSync } from 'fs';
import { join, relative } from 'path';
import * as ts from 'typescript';
import { memoize, type MemoKey } from '../../src/physics/memo';

/** A memoized function that counts how often it really computes. */
function counted<A extends MemoKey[], R>(capacity: number, compute: (...args: A) => R) {
  const calls = { count: 0 };
  const memo = memoize(capacity, (...args: A) => {
    calls.count++;
    return compute(...args);
  });
  return { memo, calls };
}

describe('memoize', () => {
  it('computes once per distinct arguments and returns the remembered answer after that', () => {
    const { memo, calls } = counted(8, (a: number, b: string) => `${a}${b}`);
    expect(memo(1, 'x')).toBe('1x');
    expect(memo(1, 'x')).toBe('1x');
    expect(calls.count).toBe(1);
    expect(memo(1, 'y')).toBe('1y');
    expect(memo(2, 'x')).toBe('2x');
    expect(calls.count).toBe(3);
    expect(memo.size).toBe(3);
  });

  it('keys on every argument, objects by identity', () => {
    const first = { name: 'a' };
    const twin = { name: 'a' };
    const { memo, calls } = counted(8, (o: { name: string }, t: number) => ({ name: o.name, t }));
    const answer = memo(first, 300);
    expect(memo(first, 300)).toBe(answer); // the same object: answers are shared, not copied
    expect(memo(twin, 300)).not.toBe(answer);
    expect(calls.count).toBe(2);
  });

  it('tells −0 from +0 (Object.is), and remembers NaN like any other number', () => {
    const { memo, calls } = counted(8, (x: number) => 1 / x);
    expect(memo(0)).toBe(Infinity);
    expect(memo(-0)).toBe(-Infinity);
    expect(calls.count).toBe(2);
    expect(memo(NaN)).toBeNaN();
    expect(memo(NaN)).toBeNaN();
    expect(calls.count).toBe(3);
  });

  it('keeps calls with different numbers of arguments apart, also when one is a prefix of the other', () => {
    const { memo, calls } = counted(8, (...args: (number | undefined)[]) => args.length);
    expect(memo(1)).toBe(1);
    expect(memo(1, 2)).toBe(2);
    expect(memo(1, undefined)).toBe(2);
    expect(memo()).toBe(0);
    expect(memo(1)).toBe(1);
    expect(calls.count).toBe(4);
  });

  it('never holds more than its capacity: storing into a full memo clears it first', () => {
    const { memo, calls } = counted(3, (x: number) => x * 2);
    for (const x of [1, 2, 3]) memo(x);
    expect(memo.size).toBe(3);
    expect(memo(4)).toBe(8); // full: cleared, then 4 stored
    expect(memo.size).toBe(1);
    expect(calls.count).toBe(4);
    expect(memo(4)).toBe(8);
    expect(memo(1)).toBe(2); // forgotten by the clear: computed again
    expect(calls.count).toBe(5);
    expect(memo.size).toBe(2);
  });

  it('stores nothing for a call that throws, so the next call throws again', () => {
    const { memo, calls } = counted(4, (x: number) => {
      if (x < 0) throw new RangeError(`negative ${x}`);
      return Math.sqrt(x);
    });
    expect(() => memo(-1)).toThrow('negative -1');
    expect(memo.size).toBe(0);
    expect(() => memo(-1)).toThrow('negative -1');
    expect(calls.count).toBe(2);
    expect(memo(4)).toBe(2);
    expect(memo.size).toBe(1);
  });

  it('counts a key once when the computation itself stored it (reentrant call)', () => {
    let depth = 0;
    const memo = memoize(4, (x: number): number => {
      depth++;
      const answer = depth === 1 ? memo(x) : x + 1; // the outer call asks the memo for its own key
      return answer;
    });
    expect(memo(1)).toBe(2);
    expect(memo.size).toBe(1);
  });

  it('forgets everything on clear()', () => {
    const { memo, calls } = counted(4, (x: number) => x);
    memo(1);
    memo.clear();
    expect(memo.size).toBe(0);
    memo(1);
    expect(calls.count).toBe(2);
  });

  it('refuses a capacity that is not a whole number of at least 1, naming what is allowed', () => {
    for (const capacity of [0, -1, 1.5, NaN, Infinity]) {
      expect(() => memoize(capacity, (x: number) => x)).toThrow(/capacity must be an integer ≥ 1/);
    }
  });
});

describe('the physics core keeps no cache of its own beside memo.ts', () => {
  // One policy for every remembered answer: a module-level Map, WeakMap or Set elsewhere in src/physics is a
  // second cache with its own eviction rule (docs/physics.md, "Memos").
  // Read from the syntax tree, not line by line, so a declaration wrapped over several lines is found too.
  it('has no module-level Map, WeakMap or Set outside memo.ts', () => {
    const root = join(__dirname, '../../src/physics');
    const offenders: string[] = [];
    const scan = (file: string): void => {
      const source = ts.createSourceFile(file, readFileSync(file, 'utf8'), ts.ScriptTarget.ES2020, true);
      const visit = (node: ts.Node): void => {
        if (ts.isFunctionLike(node)) return; // made per call, not kept by the module
        if (ts.isNewExpression(node) && ts.isIdentifier(node.expression) && /^(Weak)?(Map|Set)$/.test(node.expression.text)) {
          offenders.push(`${relative(root, file)}:${source.getLineAndCharacterOfPosition(node.getStart(source)).line + 1}`);
        }
        ts.forEachChild(node, visit);
      };
      source.statements.filter(ts.isVariableStatement).forEach(visit);
    };
    const walk = (dir: string): void => {
      for (const entry of readdirSync(dir, { withFileTypes: true })) {
        const file = join(dir, entry.name);
        if (entry.isDirectory()) walk(file);
        else if (entry.name.endsWith('.ts') && file !== join(root, 'memo.ts')) scan(file);
      }
    };
    walk(root);
    expect(offenders).toEqual([]);
  });
});
