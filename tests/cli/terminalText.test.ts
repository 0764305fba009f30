/** Text from workbooks and results printed on a terminal: controls and bidi characters escaped (issue 14 §6). */
import { escapeForTerminal } from '../../src/cli/terminalText';

describe('escapeForTerminal', () => {
  it('escapes C0, DEL and C1 controls', () => {
    expect(escapeForTerminal('a\u0000b\u001b[2Jc\u007fd\u009be')).toBe('a\\u{0}b\\u{1b}[2Jc\\u{7f}d\\u{9b}e');
  });

  it('escapes bidirectional marks, embeddings, overrides and isolates (Unicode UAX #9)', () => {
    const bidi = [0x200e, 0x200f, 0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069, 0x061c];
    for (const code of bidi) expect(escapeForTerminal(`x${String.fromCodePoint(code)}y`)).toBe(`x\\u{${code.toString(16)}}y`);
  });

  it('leaves ordinary text, including non-ASCII letters and symbols, as it is', () => {
    expect(escapeForTerminal('Résistivité ≥ 20 K, µm, Ω·cm, 電阻, עברית')).toBe('Résistivité ≥ 20 K, µm, Ω·cm, 電阻, עברית');
  });
});
