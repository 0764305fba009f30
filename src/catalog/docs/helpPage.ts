/**
 * Help pages for the add-in: one standalone HTML page per catalog function
 * (the `helpUrl` Excel links to from its function list) and an index page.
 * Pages carry their own stylesheet, load nothing from anywhere and run no
 * script; light and dark follow the reader's `prefers-color-scheme`.
 */
import { modelInfo, type ModelInfo } from '../../physics';
import type { FunctionSpec, ParameterSpec } from '../types';
import { qualifiedName, signature } from './signature';
import { prose } from '../../text/prose';

/** Looks a model code up in the physics model registry. */
export type ModelLookup = (code: string) => ModelInfo;

export interface HelpPageOptions {
  /** Model lookup; defaults to the physics registry's modelInfo. */
  readonly lookupModel?: ModelLookup;
  /** Function names (without namespace) that have pages, so mentions of them become links. */
  readonly linkedFunctions?: readonly string[];
}

/** File name of a function's help page, relative to the help folder. */
export function helpFileName(name: string): string {
  return `${name.toLowerCase()}.html`;
}

/** File name of the help index, relative to the help folder. */
export const HELP_INDEX_FILE = 'index.html';

/** The caution every page ends with. */
export const CAUTION_TEXT =
  'Results are estimates from published models, valid over the ranges stated for each model. ' +
  'They are not a substitute for calibrated measurement. Base acceptance decisions on wafers, layers ' +
  'or devices on the applicable standards and your lab’s own practice.';

const PRODUCT = 'Driftcell';

function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

/**
 * Turns plain help text (already escaped) into inline HTML: `*word*` becomes
 * emphasis and DRIFT.NAME mentions become code, linked where a page exists.
 */
function inline(escaped: string, linked: ReadonlySet<string>): string {
  return escaped
    .replace(/\*([^*\n]+)\*/g, '<em>$1</em>')
    .replace(/\bDRIFT\.([A-Z]+)\b/g, (whole, name: string) =>
      linked.has(name) ? `<a href="${helpFileName(name)}"><code>${whole}</code></a>` : `<code>${whole}</code>`,
    );
}

/** Paragraphs separated by blank lines. */
function paragraphs(text: string, linked: ReadonlySet<string>): string {
  return text
    .split(/\n\s*\n/)
    .map((p) => p.trim())
    .filter((p) => p.length > 0)
    .map((p) => `<p>${inline(escapeHtml(p), linked)}</p>`)
    .join('\n');
}

/** The page colours, light and dark, as CSS custom properties. */
const LIGHT_COLOURS =
  '--bg: #fdfdfb; --fg: #1c1f24; --muted: #4f5661; --rule: #d5d9de; --accent: #0b5d6b; --code-bg: #eef1f3; ' +
  '--caution-bg: #fff6e0; --caution-rule: #b7791f;';
const DARK_COLOURS =
  '--bg: #15181c; --fg: #e6e8eb; --muted: #a9b0ba; --rule: #39404a; --accent: #6cc5d3; --code-bg: #232830; ' +
  '--caution-bg: #2b2414; --caution-rule: #d9a441;';
const BODY_FONT = '1rem/1.55 system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", sans-serif';

const STYLE = `
:root { color-scheme: light dark; ${LIGHT_COLOURS} }
@media (prefers-color-scheme: dark) {
  :root { ${DARK_COLOURS} }
}
* { box-sizing: border-box; }
body { margin: 0; background: var(--bg); color: var(--fg); font: ${BODY_FONT}; }
.skip { position: absolute; left: -999px; }
.skip:focus { left: 1rem; top: 1rem; background: var(--bg); padding: .25rem .5rem; }
header, main, footer { max-width: 52rem; margin: 0 auto; padding: 0 1.25rem; }
header { padding-top: 1rem; font-size: .95rem; }
footer { padding-bottom: 2rem; color: var(--muted); font-size: .9rem; border-top: 1px solid var(--rule); margin-top: 2rem; }
h1 { font-size: 1.9rem; margin: .6rem 0 .2rem; }
h2 { font-size: 1.25rem; margin-top: 2rem; border-bottom: 1px solid var(--rule); padding-bottom: .2rem; }
a { color: var(--accent); }
a:focus-visible { outline: 2px solid var(--accent); outline-offset: 2px; }
.summary { font-size: 1.1rem; color: var(--muted); margin-top: 0; }
code, pre { font-family: ui-monospace, "SF Mono", Consolas, "Liberation Mono", monospace; font-size: .95em; }
code { background: var(--code-bg); padding: .05em .3em; border-radius: 3px; }
pre { background: var(--code-bg); padding: .75rem 1rem; border-radius: 4px; white-space: pre-wrap; overflow-wrap: anywhere; }
pre code { padding: 0; background: none; }
table { border-collapse: collapse; width: 100%; margin: .5rem 0; }
caption { text-align: left; color: var(--muted); padding-bottom: .3rem; }
th, td { text-align: left; vertical-align: top; padding: .4rem .6rem; border-bottom: 1px solid var(--rule); }
th { font-weight: 600; }
dl.model { margin: .8rem 0 1.2rem; }
dl.model dt { font-weight: 600; margin-top: .3rem; }
dl.model dd { margin-left: 1.25rem; }
.caution { background: var(--caution-bg); border-left: 4px solid var(--caution-rule); padding: .6rem 1rem; margin-top: 2rem; }
`;

