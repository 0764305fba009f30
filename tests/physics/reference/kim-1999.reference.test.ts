/**
 * Jongdae Kim, Sang Gi Kim, Jin Gun Koo, Tae Moon Roh, Hoon Soo Park, Dae
 * Yong Kim, "Characteristics of dynamic resistance in a heavily doped silicon
 * semiconductor resistor", International Journal of Electronics (March 1999),
 * doi:10.1080/002072199133409 (record read on bohrium.dp.tech). Read in the abstract: a heavily doped silicon
 * resistor has a positive temperature coefficient of resistance below its
 * intrinsic temperature and a negative one above it. The abstract names no
 * doping; we check it at 1e19–1e20 cm⁻³ (our reading of "heavily doped").
 */
import { resistivityTemperatureCoefficient } from '../../../src/physics/temperatureCoefficient';
import { siliconSample } from '../transportSamples';

describe('Kim et al. (1999): heavily doped Si resistors have a positive TCR below the intrinsic temperature', () => {
  it.each(['B', 'P'])('%s 1e19 and 1e20 cm⁻³: TCR > 0 from 233 to 423 K (the demo resistor’s range)', (dopant) => {
    for (const density of [1e19, 1e20]) {
      for (let t = 233.15; t <= 423.15; t += 10) {
        expect(resistivityTemperatureCoefficient(siliconSample(dopant, density, t))).toBeGreaterThan(0);
      }
    }
  });

  it('the demo resistor’s doping (B 1e20 cm⁻³): R rises monotonically over −40…150 °C', () => {
    for (let t = 233.15; t <= 423.15; t += 1) {
      expect(resistivityTemperatureCoefficient(siliconSample('B', 1e20, t))).toBeGreaterThan(0);
    }
  });
});
