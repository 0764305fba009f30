/**
 * Numbers that help texts and model citations quote for our own results must
 * be what the code gives (rounded as printed), never typed by hand.
 */
import { findFunction } from '../../src/catalog';
import { TEMPERATURE_RANGE_K } from '../../src/catalog/common';
import { SILICON, intrinsicDensity } from '../../src/physics';
import { MISIAKOS_TSAMAKIS_1993_FIT, SPROUL_GREEN_1991_FIT } from '../../src/physics/materials/silicon';

const printed = (x: number): string => x.toExponential(2).replace('e+', 'e');

describe('quoted ni values come from the code', () => {
  it('INTRINSIC help and example note quote the default at 300 K', () => {
    const spec = findFunction('INTRINSIC')!;
    const value = printed(intrinsicDensity(SILICON, 300));
    expect(spec.help).toContain(`The default gives ${value} cm⁻³`);
    expect(spec.examples[0].note).toContain(value);
  });

  it.each([
    [MISIAKOS_TSAMAKIS_1993_FIT, 'misiakos'],
    [SPROUL_GREEN_1991_FIT, 'sproul-green'],
  ])('%#: the citation quotes what its constants give at 300 K', (fit, code) => {
    expect(fit.citation).toContain(`these constants give ${printed(intrinsicDensity(SILICON, 300, code))} cm⁻³ at 300 K`);
  });

  it('the silicon gap model’s validity names the temperatures the functions accept', () => {
    expect(SILICON.bandgap.validity).toContain(`${TEMPERATURE_RANGE_K.min}–${TEMPERATURE_RANGE_K.max} K`);
  });
});
