import { guessMapping, headerWords, roleFromHeader } from '../../../src/taskpane/certificate/headers';
import { duplicateRole } from '../../../src/taskpane/certificate/roles';
import { readResistivityUnit, readThicknessUnit } from '../../../src/taskpane/certificate/units';
import { guessUnits } from '../../../src/taskpane/certificate/session';
import { CERTIFICATE_HEADERS } from './fixture';

describe('header words', () => {
  it('fold Greek letters, units and separators to plain words', () => {
    expect(headerWords('ρ min (Ω·cm)')).toEqual(['rho', 'min', 'ohm', 'cm']);
    expect(headerWords('Rho1')).toEqual(['rho', '1']);
    expect(headerWords('THK[µm]')).toEqual(['thk', 'um']);
    expect(headerWords('Wafer #')).toEqual(['wafer', 'no']);
  });
});

describe('role from one header', () => {
  it.each([
    ['Lot', 'lot'],
    ['Lot No.', 'lot'],
    ['Ingot ID', 'lot'],
    ['Wafer ID', 'wafer'],
    ['Slot', 'wafer'],
    ['Type', 'type'],
    ['Dopant', 'type'],
    ['Wafer type', 'type'],
    ['Conductivity', 'type'],
    ['Rho min (ohm-cm)', 'rho-min'],
    ['ρ max [Ω·cm]', 'rho-max'],
    ['Res. Low', 'rho-min'],
    ['Resistivity upper', 'rho-max'],
    ['Rho centre', 'rho-center'],
    ['Center', 'rho-center'],
    ['Edge 3', 'rho-edge'],
    ['Rho edge 1 (mOhm-cm)', 'rho-edge'],
    ['Resistivity', 'rho-reading'],
    ['Rho 4', 'rho-reading'],
    ['Site 2', 'rho-reading'],
    ['C', 'rho-center'],
    ['E1', 'rho-edge'],
    ['E 4 (ohm-cm)', 'rho-edge'],
    ['R3', 'rho-reading'],
    ['Resistivity Min. [Ω·cm]', 'rho-min'],
    ['Cond. Type', 'type'],
    ['Thickness (um)', 'thickness'],
    ['THK (mm)', 'thickness'],
    ['Wafer thickness', 'thickness'],
    ['Rs (ohm/sq)', 'ignore'],
    ['Sheet resistance', 'ignore'],
    ['Orientation', 'ignore'],
    ['', 'ignore'],
  ] as const)('%s → %s', (header, role) => {
    expect(roleFromHeader(header)).toBe(role);
  });
});

describe('mapping of a whole header row', () => {
  it('maps the fictional test certificate completely', () => {
    expect(guessMapping(CERTIFICATE_HEADERS)).toEqual([
      'lot',
      'wafer',
      'type',
      'rho-min',
      'rho-max',
      'rho-center',
      'rho-edge',
      'rho-edge',
      'rho-edge',
      'thickness',
    ]);
  });

  it('gives single roles to the first column only; a second centre becomes a reading', () => {
    expect(guessMapping(['Rho min', 'Res min', 'Centre', 'Centre (repeat)'])).toEqual(['rho-min', 'ignore', 'rho-center', 'rho-reading']);
  });

  it('prefers a plain thickness over thickness min/max', () => {
    expect(guessMapping(['Thk min (um)', 'Thickness (um)', 'Thk max (um)'])).toEqual(['ignore', 'thickness', 'ignore']);
  });

  it('takes a column of type words as the type column when no header says type', () => {
    const columns = [
      ['A1', 'A2'],
      ['P', 'n-type'],
      [8, 9],
    ];
    expect(guessMapping(['Wafer', 'Class', 'Rho min'], columns)).toEqual(['wafer', 'type', 'rho-min']);
    // In any case, and with the generic words the functions take.
    for (const words of [
      ['p', 'N-TYPE'],
      ['Donor', 'ACCEPTOR'],
      ['Phosphorus', 'bOrOn'],
    ]) {
      expect(guessMapping(['Wafer', 'Class', 'Rho min'], [['A1', 'A2'], words, [8, 9]])).toEqual(['wafer', 'type', 'rho-min']);
    }
  });

  it('numbered readings all become readings', () => {
    expect(guessMapping(['Rho 1', 'Rho 2', 'Rho 3', 'Rho 4', 'Rho 5'])).toEqual(Array(5).fill('rho-reading'));
  });
});

