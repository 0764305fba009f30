/**
 * The preview plot: an inline SVG drawn here (no chart library), with log or
 * linear axes, decade ticks on log axes, a legend, and a text alternative
 * (title and desc) that states the ranges shown.
 */
import type { Preview } from './preview';

const SVG = 'http://www.w3.org/2000/svg';
const WIDTH = 320;
const HEIGHT = 200;
const MARGIN = { left: 46, right: 16, top: 8, bottom: 30 };
/** Curves drawn with distinct colours; later ones reuse them. */
const PALETTE_SIZE = 4;

interface Scale {
  readonly toPixel: (value: number) => number;
  readonly ticks: readonly number[];
  readonly label: (value: number) => string;
}

/** A scale over [min, max] onto [start, end] pixels, log10 or linear. */
export function makeScale(min: number, max: number, start: number, end: number, logarithmic: boolean): Scale {
  const f = logarithmic ? Math.log10 : (v: number) => v;
  let lo = f(min);
  let hi = f(max);
  if (hi - lo < 1e-12) {
    lo -= logarithmic ? 0.5 : Math.abs(lo) * 0.05 + 1;
    hi += logarithmic ? 0.5 : Math.abs(hi) * 0.05 + 1;
  }
  const toPixel = (value: number) => start + ((f(value) - lo) / (hi - lo)) * (end - start);
  let ticks: number[];
  if (logarithmic) {
    const first = Math.ceil(lo - 1e-9);
    const last = Math.floor(hi + 1e-9);
    const every = Math.max(1, Math.ceil((last - first + 1) / 6));
    ticks = [];
    for (let e = first; e <= last; e += every) ticks.push(10 ** e);
  } else {
    const rough = (hi - lo) / 4;
    const power = 10 ** Math.floor(Math.log10(rough));
    const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? rough;
    ticks = [];
    for (let t = Math.ceil(lo / step) * step; t <= hi + step * 1e-9; t += step) ticks.push(Number(t.toPrecision(10)));
  }
  const label = (value: number) => (logarithmic ? `1e${Math.round(Math.log10(value))}` : Number(value.toPrecision(4)).toString());
  return { toPixel, ticks, label };
}

function element<K extends keyof SVGElementTagNameMap>(doc: Document, name: K, attributes: Record<string, string | number>): SVGElementTagNameMap[K] {
  const node = doc.createElementNS(SVG, name);
  for (const [key, value] of Object.entries(attributes)) node.setAttribute(key, String(value));
  return node;
}

/** A short number for the text alternative. */
function short(value: number): string {
  return Math.abs(value) >= 1e4 || (Math.abs(value) < 1e-2 && value !== 0) ? value.toExponential(2) : Number(value.toPrecision(4)).toString();
}

/**
 * Words describing the plot, for screen readers and as the visible caption.
 *
 * @param preview - the evaluated sweep
 * @param yLabel - the plotted quantity with its unit
 */
export function describePreview(preview: Preview, yLabel: string): string {
  const drawn = preview.series.filter((s) => s.points.length > 0);
  if (drawn.length === 0) return `No values to plot${preview.firstError ? `: ${preview.firstError}` : ''}.`;
  const parts = drawn.slice(0, 4).map((s) => {
    const first = s.points[0];
    const last = s.points[s.points.length - 1];
    return `${drawn.length > 1 ? `${s.name}: ` : ''}${short(first[1])} at ${short(first[0])} to ${short(last[1])} at ${short(last[0])}`;
  });
  const more = drawn.length > 4 ? `; ${drawn.length - 4} more curves` : '';
  return `${yLabel} against ${preview.xLabel}, ${preview.xLogarithmic ? 'log' : 'linear'} x, ${preview.yLogarithmic ? 'log' : 'linear'} y: ${parts.join('; ')}${more}.`;
}

