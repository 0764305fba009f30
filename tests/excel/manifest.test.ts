/**
 * manifest/manifest.xml, checked offline. office-addin-manifest's `validate`
 * posts the file to Microsoft's online validation service, which is out of
 * reach here; instead the XML is parsed and its structure checked against
 * what custom functions in a shared runtime need (Office add-ins
 * documentation: "Configure your Office Add-in to use a shared runtime",
 * "Manually create JSON metadata for custom functions").
 */
import { existsSync, readFileSync } from 'fs';
import path from 'path';
import { spawnSync } from 'child_process';
import { NAMESPACE } from '../../src/catalog';
import { ADDIN_ORIGIN } from '../../src/excel/origin';
import { ADDIN_DIR, PROJECT_ROOT, requireAddinBuild } from './support/build';
import { child, findAll, parseXml, type XmlElement } from './support/xml';

const MANIFEST = path.join(PROJECT_ROOT, 'manifest', 'manifest.xml');
const root = parseXml(readFileSync(MANIFEST, 'utf8'));
const overrides = child(root, 'VersionOverrides');
const resources = child(overrides, 'Resources');

/** Resource id -> DefaultValue, per resource kind. */
function resourceTable(kind: string): Map<string, string> {
  const container = child(resources, kind);
  return new Map(container.children.map((e) => [e.attributes.id, e.attributes.DefaultValue]));
}
const urls = resourceTable('bt:Urls');
const images = resourceTable('bt:Images');
const shortStrings = resourceTable('bt:ShortStrings');
const longStrings = resourceTable('bt:LongStrings');

function urlOf(element: XmlElement): string | undefined {
  return urls.get(element.attributes.resid);
}

