/**
 * Reads the `@example` lines of doc blocks and the results they state, for
 * tests/physics/docExamples.test.ts (not a test file). The convention is the
 * one DEVELOPERS.md gives in "Adding a function", step 1:
 *
 *   @example fitMobility('masetti', 'electron', phosphorus1e16At300K) // ≈ 1184 cm²/(V·s)
 *   @example resolveMobilityModel('ARORA') // → 'arora'
 *
 * `→ value` states the exact result; `≈ value` states a number rounded to the
 * digits printed, so it must agree to half a unit in its last printed digit
 * (≈ 1184 means 1183.5 … 1184.5, ≈ 1.3e15 means 1.25e15 … 1.35e15; trailing
 * zeros count, write 7.0e3 for two digits). Values are JavaScript-like
 * literals: numbers (− or - for minus), 'strings', true, false, null,
 * undefined, [arrays] and { objects }; inside a `→` value a single number may
 * be marked `≈`. A string ending in … matches any text that starts with what
 * precedes it; an array or object ending with an entry … may hold more. After
 * the value, free text (a unit, a source, an explanation) follows a space.
 *
 * `@example code` on one line is a one-line example; `@example` alone on its
 * line starts a block that runs to the next tag or the end of the doc block,
 * whose lines are run in order, each stated result checked on its own line.
 * A stated result belongs to an expression; a comment that starts with
 * neither → nor ≈ states nothing.
 */

/** A result stated by an example, as read from its comment. */
export type ResultPattern =
  | { readonly kind: 'number'; readonly value: number; readonly tolerance: number; readonly text: string }
  | { readonly kind: 'string'; readonly value: string; readonly prefixOnly: boolean }
  | { readonly kind: 'constant'; readonly value: boolean | null | undefined }
  | { readonly kind: 'array'; readonly items: readonly ResultPattern[]; readonly open: boolean }
  | { readonly kind: 'object'; readonly entries: readonly (readonly [string, ResultPattern])[]; readonly open: boolean };

/** One line of an example: its code, and the result its comment states, if any. */
export interface ExampleLine {
  /** 1-based line in the source file. */
  readonly line: number;
  readonly code: string;
  readonly comment?: string;
  readonly expected?: ResultPattern;
  /** Why the comment's stated result could not be read. */
  readonly claimProblem?: string;
}

export interface DocExample {
  /** Path relative to the repository root, with forward slashes. */
  readonly file: string;
  /** 1-based line of the `@example` tag. */
  readonly line: number;
  readonly lines: readonly ExampleLine[];
}

/** Every `@example` in the `/** … *\/` blocks of one source text. */
export function extractDocExamples(source: string, file: string): DocExample[] {
  const lines = source.split(/\r?\n/);
  const examples: DocExample[] = [];
  let inBlock = false;
  let open: { line: number; lines: { line: number; text: string }[] } | undefined;
  const close = (): void => {
    if (open) examples.push({ file, line: open.line, lines: readLines(dedent(open.lines)) });
    open = undefined;
  };
  lines.forEach((raw, index) => {
    const lineNumber = index + 1;
    let text = raw;
    if (!inBlock) {
      const start = text.indexOf('/**');
      if (start < 0) return;
      inBlock = true;
      text = text.slice(start + 3);
    }
    const end = text.indexOf('*/');
    const body = (end >= 0 ? text.slice(0, end) : text).replace(/^\s*\*(?!\/) ?/, '');
    const tag = /^\s*@(\w+)(.*)$/.exec(body);
    if (tag) {
      close();
      if (tag[1] === 'example') {
        const rest = tag[2].trim();
        if (rest !== '') examples.push({ file, line: lineNumber, lines: readLines([{ line: lineNumber, text: rest }]) });
        else open = { line: lineNumber, lines: [] };
      }
    } else if (open && body.trim() !== '') {
      open.lines.push({ line: lineNumber, text: body });
    }
    if (end >= 0) {
      close();
      inBlock = false;
    }
  });
  close();
  return examples;
}

function dedent(lines: { line: number; text: string }[]): { line: number; text: string }[] {
  const indent = Math.min(...lines.map((l) => /^\s*/.exec(l.text)![0].length));
  return lines.map((l) => ({ line: l.line, text: l.text.slice(Number.isFinite(indent) ? indent : 0).trimEnd() }));
}

