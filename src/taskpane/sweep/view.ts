/**
 * The Sweep builder's controls: quantity, its settings (read from the
 * catalog), compare models, the doping and temperature axes, the formula it
 * will write, a live preview plot and the Insert button. Logic lives in
 * settings.ts, compare.ts, plan.ts, preview.ts and insert.ts; this module builds elements and reads
 * them back.
 */
import { parseDecimalText } from '../../catalog/parameters';
import type { ParameterSpec } from '../../catalog/types';
import { numberInput } from '../dom';
import { blockAddress, sheetAddress } from '../port';
import { PaneRefusal } from '../sheetPlan';
import type { ToolContext } from '../tool';
import { settingKey } from './arguments';
import { fromKelvin, toKelvin, type TemperatureUnit } from './axes';
import { insertSweep } from './insert';
import { COMPARE_MODELS_HELP, modelSettingOf } from './compare';
import { planSweep, withUnit } from './plan';
import { describePreview, drawLegend, drawPreview } from './plot';
import { previewSweep } from './preview';
import { availableQuantities, settingParameters, TEMPERATURE_PARAMETER, type SweepQuantity } from './quantities';
import { COMPARE_MODELS_FIELD, resolveSweep, type SweepForm } from './settings';

/** Starting values of the axis controls (a typical wafer range; common practice, no source). */
const START = {
  dopingFrom: '1e14',
  dopingTo: '1e20',
  pointsPerDecade: '5',
  fixedDoping: '1e15',
  temperatureFrom: '250',
  temperatureTo: '400',
  temperatureStep: '50',
};

type Control = HTMLInputElement | HTMLSelectElement;

function make<K extends keyof HTMLElementTagNameMap>(
  doc: Document,
  tag: K,
  props: Partial<Record<'id' | 'className' | 'textContent', string>> = {},
): HTMLElementTagNameMap[K] {
  const node = doc.createElement(tag);
  if (props.id !== undefined) node.id = props.id;
  if (props.className !== undefined) node.className = props.className;
  if (props.textContent !== undefined) node.textContent = props.textContent;
  return node;
}

/** A labelled text input (numbers are typed as text so 1e15 stays as typed). */
function field(doc: Document, id: string, label: string, value: string, hint?: string): { wrap: HTMLElement; input: HTMLInputElement } {
  const wrap = make(doc, 'div', { className: 'sw-field' });
  const labelNode = make(doc, 'label', { textContent: label });
  labelNode.htmlFor = id;
  const input = numberInput(doc, id);
  input.value = value;
  wrap.append(labelNode, input);
  if (hint !== undefined) {
    const hintNode = make(doc, 'p', { id: `${id}-hint`, className: 'sw-hint', textContent: hint });
    input.setAttribute('aria-describedby', hintNode.id);
    wrap.append(hintNode);
  }
  return { wrap, input };
}

function selectField(
  doc: Document,
  id: string,
  label: string,
  options: readonly (readonly [string, string])[],
  value: string,
  hint?: string,
): { wrap: HTMLElement; select: HTMLSelectElement } {
  const wrap = make(doc, 'div', { className: 'sw-field' });
  const labelNode = make(doc, 'label', { textContent: label });
  labelNode.htmlFor = id;
  const select = make(doc, 'select', { id });
  for (const [optionValue, text] of options) {
    const option = make(doc, 'option', { textContent: text });
    option.value = optionValue;
    select.append(option);
  }
  select.value = value;
  wrap.append(labelNode, select);
  if (hint !== undefined) {
    const hintNode = make(doc, 'p', { id: `${id}-hint`, className: 'sw-hint', textContent: hint });
    select.setAttribute('aria-describedby', hintNode.id);
    wrap.append(hintNode);
  }
  return { wrap, select };
}

function checkbox(doc: Document, id: string, label: string, checked: boolean): { wrap: HTMLElement; input: HTMLInputElement } {
  const wrap = make(doc, 'div', { className: 'sw-check' });
  const input = make(doc, 'input', { id });
  input.type = 'checkbox';
  input.checked = checked;
  const labelNode = make(doc, 'label', { textContent: label });
  labelNode.htmlFor = id;
  wrap.append(input, labelNode);
  return { wrap, input };
}

