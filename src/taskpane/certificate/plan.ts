/**
 * Plans the certificate check: new columns of live DRIFT formulas to the right
 * of a supplier's table, one formula per wafer row, and a small block of
 * labelled parameter cells (the needed doping window, temperature, model,
 * material…) that every formula references, so changing a parameter cell
 * re-checks the whole table. The plan is data (see ../sheetPlan.ts); nothing
 * here touches a workbook.
 *
 * Layout, left to right, starting in the first column after the table:
 *   [dopant code] | doping at ρmax | doping at ρmin | window check | [model spread at ρmax, at ρmin] |
 *   [corrected readings] | [readings check] | [Rs] | [radial variation] | pass/fail
 *   (one empty column) | parameter label | parameter value
 *
 * Model spread (settings.modelSpread, off by default): three columns for each
 * end of the certificate's window, ρmax first as in the doping columns, filled
 * by ONE DRIFT.DOPINGSPREAD formula per end and row that spills [lowest,
 * highest, highest/lowest − 1] over every resistivity model of the material.
 * Its arguments are the doping columns' own: the same ρ, dopant, certificate
 * temperature and material, no counter-doping and no doping window (the
 * doping columns pass neither). 'Readings measured at' does not enter it: like
 * the doping columns it is the certificate's resistivity at the certificate's
 * temperature; only readings are converted. Pass/fail does not use it.
 *
 * Corrected readings: when the readings were measured at another temperature
 * (settings.measuredAt), one column per reading column holds it converted to
 * the certificate's temperature with DRIFT.RESISTIVITYAT (in Ω·cm), and the
 * readings check, Rs and radial variation use those columns instead.
 *
 * Pass/fail: PASS when the window check says "yes", the readings check (if
 * readings are mapped) is not "no", and |radial variation| is within the
 * optional limit; FAIL otherwise. An error in a row's inputs shows as that
 * error (with its message) rather than as PASS or FAIL.
 */
import { areaName, blockAddress, cellName, columnName, sheetAddress, type CellBlock, type CellInput } from '../port';
import { callText, parameterNamed } from '../reference/callText';
import { READING_ROLES, type ColumnRole } from './roles';
import type { CertificateSettings, CertificateTable } from './settings';
import type { SheetPlan } from '../sheetPlan';
import { dopantCodeFormula } from './typeCodes';
import { RESISTIVITY_UNITS, THICKNESS_UNITS, kelvinOf, unitByCode } from './units';
import { catalogEntry, rowWarnings, validateSettings } from './validate';

export type { CertificateSettings, CertificateTable, MeasuredAt, TemperatureUnit, WindowRule } from './settings';

/** The plan plus what the pane tells the user. */
export interface CertificatePlan extends SheetPlan {
  /** Headers of the new columns, left to right. */
  readonly headers: readonly string[];
  /** All new columns, header row included. */
  readonly columnsBlock: CellBlock;
  /** The pass/fail cells (data rows only). */
  readonly passFailBlock: CellBlock;
  /** Labels and values of the parameter cells. */
  readonly parameterBlock: CellBlock;
  /** Problems in single rows that do not stop the check (unknown type, swapped window…). */
  readonly warnings: readonly string[];
  /** One sentence saying what will be written where. */
  readonly summary: string;
}

/** Words the formulas write; the highlight rules match them exactly. */
export const VERDICT = { pass: 'PASS', fail: 'FAIL', yes: 'yes', no: 'no', none: 'none' } as const;

/** Highlight colours of our own choosing, readable in light and dark sheets. */
const PASS_COLOURS = { fill: '#cdebd6', fontColor: '#0f4d26' } as const;
const FAIL_COLOURS = { fill: '#f6d3cf', fontColor: '#7a1a10' } as const;

const FORMATS = { density: '0.00E+00', sheetResistance: '0.0', percent: '0.00', resistivity: '0.0000', fraction: '0.0%' } as const;

/** A1 references of several columns in one row, contiguous runs as ranges: 'F2:H2,J2'. */
export function rowReferences(columns: readonly number[], row: number): string {
  const sorted = [...columns].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < sorted.length;) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j += 1;
    parts.push(areaName(row, sorted[i], row, sorted[j]));
    i = j + 1;
  }
  return parts.join(',');
}

