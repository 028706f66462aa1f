// Errors of the vaporisation step, measured on the organics compilation shipped in
// lib/thermo/data/source/organics/species.csv: every C,H-containing compound with both a gas and a
// liquid row, Joback-fragmentable, estimated Tb ≥ 310 K (140 compounds; tests/reference/
// estimate-phase.test.ts repeats the measurement). Reference values are the tabulated differences
// dfH(g) − dfH(l) (= ΔvapH°), dfG(l) − dfG(g) (= RT ln psat/p°) and S(g) − S(l). Rounded up; the RMS
// includes a few compilation pairs that mix sources and look wrong (styrene), which we keep.

/** ΔvapH(298.15 K) from Joback ΔHvap(Tb) by Watson: measured RMS 3.8 kJ/mol, MAE 2.5, bias −1.0. */
export const JOBACK_DVAPH298_SIGMA_KJ = 4;

/** RT ln(psat/p°) at 298.15 K from Tb by Clausius–Clapeyron with Watson ΔvapH(T): RMS 4.4 kJ/mol, MAE 2.2. */
export const RT_LN_PSAT_SIGMA_KJ = 4.5;

/** The entropy of vaporisation to p°, ΔvapH/T + R ln(psat/p°): RMS 13.9 J/(mol K), MAE 6.2. */
export const VAPORISATION_ENTROPY_SIGMA_J_PER_K = 14;
