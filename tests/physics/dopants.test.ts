import { dopantCodes, genericDopant, resolveDopant, type DopantKind } from '../../src/physics/dopants';
import { PhysicsDomainError } from '../../src/physics/errors';
import { SILICON } from '../../src/physics/materials';

describe('dopants', () => {
  it('lists the silicon dopants in display order', () => {
    expect(dopantCodes(SILICON)).toEqual(['B', 'Al', 'Ga', 'In', 'P', 'As', 'Sb', 'n', 'p']);
  });

  it('tells donors from acceptors (common practice, no source)', () => {
    for (const symbol of ['P', 'As', 'Sb', 'n']) expect(resolveDopant(SILICON, symbol).kind).toBe('donor');
    for (const symbol of ['B', 'Al', 'Ga', 'In', 'p']) expect(resolveDopant(SILICON, symbol).kind).toBe('acceptor');
  });

  it('uses degeneracy 2 for donors and 4 for acceptors (common practice, no source)', () => {
    for (const dopant of SILICON.dopants) expect(dopant.degeneracy).toBe(dopant.kind === 'donor' ? 2 : 4);
  });

  it('resolves case-insensitively, exact case first so that P is phosphorus and p the generic acceptor', () => {
    expect(resolveDopant(SILICON, 'P').name).toBe('phosphorus');
    expect(resolveDopant(SILICON, 'p').name).toBe('generic acceptor');
    expect(resolveDopant(SILICON, 'b').symbol).toBe('B');
    expect(resolveDopant(SILICON, 'AS').symbol).toBe('As');
    expect(resolveDopant(SILICON, 'N').symbol).toBe('n');
    expect(resolveDopant(SILICON, ' sb ').symbol).toBe('Sb');
  });

  it('accepts unambiguous aliases and element names', () => {
    expect(resolveDopant(SILICON, 'n-type').symbol).toBe('n');
    expect(resolveDopant(SILICON, 'P-TYPE').symbol).toBe('p');
    expect(resolveDopant(SILICON, 'Phosphorus').symbol).toBe('P');
    expect(resolveDopant(SILICON, 'boron').symbol).toBe('B');
  });

  it('rejects unknown codes, listing the allowed ones', () => {
    expect(() => resolveDopant(SILICON, 'Bi')).toThrow(PhysicsDomainError);
    expect(() => resolveDopant(SILICON, 'Bi')).toThrow(/unknown dopant 'Bi'.*B, Al, Ga, In, P, As, Sb, n, p/);
  });

  it('maps mobility species: own fit for P, As, B; Sb → As; Al, Ga, In, p → B; n → P', () => {
    const species = Object.fromEntries(SILICON.dopants.map((d) => [d.symbol, d.mobilitySpecies]));
    expect(species).toEqual({ B: 'B', Al: 'B', Ga: 'B', In: 'B', P: 'P', As: 'As', Sb: 'As', n: 'P', p: 'B' });
  });

  it('gives generic dopants for each kind', () => {
    expect(genericDopant(SILICON, 'donor').symbol).toBe('n');
    expect(genericDopant(SILICON, 'acceptor').symbol).toBe('p');
    expect(() => genericDopant(SILICON, 'neutral' as DopantKind)).toThrow(/donor, acceptor/);
  });

  it('generic dopants carry the ionization parameters of P and B', () => {
    expect(genericDopant(SILICON, 'donor').ionization).toBe(resolveDopant(SILICON, 'P').ionization);
    expect(genericDopant(SILICON, 'acceptor').ionization).toBe(resolveDopant(SILICON, 'B').ionization);
  });
});
