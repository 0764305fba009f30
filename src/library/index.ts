/**
 * Driftcell's physics as a typed Node library: the same catalog functions the
 * spreadsheet calls (DRIFT.RESISTIVITY, DRIFT.DOPING, …), with named options
 * instead of argument positions, one number back, and an exception instead
 * of a cell error. Codes (dopants, models, materials, carriers) are parsed by
 * the catalog, so they behave exactly as in a cell: any case, a lone "P"/"N"
 * refused with both readings, and so on. Units are the spreadsheet's:
 * cm⁻³, Ω·cm, K, µm, cm²/(V·s).
 *
 * @example
 *   import { resistivity, doping, DriftcellError } from 'driftcell';
 *   resistivity({ doping: 1e15, dopant: 'B', temperature: 296.15 }); // ≈ 13.3 Ω·cm (ASTM F723 at 23 °C)
 *   doping({ resistivity: 10, dopant: 'phosphorus' });               // ≈ 4.576e14 cm⁻³
 *   try { doping({ resistivity: 10, dopant: 'P' }); } catch (e) { (e as DriftcellError).message; } // names both readings
 */
import { evaluate, findFunction, type FunctionSpec } from '../catalog';
import { isFailure, type CellInput, type ErrorCode } from '../catalog/values';

/** Thrown for bad input or a result the physics cannot give; the message is the catalog's (what was wrong, what is allowed). */
export class DriftcellError extends Error {
  constructor(
    message: string,
    /** The catalog function behind the call, e.g. 'RESISTIVITY'. */
    readonly functionName: string,
    /** The spreadsheet error the same input would show, e.g. '#VALUE!'. */
    readonly code: ErrorCode,
  ) {
    super(message);
    this.name = 'DriftcellError';
  }
}

/** What most functions need to know about the sample besides its doping. */
export interface SampleOptions {
  /** Dopant: 'B', 'phosphorus', 'As', 'Sb', …, or 'donor' / 'acceptor' (a lone 'P' or 'N' is refused as ambiguous). */
  readonly dopant: string;
  /** Lattice temperature, K (default 300 K). */
  readonly temperature?: number;
  /** Resistivity or mobility model code (default: the material's; silicon 'f723-anchored' for resistivity). */
  readonly model?: string;
  /** Host material: 'Si' (default), 'Ge', 'GaAs', '4H-SiC'. */
  readonly material?: string;
  /** Density of the opposite type, cm⁻³ (default 0). */
  readonly counterDoping?: number;
}

/** A density window choosing one of several dopings that give the same resistivity, cm⁻³ (ends included). */
export interface DopingWindowOptions {
  readonly dopingMin?: number;
  readonly dopingMax?: number;
}

type OptionValue = number | string | undefined;

/** Calls one catalog function with arguments by catalog parameter name; returns its number or throws. */
function call(name: string, args: Readonly<Record<string, OptionValue>>, optionNames: Readonly<Record<string, string>>): number {
  const spec: FunctionSpec | undefined = findFunction(name);
  if (spec === undefined) throw new Error(`driftcell: the catalog has no ${name}`);
  for (const [parameter, value] of Object.entries(args)) {
    const parameterSpec = spec.parameters.find((p) => p.name === parameter);
    if (parameterSpec === undefined) throw new Error(`driftcell: ${name} has no parameter ${parameter}`);
    const expected = parameterSpec.type === 'number' ? 'number' : 'string';
    // Numbers stay numbers and codes stay text: no "1,5" or "300" is read as anything.
    if (value !== undefined && typeof value !== expected) {
      const unit = parameterSpec.unit ? ` (${parameterSpec.unit})` : '';
      throw new DriftcellError(
        `option ${optionNames[parameter] ?? parameter} must be a ${expected}${unit}; got ${typeof value} ${JSON.stringify(value)}.`,
        name,
        '#VALUE!',
      );
    }
  }
  const values: CellInput[] = spec.parameters.map((p) => (args[p.name] === undefined ? null : (args[p.name] as CellInput)));
  const [[result]] = evaluate(spec, values);
  if (isFailure(result)) {
    // The catalog names its arguments (doping_min); the library user typed options (dopingMin).
    const message = Object.entries(optionNames).reduce(
      (text, [parameter, option]) => text.replace(new RegExp(`\\b${parameter}\\b`, 'g'), option),
      result.message,
    );
    throw new DriftcellError(`${name.toLowerCase()}: ${message}`, name, result.code);
  }
  if (typeof result !== 'number') throw new Error(`driftcell: ${name} returned ${JSON.stringify(result)}, not a number`);
  return result;
}

const SAMPLE_NAMES = {
  temperature_K: 'temperature',
  counter_doping: 'counterDoping',
  doping_min: 'dopingMin',
  doping_max: 'dopingMax',
} as const;

function sampleArguments(options: SampleOptions): Record<string, OptionValue> {
  return {
    dopant: options.dopant,
    temperature_K: options.temperature,
    model: options.model,
    material: options.material,
    counter_doping: options.counterDoping,
  };
}

/**
 * Resistivity of a doped sample (DRIFT.RESISTIVITY), Ω·cm.
 *
 * @param options - doping in cm⁻³ and the sample options
 * @returns ρ in Ω·cm
 * @throws DriftcellError with the catalog's message for bad input
 * @example resistivity({ doping: 1e16, dopant: 'phosphorus' }) // ≈ 0.5 Ω·cm
 */
