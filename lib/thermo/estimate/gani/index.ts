// Gani (2022) GC-simple fallback for ideal-gas ΔfH°, ΔfG° and S° at 298.15 K.
export { estimateGani, type GaniEstimate } from './gani';
export { ganiFragment, defaultTieRule, type GaniFragmentation, type TieRule } from './gani-fragment';
export { GANI_SIGMA_DFH_KJ, GANI_SIGMA_DFG_KJ, GANI_SIGMA_S_J_PER_K } from './gani-accuracy';
export { elementEntropySum } from './element-entropy';
export { exactCovers, type CoverCandidate, type CoverResult } from './exact-cover';
