import { ThermoError } from '../../thermo/errors';
import { parseAmount } from '../../thermo/units';
import { evaluateRoute, type RouteEvaluateResponse } from '../../thermo/route';
import type { SpeciesLookup } from '../../thermo/species-library';
import type { LinkInput, StepInput } from '../../schemas/route';
import type { ReactionOverride } from '../../thermo/reaction-override';

/** fit id → the engine's override, loaded by lib/services/fits/fit-overrides.ts */
export type StepFits = ReadonlyMap<number, ReactionOverride>;
const NO_FITS: StepFits = new Map();

interface RouteLike {
  target: string;
  targetAmount: string;
  marginalThreshold_kJ: number;
  steps: StepInput[];
  links: LinkInput[];
}

export type RouteEvaluation = RouteEvaluateResponse | { error: { code: string; message: string; field: string | null } };

// Editor steps carry UI fields and may hold blank quantities; the engine gets only its own fields.
export function toRouteEvaluateRequest(route: RouteLike, fits: StepFits = NO_FITS) {
  return {
    target: route.target,
    targetAmount: route.targetAmount,
    marginalThreshold_kJ: route.marginalThreshold_kJ,
    steps: route.steps.map(({ id, yieldPct, notes: _notes, position: _position, equation, fitId, ...fields }) => ({
      id,
      // A blank equation stays: the engine reports it on that step while the rest of the route evaluates.
      equation,
      ...Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== '' && v !== undefined)),
      // A step on a saved fit takes its ΔH° and ΔS° from it; the loader has checked the id against the team.
      ...(typeof fitId === 'number' && fits.has(fitId) ? { override: fits.get(fitId)! } : {}),
      yield: yieldPct / 100,
    })),
    links: route.links,
  };
}

// The ladder and totals a save caches for the list; remedies are the evaluate endpoint's job.
// A route the engine refuses as a whole (empty, cyclic) still saves; the answer carries the reason.
// `lookup` is the team's (lib/services/species/team-lookup.ts); the built-in library alone otherwise.
export function evaluateRouteDocument(route: RouteLike, lookup: SpeciesLookup, fits: StepFits = NO_FITS): RouteEvaluation {
  try {
    return evaluateRoute(toRouteEvaluateRequest(route, fits) as Parameters<typeof evaluateRoute>[0], { remedies: false, lookup });
  } catch (error) {
    if (error instanceof ThermoError) return { error: { code: error.code, message: error.message, field: error.field ?? null } };
    throw error;
  }
}

export function summariseEvaluation(route: RouteLike, evaluation: RouteEvaluation) {
  if ('error' in evaluation) return { stepCount: route.steps.length, overallDgKj: null, uphillSteps: null };
  // A step that could not be evaluated is left out of the totals: the list says "not evaluated", never "0.0 … none".
  if (evaluation.steps.some((s) => s.class === 'error')) return { stepCount: route.steps.length, overallDgKj: null, uphillSteps: null };
  // The list shows no total for a route whose totals wait (no step makes the target yet); its uphill count stands.
  if (evaluation.totalsWithheld) return { stepCount: route.steps.length, overallDgKj: null, uphillSteps: evaluation.overall.uphillSteps };
  // The list shows ΔG per mol of target, whatever amount the route is planned for.
  const targetMol = parseAmount(route.targetAmount, 'targetAmount');
  return { stepCount: route.steps.length, overallDgKj: evaluation.overall.deltaG_kJ / targetMol, uphillSteps: evaluation.overall.uphillSteps };
}
