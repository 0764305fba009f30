/**
 * No line of source code under src/ (.ts, .js, .mjs; the stylesheets and the
 * page are copied into the add-in as they are) is longer than MAX_LINE_LENGTH
 * characters, so a reviewer reads every text in a diff without scrolling.
 * Long prose is written with the
 * `prose` tag (src/text/prose.ts) or as a '…' + '…' concatenation; code is
 * laid out over lines. A line that cannot be broken (a URL, a published table
 * row) is allowed by a comment on the line before it that says why:
 * `line-length: allowed -- <reason>`. A URL alone may also run past the limit.
 * DEVELOPERS.md ("Conventions") states the rule.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';

/** Characters (code points) per line; the width the formatter wraps code at. */
const MAX_LINE_LENGTH = 140;

const ROOT = path.resolve(__dirname, '..', '..');
const ALLOWED = /line-length: allowed(?: -- (.*))?/;
const URL = /\bhttps?:\/\/\S+/g;

interface LongLine {
  readonly line: number;
  readonly length: number;
  readonly problem: string;
}

/** The lines of one text that are too long, or that claim an exception without a reason. */
function longLines(text: string): LongLine[] {
  const lines = text.split(/\r?\n/);
  const found: LongLine[] = [];
  lines.forEach((line, index) => {
    const length = [...line].length;
    const marker = ALLOWED.exec(line);
    if (marker && (marker[1] ?? '').trim() === '') {
      found.push({ line: index + 1, length, problem: 'line-length: allowed needs a reason after " -- "' });
    }
    if (length <= MAX_LINE_LENGTH) return;
    if ([...line.replace(URL, '')].length <= MAX_LINE_LENGTH) return;
    const previous = index > 0 ? ALLOWED.exec(lines[index - 1]) : null;
    if (previous && (previous[1] ?? '').trim() !== '') return;
    found.push({ line: index + 1, length, problem: `${length} characters, more than ${MAX_LINE_LENGTH}` });
  });
  return found;
}

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return sourceFiles(full);
    return /\.(ts|js|mjs)$/.test(entry.name) ? [full] : [];
  });
}

describe('source line length', () => {
  it(`no line under src/ is longer than ${MAX_LINE_LENGTH} characters without a stated reason`, () => {
    const files = sourceFiles(path.join(ROOT, 'src'));
    expect(files.length).toBeGreaterThan(100);
    const offenders = files.flatMap((file) =>
      longLines(readFileSync(file, 'utf8')).map((l) => `${path.relative(ROOT, file).split(path.sep).join('/')}:${l.line}: ${l.problem}`),
    );
    // Wrap long help or notes with the prose tag (src/text/prose.ts), a message as '…' + '…', code over lines.
    expect(offenders).toEqual([]);
  });
});

describe('the line-length check', () => {
  const long = 'x'.repeat(MAX_LINE_LENGTH + 1);

  it('finds a line one character over the limit, counting characters rather than bytes', () => {
    expect(longLines(`ok\n${long}`)).toEqual([{ line: 2, length: MAX_LINE_LENGTH + 1, problem: '141 characters, more than 140' }]);
    expect(longLines('µ'.repeat(MAX_LINE_LENGTH))).toEqual([]);
  });

  it('allows a line whose excess is a URL', () => {
    expect(longLines(`// see https://example.org/${'a'.repeat(MAX_LINE_LENGTH)}`)).toEqual([]);
  });

  it('allows a line after a comment giving the reason, and refuses the comment without one', () => {
    expect(longLines(`// line-length: allowed -- a published table row, kept as printed\n${long}`)).toEqual([]);
    expect(longLines(`// line-length: allowed\n${long}`).map((l) => l.problem)).toEqual([
      'line-length: allowed needs a reason after " -- "',
      '141 characters, more than 140',
    ]);
  });
});
