/**
 * A minimal XML reader for checking the manifest's structure in tests: it
 * handles the prolog, comments, elements, attributes and text, rejects
 * mismatched or unclosed tags, and decodes the five predefined entities.
 * It does not validate against a schema (Microsoft's validator is an online
 * service, unreachable here).
 */

export interface XmlElement {
  readonly name: string;
  readonly attributes: Readonly<Record<string, string>>;
  readonly children: XmlElement[];
  text: string;
}

function decode(text: string): string {
  return text.replace(/&(lt|gt|amp|quot|apos);/g, (_, e: string) => ({ lt: '<', gt: '>', amp: '&', quot: '"', apos: "'" })[e] as string);
}

const NAME = /[A-Za-z_][\w.:-]*/y;

export function parseXml(source: string): XmlElement {
  let pos = 0;
  const fail = (what: string): never => {
    const line = source.slice(0, pos).split('\n').length;
    throw new Error(`XML error at line ${line}: ${what}`);
  };
  const skipMisc = () => {
    for (;;) {
      const rest = source.slice(pos);
      const ws = /^\s+/.exec(rest);
      if (ws) {
        pos += ws[0].length;
        continue;
      }
      if (rest.startsWith('<?')) {
        const end = source.indexOf('?>', pos);
        if (end < 0) fail('unclosed <?');
        pos = end + 2;
        continue;
      }
      if (rest.startsWith('<!--')) {
        const end = source.indexOf('-->', pos);
        if (end < 0) fail('unclosed comment');
        pos = end + 3;
        continue;
      }
      return;
    }
  };
  const readName = (): string => {
    NAME.lastIndex = pos;
    const m = NAME.exec(source);
    if (!m) return fail('expected a name');
    pos += m[0].length;
    return m[0];
  };
  const readElement = (): XmlElement => {
    if (source[pos] !== '<') fail('expected <');
    pos++;
    const name = readName();
    const attributes: Record<string, string> = {};
    for (;;) {
      const ws = /^\s*/.exec(source.slice(pos)) as RegExpExecArray;
      pos += ws[0].length;
      if (source.startsWith('/>', pos)) {
        pos += 2;
        return { name, attributes, children: [], text: '' };
      }
      if (source[pos] === '>') {
        pos++;
        break;
      }
      const attr = readName();
      if (attr in attributes) fail(`attribute ${attr} repeated on <${name}>`);
      const eq = /^\s*=\s*(["'])/.exec(source.slice(pos));
      if (!eq) fail(`attribute ${attr} on <${name}> needs a quoted value`);
      pos += (eq as RegExpExecArray)[0].length;
      const quote = (eq as RegExpExecArray)[1];
      const end = source.indexOf(quote, pos);
      if (end < 0) fail(`unclosed value of ${attr}`);
      attributes[attr] = decode(source.slice(pos, end));
      pos = end + 1;
    }
    const element: XmlElement = { name, attributes, children: [], text: '' };
    for (;;) {
      if (pos >= source.length) fail(`<${name}> is never closed`);
      if (source.startsWith('<!--', pos)) {
        const end = source.indexOf('-->', pos);
        if (end < 0) fail('unclosed comment');
        pos = end + 3;
        continue;
      }
      if (source.startsWith('</', pos)) {
        pos += 2;
        const closing = readName();
        if (closing !== name) fail(`</${closing}> closes <${name}>`);
        const gt = /^\s*>/.exec(source.slice(pos));
        if (!gt) fail(`bad closing tag </${closing}`);
        pos += (gt as RegExpExecArray)[0].length;
        element.text = element.text.trim();
        return element;
      }
      if (source[pos] === '<') {
        element.children.push(readElement());
        continue;
      }
      const next = source.indexOf('<', pos);
      element.text += decode(source.slice(pos, next < 0 ? source.length : next));
      pos = next < 0 ? source.length : next;
    }
  };
  skipMisc();
  const root = readElement();
  skipMisc();
  if (pos !== source.length) fail('content after the root element');
  return root;
}

/** Every descendant (and the element itself) with the given name. */
export function findAll(element: XmlElement, name: string): XmlElement[] {
  const found = element.name === name ? [element] : [];
  for (const child of element.children) found.push(...findAll(child, name));
  return found;
}

/** The one child with the given name; throws if there is not exactly one. */
export function child(element: XmlElement, name: string): XmlElement {
  const matches = element.children.filter((c) => c.name === name);
  if (matches.length !== 1) throw new Error(`<${element.name}> has ${matches.length} <${name}> children; expected 1`);
  return matches[0];
}