/** The control for one setting parameter: a list for codes, a text field for numbers. */
function settingControl(doc: Document, owner: 'inner' | 'outer', spec: ParameterSpec): { wrap: HTMLElement; control: Control } {
  const id = `sw-${owner}-${spec.name.replace(/[^a-z0-9]+/gi, '-').toLowerCase()}`;
  const label = spec.unit === null ? spec.name : `${spec.name} (${spec.unit})`;
  const choices = spec.choices?.() ?? [];
  if (choices.length > 0) {
    const options: [string, string][] = choices.map((code) => [code, code]);
    // Optional codes start blank, so the formula leaves the catalog's default to the function.
    if (spec.optional) options.unshift(['', spec.defaultText === undefined ? '(default)' : `(default: ${spec.defaultText})`]);
    const start = spec.optional ? '' : spec.defaultText !== undefined && choices.includes(spec.defaultText) ? spec.defaultText : choices[0];
    const { wrap, select } = selectField(doc, id, label, options, start, spec.description);
    return { wrap, control: select };
  }
  const { wrap, input } = field(doc, id, label, '', spec.description);
  if (spec.defaultText !== undefined) input.placeholder = `default ${spec.defaultText}`;
  return { wrap, control: input };
}

/**
 * Builds the tool inside its panel.
 *
 * @param panel - the tool's panel element
 * @param context - port, document and announce from the shell
 */
