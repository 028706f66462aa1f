// Abraham solute descriptors (Chung et al. 2022 groups) and the water solvation relations.
export { estimateSoluteDescriptors, type SoluteEstimate, type LibraryUse } from './solute-descriptors';
export type { SoluteDescriptors } from './solute-database';
export { dGsolvBenNaim, dHsolvWater, gasStandardStateShift, log10Kwater, waterModel, type WaterModel } from './water';
export { assertNeutralClosedShell } from './neutral-check';
export { mcgowanVolume } from './mcgowan-volume';
export { GROUP_DESCRIPTOR_DG_SIGMA_KJ, GROUP_DESCRIPTOR_DH_SIGMA_KJ, LSER_DG_SIGMA_KJ, MINTZ_DH_SIGMA_KJ } from './solvation-accuracy';
