/**
 * Reads the raw XML of a written .xlsx package, for asserting what Excel
 * itself will read: array-formula markup, cached values, metadata parts.
 */
import JSZip from 'jszip';

export interface XmlCell {
  readonly address: string;
  /** Attributes of the `<c>` element (r, s, t, cm …). */
  readonly attributes: Record<string, string>;
  /** The `<f>` element, if any: its text and attributes (t, ref …). */
  readonly formula?: { readonly text: string; readonly attributes: Record<string, string> };
  /** The cached value: text of `<v>`, shared strings resolved. */
  readonly value?: string;
}

function attributes(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const match of text.matchAll(/([\w:]+)="([^"]*)"/g)) out[match[1]] = match[2];
  return out;
}

function unescape(text: string): string {
  return text
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

export async function openPackage(bytes: Buffer): Promise<JSZip> {
  return JSZip.loadAsync(bytes);
}

export async function partText(zip: JSZip, path: string): Promise<string | undefined> {
  return zip.file(path)?.async('string');
}

/** Worksheet part path for a sheet name, via workbook.xml and its relationships. */
async function sheetPart(zip: JSZip, sheet: string): Promise<string> {
  const workbook = (await partText(zip, 'xl/workbook.xml')) ?? '';
  const rels = (await partText(zip, 'xl/_rels/workbook.xml.rels')) ?? '';
  const sheetTag = [...workbook.matchAll(/<sheet\s([^>]*)\/?>/g)].map((m) => attributes(m[1])).find((a) => unescape(a.name) === sheet);
  if (!sheetTag) throw new Error(`no sheet ${sheet} in workbook.xml`);
  const rel = [...rels.matchAll(/<Relationship\s([^>]*)\/?>/g)].map((m) => attributes(m[1])).find((a) => a.Id === sheetTag['r:id']);
  if (!rel) throw new Error(`no relationship for sheet ${sheet}`);
  return rel.Target.startsWith('/') ? rel.Target.slice(1) : `xl/${rel.Target}`;
}

async function sharedStrings(zip: JSZip): Promise<string[]> {
  const xml = (await partText(zip, 'xl/sharedStrings.xml')) ?? '';
  return [...xml.matchAll(/<si>([\s\S]*?)<\/si>/g)].map((m) =>
    unescape([...m[1].matchAll(/<t[^>]*>([\s\S]*?)<\/t>/g)].map((t) => t[1]).join('')),
  );
}

/** Every `<c>` of a sheet by address. */
export async function sheetCells(zip: JSZip, sheet: string): Promise<Map<string, XmlCell>> {
  const xml = (await partText(zip, await sheetPart(zip, sheet))) ?? '';
  const strings = await sharedStrings(zip);
  const cells = new Map<string, XmlCell>();
  for (const match of xml.matchAll(/<c\s([^>]*?)(?:\/>|>([\s\S]*?)<\/c>)/g)) {
    const attrs = attributes(match[1]);
    const body = match[2] ?? '';
    const f = /<f([^>]*?)\/>|<f([^>]*)>([\s\S]*?)<\/f>/.exec(body);
    const v = /<v>([\s\S]*?)<\/v>/.exec(body);
    let value = v ? unescape(v[1]) : undefined;
    if (value !== undefined && attrs.t === 's') value = strings[Number(value)];
    cells.set(attrs.r, {
      address: attrs.r,
      attributes: attrs,
      formula: f ? { text: unescape(f[3] ?? ''), attributes: attributes(f[1] ?? f[2] ?? '') } : undefined,
      value,
    });
  }
  return cells;
}

/** A1 addresses of a rectangular range such as `B2:C4`, row by row. */
export function addressesOf(ref: string): string[] {
  const [start, end = start] = ref.split(':');
  const parse = (a: string) => {
    const m = /^([A-Z]+)(\d+)$/.exec(a);
    if (!m) throw new Error(`bad address ${a}`);
    return { col: [...m[1]].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0), row: Number(m[2]) };
  };
  const letters = (n: number): string => (n <= 0 ? '' : letters(Math.floor((n - 1) / 26)) + String.fromCharCode(65 + ((n - 1) % 26)));
  const a = parse(start);
  const b = parse(end);
  const out: string[] = [];
  for (let r = a.row; r <= b.row; r++) for (let c = a.col; c <= b.col; c++) out.push(`${letters(c)}${r}`);
  return out;
}
