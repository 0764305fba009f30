/** Sweep axes: the log doping grid, the linear temperature grid, °C → K, and the messages for bad settings. */
import {
  CELSIUS_ZERO_K,
  fromKelvin,
  MAX_DOPING_POINTS,
  dopingAxis,
  dopingAxisProblems,
  temperatureAxis,
  temperatureAxisProblems,
  toKelvin,
} from '../../../src/taskpane/sweep/axes';

describe('dopingAxis', () => {
  it('spaces points evenly in log10, ends exactly at both limits', () => {
    expect(dopingAxis({ from: 1e14, to: 1e16, pointsPerDecade: 2 })).toEqual([1e14, 316227766017000, 1e15, 3162277660170000, 1e16]);
    const grid = dopingAxis({ from: 1e14, to: 1e20, pointsPerDecade: 5 });
    expect(grid).toHaveLength(31);
    expect(grid[0]).toBe(1e14);
    expect(grid[30]).toBe(1e20);
    for (let i = 1; i < grid.length; i++) expect(Math.log10(grid[i] / grid[i - 1])).toBeCloseTo(0.2, 9);
  });

  it('adds the upper limit when it is not on the grid', () => {
    expect(dopingAxis({ from: 1e15, to: 5e15, pointsPerDecade: 1 })).toEqual([1e15, 5e15]);
  });

  it('says what is wrong with bad settings', () => {
    expect(dopingAxisProblems({ from: 0, to: 1e16, pointsPerDecade: 5 })).toEqual([expect.stringMatching(/above 0 cm⁻³/)]);
    expect(dopingAxisProblems({ from: 1e17, to: 1e16, pointsPerDecade: 5 })).toEqual([expect.stringMatching(/must be below "to"/)]);
    expect(dopingAxisProblems({ from: 1e15, to: 1e23, pointsPerDecade: 5 })).toEqual([expect.stringMatching(/at most 1e\+22 cm⁻³/)]);
    expect(dopingAxisProblems({ from: 1e15, to: 1e16, pointsPerDecade: 2.5 })).toEqual([
      expect.stringMatching(/whole number from 1 to 100/),
    ]);
    expect(dopingAxisProblems({ from: NaN, to: 1e16, pointsPerDecade: 5 })).toEqual([expect.stringMatching(/must be numbers/)]);
    expect(dopingAxisProblems({ from: 1e10, to: 1e22, pointsPerDecade: 100 })).toEqual([
      expect.stringMatching(new RegExp(`1201 points; at most ${MAX_DOPING_POINTS}`)),
    ]);
    expect(() => dopingAxis({ from: 0, to: 1, pointsPerDecade: 1 })).toThrow(RangeError);
  });
});

describe('temperatureAxis', () => {
  it('steps linearly from "from" to "to"', () => {
    expect(temperatureAxis({ from: 250, to: 400, step: 50, unit: 'K' })).toEqual([250, 300, 350, 400]);
    expect(temperatureAxis({ from: 0, to: 0.3, step: 0.1, unit: '°C' })).toEqual([0, 0.1, 0.2, 0.3]);
  });

  it('converts °C to K with 0 °C = 273.15 K (SI Brochure, 9th ed., 2019)', () => {
    expect(CELSIUS_ZERO_K).toBe(273.15);
    expect(toKelvin(25, '°C')).toBe(298.15);
    expect(toKelvin(300, 'K')).toBe(300);
    expect(fromKelvin(373.15, '°C')).toBe(100);
    expect(fromKelvin(250, 'K')).toBe(250);
  });

  it('says what is wrong with bad settings', () => {
    expect(temperatureAxisProblems({ from: -300, to: 0, step: 10, unit: '°C' })).toEqual([expect.stringMatching(/above absolute zero/)]);
    expect(temperatureAxisProblems({ from: 400, to: 300, step: 10, unit: 'K' })).toEqual([expect.stringMatching(/must be below "to"/)]);
    expect(temperatureAxisProblems({ from: 300, to: 400, step: 0, unit: 'K' })).toEqual([expect.stringMatching(/step must be above 0/)]);
    expect(temperatureAxisProblems({ from: 300, to: 400, step: 1, unit: 'K' }, 24)).toEqual([
      expect.stringMatching(/101 points; at most 24/),
    ]);
  });
});