/**
 * Draws the preview into a fresh SVG element.
 *
 * @param doc - the document
 * @param preview - the evaluated sweep
 * @param yLabel - the plotted quantity with its unit
 * @param idPrefix - prefix for the title/desc ids (unique in the page)
 */
export function drawPreview(doc: Document, preview: Preview, yLabel: string, idPrefix: string): SVGSVGElement {
  const svg = element(doc, 'svg', { viewBox: `0 0 ${WIDTH} ${HEIGHT}`, class: 'sw-plot', role: 'img', 'aria-labelledby': `${idPrefix}-title ${idPrefix}-desc` });
  const title = element(doc, 'title', { id: `${idPrefix}-title` });
  title.textContent = `Preview of ${yLabel}`;
  const desc = element(doc, 'desc', { id: `${idPrefix}-desc` });
  desc.textContent = describePreview(preview, yLabel);
  svg.append(title, desc);
  const usable = (v: number, log: boolean) => Number.isFinite(v) && (!log || v > 0);
  const points = preview.series.flatMap((s) => s.points).filter(([x, y]) => usable(x, preview.xLogarithmic) && usable(y, preview.yLogarithmic));
  const plotLeft = MARGIN.left;
  const plotRight = WIDTH - MARGIN.right;
  const plotTop = MARGIN.top;
  const plotBottom = HEIGHT - MARGIN.bottom;
  svg.append(element(doc, 'rect', { class: 'frame', x: plotLeft, y: plotTop, width: plotRight - plotLeft, height: plotBottom - plotTop }));
  if (points.length === 0) return svg;
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const x = makeScale(Math.min(...xs), Math.max(...xs), plotLeft, plotRight, preview.xLogarithmic);
  const y = makeScale(Math.min(...ys), Math.max(...ys), plotBottom, plotTop, preview.yLogarithmic);
  for (const t of x.ticks) {
    const px = x.toPixel(t);
    if (px < plotLeft - 0.5 || px > plotRight + 0.5) continue;
    svg.append(element(doc, 'line', { class: 'grid', x1: px, x2: px, y1: plotTop, y2: plotBottom }));
    const text = element(doc, 'text', { x: px, y: plotBottom + 12, 'text-anchor': 'middle' });
    text.textContent = x.label(t);
    svg.append(text);
  }
  for (const t of y.ticks) {
    const py = y.toPixel(t);
    if (py < plotTop - 0.5 || py > plotBottom + 0.5) continue;
    svg.append(element(doc, 'line', { class: 'grid', x1: plotLeft, x2: plotRight, y1: py, y2: py }));
    const text = element(doc, 'text', { x: plotLeft - 4, y: py + 3, 'text-anchor': 'end' });
    text.textContent = y.label(t);
    svg.append(text);
  }
  const xTitle = element(doc, 'text', { x: (plotLeft + plotRight) / 2, y: HEIGHT - 4, 'text-anchor': 'middle' });
  xTitle.textContent = preview.xLabel;
  svg.append(xTitle);
  preview.series.forEach((series, index) => {
    const kept = series.points.filter(([px, py]) => usable(px, preview.xLogarithmic) && usable(py, preview.yLogarithmic));
    if (kept.length === 0) return;
    const d = kept.map(([px, py], i) => `${i === 0 ? 'M' : 'L'}${x.toPixel(px).toFixed(1)},${y.toPixel(py).toFixed(1)}`).join(' ');
    svg.append(element(doc, 'path', { class: `curve curve-${index % PALETTE_SIZE}`, d }));
  });
  if (preview.series.length > 1) {
    preview.series.slice(0, 6).forEach((series, index) => {
      const ly = plotTop + 6 + index * 11;
      svg.append(element(doc, 'rect', { class: `swatch-${index % PALETTE_SIZE}`, x: plotRight - 54, y: ly - 6, width: 8, height: 3 }));
      const label = element(doc, 'text', { x: plotRight - 42, y: ly });
      label.textContent = series.name;
      svg.append(label);
    });
  }
  return svg;
}
