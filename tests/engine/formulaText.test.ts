import { engineFormula, storedFormula } from '../../src/engine/formulaText';

// Excel stores an Office add-in's custom function NS.NAME as _xldudf_NS_NAME
// (observed in workbooks Excel wrote; common practice, no source).
describe('storedFormula', () => {
  it('writes DRIFT calls in the add-in form and leaves quoted text alone', () => {
    expect(storedFormula('=DRIFT.RESISTOR(DRIFT.RESISTIVITY(A2,"B"),1,2,3)')).toBe(
      '_xldudf_DRIFT_RESISTOR(_xldudf_DRIFT_RESISTIVITY(A2,"B"),1,2,3)',
    );
    expect(storedFormula('DRIFT.SHEETRES(A2,"DRIFT.X(")&\'DRIFT.Y(\'!A1')).toBe('_xldudf_DRIFT_SHEETRES(A2,"DRIFT.X(")&\'DRIFT.Y(\'!A1');
    expect(storedFormula('SUM(A1:A3)')).toBe('SUM(A1:A3)');
  });
  it('is undone by engineFormula', () => {
    const text = '=IF(DRIFT.DOPING(D4:E4,C4)>0,DRIFT.MODELS(),"DRIFT.INTRINSIC(")';
    expect(engineFormula(storedFormula(text))).toBe(text);
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
