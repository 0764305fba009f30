/**
 * The Certificate check's controls. Step 1 reads the selected table and shows
 * one labelled choice per column with the guessed meaning; step 2 takes the
 * needed doping window and options; "Add check columns" plans and writes
 * through the port. All logic lives in session.ts / plan.ts; this module only
 * builds elements and reads them back.
 */
import { findFunction } from '../../catalog';
import { F723_ANCHOR_TEMPERATURE } from '../../catalog/physicsFacade';
import { columnName, sheetAddress, type CellBlock } from '../port';
import type { ToolContext } from '../tool';
import { parameterNamed } from '../reference/callText';
import { checkField, element, labelledControl, numberInput, parseNumberField, selectOf } from '../dom';
import { PaneRefusal } from '../sheetPlan';
import type { CertificateSettings, MeasuredAt, TemperatureUnit, WindowRule } from './plan';
import { COLUMN_ROLES, ROLE_LABELS, type ColumnRole } from './roles';
import { addCertificateCheck, guessUnits, readCertificateTable, type CertificateGuess } from './session';
import { RESISTIVITY_UNITS, THICKNESS_UNITS, TEMPERATURE_UNITS } from './units';

const ID = 'certificate';

/** Choices of a DRIFT.DOPING parameter and its default, from the catalog. */
function dopingChoices(name: string): { codes: readonly string[]; defaultCode: string } {
  const parameter = parameterNamed(findFunction('DOPING')!, name);
  const codes = parameter.choices?.() ?? [];
  return { codes, defaultCode: parameter.defaultText ?? codes[0] ?? '' };
}

const WINDOW_RULES: readonly (readonly [WindowRule, string])[] = [
  ['certified-inside-needed', 'certified range inside needed window'],
  ['needed-inside-certified', 'needed window inside certified range'],
];

/** Shown in a unit select before the user has chosen. */
const CHOOSE = '';

/**
 * Builds the tool inside its panel.
 *
 * @param panel - the tool's panel element
 * @param context - port, document and announce from the shell
 */
