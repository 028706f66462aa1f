import { ThermoError } from '../../thermo/errors';
import { parseAmount } from '../../thermo/units';
import { evaluateRoute, type RouteEvaluateResponse } from '../../thermo/route';
import type { LinkInput, StepInput } from '../../schemas/route';

interface RouteLike {
  target: string;
  targetAmount: string;
  marginalThreshold_kJ: number;
  steps: StepInput[];
  links: LinkInput[];
}

export type RouteEvaluation = RouteEvaluateResponse | { error: { code: string; message: string; field: string | null } };

// Editor steps carry UI fields and may hold blank quantities; the engine gets only its own fields.
export function toRouteEvaluateRequest(route: RouteLike) {
  return {
    target: route.target,
    targetAmount: route.targetAmount,
    marginalThreshold_kJ: route.marginalThreshold_kJ,
    steps: route.steps.map(({ id, yieldPct, notes: _notes, position: _position, equation, ...fields }) => ({
      id,
      // A blank equation stays: the engine reports it on that step while the rest of the route evaluates.
      equation,
      ...Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== '' && v !== undefined)),
      yield: yieldPct / 100,
    })),
    links: route.links,
  };
}

// The ladder and totals a save caches for the list; remedies are the evaluate endpoint's job.
// A route the engine refuses as a whole (empty, cyclic) still saves; the answer carries the reason.
export function evaluateRouteDocument(route: RouteLike): RouteEvaluation {
  try {
    return evaluateRoute(toRouteEvaluateRequest(route) as Parameters<typeof evaluateRoute>[0], { remedies: false });
  } catch (error) {
    if (error instanceof ThermoError) return { error: { code: error.code, message: error.message, field: error.field ?? null } };
    throw error;
  }
}

export function summariseEvaluation(route: RouteLike, evaluation: RouteEvaluation) {
  if ('error' in evaluation) return { stepCount: route.steps.length, overallDgKj: null, uphillSteps: null };
  // The list shows ΔG per mol of target, whatever amount the route is planned for.
  const targetMol = parseAmount(route.targetAmount, 'targetAmount');
  return { stepCount: route.steps.length, overallDgKj: evaluation.overall.deltaG_kJ / targetMol, uphillSteps: evaluation.overall.uphillSteps };
}
