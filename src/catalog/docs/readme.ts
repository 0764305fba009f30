/**
 * The README's generated sections: the function table, the codes and the
 * model table. `npm run docs` writes them between marker comments; a test
 * fails when README.md and the catalog disagree.
 */
import {
  CARRIER_ROLES,
  MATERIAL_CODES,
  MODEL_REGISTRY,
  typedDopantCodes,
  intrinsicModelCodes,
  mobilityModelCodes,
  resistivityModelCodes,
  SILICON_MINORITY_MOBILITY_MODEL,
} from '../../physics';
import { perMaterial } from '../citedModels';
import type { FunctionSpec } from '../types';
import { signature } from './signature';
import { renderF723Agreement } from './f723Agreement';

/** Escapes text for a Markdown table cell. */
function cell(text: string): string {
  return text.replace(/\|/g, '\\|').replace(/\s*\n\s*/g, ' ');
}

export function renderFunctionTable(catalog: readonly FunctionSpec[]): string {
  const rows = catalog.map((spec) => `| \`${signature(spec)}\` | ${spec.result.unit ?? '—'} | ${cell(spec.summary)} |`);
  return ['| Function | Result unit | What it gives |', '| --- | --- | --- |', ...rows].join('\n');
}

export function renderCodeTable(): string {
  const rows: [string, string, string][] = [
    ['material', MATERIAL_CODES.join(', '), MATERIAL_CODES[0]],
    [
      'dopant',
      `${perMaterial(typedDopantCodes)}. Symbols or element names; donor / acceptor (or n-type / p-type) ` +
        `are a generic donor / acceptor. A lone P or N is refused: it could mean the element or the ` +
        `conductivity type.`,
      'required',
    ],
    ['carrier', `${CARRIER_ROLES.join(', ')} (also electrons, holes, n / e, p / h)`, CARRIER_ROLES[0]],
    [
      'model (mobility, diffusivity)',
      perMaterial(mobilityModelCodes),
      `${perMaterial(mobilityModelCodes, true)}; Si minority carriers: ${SILICON_MINORITY_MOBILITY_MODEL}`,
    ],
    ['model (conductivity, resistivity, doping)', perMaterial(resistivityModelCodes), perMaterial(resistivityModelCodes, true)],
    ['model (ni)', perMaterial(intrinsicModelCodes), perMaterial(intrinsicModelCodes, true)],
  ];
  return [
    '| Argument | Codes (case-insensitive) | Default |',
    '| --- | --- | --- |',
    ...rows.map(([arg, codes, fallback]) => `| ${arg} | ${cell(codes)} | ${fallback} |`),
  ].join('\n');
}

export function renderModelTable(): string {
  return [
    '| Code | Quantity | Model | Source | Validity |',
    '| --- | --- | --- | --- | --- |',
    ...MODEL_REGISTRY.map((m) => `| \`${m.code}\` | ${cell(m.quantity)} | ${cell(m.name)} | ${cell(m.citation)} | ${cell(m.validity)} |`),
  ].join('\n');
}

/** Generated README sections by marker name. */
export function readmeSections(catalog: readonly FunctionSpec[]): Record<string, string> {
  return {
    functions: renderFunctionTable(catalog),
    codes: renderCodeTable(),
    models: renderModelTable(),
    f723: renderF723Agreement(),
  };
}

const marker = (name: string, edge: 'begin' | 'end') => `<!-- generated:${name}:${edge} -->`;

/**
 * Replaces each generated section of a README text. Throws if a marker pair
 * is missing, so a hand edit cannot silently drop a section.
 */
export function updateReadmeText(text: string, sections: Record<string, string>): string {
  let out = text;
  for (const [name, body] of Object.entries(sections)) {
    const begin = marker(name, 'begin');
    const end = marker(name, 'end');
    const start = out.indexOf(begin);
    const stop = out.indexOf(end);
    if (start < 0 || stop < start) throw new Error(`README.md lacks the markers ${begin} … ${end}`);
    out = `${out.slice(0, start + begin.length)}\n${body}\n${out.slice(stop)}`;
  }
  return out;
}
