/**
 * The manifest asks for the least permission the add-in needs.
 *
 * Facts used (Microsoft documentation, Office Add-ins): the Permissions
 * element of a task pane add-in takes Restricted, ReadDocument,
 * ReadAllDocument, WriteDocument or ReadWriteDocument; "Restricted" is the
 * minimum level and enables activation and the Settings object API
 * ([MS-OWEMXML] 2.3.35 ST_Permissions1; "Requesting permissions for API use in
 * add-ins": Restricted = the methods of the Settings object and
 * Document.getActiveViewAsync). The higher levels add reading the document,
 * writing the selection, bindings and events. Driftcell's custom functions
 * return their values through the CustomFunctions runtime, and neither the
 * functions bundle nor the pane calls a document API, so Restricted suffices.
 * The source check below keeps it true: a new use of a document API must
 * raise the permission deliberately.
 */
import { readFileSync, readdirSync, statSync } from 'fs';
import path from 'path';
import { PROJECT_ROOT } from './support/build';
import { child, parseXml } from './support/xml';

const LEVELS = ['Restricted', 'ReadDocument', 'ReadAllDocument', 'WriteDocument', 'ReadWriteDocument'] as const;

/** Office.js calls that need more than Restricted (from the permission table of the same documentation). */
const DOCUMENT_APIS =
  /\b(Excel\.run|getSelectedDataAsync|setSelectedDataAsync|getFileAsync|getFilePropertiesAsync|goToByIdAsync|bindings\.|addHandlerAsync|customXmlParts|\.setDataAsync|\.getDataAsync)\b/;

function sourceFiles(folder: string): string[] {
  return readdirSync(folder).flatMap((name) => {
    const full = path.join(folder, name);
    return statSync(full).isDirectory() ? sourceFiles(full) : /\.(ts|html)$/.test(name) ? [full] : [];
  });
}

describe('the manifest permission', () => {
  const manifest = parseXml(readFileSync(path.join(PROJECT_ROOT, 'manifest', 'manifest.xml'), 'utf8'));

  it("is ReadWriteDocument, the level the pane's workbook writes need (Excel.run)", () => {
    const permission = child(manifest, 'Permissions').text.trim();
    expect(LEVELS).toContain(permission);
    expect(permission).toBe('ReadWriteDocument');
  });

  it('document APIs are called only by the Excel adapter of the pane', () => {
    const files = [...sourceFiles(path.join(PROJECT_ROOT, 'src', 'excel')), ...sourceFiles(path.join(PROJECT_ROOT, 'src', 'taskpane'))];
    expect(files.length).toBeGreaterThan(0);
    const users = files.filter((file) => DOCUMENT_APIS.test(readFileSync(file, 'utf8'))).map((file) => path.relative(PROJECT_ROOT, file));
    expect(users).toEqual([path.join('src', 'taskpane', 'excelPort.ts')]);
  });
});
