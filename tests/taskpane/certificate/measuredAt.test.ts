/**
 * The certificate check with readings measured at another temperature: each
 * reading column gets a corrected column (DRIFT.RESISTIVITYAT to the
 * certificate's temperature), and the readings check, Rs and radial variation
 * use the corrected readings. Expected numbers come from calling the catalog
 * directly, so these tests check the written formulas, not the physics
 * (tests/physics/temperatureConversion.test.ts does that).
 */
import { findFunction, qualifiedName } from '../../../src/catalog';
import { planCertificateCheck, type CertificateSettings } from '../../../src/taskpane/certificate/plan';
import { addCertificateCheck } from '../../../src/taskpane/certificate/session';
import { kelvinOf } from '../../../src/taskpane/certificate/units';
import { PaneRefusal } from '../../../src/taskpane/sheetPlan';
import { value } from '../../catalog/support/call';
import { valueAt } from '../support/memoryPort';
import { CERTIFICATE_TABLE, WAFER_ROWS, expectedDopantOfType } from './fixture';
import { FIRST_NEW, TOP, numberAt, portWithTable } from './tablePort';

const BASE: Omit<CertificateSettings, 'mapping'> = {
  neededMin: 1e15,
  neededMax: 2e15,
  windowRule: 'certified-inside-needed',
  typeMeansConductivity: true,
  dopant: 'B',
  resistivityUnit: 'ohm-cm',
  thicknessUnit: 'um',
  temperatureK: 296.15,
  model: '',
  material: '',
  radialLimitPercent: null,
  measuredAt: { value: 25, unit: 'C' },
};

