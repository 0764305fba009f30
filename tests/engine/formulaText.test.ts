import { createEngine } from '../../src/engine/engine';
import { displayFormula, engineFormula, storedFormula } from '../../src/engine/formulaText';

// Excel stores an Office add-in's JavaScript custom function with the prefix
// _xldudf (Microsoft, OfficeDev/Excel-Custom-Functions issue #108), NS.NAME as
// _xldudf_NS_NAME (observed in workbooks Excel wrote; common practice, no source).
describe('storedFormula', () => {
  it('writes DRIFT calls in the add-in form and leaves quoted text alone', () => {
    expect(storedFormula('=DRIFT.RESISTOR(DRIFT.RESISTIVITY(A2,"B"),1,2,3)')).toBe(
      '_xldudf_DRIFT_RESISTOR(_xldudf_DRIFT_RESISTIVITY(A2,"B"),1,2,3)',
    );
    expect(storedFormula('DRIFT.SHEETRES(A2,"DRIFT.X(")&\'DRIFT.Y(\'!A1')).toBe('_xldudf_DRIFT_SHEETRES(A2,"DRIFT.X(")&\'DRIFT.Y(\'!A1');
    expect(storedFormula('SUM(A1:A3)')).toBe('SUM(A1:A3)');
  });
  it('writes one form whatever form it reads: typed, stored, any case', () => {
    for (const text of [
      'DRIFT.SHEETRES(A2,10)',
      'drift.sheetres(A2,10)',
      'Drift.SheetRes(A2,10)',
      '_xldudf_DRIFT_SHEETRES(A2,10)',
      '_xldudf_drift_sheetres(A2,10)',
      '=DRIFT.SHEETRES(A2,10)',
    ]) {
      expect(storedFormula(text)).toBe('_xldudf_DRIFT_SHEETRES(A2,10)');
    }
    // Built-in prefixes stay (Excel needs them); other names that contain DRIFT are not DRIFT calls.
    expect(storedFormula('_xlfn.STDEV.S(A1:A3)+MYDRIFT.X(1)+A_xldudf_DRIFT_X(2)')).toBe(
      '_xlfn.STDEV.S(A1:A3)+MYDRIFT.X(1)+A_xldudf_DRIFT_X(2)',
    );
  });
  it('is undone by engineFormula', () => {
    const text = '=IF(DRIFT.DOPING(D4:E4,C4)>0,DRIFT.MODELS(),"DRIFT.INTRINSIC(")';
    expect(engineFormula(storedFormula(text))).toBe(text);
  });
});

describe('every form reads as the same call', () => {
  it('gives the same engine text and the same result', () => {
    const forms = ['DRIFT.SHEETRES(2,10)', 'drift.sheetres(2,10)', '_xldudf_DRIFT_SHEETRES(2,10)', '_xldudf_drift_sheetres(2,10)'];
    expect(new Set(forms.map(engineFormula))).toEqual(new Set(['=DRIFT.SHEETRES(2,10)']));
    const engine = createEngine({ S: [forms.map(engineFormula)] });
    try {
      // Sheet resistance = ρ / t: 2 Ω·cm over 10 µm = 2 / 10e-4 Ω/sq = 2000 Ω/sq (definition; common practice, no source).
      expect(engine.getSheetValues(0)).toEqual([[2000, 2000, 2000, 2000]]);
    } finally {
      engine.destroy();
    }
  });
});

describe('displayFormula', () => {
  it('shows a stored formula as typed in Excel', () => {
    expect(displayFormula('_xlfn.STDEV.S(_xldudf_DRIFT_SHEETRES(A2:A3,10))')).toBe('=STDEV.S(DRIFT.SHEETRES(A2:A3,10))');
    expect(displayFormula('drift.doping(A1,"_xldudf_DRIFT_X(")')).toBe('=DRIFT.DOPING(A1,"_xldudf_DRIFT_X(")');
  });
});

// Excel writes and users type exponents in upper case (1E+16); HyperFormula
// reads only lower case (found by the benchmark work).
describe('upper-case exponents', () => {
  it('are lowered in number literals only', () => {
    expect(engineFormula('DRIFT.RESISTIVITY(1E16,"B")')).toBe('=DRIFT.RESISTIVITY(1e16,"B")');
    expect(engineFormula('2.5E-3*A1+.5E+2-R1E1+"1E5"')).toBe('=2.5e-3*A1+.5e+2-R1E1+"1E5"');
  });
});
