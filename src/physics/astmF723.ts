/**
 * ASTM F723 conversion between resistivity and dopant density for boron- and
 * phosphorus-doped single-crystal silicon at 23 °C (now SEMI MF723). The
 * equations are those of Thurber, Mattis, Liu and Filliben, NBS Special
 * Publication 400-64 (1981), as adopted in ASTM F723-99.
 *
 * Every coefficient below is written from memory (the standard's text was not
 * at hand). Evidence that they are right: the forward and reverse equations
 * built from them invert each other to within 3 % (B) and 4.7 % (P) over the
 * ranges where F723 §1.2 states its self-consistency as 3 % and 4.5 % (that
 * sentence was read in a public excerpt of F723-99), and they give the
 * familiar anchors 1 Ω·cm ↔ 1.46e16 cm⁻³ (B) and 4.86e15 cm⁻³ (P). (A first
 * recollection had the two phosphorus coefficient sets swapped between the
 * directions; this check exposed it, see reference/astm-f723.reference.test.ts.)
 *
 * The conversion is a dopant-density relation for uncompensated material: it
 * is not a carrier-density or mobility relation (F723 §1.4).
 */
import { PhysicsDomainError } from './errors';

/** Citation and validity of the conversion, for the model registry. */
export const F723_SOURCE = {
  citation:
    'ASTM F723-99 (now SEMI MF723), equations of W. R. Thurber, R. L. Mattis, Y. M. Liu, J. J. Filliben, ' +
    'NBS Special Publication 400-64 (1981) (coefficients from memory)',
  validity:
    'B and P only, uncompensated, 23 °C (accepted 290–305 K); B 1e12–1e21 cm⁻³ (1e-4–1e4 Ω·cm), ' +
    'P 1e12–5e20 cm⁻³ (2e-4–4e3 Ω·cm)',
} as const;

/** Dopants the conversion is defined for. */
export type F723Species = 'B' | 'P';

/** The species codes in the order they are listed in messages. */
export const F723_SPECIES: readonly F723Species[] = ['B', 'P'];

/** An inclusive interval of a quantity, with the unit used in messages. */
interface Interval {
  readonly min: number;
  readonly max: number;
}

/**
 * Ranges over which F723-99 §1.2 states the conversion is self-consistent
 * (B: 1e-4 … 1e4 Ω·cm, i.e. 1e12 … 1e21 cm⁻³; P: 2e-4 … 4e3 Ω·cm, i.e.
 * 1e12 … 5e20 cm⁻³). The exponents were lost in the excerpt read; the values
 * here are those consistent with the stated resistivity limits (from memory).
 */
export const F723_VALIDITY: Readonly<Record<F723Species, { density: Interval; resistivity: Interval }>> = {
  B: { density: { min: 1e12, max: 1e21 }, resistivity: { min: 1e-4, max: 1e4 } },
  P: { density: { min: 1e12, max: 5e20 }, resistivity: { min: 2e-4, max: 4e3 } },
};

/**
 * Temperatures accepted for the conversion, K. F723 is defined at 23 °C
 * (296.15 K); 290–305 K is accepted without adjustment because the standard
 * gives no temperature correction and resistivity changes by well under the
 * conversion's own few-percent uncertainty within a few kelvin of 23 °C
 * (Driftcell project decision, documented in the physics contract).
 */
export const F723_TEMPERATURE_RANGE: Interval = { min: 290, max: 305 };

/**
 * Boron, Thurber et al. (1981) / F723 eq. for resistivity from density:
 *   ρ = a/N + b / (N · [1 + (c·N)^k])
 * and for density from resistivity:
 *   N = a/ρ + b / (ρ · [1 + (c·ρ)^k]).
 * Coefficients from memory.
 */
const BORON = {
  resistivityFromDensity: { a: 1.305e16, b: 1.133e17, c: 2.58e-19, k: -0.737 },
  densityFromResistivity: { a: 1.33e16, b: 1.082e17, c: 54.56, k: 1.105 },
} as const;

