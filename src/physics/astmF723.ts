/**
 * ASTM F723 conversion between resistivity and dopant density for boron-,
 * phosphorus- and (ρ from N, 1e19–6e20 cm⁻³) arsenic-doped single-crystal
 * silicon at 23 °C (now SEMI MF723). The
 * equations are those of Thurber, Mattis, Liu and Filliben, NBS Special
 * Publication 400-64 (1981), as adopted in ASTM F723-99.
 *
 * The coefficients were first written from memory and then checked, digit for
 * digit, against two independent public transcriptions of F723-99 read through
 * the code corpus: mirkov/material-properties,
 * doped-silicon-resistivity/doped-silicon-resistivity.lisp (B, P both
 * directions, As forward, "ASTM F723 (1)…(10)", with its README.org naming
 * F723 §7.1.3.1–7.2.3.3) and a Swift file "Conversion.swift" (SiHelper, I.
 * Kutovoy 2016; B and P both directions). All B and P coefficients agree with
 * both; the arsenic polynomial was read in the first only. F723 §1.1–1.4 (scope,
 * ranges, self-consistency 3 % B / 4.5 % P, arsenic 1e19–6e20 cm⁻³) were read
 * in public excerpts of the standard (inforstreet.com/standards/ASTM-F723-99 and
 * a Spanish summary at kpt-bj.org). The standard's own two directions disagree:
 * N → ρ → N with these equations is off by up to 2.8 % (B) and 6.9 % (P, near
 * 2e18 cm⁻³, about 3.4 % in ρ), which is the scale of F723's stated
 * self-consistency.
 *
 * The conversion is a dopant-density relation for uncompensated material: it
 * is not a carrier-density or mobility relation (F723 §1.4).
 */
import { PhysicsDomainError } from './errors';

/** Dopants the conversion is defined for. */
export type F723Species = 'B' | 'P' | 'As';

/** The species codes in the order they are listed in messages. */
export const F723_SPECIES: readonly F723Species[] = ['B', 'P', 'As'];

/** An inclusive interval of a quantity, with the unit used in messages. */
interface Interval {
  readonly min: number;
  readonly max: number;
}

/**
 * Ranges over which F723-99 §1.2 states the conversion is self-consistent
 * (B: 1e-4 … 1e4 Ω·cm, i.e. 1e12 … 1e21 cm⁻³; P: 2e-4 … 4e3 Ω·cm, i.e.
 * 1e12 … 5e20 cm⁻³); the density exponents were read in the Spanish summary
 * (kpt-bj.org) where the English excerpt lost them. Arsenic: F723 §1.1 gives
 * its own conversion for 1e19 … 6e20 cm⁻³ (same summary; the same range in the
 * mirkov transcription); its resistivity range is that range's image, rounded inwards.
 */
export const F723_VALIDITY: Readonly<Record<F723Species, { density: Interval; resistivity: Interval }>> = {
  B: { density: { min: 1e12, max: 1e21 }, resistivity: { min: 1e-4, max: 1e4 } },
  P: { density: { min: 1e12, max: 5e20 }, resistivity: { min: 2e-4, max: 4e3 } },
  As: { density: { min: 1e19, max: 6e20 }, resistivity: { min: 2.7e-4, max: 5.5e-3 } },
};

/**
 * Temperatures accepted for the conversion, K. F723 is defined at 23 °C
 * (296.15 K); 290–305 K is accepted without adjustment because the standard
 * gives no temperature correction and resistivity changes by well under the
 * conversion's own few-percent uncertainty within a few kelvin of 23 °C
 * (our decision, no source; docs/physics.md, "Resistivity models").
 */
export const F723_TEMPERATURE_RANGE: Interval = { min: 290, max: 305 };

/**
 * An F723 range as registry text writes it, in exponent form.
 *
 * @param interval - a density (cm⁻³) or resistivity (Ω·cm) range of F723_VALIDITY
 * @returns e.g. '1e12–1e21'
 * @example f723RangeText(F723_VALIDITY.As.density) // → '1e19–6e20'
 */
export function f723RangeText(interval: Interval): string {
  const exponential = (value: number): string => value.toExponential().replace('e+', 'e');
  return `${exponential(interval.min)}–${exponential(interval.max)}`;
}

/** Citation and validity of the conversion, for the model registry; the ranges written from the tables above. */
export const F723_SOURCE = {
  citation:
    'ASTM F723-99 (now SEMI MF723), equations of W. R. Thurber, R. L. Mattis, Y. M. Liu, J. J. Filliben, ' +
    'NBS Special Publication 400-64 (1981); coefficients checked against two public transcriptions of F723-99',
  validity:
    `B, P and As, uncompensated, 23 °C (accepted ${F723_TEMPERATURE_RANGE.min}–${F723_TEMPERATURE_RANGE.max} K); ` +
    `B ${f723RangeText(F723_VALIDITY.B.density)} cm⁻³ (${f723RangeText(F723_VALIDITY.B.resistivity)} Ω·cm), ` +
    `P ${f723RangeText(F723_VALIDITY.P.density)} cm⁻³ (${f723RangeText(F723_VALIDITY.P.resistivity)} Ω·cm), ` +
    `As ${f723RangeText(F723_VALIDITY.As.density)} cm⁻³ (ρ from N only; DOPING inverts it numerically)`,
} as const;

