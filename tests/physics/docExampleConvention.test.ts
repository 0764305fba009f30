/**
 * The reader behind tests/physics/docExamples.test.ts: how examples are found
 * in doc blocks and how their stated results are read and compared. The
 * convention is ours (DEVELOPERS.md, "Adding a function", step 1); rounding to
 * half a unit in the last printed digit is common practice, no source.
 */
import { extractDocExamples, mismatches, readClaim, splitComment, type ResultPattern } from './support/docExamples';

function claim(comment: string): ResultPattern {
  const { expected, claimProblem } = readClaim(comment);
  if (expected === undefined) throw new Error(claimProblem ?? `no stated result in ${comment}`);
  return expected;
}

describe('reading a stated result', () => {
  it('takes the tolerance of ≈ from the printed digits, trailing zeros included', () => {
    expect(claim('≈ 1184 cm²/(V·s)')).toMatchObject({ kind: 'number', value: 1184, tolerance: 0.5 });
    expect(claim('≈ 7000')).toMatchObject({ tolerance: 0.5 });
    expect((claim('≈ 1.3e15') as { tolerance: number }).tolerance).toBeCloseTo(0.05e15, 0);
    expect((claim('≈ −903.974') as { value: number; tolerance: number }).value).toBe(-903.974);
    expect((claim('≈ 9.6e-7 cm') as { tolerance: number }).tolerance).toBeCloseTo(0.05e-7, 20);
  });

  it('reads → as exact, with ≈ allowed on single numbers inside', () => {
    expect(claim('→ 9')).toMatchObject({ kind: 'number', value: 9, tolerance: 0 });
    expect(claim("→ ['minimum', 'maximum']")).toEqual({
      kind: 'array',
      open: false,
      items: [
        { kind: 'string', value: 'minimum', prefixOnly: false },
        { kind: 'string', value: 'maximum', prefixOnly: false },
      ],
    });
    const object = claim('→ { top: 0, bottom: ≈ 0.31, … } (µm)');
    expect(object).toMatchObject({ kind: 'object', open: true });
    expect(mismatches({ top: 0, bottom: 0.312, buried: false }, object)).toEqual([]);
    expect(mismatches({ top: 0, bottom: 0.316 }, object)).toHaveLength(1);
    expect(claim('→ false')).toEqual({ kind: 'constant', value: false });
  });

  it('matches a string ending in … by its beginning', () => {
    const pattern = claim("→ 'no published hole saturation velocity …'");
    expect(mismatches('no published hole saturation velocity for 4H-SiC', pattern)).toEqual([]);
    expect(mismatches('no published electron saturation velocity', pattern)).toHaveLength(1);
  });

  it('states nothing in a plain comment and refuses a value glued to text', () => {
    expect(readClaim('names both readings')).toEqual({});
    expect(readClaim('≈ 1/300').claimProblem).toMatch(/followed by a space/);
    expect(readClaim('→ [1, 2').claimProblem).toMatch(/missing \]/);
  });
});

describe('comparing a result', () => {
  it('accepts half a unit in the last printed digit and no more', () => {
    const pattern = claim('≈ 1184');
    expect(mismatches(1184.49, pattern)).toEqual([]);
    expect(mismatches(1183.5, pattern)).toEqual([]);
    expect(mismatches(1184.51, pattern)).toEqual([
      'the result is 1184.51; the example states ≈ 1184 (±0.5, half a unit in its last printed digit)',
    ]);
    expect(mismatches('1184', pattern)).toEqual(['the result is "1184", not a number']);
  });

  it('names extra object keys and wrong array lengths', () => {
    expect(mismatches({ electron: 343, hole: 160, extra: 1 }, claim('→ { electron: ≈ 343, hole: ≈ 160 }'))).toEqual([
      'the result also has extra, which the example does not list (end the object with … if it need not)',
    ]);
    expect(mismatches(['a'], claim("→ ['a', 'b']"))).toEqual(['the result has 1 entries (["a"]); the example lists 2']);
  });
});

describe('finding examples in doc blocks', () => {
  const source = [
    '/**', // 1
    ' * Summary.', // 2
    " * @example first('a // b') // → 'x'", // 3
    ' * @example second() // ≈ 2.0', // 4
    ' */', // 5
    'export function f() {}', // 6
    '/**', // 7
    ' * @example', // 8
    " *   import { g } from 'driftcell';", // 9
    ' *   g(); // ≈ 1 unit', // 10
    ' *   g(); // a note', // 11
    ' * @returns something', // 12
    ' */', // 13
    '// @example not in a doc block', // 14
  ].join('\n');
  const examples = extractDocExamples(source, 'src/x.ts');

  it('gives each one-line example and each block its line', () => {
    expect(examples.map((e) => [e.file, e.line, e.lines.map((l) => [l.line, l.code])])).toEqual([
      ['src/x.ts', 3, [[3, "first('a // b')"]]],
      ['src/x.ts', 4, [[4, 'second()']]],
      [
        'src/x.ts',
        8,
        [
          [9, "import { g } from 'driftcell';"],
          [10, 'g();'],
          [11, 'g();'],
        ],
      ],
    ]);
  });

  it('reads each line its own stated result', () => {
    expect(examples[2].lines.map((l) => l.expected?.kind)).toEqual([undefined, 'number', undefined]);
  });

  it('splits code from comment outside strings only', () => {
    expect(splitComment("f('http://x') // → 1")).toEqual({ code: "f('http://x')", comment: '→ 1' });
    expect(splitComment('f()')).toEqual({ code: 'f()' });
  });
});
