// The route's net reaction: Σ ξ_i · (step i as written), intermediates cancelled, as equation text.
import type { RouteEvaluateRequest } from '../../schemas/route-evaluate';
import type { SpeciesLookup } from '../species-library';
import type { RouteEvaluateResponse } from './route-types';
import { combineStoichiometry, formatStoichiometry, readStoichiometry, type Stoichiometry } from './stoichiometry';

/** Null when a counted step cannot be read or everything cancels. Steps without an extent are left out, as in the totals. */
export function routeNetEquation(request: RouteEvaluateRequest, response: RouteEvaluateResponse, lookup: SpeciesLookup): string | null {
  const byId = new Map(request.steps.map((s) => [s.id, s.equation]));
  const parts: { nu: Stoichiometry; factor: number }[] = [];
  for (const step of response.steps) {
    if (step.extent_mol === null || step.result === null) continue;
    const { nu } = readStoichiometry(byId.get(step.id) ?? '', lookup);
    if (!nu) return null;
    parts.push({ nu, factor: step.extent_mol });
  }
  return formatStoichiometry(combineStoichiometry(parts));
}
