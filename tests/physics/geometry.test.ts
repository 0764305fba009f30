import { CM_PER_UM, resistorValue, sheetResistance } from '../../src/physics/geometry';

// Rs = ρ/t and R = Rs·L/W are the definitions of sheet resistance and of a
// uniform bar's resistance (common practice, no source).
describe('sheetResistance', () => {
  it('is ρ/t with t converted from µm to cm', () => {
    expect(CM_PER_UM).toBe(1e-4);
    expect(sheetResistance(1, 10)).toBeCloseTo(1000, 9);
    expect(sheetResistance(0.01, 0.5)).toBeCloseTo(200, 9);
  });
});

describe('resistorValue', () => {
  it('is the sheet resistance times the number of squares L/W', () => {
    expect(resistorValue(1, 100, 10, 10)).toBeCloseTo(10_000, 6);
    expect(resistorValue(2.5, 40, 40, 2)).toBeCloseTo(sheetResistance(2.5, 2), 9);
  });
  it('scales linearly with length and inversely with width and thickness', () => {
    const base = resistorValue(1, 100, 10, 5);
    expect(resistorValue(1, 200, 10, 5)).toBeCloseTo(2 * base, 9);
    expect(resistorValue(1, 100, 20, 5)).toBeCloseTo(base / 2, 9);
    expect(resistorValue(1, 100, 10, 10)).toBeCloseTo(base / 2, 9);
  });
});
