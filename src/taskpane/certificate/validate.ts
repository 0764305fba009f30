/**
 * Checks of the certificate check's input before anything is planned:
 * settings the check cannot work with are refused with a message saying what
 * is wrong and what is allowed; problems of single rows become warnings that
 * name the sheet rows, and the check still goes ahead.
 */
import { findFunction } from '../../catalog';
import { MAX_DENSITY, TEMPERATURE_RANGE_K } from '../../catalog/common';
import type { FunctionSpec } from '../../catalog/types';
import { sheetAddress, type CellBlock, type CellShown } from '../port';
import { parameterNamed } from '../reference/callText';
import { duplicateRole, ROLE_LABELS, type ColumnRole } from './roles';
import type { CertificateSettings, CertificateTable } from './settings';
import { PaneRefusal } from '../sheetPlan';
import { dopantCodeFor, dopantCodeList, knownDopant } from './typeCodes';
import { RESISTIVITY_UNITS, THICKNESS_UNITS, TEMPERATURE_UNITS, CELSIUS_ZERO_K, kelvinOf } from './units';

/** A catalog entry the check is built on. */
export function catalogEntry(name: string): FunctionSpec {
  const spec = findFunction(name);
  // The check is built on these catalog entries; a missing one is a wiring fault, caught by the unit tests.
  if (spec === undefined) throw new Error(`catalog has no ${name}`);
  return spec;
}

function isPositiveNumber(value: CellShown | undefined): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value > 0;
}

/** The material the dopant look-up uses: the chosen one, or the function's default when blank. */
export function materialCode(settings: CertificateSettings): string {
  return settings.material.trim() === '' ? (parameterNamed(catalogEntry('DOPING'), 'material').defaultText ?? 'Si') : settings.material;
}

/**
 * Refuses a selection of one row: a certificate table needs its header row and at least one wafer row.
 *
 * @param block - the selection
 * @throws PaneRefusal naming the selection
 */
export function requireTableRows(block: CellBlock): void {
  if (block.rowCount < 2) {
    throw new PaneRefusal(
      `Select the whole certificate table, header row included: the selection ` + `${sheetAddress(block)} has only one row.`,
    );
  }
}

/**
 * Refuses a table or settings the check cannot work with.
 *
 * @param table - the selection and its contents
 * @param settings - the user's choices
 * @param headers - header row as text
 * @throws PaneRefusal saying what is wrong and what is allowed
 */
