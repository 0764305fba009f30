/**
 * Long prose (help texts, descriptions, notes) written in source at a readable
 * width while the text users see keeps its paragraphs on one line each.
 *
 * `prose` is a template tag. A single line break in the source becomes one
 * space, a blank line is a paragraph break (`\n\n`), and the indentation of
 * each source line is dropped. Interpolations (`${…}`) are kept as values:
 * a line break inside an interpolated value is the value's own. The text
 * may start right after the backtick or on the next line, and the closing
 * backtick may stand on its own line; those two line breaks are not part of
 * the text.
 *
 * No text needs a line break that is not a paragraph break, so the tag has no
 * way to write one; it refuses, when its module loads, the layouts that would
 * suggest one, or that a reader could not tell from the text:
 * - a line with trailing spaces, or a tab anywhere (invisible differences);
 * - two blank lines in a row, or a blank line at either end;
 * - continuation lines indented differently from each other (an indented
 *   line reads as a formula or code block on its own line; it would be joined);
 * - a line starting like a list item (`- `, `* `, `• `, `1. `), which would
 *   be joined into its paragraph;
 * - a line break inside a `code span` (an odd number of backticks so far in
 *   the paragraph), which would put a space into the code;
 * - a `\n` or `\r` escape, which would be a line break the source hides.
 *
 * @param strings - the template's literal parts (as written, escapes decoded)
 * @param values - the interpolated values, converted as a plain template does
 * @returns the text: paragraphs on one line each, separated by `\n\n`
 * @example
 * prose`One paragraph
 *   on two source lines.
 *
 *   A second one.` // → 'One paragraph on two source lines.\n\nA second one.'
 */
export function prose(strings: TemplateStringsArray, ...values: unknown[]): string {
  const lines = sourceLines(strings, values);
  if (lines.length > 1 && lines[0].length === 0) lines.shift();
  if (lines.length > 1 && isBlankSource(lines[lines.length - 1])) lines.pop();
  const body = lines.map(stripIndent);

  const ownLine = startsOnOwnLine(strings);
  if (!ownLine && body.length > 0 && body[0].indent > 0) refuse(strings, 'it starts with a space');
  const indented = body.filter((line, i) => (i > 0 || ownLine) && line.pieces.length > 0);
  const continuationIndents = new Set(indented.map((line) => line.indent));
  if (continuationIndents.size > 1) {
    refuse(
      strings,
      `its lines are indented differently (${[...continuationIndents].join(', ')} spaces); prose joins every line into its ` +
        'paragraph, so indent them all alike (a text cannot hold a line on its own other than a paragraph)',
    );
  }

  const paragraphs: Piece[][] = [];
  let current: Piece[] | undefined;
  let blankRun = 0;
  for (const line of body) {
    if (line.pieces.length === 0) {
      if (paragraphs.length === 0) refuse(strings, 'it starts with a blank line');
      blankRun += 1;
      if (blankRun > 1) refuse(strings, 'it has two blank lines in a row; one blank line separates paragraphs');
      current = undefined;
      continue;
    }
    blankRun = 0;
    checkLine(strings, line.pieces);
    if (current === undefined) {
      current = [...line.pieces];
      paragraphs.push(current);
    } else {
      if (oddBackticks(current)) refuse(strings, `a line break falls inside a code span (before "${lineStart(line.pieces)}")`);
      current.push(' ', ...line.pieces);
    }
  }
  if (blankRun > 0) refuse(strings, 'it ends with a blank line');

  return paragraphs.map((pieces) => pieces.map((piece) => (typeof piece === 'string' ? piece : String(piece.value))).join('')).join('\n\n');
}

/** A literal part of a source line, or an interpolated value. */
type Piece = string | { readonly value: unknown };

/** The template's source lines, each a list of literal text and values. */
function sourceLines(strings: TemplateStringsArray, values: readonly unknown[]): Piece[][] {
  const lines: Piece[][] = [[]];
  strings.forEach((literal, i) => {
    if (literal === undefined) refuse(strings, 'it holds an escape sequence that is not valid');
    if (/\\[nr]/.test(strings.raw[i])) refuse(strings, 'it holds a \\n or \\r escape; prose makes paragraphs from blank lines only');
    if (literal.includes('\r')) refuse(strings, 'it holds a carriage return');
    literal.split('\n').forEach((text, j) => {
      if (j > 0) lines.push([]);
      if (text.length > 0) lines[lines.length - 1].push(text);
    });
    if (i < values.length) lines[lines.length - 1].push({ value: values[i] });
  });
  return lines;
}

function isBlankSource(line: readonly Piece[]): boolean {
  return line.every((piece) => typeof piece === 'string' && /^ *$/.test(piece));
}

/** Whether the text begins on the line after the opening backtick. */
function startsOnOwnLine(strings: TemplateStringsArray): boolean {
  return /^\n/.test(strings[0] ?? '');
}

/** The line without its leading spaces, and how many there were; a blank line has no pieces. */
function stripIndent(line: readonly Piece[]): { indent: number; pieces: Piece[] } {
  if (isBlankSource(line)) return { indent: 0, pieces: [] };
  const [first, ...rest] = line;
  if (typeof first !== 'string') return { indent: 0, pieces: [...line] };
  const text = first.replace(/^ +/, '');
  return { indent: first.length - text.length, pieces: text.length > 0 ? [text, ...rest] : rest };
}

function checkLine(strings: TemplateStringsArray, pieces: readonly Piece[]): void {
  const last = pieces[pieces.length - 1];
  const first = lineStart(pieces);
  if (pieces.some((piece) => typeof piece === 'string' && piece.includes('\t'))) refuse(strings, `a line holds a tab ("${first}")`);
  if (typeof last === 'string' && / $/.test(last)) refuse(strings, `a line ends with a space ("${first}")`);
  if (/^([-*•] |\d+[.)] )/.test(first)) {
    refuse(strings, `a line starts like a list item ("${first}"), which prose would join into its paragraph; move the word up a line`);
  }
}

/** The first characters of a line, to name it in a message. */
function lineStart(pieces: readonly Piece[]): string {
  return pieces
    .map((piece) => (typeof piece === 'string' ? piece : '${…}'))
    .join('')
    .slice(0, 30);
}

function oddBackticks(pieces: readonly Piece[]): boolean {
  const count = pieces.reduce((n, piece) => n + (typeof piece === 'string' ? (piece.match(/`/g) ?? []).length : 0), 0);
  return count % 2 === 1;
}

function refuse(strings: TemplateStringsArray, problem: string): never {
  const start = (strings.raw[0] ?? '').trimStart().split('\n')[0].slice(0, 40);
  throw new Error(`prose text starting "${start}": ${problem}`);
}