/** Help pages contain no script and load nothing: only their own inline stylesheet is allowed. */
const CSP = "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; form-action 'none'";

const FOOTER_TEXT = prose`${PRODUCT} — semiconductor transport physics as spreadsheet functions. Free software under
  the GNU GPL, version 3 or later.`;

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="Content-Security-Policy" content="${CSP}">
<meta name="color-scheme" content="light dark">
<title>${escapeHtml(title)}</title>
<style>${STYLE}</style>
</head>
<body>
<a class="skip" href="#content">Skip to content</a>
${body}
<footer><p>${FOOTER_TEXT}</p></footer>
</body>
</html>
`;
}

function cautionBlock(): string {
  return `<section class="caution" aria-labelledby="caution"><h2 id="caution">Caution</h2><p>${escapeHtml(CAUTION_TEXT)}</p></section>`;
}

function parameterRow(param: ParameterSpec, linked: ReadonlySet<string>): string {
  const optionalCell = param.defaultText !== undefined ? `<code>${escapeHtml(param.defaultText)}</code>` : 'blank';
  const defaultCell = param.optional ? optionalCell : 'required';
  const unitCell = param.unit === null ? '—' : escapeHtml(param.unit);
  const description = param.details === undefined ? param.description : `${param.description} ${param.details}`;
  return (
    `<tr><th scope="row"><code>${escapeHtml(param.name)}</code></th><td>${unitCell}</td>` +
    `<td>${inline(escapeHtml(description), linked)}</td><td>${defaultCell}</td></tr>`
  );
}

function parameterTable(spec: FunctionSpec, linked: ReadonlySet<string>): string {
  if (spec.parameters.length === 0) return '<p>This function takes no arguments.</p>';
  return `<table>
<caption>Arguments in order; optional ones may be left blank.</caption>
<thead><tr><th scope="col">Argument</th><th scope="col">Unit</th><th scope="col">Description</th><th scope="col">Default</th></tr></thead>
<tbody>
${(spec.parameters as readonly ParameterSpec[]).map((p) => parameterRow(p, linked)).join('\n')}
</tbody>
</table>${blankCellNote(spec)}`;
}

/** Names the arguments where Excel's 0 for an empty cell is read as blank. */
function blankCellNote(spec: FunctionSpec): string {
  const names = (spec.parameters as readonly ParameterSpec[]).filter((p) => p.zeroIsBlank).map((p) => p.name);
  if (names.length === 0) return '';
  return (
    `\n<p>Blank cells: some Excel versions pass an empty cell as 0. In ` +
    `${escapeHtml(names.join(', '))}, where 0 is never a valid value, a 0 is read as a blank cell, so an ` +
    `optional argument takes its default and a required one reports that it is missing. Elsewhere 0 is a ` +
    `value.</p>`
  );
}

function resultBlock(spec: FunctionSpec): string {
  const unit = spec.result.unit === null ? '' : `, in <strong>${escapeHtml(spec.result.unit)}</strong>`;
  const shape =
    spec.kind === 'table'
      ? 'It spills a table.'
      : spec.kind === 'tuple'
        ? `It spills one row of ${spec.columns.length} values: ${spec.columns.join(', ')}. Given columns ` +
          `instead of single values, it spills one such row per element; a bad element gets an error with ` +
          `a message across its row, and the other rows still compute.`
        : spec.kind === 'row'
          ? 'It spills one row, as long as its arguments’ values make it; every argument is one value, and ' +
            'a range is refused with an error.'
          : 'Given ranges or arrays, it spills one result per element, broadcasting as Excel’s own ' +
            'functions do; a bad element gets an error with a message, and the other elements still ' +
            'compute.';
  const reducing = (spec.parameters as readonly ParameterSpec[]).filter((p) => p.reduce).map((p) => p.name);
  const whole =
    reducing.length === 0
      ? ''
      : ` ${reducing.join(', ')} is taken whole, as one argument: a ` + `range there is reduced to one value, not broadcast.`;
  return `<p>${escapeHtml(spec.result.description)}${unit}. ${escapeHtml(shape + whole)}</p>`;
}

function examplesBlock(spec: FunctionSpec, linked: ReadonlySet<string>): string {
  if (spec.examples.length === 0) return '';
  const rows = spec.examples
    .map((e) => `<tr><td><code>${escapeHtml(e.formula)}</code></td><td>${inline(escapeHtml(e.note), linked)}</td></tr>`)
    .join('\n');
  return `<h2>Examples</h2>
<table>
<thead><tr><th scope="col">Formula</th><th scope="col">What it shows</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>`;
}

function modelBlock(info: ModelInfo): string {
  const notes = info.notes ? `<dt>Notes</dt><dd>${escapeHtml(info.notes)}</dd>` : '';
  return `<h3>${escapeHtml(info.name)} <span class="code">(<code>${escapeHtml(info.code)}</code>)</span></h3>
