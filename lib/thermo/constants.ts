// Physical constants (CODATA 2018 exact values) and the reference state.

/** molar gas constant, J/(mol K), CODATA 2018 */
export const R_GAS = 8.314462618;
/** Faraday constant, C/mol, CODATA 2018 */
export const FARADAY = 96485.33212;
/** reference temperature of the library, K */
export const T_REF = 298.15;
/** 1 atm in bar (exact by definition) */
export const ATM_IN_BAR = 1.01325;
