/**
 * The `prose` tag (src/text/prose.ts): source lines joined into paragraphs,
 * and every layout it refuses because the text would not say what the source
 * seems to say.
 */
import { prose } from '../../src/text/prose';

describe('prose joins source lines into paragraphs', () => {
  it('turns a single line break into one space and drops the continuation indent', () => {
    const text = prose`Returns the low-field mobility
      of electrons or holes
      in cm²/(V·s).`;
    expect(text).toBe('Returns the low-field mobility of electrons or holes in cm²/(V·s).');
  });

  it('keeps a blank line as a paragraph break (\\n\\n)', () => {
    const text = prose`First paragraph,
      still the first.

      Second paragraph.`;
    expect(text).toBe('First paragraph, still the first.\n\nSecond paragraph.');
  });

  it('accepts a blank line holding only spaces as the same paragraph break', () => {
    expect(prose(tagged('One.\n  \n  Two.'))).toBe('One.\n\nTwo.');
  });

  it('leaves a one-line text unchanged', () => {
    expect(prose`Nothing to join here.`).toBe('Nothing to join here.');
  });

  it('keeps interpolated values as values, line breaks and spaces inside them included', () => {
    const width = 3;
    const list = 'a\nb';
    const text = prose`A row of ${width}
      values: ${list}
      ${'(end)'}`;
    expect(text).toBe('A row of 3 values: a\nb (end)');
  });

  it('lets the text start on the line after the backtick and end before a closing backtick on its own line', () => {
    const text = prose`
      Starts on its own line
      and ends before the backtick.
    `;
    expect(text).toBe('Starts on its own line and ends before the backtick.');
  });

  it('joins around a code span that does not cross a line break', () => {
    const text = prose`Run \`npm run docs\` to
      regenerate the tables.`;
    expect(text).toBe('Run `npm run docs` to regenerate the tables.');
  });

  it('gives the same text as the one-line template it replaces', () => {
    const models = 'masetti';
    const oneLine = `Blank model: ${models} for majority carriers, in any material.\n\nA second paragraph with *emphasis*.`;
    const wrapped = prose`Blank model: ${models} for majority
      carriers, in any material.

      A second paragraph with
      *emphasis*.`;
    expect(wrapped).toBe(oneLine);
  });
});

/** Calls the tag on literal parts given as plain strings (no escapes in them), for layouts awkward to keep in a source file. */
function tagged(...parts: string[]): TemplateStringsArray {
  return Object.assign([...parts], { raw: [...parts] });
}

describe('prose refuses layouts a reader could misread', () => {
  const refusal = (make: () => string) => {
    try {
      make();
    } catch (e) {
      return (e as Error).message;
    }
    throw new Error('expected prose to refuse the text');
  };

  it('refuses trailing spaces on a line', () => {
    expect(refusal(() => prose(tagged('Ends with a space \n  next.')))).toMatch(
      /^prose text starting "Ends with a space ": a line ends with a space \("Ends with a space "\)$/,
    );
  });

  it('refuses a trailing space at the very end', () => {
    expect(refusal(() => prose`A fragment `)).toMatch(/a line ends with a space/);
  });

  it('refuses a tab', () => {
    expect(refusal(() => prose(tagged('One\n  with a\ttab.')))).toMatch(/a line holds a tab \("with a\ttab."\)/);
  });

  it('refuses a leading space when the text starts right after the backtick', () => {
    expect(refusal(() => prose` starts with a space`)).toMatch(/it starts with a space/);
  });

  it('refuses two blank lines in a row', () => {
    expect(refusal(() => prose(tagged('One.\n\n\nTwo.')))).toMatch(/two blank lines in a row/);
  });

  it('refuses a blank line at the start or the end', () => {
    expect(refusal(() => prose(tagged('\n\nText.')))).toMatch(/starts with a blank line/);
    expect(refusal(() => prose(tagged('Text.\n\n')))).toMatch(/ends with a blank line/);
    expect(refusal(() => prose``)).toMatch(/starts with a blank line/);
  });

  it('refuses continuation lines indented differently (a formula or code block set on its own line)', () => {
    const message = refusal(
      () => prose`The relation is
        σ = q(nμn + pμp)
          = q·N·μ
        for a majority carrier.`,
    );
    expect(message).toMatch(/indented differently \(8, 10 spaces\)/);
  });

  it('refuses a line that starts like a list item', () => {
    expect(refusal(() => prose(tagged('Codes:\n  - masetti\n  - arora')))).toMatch(/starts like a list item \("- masetti"\)/);
    expect(refusal(() => prose(tagged('Steps:\n  1. measure')))).toMatch(/starts like a list item \("1. measure"\)/);
    expect(refusal(() => prose(tagged('Steps:\n  • measure')))).toMatch(/starts like a list item/);
  });

  it('refuses a line break inside a code span', () => {
    expect(refusal(() => prose(tagged('Run `npm run\n  docs` now.')))).toMatch(
      /a line break falls inside a code span \(before "docs` now."\)/,
    );
  });

  it('refuses \\n and \\r escapes and carriage returns, line breaks the source would hide', () => {
    expect(refusal(() => prose`One line\nanother`)).toMatch(/holds a \\n or \\r escape/);
    expect(refusal(() => prose`One line\ranother`)).toMatch(/holds a \\n or \\r escape/);
    expect(refusal(() => prose(tagged('One line\r\n  another')))).toMatch(/holds a carriage return/);
  });

  it('names the text it refuses by its first words, after any leading line break', () => {
    expect(refusal(() => prose(tagged('\n  Codes by material:\n  - silicon')))).toMatch(/^prose text starting "Codes by material:/);
  });
});
