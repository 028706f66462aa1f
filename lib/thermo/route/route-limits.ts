// Route limits and defaults, dependency-free so client forms can share them without the engine.
export const MAX_ROUTE_STEPS = 500;
export const MAX_ROUTE_LINKS = 4 * MAX_ROUTE_STEPS;
/** About K = 10^3 at 298 K: common practice, no source. */
export const DEFAULT_MARGINAL_THRESHOLD_KJ = -17;
/** Below this a yield makes the extents overflow to no purpose: 0.0001 % (a bound of ours, not a standard). */
export const MIN_YIELD_FRACTION = 1e-6;
/** The largest target amount a route takes, in mol; past it ΔG totals lose meaning before they overflow. */
export const MAX_TARGET_AMOUNT_MOL = 1e9;