describe('readings measured at another temperature', () => {
  it('°C and K are read by the chosen unit, never from the number', () => {
    expect(kelvinOf(25, 'C')).toBe(298.15);
    expect(kelvinOf(298.15, 'K')).toBe(298.15);
    expect(kelvinOf(25, 'K')).toBe(25);
  });

  it('adds one corrected column per reading, and the checks use the corrected readings', async () => {
    const { port, mapping } = await portWithTable();
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping });
    expect(plan.headers).toEqual([
      'Dopant code (P/N read as p-/n-type)',
      'Doping at ρmax (cm⁻³)',
      'Doping at ρmin (cm⁻³)',
      'Certified doping inside needed window',
      'Rho centre at certificate temperature (Ω·cm)',
      'Rho edge 1 at certificate temperature (Ω·cm)',
      'Rho edge 2 at certificate temperature (Ω·cm)',
      'Rho edge 3 at certificate temperature (Ω·cm)',
      'Corrected readings inside ρ window',
      'Rs at nominal thickness, mean corrected reading (Ω/sq)',
      'Radial variation (%)',
      'Pass/fail',
    ]);
    // The measurement temperature is written in K (25 °C typed) next to the certificate's.
    expect(plan.writes[1].cells).toEqual([
      ['Certificate check parameters', null],
      ['Needed doping min (cm⁻³)', 1e15],
      ['Needed doping max (cm⁻³)', 2e15],
      ['Temperature (K)', 296.15],
      ['Readings measured at (K)', 298.15],
    ]);
    const at = qualifiedName(findFunction('RESISTIVITYAT')!);
    const firstRow = plan.writes[0].cells[1] as string[];
    // Parameter block: columns after the 12 new ones and one empty column: Y (label), Z (value).
    expect(firstRow[4]).toBe(`=IF(ISNUMBER(G3),${at}(G3,L3,$Z$6,$Z$5),"")`);
    expect(firstRow[8]).toBe('=IF(COUNT(P3:S3)=0,"none",IF(AND(MIN(P3:S3)>=MIN(E3,F3),MAX(P3:S3)<=MAX(E3,F3)),"yes","no"))');
    expect(firstRow[9]).toBe(`=${qualifiedName(findFunction('SHEETRES')!)}(AVERAGE(P3:S3),K3)`);
    expect(firstRow[10]).toBe(`=${qualifiedName(findFunction('RADIALVARIATION')!)}(P3,Q3:S3)`);

    const values = port.engineValues();
    WAFER_ROWS.forEach((row, index) => {
      const sheetRow = TOP + 1 + index;
      const [, , type, rhoMin, rhoMax, centre, e1, e2, e3, thickness] = row;
      const code = expectedDopantOfType(type);
      const corrected = [centre, e1, e2, e3].map((reading) => value('RESISTIVITYAT', reading, code, 298.15, 296.15));
      corrected.forEach((expected, k) => expect(numberAt(values, sheetRow, FIRST_NEW + 4 + k) / expected).toBeCloseTo(1, 12));
      // A warmer lab reads higher ρ where the TCR is positive (these light dopings): the correction lowers them.
      corrected.forEach((expected, k) => expect(expected).toBeLessThan([centre, e1, e2, e3][k]));
      const inside = Math.min(...corrected) >= rhoMin && Math.max(...corrected) <= rhoMax;
      expect(valueAt(values, sheetRow, FIRST_NEW + 8)).toBe(inside ? 'yes' : 'no');
      const mean = corrected.reduce((a, b) => a + b, 0) / corrected.length;
      expect(numberAt(values, sheetRow, FIRST_NEW + 9) / value('SHEETRES', mean, thickness)).toBeCloseTo(1, 12);
      expect(numberAt(values, sheetRow, FIRST_NEW + 10)).toBeCloseTo(value('RADIALVARIATION', corrected[0], [corrected.slice(1)]), 10);
    });
  });

  it('a reading just above ρ max at 25 °C passes once corrected to 23 °C', async () => {
    // Invented row: ρ window 8–12 Ω·cm, readings 12.1 at 25 °C (boron, TCR about +0.7 %/K at 23 °C).
    const table = [CERTIFICATE_TABLE[0], ['KS-9999', 'W01', 'P', 8, 12, 12.1, 12.1, 12.1, 12.1, 525]];
    const uncorrected = await portWithTable(table);
    await addCertificateCheck(uncorrected.port, await uncorrected.port.selection(), {
      ...BASE,
      mapping: uncorrected.mapping,
      measuredAt: null,
    });
    expect(valueAt(uncorrected.port.engineValues(), TOP + 1, FIRST_NEW + 4)).toBe('no');
    const corrected = await portWithTable(table);
    await addCertificateCheck(corrected.port, await corrected.port.selection(), { ...BASE, mapping: corrected.mapping });
    expect(valueAt(corrected.port.engineValues(), TOP + 1, FIRST_NEW + 8)).toBe('yes');
  });

  it('keeps a blank reading blank, and mΩ·cm readings are scaled before the correction', async () => {
    const table = [
      ['Lot', 'Type', 'Rho min (mOhm-cm)', 'Rho max (mOhm-cm)', 'Rho centre', 'Rho edge 1'],
      ['KS-1', 'P', 8000, 12000, 10000, null],
    ];
    const { port, mapping } = await portWithTable(table);
    const plan = planCertificateCheck(
      { block: await port.selection(), contents: await port.read(await port.selection()) },
      { ...BASE, mapping, resistivityUnit: 'mohm-cm' },
    );
    const at = qualifiedName(findFunction('RESISTIVITYAT')!);
    const row = plan.writes[0].cells[1] as string[];
    const centreFormula = row.find((formula) => formula.includes(at))!;
    expect(centreFormula).toMatch(new RegExp(`^=IF\\(ISNUMBER\\(F3\\),${at.replace('.', '\\.')}\\(F3\\*0\\.001,`));
    await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, resistivityUnit: 'mohm-cm' });
    const values = port.engineValues();
    const first = 1 + table[0].length;
    expect(numberAt(values, TOP + 1, first + 4) / value('RESISTIVITYAT', 10, 'acceptor', 298.15, 296.15)).toBeCloseTo(1, 12);
    expect(valueAt(values, TOP + 1, first + 5)).toBe('');
  });

  it('never writes over filled cells, now that the block is wider', async () => {
    const { port, mapping } = await portWithTable();
    port.put(TOP + 2, FIRST_NEW + 11, [['note']]);
    await expect(addCertificateCheck(port, await port.selection(), { ...BASE, mapping })).rejects.toThrow(
      /Nothing was written: Sheet1!L2:W6 must be empty, but W4/,
    );
    expect(port.writes).toEqual([]);
  });

  it.each([
    [{ measuredAt: { value: 25, unit: '' as 'C' } }, /Choose the unit of 'Readings measured at' \(°C or K\)/],
    [{ measuredAt: { value: 10, unit: 'K' as const } }, /Readings measured at 10 K is outside 20–1000 K; is the unit right\?/],
    [{ measuredAt: { value: 800, unit: 'C' as const } }, /outside 20–1000 K \(-253\.15 to 726\.85 °C\)/],
    [{ model: 'astm-f723' }, /astm-f723 has no temperature dependence/],
  ])('refuses %j', async (change, message) => {
    const { port, mapping } = await portWithTable();
    const error = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping, ...change }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(PaneRefusal);
    expect((error as Error).message).toMatch(message);
  });

  it('warns and does nothing extra when no reading column is mapped', async () => {
    const { port, mapping } = await portWithTable();
    const withoutReadings = mapping.map((role) => (role === 'rho-center' || role === 'rho-edge' ? 'ignore' : role));
    const plan = await addCertificateCheck(port, await port.selection(), { ...BASE, mapping: withoutReadings });
    expect(plan.warnings.join(' ')).toMatch(/‘Readings measured at’ is not used/);
    expect(plan.headers.some((header) => header.includes('certificate temperature'))).toBe(false);
  });
});
