/**
 * Textbook worked example: Example 5.2, "Determine the electron mobility in
 * silicon at various doping concentrations and various temperatures", read
 * from its Figure 5.2: for N_d = 1e16 cm⁻³, μn = 1400 (0 °C), 1200 (25 °C)
 * and 780 cm²/(V·s) (100 °C). Text read in the public repository
 * imjunghyunee/semicon-rag, data/text_extracted_md/chapter5_page_009.md; the
 * book is D. A. Neamen, Semiconductor Physics and Devices (attribution from
 * memory).
 *
 * At 1e16 cm⁻³ phosphorus the donors are essentially all ionized from 0 to
 * 100 °C, so ρ(T)/ρ(25 °C) = μn(25 °C)/μn(T): a check of ρ(T) ratios, which
 * the resistivity default's anchoring at room temperature barely changes.
 * Accuracy: the values are read off a chart to two significant figures,
 * about ±4 % each (±50 of 1200), so ±8 % on a ratio of two readings.
 */
import { resistivity } from '../../../src/physics/transport';
import { siliconSample } from '../transportSamples';

const CELSIUS = 273.15;
const READ_MOBILITY = { 0: 1400, 25: 1200, 100: 780 } as const;
const RATIO_ACCURACY = 0.08;

function rho(celsius: number): number {
  return resistivity(siliconSample('P', 1e16, CELSIUS + celsius));
}

describe('Textbook Example 5.2: temperature dependence of 1e16 cm⁻³ n-type Si (ratios)', () => {
  it('ρ(0 °C)/ρ(25 °C) = 1200/1400 = 0.857 within 8 %', () => {
    const expected = READ_MOBILITY[25] / READ_MOBILITY[0];
    expect(Math.abs(rho(0) / rho(25) / expected - 1)).toBeLessThan(RATIO_ACCURACY);
  });

  it('ρ(100 °C)/ρ(25 °C) = 1200/780 = 1.54 within 8 %', () => {
    const expected = READ_MOBILITY[25] / READ_MOBILITY[100];
    expect(Math.abs(rho(100) / rho(25) / expected - 1)).toBeLessThan(RATIO_ACCURACY);
  });

  it('mean TCR over 0–100 °C, ln(1400/780)/100 K = +5850 ppm/K, within 8 % of the ratio', () => {
    const expected = READ_MOBILITY[0] / READ_MOBILITY[100];
    expect(Math.abs(rho(100) / rho(0) / expected - 1)).toBeLessThan(RATIO_ACCURACY);
  });
});