function readLines(lines: { line: number; text: string }[]): ExampleLine[] {
  return lines.map(({ line, text }) => {
    const split = splitComment(text);
    if (split.comment === undefined) return { line, code: split.code };
    const claim = readClaim(split.comment);
    return { line, code: split.code, comment: split.comment, ...claim };
  });
}

/** Splits a line at the first `//` outside a string literal. */
export function splitComment(text: string): { code: string; comment?: string } {
  let quote: string | undefined;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quote) {
      if (c === '\\') i++;
      else if (c === quote) quote = undefined;
    } else if (c === "'" || c === '"' || c === '`') {
      quote = c;
    } else if (c === '/' && text[i + 1] === '/') {
      return { code: text.slice(0, i).trim(), comment: text.slice(i + 2).trim() };
    }
  }
  return { code: text.trim() };
}

/** The result a comment states (`→ value` or `≈ value`), or why it cannot be read; nothing for a plain comment. */
export function readClaim(comment: string): { expected?: ResultPattern; claimProblem?: string } {
  const marker = comment[0];
  if (marker !== '→' && marker !== '≈') return {};
  try {
    const reader = new ValueReader(comment, 1);
    const expected = reader.value(marker === '≈');
    reader.expectEndOfValue();
    return { expected };
  } catch (error) {
    return { claimProblem: `cannot read the stated result "${comment}": ${(error as Error).message}` };
  }
}

const NUMBER = /^[+\-−]?(\d+)(?:\.(\d+))?(?:[eE]([+\-−]?\d+))?/;
const IDENTIFIER = /^[A-Za-z_$][\w$]*/;

class ValueReader {
  constructor(
    private readonly text: string,
    private position: number,
  ) {}

  value(approximate: boolean): ResultPattern {
    this.skipSpace();
    const rest = this.text.slice(this.position);
    if (rest.startsWith('≈')) {
      this.position++;
      return this.value(true);
    }
    const number = NUMBER.exec(rest);
    if (number) {
      this.position += number[0].length;
      const value = Number(number[0].replace(/−/g, '-'));
      const decimals = number[2]?.length ?? 0;
      const exponent = Number((number[3] ?? '0').replace('−', '-'));
      const tolerance = approximate ? 0.5 * 10 ** (exponent - decimals) : 0;
      return { kind: 'number', value, tolerance, text: number[0] };
    }
    const c = rest[0];
    if (c === "'" || c === '"') return this.string(c);
    if (c === '[') return this.array(approximate);
    if (c === '{') return this.object(approximate);
    const word = IDENTIFIER.exec(rest)?.[0];
    const constants: Record<string, boolean | null | undefined> = { true: true, false: false, null: null, undefined: undefined };
    if (word !== undefined && word in constants) {
      this.position += word.length;
      return { kind: 'constant', value: constants[word] };
    }
    throw new Error(`expected a number, 'string', true, false, null, undefined, [array] or {object} at "${rest}"`);
  }

  expectEndOfValue(): void {
    const next = this.text[this.position];
    if (next !== undefined && !/\s/.test(next)) {
      throw new Error(`the value must be followed by a space before any further text; found "${this.text.slice(this.position)}"`);
    }
  }

  private string(quote: string): ResultPattern {
    let value = '';
    for (let i = this.position + 1; i < this.text.length; i++) {
      const c = this.text[i];
      if (c === '\\') {
        value += this.text[++i];
      } else if (c === quote) {
        this.position = i + 1;
        const prefixOnly = value.endsWith('…');
        return { kind: 'string', value: prefixOnly ? value.slice(0, -1).trimEnd() : value, prefixOnly };
      } else {
        value += c;
      }
    }
    throw new Error('unterminated string');
  }

  private array(approximate: boolean): ResultPattern {
    const items: ResultPattern[] = [];
    const open = this.list(']', () => items.push(this.value(approximate)));
    return { kind: 'array', items, open };
  }

