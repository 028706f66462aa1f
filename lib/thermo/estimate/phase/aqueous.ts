// Aqueous formation values of a neutral solute at 298.15 K, ideal solution at c° = 1 mol/L, from an
// ideal-gas estimate at p° = 1 bar and the Abraham/Mintz water relations:
//   ΔG*_solv (1 mol/L gas → 1 mol/L solution) = −RT ln K, K = c_aq/c_gas;
//   ΔG°_solv (1 bar gas → 1 mol/L solution) = ΔG*_solv + RT ln(c°RT/p°) = ΔG*_solv + 7.96 kJ/mol;
//   ΔfG°(aq) = ΔfG°(g) + ΔG°_solv;  ΔfH°(aq) = ΔfH°(g) + ΔH_solv (Mintz; no standard-state term);
//   S°(aq) = S°(g) + (ΔH_solv − ΔG°_solv)/T.
import { T_REF } from '../../constants';
import type { Chem, ParsedStructure } from '../../structure/chem';
import { assertNeutralClosedShell } from '../solvation/neutral-check';
import { GROUP_DESCRIPTOR_DG_SIGMA_KJ, GROUP_DESCRIPTOR_DH_SIGMA_KJ, LSER_DG_SIGMA_KJ, MINTZ_DH_SIGMA_KJ } from '../solvation/solvation-accuracy';
import { estimateSoluteDescriptors, type LibraryUse, type SoluteEstimate } from '../solvation/solute-descriptors';
import { dGsolvBenNaim, dHsolvWater, gasStandardStateShift, log10Kwater } from '../solvation/water';
import type { GasValues } from './gas-values';
import type { MatchedGroup } from './matched-group';

export interface AqueousEstimate extends GasValues {
  /** ΔG°_solv from the 1 bar gas to the 1 mol/L solution (what ΔfG°(aq) uses) */
  dGsolv_kJ: number;
  /** ΔG*_solv, Ben-Naim (1 mol/L → 1 mol/L); comparable with tabulated hydration free energies */
  dGsolvBenNaim_kJ: number;
  /** RT ln(c°RT/p°) added to go from the 1 mol/L gas to the 1 bar gas reference */
  standardStateShift_kJ: number;
  dHsolv_kJ: number;
  sigma_dGsolv_kJ: number;
  sigma_dHsolv_kJ: number;
  log10K: number;
  descriptors: SoluteEstimate['descriptors'];
  descriptorBasis: SoluteEstimate['basis'];
  groups: MatchedGroup[];
  method: 'gas estimate + Abraham/Mintz hydration (Chung et al. 2022 water coefficients)';
  standardState: 'ideal solution, 1 mol/L, 298.15 K (gas reference 1 bar); neutral solute';
  notes: string[];
}

const NOTES = [
  'Aqueous values are estimated twice over: the ideal-gas estimate, then the solvation step.',
  'Neutral solute only: for acids and bases this is the undissociated form at 1 mol/L; no pKa or biochemical (pH 7) standard state is applied.',
  '298.15 K only; infinite dilution, ideal solution.',
];

export function aqueousFromGas(chem: Chem, structure: string | ParsedStructure, gas: GasValues, options: { library?: LibraryUse } = {}): AqueousEstimate {
  assertNeutralClosedShell(chem, structure);
  const solute = estimateSoluteDescriptors(chem, structure, options);
  const d = solute.descriptors;
  const benNaim = dGsolvBenNaim(d);
  const shift = gasStandardStateShift();
  const dGsolv = benNaim + shift;
  const dHsolv = dHsolvWater(d);
  const grouped = solute.basis !== 'library';
  const sigmaG = Math.hypot(LSER_DG_SIGMA_KJ, grouped ? GROUP_DESCRIPTOR_DG_SIGMA_KJ : 0);
  const sigmaH = Math.hypot(MINTZ_DH_SIGMA_KJ, grouped ? GROUP_DESCRIPTOR_DH_SIGMA_KJ : 0);
  return {
    dfG_kJ: gas.dfG_kJ + dGsolv,
    dfH_kJ: gas.dfH_kJ + dHsolv,
    S_J_per_K: gas.S_J_per_K + ((dHsolv - dGsolv) * 1000) / T_REF,
    sigma_dfG_kJ: Math.hypot(gas.sigma_dfG_kJ, sigmaG),
    sigma_dfH_kJ: Math.hypot(gas.sigma_dfH_kJ, sigmaH),
    sigma_S_J_per_K: Math.hypot(gas.sigma_S_J_per_K, (Math.hypot(sigmaG, sigmaH) * 1000) / T_REF),
    dGsolv_kJ: dGsolv,
    dGsolvBenNaim_kJ: benNaim,
    standardStateShift_kJ: shift,
    dHsolv_kJ: dHsolv,
    sigma_dGsolv_kJ: sigmaG,
    sigma_dHsolv_kJ: sigmaH,
    log10K: log10Kwater(d),
    descriptors: d,
    descriptorBasis: solute.basis,
    groups: solute.groups,
    method: 'gas estimate + Abraham/Mintz hydration (Chung et al. 2022 water coefficients)',
    standardState: 'ideal solution, 1 mol/L, 298.15 K (gas reference 1 bar); neutral solute',
    notes: [...NOTES, ...solute.notes],
  };
}