export function mountSweepBuilder(panel: HTMLElement, context: ToolContext): void {
  const doc = context.doc;
  panel.classList.add('sw-tool');
  const quantities = availableQuantities();
  const intro = make(doc, 'p', {
    className: 'sw-hint',
    textContent:
      'Tabulates a quantity over doping ' +
      'and/or temperature at the selected cell: axis values as cells, one spilled DRIFT formula, and an XY ' +
      'chart.',
  });
  const quantity = selectField(
    doc,
    'sw-quantity',
    'Quantity',
    quantities.map((q) => [q.id, withUnit(q.label, q.unit)] as const),
    quantities[0]?.id ?? '',
  );
  const settingsBox = make(doc, 'div', { id: 'sw-settings', className: 'sw-settings' });

  const dopingBox = make(doc, 'fieldset', { id: 'sw-doping', className: 'sw-axis' });
  dopingBox.append(make(doc, 'legend', { textContent: 'Doping axis' }));
  const dopingSweep = checkbox(doc, 'sw-doping-sweep', 'Sweep doping (log grid)', true);
  const dopingFrom = field(doc, 'sw-doping-from', 'From (cm⁻³)', START.dopingFrom);
  const dopingTo = field(doc, 'sw-doping-to', 'To (cm⁻³)', START.dopingTo);
  const perDecade = field(doc, 'sw-doping-ppd', 'Points per decade', START.pointsPerDecade);
  const dopingRange = make(doc, 'div', { className: 'sw-row' });
  dopingRange.append(dopingFrom.wrap, dopingTo.wrap, perDecade.wrap);
  const fixedDoping = field(doc, 'sw-doping-fixed', 'Doping (cm⁻³)', START.fixedDoping);
  dopingBox.append(dopingSweep.wrap, dopingRange, fixedDoping.wrap);

  const temperatureBox = make(doc, 'fieldset', { id: 'sw-temperature', className: 'sw-axis' });
  temperatureBox.append(make(doc, 'legend', { textContent: 'Temperature axis' }));
  const temperatureSweep = checkbox(doc, 'sw-temperature-sweep', 'Sweep temperature', false);
  const unit = selectField(
    doc,
    'sw-temperature-unit',
    'Entered in',
    [
      ['K', 'K'],
      ['°C', '°C'],
    ],
    'K',
    'Formulas always receive kelvin; °C values are converted in the table.',
  );
  const temperatureFrom = field(doc, 'sw-temperature-from', 'From', START.temperatureFrom);
  const temperatureTo = field(doc, 'sw-temperature-to', 'To', START.temperatureTo);
  const temperatureStep = field(doc, 'sw-temperature-step', 'Step', START.temperatureStep);
  const temperatureRange = make(doc, 'div', { className: 'sw-row' });
  temperatureRange.append(temperatureFrom.wrap, temperatureTo.wrap, temperatureStep.wrap);
  // Filled from the catalog's default temperature by buildSettings.
  const fixedTemperature = field(doc, 'sw-temperature-fixed', 'Temperature', '');
  temperatureBox.append(temperatureSweep.wrap, unit.wrap, temperatureRange, fixedTemperature.wrap);

  // Shown for quantities whose function takes a model argument: every applicable model instead of one.
  const compareBox = make(doc, 'div', { id: 'sw-compare', className: 'sw-compare' });
  const compare = checkbox(doc, 'sw-compare-models', 'Compare models', false);
  const compareHint = make(doc, 'p', { id: 'sw-compare-models-hint', className: 'sw-hint', textContent: COMPARE_MODELS_HELP });
  compare.input.setAttribute('aria-describedby', compareHint.id);
  compareBox.append(compare.wrap, compareHint);

  const problems = make(doc, 'ul', { id: 'sw-problems', className: 'sw-problems' });
  const formulaLabel = make(doc, 'p', { className: 'sw-hint', textContent: 'Formula (as written if inserted at A1):' });
  const modelCodesFormula = make(doc, 'p', { id: 'sw-formula-models', className: 'sw-formula' });
  const formula = make(doc, 'p', { id: 'sw-formula', className: 'sw-formula' });
  const plotHolder = make(doc, 'figure', { id: 'sw-plot' });
  const caption = make(doc, 'figcaption', { id: 'sw-plot-summary', className: 'sw-plot-summary' });
  const insert = make(doc, 'button', { id: 'sw-insert', className: 'sw-insert', textContent: 'Insert table and chart' });
  insert.type = 'button';
  panel.append(
    intro,
    quantity.wrap,
    settingsBox,
    compareBox,
    dopingBox,
    temperatureBox,
    problems,
    formulaLabel,
    modelCodesFormula,
    formula,
    plotHolder,
    insert,
  );

  let settingControls = new Map<string, Control>();
  /** Whether the user wants the temperature swept (kept while a quantity without doping forces it on). */
  let temperatureChoice = temperatureSweep.input.checked;
  temperatureSweep.input.addEventListener('change', () => {
    temperatureChoice = temperatureSweep.input.checked;
  });

  function current(): SweepQuantity | undefined {
    return quantities.find((q) => q.id === quantity.select.value);
  }

  function buildSettings(): void {
    const q = current();
    settingsBox.replaceChildren();
    settingControls = new Map();
    if (q === undefined) return;
    for (const { owner, spec } of settingParameters(q)) {
      const { wrap, control } = settingControl(doc, owner, spec);
      settingControls.set(settingKey(owner, spec.name), control);
      settingsBox.append(wrap);
    }
    compareBox.hidden = modelSettingOf(q) === null;
    dopingBox.hidden = !q.hasDoping;
    temperatureBox.hidden = !q.hasTemperature;
    // A function without doping can only sweep temperature; the user's own choice returns with the next one that has doping.
    temperatureSweep.input.checked = q.hasDoping ? temperatureChoice : true;
    temperatureSweep.input.disabled = !q.hasDoping;
    const temperatureSpec = q.inner.parameters.find((p) => p.name === TEMPERATURE_PARAMETER);
    // The catalog's default temperature (K) starts the fixed-temperature field; a value the user typed stays.
    if (temperatureSpec?.defaultText !== undefined && fixedTemperature.input.value.trim() === '') {
      fixedTemperature.input.value = String(fromKelvin(Number(temperatureSpec.defaultText), unit.select.value as TemperatureUnit));
    }
  }

  function readForm(): SweepForm {
    const values: Record<string, string> = {};
    for (const [key, control] of settingControls) values[key] = control.value;
    return {
      quantityId: quantity.select.value,
      dopingSwept: dopingSweep.input.checked,
      dopingFrom: dopingFrom.input.value,
      dopingTo: dopingTo.input.value,
      pointsPerDecade: perDecade.input.value,
      fixedDoping: fixedDoping.input.value,
      temperatureSwept: temperatureSweep.input.checked,
      temperatureUnit: unit.select.value as TemperatureUnit,
      temperatureFrom: temperatureFrom.input.value,
      temperatureTo: temperatureTo.input.value,
      temperatureStep: temperatureStep.input.value,
      fixedTemperature: fixedTemperature.input.value,
      values,
      compareModels: !compareBox.hidden && compare.input.checked,
    };
  }

  function refresh(): void {
    dopingRange.hidden = !dopingSweep.input.checked;
    fixedDoping.wrap.hidden = dopingSweep.input.checked;
    temperatureRange.hidden = !temperatureSweep.input.checked;
    fixedTemperature.wrap.hidden = temperatureSweep.input.checked;
    const q = current();
    const form = readForm();
    // Comparing, the single-model list does not apply: every model is drawn.
    const modelSetting = q === undefined ? null : modelSettingOf(q);
    if (modelSetting !== null) {
      const control = settingControls.get(modelSetting.key);
      if (control !== undefined) control.disabled = form.compareModels === true;
    }
    const resolved = resolveSweep(form, quantities);
    problems.replaceChildren();
    const fields: Record<string, Control> = {
      dopingFrom: dopingFrom.input,
      dopingTo: dopingTo.input,
      pointsPerDecade: perDecade.input,
      fixedDoping: fixedDoping.input,
      temperatureFrom: temperatureFrom.input,
      temperatureTo: temperatureTo.input,
      temperatureStep: temperatureStep.input,
      fixedTemperature: fixedTemperature.input,
      [COMPARE_MODELS_FIELD]: compare.input,
      ...Object.fromEntries(settingControls),
    };
    const invalid = new Set(resolved.ok ? [] : resolved.invalid);
    for (const [name, control] of Object.entries(fields)) {
      if (invalid.has(name)) {
        control.setAttribute('aria-invalid', 'true');
        control.setAttribute('aria-errormessage', problems.id);
      } else {
        control.removeAttribute('aria-invalid');
        control.removeAttribute('aria-errormessage');
      }
    }
    if (!resolved.ok) {
      for (const problem of resolved.problems) problems.append(make(doc, 'li', { textContent: problem }));
      formula.textContent = '—';
      modelCodesFormula.hidden = true;
      plotHolder.replaceChildren(caption);
      caption.textContent = 'No preview until the settings above are fixed.';
      return;
    }
    const plan = planSweep(resolved.input, { sheet: 'Sheet1', row: 0, column: 0, rowCount: 1, columnCount: 1 });
    formula.textContent = plan.formula;
    modelCodesFormula.hidden = plan.modelCodes === null;
    modelCodesFormula.textContent = plan.modelCodes === null ? '' : `${plan.modelCodes.formula} (header row, one code per column)`;
    const preview = previewSweep(resolved.input);
    const yLabel = q === undefined ? '' : withUnit(q.label, q.unit);
    caption.textContent = describePreview(preview, yLabel);
    const svg = drawPreview(doc, preview, yLabel, 'sw-plot-svg');
    if (preview.band === undefined || preview.band === null) plotHolder.replaceChildren(svg, caption);
    else plotHolder.replaceChildren(svg, drawLegend(doc, preview, 'sw-legend'), caption);
  }

  async function onInsert(): Promise<void> {
    const resolved = resolveSweep(readForm(), quantities);
    if (!resolved.ok) {
      context.announce(`Not inserted. ${resolved.problems.join(' ')}`, 'error');
      return;
    }
    insert.disabled = true;
    try {
      const { plan, chartError } = await insertSweep(context.port, resolved.input);
      const where = sheetAddress(plan.footprint);
      const axes = `${plan.chart.xLogarithmic ? 'log' : 'linear'} x, ${plan.chart.yLogarithmic ? 'log' : 'linear'} y`;
      const codes =
        plan.modelCodes === null
          ? ''
          : `, under ${plan.modelCodes.formula} in ${blockAddress(plan.modelCodes.cell)} (one model per column)`;
      const table =
        `Inserted at ${where}: ${plan.formula} in ${blockAddress(plan.formulaCell)} spills ` +
        `${plan.results.rowCount} × ${plan.results.columnCount} values${codes}`;
      if (chartError === null) context.announce(`${table}; chart added (${axes}).`, 'success');
      else context.announce(`${table}; the chart could not be added: ${chartError}.`, 'error');
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      context.announce(error instanceof PaneRefusal ? message : `Not inserted: ${message}`, 'error');
    } finally {
      insert.disabled = false;
    }
  }

  // Switching K ↔ °C keeps the temperatures the user meant: the entered values are converted.
  let shownUnit = unit.select.value as TemperatureUnit;
  unit.select.addEventListener('change', () => {
    const next = unit.select.value as TemperatureUnit;
    if (next === shownUnit) return;
    for (const input of [temperatureFrom.input, temperatureTo.input, fixedTemperature.input]) {
      const value = parseDecimalText(input.value);
      if (value === null) continue;
      input.value = String(next === '°C' ? fromKelvin(value, '°C') : toKelvin(value, '°C'));
    }
    shownUnit = next;
  });
  quantity.select.addEventListener('change', () => {
    buildSettings();
    refresh();
  });
  panel.addEventListener('input', refresh);
  panel.addEventListener('change', (event) => {
    if (event.target !== quantity.select) refresh();
  });
  insert.addEventListener('click', () => void onInsert());
  buildSettings();
  refresh();
}
