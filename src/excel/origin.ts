/**
 * Where the add-in is served during development. The manifest's URLs, the
 * help links in functions.json and the dev server all use this one origin.
 */

/** The port in manifest/manifest.xml. */
export const ADDIN_PORT = 3000;

/** Origin of every add-in URL (Excel requires HTTPS for add-in pages). */
export const ADDIN_ORIGIN = `https://localhost:${ADDIN_PORT}`;
