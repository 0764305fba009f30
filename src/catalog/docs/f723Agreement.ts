/**
 * README's statement of how far each silicon resistivity model is from ASTM
 * F723 at 23 °C, measured at build time (`npm run docs`) rather than typed:
 * the largest |model / F723 − 1| over F723's stated range, for RESISTIVITY
 * against the standard's ρ(N) equation and DOPING against its N(ρ) equation.
 */
import {
  F723_VALIDITY,
  MOBILITY_MODEL_CODES,
  SILICON,
  dopingForResistivity,
  f723Density,
  f723Resistivity,
  resistivity,
  resolveDopant,
  F723_ANCHORED_CODE,
  F723_ANCHOR_TEMPERATURE,
} from '../../physics';

/** Points per decade of the sweep (a model's deviation changes little within a tenth of a decade). */
const PER_DECADE = 10;

function logGrid(min: number, max: number): number[] {
  const steps = Math.ceil(Math.log10(max / min) * PER_DECADE);
  return Array.from({ length: steps + 1 }, (_, i) => min * (max / min) ** (i / steps));
}

/** Largest |model/F723 − 1| of one model, species and direction over F723's range. */
export function f723Deviation(model: string, species: 'B' | 'P', direction: 'resistivity' | 'doping'): number {
  const dopant = resolveDopant(SILICON, species);
  const base = { material: SILICON, temperature: F723_ANCHOR_TEMPERATURE, dopant, counterDensity: 0 };
  const { density, resistivity: rho } = F723_VALIDITY[species];
  let worst = 0;
  if (direction === 'resistivity') {
    for (const n of logGrid(density.min, density.max)) {
      worst = Math.max(worst, Math.abs(resistivity({ ...base, density: n }, model) / f723Resistivity(species, n) - 1));
    }
  } else {
    for (const r of logGrid(rho.min, rho.max)) {
      worst = Math.max(worst, Math.abs(dopingForResistivity(r, base, model).density / f723Density(species, r) - 1));
    }
  }
  return worst;
}

function percent(x: number): string {
  return x < 0.001 ? '< 0.1 %' : `${(100 * x).toFixed(1)} %`;
}

/** The README table: one row per silicon model. */
export function renderF723Agreement(): string {
  const models = [F723_ANCHORED_CODE, ...MOBILITY_MODEL_CODES];
  const rows = models.map((model) => {
    const cells = (['B', 'P'] as const).flatMap((species) => [
      percent(f723Deviation(model, species, 'resistivity')),
      percent(f723Deviation(model, species, 'doping')),
    ]);
    return `| \`${model}\`${model === F723_ANCHORED_CODE ? ' (default)' : ''} | ${cells.join(' | ')} |`;
  });
  return [
    `Largest deviation from ASTM F723 at 23 °C (296.15 K), uncompensated silicon, over the standard's whole ` +
      `range (B: ` +
      `${F723_VALIDITY.B.density.min.toExponential(0)}–${F723_VALIDITY.B.density.max.toExponential(2)} ` +
      `cm⁻³, P: ` +
      `${F723_VALIDITY.P.density.min.toExponential(0)}–${F723_VALIDITY.P.density.max.toExponential(0)} ` +
      `cm⁻³), measured by \`npm run docs\`:`,
    '',
    '| Model | B: RESISTIVITY vs ρ(N) | B: DOPING vs N(ρ) | P: RESISTIVITY vs ρ(N) | P: DOPING vs N(ρ) |',
    '| --- | --- | --- | --- | --- |',
    ...rows,
  ].join('\n');
}
