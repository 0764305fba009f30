/**
 * Numbers that help texts and model citations quote for our own results must
 * be what the code gives (rounded as printed), never typed by hand.
 */
import { findFunction } from '../../src/catalog';
import { TEMPERATURE_RANGE_K } from '../../src/catalog/common';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { SILICON, fitMobility, freeCarrierMobility, intrinsicDensity, resolveDopant } from '../../src/physics';
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

describe('README quotes mobility numbers the code gives', () => {
  const readme = readFileSync(join(__dirname, '..', '..', 'README.md'), 'utf8');
  const sample = (symbol: string, density: number) => ({
    material: SILICON,
    temperature: 300,
    dopant: resolveDopant(SILICON, symbol),
    density,
    counterDensity: 0,
  });

  it('Masetti electrons in 1e18 cm⁻³ As-doped Si', () => {
    const masetti = fitMobility('masetti', 'electron', sample('As', 1e18)).toFixed(0);
    expect(readme).toContain(`Masetti: ${masetti} cm²/(V·s) for electrons in 1e18 cm⁻³ As-doped Si`);
  });

  it('the free-carrier factor “up to about 1.3×” near 1e18 cm⁻³', () => {
    expect(readme).toContain('up to about 1.3× near 1e18 cm⁻³');
    const factor = (symbol: string, carrier: 'electron' | 'hole') =>
      freeCarrierMobility('masetti', carrier, sample(symbol, 1e18)) / fitMobility('masetti', carrier, sample(symbol, 1e18));
    expect(Math.max(factor('B', 'hole'), factor('P', 'electron')).toFixed(1)).toBe('1.3');
  });
});
