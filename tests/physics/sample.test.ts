import { carrierFor, resolveCarrierRole, sampleDopants, totalImpurityDensity } from '../../src/physics/sample';
import { SILICON } from '../../src/physics/materials';
import { resolveDopant } from '../../src/physics/dopants';
import { PhysicsDomainError } from '../../src/physics/errors';
import { siliconSample } from './transportSamples';

const boron = resolveDopant(SILICON, 'B');
const arsenic = resolveDopant(SILICON, 'As');

describe('sampleDopants', () => {
  it('lists only the named dopant when there is no counter-doping', () => {
    const dopants = sampleDopants(siliconSample('B', 1e16));
    expect(dopants).toHaveLength(1);
    expect(dopants[0]).toEqual({ dopant: boron, density: 1e16 });
  });
  it('adds the generic dopant of the opposite kind as counter-dopant', () => {
    const [named, counter] = sampleDopants(siliconSample('As', 1e17, 300, 3e16));
    expect(named.dopant).toBe(arsenic);
    expect(counter.dopant.kind).toBe('acceptor');
    expect(counter.dopant.symbol).toBe('acceptor');
    expect(counter.density).toBe(3e16);
    expect(sampleDopants(siliconSample('B', 1e17, 300, 1e15))[1].dopant.symbol).toBe('donor');
  });
});

describe('carrierFor', () => {
  it('maps majority to the carrier the named dopant supplies and minority to the other', () => {
    expect(carrierFor(boron, 'majority')).toBe('hole');
    expect(carrierFor(boron, 'minority')).toBe('electron');
    expect(carrierFor(arsenic, 'majority')).toBe('electron');
    expect(carrierFor(arsenic, 'minority')).toBe('hole');
  });
  it('passes electron and hole through', () => {
    expect(carrierFor(boron, 'electron')).toBe('electron');
    expect(carrierFor(arsenic, 'hole')).toBe('hole');
  });
  it('rejects an unknown role at run time', () => {
    expect(() => carrierFor(boron, 'both' as 'hole')).toThrow(PhysicsDomainError);
  });
});

describe('resolveCarrierRole', () => {
  it('is case-insensitive and lists the roles on error', () => {
    expect(resolveCarrierRole(' Majority ')).toBe('majority');
    expect(resolveCarrierRole('HOLE')).toBe('hole');
    expect(() => resolveCarrierRole('ions')).toThrow(/majority, minority, electron, hole/);
  });
});

describe('totalImpurityDensity', () => {
  it('adds named and counter densities (what the mobility fits take)', () => {
    expect(totalImpurityDensity(siliconSample('P', 1e17, 300, 4e16))).toBe(1.4e17);
  });
});
