/**
 * Saturation velocity v_sat(T) and field exponent β(T) of a carrier in a
 * material, each evaluated in its source's form (types.ts) and only inside
 * the table's evaluation range.
 */
import { PhysicsDomainError } from '../errors';
import type { Carrier } from '../sample';
import { carrierHighFieldTable } from './tables';
import type { CarrierHighFieldTable, FieldExponentLaw, SaturationVelocityLaw } from './types';

/** Refuses temperatures outside a table's evaluation range. */
function checkedTemperature(table: CarrierHighFieldTable, materialCode: string, carrier: Carrier, temperature: number): number {
  const { min, max, reason } = table.evaluationRange;
  if (!Number.isFinite(temperature) || temperature < min || temperature > max) {
    const range = min === max ? `only ${min} K` : `${min}–${max} K`;
    throw new PhysicsDomainError(
      `temperature ${temperature} K is outside the range of the ${carrier} saturation velocity of ${materialCode} ` +
        `(${table.modelCode}), available at ${range} (${reason})`,
    );
  }
  return temperature;
}

/** v_sat from its law at T (already inside the range), cm/s. */
function saturationFromLaw(law: SaturationVelocityLaw, temperature: number): number {
  switch (law.form) {
    case 'quay': {
      const A = law.temperatureCoefficient;
      return law.valueAtReference / (1 - A + A * (temperature / law.referenceTemperature));
    }
    case 'single-temperature':
      return law.value;
  }
}

/** β from its law (already checked to be inside the temperature range). */
function exponentFromLaw(law: FieldExponentLaw): number {
  return law.value;
}

/**
 * Saturation velocity of a carrier type.
 *
 * @param materialCode - 'Si', 'Ge', 'GaAs' or '4H-SiC' (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param temperature - T, K, inside the table's evaluation range (Si electrons 77–1000 K, holes 102–1000 K;
 *   Ge/GaAs 20–1000 K; 4H-SiC 300 K)
 * @returns v_sat in cm/s
 * @throws PhysicsDomainError for an unknown material, a carrier without data, or a temperature outside the range
 * @example saturationVelocity('Si', 'electron', 300) // ≈ 1.0e7 cm/s (Quay et al. 2000)
 */
export function saturationVelocity(materialCode: string, carrier: Carrier, temperature: number): number {
  const table = carrierHighFieldTable(materialCode, carrier);
  return saturationFromLaw(table.saturationVelocity, checkedTemperature(table, materialCode, carrier, temperature));
}

/**
 * Caughey–Thomas field exponent β of a carrier type.
 *
 * @param materialCode - 'Si', 'Ge', 'GaAs' or '4H-SiC' (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param temperature - T, K, inside the table's evaluation range
 * @returns β, dimensionless
 * @example fieldExponent('Si', 'hole', 300) // ≈ 1.213 (Canali et al. 1975, 300 K value)
 */
export function fieldExponent(materialCode: string, carrier: Carrier, temperature: number): number {
  const table = carrierHighFieldTable(materialCode, carrier);
  checkedTemperature(table, materialCode, carrier, temperature);
  return exponentFromLaw(table.fieldExponent);
}

/** v_sat and β of one carrier at one temperature: what the Caughey–Thomas field law needs. */
export interface HighFieldParameters {
  /** v_sat, cm/s. */
  readonly saturationVelocity: number;
  /** β, dimensionless. */
  readonly fieldExponent: number;
}

/**
 * Saturation velocity and field exponent together, from one table lookup.
 *
 * @param materialCode - 'Si', 'Ge', 'GaAs' or '4H-SiC' (case-insensitive)
 * @param carrier - 'electron' or 'hole'
 * @param temperature - T, K, inside the table's evaluation range
 * @returns v_sat (cm/s) and β
 * @throws PhysicsDomainError as saturationVelocity
 * @example highFieldParameters('Si', 'electron', 300).saturationVelocity // ≈ 1.0e7 cm/s
 */
export function highFieldParameters(materialCode: string, carrier: Carrier, temperature: number): HighFieldParameters {
  const table = carrierHighFieldTable(materialCode, carrier);
  const t = checkedTemperature(table, materialCode, carrier, temperature);
  return { saturationVelocity: saturationFromLaw(table.saturationVelocity, t), fieldExponent: exponentFromLaw(table.fieldExponent) };
}
