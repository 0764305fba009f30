import { fourPointResistivity } from '../../physics';
import { length } from '../common';
import { optionalLength, probeCurrent, probeVoltage } from '../measurementParameters';
import { elementwise } from '../types';
import { prose } from '../../text/prose';

export const FOURPOINT = elementwise({
  name: 'FOURPOINT',
  summary: 'Resistivity from a collinear four-point-probe reading, with thickness and slice-diameter corrections, in Ω·cm.',
  help: prose`Converts a collinear, equally spaced four-point-probe reading (current through the outer probes,
    voltage across the inner ones) into resistivity.

    With thickness_um blank the sample is treated as semi-infinite: ρ = 2π·s·V/I. With a thickness t and a
    non-conducting bottom face (for example a layer on an insulator or a junction-isolated layer), ρ =
    2π·s·(V/I)/G(t/s), where G is Valdes' divisor summed exactly from the image series rather than read from a
    table; for t much smaller than s this becomes the thin-layer result ρ = (π/ln 2)·t·V/I ≈ 4.532·t·V/I.

    With diameter_um as well, the reading is taken at the centre of a circular slice, along a diameter, and
    the result is ρ = (V/I)·t·C(d/s)·F(t/s): Smits' closed-form disc factor C times the thickness factor F,
    multiplied as Smits does. The product is exact when either factor is 1 and is meant for thin slices (t/s
    up to about 1); for thick, small slices it is an approximation. The diameter must be at least 3 spacings,
    so that the outer probes are on the slice. A diameter without a thickness is refused: the disc factor is a
    thin-slice result.

    Cautions: the formulas assume a homogeneous sample, point contacts, exactly equal spacings and a probe far
    from any edge other than the circular one. Probe wear, spacing errors, contact injection (on
    high-resistivity or lightly doped material) and heating change the reading; calibrate the probe on a
    reference sample and reverse the current to average out thermal voltages. A conducting bottom face (a
    layer on a substrate of similar or lower resistivity) is not covered.`,
  result: { unit: 'Ω·cm', description: 'Resistivity ρ' },
  parameters: [
    probeVoltage,
    probeCurrent,
    length('spacing_um', 'Probe spacing s (equal for all three gaps)'),
    optionalLength('thickness_um', 'Sample thickness t in µm, > 0; blank means a semi-infinite sample.'),
    optionalLength(
      'diameter_um',
      'Diameter d of a circular slice probed at its centre, ≥ 3 spacings; blank ' + 'means no lateral edge. Needs thickness_um.',
    ),
  ] as const,
  examples: [
    { formula: '=DRIFT.FOURPOINT(0.0159,0.001,1000)', note: 'semi-infinite ingot end, 1 mm probe: about 10 Ω·cm' },
    { formula: '=DRIFT.FOURPOINT(0.0159,0.001,1000,500)', note: 'the same reading on a 500 µm wafer' },
    { formula: '=DRIFT.FOURPOINT(0.0159,0.001,1000,500,{50000,100000,150000})', note: 'and on 50, 100 and 150 mm slices' },
  ],
  models: ['valdes-1954', 'smits-1958'],
  compute: (voltage, current, spacingUm, thicknessUm, diameterUm) =>
    fourPointResistivity(voltage, current, { spacingUm, thicknessUm, diameterUm }),
});
