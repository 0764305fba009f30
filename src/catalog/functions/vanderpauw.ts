import { vanDerPauwSheetResistance } from '../../physics';
import { requiredNumber } from '../parameters';
import { elementwise } from '../types';
import { prose } from '../../text/prose';

function resistance(name: string, what: string) {
  return requiredNumber({ name, unit: 'Ω', description: `${what}, in Ω, > 0.`, min: 0, minExclusive: true });
}

export const VANDERPAUW = elementwise({
  name: 'VANDERPAUW',
  summary: 'Sheet resistance from the two van der Pauw resistances, in Ω/sq.',
  help: prose`Solves van der Pauw's relation exp(−π·Ra/Rs) + exp(−π·Rb/Rs) = 1 for the sheet resistance Rs,
    given the two four-terminal resistances measured with the current and voltage contacts rotated by one
    position (Ra = V43/I12 and Rb = V14/I23, for contacts 1–4 in order around the edge). For a symmetric
    sample (Ra = Rb = R) the answer is Rs = π·R/ln 2.

    The equation is solved exactly, not with a fitted correction curve: in the variable x = π·min(Ra, Rb)/Rs
    it reads r·x + ln(1 − e^(−x)) = 0 with r = max/min, which stays well conditioned for large ratios, and the
    root is bracketed from both sides, so any positive pair gives an answer.

    Cautions: the method assumes a uniform layer without holes, contacts small and on its edge. Average the
    readings over reversed currents and over the reciprocal configurations; a ratio Ra/Rb far from 1 (say
    above 2 on a symmetric sample) usually points to a misplaced or poor contact or a non-uniform layer rather
    than to the sample's shape. Multiply by the thickness for the resistivity of a uniform film.`,
  result: { unit: 'Ω/sq', description: 'Sheet resistance Rs' },
  parameters: [
    resistance('r_a_ohm', 'First four-terminal resistance Ra = V43/I12'),
    resistance('r_b_ohm', 'Second four-terminal resistance Rb = V14/I23 (contacts rotated by one)'),
  ] as const,
  examples: [
    { formula: '=DRIFT.VANDERPAUW(22.1,22.1)', note: 'a symmetric square: about 100 Ω/sq' },
    { formula: '=DRIFT.VANDERPAUW(30,{15,30,60})', note: 'the effect of an asymmetric pair' },
  ],
  models: ['van-der-pauw-1958'],
  compute: (ra, rb) => vanDerPauwSheetResistance(ra, rb),
});
