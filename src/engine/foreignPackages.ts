/**
 * Packages written by other programs, made readable for exceljs, and what
 * recalc cannot carry into its copy, said in one line each.
 *
 * exceljs 4.4 expects relationship targets relative to their part and
 * comment/VML parts under Excel's own names; openpyxl writes absolute targets
 * (`/xl/worksheets/sheet1.xml`) and `xl/comments/comment1.xml`, and exceljs
 * then fails with internal text ("reading 'anchors'"). Both are legal Open
 * Packaging Conventions (ECMA-376 Part 2: a part name is an absolute URI
 * path; relationship targets may be absolute or relative), so the package is
 * rewritten to the form exceljs reads before it loads it. Charts, pivot tables
 * and macros are not carried by exceljs: they are dropped, with a notice, and
 * a chart's drawing is unhooked so exceljs does not stumble on it.
 */
import { posix } from 'node:path';
import JSZip from 'jszip';

/** A package ready for exceljs, and what the copy will lack. */
export interface PreparedPackage {
  readonly bytes: Buffer;
  readonly notices: readonly string[];
}

/** Excel's limit on a sheet name's length (Excel's specifications and limits; common practice, no source). */
export const MAX_SHEET_NAME_LENGTH = 31;

/** A package we refuse, with the real cause. */
export class ForeignPackageRefused extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ForeignPackageRefused';
  }
}

const RELATIONSHIP = /<Relationship\b[^>]*>/g;
const ATTRIBUTE = (name: string) => new RegExp(`\\b${name}="([^"]*)"`);
const COMMENTS_TYPE = /\/relationships\/comments$/;
const VML_TYPE = /\/relationships\/vmlDrawing$/;
const DRAWING_TYPE = /\/relationships\/drawing$/;

/** The folder a .rels part's targets are relative to: `xl/worksheets/_rels/sheet1.xml.rels` → `xl/worksheets`. */
function sourceFolder(relsPart: string): string {
  return posix.dirname(posix.dirname(relsPart)).replace(/^\.$/, '');
}

function absolutePart(folder: string, target: string): string {
  return target.startsWith('/') ? target.slice(1) : posix.normalize(posix.join(folder, target));
}

function decoded(value: string): string {
  return value
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&');
}

/**
 * Prepares a package for exceljs.
 *
 * @param bytes - an .xlsx package that passed checkPackage
 * @returns the bytes exceljs should read (the same bytes when nothing needed changing) and notices
 * @throws ForeignPackageRefused for a sheet name Excel itself would not accept
 * @example (await preparePackage(openpyxlBytes)).notices // ['sheet "Data": 1 chart not carried into the copy']
 */
