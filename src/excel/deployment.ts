/**
 * Where the built add-in is served from, and the manifest for that place.
 *
 * Development serves dist/addin on https://localhost:3000 (origin.ts). A team
 * deployment serves the same folder from its own HTTPS host; the build then
 * needs that address in two places only: every URL of the manifest and every
 * helpUrl in functions.json. One build setting carries it:
 *
 *   DRIFTCELL_ADDIN_URL=https://tools.example.org/driftcell npm run build
 *   (or: npx webpack --mode production --env addinUrl=https://…)
 *
 * The manifest's Id and the function ids never change with it: Excel keys
 * installed add-ins and saved formulas on them.
 */
import { ADDIN_ORIGIN } from './origin';

/** The environment variable (and webpack --env key) of the setting. */
export const ADDIN_URL_VARIABLE = 'DRIFTCELL_ADDIN_URL';
export const ADDIN_URL_ENV_KEY = 'addinUrl';

/**
 * Reads the setting: an absolute https URL, a folder of a host, without query
 * or fragment; a trailing slash is dropped. Blank means the development origin.
 *
 * @param value - what the user set, or undefined
 * @returns the base URL every add-in URL starts with
 * @throws Error saying what is wrong and what is allowed
 * @example addinBaseUrl('https://tools.example.org/driftcell/') // 'https://tools.example.org/driftcell'
 */
export function addinBaseUrl(value: string | undefined): string {
  if (value === undefined || value.trim() === '') return ADDIN_ORIGIN;
  const text = value.trim();
  let url: URL;
  try {
    url = new URL(text);
  } catch {
    throw new Error(`${ADDIN_URL_VARIABLE} must be an absolute URL such as https://tools.example.org/driftcell; got "${text}"`);
  }
  if (url.protocol !== 'https:')
    throw new Error(`${ADDIN_URL_VARIABLE} must use https (Excel loads add-ins only over HTTPS); got "${text}"`);
  if (url.search !== '' || url.hash !== '' || url.username !== '' || url.password !== '') {
    throw new Error(`${ADDIN_URL_VARIABLE} must be a plain folder address without query, fragment or credentials; got "${text}"`);
  }
  return `${url.origin}${url.pathname}`.replace(/\/+$/, '');
}

/**
 * The manifest for a base URL: every development URL in the source manifest
 * replaced by the same path under baseUrl. Nothing else changes.
 *
 * @param sourceXml - manifest/manifest.xml as written for development
 * @param baseUrl - from addinBaseUrl()
 * @throws Error if the source manifest holds an https URL that is not the development origin
 */
export function deployedManifest(sourceXml: string, baseUrl: string): string {
  const foreign = (sourceXml.match(/https:\/\/[^"'<\s]+/g) ?? []).filter((u) => !u.startsWith(`${ADDIN_ORIGIN}/`));
  if (foreign.length > 0)
    throw new Error(`manifest.xml has URLs outside ${ADDIN_ORIGIN}: ` + `${foreign.join(', ')}; every add-in URL must start with it`);
  return sourceXml.split(`${ADDIN_ORIGIN}/`).join(`${baseUrl}/`);
}