describe('manifest.xml', () => {
  it('is an add-in-only TaskPaneApp manifest for Excel workbooks', () => {
    expect(root.name).toBe('OfficeApp');
    expect(root.attributes['xsi:type']).toBe('TaskPaneApp');
    expect(root.attributes.xmlns).toBe('http://schemas.microsoft.com/office/appforoffice/1.1');
    expect(findAll(child(root, 'Hosts'), 'Host').map((h) => h.attributes.Name)).toEqual(['Workbook']);
  });

  it('carries our own identity', () => {
    expect(child(root, 'Id').text).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect(child(root, 'ProviderName').text).toBe('Driftcell contributors');
    expect(child(root, 'DisplayName').attributes.DefaultValue).toBe('Driftcell');
    const description = child(root, 'Description').attributes.DefaultValue;
    expect(description.length).toBeGreaterThan(20);
    expect(description.length).toBeLessThanOrEqual(250);
  });

  it('reads the same through office-addin-manifest (its offline parser, not the online validator)', () => {
    // In a child Node process: the package loads ES-module dependencies that jest's CommonJS runtime cannot.
    const script = `require('office-addin-manifest').OfficeAddinManifest.readManifestFile(process.argv[1]).then((i) => process.stdout.write(JSON.stringify(i)))`;
    const run = spawnSync(process.execPath, ['-e', script, MANIFEST], { cwd: PROJECT_ROOT, encoding: 'utf8', timeout: 60000 });
    expect(run.stderr).toBe('');
    const info = JSON.parse(run.stdout) as Record<string, unknown>;
    expect(info.id).toBe(child(root, 'Id').text);
    expect(info.displayName).toBe('Driftcell');
    expect(info.providerName).toBe('Driftcell contributors');
    expect(info.hosts).toEqual(['Workbook']);
    expect(info.officeAppType).toBe('TaskPaneApp');
  });

  it('asks for the shared runtime, long-lived, on the task pane page', () => {
    const sets = findAll(child(root, 'Requirements'), 'Set').map((s) => s.attributes.Name);
    expect(sets).toContain('SharedRuntime');
    // CustomFunctions.Error/ErrorCode, which the functions return, are CustomFunctionsRuntime 1.2 (Office API reference).
    const customFunctions = findAll(child(root, 'Requirements'), 'Set').find((s) => s.attributes.Name === 'CustomFunctionsRuntime');
    expect(customFunctions?.attributes.MinVersion).toBe('1.2');
    const runtimes = findAll(overrides, 'Runtime');
    expect(runtimes).toHaveLength(1);
    expect(runtimes[0].attributes.lifetime).toBe('long');
    expect(urlOf(runtimes[0])).toBe(`${ADDIN_ORIGIN}/taskpane.html`);
  });

  it('declares the custom functions: script, shared page, metadata and the DRIFT namespace', () => {
    const point = findAll(overrides, 'ExtensionPoint').find((e) => e.attributes['xsi:type'] === 'CustomFunctions');
    if (point === undefined) throw new Error('no CustomFunctions extension point');
    expect(urlOf(child(child(point, 'Script'), 'SourceLocation'))).toBe(`${ADDIN_ORIGIN}/functions.js`);
    expect(urlOf(child(child(point, 'Page'), 'SourceLocation'))).toBe(`${ADDIN_ORIGIN}/taskpane.html`);
    expect(urlOf(child(child(point, 'Metadata'), 'SourceLocation'))).toBe(`${ADDIN_ORIGIN}/functions.json`);
    expect(shortStrings.get(child(point, 'Namespace').attributes.resid)).toBe(NAMESPACE);
  });

  it('opens the pane from a ribbon button in the same runtime', () => {
    const action = findAll(overrides, 'Action').find((a) => a.attributes['xsi:type'] === 'ShowTaskpane');
    if (action === undefined) throw new Error('no ShowTaskpane action');
    expect(urlOf(child(action, 'SourceLocation'))).toBe(`${ADDIN_ORIGIN}/taskpane.html`);
    // Under a long-lived shared runtime the pane is the runtime's page: no TaskpaneId of its own.
    expect(action.children.map((c) => c.name)).not.toContain('TaskpaneId');
    const desktop = child(child(child(overrides, 'Hosts'), 'Host'), 'DesktopFormFactor');
    expect(urlOf(child(desktop, 'FunctionFile'))).toBe(`${ADDIN_ORIGIN}/taskpane.html`);
  });

  it('defines every resource id it references, once', () => {
    for (const kind of ['bt:Urls', 'bt:Images', 'bt:ShortStrings', 'bt:LongStrings']) {
      const ids = child(resources, kind).children.map((e) => e.attributes.id);
      expect(new Set(ids).size).toBe(ids.length);
    }
    const defined = new Set([...urls.keys(), ...images.keys(), ...shortStrings.keys(), ...longStrings.keys()]);
    const walk = (e: XmlElement): string[] => [e.attributes.resid, ...e.children.flatMap(walk)].filter((r): r is string => r !== undefined);
    for (const resid of walk(overrides)) expect(defined.has(resid)).toBe(true);
  });

  it('keeps short strings within 125 characters and long strings within 250', () => {
    for (const value of shortStrings.values()) expect(value.length).toBeLessThanOrEqual(125);
    for (const value of longStrings.values()) expect(value.length).toBeLessThanOrEqual(250);
  });

  it('serves everything from the development origin', () => {
    const all = [
      ...urls.values(),
      ...images.values(),
      child(root, 'IconUrl').attributes.DefaultValue,
      child(root, 'HighResolutionIconUrl').attributes.DefaultValue,
      child(root, 'SupportUrl').attributes.DefaultValue,
      child(child(root, 'DefaultSettings'), 'SourceLocation').attributes.DefaultValue,
    ];
    for (const url of all) expect(url.startsWith(`${ADDIN_ORIGIN}/`)).toBe(true);
  });

  it('points its icons at our PNGs, each of the size it declares', () => {
    const sizeOf = (file: string) => {
      const png = readFileSync(file);
      return [png.readUInt32BE(16), png.readUInt32BE(20)];
    };
    for (const image of findAll(overrides, 'bt:Image').filter((i) => i.attributes.size !== undefined)) {
      const url = images.get(image.attributes.resid) as string;
      const size = Number(image.attributes.size);
      expect(sizeOf(path.join(PROJECT_ROOT, new URL(url).pathname))).toEqual([size, size]);
    }
    expect(sizeOf(path.join(PROJECT_ROOT, new URL(child(root, 'IconUrl').attributes.DefaultValue).pathname))).toEqual([32, 32]);
    expect(sizeOf(path.join(PROJECT_ROOT, new URL(child(root, 'HighResolutionIconUrl').attributes.DefaultValue).pathname))).toEqual([
      64, 64,
    ]);
  });

  it('names only files the build produces', () => {
    requireAddinBuild();
    const all = [...urls.values(), ...images.values(), child(root, 'IconUrl').attributes.DefaultValue];
    for (const url of all) expect(existsSync(path.join(ADDIN_DIR, new URL(url).pathname))).toBe(true);
  });
});