/**
 * Phosphorus, Thurber et al. (1981) / F723: a mobility-like factor 10^Z with
 * Z a ratio of cubics,
 *   ρ = (K/N) · 10^Z, Z = (A0 + A1·x + A2·x² + A3·x³) / (1 + B1·x + B2·x² + B3·x³), x = log10(N) − 16,
 *   N = (K/ρ) · 10^Z, same form with x = log10(ρ).
 * K = 6.242e18 is the standard's rounded 1/q (C⁻¹): 10^Z is then 1/μ.
 * Coefficients from memory.
 */
const PHOSPHORUS = {
  inverseCharge: 6.242e18,
  resistivityFromDensity: {
    numerator: [-3.0769, 2.2108, -0.62272, 0.057501],
    denominator: [-0.68157, 0.19833, -0.018376],
    densityOffsetDecades: 16,
  },
  densityFromResistivity: {
    numerator: [-3.1083, -3.2626, -1.2196, -0.13923],
    denominator: [1.0265, 0.38755, 0.041833],
  },
} as const;

/** (A0 + A1·x + A2·x² + A3·x³) / (1 + B1·x + B2·x² + B3·x³), Horner form. */
function cubicRatio(numerator: readonly number[], denominator: readonly number[], x: number): number {
  const top = numerator[0] + x * (numerator[1] + x * (numerator[2] + x * numerator[3]));
  const bottom = 1 + x * (denominator[0] + x * (denominator[1] + x * denominator[2]));
  return top / bottom;
}

/** Forward equation without range checks. */
function rawResistivity(species: F723Species, density: number): number {
  if (species === 'B') {
    const { a, b, c, k } = BORON.resistivityFromDensity;
    return a / density + b / (density * (1 + Math.pow(c * density, k)));
  }
  const { numerator, denominator, densityOffsetDecades } = PHOSPHORUS.resistivityFromDensity;
  const z = cubicRatio(numerator, denominator, Math.log10(density) - densityOffsetDecades);
  return (PHOSPHORUS.inverseCharge / density) * Math.pow(10, z);
}

/** Reverse equation without range checks. */
function rawDensity(species: F723Species, resistivity: number): number {
  if (species === 'B') {
    const { a, b, c, k } = BORON.densityFromResistivity;
    return a / resistivity + b / (resistivity * (1 + Math.pow(c * resistivity, k)));
  }
  const { numerator, denominator } = PHOSPHORUS.densityFromResistivity;
  const z = cubicRatio(numerator, denominator, Math.log10(resistivity));
  return (PHOSPHORUS.inverseCharge / resistivity) * Math.pow(10, z);
}

/**
 * Ranges actually accepted: the stated ranges, widened to the images of the
 * other quantity's stated range under the standard's own equations (the stated
 * density and resistivity limits are rounded and do not map exactly onto each
 * other, e.g. 1e-4 Ω·cm B converts to 1.2e21 cm⁻³). So any density
 * f723Density returns is accepted by f723Resistivity and vice versa.
 */
const ACCEPTED: Readonly<Record<F723Species, { density: Interval; resistivity: Interval }>> = (() => {
  const widen = (species: F723Species) => {
    const { density, resistivity } = F723_VALIDITY[species];
    const densityImages = [rawDensity(species, resistivity.max), rawDensity(species, resistivity.min)];
    const resistivityImages = [rawResistivity(species, density.max), rawResistivity(species, density.min)];
    return {
      density: { min: Math.min(density.min, ...densityImages), max: Math.max(density.max, ...densityImages) },
      resistivity: {
        min: Math.min(resistivity.min, ...resistivityImages),
        max: Math.max(resistivity.max, ...resistivityImages),
      },
    };
  };
  return { B: widen('B'), P: widen('P') };
})();

/** Validates the species code; the conversion covers B and P only. */
function checkSpecies(species: string): F723Species {
  if (species === 'B' || species === 'P') return species;
  throw new PhysicsDomainError(
    `ASTM F723 covers boron and phosphorus only; got dopant '${species}'. Allowed: ${F723_SPECIES.join(', ')}.`,
  );
}