function scaled(expression: string, factor: number): string {
  return factor === 1 ? expression : `${expression}*${factor}`;
}

function absolute(row: number, column: number): string {
  return `$${columnName(column)}$${row + 1}`;
}

/**
 * One new column: header, number format, and its formula for a sheet row
 * (null: the cell is left empty for the spill of a formula to its left).
 */
interface PlannedColumn {
  readonly header: string;
  readonly numberFormat?: string;
  readonly formula: (sheetRow: number) => string | null;
}

/** One labelled parameter cell. */
interface PlannedParameter {
  readonly key: string;
  readonly label: string;
  readonly value: CellInput;
  readonly numberFormat?: string;
}

/**
 * Plans the check of a certificate table.
 *
 * @param table - the selection (header row + wafer rows) and its contents
 * @param settings - mapping, needed window and options from the pane
 * @returns the cells, styles and highlights to write, with warnings and a summary
 * @throws PaneRefusal with a message for the user when the table or settings cannot be checked
 * @example planCertificateCheck(table, { ...settings, neededMin: 1e15, neededMax: 2e15 }).headers
 */
export function planCertificateCheck(table: CertificateTable, settings: CertificateSettings): CertificatePlan {
  const { block, contents } = table;
  const headers = (contents.values[0] ?? []).map((value) => (value === null || typeof value === 'object' ? '' : String(value)));
  validateSettings(table, settings, headers);
  const warnings = rowWarnings(table, settings);

  const doping = catalogEntry('DOPING');
  const sheetRes = catalogEntry('SHEETRES');
  const dopingSpread = catalogEntry('DOPINGSPREAD');
  const radial = catalogEntry('RADIALVARIATION');
  const densityUnit = doping.result.unit ?? 'cm⁻³';

  const sheetColumn = (role: ColumnRole): number => block.column + settings.mapping.indexOf(role);
  const columnsOf = (roles: ReadonlySet<ColumnRole> | ColumnRole): number[] =>
    settings.mapping.flatMap((role, index) =>
      (typeof roles === 'string' ? role === roles : roles.has(role)) ? [block.column + index] : [],
    );
  const has = (role: ColumnRole): boolean => settings.mapping.includes(role);
  const ref = (role: ColumnRole, sheetRow: number): string => cellName(sheetRow, sheetColumn(role));

  const rhoFactor = unitByCode(RESISTIVITY_UNITS, settings.resistivityUnit).factor;
  const readingColumns = columnsOf(READING_ROLES);
  const resistivityAt = catalogEntry('RESISTIVITYAT');
  const measuredAt = settings.measuredAt ?? null;
  const correcting = measuredAt !== null && readingColumns.length > 0;
  if (measuredAt !== null && readingColumns.length === 0) {
    warnings.push('‘Readings measured at’ is not used: no column is mapped to a reading (centre, edge or other site).');
  }
  const edgeColumns = columnsOf('rho-edge');
  const hasRadial = has('rho-center') && edgeColumns.length > 0;
  const radialLimit = hasRadial ? settings.radialLimitPercent : null;
  if (!hasRadial && settings.radialLimitPercent !== null) {
    warnings.push('The radial variation limit is not used: map a centre column and at least one edge column to check it.');
  }

  // Parameter block: to the right of the new columns, after one empty column.
  const parameters: PlannedParameter[] = [
    { key: 'title', label: 'Certificate check parameters', value: null },
    { key: 'neededMin', label: `Needed doping min (${densityUnit})`, value: settings.neededMin, numberFormat: FORMATS.density },
    { key: 'neededMax', label: `Needed doping max (${densityUnit})`, value: settings.neededMax, numberFormat: FORMATS.density },
    ...(has('type') ? [] : [{ key: 'dopant', label: 'Dopant (no type column)', value: settings.dopant.trim() }]),
    { key: 'temperature', label: `Temperature (${parameterNamed(doping, 'temperature_K').unit ?? 'K'})`, value: settings.temperatureK },
    // Written in K whatever unit was typed, so the formulas reference it without a conversion.
    ...(correcting
      ? [
          {
            key: 'measuredAt',
            label: `Readings measured at (${parameterNamed(resistivityAt, 'measured_temperature_K').unit ?? 'K'})`,
            value: kelvinOf(measuredAt!.value, measuredAt!.unit),
          },
        ]
      : []),
    // A model or material left to its default gets no cell: the formulas then omit the argument, rather than
    // pass a reference to a blank cell (how Excel hands a blank cell to a custom function is not documented).
    ...(settings.model.trim() === '' ? [] : [{ key: 'model', label: 'Doping model', value: settings.model.trim() }]),
    ...(settings.material.trim() === '' ? [] : [{ key: 'material', label: 'Material', value: settings.material.trim() }]),
    ...(radialLimit === null
      ? []
      : [{ key: 'radialLimit', label: `Max |radial variation| (${radial.result.unit ?? '%'})`, value: radialLimit }]),
  ];

  const columns: PlannedColumn[] = [];
  const firstNew = block.column + block.columnCount;
  /** The cell of a new column (by offset) in a sheet row. */
  const newCell = (offset: number, row: number): string => cellName(row, firstNew + offset);
  // Parameter cell references need the parameter block's column, known once the column count is;
  // columns are built as closures and the block column is fixed below before any formula is produced.
  let parameterColumn = -1;
  const optionalParameterRef = (key: string): string | undefined =>
    parameters.some((parameter) => parameter.key === key) ? parameterRef(key) : undefined;
  const parameterRef = (key: string): string => {
    const index = parameters.findIndex((parameter) => parameter.key === key);
    if (index < 0) throw new Error(`no parameter '${key}'`);
    return absolute(block.row + index, parameterColumn + 1);
  };

  const dopantColumn = has('type') ? columns.length : -1;
  if (has('type')) {
    columns.push({
      header: settings.typeMeansConductivity ? 'Dopant code (P/N read as p-/n-type)' : 'Dopant code (P/N read as elements)',
      formula: (row) => dopantCodeFormula(ref('type', row), settings.typeMeansConductivity),
    });
  }
  const dopantArgument = (row: number): string => (dopantColumn >= 0 ? newCell(dopantColumn, row) : parameterRef('dopant'));
  const dopingAt =
    (role: 'rho-min' | 'rho-max') =>
    (row: number): string =>
      callText(doping, {
        resistivity: scaled(ref(role, row), rhoFactor),
        dopant: dopantArgument(row),
        temperature_K: parameterRef('temperature'),
        model: optionalParameterRef('model'),
        material: optionalParameterRef('material'),
      });
  const atRhoMaxColumn = columns.length;
  columns.push({ header: `Doping at ρmax (${densityUnit})`, numberFormat: FORMATS.density, formula: dopingAt('rho-max') });
  const atRhoMinColumn = columns.length;
  columns.push({ header: `Doping at ρmin (${densityUnit})`, numberFormat: FORMATS.density, formula: dopingAt('rho-min') });

  const windowColumn = columns.length;
  columns.push({
    header:
      settings.windowRule === 'certified-inside-needed' ? 'Certified doping inside needed window' : 'Needed window inside certified doping',
    formula: (row) => {
      const pair = `${newCell(atRhoMaxColumn, row)},${newCell(atRhoMinColumn, row)}`;
      const [low, high] = [`MIN(${pair})`, `MAX(${pair})`];
      const [min, max] = [parameterRef('neededMin'), parameterRef('neededMax')];
      const inside =
        settings.windowRule === 'certified-inside-needed' ? `AND(${low}>=${min},${high}<=${max})` : `AND(${low}<=${min},${high}>=${max})`;
      return `IF(${inside},"${VERDICT.yes}","${VERDICT.no}")`;
    },
  });

  if (settings.modelSpread === true) {
    // The spilled row's names come from the catalog entry; the relative spread has no unit (shown as %).
    if (dopingSpread.kind !== 'tuple' || dopingSpread.columns.length !== 3)
      throw new Error(`${dopingSpread.name} is not a row of three values`);
    const [lowest, highest, relative] = dopingSpread.columns;
    const spreadUnit = dopingSpread.result.unit ?? densityUnit;
    for (const [role, end] of [
      ['rho-max', 'ρmax'],
      ['rho-min', 'ρmin'],
    ] as const) {
      columns.push(
        {
          header: `Doping at ${end} over models: ${lowest} (${spreadUnit})`,
          numberFormat: FORMATS.density,
          formula: (row) =>
            callText(dopingSpread, {
              resistivity: scaled(ref(role, row), rhoFactor),
              dopant: dopantArgument(row),
              temperature_K: parameterRef('temperature'),
              material: optionalParameterRef('material'),
            }),
        },
        { header: `Doping at ${end} over models: ${highest} (${spreadUnit})`, numberFormat: FORMATS.density, formula: () => null },
        { header: `Doping at ${end} over models: ${relative}`, numberFormat: FORMATS.fraction, formula: () => null },
      );
    }
  }

  // The reading cells the checks use: the readings themselves, or their corrected columns.
  const correctedOffset = new Map<number, number>();
  if (correcting) {
    for (const column of readingColumns) {
      const header = headers[column - block.column] ?? '';
      correctedOffset.set(column, columns.length);
      columns.push({
        header:
          `${header === '' ? `Column ${columnName(column)}` : header} at certificate temperature ` +
          `(${resistivityAt.result.unit ?? 'Ω·cm'})`,
        numberFormat: FORMATS.resistivity,
        formula: (row) => {
          const reading = cellName(row, column);
          // A blank reading stays blank (""), so COUNT/MIN/MAX skip it as they skip the blank cell.
          const corrected = callText(resistivityAt, {
            resistivity: scaled(reading, rhoFactor),
            dopant: dopantArgument(row),
            measured_temperature_K: parameterRef('measuredAt'),
            target_temperature_K: parameterRef('temperature'),
            model: optionalParameterRef('model'),
            material: optionalParameterRef('material'),
          });
          return `IF(ISNUMBER(${reading}),${corrected},"")`;
        },
      });
    }
  }
  /** References of reading cells in a row, corrected where correcting (then in Ω·cm). */
  const readingRefs = (columnsWanted: readonly number[], row: number): string =>
    correcting
      ? rowReferences(
          columnsWanted.map((column) => firstNew + correctedOffset.get(column)!),
          row,
        )
      : rowReferences(columnsWanted, row);
  const readingRef = (role: ColumnRole, row: number): string => readingRefs([sheetColumn(role)], row);

  const readingsColumn = readingColumns.length > 0 ? columns.length : -1;
  if (readingsColumn >= 0) {
    columns.push({
      header: correcting ? 'Corrected readings inside ρ window' : 'Readings inside ρ window',
      formula: (row) => {
        const readings = readingRefs(readingColumns, row);
        // Corrected readings are in Ω·cm; the window is then scaled to Ω·cm too.
        const window = correcting
          ? `${scaled(ref('rho-min', row), rhoFactor)},${scaled(ref('rho-max', row), rhoFactor)}`
          : `${ref('rho-min', row)},${ref('rho-max', row)}`;
        const inside = `AND(MIN(${readings})>=MIN(${window}),MAX(${readings})<=MAX(${window}))`;
        return `IF(COUNT(${readings})=0,"${VERDICT.none}",IF(${inside},"${VERDICT.yes}","${VERDICT.no}"))`;
      },
    });
  }

  if (has('thickness')) {
    const thicknessFactor = unitByCode(THICKNESS_UNITS, settings.thicknessUnit ?? '').factor;
    const fromReadings = readingColumns.length > 0;
    columns.push({
      header:
        `Rs at nominal thickness, ` +
        `${fromReadings ? (correcting ? 'mean corrected reading' : 'mean reading') : 'mid-window ρ'} ` +
        `(${sheetRes.result.unit ?? 'Ω/sq'})`,
      numberFormat: FORMATS.sheetResistance,
      formula: (row) => {
        const rho = fromReadings
          ? `AVERAGE(${readingRefs(readingColumns, row)})`
          : `AVERAGE(${ref('rho-min', row)},${ref('rho-max', row)})`;
        const inOhmCm = fromReadings && correcting ? rho : scaled(rho, rhoFactor);
        return callText(sheetRes, { resistivity: inOhmCm, thickness_um: scaled(ref('thickness', row), thicknessFactor) });
      },
    });
  }

  const radialColumn = hasRadial ? columns.length : -1;
  if (hasRadial) {
    const edgeTargets = correcting ? edgeColumns.map((column) => firstNew + correctedOffset.get(column)!) : edgeColumns;
    const contiguous = edgeTargets.every((column, index) => index === 0 || column === edgeTargets[index - 1] + 1);
    columns.push({
      header: `Radial variation (${radial.result.unit ?? '%'})`,
      numberFormat: FORMATS.percent,
      formula: (row) => {
        const edges = readingRefs(edgeColumns, row);
        // edge_values takes one range; separate edge columns are averaged first, which is the same mean.
        return callText(radial, { center: readingRef('rho-center', row), edge_values: contiguous ? edges : `AVERAGE(${edges})` });
      },
    });
  }

  const passColumn = columns.length;
  columns.push({
    header: 'Pass/fail',
    formula: (row) => {
      const conditions = [`${newCell(windowColumn, row)}="${VERDICT.yes}"`];
      if (readingsColumn >= 0) conditions.push(`${newCell(readingsColumn, row)}<>"${VERDICT.no}"`);
      if (radialLimit !== null) conditions.push(`ABS(${newCell(radialColumn, row)})<=${parameterRef('radialLimit')}`);
      return `IF(AND(${conditions.join(',')}),"${VERDICT.pass}","${VERDICT.fail}")`;
    },
  });

  parameterColumn = firstNew + columns.length + 1;
  const dataRows = block.rowCount - 1;
  const columnsBlock: CellBlock = {
    sheet: block.sheet,
    row: block.row,
    column: firstNew,
    rowCount: block.rowCount,
    columnCount: columns.length,
  };
  const parameterBlock: CellBlock = {
    sheet: block.sheet,
    row: block.row,
    column: parameterColumn,
    rowCount: parameters.length,
    columnCount: 2,
  };
  const cells: CellInput[][] = [
    columns.map((column) => column.header),
    ...Array.from({ length: dataRows }, (_, index) =>
      columns.map((column): CellInput => {
        const formula = column.formula(block.row + 1 + index);
        return formula === null ? null : `=${formula}`;
      }),
    ),
  ];
  const passFailBlock: CellBlock = {
    sheet: block.sheet,
    row: block.row + 1,
    column: firstNew + passColumn,
    rowCount: dataRows,
    columnCount: 1,
  };

  const dataColumn = (offset: number): CellBlock => ({
    sheet: block.sheet,
    row: block.row + 1,
    column: firstNew + offset,
    rowCount: dataRows,
    columnCount: 1,
  });
  const styles = [
    { block: { ...columnsBlock, rowCount: 1 }, bold: true },
    { block: { ...parameterBlock, rowCount: 1, columnCount: 1 }, bold: true },
    ...columns.flatMap((column, offset) => (column.numberFormat ? [{ block: dataColumn(offset), numberFormat: column.numberFormat }] : [])),
    ...parameters.flatMap((parameter, index) =>
      parameter.numberFormat
        ? [
            {
              block: { sheet: block.sheet, row: block.row + index, column: parameterColumn + 1, rowCount: 1, columnCount: 1 },
              numberFormat: parameter.numberFormat,
            },
          ]
        : [],
    ),
  ];

  return {
    writes: [
      { block: columnsBlock, cells },
      { block: parameterBlock, cells: parameters.map((parameter) => [parameter.label, parameter.value]) },
    ],
    styles,
    highlights: [
      { block: passFailBlock, text: VERDICT.pass, ...PASS_COLOURS },
      { block: passFailBlock, text: VERDICT.fail, ...FAIL_COLOURS },
    ],
    headers: columns.map((column) => column.header),
    columnsBlock,
    passFailBlock,
    parameterBlock,
    warnings,
    summary:
      `Checks ${dataRows} wafer row${dataRows === 1 ? '' : 's'}: ${columns.length} new columns in ${sheetAddress(columnsBlock)}, ` +
      `parameters in ${blockAddress(parameterBlock)} (change them there to re-check).`,
  };
}
