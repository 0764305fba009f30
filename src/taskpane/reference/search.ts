/**
 * Searches the catalog the way a user asks for a function: by name, by what
 * it computes, by a parameter, a unit ("ohm cm", "cm-3"), a model code or a
 * cited model's name (from the model registry).
 * Every word of the query must match somewhere; entries are ranked by where
 * the words matched (name first, help text last), ties in catalog order.
 */
import { CATALOG } from '../../catalog';
import type { FunctionSpec } from '../../catalog/types';
import { citedModel } from './details';

/**
 * Text folded for matching: lower case, Ω → 'ohm', µ → 'u', ρ → 'rho',
 * superscript digits and minus to plain ones, separators to spaces.
 *
 * @example foldSearchText('Ω·cm, cm⁻³') // 'ohm cm cm-3'
 */
export function foldSearchText(text: string): string {
  const superscripts: Record<string, string> = {
    '⁻': '-',
    '⁰': '0',
    '¹': '1',
    '²': '2',
    '³': '3',
    '⁴': '4',
    '⁵': '5',
    '⁶': '6',
    '⁷': '7',
    '⁸': '8',
    '⁹': '9',
  };
  return text
    .replace(/[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]/g, (character) => superscripts[character])
    .replace(/[\u2126\u03A9\u03C9]/g, 'ohm')
    .replace(/[\u00B5\u03BC]/g, 'u')
    .replace(/[ρϱ]/g, 'rho')
    .toLowerCase()
    .replace(/[·•⋅,;:()[\]{}"'’/=]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
}

/** How much a query word counts where it matched. Names outrank everything; help text counts least. */
export const MATCH_WEIGHTS = {
  nameExact: 100,
  namePrefix: 60,
  nameContains: 40,
  modelCode: 25,
  parameterName: 15,
  unit: 12,
  modelName: 10,
  summary: 8,
  help: 2,
} as const;

/** The searchable fields of an entry, folded once. */
interface Fields {
  readonly name: string;
  readonly models: readonly string[];
  /** Names of the cited models from the registry, e.g. 'thurmond 1975 varshni form band gap'. */
  readonly modelNames: string;
  readonly parameters: readonly string[];
  readonly units: readonly string[];
  readonly summary: string;
  readonly help: string;
}

/** Fields by entry, built the first time an entry is searched; entries do not change while the pane runs. */
const FIELDS = new WeakMap<FunctionSpec, Fields>();

function fieldsOf(spec: FunctionSpec): Fields {
  let fields = FIELDS.get(spec);
  if (fields === undefined) {
    fields = buildFields(spec);
    FIELDS.set(spec, fields);
  }
  return fields;
}

function buildFields(spec: FunctionSpec): Fields {
  const units = [spec.result.unit, ...spec.parameters.map((parameter) => parameter.unit)].filter((unit): unit is string => unit !== null);
  return {
    name: spec.name.toLowerCase(),
    models: spec.models.map((code) => code.toLowerCase()),
    modelNames: foldSearchText(
      spec.models
        .map((code) => citedModel(code)?.name)
        .filter((name): name is string => name !== undefined)
        .join(' '),
    ),
    parameters: spec.parameters.map((parameter) => parameter.name.toLowerCase()),
    units: units.map(foldSearchText),
    summary: foldSearchText(spec.summary),
    help: foldSearchText(spec.help),
  };
}

function wordScore(word: string, fields: Fields): number {
  if (fields.name === word) return MATCH_WEIGHTS.nameExact;
  if (fields.name.startsWith(word)) return MATCH_WEIGHTS.namePrefix;
  if (fields.name.includes(word)) return MATCH_WEIGHTS.nameContains;
  if (fields.models.some((code) => code === word || code.split('-').includes(word))) return MATCH_WEIGHTS.modelCode;
  if (fields.parameters.some((name) => name === word || name.split('_').includes(word))) return MATCH_WEIGHTS.parameterName;
  if (fields.units.some((unit) => unit === word || unit.split(' ').includes(word))) return MATCH_WEIGHTS.unit;
  if (` ${fields.modelNames}`.includes(` ${word}`)) return MATCH_WEIGHTS.modelName;
  if (` ${fields.summary}`.includes(` ${word}`)) return MATCH_WEIGHTS.summary;
  if (fields.help.includes(word)) return MATCH_WEIGHTS.help;
  return 0;
}

/** One search result. */
export interface SearchHit {
  readonly spec: FunctionSpec;
  readonly score: number;
}

/**
 * Ranks the catalog for a query.
 *
 * A multi-word unit such as "ohm cm" also matches as a whole. The DRIFT.
 * prefix in the query is ignored. An empty query lists every entry in catalog order.
 *
 * @param query - what the user typed, e.g. 'sheet resistance', 'cm-3', 'masetti', 'DRIFT.DOP'
 * @param catalog - entries to search (default: the whole catalog)
 * @returns matching entries, best first
 * @example searchCatalog('doping')[0].spec.name // 'DOPING'
 */
export function searchCatalog(query: string, catalog: readonly FunctionSpec[] = CATALOG): SearchHit[] {
  const folded = foldSearchText(query.replace(/\bdrift\./gi, ''));
  if (folded === '') return catalog.map((spec) => ({ spec, score: 0 }));
  const words = folded.split(' ');
  return catalog
    .flatMap((spec, order) => {
      const fields = fieldsOf(spec);
      const scores = words.map((word) => wordScore(word, fields));
      if (scores.some((score) => score === 0)) return [];
      // A phrase that is a whole unit ("ohm cm") ranks that unit's functions above loose matches.
      const phraseBonus = words.length > 1 && fields.units.includes(folded) ? MATCH_WEIGHTS.unit : 0;
      return [{ spec, order, score: scores.reduce((sum, score) => sum + score, 0) + phraseBonus }];
    })
    .sort((a, b) => b.score - a.score || a.order - b.order)
    .map(({ spec, score }) => ({ spec, score }));
}
