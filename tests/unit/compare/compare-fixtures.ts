// Routes for the comparison tests: every reaction is in the built-in library (NBS Tables 1982 values at 298.15 K).
import type { RouteForComparison } from '@/lib/compare/build-comparison';
import { evaluateRoute, type RouteEvaluateRequest } from '@/lib/thermo/route';
import { nbsLookup } from '@/lib/thermo/species-library';

export const CARBON_BURN = 'C(s) + O2(g) -> CO2(g)';
export const CALCINATION = 'CaCO3(s) -> CaO(s) + CO2(g)';
export const NO2_DIMER = '2 NO2(g) -> N2O4(g)';
export const NH3_SYNTHESIS = 'N2(g) + 3 H2(g) -> 2 NH3(g)';
export const STEAM_REFORMING = 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)';
export const WATER_GAS_SHIFT = 'CO(g) + H2O(g) -> CO2(g) + H2(g)';

export function oneStep(target: string, equation: string, extra: Partial<RouteEvaluateRequest> = {}): RouteEvaluateRequest {
  return { target, steps: [{ id: 's1', equation }], ...extra };
}

export function reformingThenShift(temperatures: [string?, string?] = []): RouteEvaluateRequest {
  return {
    target: 'CO2(g)',
    steps: [
      { id: 's1', equation: STEAM_REFORMING, ...(temperatures[0] ? { temperature: temperatures[0] } : {}) },
      { id: 's2', equation: WATER_GAS_SHIFT, ...(temperatures[1] ? { temperature: temperatures[1] } : {}) },
    ],
    links: [{ from: 's1', to: 's2', species: 'CO(g)' }],
  };
}

let nextId = 1;

/** A route as the compare service hands it over, evaluated by the real engine with the default drivers. */
export function forComparison(request: RouteEvaluateRequest, over: Partial<RouteForComparison> = {}): RouteForComparison {
  const id = over.id ?? nextId++;
  return {
    id,
    name: `Route ${id}`,
    target: request.target,
    targetAmount: request.targetAmount ?? '1 mol',
    status: 'draft',
    version: 1,
    archived: false,
    updatedAt: '2026-12-01T09:00:00.000Z',
    updatedBy: 'Baptiste Osei',
    stepCount: request.steps.length,
    openFlags: 0,
    unresolvedComments: 0,
    request,
    outcome: { evaluation: evaluateRoute(request, { lookup: nbsLookup }) },
    ...over,
  };
}
