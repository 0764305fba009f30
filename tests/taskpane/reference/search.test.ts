import { CATALOG, findFunction } from '../../../src/catalog';
import { describeFunction, signatureWithUnits } from '../../../src/taskpane/reference/details';
import { foldSearchText, searchCatalog } from '../../../src/taskpane/reference/search';
import { MODEL_REGISTRY } from '../../../src/physics/models';

const names = (query: string): string[] => searchCatalog(query).map((hit) => hit.spec.name);

describe('catalog search', () => {
  it('an empty query lists the whole catalog in catalog order', () => {
    expect(names('')).toEqual(CATALOG.map((spec) => spec.name));
    expect(names('   ')).toEqual(CATALOG.map((spec) => spec.name));
  });

  it('ranks an exact name first, then names that start with the word, then names containing it', () => {
    const hits = names('doping');
    expect(hits[0]).toBe('DOPING');
    expect(hits[1]).toBe('DOPINGRANGE');
    // Functions that only take or mention doping follow the name matches.
    expect(hits.length).toBeGreaterThan(2);
  });

  it('ignores case and the DRIFT. prefix', () => {
    expect(names('DRIFT.SheetRes')[0]).toBe('SHEETRES');
    expect(names('drift.intrinsic')[0]).toBe('INTRINSIC');
  });

  it('finds functions by what their summary says', () => {
    expect(names('sheet resistance')).toEqual(expect.arrayContaining(['SHEETRES', 'LAYERSHEETRES', 'FOURPOINTRS']));
    expect(names('radial')[0]).toBe('RADIALVARIATION');
  });

  it('finds functions by a parameter name', () => {
    const hits = names('thickness_um');
    expect(hits).toContain('SHEETRES');
    for (const name of hits) {
      const spec = findFunction(name)!;
      const mentions =
        spec.parameters.some((p) => p.name === 'thickness_um') ||
        spec.help.includes('thickness_um') ||
        spec.summary.includes('thickness_um');
      expect(mentions).toBe(true);
    }
  });

  it('finds functions by unit, typed in plain letters', () => {
    expect(foldSearchText('Ω·cm, cm⁻³, µm')).toBe('ohm cm cm-3 um');
    const ohmCm = names('ohm cm');
    expect(ohmCm).toEqual(expect.arrayContaining(['RESISTIVITY', 'DOPING', 'SHEETRES']));
    // The phrase bonus puts functions with an Ω·cm unit ahead of functions that only mention ohm and cm apart.
    const withUnit = CATALOG.filter((spec) => [spec.result.unit, ...spec.parameters.map((p) => p.unit)].includes('Ω·cm')).map(
      (spec) => spec.name,
    );
    expect(ohmCm.slice(0, withUnit.length).sort()).toEqual([...withUnit].sort());
    expect(names('cm-3')).toContain('INTRINSIC');
  });

  it('finds functions by a model code', () => {
    const hits = names('masetti');
    const citing = CATALOG.filter((spec) => spec.models.includes('masetti')).map((spec) => spec.name);
    expect(citing.length).toBeGreaterThan(0);
    expect(hits.slice(0, citing.length).sort()).toEqual([...citing].sort());
  });

  it('finds functions by a cited model’s name from the registry', () => {
    const spec = CATALOG.find((entry) => entry.models.length > 0)!;
    const registered = MODEL_REGISTRY.find((entry) => entry.code === spec.models[0])!;
    // A word of the model's name that is not its code, e.g. 'Varshni' in a band-gap model's name.
    const word = foldSearchText(registered.name)
      .split(/[\s-]+/)
      .find((w) => /^[a-z]{5,}$/.test(w) && w !== registered.code)!;
    expect(word).toBeDefined();
    expect(names(word)).toContain(spec.name);
  });

  it('needs every word to match, and finds nothing for nonsense', () => {
    expect(names('sheet zebra')).toEqual([]);
    expect(names('qqqq')).toEqual([]);
  });
});

describe('entry details', () => {
  it('give the signature with units, from the catalog', () => {
    const sheetRes = findFunction('SHEETRES')!;
    expect(signatureWithUnits(sheetRes)).toBe(
      `DRIFT.SHEETRES(${sheetRes.parameters.map((p) => `${p.name} (${p.unit})`).join(', ')}) → ${sheetRes.result.unit}`,
    );
    const doping = describeFunction(findFunction('DOPING')!);
    expect(doping.signature).toMatch(/^DRIFT\.DOPING\(resistivity \(Ω·cm\), dopant, \[temperature_K \(K\)\]/);
    expect(doping.parameters.find((p) => p.name === 'temperature_K')).toMatchObject({ unit: 'K', optional: true, defaultText: '300' });
    expect(doping.parameters.find((p) => p.name === 'dopant')!.choices).toContain('B');
  });

  it('cite every model an entry names from the registry, with its validity range', () => {
    for (const spec of CATALOG) {
      const details = describeFunction(spec);
      expect(details.models.map((m) => m.code)).toEqual(spec.models);
      for (const model of details.models) {
        const registered = MODEL_REGISTRY.find((entry) => entry.code === model.code);
        expect(model.info).toBe(registered ?? null);
      }
    }
    const masetti = describeFunction(findFunction('DOPING')!).models.find((m) => m.code === 'masetti')!;
    expect(masetti.info?.citation).toMatch(/Masetti/);
    expect(masetti.info?.validity.length).toBeGreaterThan(0);
  });

  it('carry the examples, the help paragraphs and a tuple entry’s column names', () => {
    const range = describeFunction(findFunction('DOPINGRANGE')!);
    expect(range.examples).toBe(findFunction('DOPINGRANGE')!.examples);
    expect(range.columns).toEqual(['doping at resistivity_max', 'doping at resistivity_min']);
    expect(range.help.length).toBeGreaterThan(1);
    expect(range.help.every((paragraph) => paragraph.trim() === paragraph && paragraph !== '')).toBe(true);
  });
});
