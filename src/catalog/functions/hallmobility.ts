import { hallMobility } from '../../physics';
import { resistivity } from '../common';
import { elementwise } from '../types';
import { hallCoefficient, hallFactor } from './hallParameters';
import { prose } from '../../text/prose';

export const HALLMOBILITY = elementwise({
  name: 'HALLMOBILITY',
  summary: 'Mobility from the Hall coefficient and resistivity, μ = |R_H|/(ρ·r_H), in cm²/(V·s).',
  help: prose`Returns μ = |R_H|/(ρ·r_H). The Hall factor divides: with hall_factor blank (1) the result is the
    Hall mobility μ_H = |R_H|/ρ; with the scattering factor r_H it is the drift (conductivity) mobility
    μ_H/r_H, the one DRIFT.MOBILITY models. The sign of R_H is ignored; use DRIFT.HALLDENSITY for the carrier
    type.

    Cautions: both readings must come from the same region of the same sample at the same temperature; for a
    thin layer use ρ = Rs·t with the layer's real conducting thickness (depletion at surfaces and junctions
    reduces it). Mixed conduction by electrons and holes makes the result meaningless.`,
  result: { unit: 'cm²/(V·s)', description: 'Mobility (Hall mobility when hall_factor is 1, drift mobility otherwise)' },
  parameters: [hallCoefficient, resistivity, hallFactor] as const,
  examples: [
    { formula: '=DRIFT.HALLMOBILITY(-624.15,0.5)', note: 'Hall mobility of a 0.5 Ω·cm n-type sample: about 1250 cm²/(V·s)' },
    { formula: '=DRIFT.HALLMOBILITY(-624.15,0.5,1.15)', note: 'the drift mobility with r_H = 1.15' },
  ],
  models: ['hall-effect'],
  compute: (coefficient, rho, factor) => hallMobility(coefficient, rho, factor),
});
