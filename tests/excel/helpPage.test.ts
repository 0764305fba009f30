/** Help pages rendered from the catalog and the physics model registry. */
import { CATALOG, findFunction } from '../../src/catalog';
import { CAUTION_TEXT, helpFileName, renderHelpIndex, renderHelpPage, renderHelpSite } from '../../src/catalog/docs/helpPage';
import type { ParameterSpec } from '../../src/catalog/types';
import { modelInfo } from '../../src/physics';

function spec(name: string) {
  const found = findFunction(name);
  if (found === undefined) throw new Error(`catalog lacks ${name}`);
  return found;
}

function escaped(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/** Attribute values that would make the page load something. */
function loadedUrls(html: string): string[] {
  return [...html.matchAll(/\b(?:src|href)\s*=\s*"([^"]*)"/g)].map((m) => m[1]).filter((u) => /^(https?:)?\/\//i.test(u));
}

describe('renderHelpPage', () => {
  const mobility = renderHelpPage(spec('MOBILITY'), { linkedFunctions: CATALOG.map((s) => s.name) });

  it('shows the syntax line with optional arguments in brackets', () => {
    expect(mobility).toContain('=DRIFT.MOBILITY(doping, dopant, [temperature_K], [carrier], [model], [material], [counter_doping])');
    expect(renderHelpPage(spec('MODELS'))).toContain('=DRIFT.MODELS()');
  });

  it('lists every argument with its unit, description and default', () => {
    for (const s of CATALOG) {
      const html = renderHelpPage(s);
      for (const p of s.parameters as readonly ParameterSpec[]) {
        expect(html).toContain(`<code>${escaped(p.name)}</code>`);
        expect(html).toContain(escaped(p.description));
        if (p.unit !== null) expect(html).toContain(`<td>${escaped(p.unit)}</td>`);
        if (p.optional && p.defaultText !== undefined) expect(html).toContain(`<code>${escaped(p.defaultText)}</code></td></tr>`);
      }
    }
  });

  it('gives the result unit, the help paragraphs, every example and the caution', () => {
    for (const s of CATALOG) {
      const html = renderHelpPage(s);
      if (s.result.unit !== null) expect(html).toContain(`<strong>${escaped(s.result.unit)}</strong>`);
      for (const e of s.examples) expect(html).toContain(`<code>${escaped(e.formula)}</code>`);
      expect(html.match(/<p>/g)?.length ?? 0).toBeGreaterThanOrEqual(s.help.split(/\n\s*\n/).length);
      expect(html).toContain(escaped(CAUTION_TEXT));
    }
    expect(mobility).toContain('the <em>total</em> dopant density');
  });

  it('names each model used with its citation and validity from the model registry', () => {
    for (const s of CATALOG) {
      const html = renderHelpPage(s);
      for (const code of s.models) {
        const info = modelInfo(code);
        expect(html).toContain(escaped(info.name));
        expect(html).toContain(escaped(info.citation));
        expect(html).toContain(escaped(info.validity));
      }
    }
  });

  it('links mentions of other functions to their pages', () => {
    expect(mobility).toContain('<a href="majority.html"><code>DRIFT.MAJORITY</code></a>');
  });

  it('refuses to build a page citing a model the registry lacks', () => {
    const lookup = () => {
      throw new Error('unknown model');
    };
    expect(() => renderHelpPage(spec('MOBILITY'), { lookupModel: lookup })).toThrow(
      /DRIFT\.MOBILITY: model code "masetti" is not in the model registry/,
    );
  });

  it('is a standalone page: no script, nothing loaded from elsewhere, a strict CSP, light and dark styles', () => {
    for (const s of CATALOG) {
      const html = renderHelpPage(s);
      expect(html.startsWith('<!doctype html>')).toBe(true);
      expect(html).toContain('<html lang="en">');
      expect(html).not.toMatch(/<script/i);
      expect(loadedUrls(html)).toEqual([]);
      expect(html).not.toMatch(/@import|url\(/);
      expect(html).toContain(`content="default-src 'none'; style-src 'unsafe-inline'`);
      expect(html).toContain('@media (prefers-color-scheme: dark)');
    }
  });

  it('escapes text from the catalog', () => {
    const base = spec('SHEETRES');
    const html = renderHelpPage({ ...base, summary: 'a <b> & "c"', help: 'x < y' } as typeof base);
    expect(html).toContain('a &lt;b&gt; &amp; &quot;c&quot;');
    expect(html).toContain('<p>x &lt; y</p>');
  });
});

describe('renderHelpIndex and renderHelpSite', () => {
  it('links every function page from the index', () => {
    const index = renderHelpIndex(CATALOG);
    for (const s of CATALOG) expect(index).toContain(`<a href="${helpFileName(s.name)}"><code>DRIFT.${s.name}</code></a>`);
    expect(index).toContain(escaped(CAUTION_TEXT));
    expect(loadedUrls(index)).toEqual([]);
  });

  it('makes one file per function plus the index', () => {
    const site = renderHelpSite(CATALOG);
    expect([...site.keys()].sort()).toEqual(['index.html', ...CATALOG.map((s) => `${s.name.toLowerCase()}.html`)].sort());
  });
});
