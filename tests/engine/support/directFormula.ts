/**
 * Test oracle: evaluates a self-contained DRIFT formula straight through the
 * catalog's evaluate(), without HyperFormula, so engine results can be
 * compared with it. It reads only what catalog examples use when they need no
 * cells: number and text literals, empty arguments, inline arrays {a,b;c,d}
 * and nested DRIFT calls. Anything else (cell references, operators,
 * built-ins) makes it answer `undefined`: that formula is not self-contained.
 */
import { findFunction } from '../../../src/catalog';
import { evaluate } from '../../../src/catalog/broadcast';
import type { ArgumentInput, CellInput, CellOutput, Grid } from '../../../src/catalog/values';

class NotSelfContained extends Error {}

class Reader {
  private pos = 0;
  constructor(private readonly text: string) {}

  private peek(): string {
    return this.text[this.pos] ?? '';
  }

  private skipSpace(): void {
    while (this.peek() === ' ') this.pos++;
  }

  private expect(ch: string): void {
    this.skipSpace();
    if (this.peek() !== ch) throw new NotSelfContained(`expected ${ch} at ${this.pos}`);
    this.pos++;
  }

  atEnd(): boolean {
    this.skipSpace();
    return this.pos >= this.text.length;
  }

  /** An argument: empty, literal, inline array or DRIFT call. */
  argument(): ArgumentInput {
    this.skipSpace();
    const ch = this.peek();
    if (ch === ',' || ch === ')') return undefined;
    if (ch === '{') return this.array();
    if (ch === '"') return this.string();
    if (/[0-9.+-]/.test(ch)) return this.number();
    return this.call();
  }

  private number(): number {
    const match = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?/.exec(this.text.slice(this.pos));
    if (!match) throw new NotSelfContained(`no number at ${this.pos}`);
    this.pos += match[0].length;
    return Number(match[0]);
  }

  private string(): string {
    this.pos++;
    let out = '';
    for (;;) {
      const ch = this.text[this.pos++];
      if (ch === undefined) throw new NotSelfContained('open string');
      if (ch === '"') {
        if (this.peek() === '"') {
          out += '"';
          this.pos++;
        } else return out;
      } else out += ch;
    }
  }

  private array(): Grid<CellInput> {
    this.expect('{');
    const rows: CellInput[][] = [[]];
    for (;;) {
      this.skipSpace();
      const value = this.peek() === '"' ? this.string() : this.number();
      rows[rows.length - 1].push(value);
      this.skipSpace();
      const sep = this.text[this.pos++];
      if (sep === '}') return rows;
      if (sep === ';') rows.push([]);
      else if (sep !== ',') throw new NotSelfContained('bad inline array');
    }
  }

  /** A DRIFT call; its result becomes the argument value (1×1 as a single value). */
  call(): ArgumentInput {
    const match = /^DRIFT\.[A-Za-z]+/i.exec(this.text.slice(this.pos));
    if (!match) throw new NotSelfContained(`not a DRIFT call at ${this.pos}`);
    this.pos += match[0].length;
    const spec = findFunction(match[0]);
    if (!spec) throw new NotSelfContained(`unknown ${match[0]}`);
    this.expect('(');
    const args: ArgumentInput[] = [];
    this.skipSpace();
    if (this.peek() === ')') this.pos++;
    else {
      for (;;) {
        args.push(this.argument());
        this.skipSpace();
        const sep = this.text[this.pos++];
        if (sep === ')') break;
        if (sep !== ',') throw new NotSelfContained(`bad separator at ${this.pos - 1}`);
      }
    }
    const grid = evaluate(spec, args);
    return grid.length === 1 && grid[0].length === 1 ? grid[0][0] : (grid as Grid<CellOutput>);
  }
}

/**
 * The catalog's own result for a self-contained formula.
 *
 * @param formula - e.g. `=DRIFT.RESISTIVITY(1e15,"B",,"astm-f723")`
 * @returns the result grid, or undefined if the formula needs more than literals and DRIFT calls
 */
export function evaluateDirectly(formula: string): Grid<CellOutput> | undefined {
  const reader = new Reader(formula.replace(/^=/, ''));
  try {
    const value = reader.call();
    if (!reader.atEnd()) return undefined;
    if (Array.isArray(value)) return value as Grid<CellOutput>;
    return [[value as CellOutput]];
  } catch (e) {
    if (e instanceof NotSelfContained) return undefined;
    throw e;
  }
}