export async function preparePackage(bytes: Buffer): Promise<PreparedPackage> {
  const zip = await JSZip.loadAsync(bytes);
  const notices: string[] = [];
  const workbook = await zip.file('xl/workbook.xml')?.async('string');
  const sheetNames = new Map<string, string>();
  if (workbook !== undefined) {
    for (const tag of workbook.match(/<sheet\b[^>]*>/g) ?? []) {
      const name = decoded(ATTRIBUTE('name').exec(tag)?.[1] ?? '');
      const id = ATTRIBUTE('r:id').exec(tag)?.[1];
      if ([...name].length > MAX_SHEET_NAME_LENGTH) {
        throw new ForeignPackageRefused(
          `sheet name "${name}" has ${[...name].length} characters; Excel allows at most ` +
            `${MAX_SHEET_NAME_LENGTH}: rename the sheet and save again`,
        );
      }
      if (id !== undefined) sheetNames.set(id, name);
    }
  }
  const sheetOfPart = await sheetPartNames(zip, sheetNames);

  const count = (prefix: string) => Object.keys(zip.files).filter((n) => n.startsWith(prefix) && !zip.files[n].dir).length;
  const pivots = count('xl/pivotTables/');
  if (pivots > 0) notices.push(`${pivots} pivot table${pivots === 1 ? '' : 's'} not carried into the copy`);
  if (zip.file('xl/vbaProject.bin') !== null) notices.push('macros (vbaProject.bin) not carried into the copy');

  let changed = false;
  const renames = new Map<string, string>();
  let nextComments = 1;
  let nextVml = 1;
  const relsParts = Object.keys(zip.files).filter((n) => n.endsWith('.rels') && !zip.files[n].dir);
  // First pass: part renames exceljs needs (comments and their VML under Excel's own names).
  for (const rels of relsParts) {
    const text = await zip.file(rels)?.async('string');
    if (text === undefined) continue;
    const folder = sourceFolder(rels);
    for (const tag of text.match(RELATIONSHIP) ?? []) {
      const type = ATTRIBUTE('Type').exec(tag)?.[1] ?? '';
      const target = ATTRIBUTE('Target').exec(tag)?.[1];
      if (target === undefined || /TargetMode="External"/.test(tag)) continue;
      const part = absolutePart(folder, target);
      if (COMMENTS_TYPE.test(type) && !/^xl\/comments\d+\.xml$/.test(part)) {
        while (zip.file(`xl/comments${nextComments}.xml`) !== null) nextComments++;
        renames.set(part, `xl/comments${nextComments++}.xml`);
      }
      if (VML_TYPE.test(type) && !/^xl\/drawings\/vmlDrawing\d+\.vml$/.test(part)) {
        while (zip.file(`xl/drawings/vmlDrawing${nextVml}.vml`) !== null) nextVml++;
        renames.set(part, `xl/drawings/vmlDrawing${nextVml++}.vml`);
      }
    }
  }
  // Second pass: relative targets, renamed parts, charts' drawings unhooked.
  for (const rels of relsParts) {
    // A chart drawing's own .rels may have gone with it earlier in this loop.
    const text = await zip.file(rels)?.async('string');
    if (text === undefined) continue;
    const folder = sourceFolder(rels);
    const sourcePart = posix.join(folder, posix.basename(rels, '.rels'));
    let rewritten = text;
    for (const tag of text.match(RELATIONSHIP) ?? []) {
      const type = ATTRIBUTE('Type').exec(tag)?.[1] ?? '';
      const target = ATTRIBUTE('Target').exec(tag)?.[1];
      if (target === undefined || /TargetMode="External"/.test(tag)) continue;
      const part = absolutePart(folder, target);
      if (DRAWING_TYPE.test(type) && (await drawingHasChart(zip, part))) {
        const charts = await chartCount(zip, part);
        const sheet = sheetOfPart.get(sourcePart);
        notices.push(
          `${sheet !== undefined ? `sheet "${sheet}": ` : ''}${charts} ` + `chart${charts === 1 ? '' : 's'} not carried into the copy`,
        );
        rewritten = rewritten.replace(tag, '');
        const id = ATTRIBUTE('Id').exec(tag)?.[1];
        await unhookDrawing(zip, sourcePart, id);
        // exceljs parses every drawing part it finds, hooked or not: the chart's drawing goes.
        zip.remove(part);
        zip.remove(`${posix.dirname(part)}/_rels/${posix.basename(part)}.rels`);
        changed = true;
        continue;
      }
      const final = renames.get(part) ?? part;
      const relative = posix.relative(folder, final);
      if (target.startsWith('/') || final !== part) {
        rewritten = rewritten.replace(tag, tag.replace(ATTRIBUTE('Target'), `Target="${relative}"`));
        changed = true;
      }
    }
    if (rewritten !== text) zip.file(rels, rewritten);
  }
  for (const [from, to] of renames) {
    const data = await zip.file(from)?.async('string');
    if (data === undefined) continue;
    zip.remove(from);
    zip.file(to, data);
    changed = true;
  }
  for (const name of Object.keys(zip.files).filter((n) => /^xl\/comments\d+\.xml$/.test(n))) {
    const text = await zip.file(name)!.async('string');
    const runs = withTextRuns(text);
    if (runs !== text) {
      zip.file(name, runs);
      changed = true;
    }
  }
  if (renames.size > 0) {
    const types = await zip.file('[Content_Types].xml')?.async('string');
    if (types !== undefined) {
      let next = types;
      for (const [from, to] of renames) next = next.split(`PartName="/${from}"`).join(`PartName="/${to}"`);
      if (!/Extension="vml"/.test(next) && [...renames.values()].some((p) => p.endsWith('.vml'))) {
        next = next.replace(
          '<Default ',
          '<Default Extension="vml" ' + 'ContentType="application/vnd.openxmlformats-officedocument.vmlDrawing"/><Default ',
        );
      }
      zip.file('[Content_Types].xml', next);
    }
  }
  if (!changed) return { bytes, notices };
  return { bytes: await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' }), notices };
}

/**
 * A comment's text as a run: exceljs reads only `<text><r><t>…</t></r></text>`
 * and drops the plain `<text><t>…</t></text>` other writers use (both are in
 * the schema, ECMA-376 Part 1 §18.7.7 CT_Rst: `t` or runs `r`).
 */
function withTextRuns(comments: string): string {
  return comments.replace(/<text>\s*(<t\b[^>]*>[\s\S]*?<\/t>)\s*<\/text>/g, '<text><r>$1</r></text>');
}

/** Worksheet part name → sheet name, from the workbook's relationships. */
async function sheetPartNames(zip: JSZip, sheetNames: ReadonlyMap<string, string>): Promise<Map<string, string>> {
  const result = new Map<string, string>();
  const rels = await zip.file('xl/_rels/workbook.xml.rels')?.async('string');
  for (const tag of rels?.match(RELATIONSHIP) ?? []) {
    const id = ATTRIBUTE('Id').exec(tag)?.[1];
    const target = ATTRIBUTE('Target').exec(tag)?.[1];
    const name = id !== undefined ? sheetNames.get(id) : undefined;
    if (name !== undefined && target !== undefined) result.set(absolutePart('xl', target), name);
  }
  return result;
}

async function drawingRelationships(zip: JSZip, drawingPart: string): Promise<string[]> {
  const rels = `${posix.dirname(drawingPart)}/_rels/${posix.basename(drawingPart)}.rels`;
  const text = await zip.file(rels)?.async('string');
  return text?.match(RELATIONSHIP) ?? [];
}

async function drawingHasChart(zip: JSZip, drawingPart: string): Promise<boolean> {
  return (await chartCount(zip, drawingPart)) > 0;
}

async function chartCount(zip: JSZip, drawingPart: string): Promise<number> {
  return (await drawingRelationships(zip, drawingPart)).filter((tag) => /\/relationships\/chart"/.test(tag)).length;
}

/** Removes the sheet's `<drawing r:id="…"/>` that points at a dropped chart drawing. */
async function unhookDrawing(zip: JSZip, sheetPart: string, id: string | undefined): Promise<void> {
  const sheet = await zip.file(sheetPart)?.async('string');
  if (sheet === undefined || id === undefined) return;
  const next = sheet.replace(new RegExp(`<(?:\\w+:)?drawing\\b[^>]*\\br:id="${id.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}"[^>]*/>`), '');
  if (next !== sheet) zip.file(sheetPart, next);
}
