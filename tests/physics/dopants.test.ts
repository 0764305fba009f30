import {
  dopantCodeProblem,
  dopantCodes,
  genericDopant,
  readDopant,
  resolveDopant,
  typedDopantCodes,
  type DopantKind,
} from '../../src/physics/dopants';
import { PhysicsDomainError } from '../../src/physics/errors';
import { MATERIALS, SILICON } from '../../src/physics/materials';

describe('dopants', () => {
  it('lists the silicon dopants in display order', () => {
    expect(dopantCodes(SILICON)).toEqual(['B', 'Al', 'Ga', 'In', 'P', 'As', 'Sb', 'donor', 'acceptor']);
    expect(typedDopantCodes(SILICON)).toEqual(['B', 'Al', 'Ga', 'In', 'phosphorus', 'As', 'Sb', 'donor', 'acceptor']);
  });

  it('tells donors from acceptors (common practice, no source)', () => {
    for (const symbol of ['P', 'As', 'Sb', 'donor']) expect(resolveDopant(SILICON, symbol).kind).toBe('donor');
    for (const symbol of ['B', 'Al', 'Ga', 'In', 'acceptor']) expect(resolveDopant(SILICON, symbol).kind).toBe('acceptor');
  });

  it('uses degeneracy 2 for donors and 4 for acceptors (common practice, no source)', () => {
    for (const dopant of SILICON.dopants) expect(dopant.degeneracy).toBe(dopant.kind === 'donor' ? 2 : 4);
  });

  it('resolves every code, name and alias the same in upper, lower and mixed case', () => {
    const mixed = (text: string) => [...text].map((ch, i) => (i % 2 ? ch.toLowerCase() : ch.toUpperCase())).join('');
    for (const material of MATERIALS) {
      for (const dopant of material.dopants) {
        for (const code of [dopant.symbol, dopant.name]) {
          for (const spelling of [code, code.toUpperCase(), code.toLowerCase(), mixed(code), ` ${code} `]) {
            expect(resolveDopant(material, spelling)).toBe(dopant);
          }
        }
      }
    }
    expect(resolveDopant(SILICON, 'p').name).toBe('phosphorus');
    expect(resolveDopant(SILICON, 'b').symbol).toBe('B');
    expect(resolveDopant(SILICON, 'AS').symbol).toBe('As');
  });

  it('has no two codes or names in a material that are the same case-insensitively', () => {
    for (const material of MATERIALS) {
      const spellings = material.dopants.flatMap((dopant) => [...new Set([dopant.symbol, dopant.name].map((code) => code.toLowerCase()))]);
      expect(new Set(spellings).size).toBe(spellings.length);
    }
  });

  it('accepts unambiguous aliases and element names in any case', () => {
    expect(resolveDopant(SILICON, 'n-type').symbol).toBe('donor');
    expect(resolveDopant(SILICON, 'P-TYPE').symbol).toBe('acceptor');
    expect(resolveDopant(SILICON, 'N Type').symbol).toBe('donor');
    expect(resolveDopant(SILICON, 'Generic Acceptor').symbol).toBe('acceptor');
    expect(resolveDopant(SILICON, 'Phosphorus').symbol).toBe('P');
    expect(resolveDopant(SILICON, 'boron').symbol).toBe('B');
    expect(resolveDopant(SILICON, 'aluminum').symbol).toBe('Al');
  });

  it('refuses a lone P or N in typed text in any case, naming both readings and what to type', () => {
    for (const text of ['P', 'p', ' p ']) {
      expect(() => readDopant(SILICON, text)).toThrow(PhysicsDomainError);
      expect(dopantCodeProblem(text)).toBe(
        `dopant "${text.trim()}" could mean phosphorus or a generic acceptor (p-type); type "phosphorus" or "acceptor"`,
      );
    }
    for (const text of ['N', 'n']) {
      expect(dopantCodeProblem(text)).toBe(`dopant "${text}" could mean nitrogen or a generic donor (n-type); type "nitrogen" or "donor"`);
    }
    for (const text of ['phosphorus', 'acceptor', 'B', 'pb', 'As']) expect(dopantCodeProblem(text)).toBeNull();
    expect(readDopant(SILICON, 'PHOSPHORUS').symbol).toBe('P');
  });

  it('rejects unknown codes, listing the allowed ones', () => {
    expect(() => resolveDopant(SILICON, 'Bi')).toThrow(PhysicsDomainError);
    expect(() => resolveDopant(SILICON, 'Bi')).toThrow(/unknown dopant 'Bi'.*B, Al, Ga, In, phosphorus, As, Sb, donor, acceptor/);
  });

  it('maps mobility species: own fit for P, As, B; Sb → As; Al, Ga, In, acceptor → B; donor → P', () => {
    const species = Object.fromEntries(SILICON.dopants.map((d) => [d.symbol, d.mobilitySpecies]));
    expect(species).toEqual({ B: 'B', Al: 'B', Ga: 'B', In: 'B', P: 'P', As: 'As', Sb: 'As', donor: 'P', acceptor: 'B' });
  });

  it('gives generic dopants for each kind', () => {
    expect(genericDopant(SILICON, 'donor').symbol).toBe('donor');
    expect(genericDopant(SILICON, 'acceptor').symbol).toBe('acceptor');
    expect(() => genericDopant(SILICON, 'neutral' as DopantKind)).toThrow(/donor, acceptor/);
  });

  it('generic dopants carry the ionization parameters of P and B', () => {
    expect(genericDopant(SILICON, 'donor').ionization).toBe(resolveDopant(SILICON, 'P').ionization);
    expect(genericDopant(SILICON, 'acceptor').ionization).toBe(resolveDopant(SILICON, 'B').ionization);
  });
});
