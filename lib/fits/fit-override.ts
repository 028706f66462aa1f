// A saved fit as the engine's step override: its ΔH°, ΔS°, their errors and the temperatures it covers.
import type { ReactionOverride } from '../thermo/reaction-override';
import type { FitResult } from './analyse-fit';

export function fitSource(fit: { id: number; name: string }): string {
  return `fit #${fit.id} “${fit.name}”`;
}

export function fitToOverride(fit: { id: number; name: string; equation: string; result: FitResult }): ReactionOverride {
  const r = fit.result;
  return {
    equation: fit.equation,
    deltaH0_kJ: r.deltaH0_kJ,
    deltaS0_J_per_K: r.deltaS0_J_per_K,
    source: fitSource(fit),
    range_K: r.range_K,
    stderr: { deltaH0_kJ: r.stderr_deltaH0_kJ, deltaS0_J_per_K: r.stderr_deltaS0_J_per_K, covariance_HS: r.covariance_HS },
  };
}