export function mountCertificateCheck(panel: HTMLElement, context: ToolContext): void {
  const { doc } = context;
  panel.classList.add('dc-tool');
  let table: { block: CellBlock; guess: CertificateGuess } | null = null;

  const readButton = element(doc, 'button', { type: 'button', id: `${ID}-read`, class: 'dc-button', text: 'Read selected table' });
  const mappingSection = element(doc, 'section', {
    id: `${ID}-mapping`,
    class: 'dc-group',
    'aria-labelledby': `${ID}-mapping-title`,
    hidden: true,
  });
  const notes = element(doc, 'ul', { id: `${ID}-notes`, class: 'dc-notes' });

  // Units and type options, filled per table.
  const rhoUnit = selectOf(
    doc,
    `${ID}-rho-unit`,
    [[CHOOSE, 'choose…'], ...RESISTIVITY_UNITS.map((unit) => [unit.code, unit.label] as const)],
    RESISTIVITY_UNITS[0].code,
  );
  const thicknessUnit = selectOf(
    doc,
    `${ID}-thickness-unit`,
    [[CHOOSE, 'choose…'], ...THICKNESS_UNITS.map((unit) => [unit.code, unit.label] as const)],
    CHOOSE,
  );
  const typeSwitch = element(doc, 'input', { type: 'checkbox', id: `${ID}-type-means-conductivity`, checked: true });
  typeSwitch.checked = true;
  const dopants = dopingChoices('dopant');
  const dopantSelect = selectOf(
    doc,
    `${ID}-dopant`,
    dopants.codes.map((code) => [code, code] as const),
    dopants.codes.includes('B') ? 'B' : (dopants.codes[0] ?? ''),
  );
  const thicknessField = labelledControl(
    doc,
    'Thickness unit',
    thicknessUnit,
    'Converted to µm in the formulas: mm × 1000, mil × 25.4 (1 mil = 0.001 inch).',
  );
  const typeField = checkField(
    doc,
    typeSwitch,
    'Type column gives conductivity type: P means p-type, N means n-type',
    'On: a lone P or N (any case) becomes the generic acceptor or donor (boron-like or phosphorus-like ' +
      'mobility). Off: P means phosphorus, N nitrogen. B, As, Sb, Boron, n-type… are read as written ' +
      'either way.',
  );
  const dopantField = labelledControl(doc, 'Dopant (no type column mapped)', dopantSelect);

  // Window and options.
  const neededMin = numberInput(doc, `${ID}-needed-min`, 'e.g. 1e15');
  const neededMax = numberInput(doc, `${ID}-needed-max`, 'e.g. 2e15');
  const windowRule = selectOf(doc, `${ID}-window-rule`, WINDOW_RULES, WINDOW_RULES[0][0]);
  const temperature = numberInput(doc, `${ID}-temperature`);
  // Certificates state resistivity at 23 °C (the temperature of ASTM F723 and F84), so the check starts
  // there rather than at DRIFT.DOPING's blank 300 K; the default model then gives F723's own numbers.
  const defaultTemperature = String(F723_ANCHOR_TEMPERATURE);
  temperature.value = defaultTemperature;
  // Readings taken at the lab's temperature: optional; its unit is chosen by the user, never read from the number.
  const measuredAt = numberInput(doc, `${ID}-measured-at`, 'blank: at the certificate temperature');
  const measuredUnit = selectOf(
    doc,
    `${ID}-measured-unit`,
    [[CHOOSE, 'choose…'], ...TEMPERATURE_UNITS.map((unit) => [unit.code, unit.label] as const)],
    CHOOSE,
  );
  measuredUnit.setAttribute('aria-label', 'Unit of readings measured at');
  const models = dopingChoices('model');
  const modelSelect = selectOf(doc, `${ID}-model`, [['', models.defaultCode], ...models.codes.map((code) => [code, code] as const)], '');
  const materials = dopingChoices('material');
  const materialSelect = selectOf(
    doc,
    `${ID}-material`,
    materials.codes.map((code) => [code, code] as const),
    materials.defaultCode,
  );
  // Model spread beside the doping window: off unless asked for, so the check is unchanged by default.
  const spreadSwitch = element(doc, 'input', { type: 'checkbox', id: `${ID}-model-spread` });
  const spreadField = checkField(
    doc,
    spreadSwitch,
    'Show the model spread: lowest and highest doping over the published models',
    'The spread is how far the published resistivity fits disagree for the certificate’s ρ, not a ' +
      'measurement uncertainty: the fits can share a bias, and the measured ρ has its own tolerance. ' +
      'Adds DRIFT.DOPINGSPREAD at ρmax and at ρmin over every resistivity model of the material, whichever ' +
      'doping model is chosen (a material with one model shows 0 %). Pass/fail does not use it.',
  );
  const radialLimit = numberInput(doc, `${ID}-radial-limit`, 'no limit');
  const addButton = element(doc, 'button', { type: 'button', id: `${ID}-add`, class: 'dc-button dc-primary', text: 'Add check columns' });

  const roleSelects: HTMLSelectElement[] = [];

  function currentMapping(): ColumnRole[] {
    return roleSelects.map((select) => select.value as ColumnRole);
  }

  function showNotes(lines: readonly string[]): void {
    notes.replaceChildren(...lines.map((line) => element(doc, 'li', { text: line })));
  }

  /** Shows or hides the fields that depend on the mapping. */
  function refreshDependentFields(): void {
    const mapping = currentMapping();
    thicknessField.hidden = !mapping.includes('thickness');
    typeField.hidden = !mapping.includes('type');
    dopantField.hidden = mapping.includes('type');
  }

  function showMapping(block: CellBlock, guess: CertificateGuess): void {
    roleSelects.length = 0;
    const body = element(doc, 'tbody');
    guess.headers.forEach((header, index) => {
      const letter = columnName(block.column + index);
      const select = selectOf(
        doc,
        `${ID}-role-${index}`,
        COLUMN_ROLES.map((role) => [role, ROLE_LABELS[role]] as const),
        guess.mapping[index],
      );
      select.setAttribute('aria-label', `Meaning of column ${letter}${header === '' ? '' : ` (${header})`}`);
      select.addEventListener('change', () => {
        refreshDependentFields();
        if (table !== null && select.value !== 'ignore') {
          // A newly mapped thickness or resistivity column may name its unit.
          const units = guessUnits(table.guess.headers, currentMapping());
          if (select.value === 'thickness' && units.thicknessUnit !== null) thicknessUnit.value = units.thicknessUnit;
        }
      });
      roleSelects.push(select);
      body.append(
        element(doc, 'tr', {}, [
          element(doc, 'th', { scope: 'row', text: letter }),
          element(doc, 'td', { class: 'dc-header-text', text: header === '' ? '(no header)' : header }),
          element(doc, 'td', {}, [select]),
        ]),
      );
    });
    const mappingTable = element(doc, 'table', { class: 'dc-mapping' }, [
      element(doc, 'thead', {}, [
        element(doc, 'tr', {}, [
          element(doc, 'th', { scope: 'col', text: 'Column' }),
          element(doc, 'th', { scope: 'col', text: 'Header' }),
          element(doc, 'th', { scope: 'col', text: 'Meaning' }),
        ]),
      ]),
      body,
    ]);
    rhoUnit.value = guess.resistivityUnit ?? CHOOSE;
    thicknessUnit.value = guess.thicknessUnit ?? CHOOSE;
    mappingSection.replaceChildren(
      element(doc, 'h3', { id: `${ID}-mapping-title`, text: `Columns of ${sheetAddress(block)}` }),
      element(doc, 'p', { class: 'dc-hint', text: 'Check the guessed meaning of each column and correct it where needed.' }),
      element(doc, 'div', { class: 'dc-scroll' }, [mappingTable]),
      labelledControl(doc, 'Resistivity unit (all ρ columns)', rhoUnit),
      thicknessField,
      typeField,
      dopantField,
    );
    mappingSection.hidden = false;
    refreshDependentFields();
  }

  function readSettings(): CertificateSettings {
    const min = parseNumberField(neededMin.value, 'Needed doping min');
    const max = parseNumberField(neededMax.value, 'Needed doping max');
    if (min === null || max === null) throw new PaneRefusal('Type the needed doping window: its min and max in cm⁻³, e.g. 1e15 and 2e15.');
    const temperatureK = parseNumberField(temperature.value, 'Temperature') ?? Number(defaultTemperature);
    const measuredValue = parseNumberField(measuredAt.value, 'Readings measured at');
    if (measuredValue !== null && measuredUnit.value === CHOOSE) {
      throw new PaneRefusal(
        `Choose the unit of 'Readings measured at' ` +
          `(${TEMPERATURE_UNITS.map((unit) => unit.label).join(' or ')}): ${measuredValue} could be either.`,
      );
    }
    const measured: MeasuredAt | null =
      measuredValue === null
        ? null
        : {
            value: measuredValue,
            unit: measuredUnit.value as TemperatureUnit,
          };
    return {
      mapping: currentMapping(),
      neededMin: min,
      neededMax: max,
      windowRule: windowRule.value as WindowRule,
      typeMeansConductivity: typeSwitch.checked,
      dopant: dopantSelect.value,
      resistivityUnit: rhoUnit.value,
      thicknessUnit: thicknessUnit.value === CHOOSE ? null : thicknessUnit.value,
      temperatureK,
      model: modelSelect.value,
      material: materialSelect.value,
      radialLimitPercent: parseNumberField(radialLimit.value, 'Max |radial variation|'),
      measuredAt: measured,
      modelSpread: spreadSwitch.checked,
    };
  }

  function reportFailure(error: unknown): void {
    // A PaneRefusal (and any other Error) says what went wrong in its message; anything else thrown is unexpected.
    context.announce(error instanceof Error ? error.message : `Unexpected problem: ${String(error)}`, 'error');
  }

  readButton.addEventListener('click', () => {
    void (async () => {
      try {
        const { table: read, guess } = await readCertificateTable(context.port);
        table = { block: read.block, guess };
        showMapping(read.block, guess);
        showNotes(guess.notes);
        const mapped = guess.mapping.filter((role) => role !== 'ignore').length;
        context.announce(
          mapped === 0
            ? `Read ${read.block.rowCount - 1} rows, but no header was recognised: is the first selected ` +
                `row the header row? Choose each column’s meaning by hand.`
            : `Read ${read.block.rowCount - 1} wafer rows; ${mapped} of ${guess.headers.length} columns ` +
                `recognised. Check the mapping, then add the check.`,
          'info',
        );
        roleSelects[0]?.focus();
      } catch (error) {
        reportFailure(error);
      }
    })();
  });

  addButton.addEventListener('click', () => {
    void (async () => {
      try {
        if (table === null)
          throw new PaneRefusal(
            'Select the certificate table in the sheet (header row ' + 'included) and press “Read selected table” first.',
          );
        const plan = await addCertificateCheck(context.port, table.block, readSettings());
        showNotes(plan.warnings);
        context.announce(
          plan.warnings.length === 0 ? plan.summary : `${plan.summary} ${plan.warnings.length} warning(s) below.`,
          'success',
        );
      } catch (error) {
        reportFailure(error);
      }
    })();
  });

  const windowGroup = element(doc, 'fieldset', { class: 'dc-group' }, [
    element(doc, 'legend', { text: 'Doping window the design needs (cm⁻³)' }),
    element(doc, 'div', { class: 'dc-row' }, [labelledControl(doc, 'Min', neededMin), labelledControl(doc, 'Max', neededMax)]),
    labelledControl(
      doc,
      'Pass when the',
      windowRule,
      'Certified range inside needed window: every doping the certificate allows meets the design (higher ρ ' +
        'means lower doping). The other rule only asks that the certificate’s range covers the needed ' +
        'window.',
    ),
    spreadField,
  ]);
  const more = element(doc, 'details', { class: 'dc-group' }, [
    element(doc, 'summary', { text: 'More settings' }),
    labelledControl(
      doc,
      'Temperature (K)',
      temperature,
      'Temperature at which the certificate’s ' + 'resistivity values hold; blank means the functions’ default.',
    ),
    element(doc, 'div', { class: 'dc-row' }, [
      labelledControl(
        doc,
        'Readings measured at',
        measuredAt,
        'Temperature of the lab when the centre, edge and other readings were taken. Each reading is then ' +
          'corrected to the temperature above with DRIFT.RESISTIVITYAT before it is checked. Blank: ' +
          'readings are taken as they are.',
      ),
      labelledControl(doc, 'Unit', measuredUnit),
    ]),
    labelledControl(doc, 'Doping model', modelSelect),
    labelledControl(doc, 'Material', materialSelect),
    labelledControl(
      doc,
      'Max |radial variation| (%)',
      radialLimit,
      'Blank: radial variation is shown but not part of pass/fail. Needs a centre and an edge column.',
    ),
  ]);

  panel.append(
    element(doc, 'h2', { text: 'Certificate check' }),
    element(doc, 'p', {
      class: 'dc-hint',
      text:
        'Select a supplier’s certificate table in the sheet, header row included. The check adds ' +
        'columns of live formulas to its right and never writes over your cells.',
    }),
    readButton,
    mappingSection,
    windowGroup,
    more,
    addButton,
    notes,
  );
}