describe('duplicate roles', () => {
  it('names the role and the columns', () => {
    expect(duplicateRole(['rho-min', 'rho-min', 'rho-edge', 'rho-edge'], ['Min', 'Low', 'E1', 'E2'])).toBe(
      "'ρ min' is given to 2 columns (Min, Low); give it to one column only.",
    );
    expect(duplicateRole(['rho-min', 'rho-max', 'rho-edge', 'rho-edge'], ['a', 'b', 'c', 'd'])).toBeNull();
  });
});

describe('units in headers', () => {
  it.each([
    ['Thickness (um)', 'um'],
    ['Thickness [µm]', 'um'],
    ['Thickness μm', 'um'],
    ['Thk (microns)', 'um'],
    ['THK (mm)', 'mm'],
    ['Thickness (mil)', 'mil'],
  ])('thickness %s → %s', (header, code) => {
    const reading = readThicknessUnit(header);
    expect(reading.kind === 'unit' ? reading.unit.code : reading.kind).toBe(code);
  });

  it('thickness without a unit, or in an unknown unit, is not guessed', () => {
    expect(readThicknessUnit('Thickness')).toEqual({ kind: 'none' });
    expect(readThicknessUnit('Thickness (in)')).toEqual({ kind: 'unsupported', text: 'in' });
  });

  it.each([
    ['Rho min (ohm-cm)', 'ohm-cm'],
    ['ρ [Ω·cm]', 'ohm-cm'],
    ['Res (Ohm.cm)', 'ohm-cm'],
    ['Rho (Ωcm)', 'ohm-cm'],
    ['Rho (mOhm-cm)', 'mohm-cm'],
    ['Rho [mΩ·cm]', 'mohm-cm'],
    ['Rho (milliohm cm)', 'mohm-cm'],
  ])('resistivity %s → %s', (header, code) => {
    const reading = readResistivityUnit(header);
    expect(reading.kind === 'unit' ? reading.unit.code : reading.kind).toBe(code);
  });

  it('resistivity in kΩ·cm, MΩ·cm or Ω·m is refused, not converted', () => {
    expect(readResistivityUnit('Rho (kOhm-cm)')).toEqual({ kind: 'unsupported', text: 'kOhm-cm' });
    expect(readResistivityUnit('Rho (MΩ·cm)')).toEqual({ kind: 'unsupported', text: 'MΩ·cm' });
    expect(readResistivityUnit('Rho (ohm-m)')).toEqual({ kind: 'unsupported', text: 'ohm-m' });
    expect(readResistivityUnit('Rho min')).toEqual({ kind: 'none' });
  });

  it('a table’s unit guess: one resistivity unit for all, thickness from its header', () => {
    const guess = guessUnits(
      ['Rho min (mOhm-cm)', 'Rho max (mOhm-cm)', 'Centre', 'Thk (mm)'],
      ['rho-min', 'rho-max', 'rho-center', 'thickness'],
    );
    expect(guess.resistivityUnit).toBe('mohm-cm');
    expect(guess.thicknessUnit).toBe('mm');
  });

  it('disagreeing resistivity units and a unit-less thickness are left to the user, with notes', () => {
    const guess = guessUnits(['Rho min (mOhm-cm)', 'Rho max (ohm-cm)', 'Thickness'], ['rho-min', 'rho-max', 'thickness']);
    expect(guess.resistivityUnit).toBeNull();
    expect(guess.thicknessUnit).toBeNull();
    expect(guess.notes.join(' ')).toMatch(/different units.*names no unit: choose µm, mm or mil/);
  });

  it('no unit in any resistivity header: Ω·cm, said in a note', () => {
    const guess = guessUnits(['Rho min', 'Rho max'], ['rho-min', 'rho-max']);
    expect(guess.resistivityUnit).toBe('ohm-cm');
    expect(guess.notes).toEqual(['No resistivity unit in the headers: Ω·cm assumed, the usual unit of wafer certificates.']);
  });
});
