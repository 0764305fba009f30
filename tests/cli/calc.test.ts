/**
 * `calc` in process: one formula or many (arguments, a file, stdin), the
 * record framing, exit statuses, --digits, hints (issue 13 §4, issue 14 §6).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { formulasOfText, parseDigits, runCalc, type CalcOptions } from '../../src/cli/calc';
import { CliFailure } from '../../src/cli/failure';

function calc(formulas: string[], options: CalcOptions = {}, stdin = '') {
  const out: string[] = [];
  const err: string[] = [];
  const status = runCalc(formulas, options, { out: (l) => out.push(l), err: (l) => err.push(l) }, () => stdin);
  return { status, out, err };
}

describe('several formulas', () => {
  it('prints one record per formula, in order, a spill as an array constant on one line', () => {
    expect(calc(['DRIFT.SHEETRES(1,10)', '=SEQUENCE(2,3)', '"text"', '1=1'])).toEqual({
      status: 0,
      out: ['1000', '{1,2,3;4,5,6}', '"text"', 'TRUE'],
      err: [],
    });
  });

  it('exits 1 when any whole result is an error and names the formula on stderr', () => {
    const result = calc(['DRIFT.SHEETRES(1,10)', 'DRIFT.RESISTIVITY(1e15,"B",-40)']);
    expect(result.status).toBe(1);
    expect(result.out).toEqual(['1000', '#VALUE! temperature_K must be ≥ 20 K and ≤ 1000 K; got -40']);
    expect(result.err).toEqual(['formula 2: hint: temperatures are in kelvin (K = °C + 273.15): -40 °C is 233.15 K']);
  });

  it('exits 0 when only some elements of a spill are errors, their messages on stderr with the formula named', () => {
    const result = calc(['1', 'DRIFT.SHEETRES({1,-1},10)']);
    expect(result.status).toBe(0);
    expect(result.out[1]).toBe('{1000,#VALUE!}');
    expect(result.err).toHaveLength(1);
    expect(result.err[0]).toMatch(/^formula 2: row 1, column 2: #VALUE! /);
  });

  it('reads a file: blank and # lines skipped, stderr names file and line', () => {
    const folder = mkdtempSync(join(tmpdir(), 'driftcell-calc-'));
    try {
      const file = join(folder, 'f.txt');
      writeFileSync(file, '# header\n\n  DRIFT.SHEETRES(1,10)  \r\n=#N/A\nDRIFT.RESISTIVITY(1e15,B)\n');
      const result = calc([], { file });
      expect(result.status).toBe(1);
      expect(result.out).toEqual(['1000', '#N/A', '#NAME? Named expression B not recognized.']);
      expect(result.err).toEqual([
        `${file} line 5: hint: B is not a defined name; if it is a code (dopant, material, model …), write it as text in double quotes: "B"`,
      ]);
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });

  it('reads stdin with - or --file -, and --batch gives the record form for one formula', () => {
    expect(calc(['-'], {}, 'SEQUENCE(1,2)\n').out).toEqual(['{1,2}']);
    expect(calc([], { file: '-' }, 'SEQUENCE(1,2)\n').out).toEqual(['{1,2}']);
    expect(calc(['SEQUENCE(2,1)'], { batch: true }).out).toEqual(['{1;2}']);
    expect(calc(['SEQUENCE(2,1)']).out).toEqual(['1', '2']);
  });

  it('refuses arguments together with --file, and no formulas at all', () => {
    expect(() => calc(['1'], { file: 'x' })).toThrow(new CliFailure('give the formulas either as arguments or with --file, not both'));
    expect(() => calc(['-'], {}, '\n# only a comment\n')).toThrow(/stdin holds no formulas/);
  });
});

describe('one formula', () => {
  it('refuses a reference with a message pointing to recalc', () => {
    const result = calc(['A1*2']);
    expect(result.status).toBe(1);
    expect(result.out[0]).toMatch(/^#REF! the formula refers to cell A1, but a formula evaluated on its own has no workbook/);
  });

  it('prints --digits significant digits in spills too', () => {
    expect(calc(['{28599999999999922000,0.5}'], { digits: '3' }).out).toEqual(['2.86e+19\t0.500']);
  });

  it('escapes control and bidi characters of a text result', () => {
    expect(calc(['"a"&CHAR(27)&"[31m"&UNICHAR(8238)&"b"']).out).toEqual(['a\\u{1b}[31m\\u{202e}b']);
  });
});

describe('parseDigits and formulasOfText', () => {
  it('takes whole numbers from 1 to 17 only', () => {
    expect(parseDigits('1')).toBe(1);
    expect(parseDigits('17')).toBe(17);
    expect(parseDigits(undefined)).toBeUndefined();
    for (const bad of ['0', '18', '2.5', 'three', '', '-3'])
      expect(() => parseDigits(bad)).toThrow(/--digits must be a whole number from 1 to 17/);
  });

  it('keeps line numbers of the file', () => {
    expect(formulasOfText('\n#c\nA\n', 'f')).toEqual([{ text: 'A', label: 'f line 3' }]);
  });
});

describe('DRIFT.MODELCODES, a row whose length its arguments decide', () => {
  const codes = ['f723-anchored', 'masetti', 'arora', 'caughey-thomas', 'klaassen', 'astm-f723'];

  it('prints the codes as one tab-separated row, and as an array constant in a batch', () => {
    expect(calc(['DRIFT.MODELCODES("resistivity","Si","B")'])).toEqual({ status: 0, out: [codes.join('\t')], err: [] });
    expect(calc(['DRIFT.MODELCODES("resistivity",,"Ga")', 'DRIFT.MODELCODES("intrinsic","Ge")'])).toEqual({
      status: 0,
      out: [
        `{${codes
          .slice(0, 5)
          .map((code) => `"${code}"`)
          .join(',')}}`,
        '"dos"',
      ],
      err: [],
    });
  });

  it('spills a model-taking function across every model: one value per code', () => {
    const result = calc(['DRIFT.RESISTIVITY({1e15;1e16},"B",300,DRIFT.MODELCODES("resistivity","Si","B"))']);
    expect(result.status).toBe(0);
    expect(result.out).toHaveLength(2);
    for (const line of result.out) expect(line.split('\t')).toHaveLength(codes.length);
    expect(result.out).toEqual(calc([`DRIFT.RESISTIVITY({1e15;1e16},"B",300,{${codes.map((code) => `"${code}"`).join(',')}})`]).out);
  });

  it('exits 1 with the engine’s reason when an argument is computed rather than typed', () => {
    const result = calc(['DRIFT.MODELCODES("resist"&"ivity")']);
    expect(result.status).toBe(1);
    expect(result.out).toEqual([
      expect.stringMatching(
        /^#VALUE! DRIFT\.MODELCODES needs its arguments typed into the formula in this engine \(driftcell calc, recalc\)/,
      ),
    ]);
  });

  it('exits 1 naming what is allowed for an unknown quantity', () => {
    expect(calc(['DRIFT.MODELCODES("conductance")'])).toMatchObject({
      status: 1,
      out: ['#VALUE! quantity "conductance" is not known; allowed: resistivity, mobility, intrinsic, bandgap-narrowing'],
    });
  });
});
