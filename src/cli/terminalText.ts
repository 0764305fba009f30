/**
 * Text from a workbook or a formula result made safe to print on a terminal:
 * control characters (C0, DEL, C1) and bidirectional formatting characters
 * are shown as `\u{…}` escapes instead of acting on the terminal (moving the
 * cursor, changing colours, or reversing the order in which text reads).
 */

/**
 * C0 controls U+0000–U+001F, DEL U+007F, C1 controls U+0080–U+009F, the marks
 * U+200E/U+200F, embeddings and overrides U+202A–U+202E, isolates U+2066–U+2069,
 * and the Arabic letter mark U+061C (Unicode UAX #9, "Explicit directional formatting").
 */
// eslint-disable-next-line no-control-regex -- matching control characters is this pattern's purpose
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/gu;

/**
 * Escapes every control and bidirectional formatting character as `\u{hex}`.
 * A backslash itself is left as it is.
 *
 * @example escapeForTerminal('a\u202Eb') // 'a\\u{202e}b'
 */
export function escapeForTerminal(text: string): string {
  return text.replace(UNSAFE, (c) => `\\u{${c.codePointAt(0)!.toString(16)}}`);
}
