// σ of the Gani (2022) fallback, measured on the organics compilation (lib/thermo/data/source/organics/
// species.csv, gas rows of C,H compounds) for the 103 compounds Gani can estimate that are NOT in the
// authors' regression set (tests/reference/estimate-gani.test.ts repeats the measurement). Each σ is the
// 68th percentile of |estimate − tabulated|; the tails are heavy (RMS 52 / 66 / 174, 95th percentile
// 102 / 134 / 493), worst for small strained rings, small molecules and fluorinated carbons.
// Inside the regression set the same statistic is 3.5 / 4.4 kJ/mol / 9 J/(mol K): the published ~8 kJ/mol
// describes fitted molecules only.

/** out of set: p68 29.5 kJ/mol, MAE 31, bias −14 */
export const GANI_SIGMA_DFH_KJ = 30;
/** out of set: p68 45.5 kJ/mol, MAE 43, bias −15 */
export const GANI_SIGMA_DFG_KJ = 46;
/** S° from the identity amplifies both errors: out of set p68 82 J/(mol K), MAE 100 */
export const GANI_SIGMA_S_J_PER_K = 85;
