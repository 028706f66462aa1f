// Steps two or more compared routes share: the same equation up to spelling, term order and species aliases.
import type { SpeciesLookup } from '../thermo/species-library';
import { formatStoichiometry, readStoichiometry } from '../thermo/route/stoichiometry';
import type { SharedEquation } from './compare-types';

/**
 * "CO(g) + 2 H2(g) -> CH3OH(g)" for "2H2(g) + CO(g) = CH3OH(g)". Coefficients stay as written, so a step
 * written twice as large is a different step. Null when the equation cannot be read.
 */
export function normaliseEquation(equation: string, lookup: SpeciesLookup): string | null {
  const { nu } = readStoichiometry(equation, lookup);
  if (!nu) return null;
  const sorted = new Map([...nu].filter(([, v]) => !v.equals(0)).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
  return formatStoichiometry(sorted);
}

export interface StepsOfRoute {
  routeId: number;
  steps: { id: string; equationKey: string | null }[];
}

/** Equations found in at least two routes, in the order they first appear; each with the steps that hold it. */
export function sharedEquations(routes: readonly StepsOfRoute[]): SharedEquation[] {
  const byKey = new Map<string, Map<number, string[]>>();
  for (const route of routes) {
    for (const step of route.steps) {
      if (!step.equationKey) continue;
      const holders = byKey.get(step.equationKey) ?? new Map<number, string[]>();
      holders.set(route.routeId, [...(holders.get(route.routeId) ?? []), step.id]);
      byKey.set(step.equationKey, holders);
    }
  }
  return [...byKey]
    .filter(([, holders]) => holders.size >= 2)
    .map(([equation, holders]) => ({ equation, routes: [...holders].map(([routeId, stepIds]) => ({ routeId, stepIds })) }));
}
