// σ of a route's total ΔG from its steps' σ(ΔrG°): each counted step adds ξ·σ in quadrature (RT ln Q carries no
// data uncertainty, so σ(ΔG) = σ(ΔG°) per step). Pure.
import type { RouteStepResult } from './route-types';

export interface RouteSigma {
  /** sqrt(Σ (ξ·σ)²) over counted steps, kJ for the route's target amount; null when no counted step has a σ */
  sigma_kJ: number | null;
  /** |total ΔG| ≤ σ: within the data uncertainty the total could have either sign */
  signUncertain: boolean;
  /**
   * true when the quadrature sum over-states σ: a species (an intermediate) stands in more than one counted step,
   * so its error partly cancels in the total, or a step's own σ is already an upper bound.
   */
  upperBound: boolean;
}

type SigmaStep = Pick<RouteStepResult, 'result' | 'extent_mol'>;

export function routeSigma(steps: readonly SigmaStep[], total_kJ: number): RouteSigma {
  let sumSq = 0;
  let any = false;
  let upperBound = false;
  const seen = new Set<string>();
  for (const s of steps) {
    const r = s.result;
    if (!r || s.extent_mol === null) continue;
    const sigma = r.uncertainty.deltaG0_kJ;
    if (sigma !== null) {
      any = true;
      sumSq += (s.extent_mol * sigma) ** 2;
    }
    if (r.uncertainty.upperBound) upperBound = true;
    for (const sp of r.species) {
      // Only species with a σ can cancel; reference states and σ-less species change nothing.
      if (!sp.sigma_dfG_kJ) continue;
      if (seen.has(sp.key)) upperBound = true;
      seen.add(sp.key);
    }
  }
  const sigma_kJ = any ? Math.sqrt(sumSq) : null;
  return { sigma_kJ, signUncertain: sigma_kJ !== null && Math.abs(total_kJ) <= sigma_kJ, upperBound: any && upperBound };
}
