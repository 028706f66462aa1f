// ΔrH°(T), ΔrS°(T), ΔrG°(T) of a reaction from anchored species states (Kirchhoff integration
// through the polynomials). ΔrG° is pinned to the tabulated ΔfG° at 298.15 K; see README.md.
import { ATM_IN_BAR, R_GAS, T_REF } from './constants';
import { speciesHSInto } from './species-state';
import type { SpeciesRecord } from './species-types';

export interface ReactionSpecies {
  key: string;
  asWritten: string;
  /** signed stoichiometric number: products positive, reactants negative (net, if on both sides) */
  nu: number;
  record: SpeciesRecord;
}

export interface ReactionThermo {
  deltaH0_kJ: number;
  /** from the tabulated S° values */
  deltaS0_J_per_K: number;
  deltaG0_kJ: number;
  /** ΔrG°(tab) − [ΔrH° − T·ΔrS°(tab)] at 298.15 K, kJ; non-zero when the table is not G-H-S consistent */
  ghsMismatch_kJ: number;
}

export interface ThermoOptions {
  heatCapacity?: boolean;
  /** standard pressure of the result, bar (the library is at 1 bar) */
  standardPressure_bar?: number;
}

export function gasMoleChange(species: readonly ReactionSpecies[]): number {
  let dn = 0;
  for (const s of species) if (s.record.phase === 'g') dn += s.nu;
  return dn;
}

/** Tabulated 298.15 K reaction values and the G-H-S mismatch they imply. */
export function reactionAt298(species: readonly ReactionSpecies[]): ReactionThermo {
  let dH = 0;
  let dG = 0;
  let dS = 0;
  for (const s of species) {
    dH += s.nu * s.record.dfH_kJ;
    dG += s.nu * s.record.dfG_kJ;
    dS += s.nu * s.record.S_J_per_K;
  }
  return { deltaH0_kJ: dH, deltaS0_J_per_K: dS, deltaG0_kJ: dG, ghsMismatch_kJ: dG - (dH - (T_REF * dS) / 1000) };
}

const scratch = { H_kJ: 0, S_J_per_K: 0 };

export function reactionThermoAt(
  species: readonly ReactionSpecies[],
  T: number,
  opts: ThermoOptions = {},
): ReactionThermo {
  const heatCapacity = opts.heatCapacity ?? true;
  const ref = reactionAt298(species);
  let dH = 0;
  let dS = 0;
  // The crossover search calls this ~100 times per reaction: one scratch object, no allocations.
  const st = scratch;
  const lnT = Math.log(T);
  for (const s of species) {
    speciesHSInto(s.record, T, heatCapacity, st, lnT);
    dH += s.nu * st.H_kJ;
    dS += s.nu * st.S_J_per_K;
  }
  // ΔrS°_eff = ΔrS°(T) + δ, with δ chosen so that ΔrG°(298.15) equals the tabulated value.
  const deltaJ = (-ref.ghsMismatch_kJ * 1000) / T_REF;
  // At 298.15 K take the table sum itself, so the result is the tabulated value to the last bit.
  let dG = T === T_REF ? ref.deltaG0_kJ : dH - (T * (dS + deltaJ)) / 1000;
  const p = opts.standardPressure_bar ?? 1;
  if (p !== 1) {
    // μ°(p°) = μ°(1 bar) + RT ln(p°/1 bar) for each ideal gas; condensed phases and solutes unchanged.
    const dn = gasMoleChange(species);
    dG += (dn * R_GAS * T * Math.log(p)) / 1000;
    dS -= dn * R_GAS * Math.log(p);
  }
  return { deltaH0_kJ: dH, deltaS0_J_per_K: dS, deltaG0_kJ: dG, ghsMismatch_kJ: ref.ghsMismatch_kJ };
}

export const STANDARD_PRESSURES_BAR = { '1 bar': 1, '1 atm': ATM_IN_BAR } as const;

/** ln K = −ΔrG°/(RT). */
export function lnKFromDeltaG(deltaG0_kJ: number, T: number): number {
  return (-deltaG0_kJ * 1000) / (R_GAS * T);
}
