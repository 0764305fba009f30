/**
 * Marks array formulas in a written .xlsx package as dynamic arrays, so that
 * Excel 365 opens them as spills (resizable, no braces) rather than as fixed
 * legacy array formulas.
 *
 * Excel stores a dynamic-array formula as an array formula (`<f t="array"
 * ref="B2:B21">` on the anchor cell, cached `<v>` values in every cell of the
 * range) whose anchor cell carries `cm="1"`, pointing at a cell-metadata
 * block of type XLDAPR with `fDynamic="1"` in xl/metadata.xml. The part's
 * content type and relationship type are the sheet-metadata part of ECMA-376
 * Part 1 (§12.3.10); the XLDAPR block is Microsoft's dynamic-array extension
 * to it ([MS-XLSX], from memory). The XML below was written from memory and
 * then checked against the block SheetJS writes (modules/51_xlmeta.js) and the
 * `<c … cm="1"><f t="array" ref=…>` cell form of XlsxWriter's test fixtures.
 *
 * exceljs writes the array formulas themselves; this module only adds the
 * metadata part and the cell attribute. A package that already has a
 * metadata part is left as it is (its formulas stay legacy array formulas).
 */
import JSZip from 'jszip';

const METADATA_PART = 'xl/metadata.xml';
const METADATA_CONTENT_TYPE = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml';
const METADATA_RELATIONSHIP = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata';

/** The one cell-metadata record (index 1 for `cm`) that says "dynamic array". */
const METADATA_XML =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
  '<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" ' +
  'xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">' +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" ' +
  'pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" ' +
  'coerce="1" cellMeta="1"/></metadataTypes>' +
  '<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}">' +
  '<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>' +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>';

/** The anchor cells of array formulas to mark, per sheet name. */
export type AnchorsBySheet = ReadonlyMap<string, readonly string[]>;

function decodeXmlText(text: string): string {
  return text
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

function attribute(tag: string, name: string): string | undefined {
  const match = new RegExp(`\\s${name}="([^"]*)"`).exec(tag);
  return match ? decodeXmlText(match[1]) : undefined;
}

/** Sheet name → worksheet part path, read from workbook.xml and its relationships. */
async function sheetParts(zip: JSZip): Promise<Map<string, string>> {
  const workbook = await zip.file('xl/workbook.xml')?.async('string');
  const rels = await zip.file('xl/_rels/workbook.xml.rels')?.async('string');
  if (workbook === undefined || rels === undefined) throw new Error('the written package has no workbook part');
  const targets = new Map<string, string>();
  for (const tag of rels.match(/<Relationship\s[^>]*>/g) ?? []) {
    const id = attribute(tag, 'Id');
    const target = attribute(tag, 'Target');
    if (id !== undefined && target !== undefined) {
      targets.set(id, target.startsWith('/') ? target.slice(1) : `xl/${target}`);
    }
  }
  const parts = new Map<string, string>();
  for (const tag of workbook.match(/<sheet\s[^>]*>/g) ?? []) {
    const name = attribute(tag, 'name');
    const id = attribute(tag, 'r:id');
    const part = id === undefined ? undefined : targets.get(id);
    if (name !== undefined && part !== undefined) parts.set(name, part);
  }
  return parts;
}

function nextRelationshipId(rels: string): string {
  const used = [...rels.matchAll(/\sId="rId(\d+)"/g)].map((m) => Number(m[1]));
  return `rId${Math.max(0, ...used) + 1}`;
}

/** Adds `cm="1"` to the `<c>` start tag of each anchor cell. */
function markAnchors(sheetXml: string, anchors: readonly string[]): string {
  let xml = sheetXml;
  for (const address of anchors) {
    const tag = new RegExp(`<c r="${address}"(?=[\\s>/])`);
    if (!tag.test(xml)) throw new Error(`array formula cell ${address} is missing from the written sheet`);
    xml = xml.replace(tag, `<c r="${address}" cm="1"`);
  }
  return xml;
}

/**
 * Rewrites an .xlsx package so that the given array-formula anchors are
 * dynamic arrays.
 *
 * @param packageBytes - an .xlsx written by exceljs, with `<f t="array" ref=…>` on every anchor
 * @param anchors - sheet name → anchor cell addresses (A1 style)
 * @returns the rewritten package; unchanged if there is nothing to mark or a metadata part exists
 * @example await markDynamicArrays(bytes, new Map([['Sweep', ['C8']]]))
 */
export async function markDynamicArrays(packageBytes: Buffer, anchors: AnchorsBySheet): Promise<Buffer> {
  const total = [...anchors.values()].reduce((n, list) => n + list.length, 0);
  if (total === 0) return packageBytes;
  const zip = await JSZip.loadAsync(packageBytes);
  if (zip.file(METADATA_PART) !== null) return packageBytes;

  const parts = await sheetParts(zip);
  for (const [sheet, addresses] of anchors) {
    if (addresses.length === 0) continue;
    const part = parts.get(sheet);
    const xml = part === undefined ? undefined : await zip.file(part)?.async('string');
    if (part === undefined || xml === undefined) throw new Error(`sheet "${sheet}" is missing from the written package`);
    zip.file(part, markAnchors(xml, addresses));
  }

  zip.file(METADATA_PART, METADATA_XML);
  const contentTypes = await zip.file('[Content_Types].xml')?.async('string');
  const rels = await zip.file('xl/_rels/workbook.xml.rels')?.async('string');
  if (contentTypes === undefined || rels === undefined) throw new Error('the written package has no content types');
  zip.file(
    '[Content_Types].xml',
    contentTypes.replace('</Types>', `<Override PartName="/${METADATA_PART}" ContentType="${METADATA_CONTENT_TYPE}"/></Types>`),
  );
  zip.file(
    'xl/_rels/workbook.xml.rels',
    rels.replace(
      '</Relationships>',
      `<Relationship Id="${nextRelationshipId(rels)}" Type="${METADATA_RELATIONSHIP}" Target="metadata.xml"/></Relationships>`,
    ),
  );
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
}
