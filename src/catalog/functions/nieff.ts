import { BANDGAP_NARROWING_MODEL_CODES, effectiveIntrinsicDensity, resolveBandgapNarrowingModel, resolveDopant } from '../../physics';
import { dopant, doping, material, temperature } from '../common';
import { codeParameter } from '../parameters';
import { elementwise } from '../types';
import { BANDGAP_NARROWING_MODELS } from '../citedModels';
import { prose } from '../../text/prose';

/** The apparent bandgap-narrowing model; blank means the default, klaassen-bgn. */
export const bandgapNarrowingModel = codeParameter<string>({
  name: 'model',
  description: prose`Apparent bandgap-narrowing model (silicon): ${BANDGAP_NARROWING_MODEL_CODES.join(', ')};
    blank means ${BANDGAP_NARROWING_MODEL_CODES[0]}.`,
  choices: () => BANDGAP_NARROWING_MODEL_CODES,
  defaultCode: BANDGAP_NARROWING_MODEL_CODES[0],
  resolve: (code) => code,
});

export const NIEFF = elementwise({
  name: 'NIEFF',
  summary: 'Effective intrinsic density ni_eff = ni·exp(ΔEg/2kT) with apparent bandgap narrowing, in cm⁻³.',
  help: prose`Returns the effective intrinsic carrier density of heavily doped silicon, ni_eff =
    ni·exp(ΔEg/(2kT)), with ni the default intrinsic density (as DRIFT.INTRINSIC returns it) and ΔEg the
    apparent bandgap narrowing at the dopant density, ΔEg = E0·[ln(N/Nref) + sqrt(ln²(N/Nref) + C)]. The
    default model is Klaassen, Slotboom & de Graaff (1992), unified for n- and p-type silicon (E0 = 6.92 meV,
    Nref = 1.3e17 cm⁻³, C = 0.5); slotboom-1976 gives the original 1976 parameters (9 meV, 1e17 cm⁻³, 0.5).
    Both are the same for donors and acceptors, the generic donor and acceptor included; only the dopant
    density enters.

    Apparent narrowing is defined by n0·p0 = ni_eff² with Boltzmann statistics: it describes the minority
    carriers of heavily doped emitters and bases. The minority-carrier density in heavily doped material is
    therefore about NIEFF² divided by the majority density (DRIFT.MAJORITY). The equilibrium solver behind
    DRIFT.ELECTRONS, DRIFT.HOLES, DRIFT.MAJORITY and DRIFT.MINORITY does not include bandgap narrowing: it
    uses Fermi–Dirac statistics on the undoped band edges, and adding the apparent narrowing there would count
    the majority carriers' degeneracy twice.

    Validity: silicon only (other materials give an error), dopant densities of about 1e17–1e20 cm⁻³ near room
    temperature, where the models were fitted; below about 1e17 cm⁻³ ΔEg falls smoothly to zero. ΔEg is taken
    as independent of temperature, so values away from 300 K are estimates.`,
  result: { unit: 'cm⁻³', description: 'Effective intrinsic density ni_eff' },
  parameters: [doping, dopant, temperature, bandgapNarrowingModel, material] as const,
  examples: [
    { formula: '=DRIFT.NIEFF(1e19,"phosphorus")', note: 'about 3.1e10 cm⁻³ in 1e19 cm⁻³ phosphorus-doped Si at 300 K' },
    { formula: '=DRIFT.NIEFF(1e20,"B",300,"slotboom-1976")', note: 'the original 1976 parameters for a boron-doped emitter' },
    {
      formula: '=DRIFT.NIEFF(1e19,"phosphorus")^2/DRIFT.MAJORITY(1e19,"phosphorus")',
      note: 'the minority holes in a 1e19 cm⁻³ n+ region with narrowing',
    },
  ],
  models: BANDGAP_NARROWING_MODELS,
  compute: (density, dopantCode, temperatureK, model, materialValue) => {
    // The model's material check comes first, so Ge, GaAs or 4H-SiC get the "silicon only" message.
    resolveBandgapNarrowingModel(materialValue, model);
    resolveDopant(materialValue, dopantCode);
    return effectiveIntrinsicDensity(materialValue, temperatureK, density, model);
  },
});
