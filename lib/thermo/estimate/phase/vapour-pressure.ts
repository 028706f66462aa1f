// Vapour pressure from the normal boiling point by the Clausius–Clapeyron equation, with ΔvapH(T)
// following Watson's relation instead of a constant (both common practice). Ideal vapour, negligible
// liquid volume: ln p(T) − ln p(Tb) = −∫_T^Tb ΔvapH(T′)/(R T′²) dT′, p(Tb) = 1 atm.
import { ATM_IN_BAR, R_GAS } from '../../constants';
import { watsonDvapH } from '../joback/joback';

export interface BoilingData {
  Tb_K: number;
  Tc_K: number;
  dvapH_Tb_kJ: number;
}

const STEPS = 200;

/** ln(p_sat / 1 bar) at T (K); valid below Tc. */
export function lnPsatBar(boiling: BoilingData, T: number): number {
  const { Tb_K: Tb, Tc_K: Tc, dvapH_Tb_kJ: h } = boiling;
  const f = (t: number): number => (1000 * watsonDvapH(h, Tb, Tc, t)) / (R_GAS * t * t);
  // Simpson's rule from T to Tb (the sign follows the direction of integration).
  const step = (Tb - T) / STEPS;
  let sum = f(T) + f(Tb);
  for (let i = 1; i < STEPS; i++) sum += (i % 2 === 1 ? 4 : 2) * f(T + i * step);
  return Math.log(ATM_IN_BAR) - (sum * step) / 3;
}

/** The textbook form with one constant ΔvapH: ln(p/1 atm) = −(ΔvapH/R)(1/T − 1/Tb). */
export function lnPsatBarConstantDvapH(Tb: number, dvapH_kJ: number, T: number): number {
  return Math.log(ATM_IN_BAR) - ((1000 * dvapH_kJ) / R_GAS) * (1 / T - 1 / Tb);
}
