/**
 * A few DOM helpers for the pane's tools: plain elements, no framework.
 * Every control the tools build goes through `labelledControl`, so none is
 * left without a label.
 */
import { parseDecimalText } from '../catalog/parameters';

/** Attributes and properties for `element`: strings become attributes, `text` the text content. */
export type ElementOptions = Readonly<Record<string, string | boolean | undefined>> & { readonly text?: string };

/**
 * Creates an element with attributes and children.
 *
 * @param doc - the pane's document
 * @param tag - element name
 * @param options - attributes (false/undefined omitted, true as empty), `text` for text content
 * @param children - appended in order
 * @example element(document, 'button', { type: 'button', text: 'Check' })
 */
export function element<K extends keyof HTMLElementTagNameMap>(
  doc: Document,
  tag: K,
  options: ElementOptions = {},
  children: readonly (Node | string)[] = [],
): HTMLElementTagNameMap[K] {
  const node = doc.createElement(tag);
  for (const [name, value] of Object.entries(options)) {
    if (name === 'text') node.textContent = String(value ?? '');
    else if (value === true) node.setAttribute(name, '');
    else if (typeof value === 'string') node.setAttribute(name, value);
  }
  for (const child of children) node.append(typeof child === 'string' ? doc.createTextNode(child) : child);
  return node;
}

/**
 * A text input for a number: typed as text so that 1e15 stays as typed
 * (parseNumberField reads it), with the decimal keypad on touch screens and
 * neither autocomplete nor spell checking.
 *
 * @param doc - the pane's document
 * @param id - the input's id (its label's `for`)
 * @param placeholder - optional hint shown while the field is empty
 * @example numberInput(document, 'dc-certificate-needed-min', 'e.g. 1e15')
 */
export function numberInput(doc: Document, id: string, placeholder?: string): HTMLInputElement {
  return element(doc, 'input', { type: 'text', id, inputmode: 'decimal', autocomplete: 'off', spellcheck: 'false', placeholder });
}

/**
 * A labelled field: `<div class="dc-field"><label for=id>…</label>control</div>`.
 *
 * @param doc - document
 * @param label - visible label text
 * @param control - input or select; its id must be set
 * @param hint - optional help text, tied to the control by aria-describedby
 */
export function labelledControl(doc: Document, label: string, control: HTMLElement, hint?: string): HTMLDivElement {
  const field = element(doc, 'div', { class: 'dc-field' }, [element(doc, 'label', { for: control.id, text: label }), control]);
  if (hint !== undefined) {
    const hintId = `${control.id}-hint`;
    control.setAttribute('aria-describedby', hintId);
    field.append(element(doc, 'p', { class: 'dc-hint', id: hintId, text: hint }));
  }
  return field;
}

/**
 * A checkbox with its label and a hint the box is described by: div.dc-field.dc-check [input, label, p.dc-hint].
 *
 * @param doc - document
 * @param input - the checkbox (its id names the label's target and the hint's id, `${id}-hint`)
 * @param label - label text
 * @param hint - hint text below
 */
export function checkField(doc: Document, input: HTMLInputElement, label: string, hint: string): HTMLDivElement {
  const hintId = `${input.id}-hint`;
  input.setAttribute('aria-describedby', hintId);
  return element(doc, 'div', { class: 'dc-field dc-check' }, [
    input,
    element(doc, 'label', { for: input.id, text: label }),
    element(doc, 'p', { class: 'dc-hint', id: hintId, text: hint }),
  ]);
}

/**
 * A <select> of options.
 *
 * @param doc - document
 * @param id - element id
 * @param options - [value, label] pairs
 * @param selected - value to select
 */
export function selectOf(doc: Document, id: string, options: readonly (readonly [string, string])[], selected: string): HTMLSelectElement {
  const select = element(doc, 'select', { id });
  for (const [value, label] of options) {
    const option = element(doc, 'option', { value, text: label });
    option.selected = value === selected;
    select.append(option);
  }
  return select;
}

/**
 * Reads a number typed by the user ('1e15', '2.5E+16', ' 300 ') in decimal notation only, as a
 * spreadsheet does: '0x10', '1,5' or '1e400' are refused.
 *
 * @param text - field text
 * @param what - what the field is, for the message
 * @returns the number, or null when the field is blank
 * @throws Error saying what was typed and what is allowed
 * @example parseNumberField('1e15', 'Needed doping min') // 1e15
 */
export function parseNumberField(text: string, what: string): number | null {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const value = parseDecimalText(trimmed);
  if (value === null) {
    throw new Error(`${what}: '${trimmed}' is not a number; type digits with a point for decimals, e.g. 1e15 or 2.5E+16.`);
  }
  return value;
}