export function validateSettings(table: CertificateTable, settings: CertificateSettings, headers: readonly string[]): void {
  const { block } = table;
  requireTableRows(block);
  if (settings.mapping.length !== block.columnCount) {
    throw new Error(`mapping has ${settings.mapping.length} roles for ${block.columnCount} columns`);
  }
  const duplicate = duplicateRole(settings.mapping, headers);
  if (duplicate !== null) throw new PaneRefusal(duplicate);
  for (const role of ['rho-min', 'rho-max'] as const) {
    if (!settings.mapping.includes(role)) {
      throw new PaneRefusal(`No column is mapped to '${ROLE_LABELS[role]}'. Choose the column that holds it in the mapping table.`);
    }
  }
  const { neededMin, neededMax } = settings;
  for (const [label, value] of [
    ['Needed doping min', neededMin],
    ['Needed doping max', neededMax],
  ] as const) {
    if (!Number.isFinite(value) || value <= 0 || value > MAX_DENSITY) {
      throw new PaneRefusal(`${label} must be a number above 0 and at most ${MAX_DENSITY} cm⁻³ (e.g. 1e15); got ${String(value)}.`);
    }
  }
  if (neededMin > neededMax) {
    throw new PaneRefusal(`Needed doping min (${neededMin}) is above needed doping max (${neededMax}); swap them.`);
  }
  if (
    !Number.isFinite(settings.temperatureK) ||
    settings.temperatureK < TEMPERATURE_RANGE_K.min ||
    settings.temperatureK > TEMPERATURE_RANGE_K.max
  ) {
    throw new PaneRefusal(
      `Temperature must be ${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K; got ` + `${String(settings.temperatureK)}.`,
    );
  }
  const doping = catalogEntry('DOPING');
  for (const name of ['model', 'material'] as const) {
    const parameter = parameterNamed(doping, name);
    const allowed = parameter.choices?.() ?? [];
    // A blank optional code leaves the choice to the function (the material's default model, Si).
    if (parameter.optional && settings[name].trim() === '') continue;
    if (!allowed.some((code) => code.toLowerCase() === settings[name].trim().toLowerCase())) {
      throw new PaneRefusal(`Unknown ${name} '${settings[name]}': allowed are ${allowed.join(', ')}.`);
    }
  }
  if (!settings.mapping.includes('type') && knownDopant(settings.dopant, materialCode(settings)) === null) {
    throw new PaneRefusal(
      `No column is mapped to 'Type or dopant', and the dopant '${settings.dopant}' is ` + `unknown; choose one of the listed dopants.`,
    );
  }
  if (settings.mapping.includes('thickness') && settings.thicknessUnit === null) {
    const header = headers[settings.mapping.indexOf('thickness')];
    throw new PaneRefusal(
      `The thickness column '${header}' names no unit the check knows; choose its unit ` +
        `(${THICKNESS_UNITS.map((unit) => unit.label).join(', ')}) or set the column to 'not used'.`,
    );
  }
  if (!RESISTIVITY_UNITS.some((unit) => unit.code === settings.resistivityUnit)) {
    throw new PaneRefusal(`Choose the unit of the resistivity columns (${RESISTIVITY_UNITS.map((unit) => unit.label).join(' or ')}).`);
  }
  const measuredAt = settings.measuredAt ?? null;
  if (measuredAt !== null) {
    const unit = TEMPERATURE_UNITS.find((candidate) => candidate.code === measuredAt.unit);
    if (unit === undefined)
      throw new PaneRefusal(`Choose the unit of 'Readings measured at' (${TEMPERATURE_UNITS.map((u) => u.label).join(' or ')}).`);
    const kelvin = kelvinOf(measuredAt.value, measuredAt.unit);
    if (!Number.isFinite(kelvin) || kelvin < TEMPERATURE_RANGE_K.min || kelvin > TEMPERATURE_RANGE_K.max) {
      const celsius = (kelvinValue: number) => (kelvinValue - CELSIUS_ZERO_K).toFixed(2);
      const celsiusRangeText = ` (${celsius(TEMPERATURE_RANGE_K.min)} to ${celsius(TEMPERATURE_RANGE_K.max)} °C)`;
      throw new PaneRefusal(
        `Readings measured at ${String(measuredAt.value)} ${unit.label} is outside ` +
          `${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K` +
          `${measuredAt.unit === 'C' ? celsiusRangeText : ''}; ` +
          `is the unit right?`,
      );
    }
    if (settings.model.trim().toLowerCase() === 'astm-f723') {
      throw new PaneRefusal(
        `The doping model astm-f723 has no temperature dependence, so readings measured at another ` +
          `temperature cannot be corrected with it; choose another model or clear 'Readings measured at'.`,
      );
    }
  }
  if (settings.radialLimitPercent !== null && (!Number.isFinite(settings.radialLimitPercent) || settings.radialLimitPercent < 0)) {
    throw new PaneRefusal(
      `The radial variation limit must be a number ≥ 0 (%), or left blank; got ` + `${String(settings.radialLimitPercent)}.`,
    );
  }
}

/**
 * Row-level problems, each naming the sheet rows, for the user to look at.
 *
 * @param table - the selection and its contents
 * @param settings - the user's choices
 * @returns warnings (empty when every row is fine)
 * @throws PaneRefusal when no row has positive numbers in both ρ min and ρ max
 */
export function rowWarnings(table: CertificateTable, settings: CertificateSettings): string[] {
  const { block, contents } = table;
  const col = (role: ColumnRole): number => settings.mapping.indexOf(role);
  const warnings: string[] = [];
  const unknownTypes: string[] = [];
  const swapped: number[] = [];
  const notNumbers: number[] = [];
  let usable = 0;
  for (let r = 1; r < block.rowCount; r += 1) {
    const row = contents.values[r] ?? [];
    const sheetRow = block.row + r + 1;
    const rhoMin = row[col('rho-min')];
    const rhoMax = row[col('rho-max')];
    if (isPositiveNumber(rhoMin) && isPositiveNumber(rhoMax)) {
      usable += 1;
      if (rhoMin > rhoMax) swapped.push(sheetRow);
    } else {
      notNumbers.push(sheetRow);
    }
    if (col('type') >= 0) {
      const code = dopantCodeFor(row[col('type')], settings.typeMeansConductivity);
      if (knownDopant(code, materialCode(settings)) === null) unknownTypes.push(`row ${sheetRow} ('${String(row[col('type')] ?? '')}')`);
    }
  }
  if (usable === 0) {
    throw new PaneRefusal(
      `No row of ${sheetAddress(block)} has positive numbers in both the ρ min and ρ max columns; check the ` +
        `mapping (the first row must be the header row).`,
    );
  }
  if (notNumbers.length > 0)
    warnings.push(`Rows ${notNumbers.join(', ')}: ρ min or ρ max is not a positive ` + `number, so their doping shows an error.`);
  if (swapped.length > 0)
    warnings.push(`Rows ${swapped.join(', ')}: ρ min is above ρ max; the check uses the lower and higher of the two.`);
  if (unknownTypes.length > 0) {
    warnings.push(
      `Type not known as a dopant in ${unknownTypes.join(', ')}; those rows show an error. ` +
        `Allowed (any case): ${dopantCodeList(materialCode(settings))}, n-type, p-type or element names.`,
    );
  }
  return warnings;
}
