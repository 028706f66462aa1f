// Route limits and defaults, dependency-free so client forms can share them without the engine.
export const MAX_ROUTE_STEPS = 500;
export const MAX_ROUTE_LINKS = 4 * MAX_ROUTE_STEPS;
/** About K = 10^3 at 298 K: common practice, no source. */
export const DEFAULT_MARGINAL_THRESHOLD_KJ = -17;
