import { fourPointSheetResistance } from '../../physics';
import { optionalLength, probeCurrent, probeVoltage } from '../measurementParameters';
import { elementwise } from '../types';
import { prose } from '../../text/prose';

export const FOURPOINTRS = elementwise({
  name: 'FOURPOINTRS',
  summary: 'Sheet resistance of a thin layer from a collinear four-point-probe reading, in Ω/sq.',
  help: prose`Converts a four-point-probe reading on a thin layer (thickness well below the probe spacing, on
    an insulating or junction-isolated base) into sheet resistance: Rs = (π/ln 2)·V/I ≈ 4.532·V/I for a layer
    much wider than the probe.

    For a circular slice probed at its centre along a diameter, give the probe spacing and the slice diameter:
    the factor π/ln 2 is replaced by Smits' closed-form disc factor C(d/s) = π/(ln 2 + ln((d²/s² + 3)/(d²/s² −
    3))), which falls from 4.532 to 2.266 as the slice shrinks to 3 spacings across. The spacing is only
    needed with a diameter; a diameter without a spacing is an error.

    Cautions: the layer must be uniform and much thinner than the spacing (for thicker layers use
    DRIFT.FOURPOINT with a thickness). Probe calibration, spacing errors, junction leakage under the probe,
    light (photo-current in junction-isolated layers) and probing near an edge other than the circular one all
    bias the result.`,
  result: { unit: 'Ω/sq', description: 'Sheet resistance Rs' },
  parameters: [
    probeVoltage,
    probeCurrent,
    optionalLength('spacing_um', 'Probe spacing s in µm, > 0; needed only with diameter_um.'),
    optionalLength('diameter_um', 'Diameter d of a circular slice probed at its centre, ≥ 3 spacings; blank means an unbounded layer.'),
  ] as const,
  examples: [
    { formula: '=DRIFT.FOURPOINTRS(0.0221,0.001)', note: 'an implanted layer: about 100 Ω/sq' },
    { formula: '=DRIFT.FOURPOINTRS(0.0221,0.001,1000,{10000,20000,100000})', note: 'the same reading on 10, 20 and 100 mm discs' },
  ],
  models: ['smits-1958'],
  compute: (voltage, current, spacingUm, diameterUm) => fourPointSheetResistance(voltage, current, spacingUm, diameterUm),
});
