/**
 * The preview plot: an inline SVG drawn here (no chart library), with log or
 * linear axes, decade ticks on log axes, a legend, and a text alternative
 * (title and desc) that states the ranges shown. Comparing models, it shades
 * the band between the lowest and highest model under the curves, draws the
 * default model heavier, breaks a curve where its model refused values, and
 * the legend is a list below the plot (drawLegend) naming each model's
 * refusals.
 */
import type { Preview, PreviewSeries } from './preview';

const SVG = 'http://www.w3.org/2000/svg';
const WIDTH = 320;
const HEIGHT = 200;
const MARGIN = { left: 46, right: 16, top: 8, bottom: 30 };
/** Curves drawn with distinct colours; later ones reuse them, dashed. */
const PALETTE_SIZE = 4;

/** The classes of series `index`'s line: colour, dashing once the palette repeats, emphasis. */
export function curveClasses(index: number, emphasised: boolean): string {
  const dash = Math.floor(index / PALETTE_SIZE) % 2 === 1 ? ' dashed' : '';
  return `curve curve-${index % PALETTE_SIZE}${dash}${emphasised ? ' emphasised' : ''}`;
}

/** The stretches of a series between its breaks. */
function stretches(series: PreviewSeries): (readonly (readonly [number, number])[])[] {
  const cuts = [0, ...(series.breaks ?? []), series.points.length];
  const parts: (readonly (readonly [number, number])[])[] = [];
  for (let k = 0; k + 1 < cuts.length; k++) if (cuts[k + 1] > cuts[k]) parts.push(series.points.slice(cuts[k], cuts[k + 1]));
  return parts;
}

interface Scale {
  readonly toPixel: (value: number) => number;
  readonly ticks: readonly number[];
  readonly label: (value: number) => string;
}

/** About four round (1-2-5) values from lo to hi. */
function linearTicks(lo: number, hi: number): number[] {
  const rough = (hi - lo) / 4;
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? rough;
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi + step * 1e-9; t += step) ticks.push(Number(t.toPrecision(10)));
  return ticks;
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
    // Less than a decade shown (models compared at one doping, a narrow temperature range): 1-2-5, then every
    // mantissa, so the axis still carries at least two labelled values.
    for (const mantissas of [
      [1, 2, 5],
      [1, 2, 3, 4, 5, 6, 7, 8, 9],
    ]) {
      if (ticks.length >= 2) break;
      ticks = [];
      for (let e = Math.floor(lo); e <= Math.ceil(hi); e++) {
        for (const m of mantissas) {
          const exponent = Math.log10(m) + e;
          if (exponent >= lo - 1e-9 && exponent <= hi + 1e-9) ticks.push(Number((m * 10 ** e).toPrecision(12)));
        }
      }
    }
    // Narrower still (11 to 17): round values as on a linear axis.
    if (ticks.length < 2) ticks = linearTicks(10 ** lo, 10 ** hi);
  } else ticks = linearTicks(lo, hi);
  const label = (value: number) => {
    if (!logarithmic) return Number(value.toPrecision(4)).toString();
    const exponent = Math.floor(Math.log10(value) + 1e-9);
    const mantissa = value / 10 ** exponent;
    // 1e16, 2e1 on decades and 1-2-5 ticks; a round value between (12) as it is.
    if (Math.abs(mantissa - Math.round(mantissa)) < 1e-9) return `${Math.round(mantissa)}e${exponent}`;
    return exponent >= 4 || exponent < -2 ? `${Number(mantissa.toPrecision(3))}e${exponent}` : Number(value.toPrecision(4)).toString();
  };
  return { toPixel, ticks, label };
}

function element<K extends keyof SVGElementTagNameMap>(
  doc: Document,
  name: K,
  attributes: Record<string, string | number>,
): SVGElementTagNameMap[K] {
  const node = doc.createElementNS(SVG, name);
  for (const [key, value] of Object.entries(attributes)) node.setAttribute(key, String(value));
  return node;
}

/** A short number for the text alternative. */
function short(value: number): string {
  return Math.abs(value) >= 1e4 || (Math.abs(value) < 1e-2 && value !== 0)
    ? value.toExponential(2)
    : Number(value.toPrecision(4)).toString();
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
  if (preview.band !== undefined && preview.band !== null) return describeComparison(preview, yLabel);
  const parts = drawn.slice(0, 4).map((s) => {
    const first = s.points[0];
    const last = s.points[s.points.length - 1];
    return `${drawn.length > 1 ? `${s.name}: ` : ''}${short(first[1])} at ${short(first[0])} to ${short(last[1])} at ${short(last[0])}`;
  });
  const more = drawn.length > 4 ? `; ${drawn.length - 4} more curves` : '';
  return (
    `${yLabel} against ${preview.xLabel}, ${preview.xLogarithmic ? 'log' : 'linear'} x, ` +
    `${preview.yLogarithmic ? 'log' : 'linear'} y: ${parts.join('; ')}${more}.`
  );
}

/** The end values of a curve, e.g. '13.6 at 1.00e+15 to 0.205 at 1.00e+17'. */
function ends(series: PreviewSeries): string {
  const first = series.points[0];
  const last = series.points[series.points.length - 1];
  return `${short(first[1])} at ${short(first[0])} to ${short(last[1])} at ${short(last[0])}`;
}

/** A message without its closing full stop, for use inside parentheses. */
function withoutFullStop(message: string): string {
  return message.replace(/\.\s*$/, '');
}

/** What each model refused, e.g. 'astm-f723 refused 3 of 4 values (#VALUE! …)'. */
export function refusalText(series: PreviewSeries): string | null {
  return series.refused === undefined
    ? null
    : `${series.name} refused ${series.refused.count} of ` + `${series.refused.of} values (${withoutFullStop(series.refused.message)})`;
}

