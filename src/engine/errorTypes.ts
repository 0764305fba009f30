/**
 * How cell errors translate between the catalog, HyperFormula and the .xlsx
 * file format, in one table each way. Nothing else in the engine names an
 * error type.
 */
import { ErrorType } from 'hyperformula';
import type { ErrorCode } from '../catalog/values';

/**
 * HyperFormula's error type for each catalog code. HyperFormula has no #NULL!
 * (Excel's empty-intersection error), so that code is shown as its generic
 * error and named in the message instead (see {@link messageForType}).
 */
const ERROR_TYPE_BY_CODE: Readonly<Record<ErrorCode, ErrorType>> = {
  '#VALUE!': ErrorType.VALUE,
  '#NUM!': ErrorType.NUM,
  '#N/A': ErrorType.NA,
  '#DIV/0!': ErrorType.DIV_BY_ZERO,
  '#REF!': ErrorType.REF,
  '#NAME?': ErrorType.NAME,
  '#NULL!': ErrorType.ERROR,
};

/** The catalog code for each HyperFormula error type that has one. */
const CODE_BY_ERROR_TYPE: ReadonlyMap<ErrorType, ErrorCode> = new Map(
  (Object.entries(ERROR_TYPE_BY_CODE) as [ErrorCode, ErrorType][])
    .filter(([code]) => code !== '#NULL!')
    .map(([code, type]) => [type, code]),
);

/**
 * The error literal written into an .xlsx cell for each HyperFormula error
 * type. #CYCLE!, #ERROR! and #LIC! are HyperFormula's own and not Excel error
 * values, so a file gets #VALUE! for them (the message says which it was).
 */
const FILE_TEXT_BY_ERROR_TYPE: Readonly<Record<ErrorType, string>> = {
  [ErrorType.VALUE]: '#VALUE!',
  [ErrorType.NUM]: '#NUM!',
  [ErrorType.NA]: '#N/A',
  [ErrorType.DIV_BY_ZERO]: '#DIV/0!',
  [ErrorType.REF]: '#REF!',
  [ErrorType.NAME]: '#NAME?',
  [ErrorType.SPILL]: '#SPILL!',
  [ErrorType.CYCLE]: '#VALUE!',
  [ErrorType.ERROR]: '#VALUE!',
  [ErrorType.LIC]: '#VALUE!',
};

/**
 * HyperFormula error type that shows a catalog code.
 *
 * @param code - the catalog's error code
 * @returns the ErrorType to construct a CellError with
 * @example errorTypeForCode('#N/A') // ErrorType.NA
 */
export function errorTypeForCode(code: ErrorCode): ErrorType {
  return ERROR_TYPE_BY_CODE[code];
}

/**
 * The message a CellError carries for a catalog failure: the failure's own
 * message, prefixed with its code where HyperFormula cannot show that code.
 *
 * @param code - the catalog's error code
 * @param message - the catalog's message
 * @example messageForType('#NULL!', 'ranges do not meet') // '#NULL!: ranges do not meet'
 */
export function messageForType(code: ErrorCode, message: string): string {
  return CODE_BY_ERROR_TYPE.get(ERROR_TYPE_BY_CODE[code]) === code ? message : `${code}: ${message}`;
}

/**
 * Catalog code for an error HyperFormula hands in as an argument.
 *
 * @param type - HyperFormula's error type
 * @returns the catalog code, or #VALUE! for types the catalog has no code for (#SPILL!, #CYCLE!, …)
 * @example codeForErrorType(ErrorType.DIV_BY_ZERO) // '#DIV/0!'
 */
export function codeForErrorType(type: ErrorType): ErrorCode {
  return CODE_BY_ERROR_TYPE.get(type) ?? '#VALUE!';
}

/**
 * The error literal an .xlsx cell stores for a HyperFormula error type.
 *
 * @param type - HyperFormula's error type
 * @returns an error value Excel reads, e.g. `#DIV/0!`
 * @example fileErrorText(ErrorType.CYCLE) // '#VALUE!'
 */
export function fileErrorText(type: ErrorType): string {
  return FILE_TEXT_BY_ERROR_TYPE[type];
}
