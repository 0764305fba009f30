import { resistorAtTemperature } from '../../physics';
import { TEMPERATURE_RANGE_K, length, requiredTemperature } from '../common';
import { optionalNumber, requiredNumber } from '../parameters';
import { elementwise } from '../types';
import { endSquares, sheetRes } from './resistorParameters';
import { prose } from '../../text/prose';

export const RESISTORTEMP = elementwise({
  name: 'RESISTORTEMP',
  summary: 'Value of a layer resistor at a temperature from its sheet resistance and TCR, in Ω.',
  help: prose`Returns R(T) = Rs·(L/W + Ne)·(1 + α·(T − T0) + β·(T − T0)²): the resistor's value at the
    reference temperature T0 from the layer's sheet resistance, the number of squares of its body and the end
    squares Ne, scaled by the quadratic temperature-coefficient form in common use for resistor specifications
    (common practice, no source). α is the linear TCR in ppm/K, β the quadratic one in ppm/K²; T0 is the
    temperature the sheet resistance and coefficients refer to, blank meaning 300 K.

    A TCR polynomial that is not positive at T is an error: the coefficients do not describe the layer that
    far from T0.

    Cautions: TCR values are process data, valid over the temperature range they were measured on; the
    quadratic form does not capture freeze-out or intrinsic conduction of lightly doped layers. For a
    temperature dependence computed from the doping instead, see DRIFT.RESISTOR with DRIFT.RESISTIVITY.`,
  result: { unit: 'Ω', description: 'Resistance R(T)' },
  parameters: [
    sheetRes,
    length('length_um', 'Body length L along the current'),
    length('width_um', 'Resistor width W'),
    requiredTemperature,
    requiredNumber({ name: 'tcr_ppm_per_K', unit: 'ppm/K', description: 'Linear temperature coefficient α, in ppm/K (either sign).' }),
    optionalNumber({
      name: 'reference_temperature_K',
      unit: 'K',
      description: prose`Temperature T0 at which sheet_res and the coefficients apply,
        ${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K; blank means 300 K.`,
      defaultValue: 300,
      min: TEMPERATURE_RANGE_K.min,
      max: TEMPERATURE_RANGE_K.max,
    }),
    optionalNumber({
      name: 'tcr2_ppm_per_K2',
      unit: 'ppm/K²',
      description: 'Quadratic temperature coefficient β, in ppm/K² (either sign); blank means 0.',
      defaultValue: 0,
    }),
    endSquares,
  ] as const,
  examples: [
    { formula: '=DRIFT.RESISTORTEMP(100,500,5,400,1000)', note: '100 squares of 100 Ω/sq at 400 K with +1000 ppm/K: 11 kΩ' },
    {
      formula: '=DRIFT.RESISTORTEMP(100,500,5,{233;300;398},1500,300,2,1.3)',
      note: 'a resistor with contact heads over the automotive range',
    },
  ],
  models: [],
  compute: (rs, lengthUm, widthUm, temperatureK, alpha, referenceK, beta, ends) =>
    resistorAtTemperature(
      rs,
      lengthUm,
      widthUm,
      temperatureK,
      { linearPpmPerK: alpha, quadraticPpmPerK2: beta, referenceTemperature: referenceK },
      ends,
    ),
});
