/**
 * Which array formulas of a package are dynamic arrays (spills) and which are
 * legacy array formulas (entered over a fixed range with Ctrl+Shift+Enter).
 * exceljs reads both as `shareType: 'array'` with a `ref`; the difference is
 * the `cm` attribute of the anchor cell, pointing at the dynamic-array
 * cell-metadata block of xl/metadata.xml (see dynamicArrays.ts). A package
 * without a metadata part has only legacy array formulas.
 *
 * The range of a legacy array formula belongs to it whatever its result's
 * size (recalculateWorkbook keeps it); the range of a spill follows its result.
 */
import { posix } from 'node:path';
import JSZip from 'jszip';

/** Anchor cells (A1, upper case) of dynamic-array formulas, per sheet name. */
export type DynamicAnchors = ReadonlyMap<string, ReadonlySet<string>>;

const ATTRIBUTE = (name: string) => new RegExp(`\\b${name}="([^"]*)"`);
/** A cell start tag with `cm`, directly followed by an array formula. */
const DYNAMIC_ANCHOR = /<c\b([^>]*\bcm="[^"]*"[^>]*)>\s*<f\b[^>]*\bt="array"/g;

function decoded(value: string): string {
  return value
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

/**
 * The dynamic-array anchors of each sheet.
 *
 * @param bytes - an .xlsx package that passed checkPackage
 * @returns sheet name → anchors; empty when the package has no metadata part
 * @example (await dynamicArrayAnchors(bytes)).get('Sheet1')?.has('B2') // true for a spill anchored at B2
 */
export async function dynamicArrayAnchors(bytes: Buffer): Promise<DynamicAnchors> {
  const result = new Map<string, Set<string>>();
  const zip = await JSZip.loadAsync(bytes);
  const hasMetadata = Object.keys(zip.files).some((name) => name.replace(/^\//, '').toLowerCase() === 'xl/metadata.xml');
  if (!hasMetadata) return result;
  const workbook = (await zip.file('xl/workbook.xml')?.async('string')) ?? '';
  const rels = (await zip.file('xl/_rels/workbook.xml.rels')?.async('string')) ?? '';
  const targets = new Map<string, string>();
  for (const tag of rels.match(/<Relationship\b[^>]*>/g) ?? []) {
    const id = ATTRIBUTE('Id').exec(tag)?.[1];
    const target = ATTRIBUTE('Target').exec(tag)?.[1];
    if (id !== undefined && target !== undefined)
      targets.set(id, target.startsWith('/') ? target.slice(1) : posix.normalize(posix.join('xl', target)));
  }
  for (const tag of workbook.match(/<sheet\b[^>]*>/g) ?? []) {
    const name = decoded(ATTRIBUTE('name').exec(tag)?.[1] ?? '');
    const part = targets.get(ATTRIBUTE('r:id').exec(tag)?.[1] ?? '');
    const xml = part === undefined ? undefined : await zip.file(part)?.async('string');
    if (xml === undefined || !xml.includes('cm="')) continue;
    const anchors = new Set<string>();
    for (const match of xml.matchAll(DYNAMIC_ANCHOR)) {
      const address = ATTRIBUTE('r').exec(match[1])?.[1];
      if (address !== undefined) anchors.add(address.toUpperCase());
    }
    result.set(name, anchors);
  }
  return result;
}
