/**
 * Descriptions of the band-gap, density-of-states and dopant-ionization
 * parameter sets of the hosts other than silicon (silicon's are in
 * bands/modelInfo.ts), for the model registry and DRIFT.MODELS(). Citations
 * and validity come from the parameter tables themselves.
 */
import { locationOf, type ModelInfo } from '../modelInfo';
import { MATERIALS } from './index';
import { HYDROGENIC_CONSTANTS, mottDensity } from './ionizationScaling';
import { SILICON } from './silicon';
import type { Material } from './types';

/** The non-silicon hosts described here, in catalog order. */
const HOSTS: readonly Material[] = MATERIALS.filter((material) => material !== SILICON);

/** A host's dopants other than the generic donor and acceptor. */
function namedDopants(material: Material) {
  return material.dopants.filter(
    (dopant) => dopant.symbol !== material.genericDopants.donor && dopant.symbol !== material.genericDopants.acceptor,
  );
}

/** Code of a host's dopant-ionization parameter set, e.g. 'altermatt-mott-gaas'. */
export function ionizationModelCode(material: Material): string {
  return `altermatt-mott-${material.code.toLowerCase()}`;
}

/** The distinct citations of a host's named dopants' ionization energies. */
function energySources(material: Material): string {
  const named = namedDopants(material);
  const sources = [...new Set(named.map((dopant) => dopant.ionizationEnergyCitation))];
  return sources.length === 1 ? sources[0] : named.map((dopant) => `${dopant.symbol}: ${dopant.ionizationEnergyCitation}`).join('; ');
}

function dopantSummary(material: Material): string {
  return namedDopants(material)
    .map((dopant) => {
      const mott = mottDensity(dopant.ionizationEnergy, material.relativePermittivity);
      return `${dopant.symbol} ${dopant.kind} ${(dopant.ionizationEnergy * 1000).toPrecision(3)} meV (N_M ≈ ${mott.toExponential(1)} cm⁻³)`;
    })
    .join(', ');
}

function hostModels(material: Material): ModelInfo[] {
  const { bandgap, densityOfStates } = material;
  return [
    {
      code: bandgap.code,
      quantity: `band gap Eg (${material.code})`,
      name: bandgap.name,
      citation: bandgap.citation,
      validity: bandgap.validity,
      notes:
        `Eg(T) = Eg0 − α·T²/(T + β). With ${densityOfStates.code} it gives ni of ${material.name} through the ` +
        `'dos' model, the only ni model for ${material.code} (no published ni fit is offered).`,
      ...locationOf(bandgap),
    },
    {
      code: densityOfStates.code,
      quantity: `effective densities of states Nc, Nv (${material.code})`,
      name: densityOfStates.name,
      citation: densityOfStates.citation,
      validity: densityOfStates.validity,
      ...locationOf(densityOfStates),
    },
    {
      code: ionizationModelCode(material),
      quantity: `dopant ionization (${material.code})`,
      name: `Altermatt et al. (2006) form scaled to ${material.name} by the hydrogenic Mott density`,
      citation:
        `ionization energies: ${energySources(material)}; density dependence: assumption, ` +
        'Altermatt et al., J. Appl. Phys. 100, 113714 and 113715 (2006) Si:P / Si:B parameters with Nref and Nb ' +
        `scaled by the Mott density N_M = (${HYDROGENIC_CONSTANTS.mottConstant}/a_B)³, a_B = a0·Ry/(εr·ΔE0) ` +
        '(Mott criterion: P. P. Edwards, M. J. Sienko, Phys. Rev. B 17, 2575 (1978); from memory)',
      validity:
        'freeze-out from the measured isolated levels; full ionization above the estimated Mott density, an ' +
        'estimate within about a factor of 2, not a fit',
      notes: `εr = ${material.relativePermittivity}. ${dopantSummary(material)}.`,
      equation: 'src/physics/materials/ionizationScaling.ts',
      parameterTable: material.dopantTable,
      tests: ['tests/physics/materials/hosts.test.ts'],
    },
  ];
}

/** Every band, DOS and ionization parameter set of Ge, GaAs and 4H-SiC. */
export const MATERIAL_MODELS: readonly ModelInfo[] = HOSTS.flatMap(hostModels);
