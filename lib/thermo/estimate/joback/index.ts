// Joback & Reid group contributions: boiling point, critical temperature, vaporisation enthalpy, Cp.
export { estimateJoback, watsonDvapH, WATSON_EXPONENT, type JobackEstimate } from './joback';
export { jobackCp, JOBACK_CP_RANGE_K, type JobackCp } from './joback-cp';
export { JOBACK_DVAPH298_SIGMA_KJ, RT_LN_PSAT_SIGMA_KJ, VAPORISATION_ENTROPY_SIGMA_J_PER_K } from './joback-accuracy';