<dl class="model">
<dt>Quantity</dt><dd>${escapeHtml(info.quantity)}</dd>
<dt>Source</dt><dd>${escapeHtml(info.citation)}</dd>
<dt>Validity</dt><dd>${escapeHtml(info.validity)}</dd>
${notes}
</dl>`;
}

function modelsBlock(spec: FunctionSpec, lookup: ModelLookup): string {
  if (spec.models.length === 0) {
    return '<h2>Models used</h2>\n<p>No fitted model is specific to this function.</p>';
  }
  const blocks = spec.models.map((code) => {
    let info: ModelInfo;
    try {
      info = lookup(code);
    } catch (e) {
      // A page that cites a model the registry lacks must not be built.
      throw new Error(
        `help page for ${qualifiedName(spec)}: model code "${code}" is not in the model ` +
          `registry (${e instanceof Error ? e.message : String(e)})`,
      );
    }
    return modelBlock(info);
  });
  return (
    `<h2>Models used</h2>\n<p>Model codes are typed in the <code>model</code> argument where the ` +
    `function has one; the first listed is the default.</p>\n${blocks.join('\n')}`
  );
}

/**
 * Renders the help page of one catalog function.
 *
 * @param spec - the catalog function
 * @param options - model lookup and the function names to link
 * @returns a complete HTML document
 * @example renderHelpPage(findFunction('MOBILITY')!) // '<!doctype html>…=DRIFT.MOBILITY(doping, dopant, [temperature_K], …'
 */
export function renderHelpPage(spec: FunctionSpec, options: HelpPageOptions = {}): string {
  const lookup = options.lookupModel ?? modelInfo;
  const linked = new Set((options.linkedFunctions ?? []).filter((name) => name !== spec.name));
  const name = qualifiedName(spec);
  const body = `<header><nav aria-label="Help"><a href="${HELP_INDEX_FILE}">All ${PRODUCT} functions</a></nav></header>
<main id="content">
<h1>${escapeHtml(name)}</h1>
<p class="summary">${inline(escapeHtml(spec.summary), linked)}</p>
<h2>Syntax</h2>
<pre><code>=${escapeHtml(signature(spec))}</code></pre>
<h2>Arguments</h2>
${parameterTable(spec, linked)}
<h2>Result</h2>
${resultBlock(spec)}
<h2>Details</h2>
${paragraphs(spec.help, linked)}
${examplesBlock(spec, linked)}
${modelsBlock(spec, lookup)}
${cautionBlock()}
</main>`;
  return page(`${name} — ${PRODUCT} help`, body);
}

/**
 * Renders the help index: every function with its summary and result unit.
 *
 * @param catalog - the functions, in the order to list them
 * @returns a complete HTML document linking each function's page
 */
const INDEX_SUMMARY = prose`Spreadsheet functions for doped-semiconductor transport: carrier densities, mobility,
  resistivity and back, sheet resistance and resistor values.`;
const INDEX_USAGE = prose`Type a function in a cell as <code>=DRIFT.NAME(…)</code>. Every argument takes a single value
  or a range or array; results spill. Densities are in cm⁻³, temperatures in K (default 300 K), lengths in µm.
  Codes such as dopants and model names are case-insensitive.`;

export function renderHelpIndex(catalog: readonly FunctionSpec[]): string {
  const rows = catalog
    .map((spec) => {
      const link = `<a href="${helpFileName(spec.name)}"><code>${escapeHtml(qualifiedName(spec))}</code></a>`;
      const unit = spec.result.unit === null ? '—' : escapeHtml(spec.result.unit);
      return `<tr><th scope="row">${link}</th><td>${escapeHtml(spec.summary)}</td><td>${unit}</td></tr>`;
    })
    .join('\n');
  const body = `<main id="content">
<h1>${PRODUCT} functions</h1>
<p class="summary">${INDEX_SUMMARY}</p>
<p>${INDEX_USAGE}</p>
<table>
<caption>All functions</caption>
<thead><tr><th scope="col">Function</th><th scope="col">What it gives</th><th scope="col">Result unit</th></tr></thead>
<tbody>
${rows}
</tbody>
</table>
${cautionBlock()}
</main>`;
  return page(`${PRODUCT} functions — help`, body);
}

/**
 * Every help file: the index and one page per function, by file name.
 *
 * @param catalog - the functions
 * @param lookupModel - model lookup; defaults to the physics registry
 * @returns a map from file name (relative to the help folder) to HTML
 */
export function renderHelpSite(catalog: readonly FunctionSpec[], lookupModel?: ModelLookup): Map<string, string> {
  const names = catalog.map((spec) => spec.name);
  const files = new Map<string, string>([[HELP_INDEX_FILE, renderHelpIndex(catalog)]]);
  for (const spec of catalog) {
    files.set(helpFileName(spec.name), renderHelpPage(spec, { lookupModel, linkedFunctions: names }));
  }
  return files;
}
