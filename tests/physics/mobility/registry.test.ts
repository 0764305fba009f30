/**
 * The mobility model registry: one entry per model, and everything else
 * (code lists, defaults, dispatch, DRIFT.MODELS rows) derived from it. The
 * physics of each model is checked in the test files its entry names; this
 * file checks that the entries are complete and that what is derived from
 * them agrees with them.
 */
import { existsSync } from 'fs';
import { join } from 'path';
import {
  ALL_MOBILITY_MODEL_CODES,
  MOBILITY_MODEL_REGISTRY,
  defaultMinorityMobilityModel,
  defaultMobilityModel,
  fitMobility,
  mobilityModelCodes,
  mobilityModelEntry,
} from '../../../src/physics/mobility';
import { MATERIAL_MOBILITY_FITS } from '../../../src/physics/mobility/materialFits';
import { MATERIALS, SILICON } from '../../../src/physics/materials';
import { MODEL_REGISTRY, modelInfo } from '../../../src/physics/models';
import { exponentText, parameterText } from '../../../src/physics/parameterText';
import type { Carrier } from '../../../src/physics/sample';
import { materialSample } from '../transportSamples';

const ROOT = join(__dirname, '..', '..', '..');
const CARRIERS: readonly Carrier[] = ['electron', 'hole'];

describe('every entry', () => {
  it.each(MOBILITY_MODEL_REGISTRY.map((model) => [model.code, model] as const))(
    '%s names files that exist: equation, parameter table, tests',
    (_code, model) => {
      expect(existsSync(join(ROOT, model.equation))).toBe(true);
      expect(existsSync(join(ROOT, model.parameterTable))).toBe(true);
      expect(model.tests.length).toBeGreaterThan(0);
      for (const file of model.tests) expect([file, existsSync(join(ROOT, file))]).toEqual([file, true]);
      // The first test file named is the check against the published source.
      expect(model.tests[0]).toMatch(/^tests\/physics\/reference\/.+\.reference\.test\.ts$/);
    },
  );

  it.each(MOBILITY_MODEL_REGISTRY.map((model) => [model.code, model] as const))(
    '%s has a lower-case code, a material the core knows, and text for every column',
    (_code, model) => {
      expect(model.code).toBe(model.code.toLowerCase());
      expect(model.materials.length).toBeGreaterThan(0);
      for (const code of model.materials) expect(MATERIALS.map((host) => host.code)).toContain(code);
      for (const text of [model.quantity, model.name, model.citation, model.validity, model.notes]) expect(text.trim()).not.toBe('');
      expect(model.parameters).toBeDefined();
    },
  );

  it('has one code per model, across every material', () => {
    expect(new Set(ALL_MOBILITY_MODEL_CODES).size).toBe(MOBILITY_MODEL_REGISTRY.length);
  });
});

describe('what is derived from the registry', () => {
  it('gives each material the entries that list it, in registry order, the first as default', () => {
    for (const host of MATERIALS) {
      const listed = MOBILITY_MODEL_REGISTRY.filter((model) => model.materials.includes(host.code)).map((model) => model.code);
      expect(mobilityModelCodes(host)).toEqual(listed);
      expect(defaultMobilityModel(host)).toBe(listed[0]);
    }
  });

  it('chooses the entry marked for minority carriers (silicon: klaassen), else the default', () => {
    // DRIFT.MOBILITY's help: klaassen is silicon's one model with minority-carrier physics.
    expect(defaultMinorityMobilityModel(SILICON)).toBe('klaassen');
    for (const host of MATERIALS.filter((m) => m !== SILICON)) expect(defaultMinorityMobilityModel(host)).toBe(defaultMobilityModel(host));
  });

  it('dispatches every code to its entry’s compute: fitMobility equals compute for every material and carrier', () => {
    for (const model of MOBILITY_MODEL_REGISTRY) {
      for (const hostCode of model.materials) {
        const host = MATERIALS.find((m) => m.code === hostCode)!;
        const dopant = host.dopants.find((d) => d.kind === 'donor')!.symbol;
        for (const temperature of [200, 300, 450]) {
          const s = materialSample(host, dopant, 1e17, temperature);
          for (const carrier of CARRIERS) expect(fitMobility(model.code, carrier, s)).toBe(model.compute(carrier, s));
        }
      }
    }
  });

  it('gives each entry its DRIFT.MODELS row word for word, with the files it names', () => {
    for (const model of MOBILITY_MODEL_REGISTRY) {
      expect(modelInfo(model.code)).toEqual({
        code: model.code,
        quantity: model.quantity,
        name: model.name,
        citation: model.citation,
        validity: model.validity,
        notes: model.notes,
        equation: model.equation,
        parameterTable: model.parameterTable,
        tests: model.tests,
      });
    }
    expect(MODEL_REGISTRY.filter((row) => mobilityModelEntry(row.code) !== undefined)).toHaveLength(MOBILITY_MODEL_REGISTRY.length);
  });

  it('marks the other hosts’ fits as free-carrier fits (used unchanged) and silicon’s as fits against dopant density', () => {
    for (const model of MOBILITY_MODEL_REGISTRY) {
      expect(model.fittedTo).toBe(model.materials.includes(SILICON.code) ? 'dopant-density' : 'free-carriers');
    }
  });
});

describe('citations quote the parameter table', () => {
  it.each(MATERIAL_MOBILITY_FITS.map((fit) => [fit.code, fit] as const))(
    '%s: each 300 K value of its table appears in its citation as formatted from the data',
    (_code, fit) => {
      for (const carrier of CARRIERS) {
        const p = fit.parameters[carrier];
        // μmin = 0 (Hilsum) is the form's, not a quoted value.
        const quoted = [p.maximum.value, p.referenceDensity.value, p.alpha.value, ...(p.minimum.value === 0 ? [] : [p.minimum.value])];
        for (const value of quoted) {
          const written = [parameterText(value), parameterText(value, 2), exponentText(value)];
          expect([value, written.some((text) => fit.citation.includes(text))]).toEqual([value, true]);
        }
      }
    },
  );
});

describe('parameterText', () => {
  it.each([
    [9400, undefined, '9400'],
    [0.394, undefined, '0.394'],
    [1.48e17, undefined, '1.48e17'],
    [4.73e-4, undefined, '4.73e-4'],
    [-2.15, undefined, '−2.15'],
    [0, undefined, '0'],
    [1.17, 4, '1.170'],
    [6e16, 2, '6.0e16'],
    [3, 2, '3.0'],
    [3.1e19, 3, '3.10e19'],
    [636, 3, '636'],
  ] as const)('writes %p with %p significant digits as %p', (value, digits, text) => {
    expect(parameterText(value, digits)).toBe(text);
  });

  it.each([
    [1.5, '3/2'],
    [0.5, '1/2'],
    [2, '2'],
    [-1.66, '−1.66'],
  ] as const)('writes the exponent %p as %p', (value, text) => {
    expect(exponentText(value)).toBe(text);
  });

  it('refuses what is no table value or no digit count', () => {
    expect(() => parameterText(Number.NaN)).toThrow(/finite number/);
    expect(() => parameterText(1, 0)).toThrow(/1–21 significant digits/);
  });
});
