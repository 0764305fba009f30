import { radialVariation } from '../../physics';
import { numberList } from '../measurementParameters';
import { requiredNumber } from '../parameters';
import { elementwise } from '../types';
import { prose } from '../../text/prose';

export const RADIALVARIATION = elementwise({
  name: 'RADIALVARIATION',
  summary: 'Radial variation of a wafer reading, (mean edge − centre)/centre, in %.',
  help: prose`Returns RV = (mean of the edge readings − centre reading)/centre reading × 100 %, signed:
    positive when the edge reads higher than the centre. This is a definition in common use (common practice,
    no source); ASTM F81 / SEMI MF81 lay down where the readings are taken and give their own evaluation,
    which was not consulted here, so compare with a specification only after checking that it uses this
    definition.

    edge_values is taken whole: a range of one or more readings (blank cells skipped) reduced to their mean,
    not broadcast. center may be a column of several wafers' centre readings, each compared with the same edge
    readings. Any positive quantity works (resistivity, sheet resistance, V/I), as long as centre and edge are
    in the same unit.

    Cautions: readings near the edge need edge corrections of their own (a probe within a few spacings of the
    edge reads high); take them at the distance from the edge your specification names.`,
  result: { unit: '%', description: 'Radial variation RV' },
  parameters: [
    requiredNumber({
      name: 'center',
      unit: null,
      description: 'Reading at the wafer centre (any unit, the same as the edge readings), > 0.',
      min: 0,
      minExclusive: true,
    }),
    numberList({
      name: 'edge_values',
      unit: null,
      description: 'One or more readings near the edge, same unit, each > 0; the whole range is one argument.',
      min: 0,
      minExclusive: true,
    }),
  ] as const,
  examples: [
    { formula: '=DRIFT.RADIALVARIATION(10,{10.5,10.3,10.4,10.6})', note: 'four edge readings 4.5% above the centre' },
    { formula: '=DRIFT.RADIALVARIATION(B2,C2:F2)', note: 'a wafer map’s centre against its edge sites' },
  ],
  models: [],
  compute: (centre, edges) => radialVariation(centre, edges),
});