/** The compare-models text: the models, the default's ends, how wide the band gets, and each model's refusals. */
function describeComparison(preview: Preview, yLabel: string): string {
  const emphasised = preview.series[preview.emphasised ?? 0];
  const axes =
    `${yLabel} against ${preview.xLabel}, ${preview.xLogarithmic ? 'log' : 'linear'} x, ` + `${preview.yLogarithmic ? 'log' : 'linear'} y`;
  const parts = [`${preview.series.length} models (${preview.series.map((s) => s.name).join(', ')})`];
  if (emphasised !== undefined && emphasised.points.length > 0) parts.push(`default ${emphasised.name} (heavier line) ${ends(emphasised)}`);
  const band = (preview.band ?? []).flat();
  if (band.length > 0) {
    // The widest point of the band: as a ratio on a log axis, as a difference on a linear one.
    const width = (b: readonly [number, number, number]) => (preview.yLogarithmic && b[1] > 0 ? b[2] / b[1] : b[2] - b[1]);
    const widest = band.reduce((a, b) => (width(b) > width(a) ? b : a));
    const size = preview.yLogarithmic && widest[1] > 0 ? `a factor ${short(width(widest))}` : short(width(widest));
    parts.push(`shaded band from the lowest to the highest model, widest (${size}) at ${short(widest[0])}`);
  }
  const refusals = preview.series.map(refusalText).filter((t): t is string => t !== null);
  return `${axes}: ${[...parts, ...refusals].join('; ')}.`;
}

/**
 * The compare-models legend as a list below the plot: a line sample per model in its curve's colour, dash and weight,
 * the code, "(default)" for the emphasised one, and what the model refused.
 *
 * @param doc - the document
 * @param preview - the evaluated comparison
 * @param id - the list's id
 */
export function drawLegend(doc: Document, preview: Preview, id: string): HTMLUListElement {
  const list = doc.createElement('ul');
  list.id = id;
  list.className = 'sw-legend';
  list.setAttribute('aria-label', 'Models drawn');
  preview.series.forEach((series, index) => {
    const item = doc.createElement('li');
    const emphasised = index === preview.emphasised;
    const sample = element(doc, 'svg', { class: 'sw-plot sw-key', viewBox: '0 0 24 8', 'aria-hidden': 'true' });
    sample.append(element(doc, 'path', { class: curveClasses(index, emphasised), d: 'M1,4 L23,4' }));
    const name = doc.createElement('span');
    name.className = 'sw-legend-name';
    name.textContent = emphasised ? `${series.name} (default)` : series.name;
    item.append(sample, name);
    const refused = refusalText(series);
    if (refused !== null) {
      const note = doc.createElement('span');
      note.className = 'sw-legend-note';
      note.textContent =
        series.points.length === 0
          ? ` no values: ${series.refused!.message}`
          : ` gaps: ` +
            `refused ${series.refused!.count} of ${series.refused!.of} values ` +
            `(${withoutFullStop(series.refused!.message)})`;
      item.append(note);
    }
    list.append(item);
  });
  return list;
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
  const svg = element(doc, 'svg', {
    viewBox: `0 0 ${WIDTH} ${HEIGHT}`,
    class: 'sw-plot',
    role: 'img',
    'aria-labelledby': `${idPrefix}-title ${idPrefix}-desc`,
  });
  const title = element(doc, 'title', { id: `${idPrefix}-title` });
  title.textContent = `Preview of ${yLabel}`;
  const desc = element(doc, 'desc', { id: `${idPrefix}-desc` });
  desc.textContent = describePreview(preview, yLabel);
  svg.append(title, desc);
  const usable = (v: number, log: boolean) => Number.isFinite(v) && (!log || v > 0);
  const points = preview.series
    .flatMap((s) => s.points)
    .filter(([x, y]) => usable(x, preview.xLogarithmic) && usable(y, preview.yLogarithmic));
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
  const pixel = (px: number, py: number) => `${x.toPixel(px).toFixed(1)},${y.toPixel(py).toFixed(1)}`;
  for (const segment of preview.band ?? []) {
    const kept = segment.filter(
      ([px, low, high]) => usable(px, preview.xLogarithmic) && usable(low, preview.yLogarithmic) && usable(high, preview.yLogarithmic),
    );
    if (kept.length < 2) continue;
    // Along the highest values, back along the lowest: one closed shape under the curves.
    const outline = [...kept.map(([px, , high]) => pixel(px, high)), ...[...kept].reverse().map(([px, low]) => pixel(px, low))];
    svg.append(element(doc, 'path', { class: 'band', d: `M${outline.join(' L')} Z` }));
  }
  // The emphasised curve last, so it is on top.
  const order = preview.series.map((_, index) => index).sort((a, b) => Number(a === preview.emphasised) - Number(b === preview.emphasised));
  for (const index of order) {
    const series = preview.series[index];
    const parts = stretches(series)
      .map((part) => part.filter(([px, py]) => usable(px, preview.xLogarithmic) && usable(py, preview.yLogarithmic)))
      .filter((part) => part.length > 0);
    if (parts.length === 0) continue;
    // A lone point between refusals would draw nothing as a path: it gets a dot of the curve's colour.
    const line = (part: (typeof parts)[number]) => part.map(([px, py], i) => `${i === 0 ? 'M' : 'L'}${pixel(px, py)}`).join(' ');
    const d = parts.map((part) => (part.length === 1 ? `M${pixel(...part[0])} l0,0` : line(part))).join(' ');
    svg.append(element(doc, 'path', { class: curveClasses(index, index === preview.emphasised), d, 'data-series': series.name }));
  }
  if (preview.series.length > 1 && (preview.band === undefined || preview.band === null)) {
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
