// Liquid formation values from an ideal-gas estimate and Joback's vaporisation data (common practice,
// not part of any group method): ΔfH°(l) = ΔfH°(g) − ΔvapH, ΔfG°(l) = ΔfG°(g) + RT ln(psat/p°),
// S°(l) = S°(g) − ΔvapH/T − R ln(psat/p°). The result is estimated twice over (gas, then vaporisation)
// and says so.
import { R_GAS, T_REF } from '../../constants';
import { ThermoError } from '../../errors';
import { JOBACK_DVAPH298_SIGMA_KJ, RT_LN_PSAT_SIGMA_KJ, VAPORISATION_ENTROPY_SIGMA_J_PER_K } from '../joback/joback-accuracy';
import { watsonDvapH, type JobackEstimate } from '../joback/joback';
import type { GasValues } from './gas-values';
import type { MatchedGroup } from './matched-group';
import { lnPsatBar } from './vapour-pressure';

/** Lowest temperature accepted: below it most organic liquids have frozen and the extrapolation is blind. */
export const LIQUID_T_MIN_K = 200;

export interface LiquidEstimate extends GasValues {
  T_K: number;
  Tb_K: number;
  Tc_K: number;
  /** ΔvapH at T_K (Watson from Joback's ΔHvap(Tb)) */
  dvapH_kJ: number;
  psat_bar: number;
  sigma_dvapH_kJ: number;
  vaporisationGroups: MatchedGroup[];
  method: 'gas estimate + vaporisation (Joback Tb, ΔHvap; Watson; Clausius–Clapeyron)';
  /** what is approximated, in words a user can read */
  notes: string[];
  warnings: string[];
}

const NOTES = [
  'Liquid values are estimated twice over: the ideal-gas estimate, then the vaporisation step (common practice).',
  'Vaporisation: Joback ΔHvap(Tb) moved to T by Watson (n = 0.38); psat from Tb by Clausius–Clapeyron integrated with that ΔvapH(T); ideal vapour, liquid volume neglected.',
  'Associating liquids (acids, which dimerise in the vapour; polyols) are the least reliable.',
];

/**
 * Liquid values at T (K) from gas values at the same T. Range: 200 K ≤ T ≤ max(Tb, 298.15 K), and below
 * the estimated Tc. Above Tb the liquid at 1 bar is hypothetical; that is allowed with a warning.
 * σ are the 298.15 K calibration (see joback-accuracy.ts); away from 298.15 K they are a floor.
 */
export function liquidAtTemperature(gas: GasValues, joback: JobackEstimate, T: number): LiquidEstimate {
  const { Tb_K: Tb, Tc_K: Tc } = joback;
  if (Tc === null) {
    throw new ThermoError('MISSING_DATA', 'Joback has no critical-temperature contribution for a group in this molecule, so ΔvapH and psat cannot be moved from Tb.', {
      hint: 'Give the liquid values directly, or a measured ΔvapH.',
    });
  }
  const upper = Math.max(Tb, T_REF);
  if (!(T >= LIQUID_T_MIN_K && T <= upper) || T >= Tc) {
    throw new ThermoError('OUT_OF_RANGE', `Estimated liquid values cover ${LIQUID_T_MIN_K}–${Math.min(upper, Tc).toFixed(0)} K for this molecule (estimated Tb ${Tb.toFixed(0)} K, Tc ${Tc.toFixed(0)} K); ${T} K is outside.`, {
      field: 'T',
      hint: 'Above the critical temperature no liquid exists; far below the boiling point the substance may be solid.',
    });
  }
  const dvapH = watsonDvapH(joback.dvapH_Tb_kJ, Tb, Tc, T);
  const lnP = lnPsatBar({ Tb_K: Tb, Tc_K: Tc, dvapH_Tb_kJ: joback.dvapH_Tb_kJ }, T);
  const rtLnP = (R_GAS * T * lnP) / 1000;
  const warnings = [...joback.warnings.filter((w) => !w.includes('boiling point'))];
  if (T > Tb) warnings.push(`At ${T} K the substance boils (estimated Tb ${Tb.toFixed(0)} K): a liquid at 1 bar is hypothetical, as in tables that list liquid rows for gases.`);
  return {
    T_K: T,
    Tb_K: Tb,
    Tc_K: Tc,
    dvapH_kJ: dvapH,
    psat_bar: Math.exp(lnP),
    sigma_dvapH_kJ: JOBACK_DVAPH298_SIGMA_KJ,
    dfH_kJ: gas.dfH_kJ - dvapH,
    dfG_kJ: gas.dfG_kJ + rtLnP,
    S_J_per_K: gas.S_J_per_K - (1000 * dvapH) / T - R_GAS * lnP,
    sigma_dfH_kJ: Math.hypot(gas.sigma_dfH_kJ, JOBACK_DVAPH298_SIGMA_KJ),
    sigma_dfG_kJ: Math.hypot(gas.sigma_dfG_kJ, RT_LN_PSAT_SIGMA_KJ),
    sigma_S_J_per_K: Math.hypot(gas.sigma_S_J_per_K, VAPORISATION_ENTROPY_SIGMA_J_PER_K),
    vaporisationGroups: joback.groups,
    method: 'gas estimate + vaporisation (Joback Tb, ΔHvap; Watson; Clausius–Clapeyron)',
    notes: NOTES,
    warnings,
  };
}

/** Liquid values at 298.15 K and 1 bar from 298.15 K gas values. */
export function liquidFromGas(gas: GasValues, joback: JobackEstimate): LiquidEstimate {
  return liquidAtTemperature(gas, joback, T_REF);
}