/** Relative slack on the range ends, so that computed values like 10 ** -4 are not refused for round-off. */
const RANGE_SLACK = 1e-9;

function checkInside(value: number, range: Interval, what: string, unit: string, species: F723Species): void {
  if (!(value >= range.min * (1 - RANGE_SLACK) && value <= range.max * (1 + RANGE_SLACK))) {
    throw new PhysicsDomainError(
      `ASTM F723 ${what} for ${species} must lie in ${range.min.toPrecision(3)}…${range.max.toPrecision(3)} ${unit} ` +
        `(the range the standard states for its conversion); got ${value}.`,
    );
  }
}

/**
 * Resistivity of uncompensated B- or P-doped silicon at 23 °C from its dopant
 * density, ASTM F723 (Thurber et al., NBS SP 400-64, 1981).
 *
 * @param species - 'B' or 'P'
 * @param density - dopant density N, cm⁻³, within F723_VALIDITY[species].density (widened to the
 *   image of the stated resistivity range)
 * @returns ρ in Ω·cm
 * @throws PhysicsDomainError for another species or a density outside the standard's range
 * @example f723Resistivity('B', 1.46e16) // ≈ 1.02 Ω·cm
 */
export function f723Resistivity(species: F723Species, density: number): number {
  const code = checkSpecies(species);
  checkInside(density, ACCEPTED[code].density, 'dopant density', 'cm⁻³', code);
  return rawResistivity(code, density);
}

/**
 * Dopant density of uncompensated B- or P-doped silicon at 23 °C from its
 * resistivity, ASTM F723 (Thurber et al., NBS SP 400-64, 1981). This is the
 * standard's own reverse equation, not a numerical inverse of
 * f723Resistivity: the two agree to the standard's stated 3 % (B) / 4.5 % (P).
 *
 * @param species - 'B' or 'P'
 * @param resistivity - ρ in Ω·cm, within F723_VALIDITY[species].resistivity (widened to the
 *   image of the stated density range)
 * @returns N in cm⁻³
 * @throws PhysicsDomainError for another species or a resistivity outside the standard's range
 * @example f723Density('P', 1) // ≈ 4.86e15 cm⁻³
 */
export function f723Density(species: F723Species, resistivity: number): number {
  const code = checkSpecies(species);
  checkInside(resistivity, ACCEPTED[code].resistivity, 'resistivity', 'Ω·cm', code);
  return rawDensity(code, resistivity);
}

/**
 * Checks that a sample may use the F723 conversion and returns its species:
 * the dopant must be B or P, with no counter-doping (the standard is for
 * uncompensated material), at 290–305 K.
 *
 * @param dopantSymbol - the sample's dopant symbol, e.g. 'B'
 * @param counterDensity - counter-dopant density, cm⁻³ (must be 0)
 * @param temperature - K
 * @throws PhysicsDomainError naming what is not allowed
 */
export function f723SpeciesFor(dopantSymbol: string, counterDensity: number, temperature: number): F723Species {
  const species = checkSpecies(dopantSymbol);
  if (counterDensity !== 0) {
    throw new PhysicsDomainError(
      `ASTM F723 applies to uncompensated silicon only; got counter-doping ${counterDensity} cm⁻³. ` +
        `Use counter-doping 0, or a mobility model (masetti, arora, caughey-thomas) for compensated samples.`,
    );
  }
  if (!(temperature >= F723_TEMPERATURE_RANGE.min && temperature <= F723_TEMPERATURE_RANGE.max)) {
    throw new PhysicsDomainError(
      `ASTM F723 is defined at 23 °C; temperatures ${F723_TEMPERATURE_RANGE.min}–${F723_TEMPERATURE_RANGE.max} K are ` +
        `accepted without correction, got ${temperature} K. Use a mobility model (masetti, arora, caughey-thomas) at other temperatures.`,
    );
  }
  return species;
}