export function resistivity(options: { readonly doping: number } & SampleOptions): number {
  return call('RESISTIVITY', { doping: options.doping, ...sampleArguments(options) }, SAMPLE_NAMES);
}

/**
 * Dopant density that gives a resistivity (DRIFT.DOPING), cm⁻³. Where several
 * densities give it, throws a DriftcellError listing them; dopingMin/dopingMax pick one.
 *
 * @param options - resistivity in Ω·cm, the sample options and an optional density window
 * @returns N in cm⁻³
 * @throws DriftcellError for bad input, an unreachable resistivity or an ambiguous one
 * @example doping({ resistivity: 10, dopant: 'B', temperature: 296.15 }) // ≈ 1.340e15 cm⁻³ (ASTM F723's N for 10 Ω·cm)
 */
export function doping(options: { readonly resistivity: number } & SampleOptions & DopingWindowOptions): number {
  return call(
    'DOPING',
    { resistivity: options.resistivity, ...sampleArguments(options), doping_min: options.dopingMin, doping_max: options.dopingMax },
    SAMPLE_NAMES,
  );
}

/**
 * Conductivity of a doped sample (DRIFT.CONDUCTIVITY), S/cm.
 *
 * @param options - doping in cm⁻³ and the sample options
 * @returns σ in S/cm
 * @example conductivity({ doping: 1e16, dopant: 'phosphorus' }) // ≈ 2 S/cm
 */
export function conductivity(options: { readonly doping: number } & SampleOptions): number {
  return call('CONDUCTIVITY', { doping: options.doping, ...sampleArguments(options) }, SAMPLE_NAMES);
}

/**
 * Carrier mobility as the named model publishes it (DRIFT.MOBILITY), cm²/(V·s).
 *
 * @param options - doping in cm⁻³, carrier ('electron' or 'hole'; default: the majority carrier) and the sample options
 * @returns μ in cm²/(V·s)
 * @example mobility({ doping: 1e16, dopant: 'phosphorus', carrier: 'electron' }) // ≈ 1184
 */
export function mobility(options: { readonly doping: number; readonly carrier?: string } & SampleOptions): number {
  return call('MOBILITY', { doping: options.doping, carrier: options.carrier, ...sampleArguments(options) }, SAMPLE_NAMES);
}

/**
 * Temperature coefficient of resistivity (DRIFT.TCR), ppm/K.
 *
 * @param options - doping in cm⁻³ and the sample options (no counter-doping)
 * @returns (1/ρ)·dρ/dT in ppm/K
 * @example temperatureCoefficient({ doping: 1e15, dopant: 'phosphorus' }) // ≈ 7.3e3 ppm/K
 */
export function temperatureCoefficient(options: { readonly doping: number } & Omit<SampleOptions, 'counterDoping'>): number {
  return call(
    'TCR',
    {
      doping: options.doping,
      dopant: options.dopant,
      temperature_K: options.temperature,
      model: options.model,
      material: options.material,
    },
    SAMPLE_NAMES,
  );
}

/**
 * A resistivity measured at one temperature converted to another, by default
 * 23 °C = 296.15 K (DRIFT.RESISTIVITYAT), Ω·cm.
 *
 * @param options - resistivity in Ω·cm, measuredTemperature in K, targetTemperature in K (default 296.15),
 *   dopant, model, material, counterDoping and an optional density window
 * @returns ρ at targetTemperature, Ω·cm
 * @throws DriftcellError where several densities give the reading (listing them), or for bad input
 * @example resistivityAtTemperature({ resistivity: 10.2, dopant: 'B', measuredTemperature: 298.15 }) // ≈ 10.06 Ω·cm
 */
export function resistivityAtTemperature(
  options: { readonly resistivity: number; readonly measuredTemperature: number; readonly targetTemperature?: number } & Omit<
    SampleOptions,
    'temperature'
  > &
    DopingWindowOptions,
): number {
  return call(
    'RESISTIVITYAT',
    {
      resistivity: options.resistivity,
      dopant: options.dopant,
      measured_temperature_K: options.measuredTemperature,
      target_temperature_K: options.targetTemperature,
      model: options.model,
      material: options.material,
      counter_doping: options.counterDoping,
      doping_min: options.dopingMin,
      doping_max: options.dopingMax,
    },
    { ...SAMPLE_NAMES, measured_temperature_K: 'measuredTemperature', target_temperature_K: 'targetTemperature' },
  );
}

/**
 * Intrinsic carrier density (DRIFT.INTRINSIC), cm⁻³.
 *
 * @param options - temperature in K, material and ni model
 * @returns ni in cm⁻³
 * @example intrinsicDensity({ temperature: 300 }) // ≈ 9.7e9 cm⁻³ in Si
 */
export function intrinsicDensity(options: { readonly temperature: number; readonly material?: string; readonly model?: string }): number {
  return call('INTRINSIC', { temperature_K: options.temperature, material: options.material, model: options.model }, SAMPLE_NAMES);
}

/**
 * Sheet resistance of a uniform layer (DRIFT.SHEETRES), Ω/sq.
 *
 * @param options - resistivity in Ω·cm, thickness in µm
 * @returns Rs in Ω/sq
 * @example sheetResistance({ resistivity: 10, thickness: 525 }) // ≈ 190 Ω/sq
 */
export function sheetResistance(options: { readonly resistivity: number; readonly thickness: number }): number {
  return call('SHEETRES', { resistivity: options.resistivity, thickness_um: options.thickness }, { thickness_um: 'thickness' });
}