  private object(approximate: boolean): ResultPattern {
    const entries: [string, ResultPattern][] = [];
    const open = this.list('}', () => {
      const rest = this.text.slice(this.position);
      const key = IDENTIFIER.exec(rest)?.[0];
      if (key === undefined) throw new Error(`expected a key at "${rest}"`);
      this.position += key.length;
      this.skipSpace();
      if (this.text[this.position] !== ':') throw new Error(`expected ':' after key ${key}`);
      this.position++;
      entries.push([key, this.value(approximate)]);
    });
    return { kind: 'object', entries, open };
  }

  /** Reads entries up to `closing`; true when the list ends with an entry … (more may follow). */
  private list(closing: string, entry: () => void): boolean {
    this.position++;
    for (;;) {
      this.skipSpace();
      const c = this.text[this.position];
      if (c === closing) {
        this.position++;
        return false;
      }
      if (c === '…') {
        this.position++;
        this.skipSpace();
        if (this.text[this.position] !== closing) throw new Error(`… must be the last entry before ${closing}`);
        this.position++;
        return true;
      }
      if (c === undefined) throw new Error(`missing ${closing}`);
      entry();
      this.skipSpace();
      if (this.position >= this.text.length) throw new Error(`missing ${closing}`);
      if (this.text[this.position] === ',') this.position++;
      else if (this.text[this.position] !== closing) throw new Error(`expected ',' or ${closing} at "${this.text.slice(this.position)}"`);
    }
  }

  private skipSpace(): void {
    while (/\s/.test(this.text[this.position] ?? '')) this.position++;
  }
}

/** Where `actual` differs from the stated result, one sentence each; empty when it agrees. */
export function mismatches(actual: unknown, expected: ResultPattern, where = 'the result'): string[] {
  switch (expected.kind) {
    case 'number': {
      if (typeof actual !== 'number') return [`${where} is ${describe(actual)}, not a number`];
      const within = Math.abs(actual - expected.value) <= expected.tolerance;
      if (within) return [];
      const stated =
        expected.tolerance === 0
          ? `exactly ${expected.text}`
          : `≈ ${expected.text} (±${expected.tolerance.toPrecision(1)}, half a unit in its last printed digit)`;
      return [`${where} is ${actual}; the example states ${stated}`];
    }
    case 'string': {
      if (typeof actual !== 'string') return [`${where} is ${describe(actual)}, not a string`];
      const agrees = expected.prefixOnly ? actual.startsWith(expected.value) : actual === expected.value;
      return agrees
        ? []
        : [`${where} is ${JSON.stringify(actual)}; the example states ${JSON.stringify(expected.value)}${expected.prefixOnly ? '…' : ''}`];
    }
    case 'constant':
      return actual === expected.value ? [] : [`${where} is ${describe(actual)}; the example states ${String(expected.value)}`];
    case 'array': {
      if (!Array.isArray(actual)) return [`${where} is ${describe(actual)}, not an array`];
      const lengthAgrees = expected.open ? actual.length >= expected.items.length : actual.length === expected.items.length;
      if (!lengthAgrees)
        return [
          `${where} has ${actual.length} entries (${describe(actual)}); the example lists ${expected.items.length}${expected.open ? ' or more' : ''}`,
        ];
      return expected.items.flatMap((item, i) => mismatches(actual[i], item, `${where}[${i}]`));
    }
    case 'object': {
      if (typeof actual !== 'object' || actual === null) return [`${where} is ${describe(actual)}, not an object`];
      const record = actual as Record<string, unknown>;
      const stated = new Set(expected.entries.map(([key]) => key));
      const extra = expected.open ? [] : Object.keys(record).filter((key) => !stated.has(key));
      const problems =
        extra.length > 0
          ? [`${where} also has ${extra.join(', ')}, which the example does not list (end the object with … if it need not)`]
          : [];
      return problems.concat(
        expected.entries.flatMap(([key, item]) =>
          key in record ? mismatches(record[key], item, `${where}.${key}`) : [`${where} has no ${key}`],
        ),
      );
    }
  }
}

function describe(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (value === undefined || typeof value === 'number' || typeof value === 'boolean' || value === null) return String(value);
  try {
    return JSON.stringify(value);
  } catch {
    return String(value);
  }
}