/**
 * Boron, Thurber et al. (1981) / F723 eq. for resistivity from density:
 *   ρ = a/N + b / (N · [1 + (c·N)^k])
 * and for density from resistivity:
 *   N = a/ρ + b / (ρ · [1 + (c·ρ)^k]).
 * Coefficients read in both transcriptions named in the module doc.
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
 * Coefficients read in both transcriptions named in the module doc.
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

/**
 * Arsenic, F723 (eq. 10 in the mirkov transcription): log10 ρ is a tenth-degree
 * polynomial in x = log10(N), 1e19 ≤ N ≤ 6e20 cm⁻³ only. There is no reverse
 * equation for arsenic (the transcriptions list N-from-ρ for B and P only).
 */
const ARSENIC_LOG_RESISTIVITY = [
  -6633.667, 768.2531, -25.77373, 0.9658177, -0.05643443, -8.008543e-4, 9.055838e-5, -1.776701e-6, 1.953279e-7, -5.754599e-9, -1.31657e-11,
] as const;

/** Σ c_i x^i, Horner form. */
function polynomial(coefficients: readonly number[], x: number): number {
  let sum = 0;
  for (let i = coefficients.length - 1; i >= 0; i--) sum = sum * x + coefficients[i];
  return sum;
}

/** (A0 + A1·x + A2·x² + A3·x³) / (1 + B1·x + B2·x² + B3·x³), Horner form. */
function cubicRatio(numerator: readonly number[], denominator: readonly number[], x: number): number {
  const top = numerator[0] + x * (numerator[1] + x * (numerator[2] + x * numerator[3]));
  const bottom = 1 + x * (denominator[0] + x * (denominator[1] + x * denominator[2]));
  return top / bottom;
}

/**
 * Forward equation without range checks (exported for the anchored model,
 * f723Anchored.ts, which evaluates it inside the standard's range only).
 */
export function rawResistivity(species: F723Species, density: number): number {
  if (species === 'As') return Math.pow(10, polynomial(ARSENIC_LOG_RESISTIVITY, Math.log10(density)));
  if (species === 'B') {
    const { a, b, c, k } = BORON.resistivityFromDensity;
    return a / density + b / (density * (1 + Math.pow(c * density, k)));
  }
  const { numerator, denominator, densityOffsetDecades } = PHOSPHORUS.resistivityFromDensity;
  const z = cubicRatio(numerator, denominator, Math.log10(density) - densityOffsetDecades);
  return (PHOSPHORUS.inverseCharge / density) * Math.pow(10, z);
}

/**
 * Reverse equation without range checks (exported for the anchored model).
 * Arsenic has no reverse equation: its forward equation is inverted by
 * bisection in log N over the stated density range (ρ falls monotonically
 * there), to 1e-12 relative.
 */
export function rawDensity(species: F723Species, resistivity: number): number {
  if (species === 'As') {
    const { min, max } = F723_VALIDITY.As.density;
    let lo = Math.log(min);
    let hi = Math.log(max);
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (rawResistivity('As', Math.exp(mid)) > resistivity) lo = mid;
      else hi = mid;
    }
    return Math.exp((lo + hi) / 2);
  }
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
  // Arsenic has no reverse equation, so its resistivity range is exactly the image of its density range.
  const { density } = F723_VALIDITY.As;
  const asResistivity = { min: rawResistivity('As', density.max), max: rawResistivity('As', density.min) };
  return { B: widen('B'), P: widen('P'), As: { density, resistivity: asResistivity } };
})();

/** Validates the species code; the conversion covers B and P only. */
function checkSpecies(species: string): F723Species {
  if (species === 'B' || species === 'P' || species === 'As') return species;
  throw new PhysicsDomainError(
    `ASTM F723 covers boron, phosphorus and arsenic only; got dopant '${species}'. Allowed: ${F723_SPECIES.join(', ')}.`,
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
 * Resistivity of uncompensated B-, P- or As-doped silicon at 23 °C from its dopant
 * density, ASTM F723 (Thurber et al., NBS SP 400-64, 1981).
 *
 * @param species - 'B', 'P' or 'As'
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
 * Dopant density of uncompensated B-, P- or As-doped silicon at 23 °C from its
 * resistivity, ASTM F723 (Thurber et al., NBS SP 400-64, 1981). This is the
 * standard's own reverse equation, not a numerical inverse of
 * f723Resistivity: the two agree to the standard's stated 3 % (B) / 4.5 % (P).
 *
 * @param species - 'B', 'P' or 'As'
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
 * the dopant must be B, P or As, with no counter-doping (the standard is for
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
